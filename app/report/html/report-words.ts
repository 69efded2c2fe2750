/**
 * The words the printed report names kinds of case and verdicts with: the screen's words (the
 * case list's kinds, the report view's verdicts), so paper and screen read alike.
 */
import type { CheckVerdict } from '../../checks/check-result.js';

export const VERDICT_WORDS: Readonly<Record<CheckVerdict, string>> = {
  pass: 'Pass',
  fail: 'Fail',
  warning: 'Review',
  'not-applicable': 'Does not apply',
};

const KIND_WORDS: Readonly<Record<string, string>> = {
  pipe: 'Pipe run',
  flat: 'Flat surface',
  wall: 'Wall or roof',
  conduction: 'Layers with given conditions',
};

/** A case's kind in words; "Other" for a kind this version does not know (a case file from a newer Lamina). */
export function kindWords(kind: string): string {
  return Object.hasOwn(KIND_WORDS, kind) ? KIND_WORDS[kind]! : 'Other';
}
