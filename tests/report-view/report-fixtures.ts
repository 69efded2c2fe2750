/** Reports of the example cases, solved through the one case pipeline, for the report-view tests. */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { solveCase } from '../../app/index.js';
import type { CaseReport, ReportChart, ReportCrossSection } from '../../app/report/report-model.js';
import { caseContext } from '../../main/cases/case-context.js';

const EXAMPLES = path.resolve(import.meta.dirname, '../../data/examples');

export function exampleReport(file: string): CaseReport {
  return solveCase(JSON.parse(readFileSync(path.join(EXAMPLES, file), 'utf8')), caseContext(null)).report;
}

export function chartOf(report: CaseReport, title: string): ReportChart {
  for (const s of report.sections) for (const b of s.blocks) if (b.kind === 'chart' && b.chart.title === title) return b.chart;
  throw new Error(`No chart "${title}" in ${report.title}.`);
}

export function crossSectionOf(report: CaseReport): ReportCrossSection {
  for (const s of report.sections) for (const b of s.blocks) if (b.kind === 'cross-section') return b.crossSection;
  throw new Error(`No cross-section in ${report.title}.`);
}
