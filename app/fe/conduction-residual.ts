/**
 * Residuals of the conduction equations, written in difference form.
 *
 * A conduction matrix has zero row sums (a uniform temperature conducts no heat), so
 * (K·T)_i = Σ_{j≠i} K_ij (T_j − T_i). Evaluating it that way avoids subtracting large, nearly
 * equal products when a thin, highly conductive layer (a steel pipe wall, a metal jacket) sits
 * next to insulation, which would otherwise cost several digits in the heat flows and the balance.
 */
import type { BandedMatrix } from './banded-matrix.js';

/** Σ_{j≠i} K_ij (T_j − T_i) for row i, i.e. the conduction part of (K·T)_i. */
export function conductionRowProduct(matrix: BandedMatrix, temperatures: ArrayLike<number>, row: number): number {
  const p = matrix.halfBandwidth;
  const ti = temperatures[row]!;
  let sum = 0;
  for (let j = Math.max(0, row - p); j <= Math.min(matrix.size - 1, row + p); j++) {
    if (j !== row) sum += matrix.get(row, j) * (temperatures[j]! - ti);
  }
  return sum;
}

/**
 * r = rhs − K·T for a conduction matrix K whose only non-zero row sums come from `diagonalExtra`
 * (film coefficients times the face measure).
 */
export function conductionResidual(
  matrix: BandedMatrix,
  rhs: ArrayLike<number>,
  diagonalExtra: ArrayLike<number>,
  temperatures: ArrayLike<number>,
): Float64Array {
  const r = new Float64Array(matrix.size);
  for (let i = 0; i < matrix.size; i++) {
    r[i] = rhs[i]! - diagonalExtra[i]! * temperatures[i]! - conductionRowProduct(matrix, temperatures, i);
  }
  return r;
}
