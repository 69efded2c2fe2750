/**
 * Temperature factor at the inside surface and its critical value (ISO 13788, reference notes §4):
 *   f_Rsi = (θ_si − θ_e)/(θ_i − θ_e);
 *   critical: p_sat(θ_si,min) = p_i/φ_limit → θ_si,min → f_Rsi,min = (θ_si,min − θ_e)/(θ_i − θ_e),
 * with φ_limit = 0.8 for mould and 1.0 for surface condensation. Defined only while θ_i > θ_e.
 */
import parameters from '../../data/physics/iso13788-moisture-parameters.json' with { type: 'json' };
import { saturationTemperature } from '../physics/index.js';

/** Surface relative humidity limits (ISO 13788, from memory; data/physics/iso13788-moisture-parameters.json). */
export const MOULD_SURFACE_HUMIDITY_LIMIT: number = parameters.mouldSurfaceHumidityLimit.value;
export const CONDENSATION_SURFACE_HUMIDITY_LIMIT: number = parameters.condensationSurfaceHumidityLimit.value;
/** R_si for opaque elements in the mould and surface-condensation check, m²·K/W (ISO 13788, from memory; same data file). */
export const MOULD_CHECK_INSIDE_SURFACE_RESISTANCE: number = parameters.mouldCheckInsideSurfaceResistance.value;

export function temperatureFactor(insideSurfaceTemperature: number, insideTemperature: number, outsideTemperature: number): number {
  return (insideSurfaceTemperature - outsideTemperature) / (insideTemperature - outsideTemperature);
}

/** θ_si,min, °C: the lowest surface temperature that keeps the surface RH at or below the limit. */
export function minimumSurfaceTemperature(insideVapourPressure: number, surfaceHumidityLimit: number): number {
  return saturationTemperature(insideVapourPressure / surfaceHumidityLimit);
}

export function minimumTemperatureFactor(
  insideVapourPressure: number,
  surfaceHumidityLimit: number,
  insideTemperature: number,
  outsideTemperature: number,
): number {
  return temperatureFactor(minimumSurfaceTemperature(insideVapourPressure, surfaceHumidityLimit), insideTemperature, outsideTemperature);
}
