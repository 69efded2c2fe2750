/**
 * State of the Projects view: the list and its search, the open project (its autosaving fields and
 * its workspace of cases), the recycle bin, and the last message (a success, or a refusal sentence
 * from the Node side). Every call goes through the typed API (bridge/lamina-api.ts).
 */
import type { Project, ProjectSummary } from '../../../app/api/contract.js';
import { fieldOf, laminaApi, messageOf } from '../bridge/lamina-api.js';
import { ProjectEditor } from './project-editor.svelte.js';
import { ProjectWorkspace } from '../workspace/project-workspace.svelte.js';

export interface ProjectsNotice {
  readonly kind: 'done' | 'refused';
  readonly text: string;
  /** A project the notice offers to bring back from the recycle bin. */
  readonly undoRemovalOf?: number;
}

export const NEW_PROJECT_NAME = 'Untitled project';

const SEARCHED_FIELDS = ['name', 'client', 'site', 'reference', 'engineer', 'revision'] as const;

export class ProjectsState {
  projects = $state<readonly ProjectSummary[]>([]);
  search = $state('');
  loading = $state(true);
  notice = $state<ProjectsNotice | undefined>(undefined);
  editor = $state<ProjectEditor | undefined>(undefined);
  workspace = $state<ProjectWorkspace | undefined>(undefined);
  /** The open project was just made: its details show unfolded, since they are what it needs first. */
  detailsOpen = $state(false);
  recycleBin = $state<readonly ProjectSummary[]>([]);
  showingRecycleBin = $state(false);
  /** A project file whose project is already in the library, waiting for the user to choose copy or replace. */
  importQuestion = $state<{ readonly fileName: string; readonly text: string; readonly question: string } | undefined>(undefined);
  confirmingEmpty = $state(false);

  readonly shown = $derived.by(() => {
    const words = this.search.trim().toLowerCase().split(/\s+/).filter(Boolean);
    if (words.length === 0) return this.projects;
    return this.projects.filter((p) => {
      const text = SEARCHED_FIELDS.map((field) => p[field]).join(' ').toLowerCase();
      return words.every((word) => text.includes(word));
    });
  });

  /** Numbers each list request so only the newest answer is shown. */
  private listRequest = 0;

  async reload(): Promise<void> {
    const request = ++this.listRequest;
    try {
      const [projects, bin] = await Promise.all([laminaApi().projects.list(), laminaApi().projects.listRecycleBin()]);
      if (request !== this.listRequest) return;
      this.projects = projects;
      this.recycleBin = bin;
    } catch (error) {
      if (request === this.listRequest) this.refuse(error);
    } finally {
      if (request === this.listRequest) this.loading = false;
    }
  }

  async open(id: number): Promise<void> {
    await this.editor?.flush();
    try {
      this.show(await laminaApi().projects.open({ id }));
    } catch (error) {
      this.refuse(error);
    }
  }

  /** Saves what is still waiting, then closes the details. */
  async close(): Promise<void> {
    await this.editor?.flush();
    this.editor = undefined;
    this.workspace = undefined;
  }

  async create(): Promise<void> {
    await this.editor?.flush();
    try {
      const project = await laminaApi().projects.create({ fields: { name: NEW_PROJECT_NAME } });
      this.show(project, { detailsOpen: true });
      this.done(`Made a new project. Give it a name and the details below; each change is saved as you type.`);
      await this.reload();
    } catch (error) {
      this.refuse(error);
    }
  }

  async duplicateOpen(): Promise<void> {
    const editor = this.editor;
    if (!editor) return;
    await editor.flush();
    try {
      const copy = await laminaApi().projects.duplicate({ id: editor.id });
      this.show(copy);
      this.done(`Made "${copy.name}", a copy with its ${describeCount(copy.cases.length, 'case')}; it is now open.`);
      await this.reload();
    } catch (error) {
      this.refuse(error);
    }
  }

  async removeOpen(): Promise<void> {
    const editor = this.editor;
    if (!editor) return;
    await editor.flush();
    try {
      await laminaApi().projects.remove({ id: editor.id });
      this.editor = undefined;
      this.workspace = undefined;
      this.notice = { kind: 'done', text: `Moved "${editor.storedName}" to the recycle bin.`, undoRemovalOf: editor.id };
      await this.reload();
    } catch (error) {
      this.refuse(error);
    }
  }

  async restore(id: number): Promise<void> {
    try {
      const project = await laminaApi().projects.restore({ id });
      await this.editor?.flush();
      this.show(project);
      this.done(`Restored "${project.name}" from the recycle bin; it is now open.`);
      await this.reload();
    } catch (error) {
      this.refuse(error);
    }
  }

  async emptyRecycleBin(): Promise<void> {
    this.confirmingEmpty = false;
    try {
      const { deleted } = await laminaApi().projects.emptyRecycleBin();
      this.done(`Emptied the recycle bin: ${describeCount(deleted, 'project')} deleted for good.`);
      await this.reload();
    } catch (error) {
      this.refuse(error);
    }
  }

  async exportOpen(): Promise<{ fileName: string; text: string } | undefined> {
    const editor = this.editor;
    if (!editor) return undefined;
    await editor.flush();
    try {
      const file = await laminaApi().projects.exportProject({ id: editor.id });
      this.done(`Exported "${editor.storedName}" as ${file.fileName}, with its cases and the materials they use.`);
      return file;
    } catch (error) {
      this.refuse(error);
      return undefined;
    }
  }

  /** Imports a project file; when its project is already there, asks first (importQuestion) unless `onExisting` says. */
  async importFile(fileName: string, text: string, onExisting?: 'copy' | 'replace'): Promise<void> {
    this.importQuestion = undefined;
    try {
      const result = await laminaApi().projects.importProject(onExisting ? { text, onExisting } : { text });
      await this.editor?.flush();
      this.show(result.project);
      const replaced = result.replaced === null ? '' : ' The project it replaces is in the recycle bin, where it can be restored.';
      this.done(
        `Imported "${result.project.name}" from ${fileName} with ${describeCount(result.project.cases.length, 'case')}. ` +
          `Its materials: ${result.materialsReused} already in your library (reused), ${result.materialsCreated} added to the library.${replaced}`,
      );
      await this.reload();
    } catch (error) {
      if (fieldOf(error) === 'onExisting') {
        this.notice = undefined;
        this.importQuestion = { fileName, text, question: messageOf(error).replace(/ \(onExisting: copy or replace\)\.$/, '.') };
        return;
      }
      this.notice = { kind: 'refused', text: `Nothing was imported from ${fileName}: ${messageOf(error)}` };
    }
  }

  /** Adds the demo project of the invented creamery again, and opens it. */
  async addDemo(): Promise<void> {
    try {
      const project = await laminaApi().projects.addDemo();
      await this.editor?.flush();
      this.show(project);
      this.done(`Added the demo project "${project.name}": invented data, for trying Lamina out, not for design.`);
      await this.reload();
    } catch (error) {
      this.refuse(error);
    }
  }

  private show(project: Project, { detailsOpen = false } = {}): void {
    this.editor = new ProjectEditor(project, () => void this.reload());
    this.workspace = new ProjectWorkspace(project, () => void this.reload());
    this.detailsOpen = detailsOpen;
  }

  private done(text: string): void {
    this.notice = { kind: 'done', text };
  }

  private refuse(error: unknown): void {
    this.notice = { kind: 'refused', text: messageOf(error) };
  }
}

export function describeCount(count: number, noun: string): string {
  return `${count} ${noun}${count === 1 ? '' : 's'}`;
}
