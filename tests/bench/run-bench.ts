/**
 * npm run bench: solver timings on this machine, reported against baselines measured in the same
 * run (never asserted in a test). Prints:
 *  0. every example case through solveCase, as a ratio of the 3-layer conduction example;
 *  1. median solve time of a 3-layer wall and of a 2-layer pipe with temperature-dependent
 *     conductivity and a surface-temperature-dependent film (convection + radiation);
 *  2. time per unknown from 1e3 to 1e6 nodes (linear growth shows as a flat column);
 *  3. the band solver against ml-matrix's dense LU on the same tridiagonal systems (n = 250, 500, 1000);
 *  4. a 40-case project's report to PDF in Chromium (report-bench.ts);
 *  5. a pipe case sized across 12 thicknesses against one solveCase of it (sizing-bench.ts);
 *  6. a 500-run schedule sized in one go, and 2,500 to 10,000 runs with their peak heap (schedule-bench.ts).
 */
import { execFileSync } from 'node:child_process';
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { LuDecomposition, Matrix } from 'ml-matrix';
import { solveCase } from '../../app/index.js';
import { caseContext } from '../../main/cases/case-context.js';
import { BandedMatrix, solveBanded, solveSteady, type SteadyProblem } from '../../app/fe/index.js';
import { outerSurfaceExchange } from '../../app/physics/index.js';
import { reportBench } from './report-bench.js';
import { sizingBench } from './sizing-bench.js';
import { scheduleBench } from './schedule-bench.js';

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

/** Median wall-clock time of `work` in ms, after warm-up, over enough repeats to last ~`budgetMs`. */
function time(work: () => void, budgetMs = 400, maxRuns = 200): number {
  for (let i = 0; i < 3; i++) work();
  const samples: number[] = [];
  const start = performance.now();
  while (samples.length < maxRuns && (samples.length < 5 || performance.now() - start < budgetMs)) {
    const t0 = performance.now();
    work();
    samples.push(performance.now() - t0);
  }
  return median(samples);
}

const fmt = (ms: number) => (ms < 1 ? `${(ms * 1000).toFixed(1)} µs` : `${ms.toFixed(2)} ms`);

const wall: SteadyProblem = {
  geometry: { kind: 'planar' },
  layers: [
    { thickness: 0.1025, conductivity: { kind: 'constant', value: 0.77 } },
    { thickness: 0.1, conductivity: { kind: 'constant', value: 0.035 } },
    { thickness: 0.1, conductivity: { kind: 'constant', value: 0.19 } },
  ],
  inner: { kind: 'film', coefficient: 7.69, ambient: 20 },
  outer: { kind: 'film', coefficient: 25, ambient: -5 },
};

const film = outerSurfaceExchange({
  shape: { kind: 'pipe', orientation: 'horizontal', outerDiameter: 0.2743 },
  exposure: { kind: 'outdoor', windSpeed: 3 },
  method: { kind: 'correlations' },
  airTemperature: 5,
  emissivity: 0.13,
});
const pipe: SteadyProblem = {
  geometry: { kind: 'axisymmetric', innerRadius: 0.05355 },
  layers: [
    { thickness: 0.05, conductivity: { kind: 'polynomial', coefficients: [0.0337, 1.1e-4, 1.7e-7] } },
    { thickness: 0.05, conductivity: { kind: 'table', points: [[0, 0.036], [100, 0.046], [200, 0.062]] } },
  ],
  inner: { kind: 'temperature', temperature: 250 },
  outer: { kind: 'film', coefficient: (t) => film(t), ambient: 5 },
};

console.log(`Lamina solver benchmark — Node ${process.version}, ${new Date().toISOString()}\n`);

