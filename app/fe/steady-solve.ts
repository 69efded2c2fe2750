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
