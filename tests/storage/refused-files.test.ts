/**
 * Files that are not a Lamina library, given to the real `lamina` command as a child process:
 * each is refused in one sentence naming the path, with exit code 1, and neither the file (sha256)
 * nor its folder (listing: no -wal or -shm companion) changes. A library made before Lamina wrote
 * its application_id is still recognised and gains the id in its next migration.
 */
import { spawnSync, type SpawnSyncOptions } from 'node:child_process';
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { LAMINA_APPLICATION_ID } from '../../main/storage/application-id.js';
import { listBackups } from '../../main/storage/backups.js';
import { LATEST_SCHEMA_VERSION, migrate } from '../../main/storage/migrations.js';
import { openLamina } from '../../main/services/lamina-services.js';
import { LibraryHost } from '../../main/server/library-host.js';
import { tempFolder } from './temp-folder.js';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const CLI = path.join(ROOT, 'main', 'cli', 'lamina.mjs');
const AS_ROOT = process.getuid?.() === 0;

function lamina(args: string[], options: SpawnSyncOptions = {}) {
  const r = spawnSync(process.execPath, [CLI, ...args], { cwd: ROOT, encoding: 'utf8', ...options });
  return { code: r.status, stdout: String(r.stdout), stderr: String(r.stderr) };
}

/** Every name under `folder` with the sha256 of each file: what must not change. */
function stateOf(folder: string): Record<string, string> {
  const state: Record<string, string> = {};
  for (const name of fs.readdirSync(folder, { recursive: true }) as string[]) {
    const full = path.join(folder, name);
    state[name] = fs.statSync(full).isDirectory() ? 'folder' : createHash('sha256').update(fs.readFileSync(full)).digest('hex');
  }
  return state;
}

/** Runs `materials list --db file` and checks the refusal: exit 1, one line, nothing changed. */
function expectRefused(file: string, message: string, options: SpawnSyncOptions = {}) {
  const folder = path.dirname(file);
  const before = stateOf(folder);
  const r = lamina(['materials', 'list', '--db', file], options);
  expect(r.stderr).toBe(`${message}\n`);
  expect(r.code).toBe(1);
  expect(r.stdout).toBe('');
  expect(message.length).toBeLessThan(400);
  expect(stateOf(folder)).toEqual(before);
}

function foreignDatabase(file: string, build: (db: Database.Database) => void): string {
  const db = new Database(file);
  build(db);
  db.close();
  return file;
}

const foreignMessage = (file: string) =>
  `The file ${file} is not a Lamina database (it is an SQLite database of another program): choose another file; Lamina has not changed it.`;

