/**
 * The ranges of the numbers of a case file's "sizing" block, in SI (temperatures °C, times s), each
 * with its quantity kind so a refusal reads in a project's units. The sizing parser
 * (sizing-options.ts), the JSON Schemas in data/schemas and the case editor's sizing panel state
 * the same bounds. Values are common practice, no source: wide enough for any real design, narrow
 * enough to catch a unit slip (a margin typed in °F, hours typed as seconds).
 */
import type { NumberRange } from '../../base/number-range.js';
import { QUANTITY_RANGES } from '../../base/quantity-ranges.js';

/** Thicknesses one sizing tries at most: a product family has a dozen; 40 leaves room for a fine range and bounds the work. */
export const MAX_SERIES_THICKNESSES = 40;

/** Longest product family name accepted. */
export const MAX_FAMILY_NAME_LENGTH = 200;

/**
 * A minute to 366 days, the longest the freeze simulation runs (freeze-input.ts LONGEST_MAX_TIME):
 * times before stagnant water reaches 0 °C or a part of it has frozen.
 */
const FREEZE_TIME: NumberRange = { min: 60, max: 366 * 24 * 3600, unit: 's', quantity: 'timeHours' };

export const SIZING_RANGES = {
  /** Each thickness of a series, as an insulation layer may be. */
  thickness: QUANTITY_RANGES.insulationThickness,
  /** Step of a range series: the same range (a micrometre to 2 m). */
  step: QUANTITY_RANGES.insulationThickness,
  /** The hottest the surface may be: the case's touch limit range. */
  surfaceTemperatureLimit: { min: 0, max: 100, unit: '°C', quantity: 'temperature' },
  /** Kelvin above the dew point the surface must stay; 20 K is beyond any design margin. */
  condensationMargin: { min: 0, max: 20, unit: 'K', quantity: 'temperatureDifference' },
  heatLossPerMetre: { min: 0, minExclusive: true, max: 1e5, unit: 'W/m', quantity: 'heatFlowPerLength' },
  heatLossPerSquareMetre: { min: 0, minExclusive: true, max: 1e5, unit: 'W/m²', quantity: 'heatFlux' },
  /** Mass flow of the fluid in the run: a trickle to a large district-heating main. */
  massFlow: { min: 0, minExclusive: true, max: 1e4, unit: 'kg/s', quantity: 'massFlow' },
  specificHeat: QUANTITY_RANGES.specificHeat,
  /** The most the fluid may change temperature along the run. */
  temperatureDropLimit: { min: 0, minExclusive: true, max: 500, unit: 'K', quantity: 'fluidTemperatureChange' },
  /**
   * Water when the flow stops: at least 0.5 °C, above the narrow range over which the freeze model
   * spreads the latent heat (0 °C ± 0.25 K, freeze-contents.ts), so it starts liquid; at most boiling.
   */
  freezeInitialTemperature: { min: 0.5, max: 100, unit: '°C', quantity: 'temperature' },
  /** Air while the water stands: at most 0 °C (warmer air never freezes it) down to an arctic night. */
  freezeAirTemperature: { min: -80, max: 0, unit: '°C', quantity: 'temperature' },
  freezeWindSpeed: { min: 0, max: 60, unit: 'm/s', quantity: 'windSpeed' },
  minTimeToZero: FREEZE_TIME,
  /** The part of the water that may freeze, above 0 and at most all of it. */
  freezeFraction: { min: 0, minExclusive: true, max: 1, unit: '', quantity: 'fraction' },
  minTimeToFraction: FREEZE_TIME,
} as const satisfies Record<string, NumberRange>;
