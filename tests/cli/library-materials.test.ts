/**
 * A case file that names materials by library id, solved with --db against a real SQLite library
 * (the seeded built-in materials): the same pipe as with inline values, and an unknown id refused in
 * one line naming the field.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const root = path.resolve(__dirname, '..', '..');
const cli = path.join(root, 'main', 'cli', 'lamina.mjs');

function lamina(args: string[]) {
  const r = spawnSync(process.execPath, [cli, ...args], { cwd: root, encoding: 'utf8' });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

describe('lamina solve with materials from the library', () => {
  const dir = mkdtempSync(path.join(tmpdir(), 'lamina-lib-'));
  const db = path.join(dir, 'library.sqlite');
  const materials = JSON.parse(lamina(['materials', 'list', '--json', '--db', db]).stdout) as { id: number; name: string }[];
  const idOf = (name: string) => materials.find((m) => m.name === name)!.id;

  const pipeCase = (insulationId: number) => ({
    schemaVersion: 1,
    kind: 'pipe',
    title: 'DN80 heating flow, boiler house (demo)',
    pipe: { size: { series: 'steel-iso', nominal: 'DN80' }, materialId: idOf('Carbon steel pipe') },
    inner: { kind: 'surface', temperature: 75 },
    layers: [{ materialId: insulationId, thickness: 0.04 }],
    jacket: { materialId: idOf('Aluminium cladding, bright rolled'), thickness: 0.0006 },
    orientation: 'horizontal',
    ambient: { airTemperature: 15, relativeHumidity: 0.6, exposure: { kind: 'indoor' } },
    length: 25,
    operatingHours: 5000,
  });

  it('resolves library ids and solves with a closed balance', () => {
    const file = path.join(dir, 'pipe.json');
    writeFileSync(file, JSON.stringify(pipeCase(idOf('Rock wool pipe section, typical curve'))));
    const r = lamina(['solve', file, '--db', db]);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.input.pipeSize.outerDiameter).toBeCloseTo(0.0889, 10); // DN80 = 88.9 mm (ISO 4200, from memory)
    expect(out.result.energyBalance.relativeResidual).toBeLessThan(1e-9);
    expect(out.result.heatLossPerMetre).toBeGreaterThan(0);
    expect(out.result.layers.map((l: { material: string }) => l.material)).toContain('Rock wool pipe section, typical curve');
  });

  it('an id the library does not hold: exit 2, one line naming the field', () => {
    const file = path.join(dir, 'missing.json');
    writeFileSync(file, JSON.stringify(pipeCase(99999)));
    const r = lamina(['solve', file, '--db', db]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(/layers\[0\]\.materialId 99999 names no material in the library/);
  });
});
