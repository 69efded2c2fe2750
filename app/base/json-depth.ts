/**
 * How deeply a parsed JSON value nests, found without recursion: a file nested thousands of levels
 * deep parses, but every recursive walk after it (a copy, a stringify, a validator) would overflow
 * the stack. Checked once at each edge, before anything walks the value.
 */
import { InputError } from './input-error.js';

/** Case files nest about eight levels; project files wrap cases in a few more. */
export const MAX_JSON_DEPTH = 40;

/** Throws InputError naming `what` when `value` nests deeper than `limit` lists or objects. */
export function requireBoundedNesting(value: unknown, what: string, limit = MAX_JSON_DEPTH): void {
  const stack: [unknown, number][] = [[value, 1]];
  while (stack.length > 0) {
    const [v, depth] = stack.pop()!;
    if (typeof v !== 'object' || v === null) continue;
    if (depth > limit) {
      throw new InputError(what, `${what} nests lists or objects more than ${limit} levels deep; no Lamina file needs more than ${limit}.`);
    }
    for (const child of Array.isArray(v) ? v : Object.values(v)) {
      if (typeof child === 'object' && child !== null) stack.push([child, depth + 1]);
    }
  }
}
