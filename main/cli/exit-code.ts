/**
 * The one place a failure becomes an exit code: 2 for input the user must change (a bad field, a
 * problem with no unique solution), 1 for a failure while working (no convergence, storage).
 */
import { InputError, SingularProblemError } from '../../app/index.js';
import { InvalidInputError } from '../services/service-errors.js';

export function isInputProblem(error: unknown): error is Error {
  return error instanceof InputError || error instanceof InvalidInputError || error instanceof SingularProblemError;
}

export function exitCodeOf(error: unknown): 1 | 2 {
  return isInputProblem(error) ? 2 : 1;
}
