/**
 * The exact steady element (one per layer, when the caller leaves the mesh to the engine and no
 * layer generates heat) against the Kirchhoff transform, computed here independently of the
 * engine: with U(θ) = ∫λ dθ, the steady flow through a layer is (U(θ_1) − U(θ_2))/d per m² of a
 * plane layer and 2π(U(θ_1) − U(θ_2))/ln(r_2/r_1) per metre of a cylinder (Carslaw & Jaeger,
 * Conduction of Heat in Solids, §1.7; Incropera et al., Fundamentals of Heat and Mass Transfer,
 * §3.2 and §3.3, variable conductivity). Two layers between fixed faces: the interface temperature
 * is where both layers carry the same flow, found here by bisection on the closed-form integrals.
 */
import { describe, expect, it } from 'vitest';
import { solveSteady, type ConductivityModel } from '../../app/fe/index.js';
import { exactLayerProfile } from '../../app/fe/exact-layer-profile.js';

/** ∫_0^θ λ, written from the model's definition (antiderivative of the polynomial; trapezoids of the table). */
function kirchhoff(model: ConductivityModel, theta: number): number {
  if (model.kind === 'constant') return model.value * theta;
  if (model.kind === 'polynomial') return model.coefficients.reduce((sum, a, i) => sum + (a * theta ** (i + 1)) / (i + 1), 0);
  const p = model.points;
  // Held constant beyond the ends; straight between points.
  const at = (x: number) => {
    if (x <= p[0]![0]) return p[0]![1];
    if (x >= p[p.length - 1]![0]) return p[p.length - 1]![1];
    const i = p.findIndex((q) => q[0] > x) - 1;
    return p[i]![1] + ((p[i + 1]![1] - p[i]![1]) * (x - p[i]![0])) / (p[i + 1]![0] - p[i]![0]);
  };
  const stops = [0, ...p.map((q) => q[0]).filter((x) => x > Math.min(0, theta) && x < Math.max(0, theta)), theta].sort((a, b) => a - b);
  let integral = 0;
  for (let i = 1; i < stops.length; i++) integral += ((at(stops[i - 1]!) + at(stops[i]!)) / 2) * (stops[i]! - stops[i - 1]!);
  return theta >= 0 ? integral : -integral;
}

function bisect(f: (x: number) => number, lo: number, hi: number): number {
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (Math.sign(f(mid)) === Math.sign(f(lo))) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

const polynomial: ConductivityModel = { kind: 'polynomial', coefficients: [0.0337, 1.1e-4, 1.7e-7] };
const table: ConductivityModel = { kind: 'table', points: [[-20, 0.031], [40, 0.036], [150, 0.05], [300, 0.082]] };

describe('one exact element per layer reproduces the Kirchhoff solution', () => {
  for (const geometry of [{ kind: 'planar' } as const, { kind: 'axisymmetric', innerRadius: 0.0571 } as const]) {
    it(`${geometry.kind}: polynomial then table λ(θ), 350 °C to 20 °C: flow and interface temperature to 1e-10`, () => {
      const [d1, d2, t1, t3] = [0.06, 0.05, 350, 20];
      const factor = (x1: number, x2: number) => (geometry.kind === 'planar' ? 1 / (x2 - x1) : (2 * Math.PI) / Math.log(x2 / x1));
      const x0 = geometry.kind === 'planar' ? 0 : geometry.innerRadius;
      const [g1, g2] = [factor(x0, x0 + d1), factor(x0 + d1, x0 + d1 + d2)];
      const flow1 = (t2: number) => g1 * (kirchhoff(polynomial, t1) - kirchhoff(polynomial, t2));
      const flow2 = (t2: number) => g2 * (kirchhoff(table, t2) - kirchhoff(table, t3));
      const t2 = bisect((t) => flow1(t) - flow2(t), t3, t1);

      const r = solveSteady({
        geometry,
        layers: [
          { thickness: d1, conductivity: polynomial },
          { thickness: d2, conductivity: table },
        ],
        inner: { kind: 'temperature', temperature: t1 },
        outer: { kind: 'temperature', temperature: t3 },
      });
      expect(r.mesh.elementsPerLayer).toEqual([1, 1]);
      expect(r.mesh.nodeCount).toBe(3);
      expect(Math.abs(r.faces.inner.heatIn - flow1(t2)) / flow1(t2)).toBeLessThan(1e-10);
      expect(Math.abs(r.interfaces[0]!.temperatureInnerSide - t2)).toBeLessThan(1e-9);
      expect(r.balance.relativeResidual).toBeLessThan(1e-12);
      // Newton on the exact tangent: a handful of iterations.
      expect(r.iterations).toBeLessThanOrEqual(8);
    });
  }

  it('a layer with heat generation, or a mesh the caller asks for, keeps the Lagrange elements', () => {
    const base = { geometry: { kind: 'planar' } as const, inner: { kind: 'temperature', temperature: 50 } as const, outer: { kind: 'temperature', temperature: 10 } as const };
    const generating = solveSteady({ ...base, layers: [{ thickness: 0.1, conductivity: { kind: 'constant', value: 1 }, heatGeneration: 1000 }] });
    expect(generating.mesh.order).toBe(2);
    const asked = solveSteady({ ...base, layers: [{ thickness: 0.1, conductivity: polynomial, elements: 4 }] });
    expect(asked.mesh.elementsPerLayer).toEqual([4]);
    const ordered = solveSteady({ ...base, layers: [{ thickness: 0.1, conductivity: polynomial }], options: { order: 2 } });
    expect(ordered.mesh.order).toBe(2);
  });
});

describe('the temperature inside an exact layer, for drawing', () => {
  it('constant λ in a cylinder: the logarithmic profile θ = θ1 + (θ2 − θ1)·ln(r/r1)/ln(r2/r1) (Incropera §3.3.1, eq. 3.26)', () => {
    const [r1, r2, t1, t2] = [0.0571, 0.1071, 80, 29.7];
    for (const [r, t] of exactLayerProfile('axisymmetric', { kind: 'constant', value: 0.04 }, r1, r2, t1, t2, 10)) {
      expect(Math.abs(t - (t1 + ((t2 - t1) * Math.log(r / r1)) / Math.log(r2 / r1)))).toBeLessThan(1e-9);
    }
  });

  it('λ(θ) in a plane layer: ∫λdθ from the face grows linearly with depth (Kirchhoff transform, Carslaw & Jaeger §1.7)', () => {
    const [d, t1, t2] = [0.08, 300, 40];
    const profile = exactLayerProfile('planar', polynomial, 0, d, t1, t2, 8);
    const total = kirchhoff(polynomial, t2) - kirchhoff(polynomial, t1);
    for (const [x, t] of profile) expect(Math.abs(kirchhoff(polynomial, t) - kirchhoff(polynomial, t1) - (total * x) / d)).toBeLessThan(1e-9 * Math.abs(total));
    expect(profile[0]).toEqual([0, t1]);
    expect(profile[8]).toEqual([d, t2]);
  });
});
