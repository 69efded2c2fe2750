/**
 * Projects from the command line: create a project, store a case file whose materials are library
 * ids, and recompute it from its stored inputs (results are never stored). Real SQLite library in a
 * temporary folder; the pipe's heat flow is checked against the same case solved directly.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const root = path.resolve(__dirname, '..', '..');
const cli = path.join(root, 'main', 'cli', 'lamina.mjs');

describe('lamina projects create / add-case / solve', () => {
  const dir = mkdtempSync(path.join(tmpdir(), 'lamina-projects-'));
  const db = path.join(dir, 'library.sqlite');
  const lamina = (...args: string[]) => {
    const r = spawnSync(process.execPath, [cli, ...args, '--db', db], { cwd: root, encoding: 'utf8' });
    return { code: r.status, stdout: r.stdout, stderr: r.stderr };
  };
  const materials = JSON.parse(lamina('materials', 'list', '--json').stdout) as { id: number; name: string }[];
  const idOf = (name: string) => materials.find((m) => m.name === name)!.id;
  const pipeCase = {
    schemaVersion: 1,
    kind: 'pipe',
    title: 'DN80 heating flow, boiler house (demo)',
    pipe: { size: { series: 'steel-iso', nominal: 'DN80' }, materialId: idOf('Carbon steel pipe') },
    inner: { kind: 'surface', temperature: 75 },
    layers: [{ materialId: idOf('Rock wool pipe section, typical curve'), thickness: 0.04 }],
    jacket: { materialId: idOf('Aluminium cladding, bright rolled'), thickness: 0.0006 },
    orientation: 'horizontal',
    ambient: { airTemperature: 15, relativeHumidity: 0.6, exposure: { kind: 'indoor' } },
    length: 25,
    operatingHours: 5000,
  };

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

  it('stores a case file with inline materials as it is; refuses a project that does not exist', () => {
    const inline = lamina('projects', 'add-case', '1', path.join(root, 'data', 'examples', 'pipe-hot-water-plant-room.json'));
    expect(inline.code).toBe(0);
    expect(inline.stdout).toMatch(/^Added case 2 /);
    const missing = lamina('projects', 'solve', '999');
    expect(missing.code).toBe(2);
    expect(missing.stderr.trim().split('\n')).toHaveLength(1);
  });
});
