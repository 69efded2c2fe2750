/**
 * The API channels over the browser-mode transport (POST /api/<channel>), against the real service
 * layer on a real SQLite file in a temporary folder. Each test starts its own server in-process.
 */
import { afterEach, describe, expect, it } from 'vitest';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { ApiError, Material, MaterialInput } from '../../app/api/contract.js';
import { startBrowserServer, type BrowserServer } from '../../main/server/browser-server.js';
import { MATERIAL_CSV_HEADER } from '../../main/services/material-csv.js';
import { API_CHANNELS } from '../../main/server/operations.js';
import { call, ok } from './api-client.js';
import { wallInputs } from '../storage/case-fixtures.js';

const running: BrowserServer[] = [];
const folders: string[] = [];

afterEach(async () => {
  for (const server of running.splice(0)) await server.close();
  for (const folder of folders.splice(0)) fs.rmSync(folder, { recursive: true, force: true });
});

function tempFolder(): string {
  const folder = fs.mkdtempSync(path.join(os.tmpdir(), 'lamina-api-'));
  folders.push(folder);
  fs.mkdirSync(path.join(folder, 'site'));
  fs.writeFileSync(path.join(folder, 'site', 'index.html'), '<!doctype html><title>t</title>');
  return folder;
}

async function serve(folder: string): Promise<BrowserServer> {
  const server = await startBrowserServer({
    port: 0,
    root: path.join(folder, 'site'),
    databasePath: path.join(folder, 'data', 'lamina.sqlite'),
    dailyBackups: false,
  });
  running.push(server);
  return server;
}

const userMaterial: MaterialInput = {
  name: 'Site-mixed render, Harrowgate depot', // invented scenario
  category: 'building',
  conductivity: { kind: 'constant', value: 0.8 },
  density: 1700,
  specificHeat: 1000,
  vapourResistanceFactor: 20,
  equivalentAirLayerThickness: null,
  emissivity: 0.9,
  minServiceTemperature: null,
  maxServiceTemperature: null,
  source: 'Demo value for the invented Harrowgate depot scenario',
  notes: '',
};

const csvHeader = MATERIAL_CSV_HEADER.join(',');

describe('pipe sizes channel', () => {
  it('answers the size tables of data/pipe-sizes; refuses fields it does not take', async () => {
    const { url } = await serve(tempFolder());
    const sizes = await ok(url, 'pipe-sizes:list', {});
    // ISO 4200 / EN 10220 series 1 outside diameter of DN100: 114.3 mm (from memory, as the table says).
    expect(sizes.find((s) => s.series === 'steel-iso' && s.nominal === 'DN100')?.outerDiameter).toBeCloseTo(0.1143, 10);
    expect(new Set(sizes.map((s) => s.series))).toEqual(new Set(['steel-iso', 'steel-asme', 'copper-en1057', 'copper-astm-b88', 'plastic-metric']));
    const refused = await call(url, 'pipe-sizes:list', { series: 'steel-iso' });
    expect(refused.status).toBe(400);
  });
});

