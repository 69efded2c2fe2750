/**
 * Observed convergence rates on a mesh sequence against the exact logarithmic solution of a
 * cylindrical layer with fixed face temperatures, θ(r) = θ1 + (θ2−θ1)·ln(r/r1)/ln(r2/r1)
 * (Incropera et al., Fundamentals of Heat and Mass Transfer, eq. 3.26). Theory for Lagrange
 * elements of order p: L2 error of temperature O(h^(p+1)); heat flow recovered from the reactions
 * O(h^(2p)) (error in energy; Strang & Fix, An Analysis of the Finite Element Method, ch. 1–3).
 * Slopes must lie within 0.1 of theory.
 */
import { describe, expect, it } from 'vitest';
import { solveSteady } from '../../app/fe/index.js';
import { interpolate, logLogSlope } from './exact-solutions.js';

const [r1, r2, t1, t2, k] = [0.01, 0.1, 100, 0, 0.5];
const exact = (r: number) => t1 + ((t2 - t1) * Math.log(r / r1)) / Math.log(r2 / r1);
const exactFlow = (2 * Math.PI * k * (t1 - t2)) / Math.log(r2 / r1);

function l2Error(positions: readonly number[], temperatures: readonly number[], order: 1 | 2): number {
  // 8-point composite midpoint-Gauss sampling per element, fine enough not to pollute the rate.
  const g = [-0.9602898565, -0.7966664774, -0.5255324099, -0.1834346425, 0.1834346425, 0.5255324099, 0.7966664774, 0.9602898565];
  const w = [0.1012285363, 0.2223810345, 0.3137066459, 0.3626837834, 0.3626837834, 0.3137066459, 0.2223810345, 0.1012285363];
  let sum = 0;
  for (let e = 0; e < (positions.length - 1) / order; e++) {
    const a = positions[e * order]!;
    const b = positions[(e + 1) * order]!;
    for (let q = 0; q < g.length; q++) {
      const r = a + ((g[q]! + 1) * (b - a)) / 2;
      const d = interpolate(positions, temperatures, order, r) - exact(r);
      sum += w[q]! * d * d * r * ((b - a) / 2);
    }
  }
  return Math.sqrt(sum);
}

describe('observed convergence rates (uniform refinement of a graded mesh)', () => {
  for (const order of [1, 2] as const) {
    it(`order ${order}: temperature L2 error slope ${order + 1}, heat flow slope ${2 * order}`, () => {
      const counts = order === 1 ? [4, 8, 16, 32, 64] : [2, 4, 8, 16];
      const runs = counts.map((n) =>
        solveSteady({
          geometry: { kind: 'axisymmetric', innerRadius: r1 },
          layers: [{ thickness: r2 - r1, conductivity: { kind: 'constant', value: k }, elements: n }],
          inner: { kind: 'temperature', temperature: t1 },
          outer: { kind: 'temperature', temperature: t2 },
          options: { order },
        }),
      );
      const h = counts.map((n) => 1 / n);
      const tempErrors = runs.map((r) => l2Error(r.positions, r.temperatures, order));
      const flowErrors = runs.map((r) => Math.abs(r.faces.inner.heatIn - exactFlow));
      expect(Math.abs(logLogSlope(h, tempErrors) - (order + 1))).toBeLessThan(0.1);
      expect(Math.abs(logLogSlope(h, flowErrors) - 2 * order)).toBeLessThan(0.1);
    });
  }
});

describe('observed convergence rate with temperature-dependent conductivity', () => {
  // λ = λ0(1 + βθ) across a cylindrical layer: the exact heat flow is Q' = 2πλm(θ1 − θ2)/ln(r2/r1)
  // with λm = λ0(1 + β(θ1 + θ2)/2) (Kirchhoff transform; Carslaw & Jaeger §1.7, Incropera §3.2).
  // Picard iteration converges to the discrete solution, whose heat-flow error must still fall as h^(2p).
  for (const order of [1, 2] as const) {
    it(`order ${order}: heat-flow slope ${2 * order}`, () => {
      const [lambda0, beta, ta, tb] = [0.04, 3e-3, 350, 20];
      const exactQ = (2 * Math.PI * lambda0 * (1 + (beta * (ta + tb)) / 2) * (ta - tb)) / Math.log(r2 / r1);
      const counts = order === 1 ? [4, 8, 16, 32, 64] : [2, 4, 8, 16];
      const errors = counts.map((n) => {
        const r = solveSteady({
          geometry: { kind: 'axisymmetric', innerRadius: r1 },
          layers: [{ thickness: r2 - r1, conductivity: { kind: 'polynomial', coefficients: [lambda0, lambda0 * beta] }, elements: n }],
          inner: { kind: 'temperature', temperature: ta },
          outer: { kind: 'temperature', temperature: tb },
          options: { order },
        });
        return Math.abs(r.faces.inner.heatIn - exactQ);
      });
      expect(Math.abs(logLogSlope(counts.map((n) => 1 / n), errors) - 2 * order)).toBeLessThan(0.1);
    });
  }
});
