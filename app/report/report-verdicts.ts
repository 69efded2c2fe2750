/**
 * Check results as report verdicts, and the cautions they carry, each distinct one once (several
 * moisture checks share one caution; a reader should meet it once, at the end).
 */
import type { CheckResult } from '../checks/check-result.js';
import type { ReportVerdict } from './report-model.js';

/** The verdict of `check` with its margin already phrased; `reason` replaces the check's own where the report words it. */
export function reportVerdict(check: CheckResult, margin: string | undefined, reason: string = check.reason): ReportVerdict {
  return {
    check: check.check,
    title: check.title,
    verdict: check.verdict,
    ...(margin !== undefined ? { margin } : {}),
    reason,
    ...(check.caution !== undefined ? { caution: check.caution } : {}),
  };
}

export function distinctCautions(verdicts: readonly ReportVerdict[]): string[] {
  return [...new Set(verdicts.flatMap((v) => (v.caution ? [v.caution] : [])))];
}
