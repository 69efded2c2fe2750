/**
 * Temperatures inside a layer solved as one exact element (exact-layer-element.ts), for drawing:
 * in steady conduction without heat generation the Kirchhoff potential ∫λ dθ varies linearly in
 * x (plane) or in ln r (cylinder) across the layer, so the temperature at any point follows from
 * the two face temperatures. For a constant λ this is the straight line of a plane layer and the
 * logarithmic profile of a cylindrical one; with λ(θ) it is curved as the physics says.
 */
import { conductivityAt, type ConductivityModel } from './conductivity.js';
import { meanConductivityBetween } from './conductivity-mean.js';
import type { Geometry } from './problem.js';

/** `count` + 1 points from the inner face (x1, t1) to the outer face (x2, t2), positions in m, °C. */
export function exactLayerProfile(
  geometry: Geometry['kind'],
  model: ConductivityModel,
  x1: number,
  x2: number,
  t1: number,
  t2: number,
  count: number,
): [number, number][] {
  const total = meanConductivityBetween(model, t1, t2) * (t2 - t1);
  const logRatio = Math.log(x2 / x1);
  const points: [number, number][] = [];
  for (let i = 0; i <= count; i++) {
    const x = geometry === 'planar' ? x1 + ((x2 - x1) * i) / count : x1 * Math.pow(x2 / x1, i / count);
    if (i === 0 || i === count) {
      points.push([x, i === 0 ? t1 : t2]);
      continue;
    }
    // The share of the potential reached at x: linear in x (plane) or in ln r (cylinder).
    const share = geometry === 'planar' ? (x - x1) / (x2 - x1) : Math.log(x / x1) / logRatio;
    points.push([x, temperatureAtShare(model, t1, t2, total, share)]);
  }
  return points;
}

/**
 * θ between t1 and t2 where F(θ) = ∫_{t1}^{θ} λ = s·total. λ > 0, so F rises with θ and its slope
 * is λ(θ) itself: Newton's method from the straight-line guess, kept inside a bracket that
 * shrinks with every step (a step that would leave it bisects instead), to round-off. For a
 * constant λ the first step is exact; bisection alone took some 40 evaluations of the integral
 * per point and was a fifth of a pipe case's solve time.
 */
function temperatureAtShare(model: ConductivityModel, t1: number, t2: number, total: number, s: number): number {
  let lo = Math.min(t1, t2);
  let hi = Math.max(t1, t2);
  const target = s * total;
  let theta = t1 + s * (t2 - t1);
  for (let k = 0; k < 60; k++) {
    const miss = meanConductivityBetween(model, t1, theta) * (theta - t1) - target;
    if (miss === 0) return theta;
    // F rises with θ: a positive miss means the root lies below θ.
    if (miss > 0) hi = theta;
    else lo = theta;
    const step = miss / conductivityAt(model, theta);
    // A step at round-off size is the answer (testing it before the bracket: such a step may land
    // on the bracket's end, and bisecting then would throw the converged value away).
    if (Math.abs(step) <= 1e-13 * (1 + Math.abs(theta))) return theta - step;
    const next = theta - step;
    theta = next > lo && next < hi ? next : (lo + hi) / 2;
    if (hi - lo <= 1e-13 * (1 + Math.abs(hi))) break;
  }
  return theta;
}
