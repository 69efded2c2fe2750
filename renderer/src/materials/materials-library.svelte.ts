/**
 * State of the materials view: the filter, the list it shows, the material being edited, and the
 * last message (a success, or a refusal sentence from the Node side). Every call goes through the
 * typed API (bridge/lamina-api.ts); nothing here knows which transport carries it.
 */
import type { CsvProblem, Material, MaterialCategory, MaterialOrigin } from '../../../app/api/contract.js';
import { fieldOf, laminaApi, messageOf } from '../bridge/lamina-api.js';
import { freeCopyName } from './copy-name.js';
import { draftFieldOf, draftOf, emptyDraft, readDraft, type DraftError, type MaterialDraft } from './material-draft.js';

export type Notice = { readonly kind: 'done' | 'refused'; readonly text: string };

export interface Editor {
  /** undefined while creating a new material (from blank or as a copy). */
  readonly id: number | undefined;
  /** The name when editing began, for the heading (the name box may be changed). */
  readonly originalName: string;
  /** The material a new one was copied from; the copy exists only once saved. */
  readonly copiedFrom?: string;
  draft: MaterialDraft;
  /** Shown once the person has tried to save, so a half-typed form is not covered in red. */
  showErrors: boolean;
  serverError: DraftError | undefined;
}

export class MaterialsLibrary {
  search = $state('');
  category = $state<MaterialCategory | ''>('');
  origin = $state<MaterialOrigin>('all');
  materials = $state<readonly Material[]>([]);
  loading = $state(false);
  notice = $state<Notice | undefined>(undefined);
  editor = $state<Editor | undefined>(undefined);
  importProblems = $state<readonly CsvProblem[] | undefined>(undefined);
  importFileName = $state('');

  readonly reading = $derived(this.editor ? readDraft(this.editor.draft) : undefined);

  /** The sentence for a form field: the form's own check first, then a refusal from the Node side. */
  errorFor(field: DraftError['field']): string | undefined {
    const editor = this.editor;
    if (!editor) return undefined;
    if (editor.showErrors && this.reading && !this.reading.ok) {
      const own = this.reading.errors.find((e) => e.field === field);
      if (own) return own.message;
    }
    return editor.serverError?.field === field ? editor.serverError.message : undefined;
  }

  /** Numbers each list request: typing sends one per key, and only the newest answer may be shown. */
  private listRequest = 0;

  async reload(): Promise<void> {
    const request = ++this.listRequest;
    this.loading = true;
    try {
      const found = await laminaApi().materials.list({
        ...(this.search.trim() ? { search: this.search.trim() } : {}),
        ...(this.category ? { category: this.category } : {}),
        origin: this.origin,
      });
      if (request === this.listRequest) this.materials = found;
    } catch (error) {
      if (request === this.listRequest) this.refuse(error);
    } finally {
      if (request === this.listRequest) this.loading = false;
    }
  }

  startNew(): void {
    this.editor = { id: undefined, originalName: '', draft: emptyDraft(), showErrors: false, serverError: undefined };
    this.notice = undefined;
  }

  startEdit(material: Material): void {
    this.editor = { id: material.id, originalName: material.name, draft: draftOf(material), showErrors: false, serverError: undefined };
    this.notice = undefined;
  }

  cancelEdit(): void {
    this.editor = undefined;
  }

  /**
   * A built-in is never edited in place: its values open in the form as a new material named
   * "<name> (copy)", which is created only when saved, so a cancelled copy leaves nothing behind.
   * The names already taken are asked for first, so the draft's name is one that can be saved.
   */
  async duplicate(material: Material): Promise<void> {
    try {
      const copyName = `${material.name} (copy)`;
      const similar = await laminaApi().materials.list({ search: copyName, origin: 'all' });
      const draft = { ...draftOf(material), name: freeCopyName(copyName, similar.map((m) => m.name)) };
      this.editor = { id: undefined, originalName: '', copiedFrom: material.name, draft, showErrors: false, serverError: undefined };
      this.notice = undefined;
    } catch (error) {
      this.refuse(error);
    }
  }

  /** Returns whether the material was saved; when not, the form or the notice says why. */
  async save(): Promise<boolean> {
    const editor = this.editor;
    if (!editor) return false;
    editor.showErrors = true;
    editor.serverError = undefined;
    const reading = readDraft(editor.draft);
    if (!reading.ok) return false;
    try {
      const saved = editor.id === undefined
        ? await laminaApi().materials.create({ material: reading.input })
        : await laminaApi().materials.update({ id: editor.id, material: reading.input });
      this.editor = undefined;
      this.done(`Saved "${saved.name}".`);
      await this.reload();
      return true;
    } catch (error) {
      const field = draftFieldOf(fieldOf(error));
      if (field) editor.serverError = { field, message: messageOf(error) };
      else this.refuse(error);
      return false;
    }
  }

  async remove(material: Material): Promise<void> {
    try {
      await laminaApi().materials.remove({ id: material.id });
      if (this.editor?.id === material.id) this.editor = undefined;
      this.done(`Deleted "${material.name}".`);
      await this.reload();
    } catch (error) {
      this.refuse(error);
    }
  }

  /** All or nothing: either every row is added, or none and each bad row is listed by line number. */
  async importCsv(fileName: string, csv: string): Promise<void> {
    this.importFileName = fileName;
    this.importProblems = undefined;
    try {
      const result = await laminaApi().materials.importCsv({ csv });
      if (result.ok) {
        this.done(`Imported ${result.created.length} material${result.created.length === 1 ? '' : 's'} from ${fileName}.`);
        await this.reload();
      } else {
        this.importProblems = result.problems;
        this.notice = {
          kind: 'refused',
          text: `Nothing was imported from ${fileName}: ${result.problems.length} row${result.problems.length === 1 ? ' needs' : 's need'} fixing first.`,
        };
      }
    } catch (error) {
      this.refuse(error);
    }
  }

  async exportCsv(): Promise<string | undefined> {
    try {
      return (await laminaApi().materials.exportCsv({ ...(this.category ? { category: this.category } : {}), origin: this.origin })).csv;
    } catch (error) {
      this.refuse(error);
      return undefined;
    }
  }

  private done(text: string): void {
    this.notice = { kind: 'done', text };
  }

  private refuse(error: unknown): void {
    this.notice = { kind: 'refused', text: messageOf(error) };
  }
}
