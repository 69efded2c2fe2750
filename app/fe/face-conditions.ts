/**
 * Face conditions as data. Natural conditions (flux, film) add to the system; essential ones
 * (fixed temperature) are collected so the solve can set those nodes aside.
 */
import type { BandedMatrix } from './banded-matrix.js';
import type { FaceCondition, FilmExchange } from './problem.js';

export type FaceName = 'inner' | 'outer';

export interface Face {
  readonly name: FaceName;
  readonly node: number;
  /** Measure at the face: 1 (planar, per m²) or 2πr (axisymmetric, per m). */
  readonly measure: number;
  readonly condition: FaceCondition;
}

export interface EssentialCondition {
  readonly node: number;
  readonly temperature: number;
}

/** The film coefficient and sink temperature in force for a given surface temperature. */
export function filmExchangeAt(condition: Extract<FaceCondition, { kind: 'film' }>, surfaceTemperature: number): FilmExchange {
  const c = condition.coefficient;
  if (typeof c === 'number') return { coefficient: c, ambient: condition.ambient };
  const value = c(surfaceTemperature);
  const exchange = typeof value === 'number' ? { coefficient: value, ambient: condition.ambient } : value;
  if (!Number.isFinite(exchange.coefficient) || exchange.coefficient < 0 || !Number.isFinite(exchange.ambient)) {
    throw new RangeError(
      `the film coefficient function returned ${exchange.coefficient} W/(m²·K) with sink ${exchange.ambient} °C at a surface temperature of ${surfaceTemperature} °C; it must return a finite coefficient ≥ 0 and a finite temperature`,
    );
  }
  return exchange;
}

/**
 * Relative step of the forward difference that gives a film's d(heat in)/dθ_s for Newton's method:
 * near √ε, so that truncation and cancellation errors are both about 1e-8 of the slope.
 */
const FILM_SLOPE_STEP = 1e-6;

/** Heat entering through a film face per unit of face measure (W/m²): h(θ_s)·(θ_sink(θ_s) − θ_s). */
export function filmHeatIn(
  condition: Extract<FaceCondition, { kind: 'film' }>,
  surfaceTemperature: number,
): { readonly exchange: FilmExchange; readonly heatIn: number } {
  const exchange = filmExchangeAt(condition, surfaceTemperature);
  return { exchange, heatIn: exchange.coefficient * (exchange.ambient - surfaceTemperature) };
}

/**
 * d(heat in)/dθ_s of a film face (W/(m²·K)), which Newton's method needs:
 *   d/dθ_s [h·(θ_sink − θ_s)] = −h + h'·(θ_sink − θ_s) + h·θ_sink'.
 * A coefficient function's h' and θ_sink' are forward differences, so any function a caller writes
 * (correlations, tables, radiation) works without a derivative of its own; one that returns the
 * same exchange at every temperature gets h' = θ_sink' = 0 exactly, and so the slope −h.
 */
export function filmHeatInSlope(condition: Extract<FaceCondition, { kind: 'film' }>, surfaceTemperature: number, exchange: FilmExchange): number {
  if (typeof condition.coefficient === 'number') return -condition.coefficient;
  const step = FILM_SLOPE_STEP * (1 + Math.abs(surfaceTemperature));
  const shifted = filmExchangeAt(condition, surfaceTemperature + step);
  const coefficientSlope = (shifted.coefficient - exchange.coefficient) / step;
  const sinkSlope = (shifted.ambient - exchange.ambient) / step;
  return -exchange.coefficient + coefficientSlope * (exchange.ambient - surfaceTemperature) + exchange.coefficient * sinkSlope;
}

/**
 * Stage 1 of the steady solve. A fixed face's node keeps its prescribed temperature, so it takes
 * no part in the system for the others: its row is set aside for the reaction and its column
 * multiplies a known value. Faces are the two end nodes, so the free nodes are one consecutive
 * range (empty when a single linear element lies between two fixed faces).
 */
export function freeNodeRange(faces: readonly Face[], nodeCount: number): { readonly first: number; readonly last: number } {
  let first = 0;
  let last = nodeCount - 1;
  for (const face of faces) {
    if (face.condition.kind !== 'temperature') continue;
    if (face.node === 0) first = 1;
    if (face.node === nodeCount - 1) last = nodeCount - 2;
  }
  return { first, last };
}

/** Sets each fixed face's node to its prescribed temperature (as excess over `reference`). */
export function imposeFixedTemperatures(faces: readonly Face[], excess: Float64Array, reference: number): void {
  for (const face of faces) if (face.condition.kind === 'temperature') excess[face.node] = face.condition.temperature - reference;
}

/**
 * Adds the natural conditions of each face to the conductance matrix and right-hand side, using
 * the film exchange evaluated at the current surface temperature, and returns the essential
 * conditions (as excess temperatures over `reference`) and the film exchanges used. The transient
 * solve uses it; the steady solve linearises the same conditions in tangent-assembly.ts.
 */
export function applyFaceConditions(
  conductance: BandedMatrix,
  rhs: Float64Array,
  faces: readonly Face[],
  excess: ArrayLike<number>,
  reference: number,
): { essential: EssentialCondition[]; films: (FilmExchange | undefined)[] } {
  const essential: EssentialCondition[] = [];
  const films: (FilmExchange | undefined)[] = [];
  for (const face of faces) {
    const c = face.condition;
    let film: FilmExchange | undefined;
    if (c.kind === 'temperature') {
      essential.push({ node: face.node, temperature: c.temperature - reference });
    } else if (c.kind === 'flux') {
      rhs[face.node] += c.flux * face.measure;
    } else {
      film = filmExchangeAt(c, reference + excess[face.node]!);
      conductance.add(face.node, face.node, film.coefficient * face.measure);
      rhs[face.node] += film.coefficient * (film.ambient - reference) * face.measure;
    }
    films.push(film);
  }
  return { essential, films };
}

/** Heat entering the body through a natural-condition face (W/m² or W/m); surface given as excess over reference. */
export function naturalHeatIn(face: Face, film: FilmExchange | undefined, surfaceExcess: number, reference: number): number {
  const c = face.condition;
  if (c.kind === 'flux') return c.flux * face.measure;
  if (c.kind === 'film') return film!.coefficient * (film!.ambient - reference - surfaceExcess) * face.measure;
  throw new Error('naturalHeatIn called on a fixed-temperature face');
}
