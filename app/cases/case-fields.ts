/**
 * Small structural checks shared by the case-file parsers: each failure is an InputError whose
 * message is one sentence naming the field path.
 */
import { InputError } from '../fe/errors.js';

export type JsonObject = Record<string, unknown>;

export function isObject(value: unknown): value is JsonObject {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

export function requireObject(value: unknown, field: string): JsonObject {
  if (!isObject(value)) throw new InputError(field, `${field} must be an object.`);
  return value;
}

/** Refuses keys the format does not define, so a typo never silently drops an input. */
export function rejectUnknownKeys(value: JsonObject, allowed: readonly string[], field: string): void {
  for (const key of Object.keys(value)) {
    if (!allowed.includes(key)) {
      const where = field ? `${field}.${key}` : key;
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

/** A value as it reads in an error message. */
export function shown(value: unknown): string {
  return typeof value === 'number' ? String(value) : (JSON.stringify(value) ?? String(value));
}

export function requireString(value: unknown, field: string, maxLength = 200): string {
  if (typeof value !== 'string' || value.length > maxLength) {
    throw new InputError(field, `${field} must be text of at most ${maxLength} characters.`);
  }
  return value;
}

export function requireSchemaVersion(value: JsonObject, expected: number): void {
  if (value['schemaVersion'] !== expected) {
    throw new InputError('schemaVersion', `schemaVersion must be ${expected}; got ${JSON.stringify(value['schemaVersion'])}.`);
  }
}
