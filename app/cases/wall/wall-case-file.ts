/**
 * Reads a wall or roof case file (JSON, "kind": "wall", "schemaVersion": 1; schema in
 * data/schemas/wall-case.schema.json) into a WallInput. Materials are inline ({ "material": {…} })
 * or references to the material library ({ "materialId": n }) resolved by the caller; the monthly
 * climate is inline or the name of a shipped demo climate. Every problem is one InputError
 * sentence naming the field path and the allowed values.
 */
import { demoClimateByName, DEMO_CLIMATES } from './wall-demo-climates.js';
import type { MonthlyClimate } from '../../checks/monthly-climate.js';
import { isAirLayer, type AirGapLevel, type InsideHumiditySource, type WallBridge, type WallFasteners, type WallInput, type WallLayer, type WallTargetU } from './wall-input.js';
import { MAXIMUM_BRIDGES_PER_LAYER, MAXIMUM_TARGET_THICKNESSES, validateWallInput } from './wall-validation.js';
import { requireNumberIn } from '../../base/field-checks.js';
import { enteredPart } from '../../base/quantity-sentence.js';
import { QUANTITY_RANGES } from '../../base/quantity-ranges.js';
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
  onlyKeys(value, field, ['kind', 'name', 'material', 'materialId', 'thickness', 'bridges', 'airGapLevel', 'fasteners']);
  const name = optionalText(value.name, `${field}.name`);
  const material = resolveCaseMaterial(value, field, resolveMaterial, 'building');
  const bridges = value.bridges === undefined ? undefined : parseBridges(value.bridges, `${field}.bridges`, resolveMaterial);
  if (isObject(value.fasteners)) onlyKeys(value.fasteners, `${field}.fasteners`, ['conductivity', 'perSquareMetre', 'crossSectionArea', 'lengthInLayer']);
  return {
    kind: 'material',
    ...(name !== undefined ? { name } : {}),
    material,
    thickness: value.thickness as number,
    ...(bridges !== undefined ? { bridges } : {}),
    ...(value.airGapLevel !== undefined ? { airGapLevel: value.airGapLevel as AirGapLevel } : {}),
    ...(value.fasteners !== undefined ? { fasteners: value.fasteners as unknown as WallFasteners } : {}),
  };
}

/** The sections side by side with a layer's own material: each { name?, material or materialId, fraction }; numbers checked by validateWallInput. */
function parseBridges(value: unknown, field: string, resolveMaterial: (id: number) => MaterialProperties | undefined): WallBridge[] {
  if (!Array.isArray(value) || value.length < 1 || value.length > MAXIMUM_BRIDGES_PER_LAYER) {
    throw new InputError(field, `${field} must list 1 to ${MAXIMUM_BRIDGES_PER_LAYER} bridging sections { material or materialId, fraction } (or be left out for a homogeneous layer).`);
  }
  return value.map((b, k) => {
    const g = `${field}[${k}]`;
    if (!isObject(b)) throw new InputError(g, `${g} must be an object { name, material or materialId, fraction }.`);
    onlyKeys(b, g, ['name', 'material', 'materialId', 'fraction']);
    const name = optionalText(b.name, `${g}.name`);
    const material = resolveCaseMaterial(b, g, resolveMaterial, 'building');
    return { ...(name !== undefined ? { name } : {}), material, fraction: b.fraction as number };
  });
}

/**
 * The target-U block: the layer by its name (the layer's own name, or its material's name when it
 * has none), the thicknesses as a list (any order; used rising, each once) or as { from, to, step }.
 */
function parseTargetU(value: unknown, layers: readonly WallLayer[]): WallTargetU {
  if (!isObject(value)) throw new InputError('targetU', 'targetU must be an object { layer, thicknesses, value }.');
  onlyKeys(value, 'targetU', ['layer', 'thicknesses', 'value']);
  if (typeof value.layer !== 'string') {
    throw new InputError('targetU.layer', 'targetU.layer must be the name of a material layer (its "name", or its material\'s name when it has none).');
  }
  const named = layers.flatMap((l, i) => (!isAirLayer(l) && (l.name ?? l.material.name) === value.layer ? [i] : []));
  if (named.length !== 1) {
    const names = layers.flatMap((l) => (isAirLayer(l) ? [] : [`"${l.name ?? l.material.name}"`]));
    throw new InputError(
      'targetU.layer',
      named.length === 0
        ? `targetU.layer must be the name of one material layer, one of ${names.join(', ')} (got ${shown(value.layer)}).`
        : `targetU.layer must name one layer, but ${named.length} layers are called ${shown(value.layer)}; give the insulation layer a name of its own.`,
    );
  }
  return { layer: named[0]!, thicknesses: parseThicknesses(value.thicknesses), value: value.value as number };
}

function parseThicknesses(value: unknown): number[] {
  const field = 'targetU.thicknesses';
  if (Array.isArray(value)) {
    if (value.length < 1 || value.length > MAXIMUM_TARGET_THICKNESSES) {
      throw new InputError(field, `${field} must list 1 to ${MAXIMUM_TARGET_THICKNESSES} thicknesses in m, or give { from, to, step }.`);
    }
    value.forEach((d, k) => requireNumberIn(`${field}[${k}]`, d, QUANTITY_RANGES.wallLayerThickness));
    return [...new Set(value as number[])].sort((a, b) => a - b);
  }
  if (!isObject(value)) throw new InputError(field, `${field} must be a list of thicknesses in m or a range { from, to, step } in m.`);
  onlyKeys(value, field, ['from', 'to', 'step']);
  const from = requireNumberIn(`${field}.from`, value.from, QUANTITY_RANGES.wallLayerThickness);
  const to = requireNumberIn(`${field}.to`, value.to, QUANTITY_RANGES.wallLayerThickness);
  const step = requireNumberIn(`${field}.step`, value.step, { ...QUANTITY_RANGES.wallLayerThickness, min: 0, minExclusive: true });
  if (to < from) {
    const t = (v: number, si: string) => enteredPart(v, 'thickness', si);
    throw new InputError(`${field}.to`, [`${field}.to must be at least ${field}.from (`, t(from, `${from} m`), ') (got ', t(to, String(to)), ').']);
  }
  // Thicknesses to the nanometre, so that 0.1 + 2·0.02 reads 0.14 and the last step reaches `to`.
  const count = Math.floor((to - from) / step + 1e-9) + 1;
  if (count > MAXIMUM_TARGET_THICKNESSES) {
    throw new InputError(`${field}.step`, `${field}.step must give at most ${MAXIMUM_TARGET_THICKNESSES} thicknesses from ${field}.from to ${field}.to (got ${count}).`);
  }
  return Array.from({ length: count }, (_, k) => Math.round((from + k * step) * 1e9) / 1e9);
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
  onlyKeys(json, '', ['$schema', 'kind', 'schemaVersion', 'title', 'notes', 'layers', 'heatFlowDirection', 'inside', 'outside', 'surfaceResistances', 'area', 'moisture', 'targetU']);
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
    ...(json.targetU !== undefined ? { targetU: parseTargetU(json.targetU, layers) } : {}),
  };
  validateWallInput(input);
  return input;
}
