/**
 * The operations behind the API contract (app/api/contract.ts): one handler per channel, each of
 * which validates its input before doing anything. The Electron IPC handlers and the browser-mode
 * HTTP endpoints both call these, so the two transports behave the same.
 */
import type { ApiChannel, ApiResponse } from '../../app/api/contract.js';

/** Input that a handler refuses; the message is one sentence naming the field and what is allowed. */
export class InvalidRequestError extends Error {
  override name = 'InvalidRequestError';
}

export type OperationHandlers = {
  readonly [C in ApiChannel]: (request: unknown) => Promise<ApiResponse<C>>;
};

/** Every channel, for loops that register handlers or routes. */
export const API_CHANNELS: readonly ApiChannel[] = ['app:info'];

/** The browser-mode path that mirrors a channel: 'app:info' -> '/api/app-info'. */
export function httpPathFor(channel: ApiChannel): string {
  return `/api/${channel.replace(/:/g, '-')}`;
}

export interface OperationContext {
  readonly name: string;
  readonly version: string;
}

export function createOperations(context: OperationContext): OperationHandlers {
  return {
    'app:info': async (request) => {
      requireNoFields('app:info', request);
      return { name: context.name, version: context.version };
    },
  };
}

/** A request with no parameters may arrive as undefined, null or {}; anything else is refused. */
function requireNoFields(channel: ApiChannel, request: unknown): void {
  if (request === undefined || request === null) return;
  if (typeof request !== 'object' || Array.isArray(request)) {
    throw new InvalidRequestError(`The ${channel} request must be an empty JSON object.`);
  }
  const keys = Object.keys(request);
  if (keys.length > 0) {
    throw new InvalidRequestError(`The ${channel} request takes no fields, but it was sent "${keys[0]}".`);
  }
}
