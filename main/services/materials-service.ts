import { materialIdsOf, remapMaterialIds, validateCaseInputs } from './case-inputs.js';
import { inWriteTransaction, nowIso, type DatabaseContext } from './database-context.js';
import type { CsvImportResult } from '../../app/api/material-types.js';
import { formatMaterialsCsv, parseMaterialsCsv } from './material-csv.js';
import { materialFromRow, materialInputOf, materialParameters, type MaterialRow } from './material-rows.js';
import {
  MATERIAL_CATEGORIES, type Material, type MaterialFilter, type MaterialInput, type MaterialUsage,
} from './material-types.js';
import { MATERIAL_LIMITS, validateMaterialInput } from './material-validation.js';
import { NotFoundError, RefusedError } from './service-errors.js';
import { InputError } from '../../app/index.js';
import { isPlainObject, optionalText, rejectUnknownKeys, requireId, requireOneOf, requireText } from './validate.js';

export type { CsvImportResult };

/**
 * The materials library. Built-in materials (from data/materials) are read-only; a user
 * duplicates one to change it. Every method validates its arguments before any SQL runs, and all
 * SQL is parameterised.
 */
export class MaterialsService {
  constructor(private readonly context: DatabaseContext) {}

  private get db() {
    return this.context.db;
  }

  list(filter: MaterialFilter = {}): Material[] {
    const checked = validateFilter(filter);
    const where: string[] = [];
    const params: Record<string, unknown> = {};
    if (checked.search) {
      where.push(`(name LIKE @pattern ESCAPE '\\' OR source LIKE @pattern ESCAPE '\\' OR notes LIKE @pattern ESCAPE '\\')`);
      params['pattern'] = `%${checked.search.replace(/[\\%_]/g, (c) => '\\' + c)}%`;
    }
    if (checked.category) {
      where.push('category = @category');
      params['category'] = checked.category;
    }
    if (checked.origin !== 'all') {
      where.push('built_in = @builtIn');
      params['builtIn'] = checked.origin === 'built-in' ? 1 : 0;
    }
    const sql = `SELECT * FROM materials ${where.length ? 'WHERE ' + where.join(' AND ') : ''} ORDER BY category, name COLLATE NOCASE`;
    return (this.db.prepare(sql).all(params) as MaterialRow[]).map(materialFromRow);
  }

  get(id: number): Material {
    const checked = requireId(id, 'id');
    const row = this.db.prepare('SELECT * FROM materials WHERE id = ?').get(checked) as MaterialRow | undefined;
    if (!row) throw new NotFoundError(`There is no material with id ${checked}.`);
    return materialFromRow(row);
  }

  findByName(name: string): Material | undefined {
    const checked = requireText(name, 'name', { min: 1, max: MATERIAL_LIMITS.name });
    const row = this.db.prepare('SELECT * FROM materials WHERE name = ? COLLATE NOCASE').get(checked) as MaterialRow | undefined;
    return row ? materialFromRow(row) : undefined;
  }

  create(input: unknown): Material {
    const checked = validateMaterialInput(input);
    return inWriteTransaction(this.context, () => this.insert(checked, { builtIn: false, seedKey: null }));
  }

  /** Inserts a validated material inside the caller's transaction. */
  insert(input: MaterialInput, origin: { builtIn: boolean; seedKey: string | null }): Material {
    this.assertNameFree(input.name);
    const now = nowIso();
    const result = this.db
      .prepare(
        `INSERT INTO materials (name, category, conductivity, density, specific_heat, mu, sd, emissivity, min_service_temp,
           max_service_temp, source, notes, built_in, seed_key, created_at, updated_at)
         VALUES (@name, @category, @conductivity, @density, @specific_heat, @mu, @sd, @emissivity, @min_service_temp,
           @max_service_temp, @source, @notes, @built_in, @seed_key, @now, @now)`,
      )
      .run({ ...materialParameters(input), built_in: origin.builtIn ? 1 : 0, seed_key: origin.seedKey, now });
    return this.get(Number(result.lastInsertRowid));
  }

