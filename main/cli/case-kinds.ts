/**
 * The case kinds `lamina solve` understands: each parses its file format, solves it, and renders
 * the result as JSON and as a readable text summary. Adding a case kind means adding one entry here.
 */
import { isObject } from '../../app/cases/case-fields.js';
import { parseConductionCaseFile } from '../../app/cases/conduction-case-file.js';
import { solveSteady, solveTransient } from '../../app/fe/index.js';
import type { MaterialProperties } from '../../app/materials/material-properties.js';
import { conductionSteadyText, conductionTransientText } from './format/conduction-text.js';

export interface SolvedCase {
  readonly json: unknown;
  readonly text: () => string;
}

export interface CaseKind {
  readonly kind: string;
  readonly summary: string;
  readonly solve: (json: unknown, resolveMaterial: (id: number) => MaterialProperties | undefined) => SolvedCase;
}

const conduction: CaseKind = {
  kind: 'conduction',
  summary: 'layers and face conditions given directly (steady or transient)',
  solve(json) {
    const parsed = parseConductionCaseFile(json);
    if (parsed.analysis === 'steady') {
      const result = solveSteady(parsed.problem);
      return { json: { kind: 'conduction', title: parsed.title, analysis: 'steady', result }, text: () => conductionSteadyText(parsed.title, result) };
    }
    const result = solveTransient(parsed.problem);
    return { json: { kind: 'conduction', title: parsed.title, analysis: 'transient', result }, text: () => conductionTransientText(parsed.title, result) };
  },
};

export const CASE_KINDS: readonly CaseKind[] = [conduction];

/** The case kind a parsed file declares, or a one-sentence reason it has none we know. */
export function caseKindOf(json: unknown): CaseKind | string {
  if (!isObject(json)) return 'the case file must hold a JSON object.';
  const kind = CASE_KINDS.find((k) => k.kind === json['kind']);
  return kind ?? `kind must be one of ${CASE_KINDS.map((k) => `"${k.kind}"`).join(', ')}; got ${JSON.stringify(json['kind'])}.`;
}
