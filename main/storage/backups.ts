import fs from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';
import type { BackupInfo } from '../../app/api/backup-types.js';
import { verifyDatabaseFile } from './verify-database.js';

/**
 * Backups are whole-database copies made with SQLite's online backup API, kept in a `backups`
 * folder beside the database and named `<database>-<UTC stamp>-<reason>.sqlite`, so sorting the
 * names sorts them by age. A copy is written under a temporary name and renamed when complete:
 * a half-written copy is never listed as a backup.
 */
export type BackupReason = 'pre-migration' | 'daily' | 'manual' | 'pre-restore';

export type { BackupInfo };

export const DEFAULT_BACKUPS_KEPT = 10;
const DAY_MS = 24 * 60 * 60 * 1000;

export function backupFolderOf(databasePath: string): string {
  return path.join(path.dirname(databasePath), 'backups');
}

function stampOf(date: Date): string {
  return date.toISOString().replace(/[-:]/g, '').replace(/\.(\d{3})Z$/, '$1Z'); // 20240131T120000123Z
}

function parseStamp(stamp: string): Date | undefined {
  const m = /^(\d{4})(\d{2})(\d{2})T(\d{2})(\d{2})(\d{2})(\d{3})Z$/.exec(stamp);
  if (!m) return undefined;
  return new Date(Date.UTC(+m[1]!, +m[2]! - 1, +m[3]!, +m[4]!, +m[5]!, +m[6]!, +m[7]!));
}

export function listBackups(databasePath: string): BackupInfo[] {
  const folder = backupFolderOf(databasePath);
  if (!fs.existsSync(folder)) return [];
  const base = path.basename(databasePath, path.extname(databasePath));
  const pattern = new RegExp(`^${base.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}-(\\d{8}T\\d{9}Z)-([a-z-]+)\\.sqlite$`);
  const found: BackupInfo[] = [];
  for (const name of fs.readdirSync(folder)) {
    const m = pattern.exec(name);
    const date = m ? parseStamp(m[1]!) : undefined;
    if (!m || !date) continue;
    const file = path.join(folder, name);
    found.push({ file, reason: m[2]!, createdAt: date.toISOString(), sizeBytes: fs.statSync(file).size });
  }
  return found.sort((a, b) => (a.createdAt < b.createdAt ? 1 : a.createdAt > b.createdAt ? -1 : 0)); // newest first
}

/** Copies the open database into a new backup file and prunes the oldest beyond `keep`. */
export async function createBackup(db: Database.Database, databasePath: string, reason: BackupReason, options: { keep?: number; now?: Date } = {}): Promise<BackupInfo> {
  const keep = options.keep ?? DEFAULT_BACKUPS_KEPT;
  const folder = backupFolderOf(databasePath);
  fs.mkdirSync(folder, { recursive: true });
  const base = path.basename(databasePath, path.extname(databasePath));
  let when = options.now ?? new Date();
  let target = path.join(folder, `${base}-${stampOf(when)}-${reason}.sqlite`);
  while (fs.existsSync(target)) {
    when = new Date(when.getTime() + 1);
    target = path.join(folder, `${base}-${stampOf(when)}-${reason}.sqlite`);
  }
  const partial = `${target}.partial`;
  try {
    await db.backup(partial);
    fs.renameSync(partial, target);
  } catch (error) {
    fs.rmSync(partial, { force: true });
    throw error;
  }
  pruneBackups(databasePath, keep);
  return { file: target, reason, createdAt: when.toISOString(), sizeBytes: fs.statSync(target).size };
}

export function pruneBackups(databasePath: string, keep: number): void {
  const all = listBackups(databasePath);
  for (const old of all.slice(Math.max(1, keep))) fs.rmSync(old.file, { force: true });
}

export function isDailyBackupDue(databasePath: string, now: Date = new Date()): boolean {
  const newest = listBackups(databasePath)[0];
  return !newest || now.getTime() - Date.parse(newest.createdAt) >= DAY_MS;
}

/**
 * Replaces the database at `databasePath` by a copy of `backupFile`. The database must be closed.
 * The current file (with its -wal and -shm companions) is moved aside as
 * `<name>.before-restore-<stamp>`, never overwritten or deleted, so even a restore of the wrong
 * backup loses nothing. Returns the path the old file was moved to, if there was one.
 */
export async function restoreBackup(databasePath: string, backupFile: string, now: Date = new Date()): Promise<{ movedAsideTo?: string }> {
  verifyDatabaseFile(backupFile);
  const folder = path.dirname(databasePath);
  const restoring = path.join(folder, `.${path.basename(databasePath)}.restoring`);
  fs.rmSync(restoring, { force: true });
  const source = new Database(backupFile, { readonly: true, fileMustExist: true });
  try {
    await source.backup(restoring);
  } catch (error) {
    fs.rmSync(restoring, { force: true });
    throw error;
  } finally {
    source.close();
  }
  let movedAsideTo: string | undefined;
  if (fs.existsSync(databasePath)) {
    movedAsideTo = `${databasePath}.before-restore-${stampOf(now)}`;
    fs.renameSync(databasePath, movedAsideTo);
  }
  for (const suffix of ['-wal', '-shm']) {
    if (fs.existsSync(databasePath + suffix)) {
      // A companion without its database is moved aside too: nothing is ever deleted here.
      fs.renameSync(databasePath + suffix, (movedAsideTo ?? `${databasePath}.orphan-${stampOf(now)}`) + suffix);
    }
  }
  fs.renameSync(restoring, databasePath);
  return movedAsideTo ? { movedAsideTo } : {};
}
