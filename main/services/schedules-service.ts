/**
 * A project's schedule of pipe runs in the library: its settings (condition sets, services,
 * economics; the shipped defaults until edited), its runs and each run's last sizing. Imports are
 * all or nothing in one transaction; a run edited on its own is checked as the case it becomes
 * before it is stored; sizing stores each result with the case it was sized from, so only runs
 * whose case changed are sized again. The meaning of it all is the engine's (app/schedules).
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { InputError } from '../../app/base/input-error.js';
import { billOfQuantities, parseFittingAllowances, type BillOfQuantities, type FittingAllowances } from '../../app/schedules/bill-of-quantities.js';
import { importSchedule, runProblem } from '../../app/schedules/schedule-import.js';
import type { Schedule, ScheduleImportOutcome } from '../../app/api/schedule-types.js';
import type { UnitSystem } from '../../app/base/unit-systems.js';
import type { ScheduleRun, ScheduleSettings } from '../../app/schedules/schedule-model.js';
import { writeBillCsv, writeScheduleCsv } from '../../app/schedules/schedule-csv-write.js';
import { parseScheduleSettings } from '../../app/schedules/schedule-settings.js';
import { runFromObject } from '../../app/schedules/run-object.js';
import { sizedRunFromObject } from '../../app/schedules/sized-run-object.js';
import { upToDateSizing } from '../../app/schedules/up-to-date-sizing.js';
import { caseKeyOf, runsToResize, sizeSchedule, type KeyedSizedRun, type SizingProgress } from '../../app/schedules/size-schedule.js';
import type { MaterialIdOf } from '../../app/schedules/schedule-run-case.js';
import { caseContext } from '../cases/case-context.js';
import { inWriteTransaction, type DatabaseContext } from './database-context.js';
import type { MaterialsService } from './materials-service.js';
import { NotFoundError } from './service-errors.js';
import { requireId } from './validate.js';

const DATA = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..', 'data', 'schedules');
let defaults: ScheduleSettings | undefined;
let allowances: FittingAllowances | undefined;

/** The settings a project starts with (data/schedules/schedule-defaults.json). */
export function defaultScheduleSettings(): ScheduleSettings {
  defaults ??= parseScheduleSettings(JSON.parse(readFileSync(path.join(DATA, 'schedule-defaults.json'), 'utf8')), 'schedule-defaults.json');
  return defaults;
}

/** m of insulated pipe per fitting (data/schedules/fitting-allowances.csv). */
export function fittingAllowances(): FittingAllowances {
  allowances ??= parseFittingAllowances(readFileSync(path.join(DATA, 'fitting-allowances.csv'), 'utf8'));
  return allowances;
}

export type { Schedule, ScheduleImportOutcome } from '../../app/api/schedule-types.js';

interface RunRow {
  readonly reference: string;
  readonly run: string;
  readonly sizing: string | null;
}

export class SchedulesService {
  constructor(
    private readonly context: DatabaseContext,
    private readonly materials: MaterialsService,
  ) {}

  private get db() {
    return this.context.db;
  }

  /** Library id by material name (case-insensitive), for the runs' materials. */
  private materialIdOf(): MaterialIdOf {
    const byName = new Map(this.materials.list({}).map((m) => [m.name.toLowerCase(), m.id]));
    return (name) => byName.get(name.toLowerCase());
  }

  private projectRow(projectId: number): { unit_system: UnitSystem; schedule_settings: string | null } {
    const id = requireId(projectId, 'projectId');
    const row = this.db.prepare('SELECT unit_system, schedule_settings FROM projects WHERE id = ? AND deleted_at IS NULL').get(id) as { unit_system: UnitSystem; schedule_settings: string | null } | undefined;
    if (!row) throw new NotFoundError(`There is no project with id ${id}.`);
    return row;
  }

