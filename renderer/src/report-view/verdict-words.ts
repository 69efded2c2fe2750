/** The word a verdict is shown with on screen: the same words as the plain-text report, in sentence case. */
import type { CheckVerdict } from '../../../app/checks/check-result.js';

export const VERDICT_WORDS: Readonly<Record<CheckVerdict, string>> = {
  pass: 'Pass',
  fail: 'Fail',
  warning: 'Review',
  'not-applicable': 'Does not apply',
};
