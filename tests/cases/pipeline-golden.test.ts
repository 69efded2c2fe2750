/**
 * solveCase against the figures of the pipeline it replaced: every example in data/examples,
 * solved through solveCase, gives every result field the previous pipeline gave (recorded in
 * tests/cases/golden/ by running that pipeline, commit 9ec90f5, on the same engine) to 1e-9
 * relative (an example with a sizing block and no golden file: the same case without the block).
 * Values below 1e-12 in magnitude on both sides count as equal (round-off around zero,
 * e.g. a condensation rate of 0 against 1e-20). Sentences are compared for presence only: verdict
 * reasons were reworded on purpose. The answer is plain JSON: it survives a round trip.
 */
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { solveCase } from '../../app/index.js';
import { caseContext } from '../../main/cases/case-context.js';

const root = path.resolve(__dirname, '..', '..');
const examples = readdirSync(path.join(root, 'data', 'examples')).filter((f) => f.endsWith('.json'));

/** Paths where the two disagree beyond the tolerance, or where the new result lacks a field. */
function differences(recorded: unknown, now: unknown, where: string, out: string[]): string[] {
  if (typeof recorded === 'number' && typeof now === 'number') {
    const scale = Math.max(Math.abs(recorded), Math.abs(now));
    if (scale > 1e-12 && Math.abs(recorded - now) > 1e-9 * scale) out.push(`${where}: ${recorded} then, ${now} now`);
  } else if (Array.isArray(recorded)) {
    if (!Array.isArray(now) || now.length !== recorded.length) out.push(`${where}: list of ${recorded.length} then`);
    else recorded.forEach((r, i) => differences(r, now[i], `${where}[${i}]`, out));
  } else if (recorded !== null && typeof recorded === 'object') {
    if (now === null || typeof now !== 'object') out.push(`${where}: object then`);
    else for (const [k, v] of Object.entries(recorded)) differences(v, (now as Record<string, unknown>)[k], `${where}.${k}`, out);
  } else if (typeof recorded === 'string') {
    // Sentences were reworded on purpose (plain verdicts, margins with their units); figures were not.
    if (typeof now !== 'string') out.push(`${where}: text then, ${JSON.stringify(now)} now`);
  } else if (recorded !== now) out.push(`${where}: ${JSON.stringify(recorded)} then, ${JSON.stringify(now)} now`);
  return out;
}

describe('solveCase on every example', () => {
  for (const file of examples) {
    it(`${file}: the same result as the previous pipeline, plus report, warnings and assumptions`, () => {
      const json = JSON.parse(readFileSync(path.join(root, 'data', 'examples', file), 'utf8'));
      const solved = solveCase(json, caseContext(null));
      // Through JSON, as every caller receives it (Infinity for a vapour-tight μ is not in results).
      const wire = JSON.parse(JSON.stringify(solved));
      const goldenFile = path.join(root, 'tests', 'cases', 'golden', file);
      if (existsSync(goldenFile)) {
        const golden = JSON.parse(readFileSync(goldenFile, 'utf8'));
        expect(solved.kind).toBe(golden.kind);
        expect(differences(golden.result, wire.result, 'result', [])).toEqual([]);
      } else {
        // The sizing examples came after that pipeline: the plain result of a case with a sizing
        // block must be the same case solved without it (sizing adds a table, it changes nothing).
        expect(json.sizing, `${file} has no golden file; only a sizing example may lack one`).toBeDefined();
        const { sizing: _sizing, ...plain } = json;
        const without = JSON.parse(JSON.stringify(solveCase(plain, caseContext(null))));
        expect(wire.sizing).toBeDefined();
        expect(differences(without.result, wire.result, 'result', [])).toEqual([]);
      }
      expect(Array.isArray(wire.warnings) && Array.isArray(wire.assumptions) && Array.isArray(wire.checks)).toBe(true);
      expect(wire.report.title).toBe(solved.title);
      expect(wire.report.verdicts).toHaveLength(solved.checks.length);
    });
  }
});
