/**
 * Every run of a schedule sized, one after another, with progress told after each run and a way
 * to stop between runs (the caller's worker checks a flag): a schedule of hundreds of runs must
 * leave the screen responsive and be cancellable. Materials are resolved once per schedule, not
 * once per solve. Each result carries the case it was sized from (`caseKey`), so a run whose
 * inputs or project settings change is re-sized alone and an unchanged one keeps its result.
 */
import type { CaseContext } from '../cases/case-kind.js';
import type { MaterialResolver } from '../cases/case-material.js';
import type { ScheduleRun, ScheduleSettings } from './schedule-model.js';
import { asRunProblem, runCase, type MaterialIdOf } from './schedule-run-case.js';
import { sizeRun, type SizedRun } from './size-run.js';

export interface SizingProgress {
  readonly done: number;
  readonly total: number;
}

/** The key of what a run is sized from: its pipe case (run and project settings together). */
export function caseKeyOf(run: ScheduleRun, settings: ScheduleSettings, materialIdOf: MaterialIdOf): string {
  try {
    return JSON.stringify(runCase(run, settings, materialIdOf));
  } catch (error) {
    if (asRunProblem(error) === null) throw error;
    return `problem:${JSON.stringify(run)}:${JSON.stringify(settings)}`;
  }
}

/** A context whose material lookups are remembered for the length of one schedule's sizing. */
export function withRememberedMaterials(context: CaseContext): CaseContext {
  const remembered = new Map<number, ReturnType<MaterialResolver>>();
  return {
    ...context,
    resolveMaterial: (id) => {
      if (!remembered.has(id)) remembered.set(id, context.resolveMaterial(id));
      return remembered.get(id);
    },
  };
}

export type KeyedSizedRun = SizedRun & { readonly caseKey: string };

/**
 * Sizes `runs` (all, or the changed ones), calling `onProgress` after each and stopping early
 * when `cancelled()` turns true; returns the results so far, by reference.
 */
export function sizeSchedule(
  runs: readonly ScheduleRun[],
  settings: ScheduleSettings,
  materialIdOf: MaterialIdOf,
  context: CaseContext,
  options: { readonly onProgress?: (p: SizingProgress) => void; readonly cancelled?: () => boolean } = {},
): { readonly results: Map<string, KeyedSizedRun>; readonly complete: boolean } {
  const remembering = withRememberedMaterials(context);
  const results = new Map<string, KeyedSizedRun>();
  for (let i = 0; i < runs.length; i++) {
    if (options.cancelled?.()) return { results, complete: false };
    const run = runs[i]!;
    results.set(run.reference, { ...sizeRun(run, settings, materialIdOf, remembering), caseKey: caseKeyOf(run, settings, materialIdOf) });
    options.onProgress?.({ done: i + 1, total: runs.length });
  }
  return { results, complete: true };
}

/** The runs whose stored result is missing or was sized from other inputs. */
export function runsToResize(runs: readonly ScheduleRun[], stored: ReadonlyMap<string, { readonly caseKey: string }>, settings: ScheduleSettings, materialIdOf: MaterialIdOf): ScheduleRun[] {
  return runs.filter((r) => stored.get(r.reference)?.caseKey !== caseKeyOf(r, settings, materialIdOf));
}
