/**
 * The `lamina solve` command as engineers use it: a real child process running main/cli/lamina.mjs
 * on the example case files; invalid input exits 2 with one line naming the field. Every example is
 * also validated against the JSON Schema in data/schemas (ajv, draft 2020-12).
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import Ajv2020Module from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';

const root = path.resolve(__dirname, '..', '..');
const cli = path.join(root, 'main', 'cli', 'lamina.mjs');
const examplesDir = path.join(root, 'data', 'examples');
const examples = readdirSync(examplesDir).filter((f) => f.endsWith('.json'));

function lamina(args: string[], input?: string) {
  const r = spawnSync(process.execPath, [cli, ...args], { cwd: root, encoding: 'utf8', input, env: { ...process.env, LAMINA_DB: path.join(mkdtempSync(path.join(tmpdir(), 'lamina-cli-')), 'db.sqlite') } });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

// ajv's CommonJS default export, as NodeNext module resolution sees it.
const Ajv2020 = Ajv2020Module.default;

function schemaValidator() {
  const ajv = new Ajv2020({ allErrors: true, strict: false });
  for (const file of readdirSync(path.join(root, 'data', 'schemas'))) {
    if (file !== 'case.schema.json') ajv.addSchema(JSON.parse(readFileSync(path.join(root, 'data', 'schemas', file), 'utf8')));
  }
  return ajv.compile(JSON.parse(readFileSync(path.join(root, 'data', 'schemas', 'case.schema.json'), 'utf8')));
}

/** The energy-balance residual each kind of result carries. */
function relativeResidualOf(out: { kind: string; result: Record<string, any> }): number {
  if (out.kind === 'conduction') return out.result.balance.relativeResidual;
  if (out.kind === 'wall') return out.result.wall.energyBalance.relativeResidual;
  return out.result.energyBalance.relativeResidual;
}

describe('lamina solve', () => {
  it('every example validates against the case schema', () => {
    const validate = schemaValidator();
    expect(examples.length).toBeGreaterThanOrEqual(3);
    for (const file of examples) {
      const ok = validate(JSON.parse(readFileSync(path.join(examplesDir, file), 'utf8')));
      expect(ok, `${file}: ${JSON.stringify(validate.errors)}`).toBe(true);
    }
  });

  it('the schema refuses what the command refuses (unknown field, missing thickness)', () => {
    const validate = schemaValidator();
    const base = JSON.parse(readFileSync(path.join(examplesDir, 'conduction-cold-store-wall.json'), 'utf8'));
    expect(validate({ ...base, colour: 'red' })).toBe(false);
    expect(validate({ ...base, layers: [{ conductivity: { kind: 'constant', value: 1 } }] })).toBe(false);
  });

  for (const file of examples) {
    it(`solves ${file} to JSON with a closed energy balance`, () => {
      const r = lamina(['solve', path.join('data', 'examples', file)]);
      expect(r.stderr).toBe('');
      expect(r.code).toBe(0);
      const out = JSON.parse(r.stdout);
      expect(out.kind).toBe(file.split('-')[0]);
      expect(relativeResidualOf(out)).toBeLessThan(1e-9);
    });
    it(`prints ${file} as text with its energy balance and, for surfaces, the checks with their cautions`, () => {
      const r = lamina(['solve', path.join('data', 'examples', file), '--format', 'text']);
      expect(r.code).toBe(0);
      expect(r.stdout).toMatch(/[Ee]nergy balance/);
      expect(r.stdout).not.toMatch(/NaN|undefined|Infinity/);
      if (!file.startsWith('conduction-')) {
        expect(r.stdout).toMatch(/local (building )?codes/);
        expect(r.stdout).toMatch(/licensed professional/);
      }
    });
  }

  it('matches the series-resistance heat flow for the cold-store panel (Incropera ch. 3, eq. 3.19)', () => {
    const out = JSON.parse(lamina(['solve', 'data/examples/conduction-cold-store-wall.json']).stdout);
    const R = 1 / 25 + 0.0006 / 50 + 0.12 / 0.024 + 0.0006 / 50 + 1 / 7.7;
    expect(Math.abs(out.result.faces.inner.heatIn - 24 / R) / (24 / R)).toBeLessThan(1e-9);
  });

  it('prints a readable summary with --format text, reading from standard input', () => {
    const text = readFileSync(path.join(examplesDir, 'conduction-creamery-steam-main.json'), 'utf8');
    const r = lamina(['solve', '-', '--format', 'text'], text);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/Energy balance/);
    expect(r.stdout).toMatch(/Temperature of the inside surface of Steel pipe wall\s+180\.0 °C/);
  });

  it('invalid input: exit 2 and one line naming the field and the range', () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'lamina-case-'));
    const bad = JSON.parse(readFileSync(path.join(examplesDir, 'conduction-cold-store-wall.json'), 'utf8'));
    bad.layers[1].thickness = -0.1;
    const file = path.join(dir, 'bad.json');
    writeFileSync(file, JSON.stringify(bad));
    const r = lamina(['solve', file]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(/layers\[1\]\.thickness must be greater than 0 m \(got -0\.1\)\./);
  });

  it('invalid JSON, unknown kind, unknown field, missing file: exit 2 with one line', () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'lamina-case-'));
    const cases: [string, RegExp][] = [
      ['{ "kind": ', /is not valid JSON/],
      ['{ "schemaVersion": 1, "kind": "sphere" }', /kind must be one of/],
      [JSON.stringify({ ...JSON.parse(readFileSync(path.join(examplesDir, 'conduction-cold-store-wall.json'), 'utf8')), colour: 'red' }), /colour is not a known field here/],
    ];
    cases.forEach(([text, pattern], i) => {
      const file = path.join(dir, `c${i}.json`);
      writeFileSync(file, text);
      const r = lamina(['solve', file]);
      expect(r.code).toBe(2);
      expect(r.stderr.trim().split('\n')).toHaveLength(1);
      expect(r.stderr).toMatch(pattern);
    });
    const singular = path.join(dir, 'singular.json');
    const base = JSON.parse(readFileSync(path.join(examplesDir, 'conduction-cold-store-wall.json'), 'utf8'));
    writeFileSync(singular, JSON.stringify({ ...base, inner: { kind: 'flux', flux: 10 }, outer: { kind: 'film', coefficient: 0, ambient: 0 } }));
    const r = lamina(['solve', singular]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(/inner and outer leave the temperature level undetermined/);
    const missing = lamina(['solve', path.join(dir, 'nope.json')]);
    expect(missing.code).toBe(2);
    expect(missing.stderr).toBe(`lamina solve: ${path.join(dir, 'nope.json')} does not exist.\n`);
  });

  it('--help documents the case format; an unknown option is a usage error', () => {
    const help = lamina(['solve', '--help']);
    expect(help.code).toBe(0);
    expect(help.stdout).toMatch(/data\/schemas/);
    expect(help.stdout).toMatch(/Exit codes/);
    const bad = lamina(['solve', 'x.json', '--colour', 'red']);
    expect(bad.code).toBe(2);
    expect(lamina(['--help']).stdout).toMatch(/lamina solve CASE\.json/);
  });
});
