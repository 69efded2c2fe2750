/**
 * `lamina size` as an engineer uses it on the shipped sizing examples (data/examples/*-sizing-*.json):
 * JSON with the table and the choice, the same as solveCase gives; the readable table with
 * --format text; a case without a "sizing" block, or with a bad value in it, refused in one line
 * naming the field; --help pointing at the schema and the examples. Run in-process
 * (tests/cases/in-process-cli.ts) on the real command code; the library is a real SQLite file in a
 * temporary folder.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { solveCase } from '../../app/index.js';
import { caseContext } from '../../main/cases/case-context.js';
import { caseFileWriter, runLamina, temporaryFolder } from '../cases/in-process-cli.js';

const root = path.resolve(__dirname, '..', '..');
const examplesDir = path.join(root, 'data', 'examples');
const sizingExamples = readdirSync(examplesDir).filter((f) => /^(pipe|flat)-sizing-.*\.json$/.test(f));
const read = (file: string) => JSON.parse(readFileSync(path.join(examplesDir, file), 'utf8')) as Record<string, any>;
const folder = temporaryFolder('lamina-size-cli-');
const writeCase = caseFileWriter(folder);
const db = path.join(folder, 'library.sqlite');
afterAll(() => rmSync(folder, { recursive: true, force: true }));

/** One line on standard error, and nothing on standard output. */
function expectOneLineRefusal(run: { code: number; stdout: string; stderr: string }, field: string): void {
  expect(run.code).toBe(2);
  expect(run.stdout).toBe('');
  expect(run.stderr.trim().split('\n')).toHaveLength(1);
  expect(run.stderr).toContain(field);
}

