/**
 * A real library (SQLite in a temporary folder, seeded with the shipped materials) with a project
 * whose schedule is data/schedules/example-schedule.csv (an invented creamery job), for the
 * schedule tests. One per test file.
 */
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll } from 'vitest';
import { openLamina, type LaminaServices } from '../../main/services/lamina-services.js';

export const root = path.resolve(import.meta.dirname, '..', '..');
export const exampleCsv = readFileSync(path.join(root, 'data', 'schedules', 'example-schedule.csv'), 'utf8');

export function useScheduleLibrary(): { lamina: () => LaminaServices; projectId: () => number } {
  let lamina: LaminaServices | undefined;
  let folder = '';
  let projectId = 0;
  beforeAll(async () => {
    folder = mkdtempSync(path.join(tmpdir(), 'lamina-schedule-'));
    lamina = await openLamina(path.join(folder, 'library.sqlite'));
    projectId = lamina.projects.create({ name: 'Orrin Valley Creamery plant upgrade' }).id;
  });
  afterAll(() => {
    lamina?.close();
    rmSync(folder, { recursive: true, force: true });
  });
  return { lamina: () => lamina!, projectId: () => projectId };
}

/** The outside diameter (m) of a size from the shipped tables, read here from the CSV itself. */
export function tableOuterDiameter(series: string, size: string): number {
  if (series === 'steel-iso') {
    const row = readFileSync(path.join(root, 'data', 'pipe-sizes', 'steel.csv'), 'utf8').split('\n').find((l) => l.startsWith(`${size.replace(/^DN/, '')},`));
    return Number(row!.split(',')[2]) / 1000;
  }
  if (series === 'copper-en1057') return Number(size) / 1000;
  throw new Error(`no table lookup for ${series} in this test`);
}
