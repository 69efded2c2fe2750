/**
 * The steady solve, in the three classical stages:
 *   1. impose the essential conditions (fixed face temperatures are set aside);
 *   2. solve the reduced band system for the unknown temperatures;
 *   3. recover the reactions at the fixed faces from the rows set aside, and close the energy
 *      balance: heat in through the faces + heat generated = 0.
 * A temperature-dependent conductivity or surface-dependent film coefficient makes the system
 * nonlinear: stages 1–2 are then repeated by Newton's method until the largest temperature change
 * is below the tolerance (newton-iteration.ts).
 */
import { discretise, initialGuess } from './discretisation.js';
import { iterateToSteadyState } from './newton-iteration.js';
import type { SteadyProblem } from './problem.js';
import type { SteadyResult } from './result.js';
import { recoverSteadyResult } from './steady-recovery.js';
import { startingTemperatures, type SteadyStart } from './steady-start.js';
import { validateSteadyProblem } from './validate.js';

export const DEFAULT_TEMPERATURE_TOLERANCE = 1e-10;
export const DEFAULT_MAX_ITERATIONS = 200;

export type { SteadyStart } from './steady-start.js';

/**
 * `start`, when given, is the face and interface temperatures of a similar solve, from which the
 * iteration starts instead of the uniform guess (fewer iterations, the same solution to within the
 * tolerance); one that does not fit the problem's layers is ignored.
 */
export function solveSteady(problem: SteadyProblem, start?: SteadyStart): SteadyResult {
  validateSteadyProblem(problem);
  const d = discretise(problem);
  const tolerance = problem.options?.temperatureTolerance ?? DEFAULT_TEMPERATURE_TOLERANCE;
  const maxIterations = problem.options?.maxIterations ?? DEFAULT_MAX_ITERATIONS;
  const guess = (start && d.nonlinear ? startingTemperatures(d, start) : null) ?? initialGuess(d);
  const { temperatures, iterations, lastChange } = iterateToSteadyState(d, guess, tolerance, maxIterations);
  return recoverSteadyResult(d, temperatures, iterations, lastChange);
}
