/**
 * The wall report's parts on bridged layers (ISO 6946 combined method), on the Annex F corrections
 * to U (air gaps, fasteners) and on the insulation thickness for a target U-value, with the
 * sentences for the report's assumptions and sources. Pure functions of the input and analysis.
 */
import type { QuantityText } from '../../base/quantity-text.js';
import type { ReportCell, ReportSection, ReportTable } from '../../report/report-model.js';
import type { WallAnalysis } from './wall-analysis.js';
import type { WallInput } from './wall-input.js';
import type { WallResult } from './wall-result.js';
import { isAirLayer } from './wall-input.js';

export const SECTIONS_TABLE = 'Sections of the bridged layers';
export const PATHS_TABLE = 'Parallel paths through the element (upper limit)';
export const CORRECTIONS_TABLE = 'Corrections to the U-value (ISO 6946 Annex F)';
export const TARGET_TABLE = 'U-value across the thickness series';

const resistance = (value: number | null): ReportCell => ({ value, quantity: 'thermalResistance' });
const factor = (value: number | null): ReportCell => ({ value, quantity: 'factor' });
const uCell = (value: number | null): ReportCell => ({ value, quantity: 'uValueUnrounded' });

/** The combined-method section, when a counted layer is bridged. */
export function combinedMethodSections(w: WallResult, text: QuantityText): ReportSection[] {
  const c = w.combinedMethod;
  if (c === null) return [];
  const bridged = w.layers.filter((l) => l.included && l.bridged);
  const sections: ReportTable = {
    title: SECTIONS_TABLE,
    columns: [
      { label: 'Layer' },
      { label: 'Section' },
      { label: 'Area fraction f', quantity: 'factor' },
      { label: 'λ (declared value)', quantity: 'conductivity' },
      { label: 'λ″ of the layer = Σ f·λ', quantity: 'conductivity' },
      { label: 'R carried in the solve', quantity: 'thermalResistance' },
    ],
    rows: bridged.flatMap((l) =>
      l.bridged!.sections.map((s, k): ReportCell[] => [
        k === 0 ? l.name : '',
        k === 0 ? `${s.name} (the layer's own material)` : s.name,
        factor(s.fraction),
        { value: s.conductivity, quantity: 'conductivity' },
        { value: k === 0 ? l.bridged!.lowerLimitConductivity : null, quantity: 'conductivity' },
        resistance(k === 0 ? l.bridged!.equivalentResistance : null),
      ]),
    ),
  };
  const paths: ReportTable = {
    title: PATHS_TABLE,
    columns: [{ label: 'Path (section in each bridged layer)' }, { label: 'Area fraction f_m', quantity: 'factor' }, { label: 'R_Tm', quantity: 'thermalResistance' }],
    rows: c.paths.map((p): ReportCell[] => [p.sections.join(' / '), factor(p.fraction), resistance(p.totalResistance)]),
  };
  return [
    {
      id: 'bridged-layers',
      heading: 'Bridged layers: ISO 6946 combined method',
      blocks: [
        { kind: 'table', table: sections },
        { kind: 'table', table: paths },
        {
          kind: 'figures',
          figures: [
            { label: "Upper limit R'_T (1/R'_T = Σ f_m/R_Tm)", value: c.upperLimit, quantity: 'thermalResistance' },
            { label: "Lower limit R''_T (layers of λ″ in series)", value: c.lowerLimit, quantity: 'thermalResistance' },
            { label: "Total thermal resistance R_T = (R'_T + R''_T)/2", value: c.totalResistance, quantity: 'thermalResistance' },
            { label: "Largest relative error e = (R'_T − R''_T)/(2·R_T)", value: c.relativeError, quantity: 'fraction' },
          ],
        },
        {
          kind: 'paragraphs',
          paragraphs: [
            `The U-value ${text.figure(1 / c.totalResistance, 'uValue')} is 1/R_T of the combined method; the true value lies between the two limits, so it is known to within e.`,
            'In the temperature solve each bridged layer is one layer carrying the resistance in the table above, so that the element\'s resistances in series add up to R_T. The temperatures are those of this averaged element: across a stud they differ.',
          ],
        },
      ],
    },
  ];
}

