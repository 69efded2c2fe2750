/**
 * Edge validation shared by the physics functions: each check throws one InputError whose
 * sentence names the field and the allowed range, so a bad value never turns into NaN later.
 */
import { InputError } from './errors.js';
import { KELVIN_OFFSET } from './constants.js';

import { shownValue as shown } from '../base/shown-value.js';

/** A finite number; returns it. */
export function requireFinite(field: string, value: unknown, unit = ''): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new InputError(field, `${field} must be a finite number${unit ? ` in ${unit}` : ''} (got ${shown(value)}).`);
  }
  return value;
}

/** A finite number > 0. */
export function requirePositive(field: string, value: unknown, unit: string): number {
  const v = requireFinite(field, value, unit);
  if (!(v > 0)) throw new InputError(field, `${field} must be greater than 0 ${unit} (got ${v}).`);
  return v;
}

/** A finite number ≥ 0. */
export function requireNonNegative(field: string, value: unknown, unit: string): number {
  const v = requireFinite(field, value, unit);
  if (!(v >= 0)) throw new InputError(field, `${field} must be 0 ${unit} or more (got ${v}).`);
  return v;
}

/** A finite number in [minimum, maximum]. */
export function requireInRange(field: string, value: unknown, minimum: number, maximum: number, unit = ''): number {
  const v = requireFinite(field, value, unit);
  if (v < minimum || v > maximum) {
    const u = unit ? ` ${unit}` : '';
    throw new InputError(field, `${field} must be between ${minimum}${u} and ${maximum}${u} (got ${v}).`);
  }
  return v;
}

/** A temperature in °C above absolute zero. */
export function requireCelsius(field: string, value: unknown): number {
  const v = requireFinite(field, value, '°C');
  if (!(v > -KELVIN_OFFSET)) {
    throw new InputError(field, `${field} must be above absolute zero (−273.15 °C) (got ${v} °C).`);
  }
  return v;
}

/** One of the listed string options. */
export function requireOneOf<T extends string>(field: string, value: unknown, options: readonly T[]): T {
  if (typeof value !== 'string' || !(options as readonly string[]).includes(value)) {
    throw new InputError(field, `${field} must be one of ${options.map((o) => `'${o}'`).join(', ')} (got ${shown(value)}).`);
  }
  return value as T;
}