describe('lamina size', () => {
  it('has examples of pipe and flat sizing', () => {
    expect(sizingExamples.some((f) => f.startsWith('pipe-'))).toBe(true);
    expect(sizingExamples.some((f) => f.startsWith('flat-'))).toBe(true);
  });

  for (const file of sizingExamples) {
    it(`${file}: prints the table and the choice as JSON, the same as the engine's sizing`, async () => {
      const run = await runLamina(['size', path.join(examplesDir, file)], { db });
      expect(run.stderr).toBe('');
      expect(run.code).toBe(0);
      const printed = JSON.parse(run.stdout);
      const engine = solveCase(read(file), caseContext(null)).sizing!;
      expect(printed.kind).toBe(read(file)['kind']);
      expect(printed.sizing.rows.map((r: { thickness: number }) => r.thickness)).toEqual(engine.rows.map((r) => r.thickness));
      expect(printed.sizing.choice).toEqual(engine.choice);
      // Each example is set up so that a thickness of its series meets every criterion.
      expect(printed.sizing.choice.kind).toBe('chosen');
      const chosen = printed.sizing.rows.find((r: { thickness: number }) => r.thickness === printed.sizing.choice.thickness);
      expect(chosen.outcomes.every((o: { met: boolean }) => o.met)).toBe(true);
    });
  }

  it('shows the annuity factor of the economics: the capital recovery factor i / (1 − (1 + i)^−n)', async () => {
    // Capital recovery factor, as in any engineering-economics text (e.g. ISO 15686-5 life-cycle
    // costing, from memory): 5 % over 15 years gives 0.09634.
    const example = read('pipe-sizing-hot-water-economic.json');
    const { discountRate: i, years: n } = example['sizing']['economics'];
    const run = await runLamina(['size', path.join(examplesDir, 'pipe-sizing-hot-water-economic.json')], { db });
    const { factors, economicThickness } = JSON.parse(run.stdout).sizing;
    expect(factors.annuity).toBeCloseTo(i / (1 - (1 + i) ** -n), 12);
    expect(factors.annuity).toBeCloseTo(0.09634, 5);
    expect(economicThickness).toBeGreaterThan(0);
  });

  it('says so when the least lifecycle cost is at the thickest option of the series (no minimum found)', async () => {
    // The tank shell's lifecycle cost still falls at 200 mm, the last of its list.
    const run = await runLamina(['size', path.join(examplesDir, 'flat-sizing-tank-wall.json')], { db });
    const { choice, economicThickness, rows } = JSON.parse(run.stdout).sizing;
    expect(economicThickness).toBe(rows[rows.length - 1].thickness);
    expect(choice.governing).toBe('economic');
    expect(choice.reason).toContain('It is the thickest option: a thicker one may cost less still');
    // The hot-water flow's least cost lies inside its series: nothing to say.
    const inside = JSON.parse((await runLamina(['size', path.join(examplesDir, 'pipe-sizing-hot-water-economic.json')], { db })).stdout).sizing;
    expect(inside.economicThickness).toBeLessThan(inside.rows[inside.rows.length - 1].thickness);
    expect(inside.choice.reason).not.toContain('thickest option');
  });

  it('--format text prints the choice, the governing criterion and the table', async () => {
    const run = await runLamina(['size', path.join(examplesDir, 'pipe-sizing-outdoor-freeze.json'), '--format', 'text'], { db });
    expect(run.code).toBe(0);
    expect(run.stdout).toContain('Choice of insulation thickness');
    expect(run.stdout).toMatch(/Chosen: 80\.0 mm of .*; the freeze protection governs\./s);
    expect(run.stdout).toMatch(/Time until the water reaches 0 °C \(h\)/);
    // The caution on freezing defers to local codes and licensed practice.
    expect(run.stdout).toMatch(/local codes and\s+licensed professional practice/);
    expect(run.stdout).not.toMatch(/NaN|undefined|Infinity/);
  });

  it('reads the case from standard input with "-" (a real child process)', () => {
    const r = spawnSync(process.execPath, [path.join(root, 'main', 'cli', 'lamina.mjs'), 'size', '-'], {
      cwd: root, encoding: 'utf8', input: readFileSync(path.join(examplesDir, 'flat-sizing-tank-wall.json'), 'utf8'), env: { ...process.env, LAMINA_DB: db },
    });
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    expect(JSON.parse(r.stdout).sizing.choice.kind).toBe('chosen');
  });

  it('a case without a "sizing" block: exit 2, one line saying so and pointing to lamina solve', async () => {
    const run = await runLamina(['size', path.join(examplesDir, 'pipe-hot-water-plant-room.json')], { db });
    expectOneLineRefusal(run, 'sizing');
    expect(run.stderr).toContain('lamina solve');
  });

  it('a bad value in the block: exit 2, one line naming the field', async () => {
    const bad = read('pipe-sizing-hot-water-economic.json');
    bad['sizing']['criteria']['maxHeatLoss']['limit'] = -5;
    expectOneLineRefusal(await runLamina(['size', writeCase(bad)], { db }), 'sizing.criteria.maxHeatLoss.limit');
    const noLayer = read('pipe-sizing-hot-water-economic.json');
    noLayer['sizing']['layer'] = 3;
    expectOneLineRefusal(await runLamina(['size', writeCase(noLayer)], { db }), 'sizing.layer');
    const unknownTable = read('flat-sizing-tank-wall.json');
    unknownTable['sizing']['economics']['costTable'] = 'No such table';
    expectOneLineRefusal(await runLamina(['size', writeCase(unknownTable)], { db }), 'sizing.economics.costTable');
  });

  it('--help names the block, its schema and examples that exist', async () => {
    const run = await runLamina(['size', '--help'], { db });
    expect(run.code).toBe(0);
    expect(run.stdout).toContain('"sizing"');
    for (const schema of run.stdout.match(/data\/schemas\/[\w-]+\.schema\.json/g) ?? []) expect(existsSync(path.join(root, schema))).toBe(true);
    const patterns = run.stdout.match(/data\/examples\/[\w*-]+\.json/g) ?? [];
    expect(patterns.length).toBeGreaterThan(0);
    for (const pattern of patterns) {
      const re = new RegExp(`^${path.basename(pattern).replace('*', '.*')}$`);
      expect(readdirSync(examplesDir).some((f) => re.test(f)), pattern).toBe(true);
    }
  });
});
