/**
 * Reads a wall or roof case file (JSON, "kind": "wall", "schemaVersion": 1; schema in
 * data/schemas/wall-case.schema.json) into a WallInput. Materials are inline ({ "material": {…} })
 * or references to the material library ({ "materialId": n }) resolved by the caller; the monthly
 * climate is inline or the name of a shipped demo climate. Every problem is one InputError
 * sentence naming the field path and the allowed values.
 */
import { demoClimateByName, DEMO_CLIMATES } from '../assemblies/wall-demo-climates.js';
import type { MonthlyClimate } from '../assemblies/wall-climate.js';
import type { InsideHumiditySource, WallInput, WallLayer } from '../assemblies/wall-input.js';
import { validateWallInput } from '../assemblies/wall-validation.js';
import type { ConductivityModel } from '../fe/conductivity.js';
import { InputError } from '../fe/errors.js';
import { validateConductivity } from '../fe/validate.js';
import { MATERIAL_CATEGORIES, type MaterialCategory, type MaterialProperties } from '../materials/material-properties.js';

export const WALL_CASE_SCHEMA_VERSION = 1;

type Json = Record<string, unknown>;

function isObject(v: unknown): v is Json {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function shown(v: unknown): string {
  return typeof v === 'number' ? String(v) : (JSON.stringify(v) ?? String(v));
}

function onlyKeys(o: Json, field: string, allowed: readonly string[]): void {
  for (const key of Object.keys(o)) {
    if (!allowed.includes(key)) {
      const path = field ? `${field}.${key}` : key;
      throw new InputError(path, `${path} is not a known field here; allowed: ${allowed.join(', ')}.`);
    }
  }
}

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
function parseMaterial(value: unknown, field: string): MaterialProperties {
  if (!isObject(value)) throw new InputError(field, `${field} must be an object with at least a name and a conductivity in W/(m·K).`);
  onlyKeys(value, field, MATERIAL_KEYS);
  if (typeof value.name !== 'string' || value.name.trim() === '') throw new InputError(`${field}.name`, `${field}.name must be a non-empty text.`);
  const category = value.category ?? 'building';
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

function parseLayer(value: unknown, field: string, resolveMaterial: (id: number) => MaterialProperties | undefined): WallLayer {
  if (!isObject(value)) throw new InputError(field, `${field} must be an object: a material layer { material or materialId, thickness } or an air layer { kind: "air-layer", … }.`);
  if (value.kind === 'air-layer') {
    onlyKeys(value, field, ['kind', 'name', 'thickness', 'ventilation', 'openingArea', 'emissivities']);
    return value as unknown as WallLayer;
  }
  if (value.kind !== undefined && value.kind !== 'material') {
    throw new InputError(`${field}.kind`, `${field}.kind must be "material" or "air-layer" (got ${shown(value.kind)}).`);
  }
  onlyKeys(value, field, ['kind', 'name', 'material', 'materialId', 'thickness']);
  let material: MaterialProperties;
  if (value.material !== undefined && value.materialId !== undefined) {
    throw new InputError(field, `${field} must give either material or materialId, not both.`);
  } else if (value.materialId !== undefined) {
    const id = value.materialId;
    if (typeof id !== 'number' || !Number.isInteger(id) || id < 1) throw new InputError(`${field}.materialId`, `${field}.materialId must be a whole number of 1 or more (got ${shown(id)}).`);
    const found = resolveMaterial(id);
    if (!found) throw new InputError(`${field}.materialId`, `${field}.materialId ${id} is not in the material library.`);
    material = found;
  } else {
    material = parseMaterial(value.material, `${field}.material`);
  }
  return {
    kind: 'material',
    ...(typeof value.name === 'string' ? { name: value.name } : {}),
    material,
    thickness: value.thickness as number,
  };
}

function parseClimate(value: unknown): MonthlyClimate {
  if (typeof value === 'string') {
    const c = demoClimateByName(value);
    if (!c) throw new InputError('moisture.climate', `moisture.climate must be an inline climate or one of ${DEMO_CLIMATES.map((d) => `"${d.name}"`).join(', ')} (got ${shown(value)}).`);
    return c;
  }
  if (!isObject(value)) throw new InputError('moisture.climate', 'moisture.climate must be the name of a shipped climate or an object with a name, a label and 12 months.');
  onlyKeys(value, 'moisture.climate', ['name', 'label', 'title', 'source', 'units', 'months']);
  return {
    name: typeof value.name === 'string' ? value.name : 'inline climate',
    label: typeof value.label === 'string' ? value.label : 'given in the case file',
    months: value.months as MonthlyClimate['months'],
  };
}

function parseInsideHumidity(value: unknown): InsideHumiditySource {
  const field = 'moisture.insideHumidity';
  if (!isObject(value)) throw new InputError(field, `${field} must be { "kind": "measured" } or { "kind": "class", "humidityClass": 1 to 5 }.`);
  if (value.kind === 'measured') {
    onlyKeys(value, field, ['kind']);
    return { kind: 'measured' };
  }
  if (value.kind === 'class') {
    onlyKeys(value, field, ['kind', 'humidityClass', 'safetyFactor']);
    if (value.safetyFactor !== undefined && typeof value.safetyFactor !== 'boolean') {
      throw new InputError(`${field}.safetyFactor`, `${field}.safetyFactor must be true or false (got ${shown(value.safetyFactor)}).`);
    }
    return { kind: 'class', humidityClass: value.humidityClass as number, safetyFactor: value.safetyFactor === true };
  }
  throw new InputError(`${field}.kind`, `${field}.kind must be "measured" or "class" (got ${shown(value.kind)}).`);
}

export function parseWallCaseFile(json: unknown, resolveMaterial: (id: number) => MaterialProperties | undefined): WallInput {
  if (!isObject(json)) throw new InputError('case', 'The case file must hold one JSON object with "kind": "wall".');
  if (json.kind !== 'wall') throw new InputError('kind', `kind must be "wall" for a wall or roof case (got ${shown(json.kind)}).`);
  if (json.schemaVersion !== WALL_CASE_SCHEMA_VERSION) {
    throw new InputError('schemaVersion', `schemaVersion must be ${WALL_CASE_SCHEMA_VERSION} (got ${shown(json.schemaVersion)}).`);
  }
  onlyKeys(json, '', ['$schema', 'kind', 'schemaVersion', 'title', 'notes', 'layers', 'heatFlowDirection', 'inside', 'outside', 'surfaceResistances', 'area', 'moisture']);
  if (!Array.isArray(json.layers) || json.layers.length < 1 || json.layers.length > 100) {
    throw new InputError('layers', 'layers must list 1 to 100 layers, inside to outside.');
  }
  const layers = json.layers.map((l, i) => parseLayer(l, `layers[${i}]`, resolveMaterial));
  let moisture: WallInput['moisture'];
  if (json.moisture !== undefined) {
    if (!isObject(json.moisture)) throw new InputError('moisture', 'moisture must be an object with insideHumidity and/or climate.');
    onlyKeys(json.moisture, 'moisture', ['insideHumidity', 'climate']);
    moisture = {
      ...(json.moisture.insideHumidity !== undefined ? { insideHumidity: parseInsideHumidity(json.moisture.insideHumidity) } : {}),
      ...(json.moisture.climate !== undefined ? { climate: parseClimate(json.moisture.climate) } : {}),
    };
  }
  const input: WallInput = {
    ...(typeof json.title === 'string' ? { name: json.title } : {}),
    layers,
    heatFlowDirection: json.heatFlowDirection as WallInput['heatFlowDirection'],
    inside: json.inside as WallInput['inside'],
    outside: json.outside as WallInput['outside'],
    ...(json.surfaceResistances !== undefined ? { surfaceResistances: json.surfaceResistances as WallInput['surfaceResistances'] } : {}),
    ...(json.area !== undefined ? { area: json.area as number } : {}),
    ...(moisture ? { moisture } : {}),
  };
  validateWallInput(input);
  return input;
}
