/**
 * Heat loss (or gain) through an insulated flat surface, per m² and for the area, and the surface
 * checks. Planar FE problem: wall sheet (optional), insulation, jacket, from the process side
 * outwards; the outer film from app/physics outerSurfaceExchange is iterated by the engine.
 * Heat flows are positive outwards (heat lost); a cold surface gives negative values.
 */
import { SI_TEXT, type QuantityText } from '../../base/quantity-text.js';
import type { SteadyStart } from '../../fe/steady-solve.js';
import type { OuterSurfaceShape } from '../../physics/outer-surface-exchange.js';
import { methodNeedsEmissivity, outerSurfaceEmissivity, type ResolvedEmissivity } from '../insulated/insulated-inputs.js';
import { insulatedStack, reportedStackSolution, solveStack, type StackSolution, surfaceExchangeFor } from '../insulated/insulated-solve.js';
import { validateFlatSurfaceInput, type FlatSurfaceInput } from './flat-surface-input.js';
import { DEFAULT_SURFACE_METHOD } from '../pipe/pipe-input.js';
import { withFields } from '../with-fields.js';

export interface FlatSurfaceResult extends Omit<StackSolution, 'engine' | 'heatOut'> {
  /** W/m² of surface; positive = heat lost. */
  readonly heatFlowDensity: number;
  /** W over the whole area. */
  readonly heatLoss: number;
  /** kWh per year: heatLoss × operating hours / 1000. */
  readonly annualEnergy: number;
  /** m²·K/W from the inner face to the outer surface (layers only, no films). */
  readonly layerResistance: number;
  readonly emissivity: ResolvedEmissivity | null;
  readonly assumptions: readonly string[];
}

/** Validates `input`, then calculates; `text` writes the figures of the checks' reasons and warnings (default SI). */
export function calculateFlatSurface(input: FlatSurfaceInput, text: QuantityText = SI_TEXT): FlatSurfaceResult {
  validateFlatSurfaceInput(input);
  return calculateValidatedFlatSurface(input, text);
}

/**
 * The calculation of an input that has passed validateFlatSurfaceInput already: the flat kind's
 * parse validates the whole case, so its solve does not check every field a second time. `start`,
 * from a neighbouring solve (a sizing sweep), only shortens the iteration; the result is the same.
 */
export function calculateValidatedFlatSurface(input: FlatSurfaceInput, text: QuantityText, start?: SteadyStart): FlatSurfaceResult {
  const method = input.surfaceMethod ?? DEFAULT_SURFACE_METHOD;
  const assumptions: string[] = [];
  const stack = insulatedStack(input.wall ? { role: 'wall', label: 'wall', layer: input.wall } : null, input.layers, input.jacket);
  const shape: OuterSurfaceShape =
    input.surface.kind === 'vertical'
      ? { kind: 'vertical-wall', height: input.surface.height }
      : { kind: 'horizontal-surface', facing: input.surface.facing, characteristicLength: input.surface.characteristicLength };

  const emissivity = methodNeedsEmissivity(method) ? outerSurfaceEmissivity(input.layers, input.jacket) : null;
  if (input.ambient.surroundingsTemperature === undefined) assumptions.push('surroundings (radiant) temperature taken equal to the air temperature');
  if (input.surfaceMethod === undefined) assumptions.push('outer surface coefficient from the general correlations (natural, forced and mixed convection) plus radiation');
  if (input.ambient.exposure.kind === 'outdoor' && input.ambient.exposure.windSpeed > 0) {
    assumptions.push('wind taken along the surface over its height (vertical) or characteristic length (horizontal)');
  }

  const exchange = surfaceExchangeFor(shape, input.inner, input.ambient, method, emissivity);

  const solved = solveStack({
    geometry: { kind: 'planar' },
    stack,
    inner: input.inner,
    exchange,
    ambient: input.ambient,
    ...(input.touchLimit !== undefined ? { touchLimit: input.touchLimit } : {}),
    ...(start !== undefined ? { start } : {}),
  }, text);
  const heatOut = solved.heatOut;
  const solution = reportedStackSolution(solved);
  const heatLoss = heatOut * input.area;
  // Σ d/λ_eff over the layers, from the engine's per-layer resistances where they are defined.
  const layerResistance = solution.layers.reduce((sum, l) => sum + (l.thermalResistance ?? l.thickness / (l.effectiveConductivity ?? l.conductivityAtMeanTemperature)), 0);
  return withFields(solution, {
    heatFlowDensity: heatOut,
    heatLoss,
    annualEnergy: (heatLoss * input.operatingHours) / 1000,
    layerResistance,
    emissivity,
    assumptions,
  });
}
