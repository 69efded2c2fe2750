/**
 * Element matrices of the weak form of ρc ∂T/∂t = ∇·(λ∇T) + q̇ on one line element:
 *   conductance k_ab = ∫ λ(T) N_a' N_b' dμ,  capacity m_ab = ∫ ρc N_a N_b dμ,  load f_a = ∫ q̇ N_a dμ,
 * with dμ = dx (planar) or 2πr dr (axisymmetric). λ is evaluated at each Gauss point from the
 * temperature interpolated there, so a temperature-dependent conductivity needs no special code.
 * Nodal values are excess temperatures over `reference` (see discretisation.ts).
 */
import { conductivityAt } from './conductivity.js';
import { referenceElement } from './elements.js';
import { InputError } from './errors.js';
import type { Measure } from './measure.js';
import type { Mesh } from './mesh.js';
import type { Layer } from './problem.js';

export interface ElementMatrices {
  /** Row-major (nodeCount × nodeCount). */
  readonly conductance: Float64Array;
  readonly capacity: Float64Array;
  readonly load: Float64Array;
}

export function elementMatrices(
  mesh: Mesh,
  layers: readonly Layer[],
  measure: Measure,
  elementIndex: number,
  excess: ArrayLike<number>,
  reference: number,
  workspace?: ElementMatrices,
): ElementMatrices {
  const layerIndex = mesh.elementLayer[elementIndex]!;
  const layer = layers[layerIndex]!;
  const firstNode = mesh.elementFirstNode[elementIndex]!;
  const shapes = referenceElement(mesh.order);
  const n = shapes.nodeCount;
  // A caller looping over many elements passes one workspace, so a million-element mesh does not
  // allocate three arrays per element.
  const { conductance, capacity, load } = workspace ?? newElementWorkspace(mesh.order);
  conductance.fill(0);
  capacity.fill(0);
  load.fill(0);

  const xStart = mesh.positions[firstNode]!;
  const xEnd = mesh.positions[firstNode + n - 1]!;
  // Nodes are equally spaced in each element, so the map from ξ to x is affine.
  const jacobian = (xEnd - xStart) / 2;
  const volumetricCapacity = (layer.density ?? 0) * (layer.specificHeat ?? 0);
  const generation = layer.heatGeneration ?? 0;

  for (let g = 0; g < shapes.gaussXi.length; g++) {
    const N = shapes.shape[g]!;
    const dNdXi = shapes.shapeDerivative[g]!;
    let temperature = reference;
    for (let a = 0; a < n; a++) temperature += N[a]! * excess[firstNode + a]!;
    const x = xStart + (shapes.gaussXi[g]! + 1) * jacobian;
    const weight = shapes.gaussWeight[g]! * jacobian * measure(x);
    const lambda = conductivityAt(layer.conductivity, temperature);
    if (!(lambda > 0)) {
      const field = `layers[${layerIndex}].conductivity`;
      throw new InputError(
        field,
        `${field} falls to ${lambda.toPrecision(3)} W/(m·K) at ${temperature.toPrecision(4)} °C; it must stay above 0 W/(m·K) over the temperature range of the problem.`,
      );
    }
    for (let a = 0; a < n; a++) {
      const dNa = dNdXi[a]! / jacobian;
      load[a] += generation * N[a]! * weight;
      for (let b = 0; b < n; b++) {
        conductance[a * n + b] += lambda * dNa * (dNdXi[b]! / jacobian) * weight;
        capacity[a * n + b] += volumetricCapacity * N[a]! * N[b]! * weight;
      }
    }
  }
  return { conductance, capacity, load };
}

export function newElementWorkspace(order: 1 | 2): ElementMatrices {
  const n = order + 1;
  return { conductance: new Float64Array(n * n), capacity: new Float64Array(n * n), load: new Float64Array(n) };
}
