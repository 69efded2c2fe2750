/** How projects and cases read on screen: moments of change and kinds of case. */
import type { CaseKind } from '../../../app/api/contract.js';
import { KIND_WORDS, kindWords } from '../../../app/report/report-words.js';

const changeFormat = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short' });

/** A stored ISO moment in local time; a dash, never "Invalid Date", when it cannot be read. */
export function describeMoment(iso: string | null): string {
  if (!iso) return '–';
  const date = new Date(iso);
  return Number.isFinite(date.getTime()) ? changeFormat.format(date) : '–';
}

/** The kinds a user adds from the app, in the words of app/report/report-words. */
export const CASE_KIND_LABELS: Readonly<Record<CaseKind, string>> = { pipe: KIND_WORDS['pipe']!, flat: KIND_WORDS['flat']!, wall: KIND_WORDS['wall']! };

/** The kind of a stored case, read defensively: inputs are versioned JSON that a later version may extend. */
export function describeCaseKind(kind: unknown): string {
  return kindWords(typeof kind === 'string' ? kind : '');
}
