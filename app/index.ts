/**
 * The engine's public index: the case pipeline and what its callers (command line, services,
 * renderer) need to name. Everything a case means is decided behind `solveCase`.
 */
export { solveCase, parseCase, caseKindOf, type SolvedCase } from './cases/solve-case.js';
export { CASE_KINDS } from './cases/registry.js';
export type { CaseContext, CaseKind, ParsedCase } from './cases/case-kind.js';
export type { MaterialResolver } from './cases/case-material.js';
export { PIPE_SIZE_SERIES, findPipeSize, type PipeSize, type PipeSizeSeries } from './cases/pipe/pipe-sizes.js';
export type { CaseReport, ReportSection, ReportBlock, ReportFigure, ReportTable, ReportChart, ReportVerdict } from './report/report-model.js';
export { renderReportText, renderSectionText } from './report/render-text.js';
export type { CheckResult, CheckVerdict } from './checks/check-result.js';
export { InputError } from './base/input-error.js';
export { ConvergenceError, SingularProblemError } from './fe/errors.js';
export { QUANTITIES, type QuantityName } from './base/quantities.js';