/** The corrections section, when a counted layer has air gaps or fasteners. */
export function correctionSections(w: WallResult, text: QuantityText): ReportSection[] {
  const c = w.corrections;
  if (c === null) return [];
  const table: ReportTable = {
    title: CORRECTIONS_TABLE,
    columns: [{ label: 'Layer' }, { label: 'Correction' }, { label: 'ΔU″ or α', quantity: 'factor' }, { label: 'R_1', quantity: 'thermalResistance' }, { label: 'ΔU', quantity: 'uValueUnrounded' }],
    rows: [
      ...c.airGaps.map((g): ReportCell[] => [g.name, `air gaps, level ${g.level}`, factor(g.levelValue), resistance(g.layerResistance), uCell(g.deltaU)]),
      ...c.fasteners.map((f): ReportCell[] => [
        f.name,
        f.applies ? (f.alpha < 0.8 ? 'fasteners, recessed (α = 0.8·d_1/d_0)' : 'fasteners through the layer (α = 0.8)') : 'fasteners of low conductivity (below the threshold): no correction',
        factor(f.alpha),
        resistance(f.layerResistance),
        uCell(f.deltaU),
      ]),
      ['total ΔU', '', factor(null), resistance(null), uCell(c.total)],
    ],
  };
  return [
    {
      id: 'u-corrections',
      heading: 'Corrections to the U-value for air gaps and fasteners',
      blocks: [
        { kind: 'table', table },
        {
          kind: 'figures',
          figures: [
            { label: 'R_T,h: total resistance ignoring thermal bridging', value: c.resistanceIgnoringBridges, quantity: 'thermalResistance' },
            { label: 'U-value before corrections', value: w.uValue, quantity: 'uValueUnrounded' },
            { label: 'Corrected U-value U_c = U + ΔU', value: w.correctedUValue, quantity: 'uValue', note: `unrounded ${text.figure(w.correctedUValue, 'uValueUnrounded')}` },
          ],
        },
        {
          kind: 'paragraphs',
          paragraphs: [
            'ΔU_g = ΔU″·(R_1/R_T,h)² for air gaps and ΔU_f = α·λ_f·n_f·A_f/d_0·(R_1/R_T,h)² for fasteners, R_1 being the resistance of the layer with the gaps or fasteners. Every correction is applied, even where the total is below the 3 % of U the standard lets one leave out.',
          ],
        },
      ],
    },
  ];
}

/** The target-U section, when the case names a target. */
export function targetUSections(a: WallAnalysis, text: QuantityText): ReportSection[] {
  const t = a.targetU;
  if (t === null) return [];
  const table: ReportTable = {
    title: TARGET_TABLE,
    columns: [{ label: `Thickness of ${t.layerName}`, quantity: 'thickness' }, { label: 'U', quantity: 'uValueUnrounded' }, { label: 'U with corrections', quantity: 'uValueUnrounded' }, { label: 'Meets the target' }],
    rows: t.rows.map((r): ReportCell[] => [
      { value: r.thickness, quantity: 'thickness' },
      uCell(r.uValue),
      uCell(r.correctedUValue),
      r === t.chosen ? 'yes: chosen' : r.meetsTarget ? 'yes' : 'no',
    ]),
  };
  const thinnest = t.rows[0]!;
  const reason = t.chosen
    ? t.chosen === thinnest
      ? `${text.figure(t.chosen.thickness, 'thickness')} is the thinnest thickness of the series and already gives U = ${text.figure(t.chosen.correctedUValue, 'uValueUnrounded')}, at or below the target ${text.figure(t.target, 'uValueUnrounded')}; a thinner layer might do as well.`
      : `${text.figure(t.chosen.thickness, 'thickness')} is the thinnest thickness of the series that brings U to ${text.figure(t.chosen.correctedUValue, 'uValueUnrounded')}, at or below the target ${text.figure(t.target, 'uValueUnrounded')}; the next thinner, ${text.figure(t.rows[t.rows.indexOf(t.chosen) - 1]!.thickness, 'thickness')}, gives ${text.figure(t.rows[t.rows.indexOf(t.chosen) - 1]!.correctedUValue, 'uValueUnrounded')}.`
    : `No thickness of the series reaches the target ${text.figure(t.target, 'uValueUnrounded')}: the thickest, ${text.figure(t.rows[t.rows.length - 1]!.thickness, 'thickness')}, gives ${text.figure(t.rows[t.rows.length - 1]!.correctedUValue, 'uValueUnrounded')}, ${text.figure(t.shortfall!, 'uValueUnrounded')} too high.`;
  return [
    {
      id: 'target-u',
      heading: 'Insulation thickness for the target U-value',
      blocks: [
        {
          kind: 'figures',
          figures: [
            { label: 'Target U-value', value: t.target, quantity: 'uValueUnrounded' },
            { label: `Chosen thickness of ${t.layerName}`, value: t.chosen?.thickness ?? null, quantity: 'thickness', note: t.chosen ? 'the thinnest of the series that meets the target' : 'none of the series meets the target' },
            { label: 'Thickness in the case as given', value: t.givenThickness, quantity: 'thickness' },
          ],
        },
        { kind: 'paragraphs', paragraphs: [reason, 'The rest of this report is for the thickness the case gives; the series changes that one layer alone and compares the unrounded U, corrections included, with the target.'] },
        { kind: 'table', table },
        {
          kind: 'chart',
          chart: {
            title: 'U-value against thickness',
            x: { label: `thickness of ${t.layerName}`, quantity: 'thickness' },
            y: { label: 'U-value with corrections', quantity: 'uValueUnrounded' },
            series: [
              { name: 'U-value', points: t.rows.map((r) => [r.thickness, r.correctedUValue] as const) },
              { name: 'target', points: [[thinnest.thickness, t.target], [t.rows[t.rows.length - 1]!.thickness, t.target]], reference: true },
            ],
            tabulatedIn: TARGET_TABLE,
          },
        },
      ],
    },
  ];
}

