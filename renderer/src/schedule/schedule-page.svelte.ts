/**
 * The open project's schedule of pipe runs: what the Node side stores (runs, settings, last
 * sizings, which runs are stale), the import's problems, each row's refusal kept beside it with
 * the value as typed, and the sizing in the worker. Sizing covers only the stale runs, so an
 * edited row is sized again alone (started by itself once the edit is stored); results are stored
 * in chunks as they come, so Cancel keeps what was done.
 */
import { upToDateSizing } from '../../../app/schedules/up-to-date-sizing.js';
import type { PipeSize } from '../../../app/index.js';
import type { KeyedSizedRun, Material, OpenedSchedule, ScheduleImportOutcome, ScheduleProblem, ScheduleRun, UnitSystem } from '../../../app/api/contract.js';
import { laminaApi, messageOf } from '../bridge/lamina-api.js';
import type { GridRow } from './grid-columns.js';
import { ScheduleSizeClient } from './size-client.js';

export interface ScheduleNotice {
  readonly kind: 'done' | 'refused';
  readonly text: string;
}

/** A row the Node side refused: the column and the engine's sentence. */
export interface RowRefusal {
  readonly column: string;
  readonly message: string;
}

/** Results stored per request while sizing (a cancel keeps every chunk already stored). */
const STORE_CHUNK = 25;
/** The grid and the bar take the worker's news at most this often (ms), so typing meanwhile stays quick. */
const SHOW_EVERY = 150;

export class SchedulePage {
  schedule = $state.raw<OpenedSchedule | undefined>(undefined);
  notice = $state<ScheduleNotice | undefined>(undefined);
  /** The last import's problems (nothing was imported), with the file's name. */
  problems = $state.raw<{ readonly fileName: string; readonly list: readonly ScheduleProblem[]; readonly more: number } | undefined>(undefined);
  /** Runs as typed that the Node side refused, by reference, kept for correction. */
  drafts = $state.raw<ReadonlyMap<string, ScheduleRun>>(new Map());
  refusals = $state.raw<ReadonlyMap<string, RowRefusal>>(new Map());
  progress = $state<{ done: number; total: number; cancelling: boolean } | undefined>(undefined);
  busy = $state(false);
  private library: { materials: readonly Material[]; pipeSizes: readonly PipeSize[] } | undefined;
  private readonly sizer = new ScheduleSizeClient();
  private storing: Promise<void> = Promise.resolve();
  private resizeAfter = false;

  /** `units`: the project's units as its editor holds them now (each run's reason reads in them). */
  constructor(readonly projectId: number, private readonly units: () => UnitSystem) {}



  /** The grid's rows: each run (as typed, where refused) with its sizing. */
  rows(): GridRow[] {
    const s = this.schedule;
    if (!s) return [];
    const stale = new Set(s.stale);
    return s.runs.map((stored) => {
      const run = this.drafts.get(stored.reference) ?? stored;
      return { key: stored.reference, run, sized: s.sizing[stored.reference], stale: stale.has(stored.reference) || run !== stored };
    });
  }

  /** The sizings that are for their runs' current inputs (the bill counts only these). */
  freshSizing(): Map<string, KeyedSizedRun> {
    return this.schedule ? upToDateSizing(this.schedule.sizing, this.schedule.stale) : new Map();
  }

  async open(): Promise<void> {
    try {
      this.schedule = await laminaApi().schedules.open({ projectId: this.projectId });
    } catch (error) {
      this.refuse(`The schedule could not be read: ${messageOf(error)}`);
    }
  }

  dispose(): void {
    this.sizer.dispose();
  }

