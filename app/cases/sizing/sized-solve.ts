/**
 * What a pipe or flat kind adds to its solve and report when its case carries a "sizing" block:
 * the sweep across the series beside the case's own solve, and the sizing section after the
 * case's own sections. Without the block both pass through unchanged.
 */
import type { QuantityText } from '../../base/quantity-text.js';
import type { CaseReport, ReportFigure } from '../../report/report-model.js';
import type { SolvedParts } from '../case-kind.js';
import type { PreparedSizing } from './prepared-sizing.js';
import { sizeInsulated, type SizedCase } from './size-insulated.js';
import { sizingSection } from './sizing-report.js';
import { CRITERION_NAMES, type SizingBasis } from './sizing-words.js';

export function withSizing<Result>(solved: SolvedParts<Result>, sizing: PreparedSizing | null, sized: (s: PreparedSizing) => SizedCase, text: QuantityText): SolvedParts<Result> {
  return sizing === null ? solved : { ...solved, sizing: sizeInsulated(sized(sizing), sizing, text) };
}

/** The sizing section after the case's own, and the choice among the key figures (after the case's first, which the summary shows). */
export function withSizingSection(report: CaseReport, solved: SolvedParts<unknown>, basis: SizingBasis, text: QuantityText): CaseReport {
  const sizing = solved.sizing;
  if (sizing === undefined) return report;
  const choice = sizing.choice;
  const figure: ReportFigure =
    choice.kind === 'chosen'
      ? {
          label: `Chosen thickness of layer ${sizing.layer + 1}`,
          value: choice.thickness,
          quantity: 'thickness',
          note: choice.governing === 'economic' ? 'least lifecycle cost' : `the ${CRITERION_NAMES[choice.governing]} governs`,
        }
      : { label: `Chosen thickness of layer ${sizing.layer + 1}`, value: null, quantity: 'thickness', note: 'no thickness of the series meets every criterion' };
  return { ...report, keyFigures: [...report.keyFigures, figure], sections: [...report.sections, sizingSection(sizing, text, basis)] };
}
