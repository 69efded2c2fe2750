import fs from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';
import { createBackup, verifyDatabaseFile } from './backups.js';
import { inspectDatabaseFile } from './inspect-file.js';
import { LATEST_SCHEMA_VERSION, migrate, schemaVersionOf } from './migrations.js';
import { StorageError, describeWriteFailure } from './storage-error.js';

export interface OpenedDatabase {
  readonly db: Database.Database;
  readonly path: string;
  /** Schema version found on disk before this open (0 for a new file). */
  readonly migratedFrom: number;
  /** Backup written before migrating, if a migration ran on an existing database. */
  readonly preMigrationBackup?: string;
}

export interface OpenOptions {
  /** How long a writer waits for another process's transaction before giving up (ms). */
  readonly busyTimeoutMs?: number;
  readonly backupsKept?: number;
}

/**
 * Opens (creating if absent) the database file and brings its schema up to date.
 *
 * Order matters: the file is checked read-only first (header, quick_check, schema version) so a
 * damaged, foreign or newer file is refused before anything could write to it. Only then is it
 * opened for writing, switched to WAL with foreign keys on, backed up if a migration is due, and
 * migrated inside one transaction. Several processes may open the same file: SQLite's locking
 * serialises writers and busy_timeout makes a writer wait instead of failing.
 */
export async function openDatabase(filePath: string, options: OpenOptions = {}): Promise<OpenedDatabase> {
  const absolute = path.resolve(filePath);
  const folder = path.dirname(absolute);
  let created = false;
  if (!fs.existsSync(absolute)) {
    try {
      fs.mkdirSync(folder, { recursive: true });
    } catch (error) {
      throw new StorageError('read-only', `Lamina cannot create the folder ${folder} for its database (${(error as NodeJS.ErrnoException).code}). Choose another location with --db or LAMINA_DB.`, { cause: error });
    }
    assertWritable(absolute, folder, false);
    created = createDatabaseAtomically(absolute, options);
  }
  inspectDatabaseFile(absolute); // bytes only: a foreign or truncated file is named as such even in a read-only folder
  assertWritable(absolute, folder, true);
  verifyDatabaseFile(absolute);

  let db: Database.Database;
  try {
    db = new Database(absolute, { timeout: options.busyTimeoutMs ?? 10_000 });
  } catch (error) {
    throw describeWriteFailure(error, absolute);
  }
  try {
    db.pragma('journal_mode = WAL');
    db.pragma('synchronous = FULL'); // a committed change survives power loss, not only a crash
    db.pragma('foreign_keys = ON');
    const found = schemaVersionOf(db);
    let preMigrationBackup: string | undefined;
    if (found > 0 && found < LATEST_SCHEMA_VERSION) {
      preMigrationBackup = (await createBackup(db, absolute, 'pre-migration', { keep: options.backupsKept })).file;
    }
    const migratedFrom = created ? 0 : found < LATEST_SCHEMA_VERSION ? migrate(db, absolute) : found;
    return preMigrationBackup ? { db, path: absolute, migratedFrom, preMigrationBackup } : { db, path: absolute, migratedFrom };
  } catch (error) {
    db.close();
    throw describeWriteFailure(error, absolute);
  }
}

/**
 * A new database is built complete (schema at the latest version) in a private file beside the
 * target and then linked into place, which fails if the name exists. So another process starting
 * at the same moment sees either no file or a whole database, never the empty file SQLite leaves
 * between creating a file and its first write (which would rightly be refused as truncated).
 */
function createDatabaseAtomically(target: string, options: OpenOptions): boolean {
  const temporary = path.join(path.dirname(target), `.${path.basename(target)}.new-${process.pid}-${Date.now()}`);
  try {
    const db = new Database(temporary, { timeout: options.busyTimeoutMs ?? 10_000 });
    try {
      db.pragma('journal_mode = WAL');
      db.pragma('synchronous = FULL');
      db.pragma('foreign_keys = ON');
      migrate(db, temporary);
    } finally {
      db.close(); // checkpoints the WAL into the file and removes it
    }
    try {
      fs.linkSync(temporary, target);
      return true;
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
      return false; // another process won: use its file
    }
  } catch (error) {
    throw describeWriteFailure(error, target);
  } finally {
    for (const leftover of [temporary, `${temporary}-wal`, `${temporary}-shm`]) fs.rmSync(leftover, { force: true });
  }
}

/** A read-only file or folder is reported up front, in one sentence, before SQLite tries to write. */
function assertWritable(file: string, folder: string, exists: boolean): void {
  const targets = exists ? [folder, file] : [folder];
  for (const target of targets) {
    try {
      fs.accessSync(target, fs.constants.W_OK);
    } catch {
      throw new StorageError('read-only', `Lamina cannot write to ${target} (read-only): nothing was changed. Make it writable, or choose another location with --db or LAMINA_DB.`);
    }
  }
}
