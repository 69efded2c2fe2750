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
 * Adds the natural conditions of each face to the conductance matrix and right-hand side, using
 * the film exchange evaluated at the current surface temperature, and returns the essential
 * conditions (as excess temperatures over `reference`) and the film exchanges used.
 */
export function applyFaceConditions(
  conductance: BandedMatrix,
  rhs: Float64Array,
  faces: readonly Face[],
  excess: ArrayLike<number>,
  reference: number,
): { essential: EssentialCondition[]; films: (FilmExchange | undefined)[]; filmDiagonal: Float64Array } {
  const essential: EssentialCondition[] = [];
  const films: (FilmExchange | undefined)[] = [];
  const filmDiagonal = new Float64Array(rhs.length);
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
      filmDiagonal[face.node] += film.coefficient * face.measure;
      rhs[face.node] += film.coefficient * (film.ambient - reference) * face.measure;
    }
    films.push(film);
  }
  return { essential, films, filmDiagonal };
}

/** Heat entering the body through a natural-condition face (W/m² or W/m); surface given as excess over reference. */
export function naturalHeatIn(face: Face, film: FilmExchange | undefined, surfaceExcess: number, reference: number): number {
  const c = face.condition;
  if (c.kind === 'flux') return c.flux * face.measure;
  if (c.kind === 'film') return film!.coefficient * (film!.ambient - reference - surfaceExcess) * face.measure;
  throw new Error('naturalHeatIn called on a fixed-temperature face');
}
