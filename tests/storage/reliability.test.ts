import { spawn, type SpawnOptions } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { openDatabase } from '../../main/storage/open-database.js';
import { StorageError } from '../../main/storage/storage-error.js';
import { MaterialsService } from '../../main/services/materials-service.js';
import { ProjectsService } from '../../main/services/projects-service.js';
import { openLamina } from '../../main/services/lamina-services.js';
import { wallInputs } from './case-fixtures.js';
import { tempDatabasePath } from './temp-folder.js';

const CHILD = fileURLToPath(new URL('./fixtures/storage-child.mjs', import.meta.url));
const ROOT = fileURLToPath(new URL('../../', import.meta.url));

function startChild(args: string[], options: SpawnOptions = {}) {
  const child = spawn(process.execPath, ['--import', 'tsx', CHILD, ...args], { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'], ...options });
  let out = '';
  let err = '';
  child.stdout!.on('data', (d) => (out += d));
  child.stderr!.on('data', (d) => (err += d));
  const exited = new Promise<{ code: number | null; signal: NodeJS.Signals | null; out: string; err: string }>((resolve) =>
    child.on('exit', (code, signal) => resolve({ code, signal, out, err })),
  );
  return { child, exited, output: () => out };
}

function integrity(file: string): string {
  const db = new Database(file, { readonly: true });
  try {
    return db.pragma('integrity_check', { simple: true }) as string;
  } finally {
    db.close();
  }
}

describe('reliability on real files', () => {
  it('a process killed with SIGKILL in the middle of writing leaves a sound database with whole transactions only', async () => {
    const file = tempDatabasePath();
    const lamina = await openLamina(file);
    const board = lamina.materials.findByName('Mineral wool board')!;
    const project = lamina.projects.create({ name: 'Source' });
    for (let i = 0; i < 200; i++) lamina.projects.addCase(project.id, { name: `case ${i}`, inputs: wallInputs([board.id, board.id]) });
    lamina.close();

    const run = startChild(['duplicate-forever', file]);
    // Wait until several transactions have committed, then kill at an arbitrary point in the next one.
    await new Promise<void>((resolve, reject) => {
      const timer = setTimeout(() => reject(new Error(`child made no progress: ${run.output()}`)), 30_000);
      run.child.stdout!.on('data', () => {
        if ((run.output().match(/committed/g) ?? []).length >= 5) {
          clearTimeout(timer);
          setTimeout(resolve, Math.floor(Math.random() * 15));
        }
      });
    });
    run.child.kill('SIGKILL');
    const result = await run.exited;
    expect(result.signal).toBe('SIGKILL');
    const reported = (result.out.match(/committed/g) ?? []).length;

    expect(integrity(file)).toBe('ok');
    const after = await openLamina(file);
    const copies = after.projects.list().filter((p) => p.name.startsWith('copy '));
    // Every commit the child reported survived; at most one more (committed but not yet reported).
    expect(copies.length).toBeGreaterThanOrEqual(reported);
    expect(copies.length).toBeLessThanOrEqual(reported + 1);
    // No half-written copy: each has all 200 cases, each case linked to its material.
    for (const copy of copies) expect(copy.caseCount).toBe(200);
    expect(after.materials.usage(board.id)).toHaveLength(200 * (copies.length + 1));
    after.close();
  });

  it('two processes writing the same file at once both succeed and lose nothing', async () => {
    const file = tempDatabasePath();
    (await openLamina(file)).close();
    const a = startChild(['add-materials', file, '150', 'alpha']);
    const b = startChild(['add-materials', file, '150', 'beta']);
    const [ra, rb] = await Promise.all([a.exited, b.exited]);
    expect([ra.out.trim(), rb.out.trim()]).toEqual(['done', 'done']);
    const lamina = await openLamina(file);
    expect(lamina.materials.list({ search: 'alpha ' })).toHaveLength(150);
    expect(lamina.materials.list({ search: 'beta ' })).toHaveLength(150);
    lamina.close();
    expect(integrity(file)).toBe('ok');
  });

  it('two processes opening a new file at the same moment migrate and seed it once', async () => {
    const file = tempDatabasePath();
    const [ra, rb] = await Promise.all([startChild(['open', file]).exited, startChild(['open', file]).exited]);
    expect([ra.out.trim(), rb.out.trim()]).toEqual(['opened 0', 'opened 0']);
    const lamina = await openLamina(file);
    const names = lamina.materials.list({ origin: 'built-in' }).map((m) => m.name);
    expect(new Set(names).size).toBe(names.length);
    expect(names.length).toBeGreaterThan(50);
    lamina.close();
  });

  it('a read-only folder gives a clear error and loses nothing', async () => {
    const file = tempDatabasePath();
    const folder = path.dirname(file);
    const lamina = await openLamina(file);
    lamina.projects.create({ name: 'Kept safe' });
    lamina.close();
    const before = fs.readFileSync(file);
    let result: { out: string };
    if (process.getuid?.() === 0) {
      // Root ignores permissions, so the attempt runs as an unprivileged user on the root-owned folder.
      fs.chmodSync(folder, 0o755);
      fs.chmodSync(file, 0o644);
      result = await startChild(['open', file], { uid: 65534, gid: 65534, env: { ...process.env, HOME: '/tmp' } }).exited;
    } else {
      fs.chmodSync(file, 0o444);
      fs.chmodSync(folder, 0o555);
      result = await startChild(['open', file]).exited;
      fs.chmodSync(folder, 0o755);
      fs.chmodSync(file, 0o644);
    }
    expect(result.out.trim()).toMatch(/^error read-only: Lamina cannot write to .* \(read-only\): make it writable, or choose another location with --db or LAMINA_DB; nothing was changed\.$/);
    expect(fs.readFileSync(file).equals(before)).toBe(true);
    const again = await openLamina(file);
    expect(again.projects.list().map((p) => p.name)).toEqual(['Kept safe']);
    again.close();
  });

  it('a full disk gives a clear error and keeps everything saved before', async () => {
    const file = tempDatabasePath();
    const opened = await openDatabase(file);
    const context = { db: opened.db, path: opened.path };
    const materials = new MaterialsService(context);
    const projects = new ProjectsService(context, materials);
    const kept = projects.create({ name: 'Saved before the disk filled' });
    // SQLite's own page limit stands in for a full disk: it raises SQLITE_FULL exactly as a full disk does.
    const pages = opened.db.pragma('page_count', { simple: true }) as number;
    opened.db.pragma(`max_page_count = ${pages + 2}`);
    let error: unknown;
    try {
      projects.create({ name: 'Too big', notes: 'x'.repeat(9000) });
      for (let i = 0; i < 50; i++) projects.create({ name: `more ${i}`, notes: 'y'.repeat(9000) });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(StorageError);
    expect((error as StorageError).code).toBe('disk-full');
    expect((error as Error).message).toBe(`The disk holding ${file} is full: the change was not saved; everything saved before is intact. Free some space and try again.`);
    expect(projects.open(kept.id).name).toBe('Saved before the disk filled');
    opened.db.close();
    expect(integrity(file)).toBe('ok');
  });
});