describe('materials channels', () => {
  it('lists, searches and filters the built-in library', async () => {
    const { url } = await serve(tempFolder());
    const all = await ok(url, 'materials:list', {});
    expect(all.length).toBeGreaterThan(40);
    expect(all.every((m) => m.builtIn)).toBe(true);
    const steel = await ok(url, 'materials:list', { search: 'carbon steel', category: 'pipe' });
    expect(steel.map((m) => m.name)).toEqual(['Carbon steel pipe']);
    expect(await ok(url, 'materials:list', { origin: 'user' })).toEqual([]);
  });

  it('carries a vapour-tight μ (Infinity) as "inf" over HTTP and back', async () => {
    const { url } = await serve(tempFolder());
    const answer = await call(url, 'materials:list', { search: 'Carbon steel pipe' });
    expect(answer.text).toContain('"vapourResistanceFactor":"inf"');
    const [steel] = answer.body as Material[];
    expect(steel!.vapourResistanceFactor).toBe(Infinity);
    const copy = await ok(url, 'materials:duplicate', { id: steel!.id });
    expect(copy.vapourResistanceFactor).toBe(Infinity);
    expect(copy.builtIn).toBe(false);
    expect(copy.name).toBe('Carbon steel pipe (copy)');
  });

  it('refuses bad requests with one sentence naming the field', async () => {
    const { url } = await serve(tempFolder());
    const cases: [Parameters<typeof call>[1], unknown, number, ApiError][] = [
      ['materials:get', { id: 0 }, 400, { error: 'id must be a whole number of 1 or more.', field: 'id' }],
      ['materials:get', { id: '3' }, 400, { error: 'id must be a whole number of 1 or more.', field: 'id' }],
      ['materials:get', { id: 999999 }, 404, { error: 'There is no material with id 999999.' }],
      ['materials:list', { category: 'cheese' }, 400, { error: 'category must be one of building, insulation, pipe, cladding, membrane, air-layer, other.', field: 'category' }],
      ['materials:list', { search: 'x'.repeat(201) }, 400, { error: 'search must be at most 200 characters long.', field: 'search' }],
      ['materials:create', { material: { ...userMaterial, density: -5 } }, 400, { error: 'density must be more than 0 and at most 25000 kg/m³ (got -5).', field: 'density' }],
      ['materials:create', { material: { ...userMaterial, emissivity: 1.5 } }, 400, { error: 'emissivity must be more than 0 and at most 1 (got 1.5).', field: 'emissivity' }],
      ['materials:create', { material: userMaterial, extra: 1 }, 400, { error: 'The materials:create request has no field "extra" (allowed: material).', field: 'extra' }],
      ['materials:import-csv', { csv: 42 }, 400, { error: 'csv must be text.', field: 'csv' }],
      ['materials:fit-conductivity', { points: [[10, 0.035]], degree: 2, minServiceTemperature: 0, maxServiceTemperature: 300 }, 400,
        { error: 'points must include at least 3 different temperatures for a degree-2 fit (got 1).', field: 'points' }],
    ];
    for (const [channel, request, status, body] of cases) {
      const answer = await call(url, channel, request);
      expect({ channel, status: answer.status, body: answer.body }).toEqual({ channel, status, body });
    }
  });

  it('keeps built-in materials read-only and edits a duplicate', async () => {
    const { url } = await serve(tempFolder());
    const [brick] = await ok(url, 'materials:list', { search: 'Carbon steel pipe' });
    const refused = await call(url, 'materials:update', { id: brick!.id, material: { ...userMaterial } });
    expect(refused.status).toBe(409);
    expect((refused.body as ApiError).error).toBe('"Carbon steel pipe" is a built-in material and cannot be changed; duplicate it and edit the copy.');
    const copy = await ok(url, 'materials:duplicate', { id: brick!.id, name: 'Depot header steel' });
    const { id, builtIn, createdAt, updatedAt, ...input } = copy;
    const edited = await ok(url, 'materials:update', { id, material: { ...input, emissivity: 0.35 } });
    expect(edited.emissivity).toBe(0.35);
    expect((await ok(url, 'materials:get', { id })).emissivity).toBe(0.35);
    expect(builtIn).toBe(false);
    expect(typeof createdAt + typeof updatedAt).toBe('stringstring');
  });

  it('imports CSV all or nothing, naming every bad row by line number', async () => {
    const { url } = await serve(tempFolder());
    const bad = [
      csvHeader,
      'Harrowgate render A,building,0.8,1700,1000,20,,0.9,,,demo,',
      'Harrowgate render B,building,-0.8,1700,1000,20,,0.9,,,demo,',
      'Harrowgate render C,building,0.8,1700,1000,20,,0.9,,,demo,',
      'Harrowgate render D,building,0.8,1700,1000,20,,1.7,,,demo,',
    ].join('\n');
    const refused = await ok(url, 'materials:import-csv', { csv: bad });
    expect(refused.ok).toBe(false);
    if (refused.ok) return;
    expect(refused.problems.map((p) => p.line)).toEqual([3, 5]);
    expect(await ok(url, 'materials:list', { origin: 'user' })).toEqual([]);

    const good = bad.replace('-0.8', '0.8').replace(',1.7,', ',0.7,');
    const accepted = await ok(url, 'materials:import-csv', { csv: good });
    expect(accepted.ok && accepted.created.map((m) => m.name)).toEqual(['Harrowgate render A', 'Harrowgate render B', 'Harrowgate render C', 'Harrowgate render D']);
    const exported = await ok(url, 'materials:export-csv', { origin: 'user' });
    expect(exported.csv.split(/\r?\n/).filter(Boolean)).toHaveLength(5);
  });

  it('refuses to delete a material a case uses, and deletes it with a replacement', async () => {
    const { url } = await serve(tempFolder());
    const material = await ok(url, 'materials:create', { material: userMaterial });
    const other = await ok(url, 'materials:create', { material: { ...userMaterial, name: 'Lime render, Harrowgate depot' } });
    const project = await ok(url, 'projects:create', { fields: { name: 'Harrowgate depot, north wall', client: 'Fenwick Storage Ltd' } });
    const added = await ok(url, 'projects:add-case', {
      projectId: project.id,
      draft: { name: 'North wall', inputs: wallInputs([material.id], { area: 40 }) },
    });
    const usage = await ok(url, 'materials:usage', { id: material.id });
    expect(usage).toEqual([{ projectId: project.id, projectName: 'Harrowgate depot, north wall', caseId: added.id, caseName: 'North wall', inRecycleBin: false }]);
    const refused = await call(url, 'materials:remove', { id: material.id });
    expect(refused.status).toBe(409);
    expect((refused.body as ApiError).error).toBe(
      '"Site-mixed render, Harrowgate depot" is used by 1 case(s) in project "Harrowgate depot, north wall"; choose a replacement material or remove it from those cases first.',
    );
    expect(await ok(url, 'materials:remove', { id: material.id, replaceWith: other.id })).toEqual({ replacedInCases: 1 });
    const reopened = await ok(url, 'projects:open', { id: project.id });
    expect(reopened.cases[0]!.inputs.layers[0]!.materialId).toBe(other.id);
  });
});

