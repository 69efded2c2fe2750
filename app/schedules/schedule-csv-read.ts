/**
 * A schedule of pipe runs read from CSV, as a spreadsheet saves it: a header row naming the
 * columns with their units (schedule-columns.ts), then one run per line. Every line is read and
 * every problem is collected, each with its line number, its column and one sentence; the caller
 * imports nothing unless the list is empty. Values are converted to SI here, at the edge.
 */
import { shownValue } from '../base/shown-value.js';
import { fromDisplay, toDisplay, type UnitSystem } from '../base/unit-systems.js';
import { QUANTITY_RANGES } from '../base/quantity-ranges.js';
import { PIPE_SIZE_SERIES, type PipeSizeSeries } from '../cases/pipe/pipe-sizes.js';
import { INPUT_LIMITS } from '../cases/insulated/insulated-inputs.js';
import { csvLineFields } from '../cases/sizing/csv-line.js';
import { columnHeader, RESULT_COLUMNS, resultHeader, SCHEDULE_COLUMNS, type ColumnKey, type ScheduleColumn } from './schedule-columns.js';
import { RUN_ORIENTATIONS, type RunOrientation, type ScheduleRun } from './schedule-model.js';

/** One problem of a schedule file: line 1 is the header. */
export interface ScheduleProblem {
  readonly line: number;
  /** The column's header as the file writes it, or '' for a problem of the whole line. */
  readonly column: string;
  readonly message: string;
}

export type ScheduleRead =
  | { readonly ok: true; readonly system: UnitSystem; readonly runs: readonly ScheduleRun[]; readonly lines: readonly number[] }
  | { readonly ok: false; readonly problems: readonly ScheduleProblem[] };

/** More rows than this is not a schedule of one project but a mistake (a whole database pasted). */
export const MAX_SCHEDULE_RUNS = 20_000;
export const MAX_REFERENCE_LENGTH = 60;
const MAX_TEXT_LENGTH = 120;
/** Problems listed before the rest are only counted: a wrong file gives thousands of them. */
export const MAX_PROBLEMS_LISTED = 200;

/** Allowed SI ranges of the number columns: the case pipeline's own (a run becomes a pipe case). */
const RANGES: Partial<Record<ColumnKey, { readonly min: number; readonly max: number; readonly minExclusive?: boolean; readonly maxExclusive?: boolean }>> = {
  wallThickness: QUANTITY_RANGES.pipeWallThickness,
  length: { min: 0, minExclusive: true, max: 100_000 },
  fluidTemperature: { min: INPUT_LIMITS.innerTemperature[0], max: INPUT_LIMITS.innerTemperature[1] },
  airTemperature: { min: INPUT_LIMITS.airTemperature[0], max: INPUT_LIMITS.airTemperature[1] },
  relativeHumidity: { min: 0, minExclusive: true, max: 1 },
  windSpeed: { min: INPUT_LIMITS.windSpeed[0], max: INPUT_LIMITS.windSpeed[1] },
  thickness: QUANTITY_RANGES.insulationThickness,
};
const MAX_FITTINGS = 10_000;

interface HeaderMap {
  readonly system: UnitSystem;
  /** Column key -> index in the line. */
  readonly index: ReadonlyMap<ColumnKey, number>;
  readonly headers: ReadonlyMap<ColumnKey, string>;
}

export function readScheduleCsv(text: string): ScheduleRead {
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/);
  const problems: ScheduleProblem[] = [];
  const header = readHeader(lines[0] ?? '', problems);
  if (header === null) return { ok: false, problems };
  const runs: ScheduleRun[] = [];
  const runLines: number[] = [];
  const firstLineOf = new Map<string, number>();
  for (let i = 1; i < lines.length; i++) {
    const line = lines[i]!;
    if (line.trim() === '') continue;
    if (runs.length + problems.length >= MAX_SCHEDULE_RUNS) {
      problems.push({ line: i + 1, column: '', message: `The schedule has more than ${MAX_SCHEDULE_RUNS} rows; split it into several projects.` });
      break;
    }
    const run = readRun(line, i + 1, header, problems);
    if (run === null) continue;
    const earlier = firstLineOf.get(run.reference.toLowerCase());
    if (earlier !== undefined) {
      problems.push({ line: i + 1, column: header.headers.get('reference')!, message: `reference '${run.reference}' is already the reference of line ${earlier}; each run needs its own.` });
      continue;
    }
    firstLineOf.set(run.reference.toLowerCase(), i + 1);
    runs.push(run);
    runLines.push(i + 1);
  }
  if (problems.length === 0 && runs.length === 0) problems.push({ line: 2, column: '', message: 'The schedule has a header but no runs.' });
  return problems.length > 0 ? { ok: false, problems } : { ok: true, system: header.system, runs, lines: runLines };
}

