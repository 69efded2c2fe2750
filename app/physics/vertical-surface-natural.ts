/**
 * Natural convection on a vertical plate, and on a vertical cylinder treated as a plate of the same
 * height. Churchill & Chu (1975), as given in Incropera & DeWitt, Fundamentals of Heat and Mass
 * Transfer; the thick-cylinder criterion D/L ≥ 35/Gr_L^¼ from the same text.
 */
import { formatGroup, type ConvectionResult, type NusseltEstimate } from './convection-result.js';
import { naturalConvectionGroups, type SurfaceAndAir } from './film-groups.js';
import { requirePositive } from './input-checks.js';

/** Upper Rayleigh limit of the laminar variant. */
export const VERTICAL_PLATE_LAMINAR_MAX_RAYLEIGH = 1e9;

/** Nu_L = {0.825 + 0.387 Ra^(1/6) / [1 + (0.492/Pr)^(9/16)]^(8/27)}², the whole range of Ra_L. */
export function verticalPlateNusselt(rayleigh: number, prandtl: number): NusseltEstimate {
  const shape = (1 + (0.492 / prandtl) ** (9 / 16)) ** (8 / 27);
  return { nusselt: (0.825 + (0.387 * rayleigh ** (1 / 6)) / shape) ** 2, warnings: [] };
}

/** Laminar variant Nu_L = 0.68 + 0.670 Ra^¼ / [1 + (0.492/Pr)^(9/16)]^(4/9), for Ra_L ≤ 10⁹. */
export function verticalPlateNusseltLaminar(rayleigh: number, prandtl: number): NusseltEstimate {
  const shape = (1 + (0.492 / prandtl) ** (9 / 16)) ** (4 / 9);
  const warnings: string[] = [];
  if (rayleigh > VERTICAL_PLATE_LAMINAR_MAX_RAYLEIGH) {
    warnings.push(
      `Vertical-plate laminar natural convection: Ra_L = ${formatGroup(rayleigh)} is above the laminar range (Ra_L ≤ 1e9).`,
    );
  }
  return { nusselt: 0.68 + (0.67 * rayleigh ** 0.25) / shape, warnings };
}

export interface VerticalSurfaceInput extends SurfaceAndAir {
  /** Height, m */
  readonly height: number;
  /** Outer diameter of a vertical cylinder, m; omit for a plate. */
  readonly diameter?: number;
}

/**
 * h_c of a vertical plate or cylinder in still air (all-range form, continuous in the surface
 * temperature). For a cylinder, warns when it is too slender for the plate result to hold.
 */
export function naturalConvectionVerticalSurface(input: VerticalSurfaceInput): ConvectionResult {
  const groups = naturalConvectionGroups(input, input.height, 'height');
  const { properties, rayleigh, grashof } = groups;
  const estimate = verticalPlateNusselt(rayleigh, properties.prandtl);
  const warnings = [...properties.warnings, ...estimate.warnings];
  if (input.diameter !== undefined) {
    const diameter = requirePositive('diameter', input.diameter, 'm');
    const smallest = 35 / grashof ** 0.25;
    if (grashof > 0 && diameter / input.height < smallest) {
      warnings.push(
        `Vertical cylinder: D/L = ${(diameter / input.height).toPrecision(3)} is below 35/Gr_L^¼ = ${smallest.toPrecision(3)}, so the plate correlation underestimates the coefficient of this slender cylinder.`,
      );
    }
  }
  return {
    coefficient: (estimate.nusselt * properties.conductivity) / input.height,
    nusselt: estimate.nusselt,
    rayleigh,
    prandtl: properties.prandtl,
    characteristicLength: input.height,
    filmTemperature: groups.filmTemperature,
    correlation:
      input.diameter === undefined
        ? 'Churchill–Chu, vertical plate, natural convection'
        : 'Churchill–Chu, vertical cylinder as a plate, natural convection',
    warnings,
  };
}
