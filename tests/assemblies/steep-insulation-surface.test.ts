/**
 * Pipes and flat surfaces whose insulation conductivity table has one point at an end of the
 * conductivity range (0.001 or 1000 W/(m·K) beside points near 0.04), and a hot surface in air at
 * the lowest allowed −100 °C. The solve's intermediate iterates of the surface temperature then lie
 * far outside the surface's physical range; the film must take them, and the solve must converge
 * to the surface balance.
 *
 * Reference, solved here independently of the engine: steady conduction without heat generation
 * carries one heat flow through every layer, and the Kirchhoff transform gives it exactly for any
 * λ(θ) (Carslaw & Jaeger, Conduction of Heat in Solids, §1.8; Incropera & DeWitt §3.3 and §3.4 for
 * the plane and cylindrical resistances):
 *   q = F·∫_{θ_out}^{θ_in} λ(θ) dθ per layer, F = 1/d (per m²) or 2π/ln(r_out/r_in) (per metre),
 * with the inside film θ_fluid − θ_in = q/(h_i·A_in). Given q, the temperatures follow outward
 * layer by layer (each integral inverted by bisection, the table integrated piece by piece, which is
 * exact for a piecewise-linear λ); the surface balance q = A·h(θ_s)·(θ_s − θ_sink), with h and the
 * sink from the same outer-surface physics at θ_s, fixes q by bisection.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { solveCase } from '../../app/index.js';
import { outerSurfaceExchange, type OuterSurfaceShape } from '../../app/physics/outer-surface-exchange.js';
import { pipeSizeCatalogue } from '../../main/pipe-sizes/pipe-size-catalogue.js';

type Json = Record<string, any>;
const root = path.resolve(import.meta.dirname, '../..');
const example = (name: string): Json => JSON.parse(readFileSync(path.join(root, 'data', 'examples', `${name}.json`), 'utf8'));
const context = { resolveMaterial: () => undefined, pipeSizes: pipeSizeCatalogue() };

type Model = { kind: 'constant'; value: number } | { kind: 'table'; points: [number, number][] };

/** λ of a table: straight between points, constant beyond the ends. */
function tableAt(points: readonly [number, number][], t: number): number {
  if (t <= points[0]![0]) return points[0]![1];
  for (let i = 1; i < points.length; i++) {
    const [t1, k1] = points[i]!;
    const [t0, k0] = points[i - 1]!;
    if (t <= t1) return k0 + ((k1 - k0) * (t - t0)) / (t1 - t0);
  }
  return points[points.length - 1]![1];
}

/** ∫_a^b λ dθ, exact for a constant and a piecewise-linear table (trapezoids between breakpoints). */
function integral(model: Model, a: number, b: number): number {
  if (model.kind === 'constant') return model.value * (b - a);
  const [lo, hi, sign] = a <= b ? [a, b, 1] : [b, a, -1];
  const cuts = [lo, ...model.points.map(([t]) => t).filter((t) => t > lo && t < hi), hi];
  let sum = 0;
  for (let i = 1; i < cuts.length; i++) sum += ((tableAt(model.points, cuts[i - 1]!) + tableAt(model.points, cuts[i]!)) / 2) * (cuts[i]! - cuts[i - 1]!);
  return sign * sum;
}

