/**
 * A run sent as an object (the grid's edit of one row, over IPC or HTTP), checked with the very
 * rules of a CSV row: its shape here, then its values through the CSV reader, so a row typed in
 * the grid and the same row imported are refused in the same words.
 */
import { InputError } from '../base/input-error.js';
import { rejectUnknownKeys, requireObject } from '../base/field-checks.js';
import { SCHEDULE_COLUMNS } from './schedule-columns.js';
import { readScheduleCsv } from './schedule-csv-read.js';
import { writeScheduleCsv } from './schedule-csv-write.js';
import { FITTING_KINDS, type ScheduleRun } from './schedule-model.js';

const TEXT_KEYS = ['reference', 'service', 'pipeSeries', 'pipeSize', 'location', 'orientation', 'material'] as const;
const NUMBER_KEYS = ['wallThickness', 'length', 'fluidTemperature', 'airTemperature', 'relativeHumidity', 'windSpeed', 'thickness'] as const;

export function runFromObject(value: unknown, field = 'run'): ScheduleRun {
  const run = requireObject(value, field);
  rejectUnknownKeys(run, [...TEXT_KEYS, ...NUMBER_KEYS, 'fittings'], field);
  for (const key of TEXT_KEYS) {
    const v = run[key];
    if (!(typeof v === 'string' || (v === null && (key === 'material' || key === 'orientation')))) throw new InputError(`${field}.${key}`, `${field}.${key} must be text.`);
  }
  for (const key of NUMBER_KEYS) {
    const v = run[key];
    if (!(v === null || (typeof v === 'number' && Number.isFinite(v)))) throw new InputError(`${field}.${key}`, `${field}.${key} must be a number or null.`);
  }
  const fittings = requireObject(run['fittings'], `${field}.fittings`);
  rejectUnknownKeys(fittings, FITTING_KINDS, `${field}.fittings`);
  for (const kind of FITTING_KINDS) {
    if (typeof fittings[kind] !== 'number') throw new InputError(`${field}.fittings.${kind}`, `${field}.fittings.${kind} must be a whole number.`);
  }
  const read = readScheduleCsv(writeScheduleCsv([run as unknown as ScheduleRun], 'SI'));
  if (!read.ok) {
    const problem = read.problems[0]!;
    const column = SCHEDULE_COLUMNS.find((c) => problem.column.startsWith(c.name));
    throw new InputError(column ? `${field}.${column.key}` : field, problem.message);
  }
  return read.runs[0]!;
}
