/**
 * Element matrices of the weak form of ρc ∂T/∂t = ∇·(λ∇T) + q̇ on one line element:
 *   conductance k_ab = ∫ λ(T) N_a' N_b' dμ,  capacity m_ab = ∫ ρc N_a N_b dμ,  load f_a = ∫ q̇ N_a dμ,
 * with dμ = dx (planar) or 2πr dr (axisymmetric). λ is evaluated at each Gauss point from the
 * temperature interpolated there, so a temperature-dependent conductivity needs no special code.
 * Nodal values are excess temperatures over `reference` (see discretisation.ts).
 *
 * Newton's method also needs the derivative of the element's conducted heat with respect to its
 * nodal temperatures: the tangent t_ac = k_ac + ∫ λ'(T) N_c N_a' T' dμ, where the second term
 * is how a warmer node changes λ, and so the heat conducted, around it.
 */
import { conductivityAt, conductivitySlopeAt } from './conductivity.js';
import { referenceElement } from './elements.js';
import { exactLayerMatrices } from './exact-layer-element.js';
import { InputError } from './errors.js';
import type { Measure } from './measure.js';
import type { Mesh } from './mesh.js';
import type { Layer } from './problem.js';

export interface ElementMatrices {
  /** Row-major (nodeCount × nodeCount). */
  readonly conductance: Float64Array;
  /** ∂(heat conducted out of node a)/∂θ_c, row-major; equals the conductance where λ is constant. */
  readonly tangent: Float64Array;
  readonly capacity: Float64Array;
  readonly load: Float64Array;
}

/**
 * The element's matrices at the given nodal excess temperatures. `withCapacity` false leaves the
 * capacity at zero, for the steady solve, which has no use for it.
 */
export function elementMatrices(
  mesh: Mesh,
  layers: readonly Layer[],
  measure: Measure,
  elementIndex: number,
  excess: ArrayLike<number>,
  reference: number,
  workspace?: ElementMatrices,
  withCapacity = true,
): ElementMatrices {
  // A layer that is one exact steady element has its matrices in closed form.
  if (mesh.exactLayers) return exactLayerMatrices(mesh, layers, elementIndex, excess, reference, workspace ?? newElementWorkspace(1));
  const layerIndex = mesh.elementLayer[elementIndex]!;
  const layer = layers[layerIndex]!;
  const firstNode = mesh.elementFirstNode[elementIndex]!;
  const shapes = referenceElement(mesh.order);
  const n = shapes.nodeCount;
  // A caller looping over many elements passes one workspace, so a million-element mesh does not
  // allocate arrays per element; this runs for every element of every Newton iteration.
  const matrices = workspace ?? newElementWorkspace(mesh.order);
  const { conductance, tangent, capacity, load } = matrices;
  // Plain loops: TypedArray.fill costs more than the element's arithmetic for arrays this small.
  for (let i = 0; i < n * n; i++) {
    conductance[i] = 0;
    tangent[i] = 0;
    capacity[i] = 0;
  }
  for (let a = 0; a < n; a++) load[a] = 0;

  const xStart = mesh.positions[firstNode]!;
  const xEnd = mesh.positions[firstNode + n - 1]!;
  // Nodes are equally spaced in each element, so the map from ξ to x is affine: d/dx = (1/J)·d/dξ.
  const jacobian = (xEnd - xStart) / 2;
  // A layer with a phase change stores heat as ρH(T), not ρcT: its steps take their storage term
  // from phase-change-integrals.ts (see latent-step.ts), never from this capacity.
  const volumetricCapacity = withCapacity ? (layer.density ?? 0) * (layer.specificHeat ?? 0) : 0;
  const generation = layer.heatGeneration ?? 0;
  const variable = layer.conductivity.kind !== 'constant';

  for (let g = 0; g < shapes.gaussXi.length; g++) {
    const N = shapes.shape[g]!;
    const dNdXi = shapes.shapeDerivative[g]!;
    let temperature = reference;
    let slopeInXi = 0;
    for (let a = 0; a < n; a++) {
      const theta = excess[firstNode + a]!;
      temperature += N[a]! * theta;
      slopeInXi += dNdXi[a]! * theta;
    }
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
    // k_ab = λ N_a' N_b' w; the tangent adds λ'(T)·T'·N_a'·N_b·w (zero for a constant λ).
    const conductanceScale = (lambda * weight) / (jacobian * jacobian);
    const slopeScale = variable ? (conductivitySlopeAt(layer.conductivity, temperature) * slopeInXi * weight) / (jacobian * jacobian) : 0;
    for (let a = 0; a < n; a++) {
      const ka = conductanceScale * dNdXi[a]!;
      const sa = slopeScale * dNdXi[a]!;
      load[a] += generation * N[a]! * weight;
      for (let b = 0; b < n; b++) {
        const k = ka * dNdXi[b]!;
        conductance[a * n + b] += k;
        tangent[a * n + b] += k + sa * N[b]!;
        if (volumetricCapacity !== 0) capacity[a * n + b] += volumetricCapacity * N[a]! * N[b]! * weight;
      }
    }
  }
  return matrices;
}

/** Values a workspace holds for elements of the given order. */
export function elementWorkspaceSize(order: 1 | 2): number {
  const n = order + 1;
  return 3 * n * n + n;
}

/** Scratch matrices for one element at a time; `storage` (elementWorkspaceSize values) lets a caller share one allocation. */
export function newElementWorkspace(order: 1 | 2, storage = new Float64Array(elementWorkspaceSize(order))): ElementMatrices {
  const n = order + 1;
  // Views into one allocation: small typed arrays are cheap to index but not to create.
  return {
    conductance: storage.subarray(0, n * n),
    tangent: storage.subarray(n * n, 2 * n * n),
    capacity: storage.subarray(2 * n * n, 3 * n * n),
    load: storage.subarray(3 * n * n),
  };
}
