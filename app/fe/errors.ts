/**
 * Typed errors raised by the engine. Both carry a message that is one sentence a user can act on.
 */

/** Bad input: names the field (a path such as `layers[1].thickness`) and the allowed range. */
export class InputError extends Error {
  override readonly name = 'InputError';
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
  }
}

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
