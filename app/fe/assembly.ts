/**
 * Global assembly: element conductances, capacities and loads scattered into band matrices,
 * plus the contact conductances that join the two nodes of an interface with a contact resistance.
 */
import { BandedMatrix } from './banded-matrix.js';
import { elementMatrices, newElementWorkspace } from './element-matrices.js';
import type { Measure } from './measure.js';
import type { Mesh } from './mesh.js';
import type { Layer } from './problem.js';

export interface LayerEndResiduals {
  /** Residual at the layer's inner end node: the heat entering the layer there. */
  innerEnd: number;
  /** Residual at the layer's outer end node: minus the heat leaving the layer there. */
  outerEnd: number;
  /** Size of the conductance entries behind each residual: its round-off grows with them. */
  innerScale: number;
  outerScale: number;
}

export interface GlobalSystem {
  readonly conductance: BandedMatrix;
  readonly capacity: BandedMatrix;
  /** Heat generated, distributed to the nodes (W/m² or W/m). */
  readonly load: Float64Array;
}

/** Assembles the global system with λ(T) evaluated at T = reference + the given nodal excess temperatures. */
export function assembleSystem(mesh: Mesh, layers: readonly Layer[], measure: Measure, excess: ArrayLike<number>, reference: number): GlobalSystem {
  const n = mesh.positions.length;
  const conductance = new BandedMatrix(n, mesh.order);
  const capacity = new BandedMatrix(n, mesh.order);
  const load = new Float64Array(n);
  const workspace = newElementWorkspace(mesh.order);
  const m = mesh.order + 1;
  for (let e = 0; e < mesh.elementFirstNode.length; e++) {
    const first = mesh.elementFirstNode[e]!;
    const local = elementMatrices(mesh, layers, measure, e, excess, reference, workspace);
    for (let a = 0; a < m; a++) {
      load[first + a] += local.load[a]!;
      for (let b = 0; b < m; b++) {
        conductance.add(first + a, first + b, local.conductance[a * m + b]!);
        capacity.add(first + a, first + b, local.capacity[a * m + b]!);
      }
    }
  }
  for (const contact of mesh.contacts) {
    const g = measure(mesh.positions[contact.innerNode]!) / contact.resistance;
    conductance.add(contact.innerNode, contact.innerNode, g);
    conductance.add(contact.outerNode, contact.outerNode, g);
    conductance.add(contact.innerNode, contact.outerNode, -g);
    conductance.add(contact.outerNode, contact.innerNode, -g);
  }
  return { conductance, capacity, load };
}

/**
 * The residual each layer's own elements leave at every node: r = K_layer·T − F_layer (+ capacity
 * term in transient problems, passed in as `rate`). Evaluated at a layer's end nodes it is the heat
 * entering the layer there (inner end) or minus the heat leaving it (outer end): the conservative
 * way to read heat flows off a finite-element solution, exact to round-off whatever the mesh.
 */
export function layerResidualsAtEnds(
  mesh: Mesh,
  layers: readonly Layer[],
  measure: Measure,
  excess: ArrayLike<number>,
  conductivityExcess: ArrayLike<number>,
  reference: number,
  rate?: ArrayLike<number>,
): LayerEndResiduals[] {
  const m = mesh.order + 1;
  const workspace = newElementWorkspace(mesh.order);
  return layers.map((_, l) => {
    const [first, last] = mesh.layerNodes[l]!;
    const [firstElement, lastElement] = mesh.layerElements[l]!;
    const entry = { innerEnd: 0, outerEnd: 0, innerScale: 0, outerScale: 0 };
    // Only the layer's two end elements touch its end nodes.
    for (const e of firstElement === lastElement ? [firstElement] : [firstElement, lastElement]) {
      const local = elementMatrices(mesh, layers, measure, e, conductivityExcess, reference, workspace, rate !== undefined);
      const start = mesh.elementFirstNode[e]!;
      for (let a = 0; a < m; a++) {
        const node = start + a;
        if (node !== first && node !== last) continue;
        // Conduction rows sum to zero, so use temperature differences (see tangent-assembly.ts).
        let r = -local.load[a]!;
        const ta = excess[node]!;
        for (let b = 0; b < m; b++) {
          if (b !== a) r += local.conductance[a * m + b]! * (excess[start + b]! - ta);
          if (rate) r += local.capacity[a * m + b]! * rate[start + b]!;
        }
        const scale = Math.abs(local.conductance[a * m + a]!);
        if (node === first) {
          entry.innerEnd += r;
          entry.innerScale += scale;
        }
        if (node === last) {
          entry.outerEnd += r;
          entry.outerScale += scale;
        }
      }
    }
    return entry;
  });
}
