/**
 * A project's schedule of pipe runs as the API carries it (pure declarations; the Node side's
 * SchedulesService stores and checks it, app/schedules gives it meaning). Values are SI.
 */
import type { UnitSystem } from '../base/unit-systems.js';
import type { ImportSummary } from '../schedules/schedule-import.js';
import type { ScheduleProblem } from '../schedules/schedule-csv-read.js';
import type { ScheduleRun, ScheduleSettings } from '../schedules/schedule-model.js';
import type { KeyedSizedRun } from '../schedules/size-schedule.js';

export type { ImportSummary } from '../schedules/schedule-import.js';
export type { ScheduleProblem } from '../schedules/schedule-csv-read.js';
export type { ConditionSet, ScheduleEconomics, ScheduleRun, ScheduleSettings, ServiceRule } from '../schedules/schedule-model.js';
export type { KeyedSizedRun } from '../schedules/size-schedule.js';
export type { SizedRun } from '../schedules/size-run.js';

export interface Schedule {
  readonly projectId: number;
  readonly unitSystem: UnitSystem;
  readonly settings: ScheduleSettings;
  readonly runs: readonly ScheduleRun[];
  /** The last sizing of each run, by reference; absent for a run never sized. */
  readonly sizing: Readonly<Record<string, KeyedSizedRun>>;
  /** References of runs whose case changed since they were sized (or never were). */
  readonly stale: readonly string[];
}

/** The schedule with the library's material ids by name, which the page's sizing worker needs. */
export type OpenedSchedule = Schedule & { readonly materialIds: Readonly<Record<string, number>> };

/** An import: the summary of what changed, or every problem (line, column, sentence) and nothing imported. */
export type ScheduleImportOutcome =
  | { readonly ok: true; readonly summary: ImportSummary; readonly runs: number }
  | { readonly ok: false; readonly problems: readonly ScheduleProblem[]; readonly more: number };
