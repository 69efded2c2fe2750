/**
 * Errors the service layer raises besides bad input. Each message is one sentence that names the
 * thing and what is allowed, so a form, the command line and an IPC caller can show it as it is.
 * Bad input is the engine's own InputError (app/base/input-error.ts), one vocabulary for the
 * engine and the services alike.
 */
export class NotFoundError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'NotFoundError';
  }
}

/** The request is well-formed but the current state forbids it (read-only built-in, material in use). */
export class RefusedError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'RefusedError';
  }
}
