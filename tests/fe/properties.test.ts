/**
 * Invariants of steady conduction through random layer stacks (fast-check). Reference for the flux:
 * the series-resistance solution q = Δθ / Σ(d/λ) (Incropera et al., ch. 3, eq. 3.19 and §3.1.2).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { solveSteady, type Layer } from '../../app/fe/index.js';

const layerArb = fc.record({
  thickness: fc.double({ min: 0.001, max: 1, noNaN: true }),
  k: fc.double({ min: 0.01, max: 400, noNaN: true }),
});
const stackArb = fc.array(layerArb, { minLength: 1, maxLength: 8 });
const tempArb = fc.double({ min: -60, max: 600, noNaN: true });

/**
 * The accuracy float64 allows for a heat flow read off a stack: a temperature near θ carries a
 * rounding error of ε|θ|, and the flow through the stiffest layer is its conductance k/d times a
 * temperature difference, so relative errors of order ε·κ with κ = max(k/d)·Σ(d/k) are the floor
 * (the condition number of the series network; Higham, Accuracy and Stability of Numerical
 * Algorithms, ch. 9 on tridiagonal systems). Below κ ≈ 1e5 the bar is the plain 1e-9.
 */
function accuracyBar(stack: { thickness: number; k: number }[]): number {
  const kappa = Math.max(...stack.map((l) => l.k / l.thickness)) * stack.reduce((s, l) => s + l.thickness / l.k, 0);
  return 1e-9 + 8 * Number.EPSILON * kappa;
}

const toLayers = (stack: { thickness: number; k: number }[]): Layer[] =>
  stack.map((l) => ({ thickness: l.thickness, conductivity: { kind: 'constant', value: l.k } }));

function solvePlanar(stack: { thickness: number; k: number }[], t1: number, t2: number) {
  return solveSteady({ geometry: { kind: 'planar' }, layers: toLayers(stack), inner: { kind: 'temperature', temperature: t1 }, outer: { kind: 'temperature', temperature: t2 } });
}

describe('random layer stacks (1–8 layers, 1 mm–1 m, 0.01–400 W/mK)', () => {
  it('match the series-resistance flux, with equal flux at every interface and a closed balance', () => {
    fc.assert(
      fc.property(stackArb, tempArb, tempArb, (stack, t1, t2) => {
        fc.pre(Math.abs(t1 - t2) > 1e-3);
        const r = solvePlanar(stack, t1, t2);
        const q = (t1 - t2) / stack.reduce((s, l) => s + l.thickness / l.k, 0);
        const scale = Math.abs(q);
        const bar = accuracyBar(stack);
        expect(Math.abs(r.faces.inner.heatIn - q) / scale).toBeLessThan(bar);
        for (const i of r.interfaces) expect(Math.abs(i.heatFlow - q) / scale).toBeLessThan(bar);
        expect(r.balance.relativeResidual).toBeLessThan(bar);
      }),
      { numRuns: 200 },
    );
  });
  it('temperature is monotone between the faces', () => {
    fc.assert(
      fc.property(stackArb, tempArb, tempArb, fc.boolean(), (stack, t1, t2, axisymmetric) => {
        const r = axisymmetric
          ? solveSteady({ geometry: { kind: 'axisymmetric', innerRadius: 0.01 }, layers: toLayers(stack), inner: { kind: 'temperature', temperature: t1 }, outer: { kind: 'temperature', temperature: t2 } })
          : solvePlanar(stack, t1, t2);
        const sign = Math.sign(t2 - t1);
        const tol = 1e-9 * (1 + Math.abs(t1) + Math.abs(t2));
        for (let i = 1; i < r.temperatures.length; i++) expect(sign * (r.temperatures[i]! - r.temperatures[i - 1]!)).toBeGreaterThanOrEqual(-tol);
      }),
      { numRuns: 150 },
    );
  });
  it('reversing the layer order leaves the planar flux unchanged', () => {
    fc.assert(
      fc.property(stackArb, tempArb, tempArb, (stack, t1, t2) => {
        fc.pre(Math.abs(t1 - t2) > 1e-3);
        const a = solvePlanar(stack, t1, t2).faces.inner.heatIn;
        const b = solvePlanar([...stack].reverse(), t1, t2).faces.inner.heatIn;
        expect(Math.abs(a - b) / Math.abs(a)).toBeLessThan(2 * accuracyBar(stack));
      }),
      { numRuns: 150 },
    );
  });
  it('flux is linear in the temperature difference for constant conductivity', () => {
    fc.assert(
      fc.property(stackArb, tempArb, fc.double({ min: 0.1, max: 10, noNaN: true }), (stack, t2, factor) => {
        const q1 = solvePlanar(stack, t2 + 10, t2).faces.inner.heatIn;
        const q2 = solvePlanar(stack, t2 + 10 * factor, t2).faces.inner.heatIn;
        expect(Math.abs(q2 - factor * q1) / Math.abs(q2)).toBeLessThan(2 * accuracyBar(stack));
      }),
      { numRuns: 100 },
    );
  });
});
