/**
 * The schedule grid's columns (renderer/src/schedule/grid-columns.ts): values shown and typed in
 * the project's units with SI inside, numbers sorted as numbers, and cells to and from the
 * tab-separated text spreadsheets put on the clipboard. Conversions checked against the exact
 * definitions 1 ft = 0.3048 m and °F = °C·9/5 + 32 (NIST SP 811, Appendix B).
 */
import { describe, expect, it } from 'vitest';
import type { ScheduleRun } from '../../app/schedules/schedule-model.js';
import {
  fromTabSeparated, inputColumns, resultColumns, sortedRows, toTabSeparated, withCellText, type EditableColumn, type GridRow,
} from '../../renderer/src/schedule/grid-columns.js';

// An invented run of the Kestrel Yard depot schedule.
const run: ScheduleRun = {
  reference: 'KY-0001', service: 'heating flow', pipeSeries: 'steel-iso', pipeSize: 'DN50', wallThickness: null,
  length: 30.48, fluidTemperature: 80, location: 'Plant room', airTemperature: null, relativeHumidity: null, windSpeed: null,
  orientation: 'horizontal', material: null, thickness: null, fittings: { valves: 1, flanges: 0, bends: 2 },
};
const row = (r: ScheduleRun): GridRow => ({ key: r.reference, run: r, sized: undefined, stale: true });
const column = (system: 'SI' | 'IP', key: string) => inputColumns(system).find((c) => c.key === key) as EditableColumn;

describe('schedule grid columns', () => {
  it('show and read values in US units, SI inside (1 ft = 0.3048 m, °F = °C·9/5 + 32, exact)', () => {
    expect(column('IP', 'length').text(row(run))).toBe('100');
    expect(column('IP', 'length').unit).toBe('ft');
    expect(column('IP', 'fluidTemperature').text(row(run))).toBe('176');
    const typed = withCellText(run, column('IP', 'length'), '50', 'IP');
    expect(typed.ok && typed.run.length).toBeCloseTo(15.24, 12);
    const hot = withCellText(run, column('IP', 'fluidTemperature'), '212', 'IP');
    expect(hot.ok && hot.run.fluidTemperature).toBeCloseTo(100, 12);
  });

  it('show SI thickness in mm and humidity in %, and read an emptied optional box as "not given"', () => {
    const fixed = { ...run, thickness: 0.04, relativeHumidity: 0.55 };
    expect(column('SI', 'thickness').text(row(fixed))).toBe('40');
    expect(column('SI', 'relativeHumidity').text(row(fixed))).toBe('55');
    const cleared = withCellText(fixed, column('SI', 'thickness'), ' ', 'SI');
    expect(cleared.ok && cleared.run.thickness).toBe(null);
    const fittings = withCellText(run, column('SI', 'valves'), '3', 'SI');
    expect(fittings.ok && fittings.run.fittings).toEqual({ valves: 3, flanges: 0, bends: 2 });
  });

  it('refuse text that is not a number in one sentence naming the column and its unit', () => {
    expect(withCellText(run, column('SI', 'length'), 'ten', 'SI')).toEqual({ ok: false, message: "length must be a number in m; 'ten' is not one." });
  });

  it('sort numbers as numbers (9 < 10 < 100), empty values last, and keep the order of equals', () => {
    const rows = [100, 9, 10, 9].map((length, i) => row({ ...run, reference: `R${i}`, length }));
    const columns = [...inputColumns('SI'), ...resultColumns('SI')];
    expect(sortedRows(rows, columns, { column: 'length', descending: false }).map((r) => r.key)).toEqual(['R1', 'R3', 'R2', 'R0']);
    expect(sortedRows(rows, columns, { column: 'length', descending: true }).map((r) => r.key)).toEqual(['R0', 'R2', 'R1', 'R3']);
    const withEmpty = [row({ ...run, reference: 'A', thickness: null }), row({ ...run, reference: 'B', thickness: 0.03 })];
    expect(sortedRows(withEmpty, columns, { column: 'thickness', descending: true }).map((r) => r.key)).toEqual(['B', 'A']);
  });

  it('write and read tab-separated cells as a spreadsheet copies them (CRLF lines, a last empty line)', () => {
    const cells = [['KY-0001', '30'], ['KY-0002', '12.5']];
    expect(toTabSeparated(cells)).toBe('KY-0001\t30\nKY-0002\t12.5');
    expect(fromTabSeparated('KY-0001\t30\r\nKY-0002\t12.5\r\n')).toEqual(cells);
  });
});
