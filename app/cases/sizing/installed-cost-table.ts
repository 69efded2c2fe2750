/**
 * Installed-cost tables read from CSV text (data/sizing/installed-costs.csv, or a user's own file
 * of the same columns). One file holds many tables: each row names its table, and a table is the
 * rows that share the name. Thicknesses and diameters are in millimetres, as price lists give them;
 * the tables come out in SI (metres), as the engine works.
 *
 * All or nothing: the first bad row refuses the whole file in one sentence naming the line and the
 * column, so a half-read price list never prices a thickness silently.
 */
import { InputError } from '../../base/input-error.js';
import { describeRange, isInRange, type NumberRange } from '../../base/number-range.js';
import { shownValue } from '../../base/shown-value.js';
import { csvLineFields } from './csv-line.js';
import { COST_BASES, COST_TABLE_RANGES, MAX_COST_NAME_LENGTH, MAX_COST_SOURCE_LENGTH } from './installed-cost-table-checks.js';
import type { InstalledCostTable } from './sizing-model.js';

/** The header of an installed-cost file; columns may come in any order. */
export const INSTALLED_COST_COLUMNS = {
  table: 'table',
  basis: 'basis',
  outerDiameter: 'pipe outer diameter [mm]',
  thickness: 'thickness [mm]',
  cost: 'installed cost [per m or per m²]',
  source: 'source',
} as const;

type ColumnKey = keyof typeof INSTALLED_COST_COLUMNS;
const COLUMN_NAMES = Object.values(INSTALLED_COST_COLUMNS);

/** The SI ranges in the file's millimetres. */
const inMillimetres = (range: NumberRange): NumberRange => ({ ...range, min: range.min * 1000, max: range.max * 1000, unit: 'mm' });
const DIAMETER_MM = inMillimetres(COST_TABLE_RANGES.outerDiameter);
const THICKNESS_MM = inMillimetres(COST_TABLE_RANGES.thickness);

/** A decimal number as a spreadsheet writes one (no hex, no "Infinity", no empty text read as 0). */
const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

interface Cell {
  readonly line: number;
  readonly column: number;
  readonly text: string;
}

class Reader {
  constructor(readonly fileName: string) {}

  refuse(line: number, what: string): never {
    throw new InputError(`${this.fileName} line ${line}`, `${this.fileName} line ${line}${what}`);
  }

  /** The header's names, once read: a refusal names the column by its number and its name. */
  headers: readonly string[] = [];

  at(cell: Cell): string {
    return `, column ${cell.column} (${this.headers[cell.column - 1] ?? ''})`;
  }

  number(cell: Cell, range: NumberRange): number {
    const text = cell.text.trim();
    const value = DECIMAL.test(text) ? Number(text) : NaN;
    if (!isInRange(value, range)) this.refuse(cell.line, `${this.at(cell)} must be a number ${describeRange(range)} (got ${shownValue(cell.text)}).`);
    return value;
  }

  text(cell: Cell, maxLength: number): string {
    const text = cell.text.trim();
    if (text === '' || text.length > maxLength) this.refuse(cell.line, `${this.at(cell)} must be text of 1 to ${maxLength} characters (got ${shownValue(cell.text)}).`);
    return text;
  }
}

/** Which column holds what, from the header line; every column known, none missing or twice. */
function readHeader(reader: Reader, line: number, fields: readonly string[]): Record<ColumnKey, number> {
  const names = fields.map((f) => f.trim());
  reader.headers = names;
  const allowed = COLUMN_NAMES.map((n) => `'${n}'`).join(', ');
  names.forEach((name, i) => {
    if (!(COLUMN_NAMES as readonly string[]).includes(name)) reader.refuse(line, `, column ${i + 1} ('${name}') is not a column of an installed-cost table; the columns are ${allowed}.`);
    if (names.indexOf(name) !== i) reader.refuse(line, `, column ${i + 1} repeats the column '${name}'.`);
  });
  const index = {} as Record<ColumnKey, number>;
  for (const key of Object.keys(INSTALLED_COST_COLUMNS) as ColumnKey[]) {
    const i = names.indexOf(INSTALLED_COST_COLUMNS[key]);
    if (i < 0) reader.refuse(line, ` lacks the column '${INSTALLED_COST_COLUMNS[key]}'; the columns are ${allowed}.`);
    index[key] = i;
  }
  return index;
}

