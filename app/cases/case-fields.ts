/**
 * Structural checks the case-file parsers share: those of app/base, plus the schema version every
 * case file carries. Each failure is an InputError whose sentence names the field path.
 */
import { InputError } from '../base/input-error.js';
import { shownValue } from '../base/shown-value.js';
import type { JsonObject } from '../base/field-checks.js';

export { isObject, rejectUnknownKeys, requireArray, requireObject, requireString, type JsonObject } from '../base/field-checks.js';
/** A value as it reads in an error message, cut to a readable length. */
export { shownValue as shown } from '../base/shown-value.js';

export function requireSchemaVersion(value: JsonObject, expected: number): void {
  if (value['schemaVersion'] !== expected) {
    throw new InputError('schemaVersion', `schemaVersion must be ${expected}; got ${shownValue(value['schemaVersion'])}.`);
  }
}
