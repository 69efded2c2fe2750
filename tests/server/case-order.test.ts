/**
 * The projects:move-case channel over the browser-mode transport, against the real service layer
 * on a real SQLite file in a temporary folder: a case moves to the place asked for, the others keep
 * their order, the stored positions stay 0, 1, 2, … and a bad request is refused in one sentence.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { ApiError, Project } from '../../app/api/contract.js';
import { startBrowserServer, type BrowserServer } from '../../main/server/browser-server.js';
import { call, ok } from './api-client.js';
import { seedIds, wallInputs } from '../storage/case-fixtures.js';

let folder: string;
let server: BrowserServer;
let project: Project;

beforeAll(async () => {
  folder = fs.mkdtempSync(path.join(os.tmpdir(), 'lamina-case-order-'));
  fs.mkdirSync(path.join(folder, 'site'));
  fs.writeFileSync(path.join(folder, 'site', 'index.html'), '<!doctype html><title>t</title>');
  server = await startBrowserServer({ port: 0, root: path.join(folder, 'site'), databasePath: path.join(folder, 'lamina.sqlite'), dailyBackups: false });
  const ids = seedIds((name) => server.library.library().materials.findByName(name));
  // An invented site: three walls of the Fenwick Lane depot.
  project = await ok(server.url, 'projects:create', { fields: { name: 'Fenwick Lane depot' } });
  for (const name of ['North wall', 'East wall', 'South wall']) {
    await ok(server.url, 'projects:add-case', { projectId: project.id, draft: { name, inputs: wallInputs([ids.wallMasonry, ids.wallBoard]) } });
  }
  project = await ok(server.url, 'projects:open', { id: project.id });
});

afterAll(async () => {
  await server?.close();
  fs.rmSync(folder, { recursive: true, force: true });
});

const names = (p: Project) => p.cases.map((c) => c.name);
const caseNamed = (name: string) => project.cases.find((c) => c.name === name)!;

describe('projects:move-case', () => {
  it('moves a case to the place asked for and stores dense positions', async () => {
    expect(names(project)).toEqual(['North wall', 'East wall', 'South wall']);

    const lastToFirst = await ok(server.url, 'projects:move-case', { caseId: caseNamed('South wall').id, position: 0 });
    expect(names(lastToFirst)).toEqual(['South wall', 'North wall', 'East wall']);
    expect(lastToFirst.cases.map((c) => c.position)).toEqual([0, 1, 2]);

    const firstToLast = await ok(server.url, 'projects:move-case', { caseId: caseNamed('South wall').id, position: 2 });
    expect(names(firstToLast)).toEqual(['North wall', 'East wall', 'South wall']);

    const downOne = await ok(server.url, 'projects:move-case', { caseId: caseNamed('North wall').id, position: 1 });
    expect(names(downOne)).toEqual(['East wall', 'North wall', 'South wall']);

    // The order is what the database holds: opening the project again gives the same.
    expect(names(await ok(server.url, 'projects:open', { id: project.id }))).toEqual(['East wall', 'North wall', 'South wall']);
  });

  it('refuses a place past the end, a place that is not a whole number, an unknown case and an unknown field', async () => {
    const caseId = caseNamed('East wall').id;
    const refusals: [unknown, number, ApiError][] = [
      [{ caseId, position: 3 }, 400, { error: 'position must be a whole number from 0 to 2: project "Fenwick Lane depot" has 3 cases.', field: 'position' }],
      [{ caseId, position: -1 }, 400, { error: 'position must be a whole number from 0 (the first place).', field: 'position' }],
      [{ caseId, position: 1.5 }, 400, { error: 'position must be a whole number from 0 (the first place).', field: 'position' }],
      [{ caseId, position: '1' }, 400, { error: 'position must be a whole number from 0 (the first place).', field: 'position' }],
      [{ caseId: 999_999, position: 0 }, 404, { error: 'There is no case with id 999999.' }],
      [{ caseId, position: 0, after: 2 }, 400, { error: 'The projects:move-case request has no field "after" (allowed: caseId, position).', field: 'after' }],
    ];
    for (const [request, status, body] of refusals) {
      const answer = await call(server.url, 'projects:move-case', request);
      expect({ status: answer.status, body: answer.body }).toEqual({ status, body });
    }
    // Nothing moved.
    expect(names(await ok(server.url, 'projects:open', { id: project.id }))).toEqual(['East wall', 'North wall', 'South wall']);
  });

  it('refuses to move a case of a project in the recycle bin', async () => {
    await ok(server.url, 'projects:remove', { id: project.id });
    const answer = await call(server.url, 'projects:move-case', { caseId: caseNamed('East wall').id, position: 0 });
    expect({ status: answer.status, body: answer.body }).toEqual({
      status: 409,
      body: { error: 'Project "Fenwick Lane depot" is in the recycle bin; restore it before changing it.' },
    });
    await ok(server.url, 'projects:restore', { id: project.id });
  });
});
