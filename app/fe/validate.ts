/**
 * Input validation for engine problems. Each failure raises an InputError whose message is one
 * sentence naming the field and the allowed range. The engine validates even though forms and
 * files validate too, because every edge (CLI, IPC, HTTP, import) ends up here. The number
 * checks are the engine's one set, in app/base/field-checks.ts.
 */
import { InputError } from './errors.js';
import { ABSOLUTE_ZERO_CELSIUS, requireFinite, requireNonNegative, requirePositive, requireWholeNumber } from '../base/field-checks.js';
import type { ConductivityModel } from './conductivity.js';
import type { FaceCondition, Layer, PhaseChange, SteadyProblem, TransientProblem } from './problem.js';

const MAX_LAYERS = 100;
const MAX_ELEMENTS_PER_LAYER = 2_000_000;
const MAX_TIME_STEPS = 1_000_000;

/** Absolute zero, defined once in app/base; re-exported for the FE core's callers. */
export { ABSOLUTE_ZERO_CELSIUS };

function show(value: unknown): string {
  return typeof value === 'number' ? String(value) : JSON.stringify(value) ?? String(value);
}

/** A temperature in °C not below absolute zero (a fixed face temperature or a table point). */
function requireTemperature(field: string, value: unknown): number {
  const v = requireFinite(field, value, '°C');
  if (v < ABSOLUTE_ZERO_CELSIUS) {
    throw new InputError(field, `${field} must not be below absolute zero (−273.15 °C) (got ${v} °C).`);
  }
  return v;
}

export function validateConductivity(model: ConductivityModel | undefined, field: string): void {
  if (!model || typeof model !== 'object') {
    throw new InputError(field, `${field} is missing; give a constant, a polynomial or a table of points in W/(m·K).`);
  }
  switch (model.kind) {
    case 'constant':
      requirePositive(`${field}.value`, model.value, 'W/(m·K)');
      return;
    case 'polynomial': {
      const c = model.coefficients;
      if (!Array.isArray(c) || c.length < 1 || c.length > 8) {
        throw new InputError(`${field}.coefficients`, `${field}.coefficients must list 1 to 8 numbers (a0 + a1·θ + …, θ in °C).`);
      }
      c.forEach((a, i) => requireFinite(`${field}.coefficients[${i}]`, a, 'W/(m·K) per °C^' + i));
      requirePositive(`${field}.coefficients[0]`, c[0], 'W/(m·K) (conductivity at 0 °C)');
      return;
    }
    case 'table': {
      const p = model.points;
      if (!Array.isArray(p) || p.length < 1) {
        throw new InputError(`${field}.points`, `${field}.points must list at least one (temperature °C, conductivity W/(m·K)) pair.`);
      }
      p.forEach((pt, i) => {
        if (!Array.isArray(pt) || pt.length !== 2) {
          throw new InputError(`${field}.points[${i}]`, `${field}.points[${i}] must be a pair [temperature °C, conductivity W/(m·K)].`);
        }
        requireTemperature(`${field}.points[${i}][0]`, pt[0]);
        requirePositive(`${field}.points[${i}][1]`, pt[1], 'W/(m·K)');
        if (i > 0 && pt[0] <= p[i - 1]![0]) {
          throw new InputError(`${field}.points[${i}][0]`, `${field}.points[${i}][0] must be above the previous point's temperature (${p[i - 1]![0]} °C).`);
        }
      });
      return;
    }
    default:
      throw new InputError(`${field}.kind`, `${field}.kind must be "constant", "polynomial" or "table"; got ${show((model as { kind?: unknown }).kind)}.`);
  }
}

function validateLayer(layer: Layer, i: number, count: number, transient: boolean): void {
  const f = `layers[${i}]`;
  if (!layer || typeof layer !== 'object') throw new InputError(f, `${f} must be an object with thickness and conductivity.`);
  requirePositive(`${f}.thickness`, layer.thickness, 'm');
  validateConductivity(layer.conductivity, `${f}.conductivity`);
  if (transient || layer.density !== undefined) requirePositive(`${f}.density`, layer.density, 'kg/m³');
  if (transient || layer.specificHeat !== undefined) requirePositive(`${f}.specificHeat`, layer.specificHeat, 'J/(kg·K)');
  if (layer.heatGeneration !== undefined) requireFinite(`${f}.heatGeneration`, layer.heatGeneration, 'W/m³');
  if (layer.contactResistanceToNext !== undefined) {
    requireNonNegative(`${f}.contactResistanceToNext`, layer.contactResistanceToNext, 'm²·K/W');
    if (i === count - 1 && layer.contactResistanceToNext > 0) {
      throw new InputError(`${f}.contactResistanceToNext`, `${f}.contactResistanceToNext must be 0 on the last layer, which has no next layer.`);
    }
  }
  if (layer.elements !== undefined) requireWholeNumber(`${f}.elements`, layer.elements, 1, MAX_ELEMENTS_PER_LAYER);
  if (layer.phaseChange !== undefined) validatePhaseChange(layer.phaseChange, `${f}.phaseChange`);
}

