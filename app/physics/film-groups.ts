/**
 * The dimensionless groups of external convection, with air properties taken at the film
 * temperature (θ_s + θ_a)/2 and β = 1/T_f (ideal gas), as the correlations assume.
 */
import { airPropertiesAt, type AirProperties } from './air-properties.js';
import { GRAVITY } from './constants.js';
import { requireCelsius, requireNonNegative, requirePositive } from './input-checks.js';

export interface SurfaceAndAir {
  /** °C */
  readonly surfaceTemperature: number;
  /** °C */
  readonly airTemperature: number;
}

export interface NaturalGroups {
  readonly properties: AirProperties;
  readonly filmTemperature: number;
  /** |θ_s − θ_a|, K */
  readonly temperatureDifference: number;
  readonly grashof: number;
  readonly rayleigh: number;
}

export interface ForcedGroups {
  readonly properties: AirProperties;
  readonly filmTemperature: number;
  readonly reynolds: number;
}

function filmProperties(condition: SurfaceAndAir): { properties: AirProperties; filmTemperature: number } {
  const surface = requireCelsius('surfaceTemperature', condition.surfaceTemperature);
  const air = requireCelsius('airTemperature', condition.airTemperature);
  const filmTemperature = (surface + air) / 2;
  return { properties: airPropertiesAt(filmTemperature), filmTemperature };
}

/** Ra_L = g β |ΔT| L³ / (ν α) and Gr_L = Ra_L / Pr for length L (m). */
export function naturalConvectionGroups(condition: SurfaceAndAir, length: number, lengthField = 'length'): NaturalGroups {
  const L = requirePositive(lengthField, length, 'm');
  const { properties, filmTemperature } = filmProperties(condition);
  const temperatureDifference = Math.abs(condition.surfaceTemperature - condition.airTemperature);
  const rayleigh =
    (GRAVITY * properties.expansionCoefficient * temperatureDifference * L ** 3) /
    (properties.kinematicViscosity * properties.thermalDiffusivity);
  return { properties, filmTemperature, temperatureDifference, rayleigh, grashof: rayleigh / properties.prandtl };
}

/** Re_L = v L / ν for air speed v (m/s) and length L (m). */
export function forcedConvectionGroups(
  condition: SurfaceAndAir,
  length: number,
  windSpeed: number,
  lengthField = 'length',
): ForcedGroups {
  const L = requirePositive(lengthField, length, 'm');
  const v = requireNonNegative('windSpeed', windSpeed, 'm/s');
  const { properties, filmTemperature } = filmProperties(condition);
  return { properties, filmTemperature, reynolds: (v * L) / properties.kinematicViscosity };
}
