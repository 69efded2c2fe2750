/**
 * A schedule written as CSV in a project's units: the schedule's own columns (schedule-columns.ts)
 * and, where the runs were sized, the result columns after them. Each number is written with the
 * fewest digits that read back to the very value stored, so an export re-imports as the same
 * schedule; fields holding a comma, quote or line break are quoted as spreadsheets expect.
 */
import { toDisplay, type UnitSystem } from '../base/unit-systems.js';
import { storedValue } from './schedule-csv-read.js';
import type { QuantityName } from '../base/quantities.js';
import { CRITERION_NAMES } from '../cases/sizing/sizing-words.js';
import { columnHeader, RESULT_COLUMNS, resultHeader, SCHEDULE_COLUMNS, type ColumnKey } from './schedule-columns.js';
import type { ScheduleRun } from './schedule-model.js';
import type { SizedRun } from './size-run.js';

/** A field as CSV writes it. */
export function csvField(value: string): string {
  return /[",\r\n]/.test(value) || value !== value.trim() ? `"${value.replace(/"/g, '""')}"` : value;
}

/** The shortest decimal of the shown value that the reader converts back to exactly `si`. */
export function exactShown(si: number, quantity: QuantityName, system: UnitSystem): string {
  const shown = toDisplay(si, quantity, system);
  for (let digits = 1; digits <= 17; digits++) {
    const text = String(Number(shown.toPrecision(digits)));
    if (storedValue(Number(text), quantity, system) === si) return text;
  }
  return String(shown);
}

function cellOf(run: ScheduleRun, key: ColumnKey, quantity: QuantityName | undefined, system: UnitSystem): string {
  const value = key === 'valves' || key === 'flanges' || key === 'bends' ? run.fittings[key] : run[key];
  if (value === null) return '';
  if (typeof value === 'number') return quantity === undefined ? String(value) : exactShown(value, quantity, system);
  return String(value);
}

function resultCells(sized: SizedRun | undefined, system: UnitSystem): string[] {
  if (sized === undefined) return RESULT_COLUMNS.map(() => '');
  if (!sized.ok) return RESULT_COLUMNS.map((c) => (c.name === 'reason' ? sized.reason : c.name === 'basis' ? 'not sized' : ''));
  const shown = (v: number, q: QuantityName) => String(Number(toDisplay(v, q, system).toPrecision(6)));
  return [
    shown(sized.thickness, 'thickness'),
    sized.basis === 'none-meets' ? 'none meets' : sized.basis,
    sized.governing === null ? '' : CRITERION_NAMES[sized.governing],
    shown(sized.heatLossPerMetre, 'heatFlowPerLength'),
    shown(sized.heatLoss, 'heatFlow'),
    shown(sized.surfaceTemperature, 'temperature'),
    sized.criteriaMet ? 'yes' : 'no',
    sized.verdicts.map((v) => `${v.check}: ${v.verdict}`).join('; '),
    sized.reason,
  ];
}

export function writeScheduleCsv(runs: readonly ScheduleRun[], system: UnitSystem, sized?: ReadonlyMap<string, SizedRun>): string {
  const header = [...SCHEDULE_COLUMNS.map((c) => columnHeader(c, system)), ...(sized ? RESULT_COLUMNS.map((c) => resultHeader(c, system)) : [])];
  const lines = [header.map(csvField).join(',')];
  for (const run of runs) {
    const cells = SCHEDULE_COLUMNS.map((c) => cellOf(run, c.key, c.quantity, system));
    if (sized) cells.push(...resultCells(sized.get(run.reference), system));
    lines.push(cells.map(csvField).join(','));
  }
  return `${lines.join('\r\n')}\r\n`;
}
