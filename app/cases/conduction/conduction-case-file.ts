/**
 * The "conduction" case file: a 1D conduction problem written out directly (geometry, layers with
 * conductivity models, face conditions), solved steady or transient. It is the engine's own input
 * in JSON; the pipe, flat-surface and wall case files build on materials and design conditions
 * instead. Schema: data/schemas/conduction-case.schema.json. All values SI, temperatures °C.
 */
import { InputError } from '../../fe/errors.js';
import type { FaceCondition, Layer, SteadyProblem, TransientProblem } from '../../fe/problem.js';
import { validateSteadyProblem, validateTransientProblem } from '../../fe/validate.js';
import { checkConductionRanges, checkLayerElements } from './conduction-ranges.js';
import { isObject, rejectUnknownKeys, requireArray, requireObject, requireSchemaVersion, requireString, shown } from '../case-fields.js';

export const CONDUCTION_CASE_SCHEMA_VERSION = 1;

export type ConductionCase =
  | { readonly title: string; readonly analysis: 'steady'; readonly problem: SteadyProblem }
  | { readonly title: string; readonly analysis: 'transient'; readonly problem: TransientProblem };

const TOP_KEYS = ['$schema', 'schemaVersion', 'kind', 'title', 'notes', 'geometry', 'layers', 'inner', 'outer', 'analysis', 'options'];
const LAYER_KEYS = ['name', 'thickness', 'conductivity', 'density', 'specificHeat', 'heatGeneration', 'contactResistanceToNext', 'elements'];
const ANALYSIS_KEYS = { steady: ['kind'], transient: ['kind', 'initialTemperature', 'timeStep', 'duration', 'scheme'] };

/**
 * The kind of an object the engine branches on, stated the engine's way but with the value as the
 * user reads it (a missing kind is "nothing"), before the engine's structural checks run.
 */
function requireKind(value: unknown, field: string, kinds: readonly string[]): void {
  if (!isObject(value) || kinds.includes(value['kind'] as string)) return;
  const listed = kinds.map((k) => `"${k}"`);
  throw new InputError(`${field}.kind`, `${field}.kind must be ${listed.slice(0, -1).join(', ')} or ${listed[listed.length - 1]}; got ${shown(value['kind'])}.`);
}

export function parseConductionCaseFile(json: unknown): ConductionCase {
  const file = requireObject(json, 'case');
  rejectUnknownKeys(file, TOP_KEYS, '');
  requireSchemaVersion(file, CONDUCTION_CASE_SCHEMA_VERSION);
  if (file['kind'] !== 'conduction') throw new InputError('kind', `kind must be "conduction" for this case file; got ${shown(file['kind'])}.`);
  const title = file['title'] === undefined ? 'Untitled case' : requireString(file['title'], 'title');
  if (file['notes'] !== undefined) requireString(file['notes'], 'notes', 5000);

  const layers = requireArray(file['layers'], 'layers', 1, 100).map((raw, i) => {
    const layer = requireObject(raw, `layers[${i}]`);
    rejectUnknownKeys(layer, LAYER_KEYS, `layers[${i}]`);
    if (layer['name'] !== undefined) requireString(layer['name'], `layers[${i}].name`);
    checkLayerElements(layer, `layers[${i}]`);
    requireKind(layer['conductivity'], `layers[${i}].conductivity`, ['constant', 'polynomial', 'table']);
    return layer as unknown as Layer;
  });
  requireKind(file['geometry'], 'geometry', ['planar', 'axisymmetric']);
  for (const face of ['inner', 'outer'] as const) {
    requireKind(file[face], face, ['temperature', 'flux', 'film']);
    if (isObject(file[face]) && file[face]['kind'] === 'film' && typeof file[face]['coefficient'] !== 'number') {
      throw new InputError(`${face}.coefficient`, `${face}.coefficient must be a number in W/(m²·K) in a case file.`);
    }
  }
  const base = {
    geometry: requireObject(file['geometry'], 'geometry') as unknown as SteadyProblem['geometry'],
    layers,
    inner: file['inner'] as FaceCondition,
    outer: file['outer'] as FaceCondition,
    ...(file['options'] !== undefined ? { options: requireObject(file['options'], 'options') as SteadyProblem['options'] } : {}),
  };
  if (base.options) rejectUnknownKeys(base.options as Record<string, unknown>, ['order', 'temperatureTolerance', 'maxIterations'], 'options');

  const analysis = file['analysis'] === undefined ? { kind: 'steady' } : requireObject(file['analysis'], 'analysis');
  validateSteadyProblem(base, analysis['kind'] === 'transient');
  checkConductionRanges(base, analysis);
  if (analysis['kind'] === 'steady') {
    rejectUnknownKeys(analysis, ANALYSIS_KEYS.steady, 'analysis');
    validateSteadyProblem(base);
    return { title, analysis: 'steady', problem: base };
  }
  if (analysis['kind'] === 'transient') {
    rejectUnknownKeys(analysis, ANALYSIS_KEYS.transient, 'analysis');
    const problem: TransientProblem = {
      ...base,
      initialTemperature: analysis['initialTemperature'] as number,
      timeStep: analysis['timeStep'] as number,
      duration: analysis['duration'] as number,
      ...(analysis['scheme'] !== undefined ? { scheme: analysis['scheme'] as TransientProblem['scheme'] } : {}),
    };
    if (typeof problem.initialTemperature !== 'number') {
      throw new InputError('analysis.initialTemperature', 'analysis.initialTemperature must be a number in °C (a uniform starting temperature).');
    }
    validateTransientProblem(problem);
    return { title, analysis: 'transient', problem };
  }
  throw new InputError('analysis.kind', `analysis.kind must be "steady" or "transient"; got ${shown(analysis['kind'])}.`);
}
