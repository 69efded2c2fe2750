/**
 * Newton's method on the nonlinear steady problem: the correction it takes shrinks quadratically
 * near the solution, |δ_{k+1}| ≈ C·|δ_k|², so the observed order log(|δ_{k+1}|/|δ_k|) /
 * log(|δ_k|/|δ_{k−1}|) approaches 2 (Dennis & Schnabel, Numerical Methods for Unconstrained
 * Optimization and Nonlinear Equations, SIAM 1996, Theorem 5.2.1; Kelley, Iterative Methods for
 * Linear and Nonlinear Equations, SIAM 1995, §5.1). The change of each iteration is read from the
 * ConvergenceError raised when the iteration limit stops the solve after that iteration.
 */
import { describe, expect, it } from 'vitest';
import { ConvergenceError, solveSteady, type SteadyProblem } from '../../app/fe/index.js';

const sigma = 5.670374e-8; // CODATA 2018 Stefan–Boltzmann constant

/** The largest temperature change of iterations 1, 2, … until the solve converges (then its last change). */
function changesPerIteration(problem: SteadyProblem): number[] {
  const changes: number[] = [];
  for (let limit = 1; limit <= 50; limit++) {
    try {
      const result = solveSteady({ ...problem, options: { ...problem.options, maxIterations: limit } });
      changes.push(result.lastChange);
      return changes;
    } catch (error) {
      if (!(error instanceof ConvergenceError)) throw error;
      changes.push(error.lastChange);
    }
  }
  throw new Error('did not converge in 50 iterations');
}

/** Observed orders between the changes that lie in the asymptotic range (below 1 K, above round-off). */
function observedOrders(changes: number[]): number[] {
  const orders: number[] = [];
  for (let k = 1; k + 1 < changes.length; k++) {
    const [a, b, c] = [changes[k - 1]!, changes[k]!, changes[k + 1]!];
    if (b < 1 && c > 1e-12) orders.push(Math.log(c / b) / Math.log(b / a));
  }
  return orders;
}

describe('Newton iteration converges quadratically', () => {
  it('λ(θ) quadratic in θ across a two-layer pipe with fixed face temperatures', () => {
    const changes = changesPerIteration({
      geometry: { kind: 'axisymmetric', innerRadius: 0.05 },
      layers: [
        { thickness: 0.04, conductivity: { kind: 'polynomial', coefficients: [0.034, 1.2e-4, 3e-7] } },
        { thickness: 0.06, conductivity: { kind: 'polynomial', coefficients: [0.03, 2e-4] } },
      ],
      inner: { kind: 'temperature', temperature: 450 },
      outer: { kind: 'temperature', temperature: 10 },
    });
    const orders = observedOrders(changes);
    expect(orders.length).toBeGreaterThan(0);
    for (const p of orders) expect(Math.abs(p - 2)).toBeLessThan(0.3);
    expect(changes.length).toBeLessThanOrEqual(7);
  });

  it('λ(θ) layer under a convection-plus-radiation film (the film slope by forward difference)', () => {
    const film = (ts: number) => {
      const [T, Ta] = [ts + 273.15, 15 + 273.15];
      return 2.5 + 1.3 * Math.abs(ts - 15) ** (1 / 3) + 0.85 * sigma * (T * T + Ta * Ta) * (T + Ta);
    };
    const changes = changesPerIteration({
      geometry: { kind: 'axisymmetric', innerRadius: 0.06 },
      layers: [{ thickness: 0.03, conductivity: { kind: 'polynomial', coefficients: [0.035, 1.5e-4, 2e-7] } }],
      inner: { kind: 'temperature', temperature: 300 },
      outer: { kind: 'film', coefficient: film, ambient: 15 },
    });
    const orders = observedOrders(changes);
    expect(orders.length).toBeGreaterThan(0);
    // A forward-difference slope is exact to ~1e-8 of itself, which leaves the order close to 2.
    for (const p of orders) expect(Math.abs(p - 2)).toBeLessThan(0.3);
    expect(changes.length).toBeLessThanOrEqual(7);
  });
});
