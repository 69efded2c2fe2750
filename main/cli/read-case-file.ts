/**
 * A case file (or standard input, "-") read as the command line needs it: at most
 * MAX_CASE_FILE_BYTES, UTF-8 (a byte-order mark is accepted), one JSON object, and nested no
 * deeper than any Lamina file needs. Each refusal is one InputError sentence naming the file, so a
 * 50 MB upload, a UTF-16 file or a 6,000-level nesting ends in exit 2 and one line, never a stack
 * trace. A syntax error is placed by line and column instead of JSON.parse's own words, which
 * repeat whatever text surrounds the spot.
 */
import fs from 'node:fs';
import path from 'node:path';
import { isObject } from '../../app/base/field-checks.js';
import { requireBoundedNesting } from '../../app/base/json-depth.js';
import { findJsonSyntaxError } from '../../app/base/json-syntax-error.js';
import { InputError } from '../../app/base/input-error.js';
import { decodeUtf8, NotUtf8Error } from '../files/utf8-text.js';
import { shownPath } from '../storage/shown-path.js';
import { fileAccessSentence } from './file-access.js';

/** The largest example is 5 kB; a case with 100 layers of 100-point tables is under 1 MB. */
export const MAX_CASE_FILE_BYTES = 2 * 1024 * 1024;

export function readCaseJson(file: string, cwd: string): unknown {
  const shown = file === '-' ? 'standard input' : shownPath(file);
  const bytes = file === '-' ? readStandardInput() : readBoundedFile(path.resolve(cwd, file), file);
  if (bytes.length > MAX_CASE_FILE_BYTES) throw tooLarge(shown, bytes.length);
  let text: string;
  try {
    text = decodeUtf8(bytes);
  } catch (error) {
    if (error instanceof NotUtf8Error) throw new InputError('file', `${shown} ${error.message}.`);
    throw error;
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    throw new InputError('file', syntaxSentence(shown, text));
  }
  requireBoundedNesting(json, shown);
  if (!isObject(json)) {
    const found = Array.isArray(json) ? 'a list' : json === null ? 'null' : `a ${typeof json}`;
    throw new InputError('file', `${shown} must hold one JSON object (a case with a "kind"), not ${found}.`);
  }
  return json;
}

function syntaxSentence(shown: string, text: string): string {
  if (text.trim() === '') return `${shown} is empty; a case file holds one JSON object.`;
  const error = findJsonSyntaxError(text);
  if (error === null) return `${shown} is not valid JSON.`;
  const where = `line ${error.line}, column ${error.column}`;
  if (error.atEnd) return `${shown} is not valid JSON: it ends at ${where} before the JSON is complete.`;
  const character = text.codePointAt(error.offset)!;
  const shownCharacter = character > 0x20 && character < 0x7f ? `'${String.fromCodePoint(character)}'` : `U+${character.toString(16).toUpperCase().padStart(4, '0')}`;
  return `${shown} is not valid JSON: unexpected ${shownCharacter} at ${where}.`;
}

function readBoundedFile(resolved: string, given: string): Uint8Array {
  try {
    const info = fs.statSync(resolved);
    if (info.isDirectory()) throw Object.assign(new Error('directory'), { code: 'EISDIR' });
    if (info.size > MAX_CASE_FILE_BYTES) throw tooLarge(shownPath(given), info.size);
    return fs.readFileSync(resolved);
  } catch (error) {
    if (error instanceof InputError) throw error;
    throw new InputError('file', fileAccessSentence(error, given, 'read'));
  }
}

function readStandardInput(): Uint8Array {
  const chunks: Buffer[] = [];
  let total = 0;
  const buffer = Buffer.alloc(64 * 1024);
  for (;;) {
    let n: number;
    try {
      n = fs.readSync(0, buffer, 0, buffer.length, null);
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'EAGAIN') continue;
      if ((error as NodeJS.ErrnoException).code === 'EOF') break;
      throw new InputError('file', fileAccessSentence(error, 'standard input', 'read'));
    }
    if (n === 0) break;
    total += n;
    if (total > MAX_CASE_FILE_BYTES) throw tooLarge('standard input', total);
    chunks.push(Buffer.from(buffer.subarray(0, n)));
  }
  return Buffer.concat(chunks);
}

function tooLarge(shown: string, bytes: number): InputError {
  return new InputError('file', `${shown} holds ${(bytes / 1048576).toFixed(1)} MB, more than the ${MAX_CASE_FILE_BYTES / 1048576} MB a case file may hold.`);
}
