/** Number and check formatting shared by the text summaries of `lamina solve --format text`. */
import type { CheckResult } from '../../../app/checks/check-result.js';

/** Fixed decimals with a true minus sign and no "−0.00". */
export function fixed(value: number, digits: number): string {
  const v = Object.is(Math.round(value * 10 ** digits), -0) || Math.round(value * 10 ** digits) === 0 ? 0 : value;
  return v.toFixed(digits).replace('-', '−');
}

export function scientific(value: number): string {
  return value.toExponential(2).replace('e+', 'e').replace(/-/g, '−');
}

/** "Heat loss 12.3 W/m" or, for a chilled line, "Heat gain 4.5 W/m". */
export function lossOrGain(value: number, digits: number, unit: string): string {
  return value >= 0 ? `Heat loss ${fixed(value, digits)} ${unit}` : `Heat gain ${fixed(-value, digits)} ${unit}`;
}

const VERDICT_WORDS: Record<CheckResult['verdict'], string> = {
  pass: 'PASS',
  fail: 'FAIL',
  warning: 'CAUTION',
  'not-applicable': 'n/a',
};

/** One block per check, then each distinct caution once. */
export function checksText(checks: readonly CheckResult[]): string[] {
  const lines = ['Checks'];
  for (const c of checks) {
    const margin = c.margin ? ` (margin ${fixed(c.margin.value, 2)} ${c.margin.unit})` : '';
    lines.push(`  ${VERDICT_WORDS[c.verdict].padEnd(8)}${c.title}${margin}`, `          ${c.reason}`);
  }
  const cautions = [...new Set(checks.map((c) => c.caution).filter((c): c is string => !!c))];
  if (cautions.length > 0) lines.push('', ...cautions.map((c) => `Note: ${c}`));
  return lines;
}
