/**
 * Natural convection on horizontal plates (Incropera & DeWitt, Fundamentals of Heat and Mass
 * Transfer, 7th ed.; characteristic length L = area/perimeter).
 *
 * The buoyant flow leaves the face freely when a hot face looks up or a cold face looks down
 * ('hot-up-or-cold-down'); it is blocked by the plate itself when a hot face looks down or a cold
 * face looks up ('hot-down-or-cold-up'), which gives a smaller coefficient.
 */
import { formatGroup, type ConvectionResult, type NusseltEstimate } from './convection-result.js';
import { naturalConvectionGroups, type SurfaceAndAir } from './film-groups.js';
import { requireOneOf } from './input-checks.js';

export type HorizontalPlateArrangement = 'hot-up-or-cold-down' | 'hot-down-or-cold-up';
export type Facing = 'up' | 'down';

/**
 * Upper surface of a hot plate: Nu = 0.54 Ra^¼ (10⁴ ≤ Ra ≤ 10⁷), 0.15 Ra^⅓ (10⁷ < Ra ≤ 10¹¹).
 * Lower surface of a hot plate: Nu = 0.52 Ra^(1/5) (10⁴ ≤ Ra ≤ 10⁹).
 */
export function horizontalPlateNusselt(rayleigh: number, arrangement: HorizontalPlateArrangement): NusseltEstimate {
  const warnings: string[] = [];
  if (arrangement === 'hot-up-or-cold-down') {
    if (rayleigh < 1e4 || rayleigh > 1e11) {
      warnings.push(
        `Horizontal plate, hot face up or cold face down: Ra_L = ${formatGroup(rayleigh)} is outside the correlation's range (1e4 to 1e11).`,
      );
    }
    return { nusselt: rayleigh <= 1e7 ? 0.54 * rayleigh ** 0.25 : 0.15 * rayleigh ** (1 / 3), warnings };
  }
  if (rayleigh < 1e4 || rayleigh > 1e9) {
    warnings.push(
      `Horizontal plate, hot face down or cold face up: Ra_L = ${formatGroup(rayleigh)} is outside the correlation's range (1e4 to 1e9).`,
    );
  }
  return { nusselt: 0.52 * rayleigh ** 0.2, warnings };
}

/** Which arrangement a face looking up or down is in, given whether it is warmer than the air. */
export function horizontalPlateArrangement(facing: Facing, surfaceWarmerThanAir: boolean): HorizontalPlateArrangement {
  return (facing === 'up') === surfaceWarmerThanAir ? 'hot-up-or-cold-down' : 'hot-down-or-cold-up';
}

export interface HorizontalPlateInput extends SurfaceAndAir {
  /** Area / perimeter, m */
  readonly characteristicLength: number;
  readonly facing: Facing;
}

/** h_c of a horizontal plate face in still air. */
export function naturalConvectionHorizontalPlate(input: HorizontalPlateInput): ConvectionResult {
  const facing = requireOneOf('facing', input.facing, ['up', 'down'] as const);
  const groups = naturalConvectionGroups(input, input.characteristicLength, 'characteristicLength');
  const { properties, rayleigh } = groups;
  const arrangement = horizontalPlateArrangement(facing, input.surfaceTemperature >= input.airTemperature);
  const estimate = horizontalPlateNusselt(rayleigh, arrangement);
  return {
    coefficient: (estimate.nusselt * properties.conductivity) / input.characteristicLength,
    nusselt: estimate.nusselt,
    rayleigh,
    prandtl: properties.prandtl,
    characteristicLength: input.characteristicLength,
    filmTemperature: groups.filmTemperature,
    correlation: `horizontal plate (${arrangement}), natural convection`,
    warnings: [...properties.warnings, ...estimate.warnings],
  };
}
