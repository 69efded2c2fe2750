/**
 * One open project's fields, saved on every change. Typing restarts a short wait (SAVE_DELAY_MS);
 * when it ends, every field whose text passes its check and differs from what is stored is sent in
 * one `projects:update`. A field that fails its check keeps its text and is left out, so a
 * half-typed or wrong value is never saved and never lost. One save is in flight at a time, so
 * the stored state always follows the order of typing.
 */
import type { Project, ProjectFields } from '../../../app/api/contract.js';
import { PROJECT_FIELDS } from '../../../app/api/project-types.js';
import { fieldOf, laminaApi, messageOf } from '../bridge/lamina-api.js';
import { draftOfProject, projectFieldOf, readProjectField, type FieldReading, type ProjectDraft, type ProjectField } from './project-draft.js';

export const SAVE_DELAY_MS = 400;

/** waiting: typed, the wait is running; saving: a request is in flight; failed: the last save was refused. */
export type SavePhase = 'idle' | 'waiting' | 'saving' | 'failed';

type Refusal = { readonly value: string; readonly message: string };

export class ProjectEditor {
  readonly id: number;
  draft = $state<ProjectDraft>() as ProjectDraft;
  phase = $state<SavePhase>('idle');
  failure = $state('');
  /** What the database holds now, as its last answer said. */
  private stored = $state.raw<ProjectFields>() as ProjectFields;
  /** Refusals from the Node side, kept while the box still holds the refused text. */
  private refusals = $state<Partial<Record<ProjectField, Refusal>>>({});
  private timer: ReturnType<typeof setTimeout> | undefined;
  private running: Promise<void> | undefined;
  private again = false;

  readonly readings = $derived(
    Object.fromEntries(PROJECT_FIELDS.map((field) => [field, readProjectField(field, this.draft[field])])) as Record<ProjectField, FieldReading>,
  );

  /** Fields whose text cannot be saved as it stands, in form order. */
  readonly blocked = $derived(PROJECT_FIELDS.filter((field) => this.errorFor(field) !== undefined));

  constructor(project: Project, private readonly onSaved: (project: Project) => void) {
    this.id = project.id;
    this.stored = fieldsOf(project);
    this.draft = draftOfProject(project);
  }

  get storedName(): string {
    return this.stored.name;
  }

  errorFor(field: ProjectField): string | undefined {
    const reading = this.readings[field];
    if (!reading.ok) return reading.message;
    const refusal = this.refusals[field];
    return refusal && refusal.value === this.draft[field] ? refusal.message : undefined;
  }

  /** Called on every edit: (re)starts the wait before saving. */
  changed(): void {
    if (this.phase !== 'saving') this.phase = 'waiting';
    clearTimeout(this.timer);
    this.timer = setTimeout(() => {
      this.timer = undefined;
      void this.save();
    }, SAVE_DELAY_MS);
  }

  /** Save now (before leaving the project, or to try again after a refusal). */
  async flush(): Promise<void> {
    clearTimeout(this.timer);
    this.timer = undefined;
    await this.save();
  }

  private pendingChanges(): Partial<Record<ProjectField, string>> {
    const changes: Partial<Record<ProjectField, string>> = {};
    for (const field of PROJECT_FIELDS) {
      const reading = this.readings[field];
      if (reading.ok && this.errorFor(field) === undefined && reading.value !== this.stored[field]) changes[field] = reading.value;
    }
    return changes;
  }

  /** Joins a save in flight (which then goes round once more for the newest text), or starts one. */
  private save(): Promise<void> {
    if (this.running) {
      this.again = true;
      return this.running;
    }
    this.running = this.saveUntilCurrent().finally(() => (this.running = undefined));
    return this.running;
  }

  private async saveUntilCurrent(): Promise<void> {
    do {
      this.again = false;
      const changes = this.pendingChanges();
      if (Object.keys(changes).length === 0) break;
      this.phase = 'saving';
      try {
        const project = await laminaApi().projects.update({ id: this.id, changes: changes as Partial<ProjectFields> });
        this.stored = fieldsOf(project);
        this.onSaved(project);
      } catch (error) {
        const field = projectFieldOf(fieldOf(error));
        if (!field || this.refusals[field]?.value === this.draft[field]) {
          this.failure = messageOf(error);
          this.phase = 'failed';
          return;
        }
        // The refused field shows its sentence and is left out; the other changes go again.
        this.refusals[field] = { value: this.draft[field], message: messageOf(error) };
        this.again = true;
      }
    } while (this.again);
    this.phase = this.timer === undefined ? 'idle' : 'waiting';
  }
}

function fieldsOf(project: Project): ProjectFields {
  const fields = {} as Record<ProjectField, string>;
  for (const field of PROJECT_FIELDS) fields[field] = project[field];
  return fields as unknown as ProjectFields;
}
