import { caseContext } from '../cases/case-context.js';
import { checkCaseSolvable, materialIdsOf, remapMaterialIds, validateCaseInputs, type CaseInputs } from './case-inputs.js';
import { inWriteTransaction, nowIso, type DatabaseContext } from './database-context.js';
import { materialInputOf, sameMaterialData } from './material-rows.js';
import type { MaterialsService } from './materials-service.js';
import type { Material } from './material-types.js';
import { MATERIAL_LIMITS } from './material-validation.js';
import { mergeProjectFields, PROJECT_LIMITS, validateCaseDraft, validateProjectFields } from './project-validation.js';
import { PROJECT_FILE_VERSION, readProjectFile, type ProjectFile } from './project-file.js';
import { LetterheadService, parseStoredLetterhead } from './letterhead-service.js';
import type { Letterhead } from '../../app/report/project-report.js';
import type { Project, ProjectCase, ProjectFields, ProjectSummary, UnitSystem } from './project-types.js';
import { NotFoundError, RefusedError } from './service-errors.js';
import { InputError } from '../../app/index.js';
import { requireOneOf } from '../../app/base/field-checks.js';
import { isPlainObject, rejectUnknownKeys, requireId, requireText } from './validate.js';

interface ProjectRow {
  id: number; name: string; client: string; site: string; reference: string; engineer: string; checker: string; revision: string;
  revision_note: string; project_date: string; unit_system: string; notes: string; letterhead: string | null;
  created_at: string; updated_at: string; deleted_at: string | null; case_count: number;
}
interface CaseRow { id: number; project_id: number; name: string; position: number; inputs: string; created_at: string; updated_at: string }

const PROJECT_SELECT = `SELECT p.*, (SELECT COUNT(*) FROM cases c WHERE c.project_id = p.id) AS case_count FROM projects p`;

function summaryFromRow(row: ProjectRow): ProjectSummary {
  return {
    id: row.id, name: row.name, client: row.client, site: row.site, reference: row.reference, engineer: row.engineer,
    checker: row.checker, revision: row.revision, revisionNote: row.revision_note, date: row.project_date, unitSystem: row.unit_system as UnitSystem, notes: row.notes,
    caseCount: row.case_count, createdAt: row.created_at, updatedAt: row.updated_at, deletedAt: row.deleted_at,
  };
}

function caseFromRow(row: CaseRow): ProjectCase {
  return {
    id: row.id, projectId: row.project_id, name: row.name, position: row.position,
    inputs: JSON.parse(row.inputs) as CaseInputs, createdAt: row.created_at, updatedAt: row.updated_at,
  };
}

function fieldParameters(fields: ProjectFields) {
  return {
    name: fields.name, client: fields.client, site: fields.site, reference: fields.reference, engineer: fields.engineer,
    checker: fields.checker, revision: fields.revision, revision_note: fields.revisionNote, project_date: fields.date,
    unit_system: fields.unitSystem, notes: fields.notes,
  };
}

/**
 * Runs `store` for the case at `index`; a refusal names the case, since the person copying or
 * importing a project did not write that case just now.
 */
function storeNamingCase(index: number, name: string, store: () => void): void {
  try {
    store();
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    const field = /^inputs\b/.test(error.field) ? error.field : `inputs.${error.field}`;
    throw new InputError(`cases[${index}].${field}`, `Case "${name}" cannot be stored: ${error.message}`);
  }
}

/**
 * Projects and their cases. Every change is its own transaction, so the app saves on every edit.
 * Deleting moves a project to the recycle bin; it can be restored until the bin is emptied.
 */
export class ProjectsService {
  constructor(
    private readonly context: DatabaseContext,
    private readonly materials: MaterialsService,
    private readonly letterheads: LetterheadService = new LetterheadService(context),
  ) {}

  private get db() {
    return this.context.db;
  }

  list(): ProjectSummary[] {
    return (this.db.prepare(`${PROJECT_SELECT} WHERE p.deleted_at IS NULL ORDER BY p.updated_at DESC, p.id DESC`).all() as ProjectRow[]).map(summaryFromRow);
  }

