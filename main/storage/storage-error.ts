import { shownPath } from './shown-path.js';

/**
 * Errors the storage layer raises, each carrying a code the callers branch on and a message a
 * person can act on (what is wrong, with which file, and what to do next).
 */
export type StorageErrorCode =
  | 'missing-file'
  | 'missing-folder'
  | 'not-a-file'
  | 'unreadable'
  | 'empty-file'
  | 'not-a-database'
  | 'foreign-database'
  | 'truncated'
  | 'damaged'
  | 'newer-schema'
  | 'read-only'
  | 'disk-full'
  | 'busy'
  | 'io';

export class StorageError extends Error {
  readonly code: StorageErrorCode;
  constructor(code: StorageErrorCode, message: string, options?: { cause?: unknown }) {
    super(message, options);
    this.name = 'StorageError';
    this.code = code;
  }
}

/** SQLite error codes (better-sqlite3 puts the extended code name in `code`). */
function sqliteCode(error: unknown): string | undefined {
  if (error && typeof error === 'object' && 'code' in error && typeof error.code === 'string') return error.code;
  return undefined;
}

/**
 * Turns a low-level SQLite or file-system failure during a write into a StorageError with one
 * clear sentence. The transaction that failed has been rolled back by then, so whatever was saved
 * before is still there; the message says so.
 */
export function describeWriteFailure(error: unknown, databasePath: string): unknown {
  if (error instanceof StorageError) return error;
  const shown = shownPath(databasePath);
  const code = sqliteCode(error) ?? '';
  if (code === 'SQLITE_FULL' || code === 'ENOSPC') {
    return new StorageError('disk-full', `The disk holding ${shown} is full: the change was not saved; everything saved before is intact. Free some space and try again.`, { cause: error });
  }
  if (code.startsWith('SQLITE_READONLY') || code === 'EROFS' || code === 'EACCES' || code === 'EPERM' || code.startsWith('SQLITE_CANTOPEN')) {
    return new StorageError('read-only', `Lamina cannot write to ${shown} (the file or its folder is read-only): the change was not saved; everything saved before is intact.`, { cause: error });
  }
  if (code.startsWith('SQLITE_BUSY') || code.startsWith('SQLITE_LOCKED')) {
    return new StorageError('busy', `The database ${shown} stayed locked by another Lamina process for too long: the change was not saved. Try again.`, { cause: error });
  }
  if (code === 'SQLITE_CORRUPT' || code === 'SQLITE_NOTADB') {
    return new StorageError('damaged', `The database ${shown} is damaged: the change was not saved. Restore a backup.`, { cause: error });
  }
  if (code.startsWith('SQLITE_IOERR')) {
    return new StorageError('io', `Writing ${shown} failed (${code}): the change was not saved; everything saved before is intact.`, { cause: error });
  }
  return error;
}
