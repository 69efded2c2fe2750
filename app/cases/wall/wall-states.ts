/**
 * The thermal states a wall case needs, each solved once: the design condition with the ISO 6946
 * surface resistances (U-value, temperatures, energy balance), each month of the climate for the
 * interstitial procedure, and the design condition(s) of the mould and inside-surface
 * condensation criteria with R_si = 0.25 m²·K/W. The checks then read these states; none of them
 * solves the wall again.
 *
 * A wall whose layers all have a constant conductivity is a linear problem with no heat source,
 * so its temperature field is affine in the two air temperatures:
 *   θ(x) = θ_e + (θ_i − θ_e)·φ(x),
 * where φ is the field for θ_i = 1, θ_e = 0 (superposition). One engine solve per stack then gives
 * every month exactly; a conductivity that depends on temperature makes each state a solve of its own.
 */
import { isConstantConductivity } from '../../fe/conductivity.js';
import type { SteadyResult } from '../../fe/result.js';
import { solveSteady } from '../../fe/steady-solve.js';
import { wallEngineProblem } from './wall-engine-problem.js';
import type { ThermalStack } from './wall-thermal-stack.js';

/** Temperatures at the points of the included stack: inside surface, each interface, outside surface, °C. */
export type PointTemperatures = readonly number[];

export function pointTemperatures(steady: SteadyResult): number[] {
  return [steady.faces.inner.temperature, ...steady.interfaces.map((i) => i.temperatureInnerSide), steady.faces.outer.temperature];
}

export interface WallStateSolver {
  /** The point temperatures with inside air at `inside` and outside air at `outside` (°C). */
  readonly at: (inside: number, outside: number) => PointTemperatures;
  /** Engine solves made so far. */
  readonly solves: () => number;
}

/**
 * States of one stack. `known` is a state already solved on this stack (the design condition),
 * which for a linear stack with θ_i ≠ θ_e already fixes φ, so no further solve is needed.
 */
export function wallStateSolver(stack: ThermalStack, known?: { readonly inside: number; readonly outside: number; readonly steady: SteadyResult }): WallStateSolver {
  const linear = stack.layers.filter((l) => l.included).every((l) => isConstantConductivity(l.conductivity));
  let solves = 0;
  const solve = (inside: number, outside: number) => {
    solves++;
    return pointTemperatures(solveSteady(wallEngineProblem(stack, inside, outside)));
  };
  let unit: number[] | null = null;
  if (linear && known && known.inside !== known.outside) {
    const span = known.inside - known.outside;
    unit = pointTemperatures(known.steady).map((t) => (t - known.outside) / span);
  }
  return {
    at(inside, outside) {
      if (!linear) return solve(inside, outside);
      unit ??= solve(1, 0);
      return unit.map((phi) => outside + (inside - outside) * phi);
    },
    solves: () => solves,
  };
}
