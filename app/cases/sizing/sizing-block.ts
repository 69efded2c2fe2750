/**
 * A case file's "sizing" block, taken apart from the rest before the kind parses the case: the
 * calculation's fields are parsed as ever (unknown keys refused), the block by the sizing options.
 */
import { isObject } from '../../base/field-checks.js';

export function splitSizingBlock(json: unknown): { readonly json: unknown; readonly sizing: unknown } {
  if (!isObject(json) || json['sizing'] === undefined) return { json, sizing: undefined };
  const { sizing, ...rest } = json;
  return { json: rest, sizing };
}
