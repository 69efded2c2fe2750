/**
 * Forced convection on a cylinder in cross-flow (wind across a pipe). Churchill & Bernstein (1977),
 * as given in Incropera & DeWitt, Fundamentals of Heat and Mass Transfer; valid for Re_D·Pr > 0.2.
 */
import { formatGroup, type ConvectionResult, type NusseltEstimate } from './convection-result.js';
import { forcedConvectionGroups, type SurfaceAndAir } from './film-groups.js';

/** Nu_D = 0.3 + 0.62 Re^½ Pr^⅓ / [1 + (0.4/Pr)^⅔]^¼ · [1 + (Re/282 000)^(5/8)]^(4/5). */
export function cylinderCrossFlowNusselt(reynolds: number, prandtl: number): NusseltEstimate {
  const warnings: string[] = [];
  if (reynolds * prandtl <= 0.2) {
    warnings.push(
      `Cylinder in cross-flow: Re_D·Pr = ${formatGroup(reynolds * prandtl)} is below the correlation's range (Re_D·Pr > 0.2).`,
    );
  }
  const nusselt =
    0.3 +
    ((0.62 * reynolds ** 0.5 * prandtl ** (1 / 3)) / (1 + (0.4 / prandtl) ** (2 / 3)) ** 0.25) *
      (1 + (reynolds / 282000) ** (5 / 8)) ** (4 / 5);
  return { nusselt, warnings };
}

export interface CylinderCrossFlowInput extends SurfaceAndAir {
  /** Outer diameter, m */
  readonly diameter: number;
  /** Air speed across the cylinder, m/s */
  readonly windSpeed: number;
}

/** h_c of a cylinder with air flowing across it. */
export function forcedConvectionCylinder(input: CylinderCrossFlowInput): ConvectionResult {
  const groups = forcedConvectionGroups(input, input.diameter, input.windSpeed, 'diameter');
  const { properties, reynolds } = groups;
  const estimate = cylinderCrossFlowNusselt(reynolds, properties.prandtl);
  return {
    coefficient: (estimate.nusselt * properties.conductivity) / input.diameter,
    nusselt: estimate.nusselt,
    reynolds,
    prandtl: properties.prandtl,
    characteristicLength: input.diameter,
    filmTemperature: groups.filmTemperature,
    correlation: 'Churchill–Bernstein, cylinder in cross-flow',
    warnings: [...properties.warnings, ...estimate.warnings],
  };
}
