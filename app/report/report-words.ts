/**
 * The words kinds of case and verdicts are named with, on screen and on paper alike (the case list,
 * the case editor, the report view and the printed report). The plain-text report keeps its own
 * capitals for its fixed verdict column.
 */
import type { CheckVerdict } from '../checks/check-result.js';

export const VERDICT_WORDS: Readonly<Record<CheckVerdict, string>> = {
  pass: 'Pass',
  fail: 'Fail',
  warning: 'Review',
  'not-applicable': 'Does not apply',
};

export const KIND_WORDS: Readonly<Record<string, string>> = {
  pipe: 'Pipe run',
  flat: 'Flat surface',
  wall: 'Wall or roof',
  conduction: 'Layers with given conditions',
};

/** A case's kind in words; "Other" for a kind this version does not know (a case file from a newer Lamina). */
export function kindWords(kind: string): string {
  return Object.hasOwn(KIND_WORDS, kind) ? KIND_WORDS[kind]! : 'Other';
}
