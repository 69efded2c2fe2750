/**
 * The boxes of the sizing panel: the range of thicknesses to try, each criterion's values and the
 * economics, each a field of the case file's "sizing" block with its quantity (which decides the
 * unit shown), its allowed range in SI and the value it starts from (sizing-block). The ranges are
 * those the engine's parser of the block accepts; a value outside one is refused by the engine in
 * one sentence, shown beside its box as every other refusal of the editor is.
 */
import type { NumberRange } from '../../../app/base/number-range.js';
import type { QuantityName } from '../../../app/base/quantities.js';
import { ECONOMICS_RANGES as E, ECONOMICS_YEARS, MAX_CURRENCY_LENGTH, MAX_EMISSION_SOURCE_LENGTH } from '../../../app/cases/sizing/sizing-economics-checks.js';
import { SIZING_RANGES as R } from '../../../app/cases/sizing/sizing-ranges.js';
import type { SizingCriterionName } from '../../../app/cases/sizing/sizing-model.js';
import type { CaseKindName, FormField, NumberField, TextField } from './case-form-fields.js';
import { hintValue } from './field-text.js';
import type { Json } from './case-paths.js';
import { criterionOn, ECONOMICS_START, economicsOn, seriesChoice, sizingBlock } from './sizing-block.js';

const S = 'sizing';
const number = (path: string, label: string, quantity: QuantityName, r: NumberRange, initial: number, extra: Partial<NumberField> = {}): NumberField => ({
  type: 'number',
  path: `${S}.${path}`,
  label,
  quantity,
  range: r,
  initial,
  ...extra,
});
const text = (path: string, label: string, maxLength: number): TextField => ({ type: 'text', path: `${S}.${path}`, label, maxLength });

export const RANGE_FIELDS: readonly NumberField[] = [
  number('series.from', 'Thinnest to try', 'thickness', R.thickness, 0.02),
  number('series.to', 'Thickest to try', 'thickness', R.thickness, 0.2),
  number('series.step', 'Step', 'thickness', R.step, 0.01),
];

/** Each criterion's boxes; the heat loss limit is per metre of pipe or per m² of surface. */
export function criterionFields(criterion: SizingCriterionName, kind: CaseKindName): readonly FormField[] {
  const c = `criteria.${criterion}`;
  switch (criterion) {
    case 'maxSurfaceTemperature':
      return [
        number(`${c}.limit`, 'Hottest the surface may be', 'temperature', R.surfaceTemperatureLimit, 60, {
          whenEmpty: (_doc, context) => `the touch limit of the case (${hintValue(60, 'temperature', context.unitSystem ?? 'SI')} unless set under Checks)`,
        }),
      ];
    case 'noCondensation':
      return [number(`${c}.margin`, 'Surface at least this far above the dew point', 'temperatureDifference', R.condensationMargin, 1)];
    case 'maxHeatLoss':
      return kind === 'pipe'
        ? [number(`${c}.limit`, 'Most heat lost (or gained) per length of pipe', 'heatFlowPerLength', R.heatLossPerMetre, 30)]
        : [number(`${c}.limit`, 'Most heat lost (or gained) per area of surface', 'heatFlux', R.heatLossPerSquareMetre, 50)];
    case 'maxTemperatureDrop':
      return [
        number(`${c}.massFlow`, 'Mass flow of the fluid', 'massFlow', R.massFlow, 0.5),
        number(`${c}.specificHeat`, 'Specific heat of the fluid', 'specificHeat', R.specificHeat, 4190),
        number(`${c}.limit`, 'Most the fluid temperature may change along the run', 'fluidTemperatureChange', R.temperatureDropLimit, 2),
      ];
    case 'freezeProtection':
      return [
        number(`${c}.initialTemperature`, 'Water temperature when the flow stops', 'temperature', R.freezeInitialTemperature, 5),
        number(`${c}.airTemperature`, 'Air temperature while it stands', 'temperature', R.freezeAirTemperature, -10),
        number(`${c}.windSpeed`, 'Wind speed while it stands', 'windSpeed', R.freezeWindSpeed, 5),
        number(`${c}.minTimeToZero`, 'Shortest time before the water reaches 0 °C', 'timeHours', R.minTimeToZero, 12 * 3600),
        number(`${c}.fraction`, 'Part of the water that may freeze', 'fraction', R.freezeFraction, 0.25, { whenEmpty: () => 'no limit on freezing' }),
        number(`${c}.minTimeToFraction`, 'Shortest time before that part has frozen', 'timeHours', R.minTimeToFraction, 24 * 3600, {
          whenEmpty: () => 'no limit on freezing',
        }),
      ];
    case 'economic':
      return [];
  }
}

