/**
 * Constant-conductivity multilayer walls and pipes against the exact series-resistance and
 * logarithmic solutions (Incropera et al., Fundamentals of Heat and Mass Transfer, ch. 3:
 * plane wall eq. 3.19 and the composite-wall network §3.1.2; radial systems eq. 3.27–3.32,
 * composite cylinder §3.3.1). Accuracy bar: heat flow 1e-6 relative, temperatures 1e-6 K, energy
 * balance 1e-9 relative, all with the default mesh.
 */
import { describe, expect, it } from 'vitest';
import { solveSteady, type Layer, type SteadyProblem } from '../../app/fe/index.js';
import { cylindricalResistances, planarResistances, sum, temperaturesAlong, type PlainLayer } from './exact-solutions.js';

const wall: PlainLayer[] = [
  { thickness: 0.0125, k: 0.21 }, // plasterboard-like
  { thickness: 0.1, k: 0.035, contactToNext: 0.05 },
  { thickness: 0.215, k: 0.77 },
  { thickness: 0.02, k: 1.0 },
];
const pipe: PlainLayer[] = [
  { thickness: 0.0036, k: 50 }, // steel wall
  { thickness: 0.05, k: 0.04, contactToNext: 0.02 },
  { thickness: 0.03, k: 0.06 },
  { thickness: 0.0008, k: 160 }, // aluminium jacket
];

const toLayers = (layers: PlainLayer[]): Layer[] =>
  layers.map((l) => ({ thickness: l.thickness, conductivity: { kind: 'constant', value: l.k }, contactResistanceToNext: l.contactToNext ?? 0 }));

function expectMatchesNetwork(problem: SteadyProblem, tIn: number, tOut: number, resistances: number[], interfaceIndices: number[]) {
  const result = solveSteady(problem);
  const q = (tIn - tOut) / sum(resistances);
  const along = temperaturesAlong(tIn, q, resistances);
  expect(Math.abs(result.faces.inner.heatIn - q) / q).toBeLessThan(1e-6);
  expect(Math.abs(-result.faces.outer.heatIn - q) / q).toBeLessThan(1e-6);
  for (const i of result.interfaces) expect(Math.abs(i.heatFlow - q) / q).toBeLessThan(1e-6);
  // Interface temperatures: each interface sits after a known number of resistances in the network.
  const sides = result.interfaces.flatMap((i) => (i.contactResistance > 0 ? [i.temperatureInnerSide, i.temperatureOuterSide] : [i.temperatureInnerSide]));
  sides.forEach((t, k) => expect(Math.abs(t - along[interfaceIndices[k]!]!)).toBeLessThan(1e-6));
  expect(result.balance.relativeResidual).toBeLessThan(1e-9);
  return result;
}

describe('multilayer plane wall, constant conductivity (series resistance, Incropera ch. 3)', () => {
  for (const order of [1, 2] as const) {
    it(`fixed face temperatures, order ${order}`, () => {
      const r = planarResistances(wall);
      const result = expectMatchesNetwork(
        { geometry: { kind: 'planar' }, layers: toLayers(wall), inner: { kind: 'temperature', temperature: 20 }, outer: { kind: 'temperature', temperature: -10 }, options: { order } },
        20, -10, r, [0, 1, 2, 3, 4],
      );
      expect(result.faces.inner.reaction).toBeCloseTo(result.faces.inner.heatIn, 12);
      expect(result.iterations).toBe(1);
    });
    it(`films on both faces, order ${order}`, () => {
      const r = planarResistances(wall, 7.69, 25);
      const result = expectMatchesNetwork(
        { geometry: { kind: 'planar' }, layers: toLayers(wall), inner: { kind: 'film', coefficient: 7.69, ambient: 20 }, outer: { kind: 'film', coefficient: 25, ambient: -10 }, options: { order } },
        20, -10, r, [1, 2, 3, 4, 5],
      );
      const along = temperaturesAlong(20, 30 / sum(r), r);
      expect(Math.abs(result.faces.inner.temperature - along[0]!)).toBeLessThan(1e-6);
      expect(Math.abs(result.faces.outer.temperature - along[along.length - 2]!)).toBeLessThan(1e-6);
    });
  }
  it('a prescribed heat flux with a fixed temperature on the other face', () => {
    // Heat flux q entering at x = 0, fixed T at x = L: T(0) = T_L + q·ΣR (series resistance).
    const result = solveSteady({ geometry: { kind: 'planar' }, layers: toLayers(wall), inner: { kind: 'flux', flux: 12.5 }, outer: { kind: 'temperature', temperature: 5 } });
    expect(Math.abs(result.faces.inner.temperature - (5 + 12.5 * sum(planarResistances(wall))))).toBeLessThan(1e-6);
    expect(Math.abs(result.faces.outer.reaction! + 12.5) / 12.5).toBeLessThan(1e-9);
  });
});

describe('multilayer pipe, constant conductivity (logarithmic solution, Incropera ch. 3)', () => {
  for (const order of [1, 2] as const) {
    it(`fixed temperatures, order ${order}`, () => {
      const r = cylindricalResistances(0.0545, pipe);
      expectMatchesNetwork(
        { geometry: { kind: 'axisymmetric', innerRadius: 0.0545 }, layers: toLayers(pipe), inner: { kind: 'temperature', temperature: 180 }, outer: { kind: 'temperature', temperature: 25 }, options: { order } },
        180, 25, r, [0, 1, 2, 3, 4],
      );
    });
    it(`films on both faces, order ${order}`, () => {
      const r = cylindricalResistances(0.0545, pipe, 1500, 9.5);
      const result = expectMatchesNetwork(
        { geometry: { kind: 'axisymmetric', innerRadius: 0.0545 }, layers: toLayers(pipe), inner: { kind: 'film', coefficient: 1500, ambient: 180 }, outer: { kind: 'film', coefficient: 9.5, ambient: 25 }, options: { order } },
        180, 25, r, [1, 2, 3, 4, 5],
      );
      expect(result.basis).toBe('per-metre');
      // Flux density at the outer face = Q'/(2πr).
      const rOut = 0.0545 + sum(pipe.map((l) => l.thickness));
      expect(result.faces.outer.heatFluxDensityIn).toBeCloseTo(result.faces.outer.heatIn / (2 * Math.PI * rOut), 12);
    });
  }
});