  update(id: number, input: unknown): Material {
    const checkedId = requireId(id, 'id');
    const checked = validateMaterialInput(input);
    return inWriteTransaction(this.context, () => {
      const current = this.get(checkedId);
      if (current.builtIn) throw new RefusedError(`"${current.name}" is a built-in material and cannot be changed; duplicate it and edit the copy.`);
      this.assertNameFree(checked.name, checkedId);
      this.db
        .prepare(
          `UPDATE materials SET name = @name, category = @category, conductivity = @conductivity, density = @density,
             specific_heat = @specific_heat, mu = @mu, sd = @sd, emissivity = @emissivity, min_service_temp = @min_service_temp,
             max_service_temp = @max_service_temp, source = @source, notes = @notes, updated_at = @now
           WHERE id = @id`,
        )
        .run({ ...materialParameters(checked), id: checkedId, now: nowIso() });
      return this.get(checkedId);
    });
  }

  /** A user copy of any material (built-in or not), named "<name> (copy)" unless a name is given. */
  duplicate(id: number, name?: string): Material {
    const checkedId = requireId(id, 'id');
    const checkedName = name === undefined ? undefined : requireText(name, 'name', { min: 1, max: MATERIAL_LIMITS.name });
    return inWriteTransaction(this.context, () => {
      const original = this.get(checkedId);
      const copyName = checkedName ?? this.freeName(`${original.name} (copy)`);
      return this.insert({ ...materialInputOf(original), name: copyName }, { builtIn: false, seedKey: null });
    });
  }

  /** Projects and cases that use the material, including projects in the recycle bin. */
  usage(id: number): MaterialUsage[] {
    const checkedId = requireId(id, 'id');
    const rows = this.db
      .prepare(
        `SELECT p.id AS projectId, p.name AS projectName, c.id AS caseId, c.name AS caseName, p.deleted_at IS NOT NULL AS inRecycleBin
         FROM case_materials cm JOIN cases c ON c.id = cm.case_id JOIN projects p ON p.id = c.project_id
         WHERE cm.material_id = ? ORDER BY p.name, c.position`,
      )
      .all(checkedId) as (Omit<MaterialUsage, 'inRecycleBin'> & { inRecycleBin: number })[];
    return rows.map((r) => ({ ...r, inRecycleBin: r.inRecycleBin === 1 }));
  }

  /**
   * Deletes a user material. Refused while any case uses it, unless `replaceWith` names another
   * material: then every reference is switched to the replacement in the same transaction.
   */
  remove(id: number, options: { replaceWith?: number } = {}): { replacedInCases: number } {
    const checkedId = requireId(id, 'id');
    if (!isPlainObject(options)) throw new InputError('options', 'options must be an object.');
    rejectUnknownKeys(options, ['replaceWith'], 'options');
    const replacement = options.replaceWith === undefined ? undefined : requireId(options.replaceWith, 'replaceWith');
    if (replacement === checkedId) throw new InputError('replaceWith', 'replaceWith must name a different material than the one being deleted.');
    return inWriteTransaction(this.context, () => {
      const material = this.get(checkedId);
      if (material.builtIn) throw new RefusedError(`"${material.name}" is a built-in material and cannot be deleted.`);
      const uses = this.usage(checkedId);
      if (uses.length > 0 && replacement === undefined) {
        const projects = [...new Set(uses.map((u) => `"${u.projectName}"${u.inRecycleBin ? ' (in the recycle bin)' : ''}`))];
        throw new RefusedError(`"${material.name}" is used by ${uses.length} case(s) in project ${projects.join(', ')}; choose a replacement material or remove it from those cases first.`);
      }
      if (replacement !== undefined) {
        this.get(replacement);
        this.replaceInCases(checkedId, replacement);
      }
      this.db.prepare('DELETE FROM materials WHERE id = ?').run(checkedId);
      return { replacedInCases: uses.length };
    });
  }

