/**
 * Typed errors raised by the engine. Both carry a message that is one sentence a user can act on.
 */

/** Bad input: one error type for the whole engine, defined in app/base. */
export { InputError } from '../base/input-error.js';

/** A nonlinear solve that did not reach its tolerance; never returned as if converged. */
export class ConvergenceError extends Error {
  override readonly name = 'ConvergenceError';
  constructor(
    readonly iterations: number,
    readonly lastChange: number,
    message: string,
  ) {
    super(message);
  }
}

/** A system that has no unique solution (no fixed temperature and no film with a positive coefficient). */
export class SingularProblemError extends Error {
  override readonly name = 'SingularProblemError';
}
