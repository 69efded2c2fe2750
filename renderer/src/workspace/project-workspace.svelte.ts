/**
 * The open project's cases: their order, each one's key figure and verdicts (solved in the page,
 * see case-outcome.ts), adding (from blank, from a case file, as a copy), renaming, duplicating,
 * moving, removing with an undo, and the one case open in the editor. Every change goes through
 * the typed API first; the list shows what the Node side answered.
 */
import type { CaseKind, Project, ProjectCase, ProjectSummary, UnitSystem } from '../../../app/api/contract.js';
import { PROJECT_LIMITS } from '../../../app/api/project-limits.js';
import { laminaApi, messageOf } from '../bridge/lamina-api.js';
import { BLANK_CASE_NAMES, blankCaseInputs } from './blank-cases.js';
import { loadCaseLibrary, type CaseLibrary } from './case-library.js';
import { freeCaseName, nameOfCaseFile } from './case-names.js';
import { CaseOutcomes, type CaseOutcome } from './case-outcome.js';

export interface CaseRename {
  readonly caseId: number;
  name: string;
  error: string | undefined;
}

/** A removed case, kept in the page so Undo can add it back at its place. */
export interface RemovedCase {
  readonly projectCase: ProjectCase;
  readonly index: number;
}

export interface WorkspaceNotice {
  readonly kind: 'done' | 'refused';
  readonly text: string;
}

export class ProjectWorkspace {
  readonly projectId: number;
  cases = $state.raw<readonly ProjectCase[]>([]);
  library = $state.raw<CaseLibrary | undefined>(undefined);
  notice = $state<WorkspaceNotice | undefined>(undefined);
  removed = $state.raw<RemovedCase | undefined>(undefined);
  renaming = $state<CaseRename | undefined>(undefined);
  /** The case open in the editor, as it was when opened: the editor keeps its own state from there. */
  openCase = $state.raw<ProjectCase | undefined>(undefined);
  /** The report preview is open in the list's place (like an opened case). */
  reportOpen = $state(false);
  /** A change in flight: another one pressed meanwhile is ignored, so two moves never cross. */
  busy = $state(false);
  private outcomes: CaseOutcomes | undefined;

  constructor(project: Project, private readonly onChanged: () => void) {
    this.projectId = project.id;
    this.cases = project.cases;
  }

  async loadLibrary(): Promise<void> {
    try {
      const library = await loadCaseLibrary();
      this.outcomes = new CaseOutcomes(library.context);
      this.library = library;
    } catch (error) {
      this.refuse(`The materials library could not be read, so the cases cannot be calculated here: ${messageOf(error)}`);
    }
  }

  /** The row's figures, its labels in the project's units; undefined until the library has arrived. */
  outcomeOf(projectCase: ProjectCase, unitSystem: UnitSystem): CaseOutcome | undefined {
    return this.library && this.outcomes ? this.outcomes.of(projectCase, unitSystem) : undefined;
  }

  async addBlank(kind: CaseKind): Promise<ProjectCase | undefined> {
    const library = this.library;
    if (!library) return undefined;
    return this.run(async () => {
      const name = freeCaseName(BLANK_CASE_NAMES[kind], this.names());
      const added = await laminaApi().projects.addCase({ projectId: this.projectId, draft: { name, inputs: blankCaseInputs(kind, library.materials) } });
      this.cases = [...this.cases, added];
      this.done(`Added "${added.name}": a complete case on library materials to change as you need.`);
      return added;
    });
  }

  async addFromFile(fileName: string, text: string): Promise<ProjectCase | undefined> {
    let json: unknown;
    try {
      json = JSON.parse(text.replace(/^\uFEFF/, ''));
    } catch (error) {
      this.refuse(`Nothing was added from ${fileName}: it is not JSON (${messageOf(error)}).`);
      return undefined;
    }
    return this.run(
      async () => {
        const name = freeCaseName(nameOfCaseFile(fileName, json).slice(0, PROJECT_LIMITS.caseName), this.names());
        const added = await laminaApi().projects.addCase({ projectId: this.projectId, draft: { name, inputs: json } });
        this.cases = [...this.cases, added];
        this.done(`Added "${added.name}" from ${fileName}.`);
        return added;
      },
      (message) => `Nothing was added from ${fileName}: ${message}`,
    );
  }

  /** Adds a copy of a case (of this project or another) at the end of the list. */
  async addCopyOf(source: ProjectCase): Promise<ProjectCase | undefined> {
    return this.run(async () => {
      const added = await this.storeCopy(source);
      this.cases = [...this.cases, added];
      this.done(`Added "${added.name}", a copy of "${source.name}".`);
      return added;
    });
  }