  listRecycleBin(): ProjectSummary[] {
    return (this.db.prepare(`${PROJECT_SELECT} WHERE p.deleted_at IS NOT NULL ORDER BY p.deleted_at DESC`).all() as ProjectRow[]).map(summaryFromRow);
  }

  open(id: number): Project {
    const checked = requireId(id, 'id');
    const row = this.db.prepare(`${PROJECT_SELECT} WHERE p.id = ?`).get(checked) as ProjectRow | undefined;
    if (!row) throw new NotFoundError(`There is no project with id ${checked}.`);
    const cases = (this.db.prepare('SELECT * FROM cases WHERE project_id = ? ORDER BY position, id').all(checked) as CaseRow[]).map(caseFromRow);
    return { ...summaryFromRow(row), cases };
  }

  create(fields: unknown): Project {
    const checked = validateProjectFields(fields);
    return inWriteTransaction(this.context, () => this.open(this.insertProject(checked)));
  }

  update(id: number, changes: unknown): Project {
    const checkedId = requireId(id, 'id');
    if (!isPlainObject(changes)) throw new InputError('changes', 'changes must be an object.');
    return inWriteTransaction(this.context, () => {
      const current = this.openEditable(checkedId);
      const merged = mergeProjectFields(current, changes);
      this.db
        .prepare(
          `UPDATE projects SET name = @name, client = @client, site = @site, reference = @reference, engineer = @engineer,
             checker = @checker, revision = @revision, revision_note = @revision_note, project_date = @project_date,
             unit_system = @unit_system, notes = @notes, updated_at = @now
           WHERE id = @id`,
        )
        .run({ ...fieldParameters(merged), id: checkedId, now: nowIso() });
      return this.open(checkedId);
    });
  }

  rename(id: number, name: string): Project {
    requireText(name, 'name', { min: 1, max: PROJECT_LIMITS.name });
    return this.update(id, { name });
  }

  duplicate(id: number, name?: string): Project {
    const checkedId = requireId(id, 'id');
    const checkedName = name === undefined ? undefined : requireText(name, 'name', { min: 1, max: PROJECT_LIMITS.name });
    return inWriteTransaction(this.context, () => {
      const original = this.open(checkedId);
      // The copy prints as the original does: with the letterhead it carries, if any.
      const copyId = this.insertProject({ ...original, name: checkedName ?? `${original.name} (copy)`.slice(0, PROJECT_LIMITS.name) }, this.ownLetterhead(checkedId));
      original.cases.forEach((c, i) => storeNamingCase(i, c.name, () => this.insertCase(copyId, c.name, c.inputs)));
      this.copySchedule(checkedId, copyId);
      return this.open(copyId);
    });
  }

  /** Moves the project to the recycle bin. */
  remove(id: number): void {
    const checkedId = requireId(id, 'id');
    inWriteTransaction(this.context, () => {
      this.openEditable(checkedId);
      this.db.prepare('UPDATE projects SET deleted_at = ? WHERE id = ?').run(nowIso(), checkedId);
    });
  }

  restore(id: number): Project {
    const checkedId = requireId(id, 'id');
    return inWriteTransaction(this.context, () => {
      const project = this.open(checkedId);
      if (project.deletedAt === null) throw new RefusedError(`Project "${project.name}" is not in the recycle bin.`);
      this.db.prepare('UPDATE projects SET deleted_at = NULL, updated_at = ? WHERE id = ?').run(nowIso(), checkedId);
      return this.open(checkedId);
    });
  }

  /** Deletes for good every project in the recycle bin; returns how many. */
  emptyRecycleBin(): number {
    return inWriteTransaction(this.context, () => this.db.prepare('DELETE FROM projects WHERE deleted_at IS NOT NULL').run().changes);
  }

  addCase(projectId: number, draft: unknown): ProjectCase {
    const checkedId = requireId(projectId, 'projectId');
    const checked = validateCaseDraft(draft);
    return inWriteTransaction(this.context, () => {
      this.openEditable(checkedId);
      const caseId = this.insertCase(checkedId, checked.name, checked.inputs);
      this.touch(checkedId);
      return this.getCase(caseId);
    });
  }

