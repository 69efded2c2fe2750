import type Database from 'better-sqlite3';
import { LAMINA_APPLICATION_ID } from './application-id.js';
import { shownPath } from './shown-path.js';
import { StorageError } from './storage-error.js';

/**
 * The schema, as an ordered list of forward migrations. The schema version lives in
 * PRAGMA user_version; a fresh file is version 0. Never edit a migration that has shipped: add the
 * next one. Every earlier version must stay reachable so the migration tests can build a database
 * at that version and carry it forward.
 */
export interface Migration {
  readonly version: number;
  readonly description: string;
  readonly up: (db: Database.Database) => void;
}

/** From this version on every Lamina library carries LAMINA_APPLICATION_ID; earlier ones carry none. */
export const VERSION_WITH_APPLICATION_ID = 4;

export const MIGRATIONS: readonly Migration[] = [
  {
    version: 1,
    description: 'materials, projects and cases',
    up: (db) =>
      db.exec(`
        CREATE TABLE materials (
          id INTEGER PRIMARY KEY,
          name TEXT NOT NULL,
          category TEXT NOT NULL,
          conductivity TEXT NOT NULL,              -- ConductivityModel as JSON (app/fe/conductivity.ts)
          density REAL,                            -- kg/m3
          specific_heat REAL,                      -- J/(kg.K)
          mu REAL,                                 -- vapour resistance factor, dimensionless (Inf = vapour-tight)
          sd REAL,                                 -- equivalent air-layer thickness, m (membranes)
          emissivity REAL,                         -- surface emissivity, 0..1
          min_service_temp REAL,                   -- degC
          max_service_temp REAL,                   -- degC
          source TEXT NOT NULL DEFAULT '',
          notes TEXT NOT NULL DEFAULT '',
          built_in INTEGER NOT NULL DEFAULT 0 CHECK (built_in IN (0, 1)),
          seed_key TEXT UNIQUE,
          created_at TEXT NOT NULL,
          updated_at TEXT NOT NULL
        );
        CREATE TABLE projects (
          id INTEGER PRIMARY KEY,
          name TEXT NOT NULL,
          client TEXT NOT NULL DEFAULT '',
          site TEXT NOT NULL DEFAULT '',
          reference TEXT NOT NULL DEFAULT '',
          engineer TEXT NOT NULL DEFAULT '',
          revision TEXT NOT NULL DEFAULT '',
          project_date TEXT NOT NULL DEFAULT '',
          unit_system TEXT NOT NULL DEFAULT 'SI',
          notes TEXT NOT NULL DEFAULT '',
          created_at TEXT NOT NULL,
          updated_at TEXT NOT NULL,
          deleted_at TEXT
        );
        CREATE TABLE cases (
          id INTEGER PRIMARY KEY,
          project_id INTEGER NOT NULL REFERENCES projects(id) ON DELETE CASCADE,
          name TEXT NOT NULL,
          position INTEGER NOT NULL,
          inputs TEXT NOT NULL,                    -- versioned JSON; results are never stored
          created_at TEXT NOT NULL,
          updated_at TEXT NOT NULL
        );
        CREATE INDEX cases_project ON cases(project_id, position);
      `),
  },
  {
    version: 2,
    description: 'material references held by the database; unique material names',
    up: (db) =>
      db.exec(`
        -- Which materials each case uses, so that deleting a material in use is refused by a
        -- foreign key rather than by a search through JSON.
        CREATE TABLE case_materials (
          case_id INTEGER NOT NULL REFERENCES cases(id) ON DELETE CASCADE,
          material_id INTEGER NOT NULL REFERENCES materials(id) ON DELETE RESTRICT,
          PRIMARY KEY (case_id, material_id)
        ) WITHOUT ROWID;
        CREATE INDEX case_materials_material ON case_materials(material_id);
        INSERT OR IGNORE INTO case_materials (case_id, material_id)
          SELECT c.id, t.value FROM cases c, json_tree(c.inputs) t
          WHERE (t.key = 'materialId' OR t.key GLOB '*MaterialId') AND t.type = 'integer'
            AND t.value IN (SELECT id FROM materials);
        -- Version 1 allowed two materials with the same name; keep the oldest name and tag the others.
        UPDATE materials SET name = name || ' (#' || id || ')'
          WHERE id NOT IN (SELECT MIN(id) FROM materials GROUP BY name COLLATE NOCASE);
        CREATE UNIQUE INDEX materials_name ON materials(name COLLATE NOCASE);
        CREATE INDEX materials_category ON materials(category);
      `),
  },
  {
    version: 3,
    description: 'application bookkeeping (seed data fingerprint)',
    up: (db) =>
      db.exec(`
        CREATE TABLE app_meta (key TEXT PRIMARY KEY, value TEXT NOT NULL) WITHOUT ROWID;
        CREATE INDEX projects_deleted ON projects(deleted_at);
      `),
  },
  {
    version: VERSION_WITH_APPLICATION_ID,
    description: "Lamina's application_id in the file header, so other programs' databases are told apart",
    up: (db) => {
      db.pragma(`application_id = ${LAMINA_APPLICATION_ID}`);
    },
  },
  {
    version: 5,
    description: 'settings (the letterhead of printed reports); projects gain checker, revision note and an imported letterhead',
    up: (db) =>
      db.exec(`
        -- One row per setting; the value is JSON (key 'letterhead': the firm's letterhead).
        CREATE TABLE settings (key TEXT PRIMARY KEY, value TEXT NOT NULL) WITHOUT ROWID;
        ALTER TABLE projects ADD COLUMN checker TEXT NOT NULL DEFAULT '';
        ALTER TABLE projects ADD COLUMN revision_note TEXT NOT NULL DEFAULT '';
        -- A project's own letterhead (JSON), from an imported file; NULL prints the library's.
        ALTER TABLE projects ADD COLUMN letterhead TEXT NULL;
      `),
  },
  {
    version: 6,
    description: "a project's schedule of pipe runs, its settings, and each run's last sizing",
    up: (db) =>
      db.exec(`
        -- One row per run (JSON, SI). The sizing is kept with the pipe case it was sized from
        -- (case_key), so a run is re-sized only when that case changes.
        CREATE TABLE schedule_runs (
          project_id INTEGER NOT NULL REFERENCES projects(id) ON DELETE CASCADE,
          reference TEXT NOT NULL COLLATE NOCASE,
          position INTEGER NOT NULL,
          run TEXT NOT NULL,
          sizing TEXT NULL,
          PRIMARY KEY (project_id, reference)
        ) WITHOUT ROWID;
        -- The schedule's condition sets, services and economics (JSON); NULL: the shipped defaults.
        ALTER TABLE projects ADD COLUMN schedule_settings TEXT NULL;
      `),
  },
];

export const LATEST_SCHEMA_VERSION = MIGRATIONS[MIGRATIONS.length - 1]!.version;

export function schemaVersionOf(db: Database.Database): number {
  return db.pragma('user_version', { simple: true }) as number;
}

export function newerSchemaError(filePath: string, version: number): StorageError {
  return new StorageError('newer-schema', `The database ${shownPath(filePath)} was written by a newer Lamina (schema version ${version}; this version understands up to ${LATEST_SCHEMA_VERSION}): update Lamina to open it; the file has not been changed.`);
}

/**
 * Brings the database forward to `target` in one IMMEDIATE transaction: either every step is
 * applied or none. The version is re-read inside the transaction so that two processes starting
 * together do not both migrate. Returns the version found before migrating.
 */
export function migrate(db: Database.Database, filePath: string, target: number = LATEST_SCHEMA_VERSION): number {
  const run = db.transaction(() => {
    const current = schemaVersionOf(db);
    if (current > LATEST_SCHEMA_VERSION) throw newerSchemaError(filePath, current);
    for (const migration of MIGRATIONS) {
      if (migration.version <= current || migration.version > target) continue;
      migration.up(db);
      db.pragma(`user_version = ${migration.version}`);
    }
    return current;
  });
  return run.immediate();
}
