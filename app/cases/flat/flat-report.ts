/**
 * The report of an insulated flat surface (tank or duct wall, vessel roof): heat lost (or gained)
 * per m² and over the area, the surface temperature and checks, the build-up and temperatures,
 * from the flat-surface input and its solved result. Pure: the same input and result give the
 * same report.
 */
import { SI_TEXT, type QuantityText } from '../../base/quantity-text.js';
import { asSentence } from '../../report/as-sentence.js';
import { areaUnitSymbol } from '../../report/unit-words.js';
import type { CaseReport, ReportFigure } from '../../report/report-model.js';
import { distinctCautions } from '../../report/report-verdicts.js';
import {
  buildUpSection,
  conditionsSection,
  insulatedAssumptions,
  insulatedSources,
  insulatedVerdicts,
  surfaceSection,
  temperaturesSection,
} from '../insulated/insulated-report.js';
import type { FlatSurfaceResult } from './flat-surface-calculation.js';
import type { FlatSurfaceInput } from './flat-surface-input.js';
import { withFields } from '../with-fields.js';

export interface FlatReportExtras {
  /** The case's title; default the input's. */
  readonly title?: string;
  /** Every assumption of the case (defaults the parser chose, then the calculation's); default the result's. */
  readonly assumptions?: readonly string[];
  /** Writes the figures in sentences and labels in the project's units; default SI. */
  readonly text?: QuantityText;
}

export function flatReport(input: FlatSurfaceInput, result: FlatSurfaceResult, extras: FlatReportExtras = {}): CaseReport {
  const text = extras.text ?? SI_TEXT;
  const lost = result.heatFlowDensity >= 0;
  const word = lost ? 'loss' : 'gain';
  const verdicts = insulatedVerdicts(result, text);
  const keyFigures: ReportFigure[] = [
    { label: `Heat ${word} per ${areaUnitSymbol(text)} of surface`, value: Math.abs(result.heatFlowDensity), quantity: 'heatFlux' },
    { label: `Heat ${word} over the whole area`, value: Math.abs(result.heatLoss), quantity: 'heatFlow' },
    { label: 'Outer surface temperature', value: result.surfaceTemperature, quantity: 'temperature' },
    {
      label: `Energy ${lost ? 'lost' : 'gained'} per year`,
      value: Math.abs(result.annualEnergy),
      quantity: 'energyPerYear',
      note: `over ${text.figure(input.operatingHours, 'hours')} of operation`,
    },
    { label: 'Thermal resistance of the layers', value: result.layerResistance, quantity: 'thermalResistance', note: 'without the surface films' },
  ];
  // In the order of the solved layers: wall, insulation layers, jacket.
  const materials = [...(input.wall ? [input.wall.material] : []), ...input.layers.map((l) => l.material), ...(input.jacket ? [input.jacket.material] : [])];
  const s = input.surface;
  const orientation: ReportFigure[] =
    s.kind === 'vertical'
      ? [{ label: 'Height of the vertical surface', value: s.height, quantity: 'length' }]
      : [{ label: `Characteristic length of the surface facing ${s.facing}`, value: s.characteristicLength, quantity: 'length', note: 'area divided by perimeter' }];
  return {
    kind: 'flat',
    title: extras.title ?? input.title ?? 'Insulated flat surface',
    subject: subjectOf(input, text),
    keyFigures,
    verdicts,
    sections: [
      conditionsSection(input, [{ label: 'Area of the surface', value: input.area, quantity: 'area' }, ...orientation]),
      buildUpSection(result, materials, { geometry: 'plane' }),
      temperaturesSection(result, { positionLabel: 'distance from the inner surface', shownPosition: (x) => x, profile: { kind: 'planar', conductivities: materials.map((m) => m.conductivity) } }),
      surfaceSection(result),
    ],
    energyBalance: withFields(result.energyBalance, { quantity: 'heatFlux' as const }),
    assumptions: insulatedAssumptions(extras.assumptions ?? result.assumptions),
    warnings: result.warnings.map(asSentence),
    sources: insulatedSources(input, materials, convectionOf(input), text),
    cautions: distinctCautions(verdicts),
  };
}

/** "Vertical surface 6 m high, 150 m²; wall 8.0 mm of Carbon steel; insulation 100.0 mm of Rock wool; …" ("of": see the pipe subject). */
function subjectOf(input: FlatSurfaceInput, text: QuantityText): string {
  const s = input.surface;
  const shape = s.kind === 'vertical' ? `Vertical surface ${text.figure(s.height, 'length')} high` : `Horizontal surface facing ${s.facing}`;
  const wall = input.wall ? `; wall ${text.figure(input.wall.thickness, 'thickness')} of ${input.wall.material.name}` : '';
  const insulation = input.layers.map((l) => `${text.figure(l.thickness, 'thickness')} of ${l.material.name}`).join(' + ');
  const jacket = input.jacket ? `; jacket ${text.figure(input.jacket.thickness, 'thickness')} of ${input.jacket.material.name}` : '; no jacket';
  const exposure = input.ambient.exposure.kind === 'outdoor' ? `outdoors in ${text.figure(input.ambient.exposure.windSpeed, 'windSpeed')} wind` : 'indoors in still air';
  return `${shape}, ${text.figure(input.area, 'area')}${wall}; insulation ${insulation}${jacket}; ${exposure}.`;
}

/** The correlations the outer film uses for this surface, for the sources. */
function convectionOf(input: FlatSurfaceInput): string {
  const natural =
    input.surface.kind === 'vertical'
      ? 'Churchill–Chu correlation for a vertical plate in still air'
      : `natural convection from a horizontal plate facing ${input.surface.facing} (Incropera & DeWitt, on the characteristic length area/perimeter)`;
  const wind = input.ambient.exposure.kind === 'outdoor' && input.ambient.exposure.windSpeed > 0;
  return wind
    ? `${natural}, combined with flat-plate parallel flow (laminar up to Re = 5·10⁵, mixed laminar–turbulent up to 10⁸) as mixed convection (exponent 3)`
    : natural;
}