interface TableBeingRead {
  readonly name: string;
  readonly basis: InstalledCostTable['basis'];
  readonly firstLine: number;
  readonly points: [number, number, number][];
  readonly sources: string[];
  /** "diameter thickness" (mm) -> the line that gave it. */
  readonly seen: Map<string, number>;
}

/**
 * Every table of the file, in the order their names first appear. `fileName` names the file in a
 * refusal ("installed-costs.csv line 7, column 4 (thickness [mm]) must be …").
 */
export function parseInstalledCostTables(csv: string, fileName = 'installed-costs.csv'): InstalledCostTable[] {
  const reader: Reader = new Reader(fileName);
  const lines = (csv.startsWith('\uFEFF') ? csv.slice(1) : csv).split(/\r\n|\n|\r/);
  const tables = new Map<string, TableBeingRead>();
  let columns: Record<ColumnKey, number> | null = null;
  lines.forEach((text, i) => {
    const line = i + 1;
    if (text.replace(/,/g, '').trim() === '') return;
    const read = csvLineFields(text);
    if ('problem' in read) reader.refuse(line, `, column ${read.column} ${read.problem}.`);
    if (columns === null) {
      columns = readHeader(reader, line, read.fields);
      return;
    }
    if (read.fields.length !== reader.headers.length) reader.refuse(line, ` has ${read.fields.length} fields where the header has ${reader.headers.length}.`);
    const cell = (key: ColumnKey): Cell => ({ line, column: columns![key] + 1, text: read.fields[columns![key]]! });
    readRow(reader, cell, tables);
  });
  if (columns === null) throw new InputError(fileName, `${fileName} is empty: it needs the header ${COLUMN_NAMES.join(',')} and rows below it.`);
  if (tables.size === 0) throw new InputError(fileName, `${fileName} has no rows of installed costs below its header.`);
  return [...tables.values()].map((t) => ({ name: t.name, basis: t.basis, points: t.points, source: t.sources.join('; ') }));
}

function readRow(reader: Reader, cell: (key: ColumnKey) => Cell, tables: Map<string, TableBeingRead>): void {
  const name = reader.text(cell('table'), MAX_COST_NAME_LENGTH);
  const basisCell = cell('basis');
  const basis = basisCell.text.trim() as InstalledCostTable['basis'];
  if (!COST_BASES.includes(basis)) {
    reader.refuse(basisCell.line, `${reader.at(basisCell)} must be one of ${COST_BASES.map((b) => `'${b}'`).join(', ')} (got ${shownValue(basisCell.text)}).`);
  }
  let table = tables.get(name);
  if (table === undefined) {
    table = { name, basis, firstLine: basisCell.line, points: [], sources: [], seen: new Map() };
    tables.set(name, table);
  } else if (table.basis !== basis) {
    reader.refuse(basisCell.line, `${reader.at(basisCell)} must be '${table.basis}' like line ${table.firstLine} of the table '${name}' (got ${shownValue(basisCell.text)}).`);
  }
  const diameterCell = cell('outerDiameter');
  let diameter = 0;
  if (basis === 'per-metre') diameter = reader.number(diameterCell, DIAMETER_MM);
  else if (diameterCell.text.trim() !== '' && diameterCell.text.trim() !== '0') {
    reader.refuse(diameterCell.line, `${reader.at(diameterCell)} must be empty in a per-square-metre table, which has no pipe diameter (got ${shownValue(diameterCell.text)}).`);
  }
  const thickness = reader.number(cell('thickness'), THICKNESS_MM);
  const cost = reader.number(cell('cost'), COST_TABLE_RANGES.cost);
  const source = reader.text(cell('source'), MAX_COST_SOURCE_LENGTH);
  const line = basisCell.line;
  const key = `${diameter} ${thickness}`;
  const earlier = table.seen.get(key);
  if (earlier !== undefined) {
    const where = basis === 'per-metre' ? `pipe outer diameter ${diameter} mm and thickness ${thickness} mm` : `thickness ${thickness} mm`;
    reader.refuse(line, ` repeats the ${where} of line ${earlier} in the table '${name}'.`);
  }
  table.seen.set(key, line);
  table.points.push([diameter / 1000, thickness / 1000, cost]);
  if (!table.sources.includes(source)) table.sources.push(source);
}