  updateCase(caseId: number, changes: unknown): ProjectCase {
    const checkedId = requireId(caseId, 'caseId');
    const raw = isPlainObject(changes) ? changes : undefined;
    if (!raw) throw new InputError('changes', 'changes must be an object.');
    rejectUnknownKeys(raw, ['name', 'inputs'], 'changes');
    const name = raw['name'] === undefined ? undefined : requireText(raw['name'], 'name', { min: 1, max: PROJECT_LIMITS.caseName });
    const inputs = raw['inputs'] === undefined ? undefined : validateCaseInputs(raw['inputs']);
    return inWriteTransaction(this.context, () => {
      const current = this.getCase(checkedId);
      this.openEditable(current.projectId);
      const now = nowIso();
      if (name !== undefined) this.db.prepare('UPDATE cases SET name = ?, updated_at = ? WHERE id = ?').run(name, now, checkedId);
      if (inputs !== undefined) {
        this.assertStorable(inputs);
        this.db.prepare('UPDATE cases SET inputs = ?, updated_at = ? WHERE id = ?').run(JSON.stringify(inputs), now, checkedId);
        this.db.prepare('DELETE FROM case_materials WHERE case_id = ?').run(checkedId);
        this.linkMaterials(checkedId, inputs);
      }
      this.touch(current.projectId);
      return this.getCase(checkedId);
    });
  }

  removeCase(caseId: number): void {
    const checkedId = requireId(caseId, 'caseId');
    inWriteTransaction(this.context, () => {
      const current = this.getCase(checkedId);
      this.openEditable(current.projectId);
      this.db.prepare('DELETE FROM cases WHERE id = ?').run(checkedId);
      this.touch(current.projectId);
    });
  }

  /**
   * Puts a case at `position` (0 = first) among its project's cases, the others keeping their
   * order, and stores every case's place as 0, 1, 2, … so positions stay dense after removals.
   */
  moveCase(caseId: number, position: number): Project {
    const checkedId = requireId(caseId, 'caseId');
    if (typeof position !== 'number' || !Number.isSafeInteger(position) || position < 0) {
      throw new InputError('position', 'position must be a whole number from 0 (the first place).');
    }
    return inWriteTransaction(this.context, () => {
      const project = this.openEditable(this.getCase(checkedId).projectId);
      const last = project.cases.length - 1;
      if (position > last) {
        throw new InputError('position', `position must be a whole number from 0 to ${last}: project "${project.name}" has ${project.cases.length} case${last === 0 ? '' : 's'}.`);
      }
      const order = project.cases.map((c) => c.id).filter((id) => id !== checkedId);
      order.splice(position, 0, checkedId);
      const place = this.db.prepare('UPDATE cases SET position = ? WHERE id = ?');
      order.forEach((id, index) => place.run(index, id));
      this.touch(project.id);
      return this.open(project.id);
    });
  }

  getCase(caseId: number): ProjectCase {
    const checkedId = requireId(caseId, 'caseId');
    const row = this.db.prepare('SELECT * FROM cases WHERE id = ?').get(checkedId) as CaseRow | undefined;
    if (!row) throw new NotFoundError(`There is no case with id ${checkedId}.`);
    return caseFromRow(row);
  }

  /**
   * The letterhead the project's report prints with: its own (from an imported file), else the
   * library's.
   */
  letterheadOf(id: number): Letterhead {
    return this.ownLetterhead(requireId(id, 'id')) ?? this.letterheads.get();
  }

  /**
   * One self-contained file: the project, its cases' inputs, every material they use, and the
   * letterhead its report prints with (so a colleague's copy prints the same).
   */
  exportProject(id: number): ProjectFile {
    const project = this.open(requireId(id, 'id'));
    const ids = [...new Set(project.cases.flatMap((c) => materialIdsOf(c.inputs)))].sort((a, b) => a - b);
    const { id: _id, caseCount: _n, createdAt: _c, updatedAt: _u, deletedAt: _d, cases, ...fields } = project;
    return {
      format: 'lamina-project',
      formatVersion: PROJECT_FILE_VERSION,
      exportedAt: nowIso(),
      project: fields,
      letterhead: this.letterheadOf(project.id),
      materials: ids.map((materialId) => ({ fileId: materialId, ...materialInputOf(this.materials.get(materialId)) })),
      cases: cases.map((c) => ({ name: c.name, inputs: c.inputs })),
      ...this.scheduleOf(project.id),
    };
  }