/**
 * A value of the file in SI, to 12 significant figures: a conversion from US units is not exact in
 * binary (28 m written as 91.86351706036745 ft reads back as 27.999999999999996 m), and no
 * measurement of a run has twelve figures, so rounding there lets an export read back exactly.
 */
export function storedValue(shown: number, quantity: NonNullable<ScheduleColumn['quantity']>, system: UnitSystem): number {
  const si = fromDisplay(shown, quantity, system);
  return si === 0 ? 0 : Number(si.toPrecision(12));
}

function readHeader(line: string, problems: ScheduleProblem[]): HeaderMap | null {
  const parsed = csvLineFields(line);
  if ('problem' in parsed) {
    problems.push({ line: 1, column: '', message: `The header ${parsed.problem} (column ${parsed.column}).` });
    return null;
  }
  const cells = parsed.fields.map((f) => f.trim());
  const index = new Map<ColumnKey, number>();
  const headers = new Map<ColumnKey, string>();
  const systems = new Set<UnitSystem>();
  cells.forEach((cell, i) => {
    const match = matchColumn(cell);
    if (match === null && isResultColumn(cell)) return;
    if (match === null) {
      problems.push({ line: 1, column: cell, message: `Column '${cell}' is not a column of a schedule; the columns are ${SCHEDULE_COLUMNS.map((c) => columnHeader(c, 'SI')).join(', ')} (or with US units).` });
      return;
    }
    if (index.has(match.column.key)) {
      problems.push({ line: 1, column: cell, message: `Column '${cell}' appears twice in the header.` });
      return;
    }
    index.set(match.column.key, i);
    headers.set(match.column.key, cell);
    if (match.system !== null) systems.add(match.system);
  });
  for (const column of SCHEDULE_COLUMNS) {
    if (column.required && !index.has(column.key)) problems.push({ line: 1, column: columnHeader(column, 'SI'), message: `The header has no column '${columnHeader(column, 'SI')}' (or '${columnHeader(column, 'IP')}'), which every run needs.` });
  }
  if (systems.size > 1) problems.push({ line: 1, column: '', message: 'The header mixes SI and US units; write every unit in one system (mm, m, °C, m/s or in, ft, °F, mph).' });
  if (problems.length > 0) return null;
  return { system: [...systems][0] ?? 'SI', index, headers };
}

/** A column of an export's results, skipped on import. */
function isResultColumn(cell: string): boolean {
  const lower = cell.toLowerCase();
  return RESULT_COLUMNS.some((c) => (['SI', 'IP'] as const).some((system) => resultHeader(c, system).toLowerCase() === lower));
}

function matchColumn(cell: string): { column: ScheduleColumn; system: UnitSystem | null } | null {
  const lower = cell.toLowerCase();
  for (const column of SCHEDULE_COLUMNS) {
    if (column.quantity === undefined) {
      if (lower === column.name) return { column, system: null };
      continue;
    }
    // A unit the same in both systems (%) says nothing about which one the file is in.
    const same = columnHeader(column, 'SI') === columnHeader(column, 'IP');
    for (const system of ['SI', 'IP'] as const) if (lower === columnHeader(column, system).toLowerCase()) return { column, system: same ? null : system };
  }
  return null;
}