  async importFile(fileName: string, text: string): Promise<void> {
    if (this.progress) return this.refuse('Wait for the sizing to finish (or cancel it) before importing.');
    this.busy = true;
    try {
      const outcome: ScheduleImportOutcome = await laminaApi().schedules.importCsv({ projectId: this.projectId, text: text.replace(/^\uFEFF/, '') });
      if (!outcome.ok) {
        this.problems = { fileName, list: outcome.problems, more: outcome.more };
        this.notice = undefined;
        return;
      }
      this.problems = undefined;
      this.drafts = new Map();
      this.refusals = new Map();
      const { added, changed, unchanged, kept } = outcome.summary;
      const parts = [`${added.length} added`, `${changed.length} changed`, `${unchanged} unchanged`];
      if (kept.length > 0) parts.push(`${kept.length} kept that the file does not hold (${kept.slice(0, 5).join(', ')}${kept.length > 5 ? ', …' : ''})`);
      this.done(`Imported ${fileName}: ${outcome.runs} runs in the schedule; ${parts.join(', ')}.`);
      await this.open();
    } catch (error) {
      this.refuse(`Nothing was imported from ${fileName}: ${messageOf(error)}`);
    } finally {
      this.busy = false;
    }
  }

  /** The schedule as CSV (with results), the empty template or the bill of quantities, as a download made in the page. */
  async download(which: 'export' | 'template' | 'bill'): Promise<{ fileName: string; text: string } | undefined> {
    try {
      const request = { projectId: this.projectId };
      const api = laminaApi().schedules;
      const file = which === 'export' ? await api.exportCsv(request) : which === 'bill' ? await api.exportBill(request) : await api.template(request);
      const link = document.createElement('a');
      link.href = URL.createObjectURL(new Blob([file.text], { type: 'text/csv' }));
      link.download = file.fileName;
      link.click();
      setTimeout(() => URL.revokeObjectURL(link.href), 1000);
      return file;
    } catch (error) {
      this.refuse(`The ${which === 'export' ? 'schedule' : which === 'bill' ? 'bill of quantities' : 'template'} could not be made: ${messageOf(error)}`);
      return undefined;
    }
  }

  /**
   * Stores a run edited in the grid (the reference it was stored under names it). Refused: the
   * run stays as typed with the engine's sentence beside it. Stored: it is sized again by itself.
   */
  async commitRun(reference: string, run: ScheduleRun): Promise<boolean> {
    try {
      const stored = await laminaApi().schedules.updateRun({ projectId: this.projectId, reference, run });
      this.drafts = without(this.drafts, reference);
      this.refusals = without(this.refusals, reference);
      const s = this.schedule;
      if (s) this.schedule = { ...s, runs: s.runs.map((r) => (r.reference === reference ? stored : r)) };
      await this.open();
      void this.sizeStale();
      return true;
    } catch (error) {
      const field = (error as { field?: unknown }).field;
      this.drafts = new Map(this.drafts).set(reference, run);
      this.refusals = new Map(this.refusals).set(reference, { column: typeof field === 'string' ? field.replace(/^run\./, '') : '', message: messageOf(error) });
      return false;
    }
  }

  async removeRuns(references: readonly string[]): Promise<void> {
    if (this.progress) return this.refuse('Wait for the sizing to finish (or cancel it) before removing runs.');
    try {
      const { removed } = await laminaApi().schedules.removeRuns({ projectId: this.projectId, references });
      for (const reference of references) {
        this.drafts = without(this.drafts, reference);
        this.refusals = without(this.refusals, reference);
      }
      this.done(`Removed ${removed} ${removed === 1 ? 'run' : 'runs'} from the schedule.`);
      await this.open();
    } catch (error) {
      this.refuse(`Nothing was removed: ${messageOf(error)}`);
    }
  }

