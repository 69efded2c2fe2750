/**
 * Uniform heat generation and temperature-dependent conductivity.
 * - Slab with generation, fixed faces: T(x) = T1 + (T2−T1)x/L + q̇x(L−x)/(2k)
 *   (Incropera et al., Fundamentals of Heat and Mass Transfer, §3.5.1, eq. 3.41).
 * - Cylinder with generation: T(r) = −q̇r²/(4k) + A ln r + B (Incropera §3.5.2, eq. 3.51–3.53 with two
 *   fixed surface temperatures; A and B from the two face conditions).
 * - Conductivity linear in temperature, λ = λ0(1 + βθ): the Kirchhoff transform gives the exact flow
 *   with the integral-mean conductivity λm = λ0(1 + β(θ1+θ2)/2): q = λm(θ1−θ2)/L (plane) and
 *   Q' = 2πλm(θ1−θ2)/ln(r2/r1) (cylinder) (Incropera §3.2 and problem 3.2x; Carslaw & Jaeger §1.7).
 */
import { describe, expect, it } from 'vitest';
import { solveSteady } from '../../app/fe/index.js';

describe('uniform heat generation (Incropera §3.5)', () => {
  const k = 0.8;
  const q = 2.5e4; // W/m³
  it('slab: exact parabola at every node; reactions add up to the heat generated', () => {
    const L = 0.12;
    for (const order of [1, 2] as const) {
      const r = solveSteady({
        geometry: { kind: 'planar' },
        layers: [{ thickness: L, conductivity: { kind: 'constant', value: k }, heatGeneration: q }],
        inner: { kind: 'temperature', temperature: 40 },
        outer: { kind: 'temperature', temperature: 10 },
        options: { order },
      });
      const exact = (x: number) => 40 + (10 - 40) * (x / L) + (q * x * (L - x)) / (2 * k);
      r.positions.forEach((x, i) => expect(Math.abs(r.temperatures[i]! - exact(x))).toBeLessThan(1e-6));
      // Heat in at x = 0 is −kT'(0); at x = L it is +kT'(L).
      expect(r.faces.inner.reaction!).toBeCloseTo((k * (40 - 10)) / L - (q * L) / 2, 6);
      expect(r.faces.outer.reaction!).toBeCloseTo((k * (10 - 40)) / L - (q * L) / 2, 6);
      expect(Math.abs(r.faces.inner.reaction! + r.faces.outer.reaction! + q * L) / (q * L)).toBeLessThan(1e-9);
      expect(r.balance.generated).toBeCloseTo(q * L, 9);
      expect(r.balance.relativeResidual).toBeLessThan(1e-9);
    }
  });
  it('cylinder: exact profile; reactions add up to the heat generated per metre', () => {
    const [r1, r2, t1, t2] = [0.02, 0.07, 60, 15];
    const A = (t2 - t1 + (q * (r2 * r2 - r1 * r1)) / (4 * k)) / Math.log(r2 / r1);
    const B = t1 + (q * r1 * r1) / (4 * k) - A * Math.log(r1);
    const exact = (r: number) => (-q * r * r) / (4 * k) + A * Math.log(r) + B;
    const res = solveSteady({
      geometry: { kind: 'axisymmetric', innerRadius: r1 },
      layers: [{ thickness: r2 - r1, conductivity: { kind: 'constant', value: k }, heatGeneration: q }],
      inner: { kind: 'temperature', temperature: t1 },
      outer: { kind: 'temperature', temperature: t2 },
    });
    res.positions.forEach((r, i) => expect(Math.abs(res.temperatures[i]! - exact(r))).toBeLessThan(1e-6));
    const generated = q * Math.PI * (r2 * r2 - r1 * r1);
    // Heat in at r1: πq̇r1² − 2πkA; at r2: −πq̇r2² + 2πkA (from T'(r) = −q̇r/(2k) + A/r).
    expect(Math.abs(res.faces.inner.reaction! - (Math.PI * q * r1 * r1 - 2 * Math.PI * k * A)) / generated).toBeLessThan(1e-6);
    expect(Math.abs(res.faces.outer.reaction! - (-Math.PI * q * r2 * r2 + 2 * Math.PI * k * A)) / generated).toBeLessThan(1e-6);
    expect(Math.abs(res.faces.inner.reaction! + res.faces.outer.reaction! + generated) / generated).toBeLessThan(1e-9);
    expect(res.balance.relativeResidual).toBeLessThan(1e-9);
  });
});

describe('conductivity linear in temperature (Kirchhoff transform)', () => {
  const lambda0 = 0.035;
  const beta = 4e-3; // 1/K, so λ(θ) = 0.035 + 1.4e-4·θ
  const model = { kind: 'polynomial' as const, coefficients: [lambda0, lambda0 * beta] };
  const lambdaMean = (a: number, b: number) => lambda0 * (1 + (beta * (a + b)) / 2);
  for (const order of [1, 2] as const) {
    it(`plane layer, order ${order}`, () => {
      const L = 0.08;
      const r = solveSteady({ geometry: { kind: 'planar' }, layers: [{ thickness: L, conductivity: model }], inner: { kind: 'temperature', temperature: 250 }, outer: { kind: 'temperature', temperature: 30 }, options: { order } });
      const exact = (lambdaMean(250, 30) * 220) / L;
      expect(Math.abs(r.faces.inner.heatIn - exact) / exact).toBeLessThan(1e-6);
      expect(r.iterations).toBeGreaterThan(1);
      expect(r.lastChange).toBeLessThanOrEqual(1e-10);
      expect(r.balance.relativeResidual).toBeLessThan(1e-9);
      // The layer's effective conductivity is the integral mean (Kirchhoff).
      expect(Math.abs(r.layers[0]!.effectiveConductivity! - lambdaMean(250, 30)) / lambdaMean(250, 30)).toBeLessThan(1e-6);
    });
    it(`cylindrical layer, two layers, order ${order}`, () => {
      // Two layers with the same curve: the interface temperature comes from equal flows, then each layer obeys Kirchhoff.
      const r = solveSteady({
        geometry: { kind: 'axisymmetric', innerRadius: 0.0301 },
        layers: [{ thickness: 0.04, conductivity: model }, { thickness: 0.05, conductivity: { kind: 'table', points: [[-50, 0.02], [400, 0.11]] } }],
        inner: { kind: 'temperature', temperature: 300 },
        outer: { kind: 'temperature', temperature: 20 },
        options: { order },
      });
      const ti = r.interfaces[0]!.temperatureInnerSide;
      const exact1 = (2 * Math.PI * lambdaMean(300, ti) * (300 - ti)) / Math.log(0.0701 / 0.0301);
      // The table is linear between its two points: λ(θ) = 0.02 + 2e-4·(θ + 50); mean over [ti, 20].
      const lam2 = 0.02 + 2e-4 * ((ti + 20) / 2 + 50);
      const exact2 = (2 * Math.PI * lam2 * (ti - 20)) / Math.log(0.1201 / 0.0701);
      expect(Math.abs(r.faces.inner.heatIn - exact1) / exact1).toBeLessThan(1e-6);
      expect(Math.abs(-r.faces.outer.heatIn - exact2) / exact2).toBeLessThan(1e-6);
      expect(r.balance.relativeResidual).toBeLessThan(1e-9);
    });
  }
});
