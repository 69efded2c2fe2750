/**
 * Materials in case files: inline ({ "material": {…} }) or a library reference ({ "materialId": n })
 * resolved by the caller. One parser for every case kind, so an inline material means the same in
 * a pipe, a flat surface and a wall. Inline conductivity is a number (W/(m·K)) or a conductivity
 * model; μ is a number or "vapour-tight" (JSON has no Infinity); missing optional fields are null.
 */
import { MATERIAL_LIMITS } from '../materials/material-limits.js';
import { optionalNumberIn } from '../base/field-checks.js';
import { InputError } from '../base/input-error.js';
import { enteredPart } from '../base/quantity-sentence.js';
import type { NumberRange } from '../base/number-range.js';
import { validateConductivityModel } from '../materials/conductivity-checks.js';
import { MATERIAL_CATEGORIES, type MaterialCategory, type MaterialProperties } from '../materials/material-properties.js';
import { isObject, rejectUnknownKeys, requireString, shown, type JsonObject } from './case-fields.js';

export type MaterialResolver = (id: number) => MaterialProperties | undefined;

type Json = JsonObject;

const onlyKeys = (o: Json, field: string, allowed: readonly string[]) => rejectUnknownKeys(o, allowed, field);

/** An optional number of the material in its documented range (the library's own limits). */
function optionalNumber(o: Json, key: string, field: string, range: NumberRange): number | null {
  return optionalNumberIn(`${field}.${key}`, o[key], range);
}

const MU_RANGE: NumberRange = { ...MATERIAL_LIMITS.vapourResistanceFactor, unit: '(dimensionless; 1 for still air) or "vapour-tight"' };
/** s_d of a membrane; 0 is no layer at all. */
const SD_RANGE: NumberRange = { ...MATERIAL_LIMITS.equivalentAirLayerThickness, minExclusive: true };
/** 0 is allowed here (a perfect reflector as a limit case); the library keeps its own. */
const EMISSIVITY_RANGE: NumberRange = { min: 0, max: 1, unit: '' };

const MATERIAL_KEYS = [
  'name',
  'category',
  'conductivity',
  'density',
  'specificHeat',
  'vapourResistanceFactor',
  'equivalentAirLayerThickness',
  'emissivity',
  'minServiceTemperature',
  'maxServiceTemperature',
  'source',
] as const;

/** An inline material: conductivity as a number (W/(m·K)) or a conductivity model; μ a number or "vapour-tight". */
export function parseInlineMaterial(value: unknown, field: string, defaultCategory: MaterialCategory): MaterialProperties {
  if (!isObject(value)) throw new InputError(field, `${field} must be an object with at least a name and a conductivity in W/(m·K).`);
  onlyKeys(value, field, MATERIAL_KEYS);
  if (typeof value.name !== 'string' || value.name.trim() === '' || value.name.length > MATERIAL_LIMITS.name) {
    throw new InputError(`${field}.name`, `${field}.name must be a text of 1 to ${MATERIAL_LIMITS.name} characters.`);
  }
  if (value.source !== undefined) requireString(value.source, `${field}.source`, MATERIAL_LIMITS.source);
  const category = value.category ?? defaultCategory;
  if (!(MATERIAL_CATEGORIES as readonly unknown[]).includes(category)) {
    throw new InputError(`${field}.category`, `${field}.category must be one of ${MATERIAL_CATEGORIES.join(', ')} (got ${shown(category)}).`);
  }
  const c = value.conductivity;
  const conductivity = validateConductivityModel(typeof c === 'number' ? { kind: 'constant', value: c } : c, `${field}.conductivity`);
  const mu = value.vapourResistanceFactor === 'vapour-tight' ? Number.POSITIVE_INFINITY : optionalNumber(value, 'vapourResistanceFactor', field, MU_RANGE);
  const low = optionalNumber(value, 'minServiceTemperature', field, MATERIAL_LIMITS.temperature);
  const high = optionalNumber(value, 'maxServiceTemperature', field, MATERIAL_LIMITS.temperature);
  if (low !== null && high !== null && !(low < high)) {
    throw new InputError(`${field}.maxServiceTemperature`, [`${field}.maxServiceTemperature must be above ${field}.minServiceTemperature (`, enteredPart(low, 'temperature', `${low} °C`), ') (got ', enteredPart(high, 'temperature', String(high)), ').']);
  }
  return {
    name: value.name,
    category: category as MaterialCategory,
    conductivity,
    density: optionalNumber(value, 'density', field, MATERIAL_LIMITS.density),
    specificHeat: optionalNumber(value, 'specificHeat', field, MATERIAL_LIMITS.specificHeat),
    vapourResistanceFactor: mu,
    equivalentAirLayerThickness: optionalNumber(value, 'equivalentAirLayerThickness', field, SD_RANGE),
    emissivity: optionalNumber(value, 'emissivity', field, EMISSIVITY_RANGE),
    minServiceTemperature: low,
    maxServiceTemperature: high,
    ...(typeof value.source === 'string' ? { source: value.source } : {}),
  };
}


/**
 * The material of an entry holding either "material" (inline) or "materialId" (library id).
 * `field` is the entry's path, e.g. "layers[0]"; errors name `${field}.material` or `${field}.materialId`.
 */
export function resolveCaseMaterial(entry: JsonObject, field: string, resolve: MaterialResolver, defaultCategory: MaterialCategory): MaterialProperties {
  const hasInline = entry['material'] !== undefined;
  const hasId = entry['materialId'] !== undefined;
  if (hasInline === hasId) {
    throw new InputError(`${field}.material`, `${field} must give either "material" (inline) or "materialId" (library id), not ${hasInline ? 'both' : 'neither'}.`);
  }
  if (hasInline) return parseInlineMaterial(entry['material'], `${field}.material`, defaultCategory);
  const id = entry['materialId'];
  // A safe integer: beyond 2^53 − 1 a number no longer names one id (the library would refuse it without the field).
  if (typeof id !== 'number' || !Number.isSafeInteger(id) || id < 1) {
    throw new InputError(`${field}.materialId`, `${field}.materialId must be a whole number from 1 to ${Number.MAX_SAFE_INTEGER} (got ${shown(id)}).`);
  }
  const material = resolve(id);
  if (material === undefined) {
    throw new InputError(`${field}.materialId`, `${field}.materialId ${id} names no material in the library; choose an existing material or give it inline.`);
  }
  return material;
}
