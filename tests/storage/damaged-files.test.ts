import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { listBackups, restoreBackup } from '../../main/storage/backups.js';
import { openLamina } from '../../main/services/lamina-services.js';
import { StorageError } from '../../main/storage/storage-error.js';
import { wallInputs } from './case-fixtures.js';
import { tempDatabasePath } from './temp-folder.js';

/** A real library with one project, closed, plus a manual backup of it. */
async function savedLibrary(): Promise<{ file: string; backup: string }> {
  const file = tempDatabasePath();
  const lamina = await openLamina(file);
  const board = lamina.materials.create({ name: 'Site board', category: 'insulation', conductivity: { kind: 'constant', value: 0.036 }, vapourResistanceFactor: 1 });
  const project = lamina.projects.create({ name: 'Kestrel Lane depot', client: 'Northwind Cold Stores' });
  lamina.projects.addCase(project.id, { name: 'North wall', inputs: wallInputs([board.id]) });
  const backup = (await lamina.backups.create()).file;
  lamina.close();
  return { file, backup };
}

async function refusal(file: string): Promise<StorageError> {
  const error = await openLamina(file).then(
    (l) => {
      l.close();
      return undefined;
    },
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(StorageError);
  return error as StorageError;
}

describe('damaged database files are detected at open and never overwritten', () => {
  it('a file that is not a database', async () => {
    const file = path.join(path.dirname(tempDatabasePath()), 'notes.sqlite');
    fs.writeFileSync(file, 'Meeting notes: insulate the boiler house flow line.\n'.repeat(50));
    const before = fs.readFileSync(file);
    const error = await refusal(file);
    expect(error.code).toBe('not-a-database');
    expect(error.message).toBe(`The file ${file} is not a Lamina database (it is not an SQLite file): choose another file or restore a backup; Lamina has not changed it.`);
    expect(fs.readFileSync(file).equals(before)).toBe(true);
  });

  it('an empty file (truncated to nothing)', async () => {
    const file = tempDatabasePath();
    fs.writeFileSync(file, '');
    const error = await refusal(file);
    expect(error.code).toBe('empty-file');
    expect(fs.statSync(file).size).toBe(0);
  });

  it('a truncated file', async () => {
    const { file } = await savedLibrary();
    const whole = fs.readFileSync(file);
    fs.writeFileSync(file, whole.subarray(0, Math.floor(whole.length / 2) + 100));
    const before = fs.readFileSync(file);
    const error = await refusal(file);
    expect(error.code).toBe('truncated');
    expect(error.message).toMatch(/is truncated .*: restore a backup; Lamina has not changed it\.$/);
    expect(fs.readFileSync(file).equals(before)).toBe(true);
  });

  it('a file with damaged pages', async () => {
    const { file } = await savedLibrary();
    const bytes = fs.readFileSync(file);
    const pageSize = bytes.readUInt16BE(16);
    // Scribble over every page after the first (the header stays intact, so only SQLite's own check can tell).
    for (let offset = pageSize; offset < bytes.length; offset += 1) bytes[offset] = (offset * 37) & 0xff;
    fs.writeFileSync(file, bytes);
    const error = await refusal(file);
    expect(error.code).toBe('damaged');
    expect(error.message).toMatch(/is damaged .*: restore a backup; Lamina has not changed it\.$/);
    expect(fs.readFileSync(file).equals(bytes)).toBe(true);
  });

  it('offers the backups and restores one, keeping the damaged file aside', async () => {
    const { file, backup } = await savedLibrary();
    fs.writeFileSync(file, 'garbage');
    expect((await refusal(file)).code).toBe('not-a-database');
    expect(listBackups(file).map((b) => b.file)).toContain(backup);
    const { movedAsideTo } = await restoreBackup(file, backup);
    expect(fs.readFileSync(movedAsideTo!, 'utf8')).toBe('garbage');
    const lamina = await openLamina(file);
    expect(lamina.projects.list().map((p) => p.name)).toEqual(['Kestrel Lane depot']);
    lamina.close();
  });

  it('refuses to restore from a damaged backup and leaves the database alone', async () => {
    const { file } = await savedLibrary();
    const bad = path.join(path.dirname(file), 'bad-backup.sqlite');
    fs.writeFileSync(bad, 'not a database at all');
    const before = fs.readFileSync(file);
    await expect(restoreBackup(file, bad)).rejects.toThrow(/is not a Lamina database/);
    expect(fs.readFileSync(file).equals(before)).toBe(true);
  });
});