  private replaceInCases(from: number, to: number): void {
    const cases = this.db
      .prepare('SELECT c.id, c.inputs FROM cases c JOIN case_materials cm ON cm.case_id = c.id WHERE cm.material_id = ?')
      .all(from) as { id: number; inputs: string }[];
    const updateCase = this.db.prepare('UPDATE cases SET inputs = ?, updated_at = ? WHERE id = ?');
    const link = this.db.prepare('INSERT OR IGNORE INTO case_materials (case_id, material_id) VALUES (?, ?)');
    const unlink = this.db.prepare('DELETE FROM case_materials WHERE case_id = ? AND material_id = ?');
    const now = nowIso();
    for (const c of cases) {
      // Envelope only, not checkCaseSolvable: a case stored before cases were checked completely
      // (or one a migration carried over) may already be incomplete, and replacing a material must
      // not fail because of an old gap the replacement did not make; the case still solves or fails
      // by name at the next solve, and is checked completely when it is next saved.
      const inputs = validateCaseInputs(remapMaterialIds(JSON.parse(c.inputs), (id) => (id === from ? to : id)));
      updateCase.run(JSON.stringify(inputs), now, c.id);
      link.run(c.id, to);
      unlink.run(c.id, from);
      if (!materialIdsOf(inputs).includes(to)) throw new Error('replacement did not reach every reference'); // cannot happen: guards the remap
    }
  }

  /**
   * Imports user materials from CSV, all or nothing: every row is checked (format, units in the
   * header, ranges, names repeated in the file or already in the library) and every problem is
   * reported with its line number; nothing is written unless all rows are good.
   */
  importCsv(text: unknown): CsvImportResult {
    if (typeof text !== 'string') throw new InputError('csv', 'csv must be text.');
    if (text.length > 20_000_000) throw new InputError('csv', 'csv must be at most 20 MB.');
    const { rows, problems } = parseMaterialsCsv(text);
    const all = [...problems];
    for (const row of rows) {
      const existing = this.db.prepare('SELECT name FROM materials WHERE name = ? COLLATE NOCASE').get(row.input.name) as { name: string } | undefined;
      if (existing) all.push({ line: row.line, message: `a material named "${existing.name}" is already in the library.` });
    }
    if (all.length > 0) return { ok: false, problems: all.sort((a, b) => a.line - b.line) };
    const created = inWriteTransaction(this.context, () => rows.map((r) => this.insert(r.input, { builtIn: false, seedKey: null })));
    return { ok: true, created };
  }

  exportCsv(filter: MaterialFilter = {}): string {
    return formatMaterialsCsv(this.list(filter));
  }

  /** `base`, or `base 2`, `base 3`, ... whichever is not yet taken. */
  freeName(base: string): string {
    const trimmed = base.slice(0, MATERIAL_LIMITS.name - 4);
    let candidate = trimmed;
    for (let n = 2; this.nameTaken(candidate); n++) candidate = `${trimmed} ${n}`;
    return candidate;
  }

  private nameTaken(name: string, exceptId?: number): boolean {
    const row = this.db.prepare('SELECT id FROM materials WHERE name = ? COLLATE NOCASE').get(name) as { id: number } | undefined;
    return row !== undefined && row.id !== exceptId;
  }

  private assertNameFree(name: string, exceptId?: number): void {
    if (this.nameTaken(name, exceptId)) throw new RefusedError(`A material named "${name}" already exists; choose another name.`);
  }
}

function validateFilter(filter: unknown): Required<Pick<MaterialFilter, 'origin'>> & MaterialFilter {
  if (!isPlainObject(filter)) throw new InputError('filter', 'filter must be an object.');
  rejectUnknownKeys(filter, ['search', 'category', 'origin'], 'filter');
  const search = optionalText(filter['search'], 'search', 200);
  const category = filter['category'] === undefined ? undefined : requireOneOf(filter['category'], 'category', MATERIAL_CATEGORIES);
  const origin = filter['origin'] === undefined ? 'all' : requireOneOf(filter['origin'], 'origin', ['all', 'built-in', 'user'] as const);
  return { ...(search ? { search } : {}), ...(category ? { category } : {}), origin };
}
