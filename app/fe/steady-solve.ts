/**
 * The steady solve, in the three classical stages:
 *   1. impose the essential conditions (fixed face temperatures are set aside);
 *   2. solve the reduced band system for the unknown temperatures;
 *   3. recover the reactions at the fixed faces from the rows set aside, and close the energy
 *      balance: heat in through the faces + heat generated = 0.
 * A temperature-dependent conductivity or surface-dependent film coefficient is handled by Picard
 * iteration around stages 1–2 until the largest temperature change is below the tolerance.
 */
import { assembleSystem } from './assembly.js';
import { discretise, initialGuess, type Discretisation } from './discretisation.js';
import { ConvergenceError } from './errors.js';
import { applyFaceConditions } from './face-conditions.js';
import { recoverSteadyResult } from './steady-recovery.js';
import { solveWithEssentialConditions } from './reduced-solve.js';
import { conductionResidual } from './conduction-residual.js';
import type { BandedMatrix } from './banded-matrix.js';
import type { EssentialCondition } from './face-conditions.js';
import type { SteadyProblem } from './problem.js';
import type { SteadyResult } from './result.js';
import { validateSteadyProblem } from './validate.js';

export const DEFAULT_TEMPERATURE_TOLERANCE = 1e-10;
export const DEFAULT_MAX_ITERATIONS = 200;

export function solveSteady(problem: SteadyProblem): SteadyResult {
  validateSteadyProblem(problem);
  const d = discretise(problem);
  const tolerance = problem.options?.temperatureTolerance ?? DEFAULT_TEMPERATURE_TOLERANCE;
  const maxIterations = problem.options?.maxIterations ?? DEFAULT_MAX_ITERATIONS;
  const { temperatures, iterations, lastChange } = iterateToSteadyState(d, initialGuess(d), tolerance, maxIterations);
  return recoverSteadyResult(d, temperatures, iterations, lastChange);
}

/** Stages 1 and 2, repeated with updated properties until the temperatures stop changing (excess temperatures, see Discretisation.reference). */
export function iterateToSteadyState(
  d: Discretisation,
  guess: Float64Array,
  tolerance: number,
  maxIterations: number,
): { temperatures: Float64Array; iterations: number; lastChange: number } {
  let temperatures = guess;
  let previousChange = Infinity;
  let relaxation = 1;
  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    const system = assembleSystem(d.mesh, d.layers, d.measure, temperatures, d.reference);
    const rhs = Float64Array.from(system.load);
    const { essential, filmDiagonal } = applyFaceConditions(system.conductance, rhs, d.faces, temperatures, d.reference);
    const next = solveWithEssentialConditions(system.conductance, rhs, essential);
    refineSolution(system.conductance, rhs, filmDiagonal, essential, next);
    if (!d.nonlinear) return { temperatures: next, iterations: 1, lastChange: 0 };

    let change = 0;
    for (let i = 0; i < next.length; i++) change = Math.max(change, Math.abs(next[i]! - temperatures[i]!));
    if (!Number.isFinite(change)) break;
    if (change <= tolerance) return { temperatures: next, iterations: iteration, lastChange: change };
    // Under-relax when an iteration moves further than the one before (strong radiation coupling).
    if (change > previousChange) relaxation = Math.max(0.2, relaxation * 0.5);
    previousChange = change;
    const blended = new Float64Array(next.length);
    for (let i = 0; i < next.length; i++) blended[i] = temperatures[i]! + relaxation * (next[i]! - temperatures[i]!);
    temperatures = blended;
    if (iteration === maxIterations) {
      const imbalance = largestNodalImbalance(d, temperatures);
      throw new ConvergenceError(
        iteration,
        change,
        `The nonlinear solve did not converge in ${iteration} iterations: the last temperature change was ${change.toExponential(3)} K against a tolerance of ${tolerance} K, leaving a nodal heat imbalance of up to ${imbalance.toExponential(3)} ${d.mesh.geometry.kind === 'planar' ? 'W/m²' : 'W/m'}.`,
      );
    }
  }
  throw new ConvergenceError(maxIterations, Number.NaN, 'The nonlinear solve diverged: temperatures stopped being finite numbers.');
}

/** The largest residual of the nonlinear equations at the free nodes: heat that does not balance. */
function largestNodalImbalance(d: Discretisation, temperatures: Float64Array): number {
  const system = assembleSystem(d.mesh, d.layers, d.measure, temperatures, d.reference);
  const rhs = Float64Array.from(system.load);
  const { essential, filmDiagonal } = applyFaceConditions(system.conductance, rhs, d.faces, temperatures, d.reference);
  const fixed = new Set(essential.map((e) => e.node));
  const residual = conductionResidual(system.conductance, rhs, filmDiagonal, temperatures);
  let largest = 0;
  residual.forEach((r, i) => {
    if (!fixed.has(i)) largest = Math.max(largest, Math.abs(r));
  });
  return largest;
}

/**
 * Two steps of iterative refinement with the residual in difference form: recovers the digits
 * that elimination loses when a thin metal layer makes the system ill-conditioned.
 */
function refineSolution(
  matrix: BandedMatrix,
  rhs: Float64Array,
  filmDiagonal: Float64Array,
  essential: readonly EssentialCondition[],
  temperatures: Float64Array,
): void {
  const homogeneous = essential.map((e) => ({ node: e.node, temperature: 0 }));
  for (let pass = 0; pass < 2; pass++) {
    const residual = conductionResidual(matrix, rhs, filmDiagonal, temperatures);
    const correction = solveWithEssentialConditions(matrix, residual, homogeneous);
    for (let i = 0; i < temperatures.length; i++) temperatures[i] += correction[i]!;
  }
}