export function bridgingAssumptions(input: WallInput, w: WallResult, text: QuantityText): string[] {
  const bridged = w.combinedMethod !== null;
  const several = w.layers.filter((l) => l.included && l.bridged).length > 1;
  const slightly = w.ventilation.rule === 'slightly-ventilated';
  const corrected = w.corrections !== null;
  const recessedClamp = w.corrections?.fasteners.some((f) => {
    const given = input.layers[f.index]!;
    return !isAirLayer(given) && given.fasteners?.lengthInLayer !== undefined && given.fasteners.lengthInLayer > f.lengthInLayer;
  });
  return [
    ...(bridged
      ? [
          `Bridged layers by the ISO 6946 combined method, every conductivity read at ${text.figure(10, 'temperature')}; in the temperature solve each bridged layer is one homogeneous layer carrying its share of R_T, so the temperatures are those of an averaged element, not of the path through a stud or through the infill (our modelling choice).`,
          ...(several ? ["With more than one bridged layer the upper limit takes the sections of each layer independently of the others (battens across studs), and the bridged layers share the gap between R''_T and R_T in proportion to their lower-limit resistances (our modelling choices)."] : []),
          ...(slightly ? ['The combined method is taken for the element with its slightly ventilated air layer unventilated; the ventilation weighting then applies to the bridged layers\' equivalent resistances (our modelling choice).'] : []),
          'A bridged layer resists vapour as its own material (the infill) does: the moisture checks follow the path through the insulation between the bridges, where condensation would gather (our choice).',
          'A bridged layer stores heat as its sections do side by side (area-weighted density and heat capacity) in the dynamic characteristics (our choice).',
        ]
      : []),
    ...(corrected ? ['Air-gap and fastener corrections (ISO 6946 Annex F) raise the U-value only; the heat flows, temperatures and moisture checks are those of the element without them.'] : []),
    ...(recessedClamp ? ['A recessed fastener longer than the layer is taken as crossing the whole layer.'] : []),
  ];
}

export function bridgingSources(w: WallResult, a: WallAnalysis): string[] {
  return [
    ...(w.combinedMethod !== null ? ["Bridged layers: EN ISO 6946:2017 §6.7, upper and lower limits of the total thermal resistance (combined method); formulas from memory."] : []),
    ...(w.corrections !== null ? ['Corrections for air gaps and mechanical fasteners: EN ISO 6946:2017 Annex F; ΔU″ levels and α from memory.'] : []),
    ...(a.targetU !== null ? ['Thickness for the target U-value: the same ISO 6946 calculation repeated for each thickness of the series.'] : []),
  ];
}
