/**
 * The documented range of every number in a conduction case file (app/base/quantity-ranges.ts),
 * checked before the engine sees the problem: the engine's own checks only ask for finite,
 * positive values, which lets a 1e308 m layer or a 1e30 W/(m²·K) film through to an overflow or a
 * system too ill-conditioned to solve.
 */
import { requireNumberIn, requireWholeNumber } from '../../base/field-checks.js';
import { InputError } from '../../base/input-error.js';
import { QUANTITY_RANGES, MAX_CASE_ELEMENTS, MAX_CASE_ELEMENTS_PER_LAYER } from '../../base/quantity-ranges.js';
import { defaultElementCount } from '../../fe/mesh.js';
import type { FaceCondition, Layer, SteadyProblem } from '../../fe/problem.js';
import { requireConductivityOver, validateConductivityModel } from '../../materials/conductivity-checks.js';
import { isObject, type JsonObject } from '../case-fields.js';

const R = QUANTITY_RANGES;

/** The temperatures a face names (fixed or film ambient), for the span λ(θ) must cover. */
function faceTemperatures(face: FaceCondition): number[] {
  if (face.kind === 'temperature') return [face.temperature];
  if (face.kind === 'film' && typeof face.ambient === 'number') return [face.ambient];
  return [];
}

function checkFace(face: unknown, field: string): void {
  if (!isObject(face)) return;
  if (face['kind'] === 'temperature') requireNumberIn(`${field}.temperature`, face['temperature'], R.conductionTemperature);
  if (face['kind'] === 'flux') requireNumberIn(`${field}.flux`, face['flux'], R.heatFlux);
  if (face['kind'] === 'film') {
    requireNumberIn(`${field}.coefficient`, face['coefficient'], R.filmCoefficient);
    requireNumberIn(`${field}.ambient`, face['ambient'], R.conductionTemperature);
  }
}

function checkLayer(layer: JsonObject, field: string): void {
  requireNumberIn(`${field}.thickness`, layer['thickness'], R.conductionThickness);
  validateConductivityModel(layer['conductivity'], `${field}.conductivity`);
  if (layer['density'] !== undefined) requireNumberIn(`${field}.density`, layer['density'], R.density);
  if (layer['specificHeat'] !== undefined) requireNumberIn(`${field}.specificHeat`, layer['specificHeat'], R.specificHeat);
  if (layer['heatGeneration'] !== undefined) requireNumberIn(`${field}.heatGeneration`, layer['heatGeneration'], R.heatGeneration);
  if (layer['contactResistanceToNext'] !== undefined) {
    requireNumberIn(`${field}.contactResistanceToNext`, layer['contactResistanceToNext'], R.contactResistance);
  }
}

/**
 * A layer's element count within what a case may ask for. Checked before the engine's own
 * structural checks, whose limit (for benchmarks) is far higher and would be the one stated.
 */
export function checkLayerElements(layer: JsonObject, field: string): void {
  if (layer['elements'] !== undefined) requireWholeNumber(`${field}.elements`, layer['elements'], 1, MAX_CASE_ELEMENTS_PER_LAYER);
}

/** The elements of the whole case (asked for, or the engine's default for the layer) within MAX_CASE_ELEMENTS. */
function checkTotalElements(problem: SteadyProblem, transient: boolean): void {
  const order = problem.options?.order ?? 2;
  let position = problem.geometry.kind === 'planar' ? 0 : problem.geometry.innerRadius;
  let total = 0;
  for (const layer of problem.layers) {
    total += layer.elements ?? defaultElementCount(problem.geometry, layer, position, order, transient ? 'transient' : 'steady');
    position += layer.thickness;
  }
  if (total > MAX_CASE_ELEMENTS) {
    throw new InputError(
      'layers',
      `layers ask for ${total} elements in all, but a case may have at most ${MAX_CASE_ELEMENTS} (and at most ${MAX_CASE_ELEMENTS_PER_LAYER} in one layer); give fewer elements.`,
    );
  }
}

/**
 * Every number of the problem (and of a transient analysis) in range; then each polynomial λ(θ)
 * within the conductivity range between the lowest and highest temperature the case names.
 */
export function checkConductionRanges(problem: SteadyProblem, analysis: JsonObject): void {
  const geometry = problem.geometry as unknown as JsonObject;
  if (geometry['kind'] === 'axisymmetric') requireNumberIn('geometry.innerRadius', geometry['innerRadius'], R.innerRadius);
  problem.layers.forEach((layer, i) => checkLayer(layer as unknown as JsonObject, `layers[${i}]`));
  checkTotalElements(problem, analysis['kind'] === 'transient');
  checkFace(problem.inner, 'inner');
  checkFace(problem.outer, 'outer');
  const named = [...faceTemperatures(problem.inner), ...faceTemperatures(problem.outer)];
  if (analysis['kind'] === 'transient') {
    requireNumberIn('analysis.initialTemperature', analysis['initialTemperature'], R.conductionTemperature);
    requireNumberIn('analysis.timeStep', analysis['timeStep'], R.timeStep);
    requireNumberIn('analysis.duration', analysis['duration'], R.duration);
    named.push(analysis['initialTemperature'] as number);
  }
  const tolerance = problem.options?.temperatureTolerance;
  if (tolerance !== undefined) requireNumberIn('options.temperatureTolerance', tolerance, R.temperatureTolerance);
  if (named.length === 0) return;
  const low = Math.min(...named);
  const high = Math.max(...named);
  problem.layers.forEach((layer: Layer, i) => requireConductivityOver(layer.conductivity, `layers[${i}].conductivity`, low, high));
}
