/**
 * The exact steady element of a layer without heat generation: two nodes, the layer's faces. In
 * steady 1D conduction the heat flow through such a layer is the same at every position, and the
 * Kirchhoff transform gives it exactly for any λ(θ):
 *   Q = G·∫_{θ_b}^{θ_a} λ(θ) dθ = G·λ_m(θ_a, θ_b)·(θ_a − θ_b),
 * with G = 1/d (plane, per m²) or 2π/ln(r_b/r_a) (cylinder, per metre) from measure.ts. So one such
 * element per layer reproduces the series-resistance, logarithmic and Kirchhoff solutions to
 * round-off, with no mesh to refine, and Newton's tangent is exact too:
 *   ∂Q/∂θ_a = G·λ(θ_a),  ∂Q/∂θ_b = −G·λ(θ_b).
 * The element fills the same matrices as a Lagrange element (element-matrices.ts): a conductance
 * G·λ_m whose rows sum to zero, so the assembly's difference form and the recovery are unchanged.
 */
import { conductivityAt } from './conductivity.js';
import { meanConductivityBetween } from './conductivity-mean.js';
import { InputError } from './errors.js';
import type { ElementMatrices } from './element-matrices.js';
import { layerConductanceFactor } from './measure.js';
import type { Mesh } from './mesh.js';
import type { Layer } from './problem.js';

export function exactLayerMatrices(
  mesh: Mesh,
  layers: readonly Layer[],
  elementIndex: number,
  excess: ArrayLike<number>,
  reference: number,
  matrices: ElementMatrices,
): ElementMatrices {
  const layerIndex = mesh.elementLayer[elementIndex]!;
  const model = layers[layerIndex]!.conductivity;
  const first = mesh.elementFirstNode[elementIndex]!;
  const ta = reference + excess[first]!;
  const tb = reference + excess[first + 1]!;
  const g = layerConductanceFactor(mesh.geometry, mesh.positions[first]!, mesh.positions[first + 1]!);
  const mean = meanConductivityBetween(model, ta, tb);
  const lambdaA = conductivityAt(model, ta);
  const lambdaB = conductivityAt(model, tb);
  if (!(mean > 0 && lambdaA > 0 && lambdaB > 0)) {
    const field = `layers[${layerIndex}].conductivity`;
    const at = !(lambdaA > 0) ? ta : tb;
    throw new InputError(
      field,
      `${field} falls to ${Math.min(mean, lambdaA, lambdaB).toPrecision(3)} W/(m·K) at ${at.toPrecision(4)} °C; it must stay above 0 W/(m·K) over the temperature range of the problem.`,
    );
  }
  const { conductance, tangent, capacity, load } = matrices;
  const k = g * mean;
  conductance[0] = k;
  conductance[1] = -k;
  conductance[2] = -k;
  conductance[3] = k;
  tangent[0] = g * lambdaA;
  tangent[1] = -g * lambdaB;
  tangent[2] = -g * lambdaA;
  tangent[3] = g * lambdaB;
  for (let i = 0; i < 4; i++) capacity[i] = 0;
  load[0] = 0;
  load[1] = 0;
  return matrices;
}
