/**
 * The installed cost of one thickness from a table: linear in thickness along each diameter the
 * table prices, then linear in outer diameter between the two diameters either side (bilinear on
 * a full grid). Each diameter's row may cover its own thicknesses (small pipes are rarely sold
 * in the thickest sections); a cost is given wherever both rows either side cover the thickness.
 *
 * It never extrapolates: a price list says nothing about a product outside it, and a straight line
 * beyond the last row would price the thickest options, which the economic thickness is most
 * sensitive to, on a guess. Outside the table it refuses in one sentence naming the thickness or
 * diameter and the range the table covers.
 */
import { InputError } from '../../base/input-error.js';
import { enteredPart, type SentencePart } from '../../base/quantity-sentence.js';
import { shownValue } from '../../base/shown-value.js';
import type { InstalledCostTable } from './sizing-model.js';

/**
 * A thickness a range series makes (from + k·step) lands a few ulps beside the table's last row;
 * within this part of the value it counts as on the row, not outside the table.
 */
const ROUND_OFF = 1e-9;

const DEFAULT_FIELD = 'sizing.economics.costTable';

interface DiameterRow {
  readonly diameter: number;
  /** [thickness, cost], by thickness rising. */
  readonly points: readonly (readonly [number, number])[];
}

/** The table's rows by diameter rising (one row, diameter 0, for a per-square-metre table). */
function diameterRows(table: InstalledCostTable): DiameterRow[] {
  const byDiameter = new Map<number, [number, number][]>();
  for (const [diameter, thickness, cost] of table.points) {
    const row = byDiameter.get(diameter) ?? [];
    row.push([thickness, cost]);
    byDiameter.set(diameter, row);
  }
  return [...byDiameter.entries()].sort(([a], [b]) => a - b).map(([diameter, points]) => ({ diameter, points: points.sort(([a], [b]) => a - b) }));
}

/** `value` moved onto [low, high] when it is only round-off outside; null when truly outside. */
function within(value: number, low: number, high: number): number | null {
  const slack = ROUND_OFF * Math.max(Math.abs(low), Math.abs(high));
  if (value < low - slack || value > high + slack) return null;
  return Math.min(Math.max(value, low), high);
}

/**
 * Significant figures of a thickness or diameter in the SI sentence, as a field hint writes a value
 * (quantity-text's entered form): a range series' from + k·step (0.32389999999999997) reads 0.3239 m.
 */
const SENTENCE_DIGITS = 6;

const metres = (value: number, quantity: 'thickness' | 'diameter'): SentencePart =>
  enteredPart(value, quantity, `${shownValue(Number(value.toPrecision(SENTENCE_DIGITS)))} m`);

/** Linear between the two points either side of `x`, exact at a point. Assumes x within the row. */
function linear(points: readonly (readonly [number, number])[], x: number): number {
  let k = 0;
  while (k < points.length - 2 && x > points[k + 1]![0]) k++;
  const [x0, y0] = points[k]!;
  if (points.length === 1 || x === x0) return y0;
  const [x1, y1] = points[k + 1]!;
  return y0 + ((y1 - y0) * (x - x0)) / (x1 - x0);
}

function costAlongRow(table: InstalledCostTable, row: DiameterRow, thickness: number, field: string): number {
  const low = row.points[0]![0];
  const high = row.points[row.points.length - 1]![0];
  const t = within(thickness, low, high);
  if (t === null) {
    const atDiameter: SentencePart[] = table.basis === 'per-metre' ? [' at an outer diameter of ', metres(row.diameter, 'diameter')] : [];
    throw new InputError(field, [
      `${field} '${table.name}' covers thicknesses from `,
      metres(low, 'thickness'),
      ' to ',
      metres(high, 'thickness'),
      ...atDiameter,
      ', so it gives no cost for ',
      metres(thickness, 'thickness'),
      ' (it does not extrapolate).',
    ]);
  }
  return linear(row.points, t);
}

/**
 * Installed cost per metre of pipe (outer diameter in m) or per m² (diameter ignored: pass null),
 * for an insulation thickness in m. `field` names the table in a refusal.
 */
export function installedCost(table: InstalledCostTable, outerDiameter: number | null, thickness: number, field = DEFAULT_FIELD): number {
  const rows = diameterRows(table);
  if (rows.length === 0) throw new InputError(field, `${field} '${table.name}' has no points.`);
  if (table.basis === 'per-square-metre') return costAlongRow(table, rows[0]!, thickness, field);
  if (outerDiameter === null) {
    throw new InputError(field, `${field} '${table.name}' prices per metre of pipe by outer diameter; a flat surface needs a per-square-metre table.`);
  }
  const low = rows[0]!.diameter;
  const high = rows[rows.length - 1]!.diameter;
  const d = within(outerDiameter, low, high);
  if (d === null) {
    throw new InputError(field, [
      `${field} '${table.name}' covers pipe outer diameters from `,
      metres(low, 'diameter'),
      ' to ',
      metres(high, 'diameter'),
      ', so it gives no cost for ',
      metres(outerDiameter, 'diameter'),
      ' (it does not extrapolate).',
    ]);
  }
  let k = 0;
  while (k < rows.length - 2 && d > rows[k + 1]!.diameter) k++;
  const below = rows[k]!;
  if (rows.length === 1 || d === below.diameter) return costAlongRow(table, below, thickness, field);
  const above = rows[k + 1]!;
  if (d === above.diameter) return costAlongRow(table, above, thickness, field);
  const c0 = costAlongRow(table, below, thickness, field);
  const c1 = costAlongRow(table, above, thickness, field);
  return c0 + ((c1 - c0) * (d - below.diameter)) / (above.diameter - below.diameter);
}

/** The table of that name; the refusal lists the names there are. */
export function findCostTable(tables: readonly InstalledCostTable[], name: string, field = DEFAULT_FIELD): InstalledCostTable {
  const table = tables.find((t) => t.name === name);
  if (table !== undefined) return table;
  const names = tables.length === 0 ? 'there are none' : `the tables are ${tables.map((t) => `'${t.name}'`).join(', ')}`;
  throw new InputError(field, `${field} names no installed-cost table; ${names} (got ${shownValue(name)}).`);
}

/** A pipe is priced per metre and a flat surface per m²; the other basis is refused. */
export function requireCostBasis(table: InstalledCostTable, basis: InstalledCostTable['basis'], field = DEFAULT_FIELD): InstalledCostTable {
  if (table.basis === basis) return table;
  const wanted = basis === 'per-metre' ? 'a pipe needs a per-metre table' : 'a flat surface needs a per-square-metre table';
  throw new InputError(field, `${field} '${table.name}' is a ${table.basis} table; ${wanted}.`);
}
