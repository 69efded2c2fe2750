import fs from 'node:fs';
import { shownPath } from './shown-path.js';
import { StorageError } from './storage-error.js';

/**
 * Looks at a database path and the file's first 100 bytes before SQLite touches it, so that a
 * folder, an unreadable, empty, truncated or non-SQLite file is reported in one sentence instead of
 * a raw EISDIR/EACCES text, or of being silently turned into a fresh database.
 * Reads only; never writes, never creates a file.
 */
const SQLITE_MAGIC = 'SQLite format 3\u0000';
const HEADER_SIZE = 100;

/** What the bytes on disk say, before SQLite is asked anything. */
export type FileOnDisk =
  | { readonly kind: 'absent' }
  | {
      readonly kind: 'sqlite';
      readonly sizeBytes: number;
      /** SQLite's application_id header field (offset 68); 0 when no program has claimed the file. */
      readonly applicationId: number;
      /** Header bytes 18–19 are 2: the file was last used in WAL mode. */
      readonly walMode: boolean;
    };

export function inspectDatabaseFile(filePath: string): FileOnDisk {
  const shown = shownPath(filePath);
  let stat: fs.Stats;
  try {
    stat = fs.statSync(filePath);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    if (code === 'ENOENT') return { kind: 'absent' };
    if (code === 'ENOTDIR') {
      throw new StorageError('not-a-file', `${shown} cannot be a database file because part of its folder path is a file, not a folder; nothing was changed.`, { cause: error });
    }
    throw unreadable(shown, error);
  }
  if (stat.isDirectory()) {
    throw new StorageError('not-a-file', `${shown} is a folder, not a Lamina database file: give the path of a file (such as lamina.sqlite inside it); nothing was changed.`);
  }
  if (!stat.isFile()) {
    throw new StorageError('not-a-file', `${shown} is not a regular file (it is a device, pipe or socket), so it cannot be a Lamina database; nothing was changed.`);
  }
  const size = stat.size;
  if (size === 0) {
    throw new StorageError('empty-file', `The database ${shown} is empty (0 bytes), perhaps truncated: restore a backup, or move the file away to start a new library; Lamina has not changed it.`);
  }
  const header = Buffer.alloc(HEADER_SIZE);
  let read: number;
  try {
    const fd = fs.openSync(filePath, 'r');
    try {
      read = fs.readSync(fd, header, 0, HEADER_SIZE, 0);
    } finally {
      fs.closeSync(fd);
    }
  } catch (error) {
    throw unreadable(shown, error);
  }
  if (read < 16 || header.toString('latin1', 0, 16) !== SQLITE_MAGIC) {
    throw new StorageError('not-a-database', `The file ${shown} is not a Lamina database (it is not an SQLite file): choose another file or restore a backup; Lamina has not changed it.`);
  }
  if (read < HEADER_SIZE) {
    throw new StorageError('truncated', `The database ${shown} is truncated (${size} bytes, shorter than its own header): restore a backup; Lamina has not changed it.`);
  }
  const rawPageSize = header.readUInt16BE(16);
  const pageSize = rawPageSize === 1 ? 65536 : rawPageSize;
  const validPageSize = pageSize >= 512 && pageSize <= 65536 && (pageSize & (pageSize - 1)) === 0;
  if (!validPageSize) {
    throw new StorageError('damaged', `The database ${shown} is damaged (its header names an impossible page size, ${rawPageSize}): restore a backup; Lamina has not changed it.`);
  }
  // The page count in the header is trustworthy only when "version-valid-for" equals the change counter.
  const changeCounter = header.readUInt32BE(24);
  const pageCount = header.readUInt32BE(28);
  const validFor = header.readUInt32BE(92);
  if (size % pageSize !== 0 || (validFor === changeCounter && pageCount > 0 && size < pageCount * pageSize)) {
    throw new StorageError('truncated', `The database ${shown} is truncated (${size} bytes where ${pageCount} pages of ${pageSize} bytes are expected): restore a backup; Lamina has not changed it.`);
  }
  // Signed, as PRAGMA application_id reports it.
  return { kind: 'sqlite', sizeBytes: size, applicationId: header.readInt32BE(68), walMode: header[18] === 2 || header[19] === 2 };
}

function unreadable(shown: string, error: unknown): StorageError {
  const code = (error as NodeJS.ErrnoException).code;
  const why = code === 'EACCES' || code === 'EPERM' ? 'permission denied' : `the system reports ${code ?? 'an unknown error'}`;
  return new StorageError('unreadable', `Lamina cannot read ${shown} (${why}): make it readable or choose another file; nothing was changed.`, { cause: error });
}