/** The root of an increasing function f on [lo, hi]. */
function bisect(f: (x: number) => number, lo: number, hi: number): number {
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (f(mid) < 0) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

interface ReferenceLayer {
  readonly conductivity: Model;
  /** 1/F: d (plane) or ln(r_out/r_in)/(2π) (cylinder). */
  readonly resistanceFactor: number;
}

/** The heat flow (W/m² or W/m) that satisfies the surface balance, by bisection. */
function referenceHeatFlow(
  inner: { temperature: number; filmConductance: number | null },
  layers: readonly ReferenceLayer[],
  outerArea: number,
  film: (surface: number) => { coefficient: number; ambient: number },
): number {
  const surfaceFor = (q: number) => {
    let t = inner.filmConductance === null ? inner.temperature : inner.temperature - q / inner.filmConductance;
    for (const layer of layers) {
      const drop = q * layer.resistanceFactor;
      const from = t;
      // ∫_{θ_out}^{θ_in} λ dθ = q/F, increasing as θ_out falls.
      t = bisect((out) => drop - integral(layer.conductivity, out, from), -273, 3000);
    }
    return t;
  };
  // The surface balance's imbalance rises with q: more heat in, a cooler surface, less heat out.
  const imbalance = (q: number) => {
    const surface = surfaceFor(q);
    const exchange = film(surface);
    return q - outerArea * exchange.coefficient * (surface - exchange.ambient);
  };
  let span = 1;
  while (imbalance(span) < 0 || imbalance(-span) > 0) span *= 2;
  return bisect(imbalance, -span, span);
}

const withTablePoint = (json: Json, layer: number, point: number, value: number): Json => {
  const copy = structuredClone(json);
  copy.layers[layer].material.conductivity.points[point][1] = value;
  return copy;
};
const withAir = (json: Json, air: number): Json => {
  const copy = structuredClone(json);
  copy.ambient.airTemperature = air;
  return copy;
};

/** The converged heat flow of a pipe or flat case, and the reference from its geometry and conditions. */
function solvedAndReference(json: Json): { solved: number; reference: number } {
  const solved = solveCase(json, context);
  const result = solved.result as Json;
  const pipe = json.kind === 'pipe';
  const stack: Json[] = result.layers;
  const material = (i: number): Json => {
    const role = stack[i]!.role as string;
    if (role === 'pipe-wall') return json.pipe.material;
    if (role === 'wall') return json.wall.material;
    if (role === 'jacket') return json.jacket.material;
    return json.layers[Number(/insulation layer (\d+)/.exec(stack[i]!.name)![1]) - 1].material;
  };
  const layers = stack.map((l, i): ReferenceLayer => ({
    conductivity: material(i).conductivity as Model,
    resistanceFactor: pipe ? Math.log(l.outerPosition / l.innerPosition) / (2 * Math.PI) : l.outerPosition - l.innerPosition,
  }));
  const innerArea = pipe ? 2 * Math.PI * stack[0]!.innerPosition : 1;
  const outerArea = pipe ? 2 * Math.PI * stack[stack.length - 1]!.outerPosition : 1;
  const inner = { temperature: json.inner.temperature, filmConductance: json.inner.kind === 'fluid' ? json.inner.coefficient * innerArea : null };
  const shape: OuterSurfaceShape = pipe
    ? json.orientation === 'vertical'
      ? { kind: 'pipe', orientation: 'vertical', outerDiameter: result.outerDiameter, height: result.height }
      : { kind: 'pipe', orientation: 'horizontal', outerDiameter: result.outerDiameter }
    : json.surface.kind === 'vertical'
      ? { kind: 'vertical-wall', height: json.surface.height }
      : { kind: 'horizontal-surface', facing: json.surface.facing, characteristicLength: json.surface.characteristicLength };
  // The outer-surface physics alone (no bounding temperatures): the reference surface lies between
  // the air and the fluid, where the film is evaluated as it stands.
  const film = outerSurfaceExchange({
    shape,
    exposure: json.ambient.exposure,
    method: { kind: 'correlations' },
    airTemperature: json.ambient.airTemperature,
    ...(json.ambient.surroundingsTemperature !== undefined ? { surroundingsTemperature: json.ambient.surroundingsTemperature } : {}),
    emissivity: result.emissivity.value,
  });
  const reference = referenceHeatFlow(inner, layers, outerArea, film);
  return { solved: pipe ? result.heatLossPerMetre : result.heatFlowDensity, reference };
}

const CASES: readonly { readonly name: string; readonly json: Json }[] = [
  { name: 'steam main, insulation λ(50 °C) = 1000 W/(m·K)', json: withTablePoint(example('pipe-steam-outdoor'), 0, 1, 1000) },
  { name: 'steam main, insulation λ(200 °C) = 1000 W/(m·K)', json: withTablePoint(example('pipe-steam-outdoor'), 0, 3, 1000) },
  { name: 'steam main, insulation λ(50 °C) = 0.001 W/(m·K)', json: withTablePoint(example('pipe-steam-outdoor'), 0, 1, 0.001) },
  { name: 'chilled-water riser, foam λ(50 °C) = 1000 W/(m·K)', json: withTablePoint(example('pipe-chilled-water'), 0, 1, 1000) },
  { name: 'tank roof, insulation λ(50 °C) = 0.001 W/(m·K)', json: withTablePoint(example('flat-tank-roof'), 0, 1, 0.001) },
  { name: 'tank roof, insulation λ(100 °C) = 1000 W/(m·K)', json: withTablePoint(example('flat-tank-roof'), 0, 2, 1000) },
  { name: 'tank roof, insulation λ(10 °C) = 1000 W/(m·K)', json: withTablePoint(example('flat-tank-roof'), 0, 0, 1000) },
  { name: 'tank wall, insulation λ(100 °C) = 1000 W/(m·K)', json: withTablePoint(example('flat-hot-tank-wall'), 0, 2, 1000) },
  { name: 'steam main in air at −100 °C', json: withAir(example('pipe-steam-outdoor'), -100) },
  { name: 'tank wall in air at −100 °C', json: withAir(example('flat-hot-tank-wall'), -100) },
  { name: 'tank roof in air at −100 °C', json: withAir(example('flat-tank-roof'), -100) },
];

describe('a steep insulation table or the coldest air: the solve converges to the surface balance', () => {
  for (const { name, json } of CASES) {
    it(name, () => {
      const { solved, reference } = solvedAndReference(json);
      expect(Number.isFinite(solved)).toBe(true);
      // Kirchhoff-transform reference above, bisected independently of the engine.
      expect(Math.abs(solved - reference) / Math.abs(reference)).toBeLessThan(1e-6);
    });
  }
});