  /** A copy of one of this project's cases, placed just after it. */
  async duplicate(source: ProjectCase): Promise<ProjectCase | undefined> {
    return this.run(async () => {
      const added = await this.storeCopy(source);
      const index = this.cases.findIndex((c) => c.id === source.id);
      this.cases = (await laminaApi().projects.moveCase({ caseId: added.id, position: index + 1 })).cases;
      this.done(`Made "${added.name}", a copy of "${source.name}", just below it.`);
      return added;
    });
  }

  /** Moves a case one place up (-1) or down (+1); at either end nothing happens. */
  async move(projectCase: ProjectCase, step: -1 | 1): Promise<void> {
    const index = this.cases.findIndex((c) => c.id === projectCase.id);
    const position = index + step;
    if (index < 0 || position < 0 || position >= this.cases.length) return;
    await this.run(async () => {
      this.cases = (await laminaApi().projects.moveCase({ caseId: projectCase.id, position })).cases;
      this.notice = undefined;
    });
  }

  async remove(projectCase: ProjectCase): Promise<void> {
    const index = this.cases.findIndex((c) => c.id === projectCase.id);
    await this.run(async () => {
      await laminaApi().projects.removeCase({ caseId: projectCase.id });
      this.cases = this.cases.filter((c) => c.id !== projectCase.id);
      if (this.openCase?.id === projectCase.id) this.openCase = undefined;
      this.notice = undefined;
      this.removed = { projectCase, index };
    });
  }

  /** Adds the removed case back, under its name and at its place (as a new case: its id is new). */
  async undoRemove(): Promise<ProjectCase | undefined> {
    const removed = this.removed;
    if (!removed) return undefined;
    return this.run(async () => {
      const { projectCase, index } = removed;
      const added = await laminaApi().projects.addCase({ projectId: this.projectId, draft: { name: projectCase.name, inputs: projectCase.inputs } });
      const last = this.cases.length;
      this.cases = index < last ? (await laminaApi().projects.moveCase({ caseId: added.id, position: index })).cases : [...this.cases, added];
      this.removed = undefined;
      this.done(`"${added.name}" is back in its place.`);
      return added;
    });
  }

  startRename(projectCase: ProjectCase): void {
    this.renaming = { caseId: projectCase.id, name: projectCase.name, error: undefined };
  }

  async saveRename(): Promise<boolean> {
    const renaming = this.renaming;
    if (!renaming) return false;
    const name = renaming.name.trim();
    if (name.length < 1 || name.length > PROJECT_LIMITS.caseName) {
      renaming.error = `Case name must be 1 to ${PROJECT_LIMITS.caseName} characters long.`;
      return false;
    }
    try {
      this.replace(await laminaApi().projects.updateCase({ caseId: renaming.caseId, changes: { name } }));
      this.renaming = undefined;
      return true;
    } catch (error) {
      renaming.error = messageOf(error);
      return false;
    }
  }

  /** A case the editor (or a rename) saved: its row shows the new name, figures and verdicts. */
  replace(saved: ProjectCase): void {
    this.cases = this.cases.map((c) => (c.id === saved.id ? saved : c));
    this.onChanged();
  }

  /** The cases of another project, for "copy of a case". */
  async casesOf(project: ProjectSummary): Promise<readonly ProjectCase[]> {
    try {
      return (await laminaApi().projects.open({ id: project.id })).cases;
    } catch (error) {
      this.refuse(messageOf(error));
      return [];
    }
  }

  private storeCopy(source: ProjectCase): Promise<ProjectCase> {
    const name = freeCaseName(`${source.name} (copy)`, this.names());
    return laminaApi().projects.addCase({ projectId: this.projectId, draft: { name, inputs: source.inputs } });
  }

  private names(): string[] {
    return this.cases.map((c) => c.name);
  }

  /** Runs one change; a refusal shows as the notice (in `phrase`'s words when given) and gives undefined. */
  private async run<T>(change: () => Promise<T>, phrase: (message: string) => string = (m) => m): Promise<T | undefined> {
    if (this.busy) return undefined;
    this.busy = true;
    try {
      const result = await change();
      this.onChanged();
      return result;
    } catch (error) {
      this.refuse(phrase(messageOf(error)));
      return undefined;
    } finally {
      this.busy = false;
    }
  }

  private done(text: string): void {
    this.notice = { kind: 'done', text };
  }

  private refuse(text: string): void {
    this.notice = { kind: 'refused', text };
  }
}
