import { Matrix, solve } from 'ml-matrix';
import type { ConductivityFit } from '../../app/api/material-types.js';
import { assertPolynomialPositive, MATERIAL_LIMITS } from './material-validation.js';
import { InputError } from '../../app/index.js';
import { requireNumber } from './validate.js';

/**
 * Least-squares polynomial through data-sheet points (mean temperature °C, conductivity W/(m·K)),
 * the way insulation curves are published: λ(θ) = a0 + a1·θ + a2·θ² (+ a3·θ³).
 *
 * The temperatures are divided by a scale before building the Vandermonde matrix so its columns
 * have similar size (θ³ at 600 °C would otherwise dwarf the constant column); the coefficients are
 * scaled back exactly afterwards. ml-matrix solves the over-determined system by QR.
 */
export type { ConductivityFit };

export interface FitOptions {
  readonly degree: number;
  /** The material's service range: the fitted curve must stay positive on all of it. */
  readonly minServiceTemperature: number;
  readonly maxServiceTemperature: number;
}

export function fitConductivityCurve(points: unknown, options: FitOptions): ConductivityFit {
  const degree = requireNumber(options.degree, 'degree', { min: 1, max: 3, unit: '' });
  if (!Number.isInteger(degree)) throw new InputError('degree', 'degree must be 1, 2 or 3.');
  const low = requireNumber(options.minServiceTemperature, 'minServiceTemperature', MATERIAL_LIMITS.temperature);
  const high = requireNumber(options.maxServiceTemperature, 'maxServiceTemperature', MATERIAL_LIMITS.temperature);
  if (low >= high) throw new InputError('maxServiceTemperature', `maxServiceTemperature must be above minServiceTemperature (${low} °C).`);
  if (!Array.isArray(points) || points.length > MATERIAL_LIMITS.maxTablePoints) {
    throw new InputError('points', `points must be a list of at most ${MATERIAL_LIMITS.maxTablePoints} [°C, W/(m·K)] pairs.`);
  }
  const data = points.map((p, i): [number, number] => {
    if (!Array.isArray(p) || p.length !== 2) throw new InputError(`points[${i}]`, `points[${i}] must be a [°C, W/(m·K)] pair.`);
    return [
      requireNumber(p[0], `points[${i}] temperature`, MATERIAL_LIMITS.temperature),
      requireNumber(p[1], `points[${i}] conductivity`, MATERIAL_LIMITS.conductivity),
    ];
  });
  const distinct = new Set(data.map((p) => p[0])).size;
  if (distinct < degree + 1) {
    throw new InputError('points', `points must include at least ${degree + 1} different temperatures for a degree-${degree} fit (got ${distinct}).`);
  }

  const scale = Math.max(1, ...data.map((p) => Math.abs(p[0])));
  const vandermonde = new Matrix(data.map(([t]) => Array.from({ length: degree + 1 }, (_, j) => (t / scale) ** j)));
  const values = Matrix.columnVector(data.map((p) => p[1]));
  const scaled = solve(vandermonde, values).getColumn(0);
  const coefficients = scaled.map((c, j) => c / scale ** j);

  const evaluate = (t: number) => coefficients.reduceRight((acc, c) => acc * t + c, 0);
  const residuals = data.map(([t, k]) => evaluate(t) - k);
  const rmsResidual = Math.sqrt(residuals.reduce((s, r) => s + r * r, 0) / residuals.length);
  const maxResidual = Math.max(...residuals.map(Math.abs));
  assertPolynomialPositive(coefficients, low, high);
  return { model: { kind: 'polynomial', coefficients }, rmsResidual, maxResidual, residuals };
}
