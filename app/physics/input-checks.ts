/**
 * Edge validation shared by the physics functions: each check throws one InputError whose
 * sentence names the field and the allowed range, so a bad value never turns into NaN later.
 * The plain number checks are the engine's one set in app/base; the physics adds ranges and °C.
 */
import { InputError } from './errors.js';
import { ABSOLUTE_ZERO_CELSIUS, requireFinite } from '../base/field-checks.js';

export { requireFinite, requireNonNegative, requireOneOf, requirePositive } from '../base/field-checks.js';

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
  if (!(v > ABSOLUTE_ZERO_CELSIUS)) {
    throw new InputError(field, `${field} must be above absolute zero (−273.15 °C) (got ${v} °C).`);
  }
  return v;
}
