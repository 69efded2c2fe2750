/**
 * The O(n) band solver against ml-matrix's dense LU decomposition (npm ml-matrix, a general-purpose
 * reference library) on random diagonally dominant tridiagonal and pentadiagonal systems.
 */
import fc from 'fast-check';
import { LuDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { BandedMatrix, solveBanded } from '../../app/fe/index.js';

function randomSystem(n: number, p: number, values: number[]) {
  const band = new BandedMatrix(n, p);
  const dense = Matrix.zeros(n, n);
  let v = 0;
  const next = () => values[v++ % values.length]!;
  for (let i = 0; i < n; i++) {
    let off = 0;
    for (let j = Math.max(0, i - p); j <= Math.min(n - 1, i + p); j++) {
      if (j === i) continue;
      const a = next();
      band.set(i, j, a);
      dense.set(i, j, a);
      off += Math.abs(a);
    }
    const d = off + 0.5 + Math.abs(next());
    band.set(i, i, d);
    dense.set(i, i, d);
  }
  const rhs = Array.from({ length: n }, () => next() * 10);
  return { band, dense, rhs };
}

describe('band solver versus ml-matrix dense LU', () => {
  for (const p of [1, 2]) {
    it(`half-bandwidth ${p}: same solution on random diagonally dominant systems`, () => {
      fc.assert(
        fc.property(
          fc.integer({ min: 1, max: 60 }),
          fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: 10, maxLength: 50 }),
          (n, values) => {
            const { band, dense, rhs } = randomSystem(n, p, values);
            const x = solveBanded(band, rhs);
            const reference = new LuDecomposition(dense).solve(Matrix.columnVector(rhs)).to1DArray();
            const scale = Math.max(1, ...reference.map(Math.abs));
            reference.forEach((r, i) => expect(Math.abs(x[i]! - r) / scale).toBeLessThan(1e-10));
          },
        ),
        { numRuns: 200 },
      );
    });
  }
  it('reports a vanishing pivot instead of returning garbage', () => {
    const m = new BandedMatrix(2, 1);
    m.set(0, 0, 1);
    m.set(0, 1, 1);
    m.set(1, 0, 1);
    m.set(1, 1, 1);
    expect(() => solveBanded(m, [1, 2])).toThrowError(/singular/);
  });
});
