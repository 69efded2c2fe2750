/**
 * The tangent Newton's method factors is the Jacobian of the discrete heat balance: −∂imbalance/∂θ,
 * checked entry by entry against central differences of the imbalance itself,
 * (imbalance(θ − h·e_j) − imbalance(θ + h·e_j)) / 2h, whose error is O(h²) (Dennis & Schnabel,
 * Numerical Methods for Unconstrained Optimization and Nonlinear Equations, SIAM 1996, §5.4).
 * The case has everything the tangent carries: λ(T) as a polynomial and as a table, a contact
 * resistance, a film with a fixed coefficient and a film whose coefficient and sink temperature
 * depend on the surface temperature.
 */
import { describe, expect, it } from 'vitest';
import { discretise } from '../../app/fe/discretisation.js';
import { assembleImbalance, assembleTangent, newBalanceWorkspace } from '../../app/fe/tangent-assembly.js';
import type { SteadyProblem } from '../../app/fe/index.js';

const sigma = 5.670374e-8; // CODATA 2018 Stefan–Boltzmann constant

/** The largest difference between tangent and difference quotient, relative to the largest tangent entry in its row. */
function largestRelativeError(problem: SteadyProblem, excessAt: (position: number) => number): number {
  const d = discretise(problem);
  const n = d.mesh.positions.length;
  const theta = Float64Array.from(d.mesh.positions, excessAt);
  const workspace = newBalanceWorkspace(d);
  assembleTangent(d, theta, workspace);
  const tangent = workspace.tangent;
  const probe = newBalanceWorkspace(d);
  const h = 1e-4; // K
  const rowScale = Array.from({ length: n }, (_, i) => Math.max(...Array.from({ length: n }, (_, j) => Math.abs(tangent.get(i, j)))));
  let error = 0;
  for (let j = 0; j < n; j++) {
    const shifted = Float64Array.from(theta);
    shifted[j] = theta[j]! + h;
    assembleImbalance(d, shifted, probe);
    const plus = Float64Array.from(probe.imbalance);
    shifted[j] = theta[j]! - h;
    assembleImbalance(d, shifted, probe);
    for (let i = 0; i < n; i++) {
      const difference = (probe.imbalance[i]! - plus[i]!) / (2 * h);
      error = Math.max(error, Math.abs(difference - tangent.get(i, j)) / rowScale[i]!);
    }
  }
  return error;
}

describe('tangent matrix against a finite-difference Jacobian of the imbalance', () => {
  const film = (ts: number) => {
    // Convection to air at 10 °C plus radiation to surroundings at −5 °C, as one exchange.
    const [T, Tr] = [ts + 273.15, -5 + 273.15];
    const hc = 3 + 1.2 * Math.abs(ts - 10) ** (1 / 3);
    const hr = 0.9 * sigma * (T * T + Tr * Tr) * (T + Tr);
    return { coefficient: hc + hr, ambient: (hc * 10 + hr * -5) / (hc + hr) };
  };
  for (const order of [1, 2] as const) {
    it(`axisymmetric, order ${order}: λ polynomial and table, contact resistance, surface-dependent film`, () => {
      const problem: SteadyProblem = {
        geometry: { kind: 'axisymmetric', innerRadius: 0.04 },
        layers: [
          { thickness: 0.004, conductivity: { kind: 'constant', value: 50 } },
          { thickness: 0.03, conductivity: { kind: 'polynomial', coefficients: [0.034, 1.2e-4, 3e-7] }, contactResistanceToNext: 0.01, elements: 3 },
          { thickness: 0.03, conductivity: { kind: 'table', points: [[-20, 0.03], [60, 0.036], [400, 0.07]] }, elements: 3 },
        ],
        inner: { kind: 'film', coefficient: 900, ambient: 180 },
        outer: { kind: 'film', coefficient: film, ambient: 10 },
        options: { order },
      };
      // A smooth field from 170 °C inside to 35 °C outside (reference 95 °C), off the table's corners.
      expect(largestRelativeError(problem, (r) => 75 - 2000 * (r - 0.04))).toBeLessThan(1e-6);
    });
  }
  it('planar, fixed temperature on one face and heat flux on the other', () => {
    const problem: SteadyProblem = {
      geometry: { kind: 'planar' },
      layers: [{ thickness: 0.08, conductivity: { kind: 'polynomial', coefficients: [0.04, 3e-4] }, elements: 4, heatGeneration: 500 }],
      inner: { kind: 'temperature', temperature: 250 },
      outer: { kind: 'flux', flux: -60 },
    };
    expect(largestRelativeError(problem, (x) => 100 - 1500 * x)).toBeLessThan(1e-6);
  });
});
