/**
 * A film whose coefficient depends on the surface temperature (here: convection plus the exact
 * radiation coefficient εσ(Ts²+Tr²)(Ts+Tr), radiation physics as in Incropera §1.2.3) around an
 * insulated pipe with a fixed inner temperature. Reference: the single surface-temperature equation
 * Q' = 2πλ(θi − θs)/ln(r2/r1) = 2πr2·h(θs)(θs − θa), solved here independently by bisection.
 */
import { describe, expect, it } from 'vitest';
import { ConvergenceError, solveSteady, type SteadyProblem } from '../../app/fe/index.js';

const sigma = 5.670374e-8; // CODATA 2018 Stefan–Boltzmann constant
const h = (ts: number) => {
  const [T, Ta] = [ts + 273.15, 20 + 273.15];
  return 3 + 1.2 * Math.abs(ts - 20) ** (1 / 3) + 0.9 * sigma * (T * T + Ta * Ta) * (T + Ta);
};
const [r1, r2, lambda, ti, ta] = [0.0575, 0.1075, 0.045, 160, 20];

function bisect(f: (x: number) => number, lo: number, hi: number): number {
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (f(lo) * f(mid) <= 0) hi = mid;
    else lo = mid;
  }
  return (lo + hi) / 2;
}

const problem: SteadyProblem = {
  geometry: { kind: 'axisymmetric', innerRadius: r1 },
  layers: [{ thickness: r2 - r1, conductivity: { kind: 'constant', value: lambda } }],
  inner: { kind: 'temperature', temperature: ti },
  outer: { kind: 'film', coefficient: h, ambient: ta },
};

describe('surface-temperature-dependent film', () => {
  it('matches the independently solved surface balance', () => {
    const ts = bisect((s) => (2 * Math.PI * lambda * (ti - s)) / Math.log(r2 / r1) - 2 * Math.PI * r2 * h(s) * (s - ta), ta, ti);
    const q = (2 * Math.PI * lambda * (ti - ts)) / Math.log(r2 / r1);
    const r = solveSteady(problem);
    expect(Math.abs(r.faces.outer.temperature - ts)).toBeLessThan(1e-6);
    expect(Math.abs(r.faces.inner.heatIn - q) / q).toBeLessThan(1e-6);
    expect(r.faces.outer.film!.coefficient).toBeCloseTo(h(ts), 6);
    expect(r.iterations).toBeGreaterThan(2);
    expect(r.balance.relativeResidual).toBeLessThan(1e-9);
  });
  it('a film function may return its own sink temperature (convection to air, radiation to other surroundings)', () => {
    // h_c = 4 to air at 20 °C, h_r = 5 to surroundings at 0 °C: sink = (4·20 + 5·0)/9, h = 9.
    const r = solveSteady({ ...problem, outer: { kind: 'film', coefficient: () => ({ coefficient: 9, ambient: 80 / 9 }), ambient: 20 } });
    const R = Math.log(r2 / r1) / (2 * Math.PI * lambda) + 1 / (2 * Math.PI * r2 * 9);
    expect(Math.abs(r.faces.inner.heatIn - (ti - 80 / 9) / R) / r.faces.inner.heatIn).toBeLessThan(1e-9);
  });
  it('raises a convergence error with the last change when the iteration limit is too low', () => {
    expect(() => solveSteady({ ...problem, options: { maxIterations: 2 } })).toThrowError(ConvergenceError);
    try {
      solveSteady({ ...problem, options: { maxIterations: 2 } });
    } catch (e) {
      expect((e as ConvergenceError).lastChange).toBeGreaterThan(1e-10);
      expect((e as Error).message).toMatch(/did not converge in 2 iterations: the last temperature change was .* K against a tolerance of 1e-10 K, leaving a nodal heat imbalance of up to .* W\/m\./);
    }
  });
});
