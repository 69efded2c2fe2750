/**
 * Edge validation shared by the physics functions: each check throws one InputError whose
 * sentence names the field and the allowed range, so a bad value never turns into NaN later.
 * The plain number checks are the engine's one set in app/base; the physics adds ranges and °C.
 * A check told the quantity kind keeps its figures as parts, so the refusal reads in a project's
 * units (app/base/quantity-sentence); the physics itself works in SI only.
 */
import { InputError } from './errors.js';
import { ABSOLUTE_ZERO_CELSIUS, requireFinite } from '../base/field-checks.js';
import type { QuantityName } from '../base/quantities.js';
import { enteredPart, type SentencePart } from '../base/quantity-sentence.js';

export { requireFinite, requireNonNegative, requireOneOf, requirePositive } from '../base/field-checks.js';

/** A finite number in [minimum, maximum]; `quantity` is the kind of `unit`, where it has one a project may convert. */
export function requireInRange(field: string, value: unknown, minimum: number, maximum: number, unit = '', quantity?: QuantityName): number {
  const v = requireFinite(field, value, unit, quantity);
  if (v < minimum || v > maximum) {
    const u = unit ? ` ${unit}` : '';
    const figure = (x: number, si: string): SentencePart => (quantity === undefined ? si : enteredPart(x, quantity, si));
    throw new InputError(field, [`${field} must be between `, figure(minimum, `${minimum}${u}`), ' and ', figure(maximum, `${maximum}${u}`), ' (got ', figure(v, String(v)), ').']);
  }
  return v;
}

/** A temperature in °C above absolute zero. */
export function requireCelsius(field: string, value: unknown): number {
  const v = requireFinite(field, value, '°C', 'temperature');
  if (!(v > ABSOLUTE_ZERO_CELSIUS)) {
    throw new InputError(field, [`${field} must be above absolute zero (`, enteredPart(ABSOLUTE_ZERO_CELSIUS, 'temperature', '−273.15 °C'), ') (got ', enteredPart(v, 'temperature', `${v} °C`), ').']);
  }
  return v;
}
