/**
 * One example through solveCase, timed in a process of its own (so no other case's code or garbage
 * shares its engine): after warm-up, the fastest of up to 20 batches, printed in microseconds per
 * solve. Used by run-bench.ts; `npx tsx tests/bench/case-timing.ts data/examples/X.json`.
 *
 * The work is bounded by time as well as by count, so that a slow case (a transient solve takes
 * some 10 ms) does not hold the bench for minutes: warm-up is 300 solves or one second, a batch
 * is 50 solves or about 50 ms, and batches stop after two seconds once five are done. A case
 * faster than about 1 ms per solve reaches every count limit first, so it is timed exactly as by
 * the fixed 300 + 20 × 50 solves before.
 */
import { readFileSync } from 'node:fs';
import { solveCase } from '../../app/index.js';
import { caseContext } from '../../main/cases/case-context.js';

const WARM_UP_SOLVES = 300;
const WARM_UP_MS = 1000;
const BATCH_SOLVES = 50;
const BATCH_MS = 50;
const BATCHES = 20;
const MIN_BATCHES = 5;
const BATCHES_MS = 2000;

const json = JSON.parse(readFileSync(process.argv[2]!, 'utf8')) as unknown;
const context = caseContext(null);

const warmUpStart = performance.now();
let warmUps = 0;
while (warmUps < WARM_UP_SOLVES && (warmUps < MIN_BATCHES || performance.now() - warmUpStart < WARM_UP_MS)) {
  solveCase(json, context);
  warmUps++;
}
const warmUpMsPerSolve = (performance.now() - warmUpStart) / warmUps;
const batchSolves = Math.max(1, Math.min(BATCH_SOLVES, Math.round(BATCH_MS / warmUpMsPerSolve)));

let fastest = Infinity;
const batchesStart = performance.now();
for (let batch = 0; batch < BATCHES && (batch < MIN_BATCHES || performance.now() - batchesStart < BATCHES_MS); batch++) {
  const t0 = performance.now();
  for (let i = 0; i < batchSolves; i++) solveCase(json, context);
  fastest = Math.min(fastest, ((performance.now() - t0) / batchSolves) * 1000);
}
process.stdout.write(`${fastest}\n`);
