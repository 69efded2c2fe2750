/**
 * Natural convection from a long horizontal cylinder (a horizontal pipe) in still air.
 * Churchill & Chu (1975), as given in Incropera & DeWitt, Fundamentals of Heat and Mass Transfer.
 */
import { formatGroup, type ConvectionResult, type NusseltEstimate } from './convection-result.js';
import { naturalConvectionGroups, type SurfaceAndAir } from './film-groups.js';

/** Upper Rayleigh limit of the correlation. */
export const HORIZONTAL_CYLINDER_MAX_RAYLEIGH = 1e12;
/** Upper Rayleigh limit of the laminar variant. */
export const HORIZONTAL_CYLINDER_LAMINAR_MAX_RAYLEIGH = 1e9;

/** Nu_D = {0.60 + 0.387 Ra^(1/6) / [1 + (0.559/Pr)^(9/16)]^(8/27)}², for Ra_D ≤ 10¹². */
export function horizontalCylinderNusselt(rayleigh: number, prandtl: number): NusseltEstimate {
  const shape = (1 + (0.559 / prandtl) ** (9 / 16)) ** (8 / 27);
  const nusselt = (0.6 + (0.387 * rayleigh ** (1 / 6)) / shape) ** 2;
  const warnings: string[] = [];
  if (rayleigh > HORIZONTAL_CYLINDER_MAX_RAYLEIGH) {
    warnings.push(
      `Horizontal-cylinder natural convection: Ra_D = ${formatGroup(rayleigh)} is above the correlation's range (Ra_D ≤ 1e12).`,
    );
  }
  return { nusselt, warnings };
}

/** Laminar variant Nu_D = 0.36 + 0.518 Ra^¼ / [1 + (0.559/Pr)^(9/16)]^(4/9), for Ra_D < 10⁹. */
export function horizontalCylinderNusseltLaminar(rayleigh: number, prandtl: number): NusseltEstimate {
  const shape = (1 + (0.559 / prandtl) ** (9 / 16)) ** (4 / 9);
  const nusselt = 0.36 + (0.518 * rayleigh ** 0.25) / shape;
  const warnings: string[] = [];
  if (rayleigh >= HORIZONTAL_CYLINDER_LAMINAR_MAX_RAYLEIGH) {
    warnings.push(
      `Horizontal-cylinder laminar natural convection: Ra_D = ${formatGroup(rayleigh)} is above the laminar range (Ra_D < 1e9).`,
    );
  }
  return { nusselt, warnings };
}

export interface HorizontalCylinderInput extends SurfaceAndAir {
  /** Outer diameter, m */
  readonly diameter: number;
}

/**
 * h_c of a horizontal cylinder in still air. Uses the all-range form: it is continuous in the
 * surface temperature, which the surface-temperature iteration of the solver needs.
 */
export function naturalConvectionHorizontalCylinder(input: HorizontalCylinderInput): ConvectionResult {
  const groups = naturalConvectionGroups(input, input.diameter, 'diameter');
  const { properties, rayleigh } = groups;
  const estimate = horizontalCylinderNusselt(rayleigh, properties.prandtl);
  return {
    coefficient: (estimate.nusselt * properties.conductivity) / input.diameter,
    nusselt: estimate.nusselt,
    rayleigh,
    prandtl: properties.prandtl,
    characteristicLength: input.diameter,
    filmTemperature: groups.filmTemperature,
    correlation: 'Churchill–Chu, horizontal cylinder, natural convection',
    warnings: [...properties.warnings, ...estimate.warnings],
  };
}
