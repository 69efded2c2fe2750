import fs from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';
import { createBackup } from './backups.js';
import { inspectDatabaseFile } from './inspect-file.js';
import { LATEST_SCHEMA_VERSION, migrate, schemaVersionOf } from './migrations.js';
import { shownPath } from './shown-path.js';
import { StorageError, describeWriteFailure } from './storage-error.js';
import { verifyDatabaseFile } from './verify-database.js';

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
  /**
   * Whether a missing folder for a new database is created (default true: Lamina's own folders).
   * A path the user typed passes false, so a mistyped folder is reported instead of made.
   */
  readonly createFolder?: boolean;
}

/**
 * Opens (creating if absent) the database file and brings its schema up to date.
 *
 * Order matters: the path and file are checked read-only first (verify-database.ts: header, whose
 * database it is, quick_check, schema version), so a folder, a foreign, damaged or newer file is
 * refused before anything could write to it and without a companion file appearing beside it.
 * Only a new file or a Lamina library is then opened for writing, switched to WAL with foreign
 * keys on, backed up if a migration is due, and migrated inside one transaction. Several processes
 * may open the same file: SQLite's locking serialises writers and busy_timeout makes a writer wait
 * instead of failing.
 */
export async function openDatabase(filePath: string, options: OpenOptions = {}): Promise<OpenedDatabase> {
  const absolute = path.resolve(filePath);
  const folder = path.dirname(absolute);
  let created = false;
  if (inspectDatabaseFile(absolute).kind === 'absent') {
    prepareFolder(folder, options.createFolder ?? true);
    assertWritable(absolute, folder, false);
    created = createDatabaseAtomically(absolute, options);
  }
  verifyDatabaseFile(absolute); // read-only: a file that is not a healthy Lamina library is named as such even in a read-only folder
  assertWritable(absolute, folder, true);

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

/** The folder of a new database: made if it is Lamina's own, otherwise it must exist. */
function prepareFolder(folder: string, create: boolean): void {
  if (fs.existsSync(folder)) return; // a file in its place was reported by inspectDatabaseFile
  if (!create) {
    throw new StorageError('missing-folder', `The folder ${shownPath(folder)} does not exist: create it, or choose another location with --db or LAMINA_DB; nothing was changed.`);
  }
  try {
    fs.mkdirSync(folder, { recursive: true });
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const why = code === 'EACCES' || code === 'EPERM' || code === 'EROFS' ? 'permission denied' : code === 'ENOTDIR' || code === 'EEXIST' ? 'part of its path is a file' : `the system reports ${code ?? 'an unknown error'}`;
    throw new StorageError('read-only', `Lamina cannot create the folder ${shownPath(folder)} for its database (${why}): choose another location with --db or LAMINA_DB.`, { cause: error });
  }
}

/** A read-only file or folder is reported up front, in one sentence, before SQLite tries to write. */
function assertWritable(file: string, folder: string, exists: boolean): void {
  const targets = exists ? [folder, file] : [folder];
  for (const target of targets) {
    try {
      fs.accessSync(target, fs.constants.W_OK);
    } catch {
      throw new StorageError('read-only', `Lamina cannot write to ${shownPath(target)} (read-only): make it writable, or choose another location with --db or LAMINA_DB; nothing was changed.`);
    }
  }
}
