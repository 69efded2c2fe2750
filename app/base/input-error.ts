/**
 * The engine's one bad-input error: the field path (such as `layers[1].thickness`) and one sentence
 * a user can act on, naming the field and the allowed range. Every layer of the engine raises it;
 * main/ maps it to exit code 2 (command line) and HTTP 400 / an IPC refusal in one place each.
 *
 * Where the sentence holds figures (the value given, the allowed range, a unit), it is built from
 * the parts of app/base/quantity-sentence and keeps them (`sentence`): the message is written in
 * SI, as the command line and case files speak, and `inUnits` writes the same refusal in a
 * project's units (solveCase does, for a project in US customary units). The value is only shown
 * converted; nothing about the input changes.
 *
 * The sentence is bounded: a message that would run past MAX_MESSAGE_LENGTH is cut with an
 * ellipsis, so no input, however large, is echoed back whole (values inside it are already cut by
 * shownValue).
 */
import { writeSentence, type QuantitySentence, type Sentence } from './quantity-sentence.js';
import { SI_TEXT, type QuantityText } from './quantity-text.js';

export const MAX_MESSAGE_LENGTH = 399;

export class InputError extends Error {
  override readonly name = 'InputError';
  readonly field: string;
  /** The refusal as parts with quantity-tagged figures, where it has figures to convert. */
  readonly sentence?: QuantitySentence;
  /** `message` is the sentence, or its parts written in the units of `text` (SI unless told). */
  constructor(field: string, message: Sentence, text: QuantityText = SI_TEXT) {
    super(boundedMessage(typeof message === 'string' ? message : writeSentence(message, text)));
    this.field = boundedMessage(field, 120);
    if (typeof message !== 'string') this.sentence = message;
  }

  /** The same refusal written in the units of `text`; itself when it has no figures to convert or `text` is SI. */
  inUnits(text: QuantityText): InputError {
    return this.sentence === undefined || text.system === 'SI' ? this : new InputError(this.field, this.sentence, text);
  }
}

/** A message cut to `limit` characters with an ellipsis (whole code points, never half a pair). */
export function boundedMessage(message: string, limit = MAX_MESSAGE_LENGTH): string {
  if (message.length <= limit) return message;
  const cut = Array.from(message.slice(0, limit - 1));
  if (cut.length > 0 && /[\uD800-\uDBFF]$/.test(cut[cut.length - 1]!)) cut.pop();
  return `${cut.join('')}…`;
}
