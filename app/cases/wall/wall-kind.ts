/**
 * The wall kind: a wall or roof build-up. ISO 6946 U-value and temperatures at the design
 * condition; mould and inside-surface condensation (ISO 13788 temperature factor); interstitial
 * condensation at the design condition and, with a monthly climate, over a year. Each thermal
 * state is solved once and shared by the checks (wall-analysis.ts).
 */
import type { CaseKind } from '../case-kind.js';
import { analyseWall, validateWallCase, type WallAnalysis } from './wall-analysis.js';
import { parseWallCaseFile } from './wall-case-file.js';
import type { WallInput } from './wall-input.js';
import { wallReport } from './wall-report.js';

export const wallKind: CaseKind<WallInput, WallAnalysis> = {
  kind: 'wall',
  summary: 'a wall or roof build-up: U-value, temperatures, mould and condensation checks',
  parse(json, context) {
    const input = parseWallCaseFile(json, context.resolveMaterial);
    validateWallCase(input);
    return { title: input.name ?? 'Wall or roof', input, assumptions: [] };
  },
  solve({ input }) {
    const result = analyseWall(input);
    return { result, checks: result.checks, warnings: [], assumptions: [] };
  },
  report(parsed, solved) {
    return wallReport(parsed.input, solved.result);
  },
};