const start = (name: string): number => ECONOMICS_START[name] as number;

export const ECONOMICS_FIELDS: readonly FormField[] = [
  number('economics.energyPrice', 'Energy price per kWh purchased (fuel or electricity)', 'pricePerEnergy', E.energyPrice, start('energyPrice')),
  text('economics.currency', 'Currency', MAX_CURRENCY_LENGTH),
  number('economics.priceEscalation', 'Yearly rise of the energy price', 'ratePerYear', E.priceEscalation, start('priceEscalation')),
  number('economics.generationEfficiency', 'Efficiency of heat generation (or COP of cooling)', 'factor', E.generationEfficiency, start('generationEfficiency')),
  number('economics.discountRate', 'Discount rate', 'ratePerYear', E.discountRate, start('discountRate')),
  number('economics.years', 'Years of service', 'count', { ...ECONOMICS_YEARS, unit: '' }, start('years')),
  number('economics.emissionFactor', 'CO₂ per kWh of fuel or electricity', 'emissionFactor', E.emissionFactor, start('emissionFactor')),
  text('economics.emissionSource', 'Where the CO₂ figure comes from', MAX_EMISSION_SOURCE_LENGTH),
];

/** The paths of every box of the panel the case shows now, for placing the engine's complaints beside them. */
export function sizingPaths(kind: CaseKindName, on: (criterion: SizingCriterionName) => boolean, economics: boolean, range: boolean): string[] {
  const criteria: SizingCriterionName[] = ['maxSurfaceTemperature', 'noCondensation', 'maxHeatLoss', 'maxTemperatureDrop', 'freezeProtection', 'economic'];
  return [
    S,
    `${S}.layer`,
    `${S}.series`,
    `${S}.criteria`,
    ...(range ? RANGE_FIELDS.map((f) => f.path) : []),
    ...criteria.filter(on).flatMap((c) => [`${S}.criteria.${c}`, ...criterionFields(c, kind).map((f) => f.path)]),
    ...(economics ? [`${S}.economics`, `${S}.economics.costTable`, ...ECONOMICS_FIELDS.map((f) => f.path)] : []),
  ];
}

/** The paths of the sizing panel's boxes for the case as it is now (none when sizing is off, or for a wall). */
export function shownSizingPaths(kind: CaseKindName, doc: Json): string[] {
  if (kind === 'wall' || sizingBlock(doc) === undefined) return [];
  return sizingPaths(kind, (c) => criterionOn(doc, c), economicsOn(doc), seriesChoice(doc) === 'range');
}

/** What each criterion's switch says, as a stranger would read it (the sizing panel and the schedule's services). */
export const CRITERION_SWITCHES: Readonly<Record<SizingCriterionName, { readonly label: string; readonly hint: string }>> = {
  maxSurfaceTemperature: { label: 'Safe to touch', hint: 'The outer surface no hotter than a limit (personnel protection).' },
  noCondensation: { label: 'No condensation on the surface', hint: 'The outer surface stays warmer than the dew point of the air by a margin (cold and chilled lines).' },
  maxHeatLoss: { label: 'Heat loss within a limit', hint: 'Heat lost, or gained by a cold line, no more than a limit.' },
  maxTemperatureDrop: { label: 'Fluid temperature kept along the run', hint: 'The fluid cools (or warms) by no more than a limit from one end of the run to the other, at its mass flow.' },
  freezeProtection: { label: 'Water does not freeze too soon', hint: 'With the flow stopped in cold air, the water takes at least a given time to reach 0 °C, and, if given, to freeze in part.' },
  economic: { label: 'Least lifecycle cost', hint: 'The thickness whose installed cost plus the energy lost over the years costs least (needs the costs below).' },
};
