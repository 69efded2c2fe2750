/**
 * One open case in the editor. The case file (SI) is the document: every edit makes a new snapshot
 * of it (kept for undo), is sent to the solving worker, and is saved once the engine has solved it.
 * A box whose text is not a number keeps its text and leaves the document alone; a document the
 * engine refuses is never saved, and the last good report stays on screen marked out of date until
 * the input is valid again.
 */
import type { ProjectCase } from '../../../app/api/contract.js';
import type { PipeSize } from '../../../app/index.js';
import type { CaseReport } from '../../../app/report/report-model.js';
import type { MaterialProperties } from '../../../app/materials/material-properties.js';
import type { UnitSystem } from '../../../app/base/unit-systems.js';
import { laminaApi, messageOf } from '../bridge/lamina-api.js';
import { fieldForError, getAt, setAt, type Json } from './case-paths.js';
import { shownFields, type CaseKindName, type NumberField } from './case-form-fields.js';
import { buildUpPaths, normaliseMaterialPath, referencedMaterialIds } from './build-up.js';
import { EditHistory } from './edit-history.js';
import { storedValueFor } from './field-text.js';
import { refusalText } from './refusal-text.js';
import { SolveClient, type TimedAnswer } from './solve-client.js';
import { shownSizingPaths } from './sizing-fields.js';
import { shownTargetUPaths } from './target-u-block.js';
import type { SizingResult } from '../../../app/cases/sizing/sizing-model.js';

/** Pause after the last edit before saving (as the project details wait). */
export const CASE_SAVE_DELAY_MS = 400;
/** A pause in typing this long ends an undo step even while the box keeps the focus. */
export const UNDO_PAUSE_MS = 1000;

export type CaseSavePhase = 'idle' | 'waiting' | 'saving' | 'failed';

export class CaseEditorState {
  readonly caseId: number;
  readonly kind: CaseKindName;
  doc = $state.raw<Json>(null);
  /** Text typed into number boxes, by path, while it differs from what the document shows. */
  texts = $state<Record<string, string>>({});
  /** Sentences for boxes whose text is not a number, by path. */
  typingErrors = $state<Record<string, string>>({});
  /** The engine's refusal of the current document, if any. */
  refusal = $state.raw<{ readonly field: string | null; readonly message: string } | null>(null);
  report = $state.raw<CaseReport | null>(null);
  /** The last good sizing of a case with a "sizing" block (it stays, out of date, while the input is refused). */
  sizing = $state.raw<SizingResult | null>(null);
  layerMeans = $state.raw<Readonly<Record<string, number>>>({});
  solveMs = $state<number | null>(null);
  roundTripMs = $state<number | null>(null);
  solving = $state(false);
  /** Set when the solving worker could not start or stopped. */
  solverProblem = $state('');
  phase = $state<CaseSavePhase>('idle');
  failure = $state('');
  canUndo = $state(false);
  canRedo = $state(false);
  library = $state.raw<ReadonlyMap<number, MaterialProperties>>(new Map());
  pipeSizes = $state.raw<readonly PipeSize[]>([]);

  /** The document as last stored; reactive so the status can tell an edit still being solved from a saved one. */
  private stored = $state.raw<Json>(null);

  /** Out of date: what is on screen is not the result of what the form holds. */
  readonly stale = $derived(Object.keys(this.typingErrors).length > 0 || this.refusal !== null);
  /** An edit is on its way to the store: being solved (it is saved once solved), waiting, or being written. */
  readonly pending = $derived(this.phase === 'waiting' || this.phase === 'saving' || (this.solving && !this.stale && this.doc !== this.stored));

  /** The project's units: the report's sentences read in them, so a change solves again. */
  private unitSystem: UnitSystem;
  private goodDoc: Json | null = null;
  private readonly history = new EditHistory<Json>();
  private solver: SolveClient | null = null;
  private sentDoc: Json = null;
  private timer: ReturnType<typeof setTimeout> | undefined;
  private saving: Promise<void> | undefined;
  private ready = false;
  private lastEditAt = 0;

  constructor(projectCase: ProjectCase, unitSystem: UnitSystem, private readonly onSaved: (saved: ProjectCase) => void) {
    this.caseId = projectCase.id;
    this.unitSystem = unitSystem;
    this.kind = projectCase.inputs.kind;
    this.doc = projectCase.inputs as unknown as Json;
    this.stored = this.doc;
  }

  /** Loads the library and the size tables, then solves the case as stored. */
  async start(): Promise<void> {
    const [materials, sizes] = await Promise.all([laminaApi().materials.list({}), laminaApi().pipeSizes()]);
    this.library = new Map(materials.map((m) => [m.id, m]));
    this.pipeSizes = sizes;
    this.solver = new SolveClient(
      () => this.pipeSizes,
      (timed) => this.answered(timed),
      (message) => {
        this.solving = false;
        this.solverProblem = `The results cannot be worked out in this window: ${message}.`;
      },
    );
    this.ready = true;
    this.requestSolve();
  }

  dispose(): void {
    this.solver?.dispose();
    clearTimeout(this.timer);
  }

