/**
 * The report of an insulated pipe: heat lost (or gained) per metre and over the run, the surface
 * temperature and checks, the build-up and temperatures, from the pipe input and its solved
 * result. Pure: the same input and result give the same report.
 */
import { SI_TEXT, type QuantityText } from '../../base/quantity-text.js';
import { asSentence } from '../../report/as-sentence.js';
import { lengthUnitWord } from '../../report/unit-words.js';
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
import type { PipeResult } from './pipe-calculation.js';
import type { PipeInput } from './pipe-input.js';
import type { PipeSize } from './pipe-sizes.js';
import { withFields } from '../with-fields.js';

export interface PipeReportExtras {
  /** The case's title; default the input's. */
  readonly title?: string;
  /** Every assumption of the case (defaults the parser chose, then the calculation's); default the result's. */
  readonly assumptions?: readonly string[];
  /** Writes the figures in sentences and labels in the project's units; default SI. */
  readonly text?: QuantityText;
}

/** `input.pipeSize`, where given, is the named size the case file gave instead of a diameter. */
export function pipeReport(input: PipeInput & { readonly pipeSize?: PipeSize | null }, result: PipeResult, extras: PipeReportExtras = {}): CaseReport {
  const text = extras.text ?? SI_TEXT;
  const lost = result.heatLossPerMetre >= 0;
  const word = lost ? 'loss' : 'gain';
  const perLength = lengthUnitWord(text);
  const verdicts = insulatedVerdicts(result, text);
  const keyFigures: ReportFigure[] = [
    { label: `Heat ${word} per ${perLength}`, value: Math.abs(result.heatLossPerMetre), quantity: 'heatFlowPerLength' },
    { label: `Heat ${word} over the whole run`, value: Math.abs(result.heatLoss), quantity: 'heatFlow' },
    { label: 'Outer surface temperature', value: result.surfaceTemperature, quantity: 'temperature' },
    { label: `Heat flow density ${lost ? 'from' : 'into'} the outer surface`, value: Math.abs(result.heatFlowDensityAtSurface), quantity: 'heatFlux' },
    {
      label: `Energy ${lost ? 'lost' : 'gained'} per year`,
      value: Math.abs(result.annualEnergy),
      quantity: 'energyPerYear',
      note: `over ${text.figure(input.operatingHours, 'hours')} of operation`,
    },
  ];
  const size = input.pipeSize ?? null;
  // In the order of the solved layers: pipe wall, insulation layers, jacket.
  const materials = [input.pipe.material, ...input.layers.map((l) => l.material), ...(input.jacket ? [input.jacket.material] : [])];
  return {
    kind: 'pipe',
    title: extras.title ?? input.title ?? 'Insulated pipe',
    subject: subjectOf(input, size, text),
    keyFigures,
    verdicts,
    sections: [
      conditionsSection(input, [
        { label: 'Length of the run', value: input.length, quantity: 'length' },
        ...(result.height !== null ? [{ label: 'Height for convection on the vertical pipe', value: result.height, quantity: 'length' as const }] : []),
      ]),
      buildUpSection(result, materials, { geometry: 'cylinder', innerRadius: result.layers[0]!.innerPosition }),
      temperaturesSection(result, { positionLabel: 'radius', shownPosition: (r) => r, profile: { kind: 'axisymmetric', conductivities: materials.map((m) => m.conductivity) } }),
      surfaceSection(result),
      {
        id: 'pipe',
        heading: 'Pipe dimensions',
        blocks: [
          {
            kind: 'figures',
            figures: [
              { label: 'Outside diameter of the pipe', value: input.pipe.outerDiameter, quantity: 'diameter' },
              { label: 'Pipe wall thickness', value: input.pipe.wallThickness, quantity: 'thickness' },
              { label: 'Outside diameter over the insulation', value: result.outerDiameter, quantity: 'diameter' },
              { label: `Outer surface area per ${perLength} of pipe`, value: result.surfaceAreaPerMetre, quantity: 'area' },
            ],
          },
        ],
      },
    ],
    energyBalance: withFields(result.energyBalance, { quantity: 'heatFlowPerLength' as const }),
    assumptions: insulatedAssumptions(extras.assumptions ?? result.assumptions),
    warnings: result.warnings.map(asSentence),
    sources: [
      ...(size ? [asSentence(`Pipe size ${sizeName(size)} from the ${size.series} table: ${size.source}`)] : []),
      ...insulatedSources(input, materials, convectionOf(input), text),
    ],
    cautions: distinctCautions(verdicts),
  };
}

/**
 * "Horizontal pipe, 168.3 × 7.1 mm of Carbon steel; insulation 60.0 mm of Rock wool; …; outdoors in 5.0 m/s wind".
 * "of" after each thickness: in US units the unit "in" would otherwise read as a preposition
 * ("1.969 in Rock wool").
 */
function subjectOf(input: PipeInput, size: PipeSize | null, text: QuantityText): string {
  const pipe = `${text.number(input.pipe.outerDiameter, 'diameter')} × ${text.figure(input.pipe.wallThickness, 'thickness')} of ${input.pipe.material.name}`;
  const named = size ? ` (${sizeName(size)})` : '';
  const insulation = input.layers.map((l) => `${text.figure(l.thickness, 'thickness')} of ${l.material.name}`).join(' + ');
  const jacket = input.jacket ? `; jacket ${text.figure(input.jacket.thickness, 'thickness')} of ${input.jacket.material.name}` : '; no jacket';
  const exposure = input.ambient.exposure.kind === 'outdoor' ? `outdoors in ${text.figure(input.ambient.exposure.windSpeed, 'windSpeed')} wind` : 'indoors in still air';
  return `${input.orientation === 'vertical' ? 'Vertical' : 'Horizontal'} pipe, ${pipe}${named}; insulation ${insulation}${jacket}; ${exposure}.`;
}

/** The correlations the outer film uses for this pipe, for the sources. */
function convectionOf(input: PipeInput): string {
  const natural =
    input.orientation === 'horizontal'
      ? 'Churchill–Chu correlation for a horizontal cylinder in still air'
      : 'Churchill–Chu correlation for a vertical plate, applied to the vertical pipe as a plate of the same height';
  const wind = input.ambient.exposure.kind === 'outdoor' && input.ambient.exposure.windSpeed > 0;
  return wind ? `${natural}, combined with the Churchill–Bernstein correlation for a cylinder in cross-flow as mixed convection (exponent 3)` : natural;
}

/** A named size as the trade says it: "DN100", "NPS 6", "108 mm tube", "1 1/4 in tube". */
function sizeName(size: PipeSize): string {
  switch (size.series) {
    case 'steel-iso':
      return size.nominal;
    case 'steel-asme':
      return `NPS ${size.nominal}`;
    case 'copper-astm-b88':
      return `${size.nominal} in tube`;
    default:
      return `${size.nominal} mm tube`;
  }
}
