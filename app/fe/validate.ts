/**
 * Input validation for engine problems. Each failure raises an InputError whose message is one
 * sentence naming the field and the allowed range. The engine validates even though forms and
 * files validate too, because every edge (CLI, IPC, HTTP, import) ends up here.
 */
import { InputError } from './errors.js';
import type { ConductivityModel } from './conductivity.js';
import type { FaceCondition, Layer, SteadyProblem, TransientProblem } from './problem.js';

export const ABSOLUTE_ZERO_CELSIUS = -273.15;
const MAX_LAYERS = 100;
const MAX_ELEMENTS_PER_LAYER = 2_000_000;
const MAX_TIME_STEPS = 1_000_000;

function show(value: unknown): string {
  return typeof value === 'number' ? String(value) : JSON.stringify(value) ?? String(value);
}

export function requireFinite(value: unknown, field: string, unit: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new InputError(field, `${field} must be a finite number in ${unit}; got ${show(value)}.`);
  }
  return value;
}

export function requirePositive(value: unknown, field: string, unit: string): number {
  const v = requireFinite(value, field, unit);
  if (v <= 0) throw new InputError(field, `${field} must be greater than 0 ${unit}; got ${v}.`);
  return v;
}

export function requireNonNegative(value: unknown, field: string, unit: string): number {
  const v = requireFinite(value, field, unit);
  if (v < 0) throw new InputError(field, `${field} must be 0 ${unit} or more; got ${v}.`);
  return v;
}

export function requireTemperature(value: unknown, field: string): number {
  const v = requireFinite(value, field, '°C');
  if (v < ABSOLUTE_ZERO_CELSIUS) {
    throw new InputError(field, `${field} must not be below absolute zero (−273.15 °C); got ${v} °C.`);
  }
  return v;
}

function requireInteger(value: unknown, field: string, min: number, max: number): number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < min || value > max) {
    throw new InputError(field, `${field} must be a whole number from ${min} to ${max}; got ${show(value)}.`);
  }
  return value;
}

export function validateConductivity(model: ConductivityModel | undefined, field: string): void {
  if (!model || typeof model !== 'object') {
    throw new InputError(field, `${field} is missing; give a constant, a polynomial or a table of points in W/(m·K).`);
  }
  switch (model.kind) {
    case 'constant':
      requirePositive(model.value, `${field}.value`, 'W/(m·K)');
      return;
    case 'polynomial': {
      const c = model.coefficients;
      if (!Array.isArray(c) || c.length < 1 || c.length > 8) {
        throw new InputError(`${field}.coefficients`, `${field}.coefficients must list 1 to 8 numbers (a0 + a1·θ + …, θ in °C).`);
      }
      c.forEach((a, i) => requireFinite(a, `${field}.coefficients[${i}]`, 'W/(m·K) per °C^' + i));
      requirePositive(c[0], `${field}.coefficients[0]`, 'W/(m·K) (conductivity at 0 °C)');
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
        requireTemperature(pt[0], `${field}.points[${i}][0]`);
        requirePositive(pt[1], `${field}.points[${i}][1]`, 'W/(m·K)');
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
  requirePositive(layer.thickness, `${f}.thickness`, 'm');
  validateConductivity(layer.conductivity, `${f}.conductivity`);
  if (transient || layer.density !== undefined) requirePositive(layer.density, `${f}.density`, 'kg/m³');
  if (transient || layer.specificHeat !== undefined) requirePositive(layer.specificHeat, `${f}.specificHeat`, 'J/(kg·K)');
  if (layer.heatGeneration !== undefined) requireFinite(layer.heatGeneration, `${f}.heatGeneration`, 'W/m³');
  if (layer.contactResistanceToNext !== undefined) {
    requireNonNegative(layer.contactResistanceToNext, `${f}.contactResistanceToNext`, 'm²·K/W');
    if (i === count - 1 && layer.contactResistanceToNext > 0) {
      throw new InputError(`${f}.contactResistanceToNext`, `${f}.contactResistanceToNext must be 0 on the last layer, which has no next layer.`);
    }
  }
  if (layer.elements !== undefined) requireInteger(layer.elements, `${f}.elements`, 1, MAX_ELEMENTS_PER_LAYER);
}

export function validateFaceCondition(condition: FaceCondition | undefined, field: string): void {
  if (!condition || typeof condition !== 'object') {
    throw new InputError(field, `${field} is missing; give a fixed temperature, a heat flux or a film condition.`);
  }
  switch (condition.kind) {
    case 'temperature':
      requireTemperature(condition.temperature, `${field}.temperature`);
      return;
    case 'flux':
      requireFinite(condition.flux, `${field}.flux`, 'W/m²');
      return;
    case 'film':
      if (typeof condition.coefficient !== 'function') requireNonNegative(condition.coefficient, `${field}.coefficient`, 'W/(m²·K)');
      requireTemperature(condition.ambient, `${field}.ambient`);
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
  if (g.kind === 'axisymmetric') requirePositive(g.innerRadius, 'geometry.innerRadius', 'm');
  if (!Array.isArray(problem.layers) || problem.layers.length < 1 || problem.layers.length > MAX_LAYERS) {
    throw new InputError('layers', `layers must list 1 to ${MAX_LAYERS} layers; got ${Array.isArray(problem.layers) ? problem.layers.length : show(problem.layers)}.`);
  }
  problem.layers.forEach((layer, i) => validateLayer(layer, i, problem.layers.length, transient));
  validateFaceCondition(problem.inner, 'inner');
  validateFaceCondition(problem.outer, 'outer');
  if (!transient && problem.inner.kind === 'flux' && problem.outer.kind === 'flux') {
    throw new InputError('outer', 'outer must be a fixed temperature or a film when inner is a heat flux: with heat fluxes on both faces the temperature level is undetermined.');
  }
  const o = problem.options;
  if (o !== undefined) {
    if (o.order !== undefined && o.order !== 1 && o.order !== 2) throw new InputError('options.order', `options.order must be 1 (linear) or 2 (quadratic); got ${show(o.order)}.`);
    if (o.temperatureTolerance !== undefined) requirePositive(o.temperatureTolerance, 'options.temperatureTolerance', 'K');
    if (o.maxIterations !== undefined) requireInteger(o.maxIterations, 'options.maxIterations', 1, 10_000);
  }
}

export function validateTransientProblem(problem: TransientProblem): void {
  validateSteadyProblem(problem, true);
  if (typeof problem.initialTemperature !== 'function') requireTemperature(problem.initialTemperature, 'initialTemperature');
  const dt = requirePositive(problem.timeStep, 'timeStep', 's');
  const duration = requirePositive(problem.duration, 'duration', 's');
  if (Math.ceil(duration / dt - 1e-9) > MAX_TIME_STEPS) {
    throw new InputError('timeStep', `timeStep must give at most ${MAX_TIME_STEPS} steps over the duration; ${duration} s / ${dt} s is too many.`);
  }
  if (problem.scheme !== undefined && problem.scheme !== 'backward-euler' && problem.scheme !== 'crank-nicolson') {
    throw new InputError('scheme', `scheme must be "backward-euler" or "crank-nicolson"; got ${show(problem.scheme)}.`);
  }
}