  settingsOf(projectId: number): ScheduleSettings {
    const row = this.projectRow(projectId);
    return row.schedule_settings === null ? defaultScheduleSettings() : parseScheduleSettings(JSON.parse(row.schedule_settings));
  }

  get(projectId: number): Schedule {
    const row = this.projectRow(projectId);
    const settings = this.settingsOf(projectId);
    const rows = this.db.prepare('SELECT reference, run, sizing FROM schedule_runs WHERE project_id = ? ORDER BY position').all(projectId) as RunRow[];
    const runs = rows.map((r) => JSON.parse(r.run) as ScheduleRun);
    const sizing: Record<string, KeyedSizedRun> = {};
    rows.forEach((r, i) => {
      if (r.sizing !== null) sizing[runs[i]!.reference] = JSON.parse(r.sizing) as KeyedSizedRun;
    });
    const stale = runsToResize(runs, new Map(Object.entries(sizing)), settings, this.materialIdOf()).map((r) => r.reference);
    return { projectId, unitSystem: row.unit_system, settings, runs, sizing, stale };
  }

  setSettings(projectId: number, settings: unknown): ScheduleSettings {
    this.projectRow(projectId);
    const checked = parseScheduleSettings(settings);
    inWriteTransaction(this.context, () => {
      this.db.prepare('UPDATE projects SET schedule_settings = ? WHERE id = ?').run(JSON.stringify(checked), projectId);
    });
    return checked;
  }

  /** Imports a CSV schedule: every row good, or nothing changes. */
  importCsv(projectId: number, text: unknown): ScheduleImportOutcome {
    if (typeof text !== 'string') throw new InputError('text', 'text must be the CSV file as text.');
    const existing = this.get(projectId);
    const outcome = importSchedule(text, existing.runs, existing.settings, this.materialIdOf(), caseContext(this.materials));
    if (!outcome.ok) return outcome;
    inWriteTransaction(this.context, () => this.storeRuns(projectId, outcome.runs, existing.sizing));
    return { ok: true, summary: outcome.summary, runs: outcome.runs.length };
  }

  /** One run edited in the grid: checked as the case it becomes, then stored in place of the one with its old reference. */
  updateRun(projectId: number, reference: unknown, run: unknown): ScheduleRun {
    const schedule = this.get(projectId);
    if (typeof reference !== 'string') throw new InputError('reference', 'reference must be the line reference of a run of the schedule.');
    const index = schedule.runs.findIndex((r) => r.reference.toLowerCase() === reference.toLowerCase());
    if (index < 0) throw new NotFoundError(`The schedule of project ${projectId} has no run '${reference}'.`);
    const checked = runFromObject(run);
    if (checked.reference.toLowerCase() !== reference.toLowerCase() && schedule.runs.some((r) => r.reference.toLowerCase() === checked.reference.toLowerCase())) {
      throw new InputError('reference', `reference '${checked.reference}' is already the reference of another run; each run needs its own.`);
    }
    const problem = runProblem(checked, schedule.settings, this.materialIdOf(), caseContext(this.materials));
    if (problem) throw new InputError(problem.column, problem.message);
    // One row rewritten in place; its last sizing stays and reads as stale through its caseKey.
    inWriteTransaction(this.context, () => {
      this.db.prepare('UPDATE schedule_runs SET reference = ?, run = ? WHERE project_id = ? AND reference = ?').run(checked.reference, JSON.stringify(checked), projectId, schedule.runs[index]!.reference);
    });
    return checked;
  }

  removeRuns(projectId: number, references: unknown): number {
    this.projectRow(projectId);
    if (!Array.isArray(references) || references.some((r) => typeof r !== 'string')) throw new InputError('references', 'references must be a list of line references.');
    return inWriteTransaction(this.context, () => references.reduce((n, r: string) => n + this.db.prepare('DELETE FROM schedule_runs WHERE project_id = ? AND reference = ?').run(projectId, r).changes, 0));
  }

