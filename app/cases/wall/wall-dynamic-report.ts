/**
 * The wall report's part on the dynamic thermal characteristics (ISO 13786, 24 h cycle): a small
 * table of the periodic thermal transmittance and the two admittances with their time shifts, the
 * decrement factor and the areal heat capacities beside it, and the sentences for the report's
 * assumptions and sources. A pure function of the wall input and its result.
 */
import type { QuantityText } from '../../base/quantity-text.js';
import type { ReportSection, ReportTable } from '../../report/report-model.js';
import { layersLackingHeatCapacity } from './wall-dynamic.js';
import type { WallInput } from './wall-input.js';
import type { WallResult } from './wall-result.js';

export const DYNAMIC_TABLE = 'Dynamic thermal characteristics (ISO 13786, 24 h cycle)';

/** The section, or none when the characteristics could not be computed (the assumptions say why). */
export function dynamicSections(wall: WallResult, text: QuantityText): ReportSection[] {
  const d = wall.dynamic;
  if (d === null) return [];
  const row = (label: string, figure: { amplitude: number; timeShift: number }) => [
    label,
    { value: figure.amplitude, quantity: 'thermalAdmittance' as const },
    { value: figure.timeShift, quantity: 'timeHours' as const },
  ];
  const table: ReportTable = {
    title: DYNAMIC_TABLE,
    columns: [{ label: 'Characteristic' }, { label: 'Amplitude', quantity: 'thermalAdmittance' }, { label: 'Time shift', quantity: 'timeHours' }],
    rows: [
      row('periodic thermal transmittance Y_ie', d.periodicTransmittance),
      row('inside thermal admittance Y_ii', d.insideAdmittance),
      row('outside thermal admittance Y_ee', d.outsideAdmittance),
    ],
  };
  // The transmittance's shift is a delay for any real wall (negative); said as a delay in words.
  const shift = d.periodicTransmittance.timeShift;
  const timing = shift <= 0 ? `${text.figure(-shift, 'timeHours')} after` : `${text.figure(shift, 'timeHours')} before`;
  return [
    {
      id: 'dynamic',
      heading: 'Dynamic thermal characteristics for a daily cycle',
      blocks: [
        { kind: 'table', table },
        {
          kind: 'figures',
          figures: [
            { label: 'Decrement factor f = |Y_ie|/U', value: d.decrementFactor, quantity: 'decrementFactor' },
            { label: 'Inside areal heat capacity κ_1', value: d.insideArealHeatCapacity, quantity: 'arealHeatCapacity' },
            { label: 'Outside areal heat capacity κ_2', value: d.outsideArealHeatCapacity, quantity: 'arealHeatCapacity' },
          ],
        },
        {
          kind: 'paragraphs',
          paragraphs: [
            `Under a daily swing of the outside air temperature, the heat flow into the inside swings by f = ${text.figure(d.decrementFactor, 'decrementFactor')} times what the U-value gives for a steady difference of the same size, and peaks ${timing} the outside temperature does.`,
            'A negative time shift is a delay: the heat flow peaks after the temperature that drives it; a positive one, as for the admittances, is an advance.',
          ],
        },
      ],
    },
  ];
}

/** The assumption the characteristics rest on, or the sentence saying which layers prevented them. */
export function dynamicAssumptions(input: WallInput, wall: WallResult): string[] {
  if (wall.dynamic !== null) {
    return [
      'Only the dynamic thermal characteristics (ISO 13786) count the heat stored in the layers: for a sinusoidal 24 h cycle, each layer homogeneous with its conductivity at the design condition, air layers and surfaces as pure resistances, the same surface resistances as the U-value.',
    ];
  }
  const missing = layersLackingHeatCapacity(input, wall.layers).map((l) => `layer "${l.name}" has no ${l.missing}`);
  const listed = missing.length === 1 ? missing[0]! : `${missing.slice(0, -1).join(', ')} and ${missing.at(-1)!}`;
  return [`The dynamic thermal characteristics (ISO 13786) are not given: ${listed}; the periodic calculation needs both for every layer but an air layer.`];
}

export function dynamicSources(wall: WallResult): string[] {
  return wall.dynamic === null ? [] : ['Dynamic thermal characteristics: ISO 13786:2017, heat transfer matrix method for plane layers, period 24 h.'];
}
