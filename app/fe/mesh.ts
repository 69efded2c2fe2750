/**
 * Mesh: layers -> nodes and elements.
 *
 * Each layer is meshed on its own, so every interface is a node. Planar layers are divided
 * evenly; axisymmetric layers are graded geometrically (every element spans the same ratio of
 * radii), which is the spacing that makes the logarithmic temperature profile equally well
 * resolved everywhere. Where two layers have a contact resistance between them, the interface
 * carries two nodes at the same position joined by a contact conductance.
 */
import { isConstantConductivity } from './conductivity.js';
import type { ElementOrder, Geometry, Layer } from './problem.js';

export interface MeshElement {
  /** Global node indices, in order of increasing position. */
  readonly nodes: readonly number[];
  readonly layer: number;
}

export interface ContactLink {
  /** Node on the inner side, node on the outer side (same position). */
  readonly innerNode: number;
  readonly outerNode: number;
  /** Contact resistance, m²·K/W. */
  readonly resistance: number;
}

export interface Mesh {
  readonly geometry: Geometry;
  readonly order: ElementOrder;
  /** Node positions: x from the inner face (planar) or radius r (axisymmetric), m. */
  readonly positions: Float64Array;
  readonly elements: readonly MeshElement[];
  readonly contacts: readonly ContactLink[];
  /** First and last node of each layer. */
  readonly layerNodes: readonly (readonly [number, number])[];
  /** Element count used in each layer. */
  readonly elementsPerLayer: readonly number[];
}

/** Axisymmetric default: at most this much ln(r_out/r_in) per element. */
const AXISYMMETRIC_LOG_SPAN = 0.02;
/** Elements in a layer whose conductivity depends on temperature or that generates heat. */
const CURVED_PROFILE_ELEMENTS = 16;
/** Fewest elements in a layer of a transient problem, where heat is stored along the layer. */
const TRANSIENT_MINIMUM_ELEMENTS = 8;

export type MeshPurpose = 'steady' | 'transient';

/**
 * The default number of elements in a layer: enough that heat flows and temperatures reach 1e-6
 * relative accuracy on the verification cases (see tests/fe). A steady plane layer of constant
 * conductivity has a straight profile that one element represents exactly; giving it more would
 * only add stiff equations (a thin metal sheet) that cost round-off.
 */
export function defaultElementCount(
  geometry: Geometry,
  layer: Layer,
  innerPosition: number,
  order: ElementOrder,
  purpose: MeshPurpose = 'steady',
): number {
  const curved = !isConstantConductivity(layer.conductivity) || (layer.heatGeneration ?? 0) !== 0;
  let count = curved ? CURVED_PROFILE_ELEMENTS : 1;
  if (purpose === 'transient') count = Math.max(count, TRANSIENT_MINIMUM_ELEMENTS);
  if (geometry.kind === 'axisymmetric') {
    const logSpan = Math.log((innerPosition + layer.thickness) / innerPosition);
    // Linear elements converge as h², quadratic ones as h⁴: linear ones need a much finer default.
    const perElement = order === 1 ? AXISYMMETRIC_LOG_SPAN / 25 : AXISYMMETRIC_LOG_SPAN;
    count = Math.max(count, Math.ceil(logSpan / perElement));
  }
  return count;
}

export function buildMesh(geometry: Geometry, layers: readonly Layer[], order: ElementOrder, purpose: MeshPurpose = 'steady'): Mesh {
  const positions: number[] = [];
  const elements: MeshElement[] = [];
  const contacts: ContactLink[] = [];
  const layerNodes: [number, number][] = [];
  const elementsPerLayer: number[] = [];

  let start = geometry.kind === 'planar' ? 0 : geometry.innerRadius;
  layers.forEach((layer, layerIndex) => {
    const count = layer.elements ?? defaultElementCount(geometry, layer, start, order, purpose);
    const end = start + layer.thickness;
    const vertices = layerVertices(geometry, start, end, count);

    // The first node of this layer is shared with the previous layer unless a contact resistance separates them.
    const previousContact = layerIndex > 0 ? (layers[layerIndex - 1]!.contactResistanceToNext ?? 0) : 0;
    let firstNode: number;
    if (layerIndex === 0 || previousContact > 0) {
      firstNode = positions.length;
      positions.push(start);
      if (layerIndex > 0) contacts.push({ innerNode: firstNode - 1, outerNode: firstNode, resistance: previousContact });
    } else {
      firstNode = positions.length - 1;
    }

    let left = firstNode;
    for (let e = 0; e < count; e++) {
      const a = vertices[e]!;
      const b = vertices[e + 1]!;
      const nodes = [left];
      if (order === 2) {
        positions.push((a + b) / 2);
        nodes.push(positions.length - 1);
      }
      positions.push(b);
      nodes.push(positions.length - 1);
      elements.push({ nodes, layer: layerIndex });
      left = positions.length - 1;
    }
    // Snap the last node to the exact layer end to keep interface positions free of round-off.
    positions[positions.length - 1] = end;
    layerNodes.push([firstNode, positions.length - 1]);
    elementsPerLayer.push(count);
    start = end;
  });

  return { geometry, order, positions: Float64Array.from(positions), elements, contacts, layerNodes, elementsPerLayer };
}

function layerVertices(geometry: Geometry, start: number, end: number, count: number): number[] {
  const vertices: number[] = [];
  for (let i = 0; i <= count; i++) {
    const s = i / count;
    vertices.push(geometry.kind === 'planar' ? start + s * (end - start) : start * Math.pow(end / start, s));
  }
  vertices[count] = end;
  return vertices;
}
