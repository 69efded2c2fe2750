/**
 * The heat transfer matrices of ISO 13786:2017 (clause 6, "calculation method" for plane
 * components of plane homogeneous layers; sub-clause numbers below are from memory, the
 * standard's text was not at hand): a 2 × 2 complex matrix that carries the complex amplitudes of
 * temperature θ̂ and heat flow density q̂ across a layer for one period T,
 *
 *   [θ̂₂]   [Z₁₁ Z₁₂] [θ̂₁]
 *   [q̂₂] = [Z₂₁ Z₂₂] [q̂₁],
 *
 * side 1 being the inside of the layer and q̂ counted positive from side 1 towards side 2.
 *
 * Conventions chosen, and why:
 * - Time dependence e^{+iωt}, ω = 2π/T. Then the heat equation ρc ∂θ/∂t = λ ∂²θ/∂x² gives
 *   θ̂'' = k²θ̂ with k = (1 + i)/δ, δ = √(λT/(πρc)), and with q̂ = −λθ̂' the exact solution across a
 *   layer of thickness d is Z₁₁ = Z₂₂ = cosh(kd), Z₁₂ = −sinh(kd)/(λk), Z₂₁ = −λk·sinh(kd). Written
 *   out with ξ = d/δ these are the standard's entries (the "layer matrix" sub-clause, 6.4.2 in our
 *   recollection):
 *     Z₁₁ = Z₂₂ = cosh ξ cos ξ + i sinh ξ sin ξ
 *     Z₁₂ = −(δ/2λ)·[sinh ξ cos ξ + cosh ξ sin ξ + i(cosh ξ sin ξ − sinh ξ cos ξ)]
 *     Z₂₁ = −(λ/δ)·[sinh ξ cos ξ − cosh ξ sin ξ + i(sinh ξ cos ξ + cosh ξ sin ξ)]
 *   The sign inside Z₁₂ is "+ i(cosh ξ sin ξ − sinh ξ cos ξ)": with "− i" the matrix would not be
 *   cosh/sinh of one argument, its determinant would differ from 1 and the thin-layer limit
 *   Z₁₂ → −d/λ would fail; tests/physics checks det Z = 1 and that limit. The project's reference
 *   notes (§10) write the same sign.
 * - A layer with resistance only (air layer, surface film) has Z = [[1, −R], [0, 1]]: θ̂₂ = θ̂₁ − R·q̂₁.
 * - The element: Z = Z_se · Z_N ⋯ Z₂ · Z₁ · Z_si, layer 1 at the inside (the "multilayer" sub-clause).
 *   The first factor applied to [θ̂₁, q̂₁] is the inside film, so the product is written from the
 *   outside to the inside; side 1 of the element is the inside environment, side 2 the outside.
 */
import { complex, multiply, add, type Complex } from './complex-number.js';

export interface HeatTransferMatrix {
  readonly z11: Complex;
  readonly z12: Complex;
  readonly z21: Complex;
  readonly z22: Complex;
}

/** A homogeneous layer that stores heat, in SI. */
export interface StoringLayer {
  /** m */
  readonly thickness: number;
  /** W/(m·K) */
  readonly conductivity: number;
  /** kg/m³ */
  readonly density: number;
  /** J/(kg·K) */
  readonly specificHeat: number;
}

/** δ = √(λT/(πρc)), m: the depth at which a periodic temperature wave falls to 1/e of its amplitude. */
export function periodicPenetrationDepth(layer: StoringLayer, period: number): number {
  return Math.sqrt((layer.conductivity * period) / (Math.PI * layer.density * layer.specificHeat));
}

/** The layer matrix for period T (s), entries as in the module comment. */
export function layerMatrix(layer: StoringLayer, period: number): HeatTransferMatrix {
  const delta = periodicPenetrationDepth(layer, period);
  const xi = layer.thickness / delta;
  const lambda = layer.conductivity;
  const ch = Math.cosh(xi);
  const sh = Math.sinh(xi);
  const c = Math.cos(xi);
  const s = Math.sin(xi);
  const diagonal = complex(ch * c, sh * s);
  const f12 = -delta / (2 * lambda);
  const f21 = -lambda / delta;
  return {
    z11: diagonal,
    z12: complex(f12 * (sh * c + ch * s), f12 * (ch * s - sh * c)),
    z21: complex(f21 * (sh * c - ch * s), f21 * (sh * c + ch * s)),
    z22: diagonal,
  };
}

/** A pure thermal resistance R (m²·K/W): air layer or surface film. */
export function resistanceMatrix(resistance: number): HeatTransferMatrix {
  return { z11: complex(1), z12: complex(-resistance), z21: complex(0), z22: complex(1) };
}

/** The product a·b (b acts first on the vector of side 1). */
export function multiplyMatrices(a: HeatTransferMatrix, b: HeatTransferMatrix): HeatTransferMatrix {
  return {
    z11: add(multiply(a.z11, b.z11), multiply(a.z12, b.z21)),
    z12: add(multiply(a.z11, b.z12), multiply(a.z12, b.z22)),
    z21: add(multiply(a.z21, b.z11), multiply(a.z22, b.z21)),
    z22: add(multiply(a.z21, b.z12), multiply(a.z22, b.z22)),
  };
}
