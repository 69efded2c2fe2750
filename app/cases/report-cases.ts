/**
 * Every case of a project through solveCase, in the project's units, as the printed report needs
 * them: a case that cannot be calculated (a material removed from the library since, a case file
 * from a newer Lamina) is reported by name with the sentence that says why, and the others still
 * print. Nothing is stored; each report is recomputed from the inputs.
 */
import { InputError } from '../base/input-error.js';
import { SingularProblemError } from '../fe/errors.js';
import type { ReportedCase } from '../report/project-report.js';
import type { CaseContext } from './case-kind.js';
import { solveCase } from './solve-case.js';

export interface StoredCase {
  readonly id: number;
  readonly name: string;
  readonly inputs: unknown;
}

export function reportCases(cases: readonly StoredCase[], context: CaseContext): ReportedCase[] {
  return cases.map((c) => {
    const kind = typeof (c.inputs as { kind?: unknown } | null)?.kind === 'string' ? String((c.inputs as { kind: string }).kind) : 'unknown';
    try {
      const solved = solveCase(c.inputs, context);
      return { id: c.id, name: c.name, kind: solved.kind, report: solved.report };
    } catch (error) {
      const reason = error instanceof InputError || error instanceof SingularProblemError ? error.message : `the calculation failed: ${(error as Error).message}`;
      return { id: c.id, name: c.name, kind, error: reason };
    }
  });
}
