/**
 * Integrals over the body that a phase change makes nonlinear in temperature: the heat stored
 * between two states, ∫ρ(H(T₂) − H(T₁))dμ, in total and at each node (∫ρ(H(T₂) − H(T₁))N_a dμ, with
 * its derivative ∫ρH'(T₂)N_aN_b dμ for Newton's method), and each layer's solid mass fraction,
 * ∫ρ(1 − φ(T))dμ / ∫ρ dμ. All use the Gauss rule of the element matrices at the temperatures
 * interpolated there, so the heat stored over a run and the sum of the steps' storage terms agree
 * to round-off (see latent-step.ts).
 */
import type { BandedMatrix } from './banded-matrix.js';
import { referenceElement } from './elements.js';
import type { Measure } from './measure.js';
import type { Mesh } from './mesh.js';
import { apparentSpecificHeat, curveOf, hasPhaseChange, liquidFraction, specificEnthalpy } from './phase-change.js';
import type { Layer } from './problem.js';

/**
 * Visits every Gauss point: the layer, its weight (dμ), the temperature of each state there, and
 * the element's first node and shape values (for integrals against N_a).
 */
function eachGaussPoint(
  mesh: Mesh,
  measure: Measure,
  states: readonly ArrayLike<number>[],
  reference: number,
  visit: (layerIndex: number, weight: number, temperatures: readonly number[], firstNode: number, shape: readonly number[]) => void,
): void {
  const shapes = referenceElement(mesh.order);
  const n = shapes.nodeCount;
  const temperatures = states.map(() => 0);
  for (let e = 0; e < mesh.elementFirstNode.length; e++) {
    const first = mesh.elementFirstNode[e]!;
    const xStart = mesh.positions[first]!;
    const jacobian = (mesh.positions[first + n - 1]! - xStart) / 2;
    for (let g = 0; g < shapes.gaussXi.length; g++) {
      const N = shapes.shape[g]!;
      states.forEach((state, k) => {
        let t = reference;
        for (let a = 0; a < n; a++) t += N[a]! * state[first + a]!;
        temperatures[k] = t;
      });
      const weight = shapes.gaussWeight[g]! * jacobian * measure(xStart + (shapes.gaussXi[g]! + 1) * jacobian);
      visit(mesh.elementLayer[e]!, weight, temperatures, first, N);
    }
  }
}

/** ∫ρ(H(T_end) − H(T_start))dμ over the body (W·s per m² or per m); ρc(T_end − T_start) in a layer without a phase change. */
export function enthalpyChange(mesh: Mesh, layers: readonly Layer[], measure: Measure, start: ArrayLike<number>, end: ArrayLike<number>, reference: number): number {
  const m = mesh.order + 1;
  let total = 0;
  eachGaussPoint(mesh, measure, [start, end], reference, (l, weight, [t1, t2], first, N) => {
    const layer = layers[l]!;
    const rho = layer.density ?? 0;
    let change: number;
    if (hasPhaseChange(layer)) {
      change = specificEnthalpy(curveOf(layer), t2!) - specificEnthalpy(curveOf(layer), t1!);
    } else {
      // As a difference, the way assembleEnthalpyStorage takes it, so the two agree to round-off.
      let difference = 0;
      for (let a = 0; a < m; a++) difference += N[a]! * (end[first + a]! - start[first + a]!);
      change = (layer.specificHeat ?? 0) * difference;
    }
    total += rho * change * weight;
  });
  return total;
}

/**
 * Adds ∫ρ(H(T_end) − H(T_start))N_a dμ to `stored` (the heat each node's share of the body takes up
 * between the two states) and ∫ρH'(T_end)N_aN_b dμ to `capacity`. In a layer without a phase change
 * that is ρc·(T_end − T_start), interpolated as a difference so that it keeps its digits, and ρc.
 */
export function assembleEnthalpyStorage(
  mesh: Mesh,
  layers: readonly Layer[],
  measure: Measure,
  start: ArrayLike<number>,
  end: ArrayLike<number>,
  reference: number,
  stored: Float64Array,
  capacity: BandedMatrix,
): void {
  const m = mesh.order + 1;
  eachGaussPoint(mesh, measure, [start, end], reference, (l, weight, [t1, t2], first, N) => {
    const layer = layers[l]!;
    const rho = layer.density ?? 0;
    let change: number;
    let slope: number;
    if (hasPhaseChange(layer)) {
      const curve = curveOf(layer);
      change = specificEnthalpy(curve, t2!) - specificEnthalpy(curve, t1!);
      slope = apparentSpecificHeat(curve, t2!);
    } else {
      let difference = 0;
      for (let a = 0; a < m; a++) difference += N[a]! * (end[first + a]! - start[first + a]!);
      slope = layer.specificHeat ?? 0;
      change = slope * difference;
    }
    for (let a = 0; a < m; a++) {
      stored[first + a] += rho * change * N[a]! * weight;
      for (let b = 0; b < m; b++) capacity.add(first + a, first + b, rho * slope * N[a]! * N[b]! * weight);
    }
  });
}

/** Per layer: the mass fraction below the phase change (solid), or null for a layer without one. */
export function solidFractions(mesh: Mesh, layers: readonly Layer[], measure: Measure, excess: ArrayLike<number>, reference: number): (number | null)[] {
  const solid = new Float64Array(layers.length);
  const volume = new Float64Array(layers.length);
  eachGaussPoint(mesh, measure, [excess], reference, (l, weight, [t]) => {
    const layer = layers[l]!;
    if (!hasPhaseChange(layer)) return;
    // Density is uniform in a layer, so the mass fraction is the volume fraction.
    solid[l] += (1 - liquidFraction(curveOf(layer), t!)) * weight;
    volume[l] += weight;
  });
  return layers.map((layer, l) => (hasPhaseChange(layer) ? solid[l]! / volume[l]! : null));
}
