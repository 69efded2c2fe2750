/**
 * Projects from the command line: create a project, store a case file whose materials are library
 * ids, and recompute it from its stored inputs (results are never stored). Real SQLite library in a
 * temporary folder; the pipe's heat flow is checked against the same case solved directly. A case
 * the engine could not solve is refused when it is added; one stored before that check (written
 * here straight into the file) is named when the project is solved, and the others still run.
 */
import { spawnSync } from 'node:child_process';
import Database from 'better-sqlite3';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { MATERIAL_CSV_HEADER } from '../../main/services/material-csv.js';
import { pipeInputs } from '../storage/case-fixtures.js';

const root = path.resolve(__dirname, '..', '..');
const cli = path.join(root, 'main', 'cli', 'lamina.mjs');

describe('lamina projects create / add-case / solve', () => {
  const dir = mkdtempSync(path.join(tmpdir(), 'lamina-projects-'));
  const db = path.join(dir, 'library.sqlite');
  const lamina = (...args: string[]) => {
    const r = spawnSync(process.execPath, [cli, ...args, '--db', db], { cwd: root, encoding: 'utf8' });
    return { code: r.status, stdout: r.stdout, stderr: r.stderr };
  };
  const materialIds = () => JSON.parse(lamina('materials', 'list', '--json').stdout) as { id: number; name: string }[];
  const idOf = (name: string) => materialIds().find((m) => m.name === name)!.id;
  const steel = idOf('Carbon steel pipe');
  const pipeCase = pipeInputs(
    { pipe: steel, insulation: [idOf('Rock wool pipe section, typical curve')], jacket: idOf('Aluminium cladding, bright rolled') },
    {
      title: 'DN80 heating flow, boiler house (demo)',
      pipe: { size: { series: 'steel-iso', nominal: 'DN80' }, materialId: steel },
      length: 25,
      operatingHours: 5000,
    },
  );

  it('stores a case and recomputes it from its inputs, as lamina solve would', () => {
    expect(lamina('projects', 'create', 'Orrin Valley Creamery, boiler house (demo)', '--client', 'Orrin Valley Dairy Co-operative (invented)').stdout).toMatch(/^Created project 1 /);
    const file = path.join(dir, 'pipe.json');
    writeFileSync(file, JSON.stringify(pipeCase));
    const added = lamina('projects', 'add-case', '1', file);
    expect(added.code).toBe(0);
    expect(added.stdout).toMatch(/Added case 1 "DN80 heating flow, boiler house \(demo\)" to project 1\./);

    const solved = lamina('projects', 'solve', '1');
    expect(solved.code).toBe(0);
    const out = JSON.parse(solved.stdout);
    expect(out.project.name).toBe('Orrin Valley Creamery, boiler house (demo)');
    expect(out.cases).toHaveLength(1);
    const direct = JSON.parse(lamina('solve', file).stdout);
    expect(out.cases[0].result.result.heatLossPerMetre).toBe(direct.result.heatLossPerMetre);
    expect(out.cases[0].result.result.energyBalance.relativeResidual).toBeLessThan(1e-9);

    const text = lamina('projects', 'solve', '1', '--format', 'text');
    expect(text.stdout).toMatch(/=== Case 1: DN80 heating flow, boiler house \(demo\) \(pipe\)/);
    expect(text.stdout).toMatch(/Heat loss per metre\s+\d+(\.\d+)? W\/m/);
  });

  it('refuses a pipe case whose bare outer insulation has no emissivity when it is added, writing nothing', () => {
    // A user material without an emissivity, as a site's own foam would be entered.
    const csv = path.join(dir, 'foam.csv');
    writeFileSync(csv, `${MATERIAL_CSV_HEADER.join(',')}\nKestrel site foam,insulation,0.035,,,,,,,,invented demo value,\n`);
    expect(lamina('materials', 'import', csv).code).toBe(0);
    const file = path.join(dir, 'bare.json');
    writeFileSync(file, JSON.stringify(pipeInputs({ pipe: steel, insulation: [idOf('Kestrel site foam')] }, { title: 'Bare foam, no emissivity' })));
    const refused = lamina('projects', 'add-case', '1', file);
    expect(refused.code).toBe(2);
    expect(refused.stderr).toBe(
      'projects add-case: layers[0].material.emissivity is needed for the radiation from the bare insulation surface: give a value from 0 to 1, or add a jacket with an emissivity.\n',
    );
    expect(JSON.parse(lamina('projects', 'list', '--json').stdout)[0].caseCount).toBe(1);
  });

  it('a case stored before the complete check that no longer solves is named, the others still run, exit 1', () => {
    const stale = { schemaVersion: 1, kind: 'pipe', length: 20, layers: [{ materialId: idOf('Kestrel site foam'), thickness: 0.05 }] };
    const sqlite = new Database(db);
    const now = '2024-01-01T00:00:00.000Z';
    sqlite.prepare(`INSERT INTO cases (project_id, name, position, inputs, created_at, updated_at) VALUES (1, 'Old flow line', 1, ?, ?, ?)`).run(JSON.stringify(stale), now, now);
    sqlite.close();
    const solved = lamina('projects', 'solve', '1');
    expect(solved.code).toBe(1);
    const out = JSON.parse(solved.stdout);
    expect(out.cases[0].result).toBeDefined();
    expect(out.cases[1]).toMatchObject({ name: 'Old flow line', error: 'ambient must be an object.' });
    expect(solved.stderr).toBe('lamina projects solve: case 2 "Old flow line": ambient must be an object.\n');
  });

  it('stores a case file with inline materials as it is; refuses a project that does not exist', () => {
    const inline = lamina('projects', 'add-case', '1', path.join(root, 'data', 'examples', 'pipe-hot-water-plant-room.json'));
    expect(inline.code).toBe(0);
    expect(inline.stdout).toMatch(/^Added case 3 /);
    const missing = lamina('projects', 'solve', '999');
    expect(missing.code).toBe(2);
    expect(missing.stderr.trim().split('\n')).toHaveLength(1);
  });

  it('imports its own export again only as a copy or a replacement, as the user chooses', () => {
    const file = path.join(dir, 'export.json');
    const id = /^Created project (\d+) /.exec(lamina('projects', 'create', 'Exported yard').stdout)![1]!;
    expect(lamina('projects', 'add-case', id, path.join(root, 'data', 'examples', 'pipe-steam-outdoor.json')).code).toBe(0);
    expect(lamina('projects', 'export', id, file).code).toBe(0);
    const again = lamina('projects', 'import', file);
    expect(again.code).toBe(2);
    expect(again.stderr).toMatch(/from the same file is already in the library: choose whether to add this one as a copy or to replace it/);
    const copy = lamina('projects', 'import', file, '--on-existing', 'copy');
    expect(copy.code).toBe(0);
    const replace = lamina('projects', 'import', file, '--on-existing', 'replace');
    expect(replace.code).toBe(0);
    expect(replace.stdout).toMatch(/ it replaces is in the recycle bin\.\n$/);
    expect(lamina('projects', 'import', file, '--on-existing', 'merge').stderr).toMatch(/onExisting must be one of 'copy', 'replace'/);
  });

  it('adds the demo project as the app does, every case of it solvable', () => {
    const added = lamina('projects', 'add-demo');
    expect(added.code).toBe(0);
    const [, id, name, count] = /^Added the demo project (\d+) "(.+)" with (\d+) case\(s\)\.\n$/.exec(added.stdout)!;
    // data/demo/demo-project.json: the invented creamery project of the examples.
    expect(name).toBe('Orrin Valley Creamery (demo)');
    expect(Number(count)).toBeGreaterThanOrEqual(6);
    const solved = lamina('projects', 'solve', id!);
    expect(solved.code).toBe(0);
    expect(JSON.parse(solved.stdout).cases).toHaveLength(Number(count));
    expect(lamina('projects', 'add-demo', 'extra').code).toBe(2);
  });
});
