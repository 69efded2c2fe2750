/**
 * Benchmark section: one pipe case sized across a 12-thickness series, against one solveCase of
 * the same case without a sizing block. The pipe is the hot-water plant-room example (rock wool
 * with a temperature-dependent conductivity, surface film by the correlations); the criteria are
 * the touch limit and a heat-loss limit, so the time is the sweep's (no fluid along the run, no
 * freeze model). Target: the sized case at most 6× the plain one (reported, not asserted).
 *
 * Both are timed as section 0 times a case: each in a process of its own (case-timing.ts), the two
 * alternating five times, the fastest of each compared. Then, in this process, where the sized
 * case's time goes: the sweep's steady solves (warm started, as the sweep runs them, against the
 * same solves started cold, with their Newton iterations) and the rest (the case's own solve,
 * checks, report with its sizing section). Run alone with `npx tsx tests/bench/sizing-bench.ts`.
 */
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { solveCase } from '../../app/index.js';
import { SI_TEXT } from '../../app/base/quantity-text.js';
import { stackStart } from '../../app/cases/insulated/stack-start.js';
import { calculateValidatedPipe } from '../../app/cases/pipe/pipe-calculation.js';
import type { PipeInput } from '../../app/cases/pipe/pipe-input.js';
import { CASE_KINDS } from '../../app/cases/registry.js';
import { withLayerThickness } from '../../app/cases/sizing/sized-layers.js';
import type { SteadyStart } from '../../app/fe/steady-solve.js';
import { caseContext } from '../../main/cases/case-context.js';

const TARGET = 6;
const EXAMPLE = 'pipe-hot-water-plant-room.json';
/** m: 20 to 130 mm every 10 mm, twelve thicknesses; the case's own 50 mm is one of them (its own solve is reused). */
const SERIES = { kind: 'range', from: 0.02, to: 0.13, step: 0.01 } as const;
const SIZING = { layer: 0, series: SERIES, criteria: { maxSurfaceTemperature: {}, maxHeatLoss: { limit: 15 } } };

/**
 * The fastest time of each piece of work in µs, the pieces taking turns (so a burst of other work
 * on the machine falls on all of them alike) for `rounds` rounds after a warm-up of 50.
 */
function fastestMicros(works: readonly (() => void)[], rounds: number): number[] {
  for (let i = 0; i < 50; i++) for (const work of works) work();
  const best = works.map(() => Infinity);
  for (let round = 0; round < rounds; round++) {
    works.forEach((work, i) => {
      const t0 = performance.now();
      work();
      best[i] = Math.min(best[i]!, (performance.now() - t0) * 1000);
    });
  }
  return best;
}

const us = (micros: number) => (micros < 1000 ? `${micros.toFixed(0)} µs` : `${(micros / 1000).toFixed(2)} ms`);

export function sizingBench(): void {
  const here = path.dirname(fileURLToPath(import.meta.url));
  const plainFile = path.resolve(here, '..', '..', 'data', 'examples', EXAMPLE);
  const plain = JSON.parse(fs.readFileSync(plainFile, 'utf8')) as Record<string, unknown>;
  const sizedCase = { ...plain, sizing: SIZING };
  const folder = fs.mkdtempSync(path.join(os.tmpdir(), 'lamina-sizing-bench-'));
  try {
    const sizedFile = path.join(folder, 'sized.json');
    fs.writeFileSync(sizedFile, JSON.stringify(sizedCase));
    const context = caseContext(null);
    const solved = solveCase(sizedCase, context);
    const rows = solved.sizing?.rows.length ?? 0;
    const choice = solved.sizing?.choice;
    console.log(`5. Sizing: ${EXAMPLE.replace('.json', '')} across ${rows} thicknesses (20–130 mm; touch limit + heat loss ≤ 15 W/m), against one solveCase without sizing`);
    if (!solved.sizing || rows !== 12) {
      console.log(`   skipped: the sized case did not give 12 rows (got ${rows})\n`);
      return;
    }

    const timing = path.join(here, 'case-timing.ts');
    const tsx = path.resolve(here, '..', '..', 'node_modules', 'tsx', 'dist', 'cli.mjs');
    const timeOf = (file: string) => Number(execFileSync(process.execPath, [tsx, timing, file], { encoding: 'utf8' }));
    const plainTimes: number[] = [];
    const sizedTimes: number[] = [];
    for (let round = 0; round < 5; round++) {
      plainTimes.push(timeOf(plainFile));
      sizedTimes.push(timeOf(sizedFile));
    }
    const plainFastest = Math.min(...plainTimes);
    const sizedFastest = Math.min(...sizedTimes);
    const ratio = sizedFastest / plainFastest;
    console.log('   each in its own process, fastest of five             time      ratio  target');
    console.log(`   one solveCase, no sizing block                  ${us(plainFastest).padStart(9)}`);
    console.log(`   solveCase with the sizing block (${rows} rows)       ${us(sizedFastest).padStart(9)}   ${ratio.toFixed(1).padStart(6)}×   ≤ ${TARGET}×   ${ratio <= TARGET ? 'within target' : 'ABOVE TARGET'}`);
    console.log(`   chosen: ${choice?.kind === 'chosen' ? `${(choice.thickness * 1000).toFixed(0)} mm (${choice.governing})` : choice?.kind ?? '–'}`);

    // Where the time goes, in this process: the sweep's own solves, warm and cold.
    const kind = CASE_KINDS.find((k) => k.kind === 'pipe')!;
    const input = kind.parse(plain, context).input as PipeInput;
    const caseThickness = input.layers[0]!.thickness;
    const swept = solved.sizing.rows.map((r) => r.thickness).filter((t) => Math.abs(t - caseThickness) > 1e-9);
    const variant = (t: number): PipeInput => ({ ...input, layers: withLayerThickness(input.layers, 0, t) });
    const sweep = (warm: boolean) => {
      let start: SteadyStart | undefined = warm ? stackStart(calculateValidatedPipe(input, SI_TEXT).layers) : undefined;
      let iterations = 0;
      for (const t of swept) {
        const r = calculateValidatedPipe(variant(t), SI_TEXT, warm ? start : undefined);
        iterations += r.iterations;
        start = stackStart(r.layers);
      }
      return iterations;
    };
    const warmIterations = sweep(true);
    const coldIterations = sweep(false);
    const [plainMicros, sizedMicros, one, seededWarm, coldMicros] = fastestMicros(
      [() => solveCase(plain, context), () => solveCase(sizedCase, context), () => calculateValidatedPipe(input, SI_TEXT), () => sweep(true), () => sweep(false)],
      300,
    ) as [number, number, number, number, number];
    const warmMicros = seededWarm - one; // less the case's own solve that seeds it
    const rest = sizedMicros - warmMicros;
    console.log(`   in this process (fastest of 300 turns): solveCase without sizing ${us(plainMicros)} (of which the steady solve ${us(one)}), with sizing ${us(sizedMicros)}`);
    console.log(`     the sweep's ${swept.length} steady solves, warm started   ${us(warmMicros).padStart(9)}  ${String(warmIterations).padStart(3)} Newton iterations  ${((100 * warmMicros) / sizedMicros).toFixed(0)} % of the sized case`);
    console.log(`     the same solves started cold           ${us(coldMicros).padStart(9)}  ${String(coldIterations).padStart(3)} Newton iterations`);
    console.log(`     the rest (parse, own solve, checks, report)  ${us(rest).padStart(9)}\n`);
  } finally {
    fs.rmSync(folder, { recursive: true, force: true });
  }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) sizingBench();
