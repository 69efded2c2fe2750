/**
 * The conduction kind: a 1D problem written out directly (layers with conductivity models, face
 * conditions), steady or transient. Its checks are none; its warnings say where the inputs are
 * used beyond what backs them.
 */
import { solveSteady } from '../../fe/steady-solve.js';
import { solveTransient } from '../../fe/transient-solve.js';
import type { SteadyResult, TransientResult } from '../../fe/result.js';
import type { CaseKind } from '../case-kind.js';
import { parseConductionCaseFile, type ConductionCase } from './conduction-case-file.js';
import { conductionReport } from './conduction-report.js';
import { conductionWarnings } from './conduction-warnings.js';

export const conductionKind: CaseKind<ConductionCase, SteadyResult | TransientResult> = {
  kind: 'conduction',
  summary: 'layers and face conditions given directly (steady or transient)',
  parse(json) {
    const parsed = parseConductionCaseFile(json);
    return { title: parsed.title, input: parsed, assumptions: [] };
  },
  solve({ input }, text) {
    if (input.analysis === 'steady') {
      const result = solveSteady(input.problem);
      return { result, checks: [], warnings: conductionWarnings(input.problem, result.positions, [result.temperatures], text), assumptions: [] };
    }
    const result = solveTransient(input.problem);
    return { result, checks: [], warnings: conductionWarnings(input.problem, result.positions, result.temperatures, text), assumptions: [] };
  },
  report({ title, input }, { result, warnings }, text) {
    return conductionReport(title, input.problem, input.analysis, result, warnings, text);
  },
};