describe('projects channels', () => {
  it('creates, renames, bins, restores, exports and imports a project', async () => {
    const folder = tempFolder();
    const { url } = await serve(folder);
    const material = await ok(url, 'materials:create', { material: userMaterial });
    const project = await ok(url, 'projects:create', { fields: { name: 'Depot boiler room', engineer: 'R. Okafor', date: '2031-04-02' } });
    await ok(url, 'projects:add-case', { projectId: project.id, draft: { name: 'Wall A', inputs: wallInputs([material.id]) } });
    expect((await ok(url, 'projects:rename', { id: project.id, name: 'Depot boiler room, rev B' })).name).toBe('Depot boiler room, rev B');
    expect((await ok(url, 'projects:update', { id: project.id, changes: { revision: 'B' } })).revision).toBe('B');
    const badDate = await call(url, 'projects:update', { id: project.id, changes: { date: '2031-02-30' } });
    expect(badDate.body).toEqual({ error: 'date must be a calendar date written YYYY-MM-DD, or empty.', field: 'date' });

    const exported = await ok(url, 'projects:export-file', { id: project.id });
    expect(exported.fileName).toBe('Depot-boiler-room-rev-B.lamina.json');
    expect(await ok(url, 'projects:remove', { id: project.id })).toBeNull();
    expect((await ok(url, 'projects:list-recycle-bin', {})).map((p) => p.id)).toEqual([project.id]);
    expect((await ok(url, 'projects:restore', { id: project.id })).deletedAt).toBeNull();

    // The project is still there: importing its own export asks first (field onExisting), then adds a copy.
    const asks = await call(url, 'projects:import-file', { text: exported.text });
    expect(asks.status).toBe(400);
    expect((asks.body as ApiError).field).toBe('onExisting');
    const imported = await ok(url, 'projects:import-file', { text: exported.text, onExisting: 'copy' });
    expect(imported.replaced).toBeNull();
    expect(imported.materialsReused).toBe(1);
    expect(imported.project.cases).toHaveLength(1);
    expect((await ok(url, 'projects:list', {})).length).toBe(2);
    const notAFile = await call(url, 'projects:import-file', { text: '{"format":"something else"}' });
    expect(notAFile.status).toBe(400);
    expect((notAFile.body as ApiError).error).toBe('format must be "lamina-project"; this is not a Lamina project file.');
  });

  it('adds the demo project of data/demo again on request', async () => {
    const { url } = await serve(tempFolder());
    const demo = await ok(url, 'projects:add-demo', {});
    expect(demo.name).toBe('Orrin Valley Creamery (demo)');
    expect(demo.cases).toHaveLength(6);
    expect((await call(url, 'projects:add-demo', { again: true })).status).toBe(400);
  });
});

