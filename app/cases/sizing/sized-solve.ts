/**
 * What a pipe or flat kind adds to its solve and report when its case carries a "sizing" block:
 * the sweep across the series beside the case's own solve, and the sizing section after the
 * case's own sections. Without the block both pass through unchanged.
 */
import type { QuantityText } from '../../base/quantity-text.js';
import type { CaseReport } from '../../report/report-model.js';
import type { SolvedParts } from '../case-kind.js';
import type { PreparedSizing } from './prepared-sizing.js';
import { sizeInsulated, type SizedCase } from './size-insulated.js';
import { sizingSection } from './sizing-report.js';
import type { SizingBasis } from './sizing-words.js';

export function withSizing<Result>(solved: SolvedParts<Result>, sizing: PreparedSizing | null, sized: (s: PreparedSizing) => SizedCase, text: QuantityText): SolvedParts<Result> {
  return sizing === null ? solved : { ...solved, sizing: sizeInsulated(sized(sizing), sizing, text) };
}

export function withSizingSection(report: CaseReport, solved: SolvedParts<unknown>, basis: SizingBasis, text: QuantityText): CaseReport {
  return solved.sizing === undefined ? report : { ...report, sections: [...report.sections, sizingSection(solved.sizing, text, basis)] };
}
