/**
 * The field checks every edge of the engine uses. Each returns the checked value or throws one
 * InputError whose sentence names the field path and the allowed range, and repeats the offending
 * value only as shownValue cuts it.
 */
import { InputError } from './input-error.js';
import { describeRange, isInRange, type NumberRange } from './number-range.js';
import type { QuantityName } from './quantities.js';
import { enteredPart, rangePart, unitPart, type SentencePart } from './quantity-sentence.js';
import { shownValue } from './shown-value.js';

/** −273.15 °C: no temperature in °C may be at or below it. */
export const ABSOLUTE_ZERO_CELSIUS = -273.15;

export type JsonObject = Record<string, unknown>;

export function isObject(value: unknown): value is JsonObject {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/**
 * The value a refusal repeats: as the SI sentence always wrote it (a bare number), with its unit
 * once converted, so "(got 5)" of an SI file reads "(got 196.85 in)" in a US project.
 */
function given(value: number, quantity: QuantityName | undefined): SentencePart {
  return quantity === undefined ? String(value) : enteredPart(value, quantity, String(value));
}

/** "0 m/s" as the SI sentence writes it; the same bound converted ("0 mph") otherwise. */
function zero(unit: string, quantity: QuantityName | undefined): SentencePart {
  return quantity === undefined ? `0 ${unit}` : enteredPart(0, quantity, `0 ${unit}`);
}

/** The range's wording, kept as a part when its kind is known. */
function allowed(range: NumberRange): SentencePart {
  return range.quantity === undefined ? describeRange(range) : rangePart(range, range.quantity, describeRange(range));
}

/**
 * A finite number; returns it. `unit` names the unit the number is read in; `quantity`, where
 * given, is its kind, so a project in other units reads that unit instead.
 */
export function requireFinite(field: string, value: unknown, unit = '', quantity?: QuantityName): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    const inUnit: SentencePart[] = unit ? [' in ', quantity === undefined ? unit : unitPart(quantity, unit)] : [];
    throw new InputError(field, [`${field} must be a finite number`, ...inUnit, ` (got ${shownValue(value)}).`]);
  }
  return value;
}

/** A finite number > 0. */
export function requirePositive(field: string, value: unknown, unit: string, quantity?: QuantityName): number {
  const v = requireFinite(field, value, unit, quantity);
  if (!(v > 0)) throw new InputError(field, [`${field} must be greater than `, zero(unit, quantity), ' (got ', given(v, quantity), ').']);
  return v;
}

/** A finite number ≥ 0. */
export function requireNonNegative(field: string, value: unknown, unit: string, quantity?: QuantityName): number {
  const v = requireFinite(field, value, unit, quantity);
  if (!(v >= 0)) throw new InputError(field, [`${field} must be `, zero(unit, quantity), ' or more (got ', given(v, quantity), ').']);
  return v;
}

/** A finite number within `range`; the refusal states the range in a project's units where the range names its kind. */
export function requireNumberIn(field: string, value: unknown, range: NumberRange): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new InputError(field, [`${field} must be a number, `, allowed(range), ` (got ${shownValue(value)}).`]);
  }
  if (!isInRange(value, range)) throw new InputError(field, [`${field} must be `, allowed(range), ' (got ', given(value, range.quantity), ').']);
  return value;
}

/** `requireNumberIn`, or null when the value is absent (undefined or null). */
export function optionalNumberIn(field: string, value: unknown, range: NumberRange): number | null {
  return value === undefined || value === null ? null : requireNumberIn(field, value, range);
}

/** A whole number from min to max. */
export function requireWholeNumber(field: string, value: unknown, min: number, max: number): number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < min || value > max) {
    throw new InputError(field, `${field} must be a whole number from ${min} to ${max} (got ${shownValue(value)}).`);
  }
  return value;
}

export function requireObject(value: unknown, field: string): JsonObject {
  if (!isObject(value)) throw new InputError(field, `${field} must be an object.`);
  return value;
}

/** Refuses keys the format does not define, so a typo never silently drops an input. */
export function rejectUnknownKeys(value: JsonObject, allowed: readonly string[], field: string): void {
  for (const key of Object.keys(value)) {
    if (!allowed.includes(key)) {
      const shownKey = key.length > 60 ? `${key.slice(0, 59)}…` : key;
      const where = field ? `${field}.${shownKey}` : shownKey;
      throw new InputError(where, `${where} is not a known field here; allowed: ${allowed.join(', ')}.`);
    }
  }
}

export function requireArray(value: unknown, field: string, min: number, max: number): unknown[] {
  if (!Array.isArray(value) || value.length < min || value.length > max) {
    throw new InputError(field, `${field} must be a list of ${min} to ${max} entries.`);
  }
  return value;
}

export function requireString(value: unknown, field: string, maxLength = 200): string {
  if (typeof value !== 'string' || value.length > maxLength) {
    throw new InputError(field, `${field} must be text of at most ${maxLength} characters.`);
  }
  return value;
}

/** One of the listed options. */
export function requireOneOf<T extends string>(field: string, value: unknown, options: readonly T[]): T {
  if (typeof value !== 'string' || !(options as readonly string[]).includes(value)) {
    throw new InputError(field, `${field} must be one of ${options.map((o) => `'${o}'`).join(', ')} (got ${shownValue(value)}).`);
  }
  return value as T;
}
