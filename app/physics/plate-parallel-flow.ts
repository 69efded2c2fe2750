/**
 * Forced convection along a flat plate (wind along a wall or roof), average over the length L in
 * the flow direction. Incropera & DeWitt, Fundamentals of Heat and Mass Transfer: laminar
 * Nu = 0.664 Re^½ Pr^⅓ up to the transition Reynolds number 5·10⁵; mixed laminar–turbulent
 * Nu = (0.037 Re^0.8 − 871) Pr^⅓ for 5·10⁵ < Re ≤ 10⁸, 0.6 ≤ Pr ≤ 60. The two meet at the
 * transition, so the coefficient is continuous in the wind speed.
 */
import { formatGroup, type ConvectionResult, type NusseltEstimate } from './convection-result.js';
import { forcedConvectionGroups, type SurfaceAndAir } from './film-groups.js';

export const PLATE_TRANSITION_REYNOLDS = 5e5;
export const PLATE_MAX_REYNOLDS = 1e8;

export function plateParallelFlowNusselt(reynolds: number, prandtl: number): NusseltEstimate {
  const warnings: string[] = [];
  if (prandtl < 0.6 || prandtl > 60) {
    warnings.push(`Plate in parallel flow: Pr = ${prandtl.toPrecision(3)} is outside the correlation's range (0.6 to 60).`);
  }
  if (reynolds > PLATE_MAX_REYNOLDS) {
    warnings.push(`Plate in parallel flow: Re_L = ${formatGroup(reynolds)} is above the correlation's range (Re_L ≤ 1e8).`);
  }
  const nusselt =
    reynolds <= PLATE_TRANSITION_REYNOLDS
      ? 0.664 * reynolds ** 0.5 * prandtl ** (1 / 3)
      : (0.037 * reynolds ** 0.8 - 871) * prandtl ** (1 / 3);
  return { nusselt, warnings };
}

export interface PlateParallelFlowInput extends SurfaceAndAir {
  /** Plate length in the flow direction, m */
  readonly length: number;
  /** Air speed along the plate, m/s */
  readonly windSpeed: number;
}

/** h_c of a plate with air flowing along it. */
export function forcedConvectionPlate(input: PlateParallelFlowInput): ConvectionResult {
  const groups = forcedConvectionGroups(input, input.length, input.windSpeed, 'length');
  const { properties, reynolds } = groups;
  const estimate = plateParallelFlowNusselt(reynolds, properties.prandtl);
  return {
    coefficient: (estimate.nusselt * properties.conductivity) / input.length,
    nusselt: estimate.nusselt,
    reynolds,
    prandtl: properties.prandtl,
    characteristicLength: input.length,
    filmTemperature: groups.filmTemperature,
    correlation:
      reynolds <= PLATE_TRANSITION_REYNOLDS
        ? 'flat plate in parallel flow, laminar'
        : 'flat plate in parallel flow, mixed laminar–turbulent',
    warnings: [...properties.warnings, ...estimate.warnings],
  };
}
