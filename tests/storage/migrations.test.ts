import fs from 'node:fs';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { LAMINA_APPLICATION_ID } from '../../main/storage/application-id.js';
import { listBackups } from '../../main/storage/backups.js';
import { LATEST_SCHEMA_VERSION, MIGRATIONS, migrate } from '../../main/storage/migrations.js';
import { openDatabase } from '../../main/storage/open-database.js';
import { openLamina } from '../../main/services/lamina-services.js';
import { EMPTY_LETTERHEAD } from '../../app/report/project-report.js';
import { tempDatabasePath } from './temp-folder.js';

/** Builds a database at an earlier schema version, the way that version of Lamina left it, with data in it. */
function databaseAtVersion(file: string, version: number): void {
  const db = new Database(file);
  db.pragma('journal_mode = WAL');
  migrate(db, file, version);
  const now = '2024-01-01T00:00:00.000Z';
  const insertMaterial = db.prepare(
    `INSERT INTO materials (name, category, conductivity, density, built_in, created_at, updated_at) VALUES (?, 'insulation', ?, 30, 0, ?, ?)`,
  );
  const a = Number(insertMaterial.run('Old board', JSON.stringify({ kind: 'constant', value: 0.04 }), now, now).lastInsertRowid);
  // Version 1 did not forbid repeated names; version 2 must tag the second one, not fail.
  const b = version < 2 ? Number(insertMaterial.run('old BOARD', JSON.stringify({ kind: 'constant', value: 0.05 }), now, now).lastInsertRowid) : a;
  const project = Number(db.prepare(`INSERT INTO projects (name, created_at, updated_at) VALUES ('Harbour Road boiler house', ?, ?)`).run(now, now).lastInsertRowid);
  const inputs = { schemaVersion: 1, kind: 'pipe', length: 20, layers: [{ materialId: a, thickness: 0.05 }, { materialId: b, thickness: 0.03 }] };
  const caseId = Number(db.prepare(`INSERT INTO cases (project_id, name, position, inputs, created_at, updated_at) VALUES (?, 'Flow line', 0, ?, ?, ?)`).run(project, JSON.stringify(inputs), now, now).lastInsertRowid);
  if (version >= 2) db.prepare('INSERT INTO case_materials (case_id, material_id) VALUES (?, ?)').run(caseId, a);
  db.close();
}

