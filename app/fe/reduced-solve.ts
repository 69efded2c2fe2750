/**
 * Stages 1 and 2 of a time step: set the essential (fixed-temperature) nodes aside, move their
 * known temperatures to the right-hand side, and solve the reduced band system for the remaining
 * nodes. Stage 3 (the heat in at a fixed face) reads the rows that were set aside; see
 * transient-solve.ts. The steady solve does the same on Newton corrections (newton-iteration.ts).
 */
import { BandedMatrix, solveBanded, ZeroPivotError } from './banded-matrix.js';
import { SingularProblemError } from './errors.js';
import type { EssentialCondition } from './face-conditions.js';

export function solveWithEssentialConditions(
  matrix: BandedMatrix,
  rhs: Float64Array,
  essential: readonly EssentialCondition[],
): Float64Array {
  const n = matrix.size;
  const p = matrix.halfBandwidth;
  const fixed = new Float64Array(n).fill(Number.NaN);
  for (const e of essential) fixed[e.node] = e.temperature;

  // Stage 1: number the free nodes in order (this keeps the band), and condense the known temperatures.
  const freeIndex = new Int32Array(n).fill(-1);
  const freeNodes: number[] = [];
  for (let i = 0; i < n; i++) {
    if (Number.isNaN(fixed[i]!)) {
      freeIndex[i] = freeNodes.length;
      freeNodes.push(i);
    }
  }
  const reduced = new BandedMatrix(freeNodes.length, p);
  const reducedRhs = new Float64Array(freeNodes.length);
  for (let fi = 0; fi < freeNodes.length; fi++) {
    const i = freeNodes[fi]!;
    let b = rhs[i]!;
    for (let j = Math.max(0, i - p); j <= Math.min(n - 1, i + p); j++) {
      const a = matrix.get(i, j);
      if (a === 0) continue;
      if (freeIndex[j]! >= 0) reduced.add(fi, freeIndex[j]!, a);
      else b -= a * fixed[j]!;
    }
    reducedRhs[fi] = b;
  }

  // Stage 2: the reduced band solve.
  let freeValues: Float64Array;
  try {
    freeValues = freeNodes.length > 0 ? solveBanded(reduced, reducedRhs) : new Float64Array(0);
  } catch (error) {
    if (error instanceof ZeroPivotError) {
      throw new SingularProblemError(
        'inner and outer leave the temperature level undetermined: give at least one face a fixed temperature or a film with a coefficient greater than 0 W/(m²·K).',
      );
    }
    throw error;
  }

  const temperatures = new Float64Array(n);
  for (let i = 0; i < n; i++) temperatures[i] = freeIndex[i]! >= 0 ? freeValues[freeIndex[i]!]! : fixed[i]!;
  return temperatures;
}
