/**
 * Moist-air relations at a point: vapour pressure, relative humidity, dew point and vapour
 * concentration. Relative humidity is a fraction 0..1 in the API (0.5 = 50 %).
 */
import { toKelvin, WATER_VAPOUR_GAS_CONSTANT } from './constants.js';
import { InputError } from './errors.js';
import { requireCelsius, requireFinite, requireNonNegative } from './input-checks.js';
import { saturationPressure, saturationTemperature, type SaturationOptions } from './saturation-pressure.js';

function requireRelativeHumidity(value: unknown, allowZero: boolean): number {
  const rh = requireFinite('relativeHumidity', value, 'fraction');
  if (rh > 1 || rh < 0 || (!allowZero && rh === 0)) {
    const range = allowZero ? 'from 0 to 1 (0 to 100 %)' : 'above 0 and at most 1 (above 0 up to 100 %)';
    throw new InputError('relativeHumidity', `relativeHumidity must be a fraction ${range} (got ${rh}).`);
  }
  return rh;
}

/** p = φ·p_sat(θ), Pa, for relative humidity φ (0..1) at θ (°C). */
export function vapourPressure(celsius: number, relativeHumidity: number, options?: SaturationOptions): number {
  const rh = requireRelativeHumidity(relativeHumidity, true);
  return rh * saturationPressure(celsius, options);
}

/** φ = p/p_sat(θ) as a fraction; above 1 means the vapour pressure exceeds saturation at θ. */
export function relativeHumidity(celsius: number, pressure: number, options?: SaturationOptions): number {
  const p = requireNonNegative('vapourPressure', pressure, 'Pa');
  return p / saturationPressure(celsius, options);
}

/** Dew point (frost point below 0 °C with the default phase), °C, of air at θ (°C) and φ (0 < φ ≤ 1). */
export function dewPoint(celsius: number, relativeHumidity: number, options?: SaturationOptions): number {
  const rh = requireRelativeHumidity(relativeHumidity, false);
  return saturationTemperature(rh * saturationPressure(celsius, options), options);
}

/** Vapour concentration (absolute humidity) ν = p/(R_v·T), kg/m³, for p in Pa at θ in °C. */
export function vapourConcentration(pressure: number, celsius: number): number {
  const p = requireNonNegative('vapourPressure', pressure, 'Pa');
  return p / (WATER_VAPOUR_GAS_CONSTANT * toKelvin(requireCelsius('temperature', celsius)));
}

/** Vapour pressure p = ν·R_v·T, Pa, for a vapour concentration ν in kg/m³ at θ in °C. */
export function vapourPressureFromConcentration(concentration: number, celsius: number): number {
  const nu = requireNonNegative('vapourConcentration', concentration, 'kg/m³');
  return nu * WATER_VAPOUR_GAS_CONSTANT * toKelvin(requireCelsius('temperature', celsius));
}
