/**
 * The one place a failure becomes an exit code: 0 done; 2 for input the user must change (a bad
 * field or usage, a problem with no unique solution, an id or a file that does not exist); 1 for a
 * failure while working (no convergence, storage, a change the library's state refuses).
 */
import { InputError, SingularProblemError } from '../../app/index.js';
import { NotFoundError } from '../services/service-errors.js';

export const EXIT_DONE = 0;
export const EXIT_FAILED = 1;
export const EXIT_BAD_INPUT = 2;

/** Bad input in the engine's one vocabulary, or a problem the input leaves without a unique solution. */
export function isInputProblem(error: unknown): error is Error {
  return error instanceof InputError || error instanceof SingularProblemError;
}

/** A file the user named that is not there (Node's own error, before any sentence of ours). */
export function isMissingFile(error: unknown): error is NodeJS.ErrnoException & { path: string } {
  const fileError = error as NodeJS.ErrnoException | undefined;
  return fileError?.code === 'ENOENT' && typeof fileError.path === 'string';
}

export function exitCodeOf(error: unknown): typeof EXIT_FAILED | typeof EXIT_BAD_INPUT {
  return isInputProblem(error) || error instanceof NotFoundError || isMissingFile(error) ? EXIT_BAD_INPUT : EXIT_FAILED;
}