describe('schema migrations', () => {
  it('keeps every migration in order with no gaps, so each earlier version is reachable', () => {
    expect(MIGRATIONS.map((m) => m.version)).toEqual(Array.from({ length: LATEST_SCHEMA_VERSION }, (_, i) => i + 1));
    expect(LATEST_SCHEMA_VERSION).toBeGreaterThanOrEqual(3);
  });

  it('creates a new database at the latest version, in WAL mode, with foreign keys on', async () => {
    const file = tempDatabasePath();
    const opened = await openDatabase(file);
    expect(opened.migratedFrom).toBe(0);
    expect(opened.db.pragma('user_version', { simple: true })).toBe(LATEST_SCHEMA_VERSION);
    expect(opened.db.pragma('journal_mode', { simple: true })).toBe('wal');
    expect(opened.db.pragma('foreign_keys', { simple: true })).toBe(1);
    expect(opened.db.pragma('application_id', { simple: true })).toBe(LAMINA_APPLICATION_ID);
    expect(opened.preMigrationBackup).toBeUndefined(); // nothing to back up in a new file
    opened.db.close();
  });

  for (let version = 1; version < LATEST_SCHEMA_VERSION; version++) {
    it(`migrates a database created at version ${version}, keeping its data and backing it up first`, async () => {
      const file = tempDatabasePath();
      databaseAtVersion(file, version);
      const lamina = await openLamina(file);
      try {
        expect(lamina.migratedFrom).toBe(version);
        expect(lamina.preMigrationBackup).toBeDefined();
        const backups = listBackups(file);
        expect(backups.map((b) => b.reason)).toEqual(['pre-migration']);
        // The backup holds the database as it was before the migration.
        const copy = new Database(backups[0]!.file, { readonly: true });
        expect(copy.pragma('user_version', { simple: true })).toBe(version);
        copy.close();

        const migrated = new Database(file, { readonly: true });
        expect(migrated.pragma('application_id', { simple: true })).toBe(LAMINA_APPLICATION_ID); // gained in migration 4
        migrated.close();

        const [project] = lamina.projects.list();
        expect(project?.name).toBe('Harbour Road boiler house');
        const opened = lamina.projects.open(project!.id);
        expect(opened.cases).toHaveLength(1);
        const used = opened.cases[0]!.inputs.layers[0]!.materialId;
        // Version 2 records material use in a table: the material in use cannot be deleted.
        expect(lamina.materials.usage(used)).toHaveLength(1);
        expect(() => lamina.materials.remove(used)).toThrow(/is used by 1 case/);
        if (version < 2) expect(lamina.materials.list({ search: 'old board' }).map((m) => m.name).sort()).toEqual(['Old board', `old BOARD (#${used + 1})`]);
        // The stored case predates complete checks (it has no pipe and no ambient): it opens as it was
        // stored, replacing its material still rewrites it (envelope only), and saving it is refused.
        const stored = opened.cases[0]!;
        const spare = lamina.materials.create({ name: 'Harbour Road spare board', category: 'insulation', conductivity: { kind: 'constant', value: 0.04 } });
        expect(lamina.materials.remove(used, { replaceWith: spare.id })).toEqual({ replacedInCases: 1 });
        const replaced = lamina.projects.getCase(stored.id);
        expect(replaced.inputs.layers[0]!.materialId).toBe(spare.id);
        expect(() => lamina.projects.updateCase(stored.id, { inputs: replaced.inputs })).toThrow('ambient must be an object.');
        expect(lamina.projects.getCase(stored.id)).toEqual(replaced);
      } finally {
        lamina.close();
      }
    });
  }

  it('version 5 gives a version 4 library a settings table and each project an empty checker, revision note and no letterhead of its own', async () => {
    const file = tempDatabasePath();
    databaseAtVersion(file, 4);
    const lamina = await openLamina(file);
    try {
      expect(lamina.migratedFrom).toBe(4);
      const [summary] = lamina.projects.list();
      const project = lamina.projects.open(summary!.id);
      expect([project.checker, project.revisionNote]).toEqual(['', '']);
      // No letterhead of its own: it prints with the library's, empty until one is saved.
      expect(lamina.projects.letterheadOf(project.id)).toEqual(EMPTY_LETTERHEAD);
      lamina.letterhead.save({ firmName: 'Fernhill Thermal Consultants', paper: 'Letter' });
      expect(lamina.projects.letterheadOf(project.id)).toMatchObject({ firmName: 'Fernhill Thermal Consultants', paper: 'Letter' });
      expect(lamina.projects.update(project.id, { checker: 'J. Lindqvist', revisionNote: 'Issued for tender' })).toMatchObject({ checker: 'J. Lindqvist', revisionNote: 'Issued for tender' });
    } finally {
      lamina.close();
    }
    const db = new Database(file, { readonly: true });
    const columns = (db.prepare('PRAGMA table_info(projects)').all() as { name: string; notnull: number; dflt_value: string | null }[])
      .filter((c) => ['checker', 'revision_note', 'letterhead'].includes(c.name))
      .map((c) => [c.name, c.notnull, c.dflt_value]);
    expect(columns).toEqual([['checker', 1, "''"], ['revision_note', 1, "''"], ['letterhead', 0, null]]);
    expect(db.prepare(`SELECT key FROM settings`).all()).toEqual([{ key: 'letterhead' }]);
    db.close();
  });

  it('refuses a database from a newer Lamina and leaves its bytes untouched', async () => {
    const file = tempDatabasePath();
    const db = new Database(file);
    db.pragma('journal_mode = DELETE');
    db.exec('CREATE TABLE future (x)');
    db.pragma(`application_id = ${LAMINA_APPLICATION_ID}`); // a newer Lamina marks its files as this one does
    db.pragma(`user_version = ${LATEST_SCHEMA_VERSION + 1}`);
    db.close();
    const before = fs.readFileSync(file);
    await expect(openLamina(file)).rejects.toThrow(
      `was written by a newer Lamina (schema version ${LATEST_SCHEMA_VERSION + 1}; this version understands up to ${LATEST_SCHEMA_VERSION}): update Lamina to open it; the file has not been changed.`,
    );
    expect(fs.readFileSync(file).equals(before)).toBe(true);
    expect(fs.existsSync(file + '-wal')).toBe(false);
    expect(listBackups(file)).toEqual([]);
  });

  it('rolls a failing migration back completely', () => {
    const file = tempDatabasePath();
    const db = new Database(file);
    migrate(db, file, 1);
    db.exec(`INSERT INTO materials (name, category, conductivity, created_at, updated_at) VALUES ('x', 'other', '{}', 'a', 'a')`);
    db.exec('CREATE TABLE case_materials (oops)'); // makes version 2 fail half-way
    expect(() => migrate(db, file)).toThrow(/already exists/);
    expect(db.pragma('user_version', { simple: true })).toBe(1);
    expect(db.prepare(`SELECT name FROM sqlite_master WHERE name = 'materials_name'`).get()).toBeUndefined();
    db.close();
  });
});