  /** Sizes every stale run in the worker, storing results as they come. */
  async sizeStale(): Promise<void> {
    if (this.progress) {
      this.resizeAfter = true;
      return;
    }
    const s = this.schedule;
    if (!s) return;
    const stale = new Set(s.stale);
    const runs = s.runs.filter((r) => stale.has(r.reference));
    if (runs.length === 0) {
      this.done(s.runs.length === 0 ? 'The schedule has no runs yet: import a CSV first.' : 'Every run is already sized for its current inputs.');
      return;
    }
    try {
      this.library ??= await this.loadLibrary();
    } catch (error) {
      return this.refuse(`The materials library could not be read, so nothing was sized: ${messageOf(error)}`);
    }
    const library = this.library;
    this.progress = { done: 0, total: runs.length, cancelling: false };
    this.notice = undefined;
    let buffer: KeyedSizedRun[] = [];
    let stored = 0;
    // The worker's news, shown together on a timer rather than message by message.
    let unshown: KeyedSizedRun[] = [];
    let latest = { done: 0, total: runs.length };
    let showTimer: ReturnType<typeof setTimeout> | undefined;
    const show = () => {
      showTimer = undefined;
      if (this.progress) this.progress = { ...this.progress, ...latest };
      if (unshown.length > 0) this.takeResults(unshown);
      unshown = [];
    };
    const flush = () => {
      const chunk = buffer;
      buffer = [];
      if (chunk.length === 0) return;
      this.storing = this.storing.then(async () => {
        try {
          stored += (await laminaApi().schedules.storeSizing({ projectId: this.projectId, results: chunk })).stored;
        } catch (error) {
          this.refuse(`Some results could not be stored: ${messageOf(error)}`);
        }
      });
    };
    this.sizer.size(
      { runs, settings: s.settings, materialIds: s.materialIds, materials: library.materials.map((m) => [m.id, m] as const), pipeSizes: library.pipeSizes, unitSystem: this.units() },
      {
        onProgress: (done, total, results) => {
          latest = { done, total };
          unshown.push(...results);
          showTimer ??= setTimeout(show, SHOW_EVERY);
          if (results.length === 0) return;
          buffer.push(...results);
          if (buffer.length >= STORE_CHUNK) flush();
        },
        onFinished: (complete) => {
          clearTimeout(showTimer);
          show();
          flush();
          void this.storing.then(async () => {
            const total = this.progress?.total ?? runs.length;
            this.progress = undefined;
            await this.open();
            if (this.resizeAfter) {
              this.resizeAfter = false;
              void this.sizeStale();
            } else if (!complete) this.done(`Sizing cancelled: ${stored} of ${total} runs sized and kept; Size again carries on with the rest.`);
            else this.done(`Sized ${stored} ${stored === 1 ? 'run' : 'runs'}.`);
          });
        },
        onFailure: (message) => {
          clearTimeout(showTimer);
          show();
          flush();
          void this.storing.then(() => {
            this.progress = undefined;
            this.refuse(`Sizing stopped: ${message}`);
            void this.open();
          });
        },
      },
    );
  }

  cancelSizing(): void {
    if (!this.progress) return;
    this.resizeAfter = false;
    this.progress = { ...this.progress, cancelling: true };
    this.sizer.cancel();
  }

  private takeResults(results: readonly KeyedSizedRun[]): void {
    const s = this.schedule;
    if (!s) return;
    const sized = new Set(results.map((r) => r.reference));
    const sizing = { ...s.sizing };
    for (const r of results) sizing[r.reference] = r;
    this.schedule = { ...s, sizing, stale: s.stale.filter((reference) => !sized.has(reference)) };
  }

  private async loadLibrary(): Promise<{ materials: readonly Material[]; pipeSizes: readonly PipeSize[] }> {
    const [materials, pipeSizes] = await Promise.all([laminaApi().materials.list({ origin: 'all' }), laminaApi().pipeSizes()]);
    return { materials, pipeSizes };
  }

  private done(text: string): void {
    this.notice = { kind: 'done', text };
  }

  private refuse(text: string): void {
    this.notice = { kind: 'refused', text };
  }
}

function without<V>(map: ReadonlyMap<string, V>, key: string): ReadonlyMap<string, V> {
  if (!map.has(key)) return map;
  const next = new Map(map);
  next.delete(key);
  return next;
}
