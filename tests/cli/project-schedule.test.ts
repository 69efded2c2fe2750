/**
 * `lamina projects schedule` as a contractor uses it on the invented creamery job
 * (data/schedules/example-schedule.csv): import (all or nothing, problems by line and column),
 * size (the table, the bill of quantities, JSON), export (reads back as the same schedule), the
 * template, re-import with a summary of what changed. In-process (tests/cases/in-process-cli.ts)
 * on a real SQLite library in a temporary folder.
 */
import { readFileSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { readScheduleCsv } from '../../app/schedules/schedule-csv-read.js';
import { runLamina, temporaryFolder } from '../cases/in-process-cli.js';

const root = path.resolve(__dirname, '..', '..');
const example = path.join(root, 'data', 'schedules', 'example-schedule.csv');
const folder = temporaryFolder('lamina-schedule-cli-');
const db = path.join(folder, 'library.sqlite');
const file = (name: string) => path.join(folder, name);
afterAll(() => rmSync(folder, { recursive: true, force: true }));
const lamina = (...args: string[]) => runLamina(['projects', ...args], { db, cwd: folder });

describe('lamina projects schedule', () => {
  it('imports nothing from a file with a bad row, and names the line and column', async () => {
    await lamina('create', 'Orrin Valley Creamery plant upgrade');
    const lines = readFileSync(example, 'utf8').trim().split('\n');
    lines[5] = lines[5]!.replace(',28,80,', ',28,eighty,');
    writeFileSync(file('bad.csv'), lines.join('\n'));
    const run = await lamina('schedule', '1', 'import', file('bad.csv'));
    expect(run.code).toBe(2);
    expect(run.stderr).toContain(`${file('bad.csv')}: line 6, fluid temperature [°C]: fluid temperature [°C] must be a number written with a decimal point (got "eighty").`);
    expect(run.stderr).toContain('Nothing was imported');
    const sized = JSON.parse((await lamina('schedule', '1', 'size', '--format', 'json')).stdout);
    expect(sized.runs).toEqual([]);
  });

  it('imports the schedule, sizes it, and prints the runs and the bill of quantities', async () => {
    const imported = await lamina('schedule', '1', 'import', example);
    expect(imported.code).toBe(0);
    expect(imported.stdout).toMatch(/14 added, 0 changed, 0 unchanged, 0 kept that the file does not hold; 14 runs in all\./);
    const text = await lamina('schedule', '1', 'size');
    expect(text.code).toBe(0);
    expect(text.stdout).toContain('Schedule of project 1: 14 runs, 14 sized now.');
    expect(text.stdout).toContain('Bill of quantities');
    expect(text.stdout).toMatch(/OVC-CHW-F-001 +chilled water +steel-iso DN125 +38\.00 +19\.0 +condensation margin/);
    expect(text.stdout).toMatch(/local codes and licensed professional practice/);
    expect(text.stdout).not.toMatch(/NaN|undefined|Infinity/);
    // Sized once: a second size has nothing left to do.
    expect((await lamina('schedule', '1', 'size')).stdout).toContain('14 runs, 0 sized now.');
    const json = JSON.parse((await lamina('schedule', '1', 'size', '--format', 'json')).stdout);
    expect(json.runs).toHaveLength(14);
    expect(json.bill.lines.reduce((t: number, l: { length: number }) => t + l.length, 0)).toBeCloseTo(json.runs.reduce((t: number, r: { run: { length: number } }) => t + r.run.length, 0), 9);
  });

  it('exports the schedule with its results; the export reads back as the same runs and re-imports unchanged', async () => {
    const exported = await lamina('schedule', '1', 'export', file('out.csv'));
    expect(exported.code).toBe(0);
    const text = readFileSync(file('out.csv'), 'utf8');
    expect(text.split('\r\n')[0]).toContain('chosen thickness [mm],basis,governing criterion');
    const back = readScheduleCsv(text);
    const original = readScheduleCsv(readFileSync(example, 'utf8'));
    expect(back.ok && original.ok && back.runs).toEqual(original.ok ? original.runs : null);
    const again = await lamina('schedule', '1', 'import', file('out.csv'));
    expect(again.stdout).toContain('0 added, 0 changed, 14 unchanged, 0 kept');
  });

  it('writes the bill of quantities as CSV: its lengths add up to the schedule\'s', async () => {
    const bill = await lamina('schedule', '1', 'bill', '-');
    expect(bill.code).toBe(0);
    const [header, ...rows] = bill.stdout.split('\r\n\r\n')[0]!.split('\r\n');
    expect(header).toBe('material,thickness [mm],pipe series,pipe size,pipe outside diameter [mm],runs,length [m],outer surface [m²],volume [m³],valves,flanges,bends,fittings as pipe [m]');
    const total = rows.reduce((t, r) => t + Number(r.split(',').at(-7)), 0);
    const original = readScheduleCsv(readFileSync(example, 'utf8'));
    expect(total).toBeCloseTo(original.ok ? original.runs.reduce((t, r) => t + r.length, 0) : NaN, 6);
    expect(bill.stdout).toMatch(/\r\nthe job,14,/);
  });

  it('a re-import of changed rows updates them by reference and says what changed', async () => {
    const lines = readFileSync(example, 'utf8').trim().split('\n');
    writeFileSync(file('changed.csv'), [lines[0], lines[1]!.replace(',42,80,', ',48,80,'), lines[2]].join('\n'));
    const run = await lamina('schedule', '1', 'import', file('changed.csv'));
    expect(run.stdout).toContain('0 added, 1 changed (OVC-HTG-F-001: length), 1 unchanged, 12 kept that the file does not hold; 14 runs in all.');
    expect((await lamina('schedule', '1', 'size')).stdout).toContain('14 runs, 1 sized now.');
  });

  it('prints the schedule settings, sets new ones from a file, and refuses a bad one naming the field', async () => {
    const settings = JSON.parse((await lamina('schedule', '1', 'settings')).stdout);
    expect(settings.services.map((s: { service: string }) => s.service)).toContain('chilled water');
    settings.services.find((s: { service: string }) => s.service === 'heating flow').criteria = { maxSurfaceTemperature: { limit: 45 }, maxHeatLoss: { limit: 25 } };
    writeFileSync(file('settings.json'), JSON.stringify(settings));
    expect((await lamina('schedule', '1', 'settings', file('settings.json'))).code).toBe(0);
    // The heating-flow runs' cases changed: they alone are sized again.
    expect((await lamina('schedule', '1', 'size')).stdout).toContain('14 runs, 4 sized now.');
    settings.conditionSets[0].relativeHumidity = 1.5;
    writeFileSync(file('bad-settings.json'), JSON.stringify(settings));
    const bad = await lamina('schedule', '1', 'settings', file('bad-settings.json'));
    expect(bad.code).toBe(2);
    expect(bad.stderr.trim()).toMatch(/^settings\.conditionSets\[0\]\.relativeHumidity must be/);
  });

  it('writes a template in the project\'s units, and refuses a bad action or id in one line', async () => {
    const template = await lamina('schedule', '1', 'template', '-');
    expect(template.stdout.trim()).toBe('reference,service,pipe series,pipe size,wall thickness [mm],length [m],fluid temperature [°C],location,air temperature [°C],relative humidity [%],wind speed [m/s],orientation,insulation material,insulation thickness [mm],valves,flanges,bends');
    const bad = await lamina('schedule', '1', 'resize');
    expect(bad.code).toBe(2);
    expect(bad.stderr.trim().split('\n')).toHaveLength(1);
    const missing = await lamina('schedule', '99', 'size');
    expect(missing.code).not.toBe(0);
    expect(missing.stderr.trim()).toBe('There is no project with id 99.');
  });
});
