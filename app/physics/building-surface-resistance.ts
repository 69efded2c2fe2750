/**
 * Surface resistances of building elements (ISO 6946): the conventional table values, and the
 * basis they come from, R_s = 1/(h_c + ε·h_r0) with h_r0 = 4σT_m³, for non-standard conditions
 * (low-emissivity surfaces, other wind speeds). Table and basis are data with their labels
 * (data/physics/iso6946-surface-resistances.json).
 */
import table from '../../data/physics/iso6946-surface-resistances.json' with { type: 'json' };
import { HEAT_FLOW_DIRECTIONS, type HeatFlowDirection } from './heat-flow-direction.js';
import { requireInRange, requireNonNegative, requireOneOf } from './input-checks.js';
import { blackBodyRadiationCoefficient } from './radiation.js';

export interface SurfaceResistancePair {
  /** R_si, m²·K/W */
  readonly inside: number;
  /** R_se, m²·K/W */
  readonly outside: number;
}

export const SURFACE_RESISTANCE_SOURCE: string = table.source;
export const SURFACE_RESISTANCE_BASIS = table.basis;

/** The conventional R_si and R_se for the heat-flow direction (ISO 6946 table). */
export function standardSurfaceResistances(direction: HeatFlowDirection): SurfaceResistancePair {
  const d = requireOneOf('direction', direction, HEAT_FLOW_DIRECTIONS);
  const row = table.resistances.rows.find((r) => r.direction === d)!;
  return { inside: row.inside, outside: row.outside };
}

export interface SurfaceResistanceBasisInput {
  /** h_c, W/(m²·K) ≥ 0 */
  readonly convection: number;
  /** Surface emissivity 0..1 (the surroundings taken as black, as in the standard's basis). */
  readonly emissivity: number;
  /** θ_m in °C, the mean of surface and surroundings. */
  readonly meanTemperature: number;
}

/** R_s = 1/(h_c + ε·4σT_m³), m²·K/W. */
export function surfaceResistanceFromCoefficients(input: SurfaceResistanceBasisInput): number {
  const hc = requireNonNegative('convection', input.convection, 'W/(m²·K)');
  const e = requireInRange('emissivity', input.emissivity, 0, 1);
  const hr = e * blackBodyRadiationCoefficient(input.meanTemperature);
  const total = hc + hr;
  if (total === 0) return Number.POSITIVE_INFINITY;
  return 1 / total;
}

/** Internal convective coefficient h_ci of the standard's basis, W/(m²·K). */
export function internalConvectionCoefficient(direction: HeatFlowDirection): number {
  const d = requireOneOf('direction', direction, HEAT_FLOW_DIRECTIONS);
  return table.basis.internalConvection[d];
}

/** External convective coefficient h_ce = 4 + 4v of the standard's basis, W/(m²·K), for wind v (m/s). */
export function externalConvectionCoefficient(windSpeed: number): number {
  const v = requireNonNegative('windSpeed', windSpeed, 'm/s');
  const c = table.basis.externalConvection;
  return c.constant + c.perWindSpeed * v;
}

/** R_si from the basis with a chosen emissivity (e.g. a low-emissivity lining), θ_m default 20 °C. */
export function insideSurfaceResistance(
  direction: HeatFlowDirection,
  emissivity: number = table.basis.emissivity,
  meanTemperature: number = table.basis.internalMeanTemperature,
): number {
  return surfaceResistanceFromCoefficients({
    convection: internalConvectionCoefficient(direction),
    emissivity,
    meanTemperature,
  });
}

/** R_se from the basis with a chosen wind speed and emissivity, θ_m default 0 °C. */
export function outsideSurfaceResistance(
  windSpeed: number = table.basis.externalWindSpeed,
  emissivity: number = table.basis.emissivity,
  meanTemperature: number = table.basis.externalMeanTemperature,
): number {
  return surfaceResistanceFromCoefficients({
    convection: externalConvectionCoefficient(windSpeed),
    emissivity,
    meanTemperature,
  });
}
