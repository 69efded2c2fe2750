/**
 * The schedule grid's columns: the run's own values (editable, shown and typed in the project's
 * units, SI inside) and, beside them, the results of its last sizing (read only). Each column says
 * how a run shows in it, how typed text becomes the run's value, and what it sorts by (numbers as
 * numbers). The texts of a cell are what copy puts on the clipboard and paste reads back.
 */
import { CRITERION_NAMES } from '../../../app/cases/sizing/sizing-words.js';
import { SCHEDULE_COLUMNS, type ColumnKey } from '../../../app/schedules/schedule-columns.js';
import type { KeyedSizedRun, ScheduleRun } from '../../../app/api/contract.js';
import type { CheckVerdict } from '../../../app/checks/check-result.js';
import type { QuantityName } from '../../../app/base/quantities.js';
import { fromDisplay, toDisplay, unitLabel, type UnitSystem } from '../../../app/base/unit-systems.js';
import { formatQuantityNumber } from '../../../app/report/format-quantity.js';

/** A run with its sizing, when that sizing is for the run's current inputs. */
export interface GridRow {
  /** The reference the run is stored under (a row as typed may have changed its own). */
  readonly key: string;
  readonly run: ScheduleRun;
  readonly sized: KeyedSizedRun | undefined;
  /** True when the run has no sizing for its current inputs (never sized, or changed since). */
  readonly stale: boolean;
}

export interface GridColumn {
  readonly id: string;
  readonly title: string;
  /** The unit in the header, in the project's system ('' for none). */
  readonly unit: string;
  readonly editable: boolean;
  readonly numeric: boolean;
  /** Wide columns (names) get room; numbers stay narrow. */
  readonly wide?: boolean;
  readonly text: (row: GridRow) => string;
  /** For sorting: a number for numeric columns (null sorts last), text otherwise. */
  readonly sortKey: (row: GridRow) => number | string | null;
}

export type EditableColumn = GridColumn & { readonly key: ColumnKey; readonly quantity?: QuantityName; readonly count?: boolean };

/** Few enough digits to read, enough that a value typed in US units reads back as typed. */
function editableNumber(value: number): string {
  const rounded = Number(value.toPrecision(6));
  return String(Object.is(rounded, -0) ? 0 : rounded);
}

function runValue(run: ScheduleRun, key: ColumnKey): unknown {
  return key === 'valves' || key === 'flanges' || key === 'bends' ? run.fittings[key] : run[key];
}

const SHORT_TITLES: Partial<Record<ColumnKey, string>> = {
  pipeSeries: 'series', pipeSize: 'size', wallThickness: 'wall', fluidTemperature: 'fluid', airTemperature: 'air',
  relativeHumidity: 'RH', windSpeed: 'wind', material: 'material', thickness: 'fixed thickness',
};

export function inputColumns(system: UnitSystem): EditableColumn[] {
  return SCHEDULE_COLUMNS.map((c) => {
    const numeric = c.quantity !== undefined || c.count === true;
    return {
      id: c.key,
      key: c.key,
      title: SHORT_TITLES[c.key] ?? c.name,
      unit: c.quantity ? unitLabel(c.quantity, system) : '',
      editable: true,
      numeric,
      wide: c.key === 'reference' || c.key === 'service' || c.key === 'location' || c.key === 'material',
      ...(c.quantity ? { quantity: c.quantity } : {}),
      ...(c.count ? { count: true } : {}),
      text: (row: GridRow) => {
        const v = runValue(row.run, c.key);
        if (v === null || v === undefined) return '';
        if (typeof v === 'number') return c.quantity ? editableNumber(toDisplay(v, c.quantity, system)) : String(v);
        return String(v);
      },
      sortKey: (row: GridRow) => {
        const v = runValue(row.run, c.key);
        return typeof v === 'number' ? v : v === null || v === undefined ? null : String(v).toLowerCase();
      },
    };
  });
}

/** What the cell's typed text makes of the run, or the sentence why it cannot be read. */
export function withCellText(run: ScheduleRun, column: EditableColumn, text: string, system: UnitSystem): { ok: true; run: ScheduleRun } | { ok: false; message: string } {
  const typed = text.trim();
  const key = column.key;
  let value: string | number | null;
  if (!column.numeric) {
    value = typed === '' && (key === 'material' || key === 'orientation') ? null : typed;
  } else if (typed === '') {
    value = column.count ? 0 : null;
  } else {
    const n = Number(typed.replace(/\u2212/g, '-'));
    if (!Number.isFinite(n)) return { ok: false, message: `${column.title} must be a number${column.unit ? ` in ${column.unit}` : ''}; '${typed}' is not one.` };
    value = column.quantity ? fromDisplay(n, column.quantity, system) : n;
  }
  if (key === 'valves' || key === 'flanges' || key === 'bends') return { ok: true, run: { ...run, fittings: { ...run.fittings, [key]: value } } };
  return { ok: true, run: { ...run, [key]: value } as ScheduleRun };
}


const VERDICT_SIGNS: Readonly<Record<CheckVerdict, string>> = { pass: '✓', fail: '✗', warning: '!', 'not-applicable': '–' };

