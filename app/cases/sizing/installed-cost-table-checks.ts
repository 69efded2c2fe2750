/**
 * What an installed-cost table may hold, and the check of one given inline in a case file
 * (sizing.economics.costTable as an object). The CSV reader (installed-cost-table.ts) applies the
 * same ranges to the rows of data/sizing/installed-costs.csv, in that file's millimetres.
 * Ranges are common practice, no source: wide enough for any real pipe and product, narrow enough
 * that a unit slip (inches typed as millimetres, a cost in cents) is caught at the edge.
 */
import { isObject, rejectUnknownKeys, requireArray, requireNumberIn, requireOneOf } from '../../base/field-checks.js';
import { InputError } from '../../base/input-error.js';
import type { NumberRange } from '../../base/number-range.js';
import { shownValue } from '../../base/shown-value.js';
import type { InstalledCostTable } from './sizing-model.js';

export const COST_BASES = ['per-metre', 'per-square-metre'] as const;

export const COST_TABLE_RANGES = {
  /** The pipe outer diameter a per-metre row is priced for: up to the largest pipe the engine takes (5 m). */
  outerDiameter: { min: 0, minExclusive: true, max: 5, unit: 'm', quantity: 'diameter' },
  /** The insulation thickness of a row, as an insulation layer may be. */
  thickness: { min: 0, minExclusive: true, max: 2, unit: 'm', quantity: 'thickness' },
  /** Installed cost per metre or per m², in the currency unit. */
  cost: { min: 0, max: 1e7, unit: '', quantity: 'money' },
} as const satisfies Record<string, NumberRange>;

/** Rows one table may have: a few hundred is a big price list; the limit keeps a pasted file bounded. */
export const MAX_COST_POINTS = 5000;
export const MAX_COST_NAME_LENGTH = 200;
export const MAX_COST_SOURCE_LENGTH = 300;

/** Text of 1 to `maxLength` characters that is not only spaces. */
export function requireNamingText(field: string, value: unknown, maxLength: number): string {
  if (typeof value !== 'string' || value.trim() === '' || value.length > maxLength) {
    throw new InputError(field, `${field} must be text of 1 to ${maxLength} characters (got ${shownValue(value)}).`);
  }
  return value;
}

/** A table given inline: every point checked, the same outer diameter and thickness never twice. */
export function validateInstalledCostTable(value: unknown, field: string): InstalledCostTable {
  if (!isObject(value)) throw new InputError(field, `${field} must be an installed-cost table { name, basis, points, source } or the name of one.`);
  rejectUnknownKeys(value, ['name', 'basis', 'points', 'source'], field);
  const name = requireNamingText(`${field}.name`, value['name'], MAX_COST_NAME_LENGTH);
  const basis = requireOneOf(`${field}.basis`, value['basis'], COST_BASES);
  const list = requireArray(value['points'], `${field}.points`, 1, MAX_COST_POINTS);
  const seen = new Map<string, number>();
  const points = list.map((point, k): [number, number, number] => {
    const at = `${field}.points[${k}]`;
    if (!Array.isArray(point) || point.length !== 3) {
      throw new InputError(at, `${at} must be a list of 3 numbers: [pipe outer diameter in m (0 for a per-square-metre table), thickness in m, cost].`);
    }
    const diameter = basis === 'per-metre' ? requireNumberIn(`${at}[0]`, point[0], COST_TABLE_RANGES.outerDiameter) : requireFlatDiameter(`${at}[0]`, point[0]);
    const thickness = requireNumberIn(`${at}[1]`, point[1], COST_TABLE_RANGES.thickness);
    const cost = requireNumberIn(`${at}[2]`, point[2], COST_TABLE_RANGES.cost);
    const key = `${diameter} ${thickness}`;
    const first = seen.get(key);
    if (first !== undefined) throw new InputError(at, `${at} repeats the outer diameter and thickness of ${field}.points[${first}].`);
    seen.set(key, k);
    return [diameter, thickness, cost];
  });
  const source = requireNamingText(`${field}.source`, value['source'], MAX_COST_SOURCE_LENGTH);
  return { name, basis, points, source };
}

/** A per-square-metre table has no diameter: its rows carry 0 there, as the model states. */
function requireFlatDiameter(field: string, value: unknown): number {
  if (value !== 0) throw new InputError(field, `${field} must be 0 in a per-square-metre table, which has no pipe diameter (got ${shownValue(value)}).`);
  return 0;
}
