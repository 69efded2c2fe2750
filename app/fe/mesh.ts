/**
 * Mesh: layers -> nodes and elements.
 *
 * Each layer is meshed on its own, so every interface is a node. Planar layers are divided
 * evenly; axisymmetric layers are graded geometrically (every element spans the same ratio of
 * radii), which is the spacing that makes the logarithmic temperature profile equally well
 * resolved everywhere. A layer that starts at the axis (r = 0, a solid cylinder) has no logarithmic
 * part, and no ratio of radii to grade by: its field is smooth and even in r, so it is divided evenly. Where two layers have a contact resistance between them, the interface
 * carries two nodes at the same position joined by a contact conductance.
 */
import { isConstantConductivity } from './conductivity.js';
import type { ElementOrder, Geometry, Layer } from './problem.js';

/**
 * Elements are stored compactly: in 1D the nodes of element e are consecutive, starting at
 * `elementFirstNode[e]` (order + 1 of them), so a million-element mesh is two typed arrays.
 */
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
  /** First node of each element; the element's nodes are firstNode … firstNode + order. */
  readonly elementFirstNode: Int32Array;
  /** Layer of each element. */
  readonly elementLayer: Int32Array;
  /** First and last element of each layer. */
  readonly layerElements: readonly (readonly [number, number])[];
  readonly contacts: readonly ContactLink[];
  /** First and last node of each layer. */
  readonly layerNodes: readonly (readonly [number, number])[];
  /** Element count used in each layer. */
  readonly elementsPerLayer: readonly number[];
  /**
   * True when every layer is one exact steady element (exact-layer-element.ts): a steady problem
   * with no heat generation whose mesh the caller left to the engine.
   */
  readonly exactLayers: boolean;
}

/** Axisymmetric default: at most this much ln(r_out/r_in) per element. */
const AXISYMMETRIC_LOG_SPAN = 0.02;
/** Elements in a layer whose conductivity depends on temperature or that generates heat. */
const CURVED_PROFILE_ELEMENTS = 16;
/** Fewest elements in a layer of a transient problem, where heat is stored along the layer. */
const TRANSIENT_MINIMUM_ELEMENTS = 8;
/**
 * Elements of a layer from the axis: as many as a curved profile gets; linear elements, which
 * converge as h² rather than h⁴, four times as many.
 */
const AXIS_LAYER_ELEMENTS = { 1: 4 * CURVED_PROFILE_ELEMENTS, 2: CURVED_PROFILE_ELEMENTS } as const;

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
  if (geometry.kind === 'axisymmetric' && innerPosition === 0) {
    count = Math.max(count, AXIS_LAYER_ELEMENTS[order]);
  } else if (geometry.kind === 'axisymmetric') {
    const logSpan = Math.log((innerPosition + layer.thickness) / innerPosition);
    // Linear elements converge as h², quadratic ones as h⁴: linear ones need a much finer default.
    const perElement = order === 1 ? AXISYMMETRIC_LOG_SPAN / 25 : AXISYMMETRIC_LOG_SPAN;
    count = Math.max(count, Math.ceil(logSpan / perElement));
  }
  return count;
}

/**
 * A steady problem with no heat generation, whose mesh and element order the caller left to the
 * engine, is meshed with one exact element per layer: its nodes are the faces and interfaces.
 */
export function usesExactLayers(layers: readonly Layer[], order: ElementOrder | undefined, purpose: MeshPurpose): boolean {
  return purpose === 'steady' && order === undefined && layers.every((l) => l.elements === undefined && (l.heatGeneration ?? 0) === 0);
}

export function buildMesh(
  geometry: Geometry,
  layers: readonly Layer[],
  order: ElementOrder,
  purpose: MeshPurpose = 'steady',
  exactLayers = false,
): Mesh {
  if (exactLayers) order = 1;
  // Element counts first, so every array is allocated once at its final size.
  const counts: number[] = [];
  let position = geometry.kind === 'planar' ? 0 : geometry.innerRadius;
  for (const layer of layers) {
    counts.push(exactLayers ? 1 : (layer.elements ?? defaultElementCount(geometry, layer, position, order, purpose)));
    position += layer.thickness;
  }
  const contactCount = layers.slice(0, -1).filter((l) => (l.contactResistanceToNext ?? 0) > 0).length;
  const elementCount = counts.reduce((a, b) => a + b, 0);
  const positions = new Float64Array(elementCount * order + 1 + contactCount);
  const elementFirstNode = new Int32Array(elementCount);
  const elementLayer = new Int32Array(elementCount);
  const contacts: ContactLink[] = [];
  const layerNodes: [number, number][] = [];
  const layerElements: [number, number][] = [];

  let node = 0; // next free node
  let element = 0;
  let start = geometry.kind === 'planar' ? 0 : geometry.innerRadius;
  layers.forEach((layer, layerIndex) => {
    const count = counts[layerIndex]!;
    const end = start + layer.thickness;
    const vertices = layerVertices(geometry, start, end, count);

    // The first node of this layer is shared with the previous layer unless a contact resistance separates them.
    const previousContact = layerIndex > 0 ? (layers[layerIndex - 1]!.contactResistanceToNext ?? 0) : 0;
    if (layerIndex === 0 || previousContact > 0) {
      positions[node] = start;
      if (layerIndex > 0) contacts.push({ innerNode: node - 1, outerNode: node, resistance: previousContact });
      node++;
    }
    const firstNode = node - 1;
    const firstElement = element;
    for (let e = 0; e < count; e++) {
      elementFirstNode[element] = node - 1;
      elementLayer[element] = layerIndex;
      element++;
      if (order === 2) positions[node++] = (vertices[e]! + vertices[e + 1]!) / 2;
      positions[node++] = vertices[e + 1]!;
    }
    // The last vertex is the exact layer end, which keeps interface positions free of round-off.
    layerNodes.push([firstNode, node - 1]);
    layerElements.push([firstElement, element - 1]);
    start = end;
  });

  return { geometry, order, positions, elementFirstNode, elementLayer, layerElements, contacts, layerNodes, elementsPerLayer: counts, exactLayers };
}

function layerVertices(geometry: Geometry, start: number, end: number, count: number): number[] {
  const vertices: number[] = [];
  for (let i = 0; i <= count; i++) {
    const s = i / count;
    vertices.push(geometry.kind === 'planar' || start === 0 ? start + s * (end - start) : start * Math.pow(end / start, s));
  }
  vertices[count] = end;
  return vertices;
}
