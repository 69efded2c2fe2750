import type Database from 'better-sqlite3';
import { LAMINA_APPLICATION_ID } from './application-id.js';
import { inspectDatabaseFile } from './inspect-file.js';
import { LATEST_SCHEMA_VERSION, VERSION_WITH_APPLICATION_ID, newerSchemaError, schemaVersionOf } from './migrations.js';
import { openReadOnlySnapshot } from './read-only-snapshot.js';
import { clippedText, shownPath } from './shown-path.js';
import { StorageError } from './storage-error.js';

/**
 * Checks, read-only, that a file is a healthy Lamina library this version can open: the path and
 * header bytes first, then whose database it is, SQLite's own quick_check and the schema version.
 * Nothing is written and no companion file is created (read-only-snapshot.ts), so a refused file
 * and its folder stay exactly as they were.
 *
 * A library is recognised by Lamina's application_id, or, for libraries made before the id was
 * written (schema versions 1 to 3), by that version together with Lamina's first tables and the
 * materials columns no other program would have.
 */
const FIRST_TABLES = ['materials', 'projects', 'cases'] as const;
const MATERIAL_COLUMNS = ['conductivity', 'built_in', 'seed_key'] as const;

export function verifyDatabaseFile(filePath: string): { schemaVersion: number } {
  const shown = shownPath(filePath);
  const onDisk = inspectDatabaseFile(filePath);
  if (onDisk.kind === 'absent') {
    throw new StorageError('missing-file', `The database ${shown} does not exist; nothing was changed.`);
  }
  // An id in the header that is not ours settles it without asking SQLite anything.
  if (onDisk.applicationId !== 0 && onDisk.applicationId !== LAMINA_APPLICATION_ID) throw foreignDatabase(shown);
  let db: Database.Database | undefined;
  try {
    db = openReadOnlySnapshot(filePath, onDisk.walMode);
    if (!isLaminaLibrary(db)) throw foreignDatabase(shown);
    const version = schemaVersionOf(db);
    if (version > LATEST_SCHEMA_VERSION) throw newerSchemaError(filePath, version);
    // quick_check(1): SQLite's structural check, stopping at the first problem so the message stays one line.
    const check = String(db.pragma('quick_check(1)', { simple: true }));
    if (check !== 'ok') {
      throw new StorageError('damaged', `The database ${shown} is damaged (SQLite reports: ${clippedText(check)}): restore a backup; Lamina has not changed it.`);
    }
    return { schemaVersion: version };
  } catch (error) {
    if (error instanceof StorageError) throw error;
    const code = (error as { code?: string }).code ?? '';
    const reported = clippedText((error as Error).message);
    if (code === 'SQLITE_NOTADB' || code.startsWith('SQLITE_CORRUPT')) {
      throw new StorageError('damaged', `The database ${shown} is damaged (${reported}): restore a backup; Lamina has not changed it.`, { cause: error });
    }
    if (code.startsWith('SQLITE_CANTOPEN') || code.startsWith('SQLITE_READONLY') || code === 'SQLITE_PERM' || code === 'EACCES' || code === 'EPERM') {
      throw new StorageError('unreadable', `Lamina cannot read ${shown} (${reported}): check that the file and its folder can be read; nothing was changed.`, { cause: error });
    }
    throw error;
  } finally {
    db?.close();
  }
}

function isLaminaLibrary(db: Database.Database): boolean {
  const id = db.pragma('application_id', { simple: true }) as number;
  if (id === LAMINA_APPLICATION_ID) return true;
  const version = schemaVersionOf(db);
  if (id !== 0 || version < 1 || version >= VERSION_WITH_APPLICATION_ID) return false;
  const count = (sql: string, names: readonly string[]) => (db.prepare(sql).get(...names) as { n: number }).n;
  const marks = (names: readonly string[]) => names.map(() => '?').join(', ');
  return (
    count(`SELECT count(*) AS n FROM sqlite_schema WHERE type = 'table' AND name IN (${marks(FIRST_TABLES)})`, FIRST_TABLES) === FIRST_TABLES.length &&
    count(`SELECT count(*) AS n FROM pragma_table_info('materials') WHERE name IN (${marks(MATERIAL_COLUMNS)})`, MATERIAL_COLUMNS) === MATERIAL_COLUMNS.length
  );
}

function foreignDatabase(shown: string): StorageError {
  return new StorageError('foreign-database', `The file ${shown} is not a Lamina database (it is an SQLite database of another program): choose another file; Lamina has not changed it.`);
}
