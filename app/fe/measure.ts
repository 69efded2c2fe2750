/**
 * The integration measure: the only place where planar and axisymmetric problems differ.
 * Planar integrals are per m² of wall (dV = dx); axisymmetric integrals are per metre of pipe
 * (dV = 2πr dr), so every assembled quantity is "per m²" or "per m" accordingly.
 */
import type { Geometry } from './problem.js';

export type Measure = (position: number) => number;

export function measureFor(geometry: Geometry): Measure {
  return geometry.kind === 'planar' ? () => 1 : (r) => 2 * Math.PI * r;
}

/** The unit every extensive result is expressed in. */
export type FlowBasis = 'per-square-metre' | 'per-metre';

export function flowBasisFor(geometry: Geometry): FlowBasis {
  return geometry.kind === 'planar' ? 'per-square-metre' : 'per-metre';
}

/**
 * The conductance factor of a layer from x_1 to x_2, 1 / ∫ dx/μ(x): a heat flow through the layer
 * is this factor times ∫λ dθ across it. 1/d for a plane layer, 2π/ln(r_2/r_1) per metre of pipe.
 */
export function layerConductanceFactor(geometry: Geometry, x1: number, x2: number): number {
  return geometry.kind === 'planar' ? 1 / (x2 - x1) : (2 * Math.PI) / Math.log(x2 / x1);
}
