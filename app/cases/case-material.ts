/**
 * Materials in case files: inline ({ "material": {…} }) or a library reference ({ "materialId": n })
 * resolved by the caller. One parser for every case kind, so an inline material means the same in
 * a pipe, a flat surface and a wall. Inline conductivity is a number (W/(m·K)) or a conductivity
 * model; μ is a number or "vapour-tight" (JSON has no Infinity); missing optional fields are null.
 */
import type { ConductivityModel } from '../fe/conductivity.js';
import { InputError } from '../fe/errors.js';
import { validateConductivity } from '../fe/validate.js';
import { MATERIAL_CATEGORIES, type MaterialCategory, type MaterialProperties } from '../materials/material-properties.js';
import { isObject, rejectUnknownKeys, shown, type JsonObject } from './case-fields.js';

export type MaterialResolver = (id: number) => MaterialProperties | undefined;

type Json = JsonObject;

const onlyKeys = (o: Json, field: string, allowed: readonly string[]) => rejectUnknownKeys(o, allowed, field);

function optionalNumber(o: Json, key: string, field: string, unit: string): number | null {
  const v = o[key];
  if (v === undefined || v === null) return null;
  if (typeof v !== 'number' || !Number.isFinite(v)) throw new InputError(`${field}.${key}`, `${field}.${key} must be a number in ${unit} or null (got ${shown(v)}).`);
  return v;
}

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
  if (typeof value.name !== 'string' || value.name.trim() === '') throw new InputError(`${field}.name`, `${field}.name must be a non-empty text.`);
  const category = value.category ?? defaultCategory;
  if (!(MATERIAL_CATEGORIES as readonly unknown[]).includes(category)) {
    throw new InputError(`${field}.category`, `${field}.category must be one of ${MATERIAL_CATEGORIES.join(', ')} (got ${shown(category)}).`);
  }
  const c = value.conductivity;
  const conductivity: ConductivityModel = typeof c === 'number' ? { kind: 'constant', value: c } : (c as ConductivityModel);
  validateConductivity(conductivity, `${field}.conductivity`);
  let mu: number | null;
  if (value.vapourResistanceFactor === 'vapour-tight') mu = Number.POSITIVE_INFINITY;
  else {
    mu = optionalNumber(value, 'vapourResistanceFactor', field, 'dimensionless (or "vapour-tight")');
    if (mu !== null && !(mu > 0)) throw new InputError(`${field}.vapourResistanceFactor`, `${field}.vapourResistanceFactor must be greater than 0 (1 for still air) or "vapour-tight" (got ${mu}).`);
  }
  const sd = optionalNumber(value, 'equivalentAirLayerThickness', field, 'm');
  if (sd !== null && !(sd > 0)) throw new InputError(`${field}.equivalentAirLayerThickness`, `${field}.equivalentAirLayerThickness must be greater than 0 m (got ${sd}).`);
  const emissivity = optionalNumber(value, 'emissivity', field, 'fraction 0..1');
  if (emissivity !== null && (emissivity < 0 || emissivity > 1)) throw new InputError(`${field}.emissivity`, `${field}.emissivity must be from 0 to 1 (got ${emissivity}).`);
  return {
    name: value.name,
    category: category as MaterialCategory,
    conductivity,
    density: optionalNumber(value, 'density', field, 'kg/m³'),
    specificHeat: optionalNumber(value, 'specificHeat', field, 'J/(kg·K)'),
    vapourResistanceFactor: mu,
    equivalentAirLayerThickness: sd,
    emissivity,
    minServiceTemperature: optionalNumber(value, 'minServiceTemperature', field, '°C'),
    maxServiceTemperature: optionalNumber(value, 'maxServiceTemperature', field, '°C'),
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
  if (typeof id !== 'number' || !Number.isInteger(id) || id < 1) {
    throw new InputError(`${field}.materialId`, `${field}.materialId must be a whole number of 1 or more (got ${shown(id)}).`);
  }
  const material = resolve(id);
  if (material === undefined) {
    throw new InputError(`${field}.materialId`, `${field}.materialId ${id} names no material in the library; choose an existing material or give it inline.`);
  }
  return material;
}