describe('backups channels', () => {
  it('creates a backup and restores it, reopening the library', async () => {
    const folder = tempFolder();
    const { url } = await serve(folder);
    expect(await ok(url, 'database:status', {})).toEqual({ state: 'open', databasePath: path.join(folder, 'data', 'lamina.sqlite'), createdAtThisStart: true });
    const before = await ok(url, 'materials:create', { material: userMaterial });
    const backup = await ok(url, 'backups:create', {});
    expect(backup.reason).toBe('manual');
    await ok(url, 'materials:create', { material: { ...userMaterial, name: 'Made after the backup' } });
    expect((await ok(url, 'backups:list', {})).map((b) => b.file)).toEqual([backup.file]);

    const restored = await ok(url, 'backups:restore', { file: backup.file });
    expect(restored.status.state).toBe('open');
    expect(restored.movedAsideTo).toMatch(/lamina\.sqlite\.before-restore-/);
    expect(fs.existsSync(restored.movedAsideTo!)).toBe(true);
    expect((await ok(url, 'materials:list', { origin: 'user' })).map((m) => m.name)).toEqual([before.name]);
  });

  it('restores only a listed backup, never an arbitrary path', async () => {
    const folder = tempFolder();
    const { url } = await serve(folder);
    const answer = await call(url, 'backups:restore', { file: '/etc/passwd' });
    expect(answer.status).toBe(409);
    expect(answer.body).toEqual({ error: 'file must name one of the listed backups; "/etc/passwd" is not one.' });
    expect((await ok(url, 'database:status', {})).state).toBe('open');
  });

  it('reports a damaged database at start, never writes it, and recovers by restoring a backup', async () => {
    const folder = tempFolder();
    const first = await serve(folder);
    await ok(first.url, 'materials:create', { material: userMaterial });
    const backup = await ok(first.url, 'backups:create', {});
    await first.close();
    running.splice(running.indexOf(first), 1);

    const databasePath = path.join(folder, 'data', 'lamina.sqlite');
    const damaged = Buffer.from('This is a note someone saved over the library file.\n');
    fs.writeFileSync(databasePath, damaged);
    const { url } = await serve(folder);
    const status = await ok(url, 'database:status', {});
    expect(status).toEqual({
      state: 'unavailable',
      databasePath,
      reason: 'not-a-database',
      message: `The file ${databasePath} is not a Lamina database (it is not an SQLite file): choose another file or restore a backup; Lamina has not changed it.`,
      backups: [backup],
    });
    const refused = await call(url, 'materials:list', {});
    expect(refused.status).toBe(409);
    expect((refused.body as ApiError).error).toBe(`The library is not open: ${status.state === 'unavailable' ? status.message : ''}`);
    expect(fs.readFileSync(databasePath)).toEqual(damaged);

    const restored = await ok(url, 'backups:restore', { file: backup.file });
    expect(restored.status.state).toBe('open');
    expect(fs.readFileSync(restored.movedAsideTo!)).toEqual(damaged);
    expect((await ok(url, 'materials:list', { origin: 'user' })).map((m) => m.name)).toEqual([userMaterial.name]);
  });
});

