/**
 * A value as it reads inside an error sentence: numbers as JavaScript prints them, everything else
 * as JSON, cut to MAX_SHOWN_LENGTH characters with an ellipsis. Input can be a megabyte string or an
 * object nested thousands deep; the user needs to recognise it, not to read it back whole, so the
 * JSON is written only as far as it will be shown.
 */
import { boundedMessage } from './input-error.js';

export const MAX_SHOWN_LENGTH = 60;

export function shownValue(value: unknown): string {
  if (typeof value === 'number') return String(value);
  if (value === undefined) return 'nothing';
  const out: string[] = [];
  writeBrief(value, out, { left: MAX_SHOWN_LENGTH + 1 }, 0);
  return boundedMessage(out.join(''), MAX_SHOWN_LENGTH);
}

const DEEPEST = 6;

/** JSON of `value`, stopping once `budget.left` characters are written (or DEEPEST levels down). */
function writeBrief(value: unknown, out: string[], budget: { left: number }, depth: number): void {
  const put = (text: string) => {
    out.push(text.length > budget.left ? text.slice(0, budget.left) : text);
    budget.left -= text.length;
  };
  if (budget.left <= 0) return;
  if (value === null || typeof value === 'boolean' || typeof value === 'number') return put(String(value));
  if (typeof value === 'string') return put(JSON.stringify(value.slice(0, budget.left + 1)));
  if (typeof value !== 'object') return put(String(value));
  if (depth >= DEEPEST) return put('…');
  const isList = Array.isArray(value);
  put(isList ? '[' : '{');
  let first = true;
  for (const key of isList ? (value as unknown[]).keys() : Object.keys(value)) {
    if (budget.left <= 0) return;
    if (!first) put(',');
    first = false;
    if (!isList) put(`${JSON.stringify(String(key).slice(0, budget.left + 1))}:`);
    writeBrief((value as Record<string | number, unknown>)[key as string], out, budget, depth + 1);
  }
  put(isList ? ']' : '}');
}