// 0. Every example through solveCase (parse, solve, checks, report), against the 3-layer constant
// conduction example, targets: pipe and flat at most 4×, walls at most 8×. Each timing runs in a
// process of its own (case-timing.ts): in one shared process the order of the cases changes their
// times (compiled code and garbage left by the case before). Baseline and case alternate five
// times and the fastest of each is compared: other work on the machine only ever adds time.
{
  const here = path.dirname(fileURLToPath(import.meta.url));
  const examplesDir = path.resolve(here, '..', '..', 'data', 'examples');
  const timing = path.join(here, 'case-timing.ts');
  const tsx = path.resolve(here, '..', '..', 'node_modules', 'tsx', 'dist', 'cli.mjs');
  const timeOf = (file: string) => Number(execFileSync(process.execPath, [tsx, timing, path.join(examplesDir, file)], { encoding: 'utf8' }));
  const context = caseContext(null);
  const baselineFile = 'conduction-cold-store-wall.json';
  console.log('0. Cases through solveCase, each in its own process, against the 3-layer constant conduction example (conduction-cold-store-wall)');
  console.log('   example                                   fastest      ratio  target   iterations / solves');
  for (const file of readdirSync(examplesDir).filter((f) => f.endsWith('.json')).sort()) {
    const solved = solveCase(JSON.parse(readFileSync(path.join(examplesDir, file), 'utf8')), context);
    const baseline: number[] = [];
    const own: number[] = [];
    for (let round = 0; round < 5; round++) {
      baseline.push(timeOf(baselineFile));
      own.push(timeOf(file));
    }
    const ratio = Math.min(...own) / Math.min(...baseline);
    const target = solved.kind === 'wall' ? 8 : solved.kind === 'conduction' ? null : 4;
    const r = solved.result as { iterations?: number; solves?: number };
    const work = solved.kind === 'wall' ? `${r.solves} engine solve(s)` : r.iterations !== undefined ? `${r.iterations} iteration(s)` : '';
    console.log(`   ${file.padEnd(42)} ${fmt(Math.min(...own) / 1000).padStart(9)}   ${ratio.toFixed(1).padStart(6)}×  ${target === null ? '    –' : `≤ ${target}×`.padStart(5)}   ${work}`);
  }
  console.log('');
}

const wallMs = time(() => solveSteady(wall));
const pipeResult = solveSteady(pipe);
const pipeMs = time(() => solveSteady(pipe));
console.log('1. Median solve time');
console.log(`   3-layer wall (linear, ${solveSteady(wall).mesh.nodeCount} nodes)                         ${fmt(wallMs)}`);
console.log(`   2-layer pipe, λ(T) + surface film (${pipeResult.mesh.nodeCount} nodes, ${pipeResult.iterations} iterations)   ${fmt(pipeMs)}  (${(pipeMs / wallMs).toFixed(1)}× the wall)\n`);

console.log('2. Time per unknown (one planar layer with heat generation, linear elements, fixed temperature and film)');
console.log('        nodes     solve time   per unknown   relative to 1e3');
let perUnknownBase = 0;
for (const n of [1e3, 1e4, 1e5, 1e6]) {
  const problem: SteadyProblem = {
    geometry: { kind: 'planar' },
    layers: [{ thickness: 1, conductivity: { kind: 'constant', value: 1 }, heatGeneration: 100, elements: n - 1 }],
    inner: { kind: 'temperature', temperature: 0 },
    outer: { kind: 'film', coefficient: 10, ambient: 0 },
    options: { order: 1 },
  };
  const ms = time(() => solveSteady(problem), n >= 1e6 ? 3000 : 600, n >= 1e6 ? 5 : 50);
  const per = (ms * 1e6) / n; // ns per unknown
  if (n === 1e3) perUnknownBase = per;
  console.log(`   ${n.toExponential(0).padStart(10)}   ${fmt(ms).padStart(11)}   ${per.toFixed(0).padStart(8)} ns   ${(per / perUnknownBase).toFixed(2).padStart(8)}×`);
}

console.log('\n3. Band solver versus ml-matrix dense LU (same diagonally dominant tridiagonal system)');
console.log('        n     band solve     dense LU solve     dense / band');
for (const n of [250, 500, 1000]) {
  const band = new BandedMatrix(n, 1);
  const dense = Matrix.zeros(n, n);
  for (let i = 0; i < n; i++) {
    band.set(i, i, 4);
    dense.set(i, i, 4);
    if (i > 0) {
      band.set(i, i - 1, -1);
      dense.set(i, i - 1, -1);
    }
    if (i < n - 1) {
      band.set(i, i + 1, -1);
      dense.set(i, i + 1, -1);
    }
  }
  const rhs = Array.from({ length: n }, (_, i) => Math.sin(i));
  const bandMs = time(() => solveBanded(band, rhs), 300);
  const denseMs = time(() => new LuDecomposition(dense).solve(Matrix.columnVector(rhs)), 1500, 30);
  console.log(`   ${String(n).padStart(6)}   ${fmt(bandMs).padStart(11)}   ${fmt(denseMs).padStart(15)}   ${(denseMs / bandMs).toFixed(0).padStart(10)}×`);
}

console.log('');
await reportBench();
sizingBench();
await scheduleBench();
