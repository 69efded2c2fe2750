/**
 * Importing a schedule into a project, all or nothing: the file read (schedule-csv-read.ts), then
 * every run checked against the project as the pipe case it becomes (its service, condition set,
 * materials and pipe size must exist, and the case must be one the pipeline accepts), each problem
 * with its line and column. A re-import matches runs by reference: a changed run is updated (the
 * summary names the columns that changed), a new one added, and runs the file does not hold are
 * kept as they were, listed so the user sees them.
 */
import type { CaseContext } from '../cases/case-kind.js';
import { parseCase } from '../cases/solve-case.js';
import type { UnitSystem } from '../base/unit-systems.js';
import { columnHeader, SCHEDULE_COLUMNS, type ColumnKey } from './schedule-columns.js';
import { readScheduleCsv, MAX_PROBLEMS_LISTED, type ScheduleProblem } from './schedule-csv-read.js';
import type { ScheduleRun, ScheduleSettings } from './schedule-model.js';
import { asRunProblem, runCase, type MaterialIdOf } from './schedule-run-case.js';

export interface ImportSummary {
  readonly added: readonly string[];
  /** Each updated run with the columns (by name) whose values changed. */
  readonly changed: readonly { readonly reference: string; readonly columns: readonly string[] }[];
  readonly unchanged: number;
  /** Runs of the schedule the file does not hold: kept. */
  readonly kept: readonly string[];
}

export type ScheduleImport =
  | { readonly ok: true; readonly runs: readonly ScheduleRun[]; readonly summary: ImportSummary }
  | { readonly ok: false; readonly problems: readonly ScheduleProblem[]; readonly more: number };

/** Problems of one run against the project: null when its case is one the pipeline takes. */
export function runProblem(run: ScheduleRun, settings: ScheduleSettings, materialIdOf: MaterialIdOf, context: CaseContext): { column: string; message: string } | null {
  try {
    parseCase(runCase(run, settings, materialIdOf), context);
    return null;
  } catch (error) {
    const problem = asRunProblem(error);
    if (problem === null) throw error;
    return { column: problem.column, message: problem.message };
  }
}

export function importSchedule(
  text: string,
  existing: readonly ScheduleRun[],
  settings: ScheduleSettings,
  materialIdOf: MaterialIdOf,
  context: CaseContext,
): ScheduleImport {
  const read = readScheduleCsv(text);
  if (!read.ok) return limited(read.problems);
  const problems: ScheduleProblem[] = [];
  read.runs.forEach((run, i) => {
    const problem = runProblem(run, settings, materialIdOf, context);
    if (problem) problems.push({ line: read.lines[i]!, column: headerOf(problem.column, read.system), message: problem.message });
  });
  if (problems.length > 0) return limited(problems);
  return { ok: true, ...mergeRuns(existing, read.runs) };
}

/** A column named by its header as the file writes it ("wall thickness [mm]"). */
function headerOf(name: string, system: UnitSystem): string {
  const column = SCHEDULE_COLUMNS.find((c) => c.name === name);
  return column === undefined ? name : columnHeader(column, system);
}

function limited(problems: readonly ScheduleProblem[]): ScheduleImport {
  return { ok: false, problems: problems.slice(0, MAX_PROBLEMS_LISTED), more: Math.max(0, problems.length - MAX_PROBLEMS_LISTED) };
}

/** The schedule after a re-import: the file's runs (updated in place, new ones after), and the rest kept. */
export function mergeRuns(existing: readonly ScheduleRun[], incoming: readonly ScheduleRun[]): { runs: ScheduleRun[]; summary: ImportSummary } {
  const key = (r: ScheduleRun) => r.reference.toLowerCase();
  const byReference = new Map(incoming.map((r) => [key(r), r]));
  const added: string[] = [];
  const changed: { reference: string; columns: string[] }[] = [];
  const kept: string[] = [];
  let unchanged = 0;
  const runs: ScheduleRun[] = existing.map((old) => {
    const next = byReference.get(key(old));
    if (next === undefined) {
      kept.push(old.reference);
      return old;
    }
    const columns = changedColumns(old, next);
    if (columns.length === 0) unchanged++;
    else changed.push({ reference: next.reference, columns });
    return next;
  });
  const known = new Set(existing.map(key));
  for (const run of incoming) {
    if (known.has(key(run))) continue;
    added.push(run.reference);
    runs.push(run);
  }
  return { runs, summary: { added, changed, unchanged, kept } };
}

const valueOf = (run: ScheduleRun, k: ColumnKey): unknown => (k === 'valves' || k === 'flanges' || k === 'bends' ? run.fittings[k] : run[k]);

function changedColumns(a: ScheduleRun, b: ScheduleRun): string[] {
  return SCHEDULE_COLUMNS.filter((c) => valueOf(a, c.key) !== valueOf(b, c.key)).map((c) => c.name);
}
