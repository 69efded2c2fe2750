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
  // Two parallel stacks (values and their depths) rather than a pair per value: every solve
  // walks its whole case through here.
  const values: object[] = [];
  const depths: number[] = [];
  if (typeof value === 'object' && value !== null) {
    values.push(value);
    depths.push(1);
  }
  while (values.length > 0) {
    const v = values.pop()!;
    const depth = depths.pop()!;
    if (depth > limit) {
      throw new InputError(what, `${what} nests lists or objects more than ${limit} levels deep; no Lamina file needs more than ${limit}.`);
    }
    const children = Array.isArray(v) ? v : Object.values(v);
    for (let i = 0; i < children.length; i++) {
      const child: unknown = children[i];
      if (typeof child === 'object' && child !== null) {
        values.push(child);
        depths.push(depth + 1);
      }
    }
  }
}
