import fs from 'node:fs';
import { StorageError } from './storage-error.js';

/**
 * Looks at a database file's bytes before SQLite touches it, so that an empty, truncated or
 * foreign file is reported instead of being silently turned into a fresh database.
 * Reads only; never writes.
 */
const SQLITE_MAGIC = 'SQLite format 3\u0000';
const HEADER_SIZE = 100;

export function inspectDatabaseFile(filePath: string): void {
  const size = fs.statSync(filePath).size;
  if (size === 0) {
    throw new StorageError('empty-file', `The database ${filePath} is empty (0 bytes): it may have been truncated. Restore a backup, or move the file away to start a new library; Lamina has not changed it.`);
  }
  const header = Buffer.alloc(HEADER_SIZE);
  const fd = fs.openSync(filePath, 'r');
  let read: number;
  try {
    read = fs.readSync(fd, header, 0, HEADER_SIZE, 0);
  } finally {
    fs.closeSync(fd);
  }
  if (read < 16 || header.toString('latin1', 0, 16) !== SQLITE_MAGIC) {
    throw new StorageError('not-a-database', `The file ${filePath} is not a Lamina database (it is not an SQLite file). Choose another file or restore a backup; Lamina has not changed it.`);
  }
  if (read < HEADER_SIZE) {
    throw new StorageError('truncated', `The database ${filePath} is truncated (${size} bytes, shorter than its own header). Restore a backup; Lamina has not changed it.`);
  }
  const rawPageSize = header.readUInt16BE(16);
  const pageSize = rawPageSize === 1 ? 65536 : rawPageSize;
  const validPageSize = pageSize >= 512 && pageSize <= 65536 && (pageSize & (pageSize - 1)) === 0;
  if (!validPageSize) {
    throw new StorageError('damaged', `The database ${filePath} is damaged (its header names an impossible page size, ${rawPageSize}). Restore a backup; Lamina has not changed it.`);
  }
  // The page count in the header is trustworthy only when "version-valid-for" equals the change counter.
  const changeCounter = header.readUInt32BE(24);
  const pageCount = header.readUInt32BE(28);
  const validFor = header.readUInt32BE(92);
  if (size % pageSize !== 0 || (validFor === changeCounter && pageCount > 0 && size < pageCount * pageSize)) {
    throw new StorageError('truncated', `The database ${filePath} is truncated (${size} bytes where ${pageCount} pages of ${pageSize} bytes are expected). Restore a backup; Lamina has not changed it.`);
  }
}
