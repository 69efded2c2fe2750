/**
 * The flat-surface case file: a duct wall, tank wall or equipment casing calculation as JSON, SI
 * units, temperatures in °C, relative humidity as a fraction 0..1.
 * Schema: data/schemas/flat-case.schema.json. Same conventions as the pipe case file
 * (app/cases/pipe-case-file.ts): materials inline or by library id, field names those of
 * FlatSurfaceInput.
 *
 *   { "kind": "flat", "schemaVersion": 1,
 *     "wall": { "materialId": 3, "thickness": 0.008 },
 *     "inner": { "kind": "surface", "temperature": 90 },
 *     "layers": [ { "materialId": 12, "thickness": 0.1 } ],
 *     "surface": { "kind": "vertical", "height": 6 },
 *     "ambient": { "airTemperature": 15, "relativeHumidity": 0.7, "exposure": { "kind": "outdoor", "windSpeed": 4 } },
 *     "area": 120, "operatingHours": 8760 }
 */
import { validateFlatSurfaceInput, type FlatSurfaceInput } from './flat-surface-input.js';
import { rejectUnknownKeys, requireObject, type JsonObject } from '../case-fields.js';
import { withFields } from '../with-fields.js';
import { caseEnvelope, caseLayers, caseMaterialLayer, withoutEnvelope, type MaterialResolver } from '../pipe/pipe-case-file.js';

export const FLAT_CASE_SCHEMA_VERSION = 1;

const FLAT_TOP_KEYS = [
  '$schema',
  'schemaVersion',
  'kind',
  'title',
  'notes',
  'wall',
  'inner',
  'layers',
  'jacket',
  'surface',
  'ambient',
  'surfaceMethod',
  'area',
  'operatingHours',
  'touchLimit',
  'sizing',
];

/** Parses and validates a flat-surface case file; throws InputError naming the field. */
export function parseFlatCaseFile(json: unknown, resolveMaterial: MaterialResolver): FlatSurfaceInput {
  const file = caseEnvelope(json, 'flat', FLAT_CASE_SCHEMA_VERSION, FLAT_TOP_KEYS);
  rejectUnknownKeys(requireObject(file['surface'], 'surface'), ['kind', 'height', 'facing', 'characteristicLength'], 'surface');
  const input: JsonObject = withFields(file, { layers: caseLayers(file['layers'], resolveMaterial) });
  if (file['wall'] !== undefined) input['wall'] = caseMaterialLayer(file['wall'], 'wall', resolveMaterial);
  if (file['jacket'] !== undefined) input['jacket'] = caseMaterialLayer(file['jacket'], 'jacket', resolveMaterial, ['emissivity']);
  const fields = withoutEnvelope(input);
  validateFlatSurfaceInput(fields);
  return fields;
}