describe('a file that is not a Lamina library is refused untouched', () => {
  it('an SQLite database of another program, in rollback-journal mode', () => {
    const file = foreignDatabase(path.join(tempFolder(), 'f.sqlite'), (db) => db.exec('CREATE TABLE t(x)'));
    expectRefused(file, foreignMessage(file));
  });

  it('another program\'s database with a table named materials, in WAL mode (header bytes 18–19 stay 2)', () => {
    const file = foreignDatabase(path.join(tempFolder(), 'g.sqlite'), (db) => {
      db.pragma('journal_mode = WAL');
      db.exec(`CREATE TABLE materials (sku TEXT); CREATE TABLE projects (x); CREATE TABLE cases (y); INSERT INTO materials VALUES ('bolt M8')`);
      db.pragma('user_version = 7');
    });
    expect(fs.readdirSync(path.dirname(file))).toEqual(['g.sqlite']);
    expectRefused(file, foreignMessage(file));
    expect([...fs.readFileSync(file).subarray(18, 20)]).toEqual([2, 2]);
  });

  it('another program\'s database with tables named like Lamina\'s first ones but not their columns', () => {
    const file = foreignDatabase(path.join(tempFolder(), 'stock.sqlite'), (db) => {
      db.exec('CREATE TABLE materials (sku TEXT, conductivity REAL); CREATE TABLE projects (x); CREATE TABLE cases (y)');
      db.pragma('user_version = 2');
    });
    expectRefused(file, foreignMessage(file));
  });

  it('an SQLite database that another program marked with its own application_id', () => {
    const file = foreignDatabase(path.join(tempFolder(), 'h.sqlite'), (db) => {
      db.exec('CREATE TABLE materials (x); CREATE TABLE projects (x); CREATE TABLE cases (x)');
      db.pragma('application_id = 1234567');
      db.pragma('user_version = 3');
    });
    expectRefused(file, foreignMessage(file));
  });

  it('a file that is not an SQLite database', () => {
    const file = path.join(tempFolder(), 'notes.sqlite');
    fs.writeFileSync(file, 'Larkfield depot: lag the condensate return before winter.\n'.repeat(40));
    expectRefused(file, `The file ${file} is not a Lamina database (it is not an SQLite file): choose another file or restore a backup; Lamina has not changed it.`);
  });

  it('a library written by a newer Lamina', async () => {
    const file = path.join(tempFolder(), 'lamina.sqlite');
    (await openLamina(file)).close();
    const db = new Database(file);
    db.pragma(`user_version = ${LATEST_SCHEMA_VERSION + 1}`);
    db.close();
    expectRefused(
      file,
      `The database ${file} was written by a newer Lamina (schema version ${LATEST_SCHEMA_VERSION + 1}; this version understands up to ${LATEST_SCHEMA_VERSION}): update Lamina to open it; the file has not been changed.`,
    );
  });

  it('a damaged library', async () => {
    const file = path.join(tempFolder(), 'lamina.sqlite');
    const lamina0 = await openLamina(file);
    lamina0.projects.create({ name: 'Ferncliff bottling hall' });
    lamina0.close();
    const bytes = fs.readFileSync(file);
    const pageSize = bytes.readUInt16BE(16);
    for (let offset = pageSize; offset < bytes.length; offset++) bytes[offset] = (offset * 37) & 0xff;
    fs.writeFileSync(file, bytes);
    const before = stateOf(path.dirname(file));
    const r = lamina(['materials', 'list', '--db', file]);
    expect(r.code).toBe(1);
    // SQLite's own report sits in the parentheses; its wording is SQLite's, so only its frame is fixed here.
    expect(r.stderr.startsWith(`The database ${file} is damaged (SQLite reports: `)).toBe(true);
    expect(r.stderr.endsWith('): restore a backup; Lamina has not changed it.\n')).toBe(true);
    expect(r.stderr.trimEnd()).not.toContain('\n');
    expect(r.stderr.length).toBeLessThan(400);
    expect(stateOf(path.dirname(file))).toEqual(before);
  });

  it('a folder', () => {
    const parent = tempFolder();
    const folder = path.join(parent, 'library');
    fs.mkdirSync(folder);
    fs.writeFileSync(path.join(folder, 'readme.txt'), 'Harbour Road jobs');
    const before = stateOf(parent);
    expectRefused(folder, `${folder} is a folder, not a Lamina database file: give the path of a file (such as lamina.sqlite inside it); nothing was changed.`);
    expect(stateOf(parent)).toEqual(before);
  });

  it('a path whose folder does not exist (not created from a typing mistake)', () => {
    const parent = tempFolder();
    const missing = path.join(parent, 'no-such-folder');
    const before = stateOf(parent);
    const r = lamina(['materials', 'list', '--db', path.join(missing, 'lamina.sqlite')]);
    expect(r.stderr).toBe(`The folder ${missing} does not exist: create it, or choose another location with --db or LAMINA_DB; nothing was changed.\n`);
    expect(r.code).toBe(1);
    expect(stateOf(parent)).toEqual(before);
  });

  it('a file Lamina may not read', async () => {
    const file = path.join(tempFolder(), 'lamina.sqlite');
    (await openLamina(file)).close();
    const folder = path.dirname(file);
    const message = `Lamina cannot read ${file} (permission denied): make it readable or choose another file; nothing was changed.`;
    if (AS_ROOT) {
      // Root reads any file, so the command runs as an unprivileged user on a root-owned file it may not read.
      fs.chmodSync(folder, 0o755);
      fs.chmodSync(file, 0o600);
      expectRefused(file, message, { uid: 65534, gid: 65534, env: { ...process.env, HOME: '/tmp' } });
    } else {
      fs.chmodSync(file, 0o000);
      expectRefused(file, message);
      fs.chmodSync(file, 0o644);
    }
  });

  it('a long path is shown cut to 60 characters, keeping the file name', () => {
    let folder = tempFolder();
    for (const part of ['Northwind Cold Stores', 'Kestrel Lane depot', 'insulation survey 2024']) folder = path.join(folder, part);
    fs.mkdirSync(folder, { recursive: true });
    const file = foreignDatabase(path.join(folder, 'survey-results.sqlite'), (db) => db.exec('CREATE TABLE readings (x)'));
    const shown = `…${file.slice(-59)}`;
    expect(shown).toHaveLength(60);
    expect(shown.endsWith('insulation survey 2024/survey-results.sqlite')).toBe(true);
    expectRefused(file, foreignMessage(shown));
  });

  it('the desktop app and browser mode show the refusal in the damaged-library banner', async () => {
    const file = foreignDatabase(path.join(tempFolder(), 'lamina.sqlite'), (db) => db.exec('CREATE TABLE t(x)'));
    const folder = path.dirname(file);
    const before = stateOf(folder);
    const host = await LibraryHost.open(file, { dailyBackups: false });
    expect(host.status()).toEqual({ state: 'unavailable', databasePath: file, reason: 'foreign-database', message: foreignMessage(file), backups: [] });
    await host.close();
    const asFolder = await LibraryHost.open(folder, { dailyBackups: false });
    expect(asFolder.status()).toMatchObject({ state: 'unavailable', reason: 'not-a-file' });
    await asFolder.close();
    expect(stateOf(folder)).toEqual(before);
  });
});

