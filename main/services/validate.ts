import { describeRange, type NumberRange } from '../../app/api/material-limits.js';
import { InputError } from '../../app/index.js';

/**
 * Small checks used at the edge of every service operation, before any SQL runs. Each returns the
 * cleaned value or throws an InputError naming the field and the allowed range.
 */
export function isPlainObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value) && Object.getPrototypeOf(value) === Object.prototype;
}

export function requireObject(value: unknown, field: string): Record<string, unknown> {
  if (!isPlainObject(value)) throw new InputError(field, `${field} must be an object.`);
  return value;
}

export function requireId(value: unknown, field: string): number {
  if (typeof value !== 'number' || !Number.isSafeInteger(value) || value < 1) {
    throw new InputError(field, `${field} must be a whole number of 1 or more.`);
  }
  return value;
}

export function requireText(value: unknown, field: string, limits: { min?: number; max: number }): string {
  if (typeof value !== 'string') throw new InputError(field, `${field} must be text.`);
  const text = value.trim();
  const min = limits.min ?? 0;
  if (text.length < min || text.length > limits.max) {
    throw new InputError(field, min > 0 ? `${field} must be ${min} to ${limits.max} characters long.` : `${field} must be at most ${limits.max} characters long.`);
  }
  if (/[\u0000-\u0008\u000B\u000C\u000E-\u001F]/.test(text)) throw new InputError(field, `${field} must not contain control characters.`);
  return text;
}

export function optionalText(value: unknown, field: string, max: number): string {
  return value === undefined || value === null ? '' : requireText(value, field, { max });
}

export { describeRange, type NumberRange };

export function requireNumber(value: unknown, field: string, range: NumberRange): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new InputError(field, `${field} must be a number ${describeRange(range)}.`);
  }
  const tooLow = range.minExclusive ? value <= range.min : value < range.min;
  const tooHigh = range.maxExclusive ? value >= range.max : value > range.max;
  if (tooLow || tooHigh) throw new InputError(field, `${field} must be ${describeRange(range)} (got ${value}).`);
  return value;
}

export function optionalNumber(value: unknown, field: string, range: NumberRange): number | null {
  return value === undefined || value === null ? null : requireNumber(value, field, range);
}

export function requireOneOf<T extends string>(value: unknown, field: string, allowed: readonly T[]): T {
  if (typeof value !== 'string' || !(allowed as readonly string[]).includes(value)) {
    throw new InputError(field, `${field} must be one of ${allowed.join(', ')}.`);
  }
  return value as T;
}

/** Rejects keys the caller did not mean to send (a misspelt field would otherwise be dropped silently). */
export { rejectUnknownKeys } from '../../app/base/field-checks.js';
