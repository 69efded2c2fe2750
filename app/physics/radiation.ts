/**
 * Linearised long-wave radiation between a small grey surface and large surroundings:
 * q = h_r (θ_s − θ_r) with h_r = ε σ (T_s² + T_r²)(T_s + T_r) = ε σ (T_s⁴ − T_r⁴)/(T_s − T_r),
 * exact (not a small-difference approximation) and finite when T_s = T_r.
 * Temperatures in °C at the API, kelvin inside.
 */
import { STEFAN_BOLTZMANN, toKelvin } from './constants.js';
import { requireCelsius, requireInRange } from './input-checks.js';

/** h_r in W/(m²·K) for emissivity ε (0..1), surface θ_s and surroundings θ_r in °C. */
export function radiationCoefficient(emissivity: number, surfaceTemperature: number, surroundingsTemperature: number): number {
  const e = requireInRange('emissivity', emissivity, 0, 1);
  const Ts = toKelvin(requireCelsius('surfaceTemperature', surfaceTemperature));
  const Tr = toKelvin(requireCelsius('surroundingsTemperature', surroundingsTemperature));
  return e * STEFAN_BOLTZMANN * (Ts * Ts + Tr * Tr) * (Ts + Tr);
}

/**
 * Black-body coefficient h_r0 = 4 σ T_m³ at the mean temperature θ_m (°C): the small-difference
 * form ISO 6946 uses for surfaces and air layers.
 */
export function blackBodyRadiationCoefficient(meanTemperature: number): number {
  const T = toKelvin(requireCelsius('meanTemperature', meanTemperature));
  return 4 * STEFAN_BOLTZMANN * T ** 3;
}
