/**
 * Benchmark section: a whole project's schedule sized in one go. 500 runs of the services and
 * condition sets of data/schedules/schedule-defaults.json (hot lines in rock wool, chilled and
 * cold ones in elastomeric foam; DN15 to DN200 steel, indoors and outdoors), each sized over its
 * material's thickness series (ten to twelve thicknesses, λ(θ) from the library, surface films
 * from the correlations), then solved at the chosen thickness and bare, as "Size all" does. The
 * baseline, measured in the same run, is one plain solve of a typical run's case: the ratio says
 * how many plain solves a schedule run costs. Target: 500 runs under 1 s on this machine
 * (reported, not asserted). Then 2,500, 5,000 and 10,000 runs: time and peak heap, which should
 * both grow in proportion to the runs. Run alone with `npx tsx tests/bench/schedule-bench.ts`.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { solveCase } from '../../app/index.js';
import type { ScheduleRun } from '../../app/schedules/schedule-model.js';
import { runCase } from '../../app/schedules/schedule-run-case.js';
import { sizeSchedule, withRememberedMaterials } from '../../app/schedules/size-schedule.js';
import { caseContext } from '../../main/cases/case-context.js';
import { openLamina } from '../../main/services/lamina-services.js';
import { defaultScheduleSettings } from '../../main/services/schedules-service.js';

const TARGET_SECONDS = 1;
const SIZES = ['DN15', 'DN20', 'DN25', 'DN32', 'DN40', 'DN50', 'DN65', 'DN80', 'DN100', 'DN150', 'DN200'];
/** m: a typical wall (from memory) for the sizes whose wall the shipped steel table does not give. */
const WALLS: Record<string, number> = { DN150: 0.0045, DN200: 0.0063 };
const TEMPERATURES: Record<string, number> = { 'heating flow': 80, 'heating return': 60, 'domestic hot water': 60, steam: 170, condensate: 95, 'chilled water': 6, 'domestic cold water': 10 };

/** `count` runs, the same for every machine: services, sizes and places in turn. */
export function benchRuns(count: number): ScheduleRun[] {
  const settings = defaultScheduleSettings();
  return Array.from({ length: count }, (_, i) => {
    const service = settings.services[i % settings.services.length]!.service;
    const location = settings.conditionSets[(i * 7) % settings.conditionSets.length]!.name;
    return {
      reference: `BENCH-${String(i + 1).padStart(5, '0')}`,
      service,
      pipeSeries: 'steel-iso',
      pipeSize: SIZES[(i * 3) % SIZES.length]!,
      wallThickness: WALLS[SIZES[(i * 3) % SIZES.length]!] ?? null,
      length: 5 + (i % 40),
      fluidTemperature: TEMPERATURES[service]! + ((i % 5) - 2),
      location,
      airTemperature: null,
      relativeHumidity: null,
      windSpeed: null,
      orientation: i % 4 === 0 ? 'vertical' : 'horizontal',
      material: null,
      thickness: null,
      fittings: { valves: i % 3, flanges: i % 4, bends: i % 5 },
    };
  });
}

export async function scheduleBench(): Promise<void> {
  const folder = fs.mkdtempSync(path.join(os.tmpdir(), 'lamina-schedule-bench-'));
  const lamina = await openLamina(path.join(folder, 'library.sqlite'));
  try {
    const settings = defaultScheduleSettings();
    const ids = new Map(lamina.materials.list({}).map((m) => [m.name.toLowerCase(), m.id]));
    const idOf = (name: string) => ids.get(name.toLowerCase());
    const context = caseContext(lamina.materials);
    const size = (runs: readonly ScheduleRun[]) => {
      let peak = process.memoryUsage().heapUsed;
      const t0 = performance.now();
      const { results } = sizeSchedule(runs, settings, idOf, context, { onProgress: (p) => { if (p.done % 100 === 0) peak = Math.max(peak, process.memoryUsage().heapUsed); } });
      return { seconds: (performance.now() - t0) / 1000, peak, results };
    };

    // Warm the engine (the JIT) on a schedule of its own, then the baseline: one plain solve.
    size(benchRuns(200));
    const typical = runCase(benchRuns(1)[0]!, settings, idOf, { thickness: 0.04, withoutSizing: true });
    const remembered = withRememberedMaterials(context);
    for (let i = 0; i < 200; i++) solveCase(typical, remembered);
    let plain = Infinity;
    for (let round = 0; round < 5; round++) {
      const t0 = performance.now();
      for (let i = 0; i < 200; i++) solveCase(typical, remembered);
      plain = Math.min(plain, (performance.now() - t0) / 200 / 1000);
    }

    const runs500 = benchRuns(500);
    let best = Infinity;
    let failed = 0;
    for (let round = 0; round < 3; round++) {
      const { seconds, results } = size(runs500);
      best = Math.min(best, seconds);
      failed = [...results.values()].filter((r) => !r.ok).length;
    }
    console.log('\n6. A schedule of 500 pipe runs sized in one go (each over its material\'s series, then solved at the choice and bare)');
    console.log(`   one plain solve of a typical run (baseline, same run): ${(plain * 1000).toFixed(2)} ms`);
    console.log(`   500 runs: ${best.toFixed(2)} s, ${(best / 500 * 1000).toFixed(2)} ms a run = ${(best / 500 / plain).toFixed(1)} plain solves a run; target under ${TARGET_SECONDS} s: ${best < TARGET_SECONDS ? 'met' : 'NOT met'} (${failed} runs could not be sized)`);

    const base = process.memoryUsage().heapUsed;
    for (const count of [2500, 5000, 10000]) {
      global.gc?.();
      const { seconds, peak } = size(benchRuns(count));
      console.log(`   ${String(count).padStart(6)} runs: ${seconds.toFixed(1)} s (${(seconds / count * 1000).toFixed(2)} ms a run), peak heap ${((peak - base) / 2 ** 20).toFixed(0)} MiB above the start (${((peak - base) / count / 1024).toFixed(1)} KiB a run)`);
    }
  } finally {
    lamina.close();
    fs.rmSync(folder, { recursive: true, force: true });
  }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) await scheduleBench();
