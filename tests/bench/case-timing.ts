/**
 * One example through solveCase, timed in a process of its own (so no other case's code or garbage
 * shares its engine): after warm-up, the fastest of 20 batches, printed in microseconds per solve.
 * Used by run-bench.ts; `npx tsx tests/bench/case-timing.ts data/examples/X.json`.
 */
import { readFileSync } from 'node:fs';
import { solveCase } from '../../app/index.js';
import { caseContext } from '../../main/cases/case-context.js';

const json = JSON.parse(readFileSync(process.argv[2]!, 'utf8')) as unknown;
const context = caseContext(null);
for (let i = 0; i < 300; i++) solveCase(json, context);
let fastest = Infinity;
for (let batch = 0; batch < 20; batch++) {
  const t0 = performance.now();
  for (let i = 0; i < 50; i++) solveCase(json, context);
  fastest = Math.min(fastest, ((performance.now() - t0) / 50) * 1000);
}
process.stdout.write(`${fastest}\n`);
