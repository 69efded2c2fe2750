/**
 * The one path from a case to what a person reads: find the kind, parse and validate the whole
 * case, solve it, run its checks on the solved result, build its report. The command line, the
 * Node services and the renderer all call this; none of them wires a case to the engine itself.
 */
import { requireBoundedNesting } from '../base/json-depth.js';
import { InputError } from '../base/input-error.js';
import { shownValue } from '../base/shown-value.js';
import { isObject } from '../base/field-checks.js';
import { quantityText } from '../base/quantity-text.js';
import type { CheckResult } from '../checks/check-result.js';
import type { CaseReport } from '../report/report-model.js';
import type { SizingResult } from './sizing/sizing-model.js';
import type { CaseContext, CaseKind, ParsedCase } from './case-kind.js';
import { CASE_KINDS } from './registry.js';

export interface SolvedCase {
  readonly kind: string;
  readonly title: string;
  /** The validated input the solve used (SI; materials resolved). */
  readonly input: unknown;
  readonly result: unknown;
  readonly checks: readonly CheckResult[];
  readonly warnings: readonly string[];
  readonly assumptions: readonly string[];
  readonly report: CaseReport;
  /** For a pipe or flat case with a "sizing" block: the table across the thickness series and the choice (also a section of the report). */
  readonly sizing?: SizingResult;
}

/** The kind a case file declares, or an InputError naming "kind". */
export function caseKindOf(json: unknown): CaseKind {
  if (!isObject(json)) throw new InputError('case', 'The case must be a JSON object with a "kind" field.');
  const kind = CASE_KINDS.find((k) => k.kind === json['kind']);
  if (!kind) {
    throw new InputError('kind', `kind must be one of ${CASE_KINDS.map((k) => `"${k.kind}"`).join(', ')}; got ${shownValue(json['kind'])}.`);
  }
  return kind;
}

/**
 * Parses and validates a case completely without solving it (for saving a case: refuse it now, not
 * later). A refusal reads in the context's units (SI unless told).
 */
export function parseCase(json: unknown, context: CaseContext): { kind: CaseKind; parsed: ParsedCase<unknown> } {
  try {
    requireBoundedNesting(json, 'The case');
    const kind = caseKindOf(json);
    return { kind, parsed: kind.parse(json, context) };
  } catch (error) {
    throw error instanceof InputError && context.unitSystem !== undefined ? error.inUnits(quantityText(context.unitSystem)) : error;
  }
}

export function solveCase(json: unknown, context: CaseContext): SolvedCase {
  const text = quantityText(context.unitSystem);
  try {
    const { kind, parsed } = parseCase(json, context);
    const solved = kind.solve(parsed, text);
    return {
      kind: kind.kind,
      title: parsed.title,
      input: parsed.input,
      result: solved.result,
      checks: solved.checks,
      warnings: solved.warnings,
      assumptions: solved.assumptions,
      report: kind.report(parsed, solved, text),
      ...(solved.sizing !== undefined ? { sizing: solved.sizing } : {}),
    };
  } catch (error) {
    // A refusal reads in the project's units, as the rest of the case does; the input stays as given.
    throw error instanceof InputError ? error.inUnits(text) : error;
  }
}
