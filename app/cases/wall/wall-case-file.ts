/**
 * Reads a wall or roof case file (JSON, "kind": "wall", "schemaVersion": 1; schema in
 * data/schemas/wall-case.schema.json) into a WallInput. Materials are inline ({ "material": {…} })
 * or references to the material library ({ "materialId": n }) resolved by the caller; the monthly
 * climate is inline or the name of a shipped demo climate. Every problem is one InputError
 * sentence naming the field path and the allowed values.
 */
import { demoClimateByName, DEMO_CLIMATES } from './wall-demo-climates.js';
import type { MonthlyClimate } from '../../checks/monthly-climate.js';
import type { InsideHumiditySource, WallInput, WallLayer } from './wall-input.js';
import { validateWallInput } from './wall-validation.js';
import { InputError } from '../../fe/errors.js';
import type { MaterialProperties } from '../../materials/material-properties.js';
import { resolveCaseMaterial } from '../case-material.js';
import { isObject, rejectUnknownKeys, requireString, shown, type JsonObject } from '../case-fields.js';

export const WALL_CASE_SCHEMA_VERSION = 1;

type Json = JsonObject;

const onlyKeys = (o: Json, field: string, allowed: readonly string[]) => rejectUnknownKeys(o, allowed, field);

/** Text when present: a title, a name or notes that are not text are refused, never dropped. */
function optionalText(value: unknown, field: string, maxLength?: number): string | undefined {
  return value === undefined ? undefined : requireString(value, field, maxLength);
}

const AIR_KEYS = ['temperature', 'relativeHumidity'] as const;

/** The keys of an inside or outside air condition; its values are checked by validateWallInput. */
function checkAirKeys(value: unknown, field: string): void {
  if (isObject(value)) onlyKeys(value, field, AIR_KEYS);
}

function parseLayer(value: unknown, field: string, resolveMaterial: (id: number) => MaterialProperties | undefined): WallLayer {
  if (!isObject(value)) throw new InputError(field, `${field} must be an object: a material layer { material or materialId, thickness } or an air layer { kind: "air-layer", … }.`);
  if (value.kind === 'air-layer') {
    onlyKeys(value, field, ['kind', 'name', 'thickness', 'ventilation', 'openingArea', 'emissivities']);
    optionalText(value.name, `${field}.name`);
    return value as unknown as WallLayer;
  }
  if (value.kind !== undefined && value.kind !== 'material') {
    throw new InputError(`${field}.kind`, `${field}.kind must be "material" or "air-layer" (got ${shown(value.kind)}).`);
  }
  onlyKeys(value, field, ['kind', 'name', 'material', 'materialId', 'thickness']);
  const name = optionalText(value.name, `${field}.name`);
  const material = resolveCaseMaterial(value, field, resolveMaterial, 'building');
  return {
    kind: 'material',
    ...(name !== undefined ? { name } : {}),
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
  const name = optionalText(value.name, 'moisture.climate.name');
  const label = optionalText(value.label, 'moisture.climate.label');
  optionalText(value.title, 'moisture.climate.title');
  optionalText(value.source, 'moisture.climate.source', 1000);
  if (value.units !== undefined && !isObject(value.units)) {
    throw new InputError('moisture.climate.units', 'moisture.climate.units must be an object naming the unit of each column, or left out.');
  }
  if (Array.isArray(value.months)) value.months.forEach((m, i) => checkMonthKeys(m, `moisture.climate.months[${i}]`));
  return {
    name: name ?? 'inline climate',
    label: label ?? 'given in the case file',
    months: value.months as MonthlyClimate['months'],
  };
}

/** The keys of a climate month and its two air conditions, and its name as text; its numbers are checked by validateClimate. */
function checkMonthKeys(value: unknown, field: string): void {
  if (!isObject(value)) throw new InputError(field, `${field} must be an object: { month, days, outside, inside }.`);
  onlyKeys(value, field, ['month', 'days', 'outside', 'inside']);
  requireString(value.month, `${field}.month`, 40);
  checkAirKeys(value.outside, `${field}.outside`);
  checkAirKeys(value.inside, `${field}.inside`);
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
  const title = optionalText(json.title, 'title');
  optionalText(json.notes, 'notes', 5000);
  checkAirKeys(json.inside, 'inside');
  checkAirKeys(json.outside, 'outside');
  if (isObject(json.surfaceResistances)) onlyKeys(json.surfaceResistances, 'surfaceResistances', ['inside', 'outside']);
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
    ...(title !== undefined ? { name: title } : {}),
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
