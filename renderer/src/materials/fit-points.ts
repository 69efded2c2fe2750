/**
 * The fit panel's edge: the rows a person typed or pasted (text in each cell) and the service range
 * from the material form, read into the numbers the `materials:fit-conductivity` channel takes.
 * Each refusal is one sentence naming the point and column, with the range from the same limits
 * table the service checks (app/api/material-limits.ts).
 */
import { MATERIAL_LIMITS, describeRange, isInRange } from '../../../app/api/material-limits.js';

export interface FitRow {
  /** Mean test temperature, °C, as typed. */
  temperature: string;
  /** Conductivity at that mean temperature, W/(m·K), as typed. */
  conductivity: string;
}

export type FitColumn = keyof FitRow;

/** Where a refusal belongs: the sentence, and the cell to mark when it names one. */
export interface FitProblem {
  readonly message: string;
  readonly row?: number;
  readonly column?: FitColumn;
}

export type PointsReading = { readonly ok: true; readonly points: [number, number][] } | ({ readonly ok: false } & FitProblem);

export type RangeReading = { readonly ok: true; readonly low: number; readonly high: number } | { readonly ok: false; readonly message: string };

/** The most rows the panel holds: the most points the service takes. */
export const MAX_FIT_ROWS = MATERIAL_LIMITS.maxTablePoints;

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/**
 * A typed number: a true minus sign and a decimal comma ("0,0348", as many data sheets print it)
 * are accepted; undefined when it is not a number.
 */
export function parseCell(raw: string): number | undefined {
  let cleaned = raw.trim().replace(/−/g, '-');
  if (/^[+-]?\d*,\d+$/.test(cleaned)) cleaned = cleaned.replace(',', '.');
  return NUMBER.test(cleaned) ? Number(cleaned) : undefined;
}

const COLUMN_NAMES: Readonly<Record<FitColumn, string>> = { temperature: 'mean temperature', conductivity: 'conductivity' };

export function isBlank(row: FitRow): boolean {
  return row.temperature.trim() === '' && row.conductivity.trim() === '';
}

/** Blank rows are left out (a table keeps a spare row or two); a half-filled or bad row is refused. */
export function readFitRows(rows: readonly FitRow[]): PointsReading {
  const points: [number, number][] = [];
  const ranges = { temperature: MATERIAL_LIMITS.temperature, conductivity: MATERIAL_LIMITS.conductivity } as const;
  for (const [index, row] of rows.entries()) {
    if (isBlank(row)) continue;
    const pair: number[] = [];
    for (const column of ['temperature', 'conductivity'] as const) {
      const value = parseCell(row[column]);
      if (value === undefined || !isInRange(value, ranges[column])) {
        return {
          ok: false, row: index, column,
          message: `Point ${index + 1} ${COLUMN_NAMES[column]} must be a number ${describeRange(ranges[column])}.`,
        };
      }
      pair.push(value);
    }
    points.push([pair[0]!, pair[1]!]);
  }
  if (points.length === 0) return { ok: false, message: 'Points must list at least one mean temperature with its conductivity.' };
  return { ok: true, points };
}

/** The material's service range, from the form's two boxes: the fitted curve must stay positive on it. */
export function readServiceRange(lowText: string, highText: string): RangeReading {
  if (lowText.trim() === '' || highText.trim() === '') {
    return { ok: false, message: 'Lowest and highest service temperature are both needed for a fit: the curve must stay above zero over that range.' };
  }
  const range = MATERIAL_LIMITS.temperature;
  const low = parseCell(lowText);
  if (low === undefined || !isInRange(low, range)) return { ok: false, message: `Lowest service temperature must be a number ${describeRange(range)}.` };
  const high = parseCell(highText);
  if (high === undefined || !isInRange(high, range)) return { ok: false, message: `Highest service temperature must be a number ${describeRange(range)}.` };
  if (low >= high) return { ok: false, message: `Highest service temperature must be above the lowest service temperature (${low} °C).` };
  return { ok: true, low, high };
}

/**
 * Lines copied from a spreadsheet or a PDF data sheet, as cells: tab- or semicolon-separated
 * columns (decimal commas allowed there), else columns separated by spaces, else by commas.
 * Lines with no number at all (headings, units) are left out. Undefined when the text is a single
 * value, which the cell then takes as typed.
 */
export function cellsFromPaste(text: string): string[][] | undefined {
  const lines = text.split(/\r?\n/).map((line) => line.trim()).filter((line) => line !== '');
  const table = lines
    .map((line) => {
      if (/[\t;]/.test(line)) return line.split(/\s*[\t;]\s*/);
      if (/\s/.test(line)) return line.split(/\s+/).map((cell) => cell.replace(/,$/, ''));
      return line.split(',');
    })
    .map((cells) => cells.map((cell) => cell.trim()).filter((cell) => cell !== ''))
    .filter((cells) => cells.some((cell) => parseCell(cell) !== undefined));
  if (table.length === 0) return undefined;
  if (table.length === 1 && table[0]!.length === 1) return undefined;
  return table;
}

/** Points written θ:λ in the form's table box, as rows to start from (empty when it holds none). */
export function rowsFromTableText(pointsText: string): FitRow[] {
  return pointsText
    .trim()
    .split(/\s+/)
    .filter(Boolean)
    .map((pair) => pair.split(':'))
    .filter((parts) => parts.length === 2)
    .map(([temperature, conductivity]) => ({ temperature: temperature!, conductivity: conductivity! }))
    .slice(0, MAX_FIT_ROWS);
}