  /** The project's schedule for its file (none when it has no runs and default settings). */
  private scheduleOf(projectId: number): Pick<ProjectFile, 'schedule'> {
    const settings = (this.db.prepare('SELECT schedule_settings FROM projects WHERE id = ?').get(projectId) as { schedule_settings: string | null }).schedule_settings;
    const runs = (this.db.prepare('SELECT run FROM schedule_runs WHERE project_id = ? ORDER BY position').all(projectId) as { run: string }[]).map((r) => JSON.parse(r.run));
    return settings === null && runs.length === 0 ? {} : { schedule: { settings: settings === null ? null : JSON.parse(settings), runs } };
  }

  /** Copies the schedule (settings, runs and their sizing) of one project to another. */
  private copySchedule(fromId: number, toId: number): void {
    this.db.prepare('UPDATE projects SET schedule_settings = (SELECT schedule_settings FROM projects WHERE id = ?) WHERE id = ?').run(fromId, toId);
    this.db.prepare('INSERT INTO schedule_runs (project_id, reference, position, run, sizing) SELECT ?, reference, position, run, sizing FROM schedule_runs WHERE project_id = ?').run(toId, fromId);
  }

  /**
   * Imports a project file as a new project. A material in the file that matches one in the library
   * (same name, same data) is reused; one whose name is taken by different data is added as
   * "<name> (imported)"; others are added as user materials.
   */
  /**
   * Imports a project file. When the library already holds a project with the same name, client
   * and reference (the same export, imported before), `onExisting` says what to do: 'copy' adds
   * this one beside it, 'replace' adds it and moves the existing one to the recycle bin (so
   * nothing is lost); without it the import is refused with a sentence naming `onExisting`.
   */
  importProject(file: unknown, onExisting?: unknown): { project: Project; materialsReused: number; materialsCreated: number; replaced: number | null } {
    const parsed = readProjectFile(file);
    const choice = onExisting === undefined ? undefined : requireOneOf('onExisting', onExisting, ['copy', 'replace'] as const);
    const same = this.list().find((p) => p.name === parsed.project.name && p.client === parsed.project.client && p.reference === parsed.project.reference);
    if (same && choice === undefined) {
      throw new InputError('onExisting', `A project "${same.name}" from the same file is already in the library: choose whether to add this one as a copy or to replace it (onExisting: copy or replace).`);
    }
    return inWriteTransaction(this.context, () => {
      const idMap = new Map<number, number>();
      let reused = 0;
      let created = 0;
      for (const { fileId, material } of parsed.materials) {
        // The same data under the same name, or under a name an earlier import gave it, is reused.
        const existing = this.materials.findByName(material.name);
        const match = [existing, ...this.earlierImportsOf(material.name)].find((m) => m && sameMaterialData(m, material));
        if (match) {
          idMap.set(fileId, match.id);
          reused++;
          continue;
        }
        const name = existing ? this.materials.freeName(`${material.name} (imported)`) : material.name;
        idMap.set(fileId, this.materials.insert({ ...material, name }, { builtIn: false, seedKey: null }).id);
        created++;
      }
      const projectId = this.insertProject(parsed.project, parsed.letterhead);
      parsed.cases.forEach((c, i) => {
        const inputs = validateCaseInputs(remapMaterialIds(c.inputs, (fileId) => idMap.get(fileId)!));
        storeNamingCase(i, c.name, () => this.insertCase(projectId, c.name, inputs));
      });
      if (parsed.schedule !== null) {
        if (parsed.schedule.settings !== null) this.db.prepare('UPDATE projects SET schedule_settings = ? WHERE id = ?').run(JSON.stringify(parsed.schedule.settings), projectId);
        const insert = this.db.prepare('INSERT INTO schedule_runs (project_id, reference, position, run, sizing) VALUES (?, ?, ?, ?, NULL)');
        parsed.schedule.runs.forEach((run, i) => insert.run(projectId, run.reference, i, JSON.stringify(run)));
      }
      const replaced = same && choice === 'replace' ? same.id : null;
      if (replaced !== null) this.remove(replaced);
      return { project: this.open(projectId), materialsReused: reused, materialsCreated: created, replaced };
    });
  }