function readRun(line: string, lineNumber: number, header: HeaderMap, problems: ScheduleProblem[]): ScheduleRun | null {
  const parsed = csvLineFields(line);
  if ('problem' in parsed) {
    problems.push({ line: lineNumber, column: '', message: `The line ${parsed.problem} (column ${parsed.column}).` });
    return null;
  }
  const before = problems.length;
  const cell = (key: ColumnKey) => {
    const i = header.index.get(key);
    return i === undefined ? '' : (parsed.fields[i] ?? '').trim();
  };
  const fail = (key: ColumnKey, message: string) => problems.push({ line: lineNumber, column: header.headers.get(key) ?? key, message });
  const text = (key: ColumnKey, name: string, required: boolean, max = MAX_TEXT_LENGTH): string | null => {
    const value = cell(key);
    if (value === '') {
      if (required) fail(key, `${name} is empty; every run needs one.`);
      return null;
    }
    if (value.length > max) fail(key, `${name} is longer than ${max} characters.`);
    return value;
  };
  const number = (key: ColumnKey, required: boolean): number | null => {
    const column = SCHEDULE_COLUMNS.find((c) => c.key === key)!;
    const shown = header.headers.get(key) ?? column.name;
    const raw = cell(key);
    if (raw === '') {
      if (required) fail(key, `${column.name} is empty; every run needs one.`);
      return null;
    }
    const value = Number(raw);
    if (!/^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(raw) || !Number.isFinite(value)) {
      fail(key, `${shown} must be a number written with a decimal point (got ${shownValue(raw)}).`);
      return null;
    }
    if (column.count) {
      if (!Number.isInteger(value) || value < 0 || value > MAX_FITTINGS) fail(key, `${shown} must be a whole number from 0 to ${MAX_FITTINGS} (got ${raw}).`);
      return value;
    }
    const si = storedValue(value, column.quantity!, header.system);
    const range = RANGES[key]!;
    const low = range.minExclusive ? si <= range.min : si < range.min;
    const high = range.maxExclusive ? si >= range.max : si > range.max;
    if (low || high) {
      const bound = (v: number) => Number(toDisplay(v, column.quantity!, header.system).toPrecision(6));
      fail(key, `${shown} must be ${range.minExclusive ? 'above' : 'at least'} ${bound(range.min)} and ${range.maxExclusive ? 'below' : 'at most'} ${bound(range.max)} (got ${raw}).`);
    }
    return si;
  };

  const reference = text('reference', 'reference', true, MAX_REFERENCE_LENGTH);
  const service = text('service', 'service', true);
  const seriesText = text('pipeSeries', 'pipe series', true);
  if (seriesText !== null && !(PIPE_SIZE_SERIES as readonly string[]).includes(seriesText.toLowerCase())) {
    fail('pipeSeries', `pipe series must be one of ${PIPE_SIZE_SERIES.join(', ')} (got ${shownValue(seriesText)}).`);
  }
  const pipeSize = text('pipeSize', 'pipe size', true, 20);
  const wallThickness = number('wallThickness', false);
  const length = number('length', true);
  const fluidTemperature = number('fluidTemperature', true);
  const location = text('location', 'location', true);
  const airTemperature = number('airTemperature', false);
  const relativeHumidity = number('relativeHumidity', false);
  const windSpeed = number('windSpeed', false);
  const orientationText = cell('orientation').toLowerCase();
  if (orientationText !== '' && !(RUN_ORIENTATIONS as readonly string[]).includes(orientationText)) {
    fail('orientation', `orientation must be horizontal or vertical (got ${shownValue(cell('orientation'))}).`);
  }
  const material = text('material', 'insulation material', false, 200);
  const thickness = number('thickness', false);
  const valves = number('valves', false) ?? 0;
  const flanges = number('flanges', false) ?? 0;
  const bends = number('bends', false) ?? 0;
  if (problems.length > before) return null;
  return {
    reference: reference!,
    service: service!,
    pipeSeries: seriesText!.toLowerCase() as PipeSizeSeries,
    pipeSize: pipeSize!,
    wallThickness,
    length: length!,
    fluidTemperature: fluidTemperature!,
    location: (location!.toLowerCase() === 'indoor' || location!.toLowerCase() === 'outdoor' ? location!.toLowerCase() : location)!,
    airTemperature,
    relativeHumidity,
    windSpeed,
    orientation: (orientationText === '' ? 'horizontal' : orientationText) as RunOrientation,
    material,
    thickness,
    fittings: { valves, flanges, bends },
  };
}