  private storeRuns(projectId: number, runs: readonly ScheduleRun[], sizing: Readonly<Record<string, KeyedSizedRun>>): void {
    this.db.prepare('DELETE FROM schedule_runs WHERE project_id = ?').run(projectId);
    const insert = this.db.prepare('INSERT INTO schedule_runs (project_id, reference, position, run, sizing) VALUES (?, ?, ?, ?, ?)');
    runs.forEach((run, i) => {
      const kept = sizing[run.reference];
      insert.run(projectId, run.reference, i, JSON.stringify(run), kept === undefined ? null : JSON.stringify(kept));
    });
  }

  /**
   * Sizes the runs whose case changed since their last sizing (all of them with `all`), storing
   * each result as it comes; `onProgress` after each run, `cancelled` checked between runs.
   */
  size(projectId: number, options: { readonly all?: boolean; readonly onProgress?: (p: SizingProgress) => void; readonly cancelled?: () => boolean } = {}): { sized: number; complete: boolean } {
    const schedule = this.get(projectId);
    const stale = new Set(schedule.stale);
    const toSize = options.all ? schedule.runs : schedule.runs.filter((r) => stale.has(r.reference));
    const { results, complete } = sizeSchedule(toSize, schedule.settings, this.materialIdOf(), caseContext(this.materials), options);
    inWriteTransaction(this.context, () => {
      const update = this.db.prepare('UPDATE schedule_runs SET sizing = ? WHERE project_id = ? AND reference = ?');
      for (const [reference, result] of results) update.run(JSON.stringify(result), projectId, reference);
    });
    return { sized: results.size, complete };
  }

  /**
   * Stores sizings made elsewhere (the app sizes in its worker, off the main thread): each is kept
   * only when it was sized from the run's current case (its caseKey); the others are dropped as
   * out of date. Returns how many were stored.
   */
  storeSizing(projectId: number, results: unknown): number {
    if (!Array.isArray(results)) throw new InputError('results', 'results must be a list of sized runs.');
    const schedule = this.get(projectId);
    const materialIdOf = this.materialIdOf();
    const current = new Map(schedule.runs.map((r) => [r.reference.toLowerCase(), caseKeyOf(r, schedule.settings, materialIdOf)]));
    const fresh = results.map((r, i) => sizedRunFromObject(r, `results[${i}]`)).filter((r) => current.get(r.reference.toLowerCase()) === r.caseKey);
    inWriteTransaction(this.context, () => {
      const update = this.db.prepare('UPDATE schedule_runs SET sizing = ? WHERE project_id = ? AND reference = ?');
      for (const result of fresh) update.run(JSON.stringify(result), projectId, result.reference);
    });
    return fresh.length;
  }

  /** Library ids of the materials by name, as the schedule's runs name them (for sizing in the app's worker). */
  materialIds(): Record<string, number> {
    return Object.fromEntries(this.materials.list({}).map((m) => [m.name, m.id]));
  }

  bill(projectId: number): BillOfQuantities {
    return this.billOf(this.get(projectId));
  }

  /** The bill of a schedule already read (its up-to-date sizings only). */
  billOf(schedule: Schedule): BillOfQuantities {
    return billOfQuantities(schedule.runs, upToDateSizing(schedule.sizing, schedule.stale), fittingAllowances(), schedule.settings.economics);
  }

  exportCsv(projectId: number): string {
    const schedule = this.get(projectId);
    const fresh = upToDateSizing(schedule.sizing, schedule.stale);
    return writeScheduleCsv(schedule.runs, schedule.unitSystem, fresh.size > 0 ? fresh : undefined);
  }

  /** The bill of quantities as CSV in the project's units. */
  billCsv(projectId: number): string {
    return writeBillCsv(this.bill(projectId), this.projectRow(projectId).unit_system);
  }

  /** An empty schedule in the project's units, with the header only. */
  template(projectId: number): string {
    return writeScheduleCsv([], this.projectRow(projectId).unit_system);
  }
}