  private earlierImportsOf(name: string): Material[] {
    const found: Material[] = [];
    const base = `${name} (imported)`.slice(0, MATERIAL_LIMITS.name - 4);
    for (let n = 1; ; n++) {
      const candidate = n === 1 ? base : `${base} ${n}`;
      const material = this.materials.findByName(candidate);
      if (!material) return found;
      found.push(material);
    }
  }

  private insertProject(fields: ProjectFields, letterhead: Letterhead | null = null): number {
    const now = nowIso();
    const result = this.db
      .prepare(
        `INSERT INTO projects (name, client, site, reference, engineer, checker, revision, revision_note, project_date, unit_system, notes,
           letterhead, created_at, updated_at)
         VALUES (@name, @client, @site, @reference, @engineer, @checker, @revision, @revision_note, @project_date, @unit_system, @notes,
           @letterhead, @now, @now)`,
      )
      .run({ ...fieldParameters(fields), letterhead: letterhead === null ? null : JSON.stringify(letterhead), now });
    return Number(result.lastInsertRowid);
  }

  /** The letterhead stored on the project itself (from an imported file), or null. */
  private ownLetterhead(id: number): Letterhead | null {
    const row = this.db.prepare('SELECT letterhead FROM projects WHERE id = ?').get(id) as { letterhead: string | null } | undefined;
    if (!row) throw new NotFoundError(`There is no project with id ${id}.`);
    return row.letterhead === null ? null : parseStoredLetterhead(row.letterhead);
  }

  private insertCase(projectId: number, name: string, inputs: CaseInputs): number {
    this.assertStorable(inputs);
    const position = (this.db.prepare('SELECT COALESCE(MAX(position), -1) + 1 AS next FROM cases WHERE project_id = ?').get(projectId) as { next: number }).next;
    const now = nowIso();
    const result = this.db
      .prepare('INSERT INTO cases (project_id, name, position, inputs, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?)')
      .run(projectId, name, position, JSON.stringify(inputs), now, now);
    const caseId = Number(result.lastInsertRowid);
    this.linkMaterials(caseId, inputs);
    return caseId;
  }

  private linkMaterials(caseId: number, inputs: CaseInputs): void {
    const link = this.db.prepare('INSERT OR IGNORE INTO case_materials (case_id, material_id) VALUES (?, ?)');
    for (const materialId of materialIdsOf(inputs)) link.run(caseId, materialId);
  }

  /**
   * A case is stored only if it can be solved: its materials exist (the service's own sentence),
   * then the engine parses it completely, as the next solve will (an outer surface emissivity, μ
   * on a wall layer, every field in its range), and refuses it now in one sentence naming the field.
   */
  private assertStorable(inputs: CaseInputs): void {
    this.assertMaterialsExist(inputs);
    checkCaseSolvable(inputs, caseContext(this.materials));
  }

  private assertMaterialsExist(inputs: CaseInputs): void {
    const exists = this.db.prepare('SELECT 1 FROM materials WHERE id = ?');
    for (const materialId of materialIdsOf(inputs)) {
      if (!exists.get(materialId)) throw new InputError('inputs', `inputs refer to material id ${materialId}, which is not in the library.`);
    }
  }

  private openEditable(id: number): Project {
    const project = this.open(id);
    if (project.deletedAt !== null) throw new RefusedError(`Project "${project.name}" is in the recycle bin; restore it before changing it.`);
    return project;
  }

  private touch(projectId: number): void {
    this.db.prepare('UPDATE projects SET updated_at = ? WHERE id = ?').run(nowIso(), projectId);
  }
}