function validatePhaseChange(p: PhaseChange, field: string): void {
  if (!p || typeof p !== 'object') {
    throw new InputError(field, `${field} must be an object with temperature (°C), latentHeat (J/kg) and range (K).`);
  }
  requireTemperature(`${field}.temperature`, p.temperature);
  requireNonNegative(`${field}.latentHeat`, p.latentHeat, 'J/kg');
  requirePositive(`${field}.range`, p.range, 'K');
  if (p.solidSpecificHeat !== undefined) requirePositive(`${field}.solidSpecificHeat`, p.solidSpecificHeat, 'J/(kg·K)');
}

export function validateFaceCondition(condition: FaceCondition | undefined, field: string): void {
  if (!condition || typeof condition !== 'object') {
    throw new InputError(field, `${field} is missing; give a fixed temperature, a heat flux or a film condition.`);
  }
  switch (condition.kind) {
    case 'temperature':
      requireTemperature(`${field}.temperature`, condition.temperature);
      return;
    case 'flux':
      requireFinite(`${field}.flux`, condition.flux, 'W/m²');
      return;
    case 'film':
      if (typeof condition.coefficient !== 'function') requireNonNegative(`${field}.coefficient`, condition.coefficient, 'W/(m²·K)');
      requireTemperature(`${field}.ambient`, condition.ambient);
      return;
    default:
      throw new InputError(`${field}.kind`, `${field}.kind must be "temperature", "flux" or "film"; got ${show((condition as { kind?: unknown }).kind)}.`);
  }
}

export function validateSteadyProblem(problem: SteadyProblem, transient = false): void {
  if (!problem || typeof problem !== 'object') throw new InputError('problem', 'The problem must be an object with geometry, layers, inner and outer.');
  const g = problem.geometry;
  if (!g || (g.kind !== 'planar' && g.kind !== 'axisymmetric')) {
    throw new InputError('geometry.kind', `geometry.kind must be "planar" or "axisymmetric"; got ${show((g as { kind?: unknown } | undefined)?.kind)}.`);
  }
  // A transient problem may start at the axis (a pipe's contents): innerRadius 0, checked below.
  const solidCylinder = transient && g.kind === 'axisymmetric' && g.innerRadius === 0;
  if (g.kind === 'axisymmetric' && !solidCylinder) requirePositive('geometry.innerRadius', g.innerRadius, 'm');
  if (!Array.isArray(problem.layers) || problem.layers.length < 1 || problem.layers.length > MAX_LAYERS) {
    throw new InputError('layers', `layers must list 1 to ${MAX_LAYERS} layers; got ${Array.isArray(problem.layers) ? problem.layers.length : show(problem.layers)}.`);
  }
  problem.layers.forEach((layer, i) => validateLayer(layer, i, problem.layers.length, transient));
  validateFaceCondition(problem.inner, 'inner');
  validateFaceCondition(problem.outer, 'outer');
  // At r = 0 the face has no area (its measure 2πr is 0) and the axis is a line of symmetry: no
  // heat crosses it. Only a zero flux says that; a fixed temperature on a line would be a line
  // source whose heat flow the mesh cannot converge to, so it is refused rather than ignored.
  if (solidCylinder && !(problem.inner.kind === 'flux' && problem.inner.flux === 0)) {
    throw new InputError('inner', `inner must be a heat flux of 0 W/m² when geometry.innerRadius is 0: the inner face is then the axis of a solid cylinder, across which no heat flows.`);
  }
  if (!transient && problem.inner.kind === 'flux' && problem.outer.kind === 'flux') {
    throw new InputError('outer', 'outer must be a fixed temperature or a film when inner is a heat flux: with heat fluxes on both faces the temperature level is undetermined.');
  }
  const o = problem.options;
  if (o !== undefined) {
    if (o.order !== undefined && o.order !== 1 && o.order !== 2) throw new InputError('options.order', `options.order must be 1 (linear) or 2 (quadratic); got ${show(o.order)}.`);
    if (o.temperatureTolerance !== undefined) requirePositive('options.temperatureTolerance', o.temperatureTolerance, 'K');
    if (o.maxIterations !== undefined) requireWholeNumber('options.maxIterations', o.maxIterations, 1, 10_000);
  }
}

export function validateTransientProblem(problem: TransientProblem): void {
  validateSteadyProblem(problem, true);
  if (typeof problem.initialTemperature !== 'function') requireTemperature('initialTemperature', problem.initialTemperature);
  const dt = requirePositive('timeStep', problem.timeStep, 's');
  const duration = requirePositive('duration', problem.duration, 's');
  if (Math.ceil(duration / dt - 1e-9) > MAX_TIME_STEPS) {
    throw new InputError('timeStep', `timeStep must give at most ${MAX_TIME_STEPS} steps over the duration; ${duration} s / ${dt} s is too many.`);
  }
  if (problem.scheme !== undefined && problem.scheme !== 'backward-euler' && problem.scheme !== 'crank-nicolson') {
    throw new InputError('scheme', `scheme must be "backward-euler" or "crank-nicolson"; got ${show(problem.scheme)}.`);
  }
}
