import fs from 'node:fs';
import Database from 'better-sqlite3';

/**
 * A read-only view of a database file that leaves its folder exactly as it was.
 *
 * SQLite, asked to read a WAL-mode file, creates `-wal` and `-shm` companions beside it (and a
 * read-only connection leaves them behind), which is how foreign, damaged and newer files used to
 * gain companions before being refused. So:
 * - a file with a `-wal` beside it is read through SQLite: the companions exist already, and only
 *   SQLite can see the commits still in the WAL (another process may be writing it right now);
 * - a file in rollback-journal mode is read through SQLite: a reader in that mode creates nothing;
 * - a WAL-mode file without a `-wal` holds everything in the main file, so a copy of its bytes is
 *   read from memory (header bytes 18–19 set to 1, since SQLite cannot run WAL mode in memory).
 *   SQLite's build here accepts no URI filenames, so `immutable=1` is not available instead.
 */
const MEMORY_COPY_LIMIT_BYTES = 512 * 1024 * 1024;
const COPY_ATTEMPTS = 3;

export function openReadOnlySnapshot(filePath: string, walMode: boolean): Database.Database {
  if (!walMode || fs.existsSync(`${filePath}-wal`)) return new Database(filePath, { readonly: true, fileMustExist: true });
  const bytes = stableCopy(filePath);
  // Beyond the limit (far larger than any library) memory is the scarcer thing; SQLite reads it directly.
  if (!bytes) return new Database(filePath, { readonly: true, fileMustExist: true });
  bytes[18] = 1;
  bytes[19] = 1;
  return new Database(bytes, { readonly: true });
}

/**
 * The file's bytes, read again (up to three times) if the file changed while being read, as when
 * another process checkpoints it, so that the copy is not a mixture of two states. Undefined when
 * the file is too large to copy.
 */
function stableCopy(filePath: string): Buffer | undefined {
  let bytes = Buffer.alloc(0);
  for (let attempt = 0; attempt < COPY_ATTEMPTS; attempt++) {
    const before = fs.statSync(filePath);
    if (before.size > MEMORY_COPY_LIMIT_BYTES) return undefined;
    bytes = fs.readFileSync(filePath);
    const after = fs.statSync(filePath);
    if (after.size === before.size && after.mtimeMs === before.mtimeMs && after.ino === before.ino) break;
  }
  return bytes;
}