describe('the launch key', () => {
  const noKey =
    'This request carries no valid key for this launch of Lamina: open the address Lamina printed when it started (it ends in ?k=…), or send that key in the X-Lamina-Key header.';
  const userProject = { fields: { name: 'Harrowgate depot, loading bay' } }; // invented scenario

  it('refuses every channel without the key in one sentence, and nothing is done', async () => {
    const server = await serve(tempFolder());
    const bare = `${server.origin}/`;
    const requests: Partial<Record<(typeof API_CHANNELS)[number], unknown>> = {
      'projects:create': userProject,
      'materials:create': { material: userMaterial },
      'materials:import-csv': { csv: `${csvHeader}\n` },
      'backups:create': {},
    };
    for (const channel of API_CHANNELS) {
      const answer = await call(bare, channel, requests[channel] ?? {});
      expect({ channel, status: answer.status, body: answer.body }).toEqual({ channel, status: 401, body: { error: noKey } });
    }
    // A path that names no channel is refused the same way: without the key nothing is revealed.
    const unknown = await fetch(`${server.origin}/api/no-such-thing`, { method: 'POST' });
    expect(unknown.status).toBe(401);
    expect(await ok(server.url, 'projects:list', {})).toEqual([]);
    expect(await ok(server.url, 'materials:list', { origin: 'user' })).toEqual([]);
    expect(await ok(server.url, 'backups:list', {})).toEqual([]);
  });

  it('refuses a wrong key of the same length or another length', async () => {
    const server = await serve(tempFolder());
    const sameLength = server.key.replace(/^./, (first) => (first === 'A' ? 'B' : 'A'));
    expect(sameLength).toHaveLength(server.key.length);
    for (const wrong of [sameLength, server.key.slice(0, -1), `${server.key}A`, '', 'x'.repeat(4000)]) {
      const answer = await call(`${server.origin}/?k=${encodeURIComponent(wrong)}`, 'projects:create', userProject);
      expect({ wrong, status: answer.status, body: answer.body }).toEqual({ wrong, status: 401, body: { error: noKey } });
    }
    expect(await ok(server.url, 'projects:list', {})).toEqual([]);
  });

  it('makes a new key at every launch and refuses the key of the one before', async () => {
    const folder = tempFolder();
    const first = await serve(folder);
    const oldAddress = first.url;
    await ok(oldAddress, 'projects:create', userProject);
    await first.close();
    running.splice(running.indexOf(first), 1);

    const second = await serve(folder);
    expect(second.key).not.toBe(first.key);
    expect(second.key).toMatch(/^[A-Za-z0-9_-]{43}$/); // 32 random bytes in base64url
    const stale = `${second.origin}/?k=${first.key}`;
    const refused = await call(stale, 'projects:list', {});
    expect({ status: refused.status, body: refused.body }).toEqual({ status: 401, body: { error: noKey } });
    expect((await ok(second.url, 'projects:list', {})).map((p) => p.name)).toEqual([userProject.fields.name]);
  });

  it('takes the key in the X-Lamina-Key header from a client with no Origin, and still refuses another origin', async () => {
    const server = await serve(tempFolder());
    const created = await ok(server.url, 'projects:create', userProject);
    expect(created.name).toBe(userProject.fields.name);
    const foreign = await call(server.url, 'projects:list', {}, { Origin: 'http://depot-intranet.example' });
    expect({ status: foreign.status, body: foreign.body }).toEqual({ status: 403, body: { error: 'Requests from other origins are refused.' } });
    const own = await call(server.url, 'projects:list', {}, { Origin: server.origin });
    expect(own.status).toBe(200);
  });
});
