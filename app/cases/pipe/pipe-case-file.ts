/**
 * The pipe case file: a pipe calculation written as JSON, SI units, temperatures in °C,
 * relative humidity as a fraction 0..1. Schema: data/schemas/pipe-case.schema.json.
 *
 *   { "kind": "pipe", "schemaVersion": 1, "title": "…",
 *     "pipe": { "outerDiameter": 0.1143, "wallThickness": 0.0036, "materialId": 3 },
 *     "inner": { "kind": "fluid", "temperature": 80, "coefficient": 1500 },
 *     "layers": [ { "material": { "name": "…", "conductivity": { "kind": "constant", "value": 0.04 } }, "thickness": 0.05 } ],
 *     "jacket": { "materialId": 7, "thickness": 0.0007, "emissivity": 0.13 },
 *     "orientation": "horizontal",
 *     "ambient": { "airTemperature": 20, "relativeHumidity": 0.6, "exposure": { "kind": "indoor" } },
 *     "length": 40, "operatingHours": 8760 }
 *
 * Each material is given inline ("material": {…}) or by library id ("materialId": n, resolved by
 * the caller's callback), never both. The field names are those of PipeInput, so an error from
 * the parser and one from calculatePipe name the same path.
 */
import { InputError } from '../../fe/errors.js';
import { resolveCaseMaterial, type MaterialResolver } from '../case-material.js';
import { validatePipeInput, type PipeInput } from './pipe-input.js';
import { withFields } from '../with-fields.js';
import { rejectUnknownKeys, requireObject, requireSchemaVersion, requireString, shown, type JsonObject } from '../case-fields.js';

export type { MaterialResolver } from '../case-material.js';

export const PIPE_CASE_SCHEMA_VERSION = 1;

/** An entry with a material and a thickness (and any extra keys allowed), material resolved. */
export function caseMaterialLayer(value: unknown, field: string, resolve: MaterialResolver, extraKeys: readonly string[] = []): JsonObject {
  const entry = requireObject(value, field);
  rejectUnknownKeys(entry, ['material', 'materialId', 'thickness', ...extraKeys], field);
  const { materialId: _id, ...rest } = entry;
  return withFields(rest, { material: resolveCaseMaterial(entry, field, resolve, 'other') });
}

export function caseLayers(value: unknown, resolve: MaterialResolver): JsonObject[] {
  if (!Array.isArray(value)) throw new InputError('layers', 'layers must list 1 to 20 insulation layers, inside first.');
  return value.map((layer, i) => caseMaterialLayer(layer, `layers[${i}]`, resolve));
}

/** Checks the shared envelope and the shapes of the nested objects; returns the file object. */
export function caseEnvelope(json: unknown, kind: 'pipe' | 'flat', schemaVersion: number, topKeys: readonly string[]): JsonObject {
  const file = requireObject(json, 'case');
  rejectUnknownKeys(file, topKeys, '');
  requireSchemaVersion(file, schemaVersion);
  if (file['kind'] !== kind) throw new InputError('kind', `kind must be "${kind}" for this case file; got ${shown(file['kind'])}.`);
  if (file['title'] !== undefined) requireString(file['title'], 'title');
  if (file['notes'] !== undefined) requireString(file['notes'], 'notes', 5000);
  if (file['inner'] !== undefined) rejectUnknownKeys(requireObject(file['inner'], 'inner'), ['kind', 'temperature', 'coefficient'], 'inner');
  if (file['surfaceMethod'] !== undefined) {
    rejectUnknownKeys(requireObject(file['surfaceMethod'], 'surfaceMethod'), ['kind', 'coefficient', 'resistance'], 'surfaceMethod');
  }
  const ambient = requireObject(file['ambient'], 'ambient');
  rejectUnknownKeys(ambient, ['airTemperature', 'surroundingsTemperature', 'relativeHumidity', 'exposure'], 'ambient');
  rejectUnknownKeys(requireObject(ambient['exposure'], 'ambient.exposure'), ['kind', 'windSpeed'], 'ambient.exposure');
  return file;
}

const PIPE_TOP_KEYS = [
  '$schema',
  'schemaVersion',
  'kind',
  'title',
  'notes',
  'pipe',
  'inner',
  'layers',
  'jacket',
  'orientation',
  'height',
  'ambient',
  'surfaceMethod',
  'length',
  'operatingHours',
  'touchLimit',
  'sizing',
];

/** Parses and validates a pipe case file; throws InputError naming the field. */
export function parsePipeCaseFile(json: unknown, resolveMaterial: MaterialResolver): PipeInput {
  const file = caseEnvelope(json, 'pipe', PIPE_CASE_SCHEMA_VERSION, PIPE_TOP_KEYS);
  const pipe = requireObject(file['pipe'], 'pipe');
  rejectUnknownKeys(pipe, ['outerDiameter', 'wallThickness', 'material', 'materialId'], 'pipe');
  const { materialId: _id, ...pipeRest } = pipe;
  const input: JsonObject = withFields(file, {
    pipe: withFields(pipeRest, { material: resolveCaseMaterial(pipe, 'pipe', resolveMaterial, 'pipe') }),
    layers: caseLayers(file['layers'], resolveMaterial),
  });
  if (file['jacket'] !== undefined) input['jacket'] = caseMaterialLayer(file['jacket'], 'jacket', resolveMaterial, ['emissivity']);
  const fields = withoutEnvelope(input);
  validatePipeInput(fields);
  return fields;
}

/** Not the calculation's: the file's own keys, and the "sizing" block, which the kind parses apart (app/cases/sizing). */
const ENVELOPE_KEYS: readonly string[] = ['$schema', 'schemaVersion', 'kind', 'notes', 'sizing'];

/**
 * The calculation's fields of a case file object, without the file's envelope, in the file's
 * order. Copied rather than removed with `delete`, which leaves V8 a slow dictionary-mode object
 * that the solve and the report then read field by field.
 */
export function withoutEnvelope(input: JsonObject): JsonObject {
  const fields: JsonObject = {};
  for (const key of Object.keys(input)) if (!ENVELOPE_KEYS.includes(key)) fields[key] = input[key];
  return fields;
}
