/**
 * What the pipe and flat kinds hand back once solved: the result, its three surface checks in
 * reading order, its warnings, and the parser's defaults before the calculation's own assumptions.
 */
import type { SolvedParts } from '../case-kind.js';
import type { SolveChecks } from './insulated-solve.js';

export function insulatedSolvedParts<Result extends { readonly checks: SolveChecks; readonly warnings: readonly string[]; readonly assumptions: readonly string[] }>(
  result: Result,
  parserAssumptions: readonly string[],
): SolvedParts<Result> {
  const checks = [result.checks.surfaceCondensation, result.checks.personnelProtection, result.checks.serviceTemperature];
  return { result, checks, warnings: result.warnings, assumptions: [...parserAssumptions, ...result.assumptions] };
}