describe('files named to lamina materials import and export', () => {
  it('a folder, a missing file and a missing folder each give one sentence naming the path', () => {
    const cwd = tempFolder();
    const db = path.join(cwd, 'lamina.sqlite');
    fs.mkdirSync(path.join(cwd, 'sheets'));
    let r = lamina(['materials', 'import', path.join(cwd, 'sheets'), '--db', db]);
    expect([r.code, r.stderr]).toEqual([2, `${path.join(cwd, 'sheets')} is a folder, not a file.\n`]);
    r = lamina(['materials', 'import', path.join(cwd, 'absent.csv'), '--db', db]);
    expect([r.code, r.stderr]).toEqual([2, `${path.join(cwd, 'absent.csv')} does not exist.\n`]);
    r = lamina(['materials', 'export', path.join(cwd, 'no-such-folder', 'out.csv'), '--db', db]);
    expect([r.code, r.stderr]).toEqual([2, `${path.join(cwd, 'no-such-folder', 'out.csv')} cannot be written because its folder does not exist.\n`]);
    expect(fs.readdirSync(cwd).sort()).toEqual(['lamina.sqlite', 'sheets']);
  });
});

describe('libraries made before Lamina wrote its application_id', () => {
  it('are recognised by their schema and tables, and gain the id in their next migration', () => {
    const file = path.join(tempFolder(), 'lamina.sqlite');
    const old = new Database(file);
    old.pragma('journal_mode = WAL');
    migrate(old, file, 3); // the schema as version 3 left it, with no application_id
    old.prepare(`INSERT INTO projects (name, created_at, updated_at) VALUES ('Harbour Road boiler house', '2024-01-01', '2024-01-01')`).run();
    old.close();
    expect(fs.readFileSync(file).readInt32BE(68)).toBe(0);

    const r = lamina(['projects', 'list', '--db', file]);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^1\tHarbour Road boiler house\t/);
    const after = new Database(file, { readonly: true });
    expect(after.pragma('application_id', { simple: true })).toBe(LAMINA_APPLICATION_ID);
    expect(after.pragma('user_version', { simple: true })).toBe(LATEST_SCHEMA_VERSION);
    after.close();
    expect(fs.readFileSync(file).readInt32BE(68)).toBe(LAMINA_APPLICATION_ID); // checkpointed into the header on close
    expect(listBackups(file).map((b) => b.reason)).toEqual(['pre-migration']);
  });

  it('a new library carries the id from the start', async () => {
    const file = path.join(tempFolder(), 'lamina.sqlite');
    (await openLamina(file)).close();
    expect(fs.readFileSync(file).readInt32BE(68)).toBe(LAMINA_APPLICATION_ID);
  });
});
