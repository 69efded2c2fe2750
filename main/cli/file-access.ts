import fs from 'node:fs';
import { decodeUtf8, NotUtf8Error } from '../files/utf8-text.js';
import { shownPath } from '../storage/shown-path.js';
import { InputError } from '../../app/index.js';

/**
 * Reading and writing the files a command names (CSV, project files), with each failure told in
 * one sentence that names the path instead of Node's EISDIR/ENOENT text. A bad path is invalid
 * input: exit code 2.
 */
export function readTextFile(file: string): string {
  let bytes: Uint8Array;
  try {
    bytes = fs.readFileSync(file);
  } catch (error) {
    throw new InputError('file', fileAccessSentence(error, file, 'read'));
  }
  try {
    return decodeUtf8(bytes);
  } catch (error) {
    if (error instanceof NotUtf8Error) throw new InputError('file', `${shownPath(file)} ${error.message}.`);
    throw error;
  }
}

export function writeTextFile(file: string, text: string): void {
  try {
    fs.writeFileSync(file, text);
  } catch (error) {
    throw new InputError('file', fileAccessSentence(error, file, 'write'));
  }
}

/** One sentence for a failed file-system call on `file`; the path is cut to 60 characters. */
export function fileAccessSentence(error: unknown, file: string, action: 'read' | 'write'): string {
  const shown = shownPath(file);
  switch ((error as NodeJS.ErrnoException | undefined)?.code) {
    case 'ENOENT':
      return action === 'read' ? `${shown} does not exist.` : `${shown} cannot be written because its folder does not exist.`;
    case 'EISDIR':
      return `${shown} is a folder, not a file.`;
    case 'ENOTDIR':
      return `${shown} cannot be ${action === 'read' ? 'read' : 'written'} because part of its folder path is a file, not a folder.`;
    case 'EACCES':
    case 'EPERM':
      return `${shown} cannot be ${action === 'read' ? 'read' : 'written'} (permission denied).`;
    case 'EROFS':
      return `${shown} cannot be written (the file system is read-only).`;
    case 'ENOSPC':
      return `${shown} cannot be written (the disk is full).`;
    default:
      return `${shown} cannot be ${action === 'read' ? 'read' : 'written'} (the system reports ${(error as NodeJS.ErrnoException | undefined)?.code ?? 'an unknown error'}).`;
  }
}
