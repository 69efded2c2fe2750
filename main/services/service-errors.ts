/**
 * Errors the service layer raises. Each message is one sentence that names the field or the thing
 * and what is allowed, so a form, the command line and an IPC caller can show it as it is.
 */
import { boundedMessage } from '../../app/base/input-error.js';

export class InvalidInputError extends Error {
  readonly field: string;
  constructor(field: string, message: string) {
    super(boundedMessage(message));
    this.name = 'InvalidInputError';
    this.field = boundedMessage(field, 120);
  }
}

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
