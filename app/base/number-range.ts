/**
 * A closed or half-open range of allowed values with its unit, and the one wording every range
 * message uses ("at least 0.001 and at most 1000 W/(m·K)"). Ranges are data: the same object
 * checks a case file, a stored material and a form field, and documents the JSON Schemas.
 * `quantity` names the kind of number, so a refusal can state the range in a project's units.
 */
import type { QuantityName } from './quantities.js';

export interface NumberRange {
  readonly min: number;
  readonly max: number;
  /** When true the bound itself is not allowed. */
  readonly minExclusive?: boolean;
  readonly maxExclusive?: boolean;
  readonly unit: string;
  /** The kind the bounds are of (app/base/quantities), where they have a unit a project may convert. */
  readonly quantity?: QuantityName;
}

/** "at least 1 and at most 1000 W/(m·K)". */
export function describeRange(range: NumberRange): string {
  const low = `${range.minExclusive ? 'more than' : 'at least'} ${range.min}`;
  const high = `${range.maxExclusive ? 'less than' : 'at most'} ${range.max}`;
  return `${low} and ${high}${range.unit ? ' ' + range.unit : ''}`;
}

export function isInRange(value: number, range: NumberRange): boolean {
  if (!Number.isFinite(value)) return false;
  const tooLow = range.minExclusive ? value <= range.min : value < range.min;
  const tooHigh = range.maxExclusive ? value >= range.max : value > range.max;
  return !tooLow && !tooHigh;
}
