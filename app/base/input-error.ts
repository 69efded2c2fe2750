/**
 * The engine's one bad-input error: the field path (such as `layers[1].thickness`) and one sentence
 * a user can act on, naming the field and the allowed range. Every layer of the engine raises it;
 * main/ maps it to exit code 2 (command line) and HTTP 400 / an IPC refusal in one place each.
 *
 * The sentence is bounded: a message that would run past MAX_MESSAGE_LENGTH is cut with an
 * ellipsis, so no input, however large, is echoed back whole (values inside it are already cut by
 * shownValue).
 */
export const MAX_MESSAGE_LENGTH = 399;

export class InputError extends Error {
  override readonly name = 'InputError';
  readonly field: string;
  constructor(field: string, message: string) {
    super(boundedMessage(message));
    this.field = boundedMessage(field, 120);
  }
}

/** A message cut to `limit` characters with an ellipsis (whole code points, never half a pair). */
export function boundedMessage(message: string, limit = MAX_MESSAGE_LENGTH): string {
  if (message.length <= limit) return message;
  const cut = Array.from(message.slice(0, limit - 1));
  if (cut.length > 0 && /[\uD800-\uDBFF]$/.test(cut[cut.length - 1]!)) cut.pop();
  return `${cut.join('')}…`;
}
