/**
 * Defaults of the run a quick per-metre (or per-m²) check need not state: a run of 1 m and
 * continuous operation (8760 h a year). Each default applied is reported as an assumption.
 */
import { SI_TEXT, type QuantityText } from '../../base/quantity-text.js';
import { isObject, type JsonObject } from '../case-fields.js';
import { withFields } from '../with-fields.js';

export const DEFAULT_RUN_LENGTH = 1;
export const DEFAULT_OPERATING_HOURS = 8760;

/** `text` writes the default run length of the assumption in the project's units. */
export function withOperationDefaults(json: unknown, defaults: { readonly length: boolean }, text: QuantityText = SI_TEXT): { json: unknown; assumptions: string[] } {
  if (!isObject(json)) return { json, assumptions: [] };
  const added: JsonObject = {};
  const assumptions: string[] = [];
  if (defaults.length && json['length'] === undefined) {
    added['length'] = DEFAULT_RUN_LENGTH;
    assumptions.push(`run length not given: figures for the run are for ${text.given(DEFAULT_RUN_LENGTH, 'length')}`);
  }
  if (json['operatingHours'] === undefined) {
    added['operatingHours'] = DEFAULT_OPERATING_HOURS;
    assumptions.push(`operating hours not given: ${DEFAULT_OPERATING_HOURS} h a year (continuous operation) for the annual energy`);
  }
  return { json: withFields(json, added), assumptions };
}