  /** Where the engine's complaint shows: the field's path, or null for the case as a whole. */
  readonly refusalField = $derived.by(() => {
    if (!this.refusal) return null;
    const shown = new Set([...shownFields(this.kind, this.doc).map((f) => f.path), ...buildUpPaths(this.kind, this.doc), ...shownSizingPaths(this.kind, this.doc), ...shownTargetUPaths(this.kind, this.doc)]);
    return fieldForError(this.refusal.field === null ? undefined : normaliseMaterialPath(this.refusal.field), shown);
  });

  errorFor(path: string): string | undefined {
    return this.typingErrors[path] ?? (this.refusal && this.refusalField === path ? this.refusal.message : undefined);
  }

  // ---- edits ----

  /** A number typed into a box (text in the project's units). Empty text removes an optional value. */
  typeNumber(field: NumberField, text: string, system: UnitSystem): void {
    this.texts = { ...this.texts, [field.path]: text };
    const { [field.path]: _, ...others } = this.typingErrors;
    if (text.trim() === '' && field.whenEmpty) {
      this.typingErrors = others;
      this.edit(setAt(this.doc, field.path, undefined), field.path);
      return;
    }
    const current = getAt(this.doc, field.path);
    const reading = storedValueFor(text, typeof current === 'number' ? current : undefined, field.quantity, system, field.label);
    if (!reading.ok) {
      this.typingErrors = { ...others, [field.path]: reading.message };
      return;
    }
    this.typingErrors = others;
    this.edit(setAt(this.doc, field.path, reading.value), field.path);
  }

  /** Any other change: a choice, a text, a build-up step. `group` joins typing in one box into one undo step. */
  edit(next: Json, group: string | null = null): void {
    if (next === this.doc) return;
    const now = performance.now();
    if (now - this.lastEditAt > UNDO_PAUSE_MS) this.history.seal();
    this.lastEditAt = now;
    this.history.record(this.doc, group);
    if (group === null) this.history.seal();
    this.doc = next;
    this.syncHistory();
    this.requestSolve();
  }

  /** The box lost focus: its typing is one finished undo step. */
  sealTyping(): void {
    this.history.seal();
  }

  undo(): void {
    const previous = this.history.undo(this.doc);
    if (previous !== undefined) this.jumpTo(previous);
  }

  redo(): void {
    const next = this.history.redo(this.doc);
    if (next !== undefined) this.jumpTo(next);
  }

  /** Boxes show the document again (after undo or redo, or a change of unit system). */
  forgetTyping(): void {
    this.texts = {};
    this.typingErrors = {};
  }

  /** The project switched units: the boxes show the document in them and the report is solved again in them. */
  changeUnitSystem(system: UnitSystem): void {
    if (system === this.unitSystem) return;
    this.unitSystem = system;
    this.forgetTyping();
    this.requestSolve();
  }

  private jumpTo(doc: Json): void {
    this.doc = doc;
    this.forgetTyping();
    this.syncHistory();
    this.requestSolve();
  }

  private syncHistory(): void {
    this.canUndo = this.history.canUndo;
    this.canRedo = this.history.canRedo;
  }

  // ---- solving ----

  private requestSolve(): void {
    if (!this.ready || !this.solver) return;
    const materials = referencedMaterialIds(this.doc)
      .map((id) => [id, this.library.get(id)] as const)
      .filter((pair): pair is readonly [number, MaterialProperties] => pair[1] !== undefined)
      .map(([id, material]) => [id, $state.snapshot(material) as MaterialProperties] as const);
    this.sentDoc = this.doc;
    this.solving = true;
    this.solver.solve(this.doc, materials, this.unitSystem);
  }

  private answered({ answer, roundTripMs }: TimedAnswer): void {
    this.solving = false;
    this.solveMs = answer.solveMs;
    this.roundTripMs = roundTripMs;
    if (this.sentDoc !== this.doc) return;
    if (!answer.ok) {
      const message = answer.sentence === undefined ? answer.message : refusalText(answer.field, answer.sentence, this.unitSystem, this.kind, this.doc);
      this.refusal = { field: answer.field ?? null, message };
      return;
    }
    this.refusal = null;
    this.report = answer.report;
    this.sizing = answer.sizing;
    this.layerMeans = answer.layerMeans;
    this.goodDoc = this.doc;
    if (this.goodDoc !== this.stored) this.scheduleSave();
  }

  // ---- saving ----

  private scheduleSave(): void {
    if (this.phase !== 'saving') this.phase = 'waiting';
    clearTimeout(this.timer);
    this.timer = setTimeout(() => {
      this.timer = undefined;
      void this.save();
    }, CASE_SAVE_DELAY_MS);
  }

  /** Saves the last solved document now (before the editor closes, or to try again). */
  async flush(): Promise<void> {
    clearTimeout(this.timer);
    this.timer = undefined;
    await this.save();
  }

  private async save(): Promise<void> {
    if (this.saving) await this.saving;
    const doc = this.goodDoc;
    if (doc === null || doc === this.stored) {
      if (this.phase !== 'failed') this.phase = this.timer === undefined ? 'idle' : 'waiting';
      return;
    }
    this.phase = 'saving';
    this.saving = (async () => {
      try {
        const saved = await laminaApi().projects.updateCase({ caseId: this.caseId, changes: { inputs: doc } });
        this.stored = doc;
        this.phase = this.timer === undefined ? 'idle' : 'waiting';
        this.onSaved(saved);
      } catch (error) {
        this.failure = messageOf(error);
        this.phase = 'failed';
      }
    })();
    await this.saving;
    this.saving = undefined;
  }
}