/** How a sized run's thickness came about, in words ('' for a run not sized). */
export function basisText(sized: KeyedSizedRun | undefined): string {
  if (!sized) return '';
  if (!sized.ok) return 'cannot size';
  if (sized.basis === 'fixed') return sized.criteriaMet ? 'fixed' : 'fixed, falls short';
  if (sized.basis === 'none-meets') return 'none meets';
  // The engine's names, as the report and the command line write them.
  return sized.governing ? CRITERION_NAMES[sized.governing] : 'chosen';
}

/** True for a row whose result needs the reader's attention (flagged in the grid). */
export function isFlagged(sized: KeyedSizedRun | undefined): boolean {
  return sized !== undefined && (!sized.ok || sized.basis === 'none-meets' || !sized.criteriaMet);
}

/** Every check with its verdict, for the active row's line. */
export function verdictList(sized: KeyedSizedRun | undefined): string {
  if (!sized || !sized.ok) return '';
  return sized.verdicts.map((v) => `${VERDICT_SIGNS[v.verdict]} ${v.check}`).join('; ');
}

/** The checks in short, for the grid's cell: what fails, else what warns, else that all pass. */
export function verdictText(sized: KeyedSizedRun | undefined): string {
  if (!sized || !sized.ok) return '';
  const named = (verdict: CheckVerdict) => sized.verdicts.filter((v) => v.verdict === verdict).map((v) => v.check);
  const fails = named('fail');
  if (fails.length > 0) return `✗ ${fails.join(', ')}`;
  const warnings = named('warning');
  if (warnings.length > 0) return `! ${warnings.join(', ')}`;
  return sized.verdicts.some((v) => v.verdict === 'pass') ? '✓ all pass' : '– none apply';
}

function resultNumber(quantity: QuantityName, system: UnitSystem, pick: (s: Extract<KeyedSizedRun, { ok: true }>) => number): Pick<GridColumn, 'text' | 'sortKey' | 'unit' | 'numeric'> {
  const value = (row: GridRow) => (row.sized && row.sized.ok && !row.stale ? pick(row.sized) : null);
  return {
    unit: unitLabel(quantity, system),
    numeric: true,
    text: (row) => {
      const v = value(row);
      return v === null ? '' : formatQuantityNumber(v, quantity, system);
    },
    sortKey: value,
  };
}

export function resultColumns(system: UnitSystem): GridColumn[] {
  const fresh = (row: GridRow) => (row.stale ? undefined : row.sized);
  return [
    { id: 'result-thickness', title: 'chosen thickness', editable: false, ...resultNumber('thickness', system, (s) => s.thickness) },
    { id: 'result-basis', title: 'decided by', unit: '', editable: false, numeric: false, wide: true, text: (row) => basisText(fresh(row)), sortKey: (row) => basisText(fresh(row)) },
    { id: 'result-heat-loss', title: 'heat loss', editable: false, ...resultNumber('heatFlowPerLength', system, (s) => s.heatLossPerMetre) },
    { id: 'result-surface', title: 'surface', editable: false, ...resultNumber('temperature', system, (s) => s.surfaceTemperature) },
    { id: 'result-checks', title: 'checks', unit: '', editable: false, numeric: false, wide: true, text: (row) => verdictText(fresh(row)), sortKey: (row) => verdictText(fresh(row)) },
  ];
}

export type SortOrder = { readonly column: string; readonly descending: boolean } | null;

/** The rows in the order asked for (stable; empty values last either way). */
export function sortedRows(rows: readonly GridRow[], columns: readonly GridColumn[], order: SortOrder): GridRow[] {
  const column = order ? columns.find((c) => c.id === order.column) : undefined;
  if (!order || !column) return [...rows];
  const sign = order.descending ? -1 : 1;
  return rows
    .map((row, index) => ({ row, index, key: column.sortKey(row) }))
    .sort((a, b) => {
      if (a.key === null || b.key === null) return a.key === b.key ? a.index - b.index : a.key === null ? 1 : -1;
      const c = typeof a.key === 'number' && typeof b.key === 'number' ? a.key - b.key : String(a.key).localeCompare(String(b.key), undefined, { numeric: true });
      return c === 0 ? a.index - b.index : sign * c;
    })
    .map((x) => x.row);
}

/** The rows any of whose cells holds every word of the filter (case-insensitive). */
export function filteredRows(rows: readonly GridRow[], columns: readonly GridColumn[], filter: string): readonly GridRow[] {
  const words = filter.toLowerCase().split(/\s+/).filter((w) => w !== '');
  if (words.length === 0) return rows;
  return rows.filter((row) => {
    const text = columns.map((c) => c.text(row)).join('\t').toLowerCase();
    return words.every((w) => text.includes(w));
  });
}

/** Cells as a spreadsheet copies them: tabs between cells, a line per row. */
export function toTabSeparated(cells: readonly (readonly string[])[]): string {
  return cells.map((row) => row.map((c) => c.replace(/[\t\r\n]+/g, ' ')).join('\t')).join('\n');
}

/** Text a spreadsheet put on the clipboard, as rows of cells (the last empty line dropped). */
export function fromTabSeparated(text: string): string[][] {
  const lines = text.replace(/\r\n?/g, '\n').split('\n');
  if (lines.length > 1 && lines[lines.length - 1] === '') lines.pop();
  return lines.map((line) => line.split('\t'));
}
