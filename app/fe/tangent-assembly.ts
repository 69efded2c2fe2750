/**
 * The discrete steady heat balance at a temperature field, and its linearisation for Newton's
 * method. At every node the imbalance is
 *   heat generated + heat in through a natural face − heat conducted away
 * (W/m² of wall or W/m of pipe): zero at the steady state. The tangent is −∂imbalance/∂θ, the
 * conductance plus the λ'(T) terms of each element (see element-matrices.ts), the contact
 * conductances and the film's d(heat out)/dθ_s; it keeps the band of the conductance matrix.
 *
 * Conducted heat is summed element by element in difference form: an element's conductance rows
 * sum to zero (a uniform temperature conducts no heat), so (k·θ)_a = Σ_{b≠a} k_ab (θ_b − θ_a).
 * Evaluated that way it avoids subtracting large, nearly equal products when a thin, highly
 * conductive layer (a steel pipe wall, a metal jacket) sits next to insulation; the imbalance then
 * keeps its digits, and so do Newton's corrections and the temperatures they give.
 */
import { BandedMatrix } from './banded-matrix.js';
import type { Discretisation } from './discretisation.js';
import { elementMatrices, elementWorkspaceSize, newElementWorkspace, type ElementMatrices } from './element-matrices.js';
import { filmHeatIn, filmHeatInSlope } from './face-conditions.js';

export interface BalanceWorkspace {
  /** Heat in − heat out at each node; at a fixed face it is minus the heat that face supplies. */
  readonly imbalance: Float64Array;
  /** −∂imbalance/∂θ in band storage. */
  readonly tangent: BandedMatrix;
  /** The conduction part of the tangent at λ(T) (elements and contacts): its rows sum to zero. */
  readonly conductance: BandedMatrix;
  /** The imbalance without conduction: heat generated plus heat in through the natural faces. */
  readonly sources: Float64Array;
  readonly element: ElementMatrices;
}

export function newBalanceWorkspace(d: Discretisation): BalanceWorkspace {
  const n = d.mesh.positions.length;
  const order = d.mesh.order;
  const band = n * (2 * order + 1);
  // One allocation for all of it: the workspace is made once per solve and reused by every iteration.
  const storage = new Float64Array(2 * n + 2 * band + elementWorkspaceSize(order));
  return {
    imbalance: storage.subarray(0, n),
    sources: storage.subarray(n, 2 * n),
    tangent: new BandedMatrix(n, order, storage.subarray(2 * n, 2 * n + band)),
    conductance: new BandedMatrix(n, order, storage.subarray(2 * n + band, 2 * n + 2 * band)),
    element: newElementWorkspace(order, storage.subarray(2 * n + 2 * band)),
  };
}

/** Fills workspace.imbalance at the given excess temperatures (see Discretisation.reference). */
export function assembleImbalance(d: Discretisation, excess: Float64Array, workspace: BalanceWorkspace): void {
  assemble(d, excess, workspace, false);
}

/** Fills the whole workspace (imbalance, tangent, conductance, sources) at the given excess temperatures. */
export function assembleTangent(d: Discretisation, excess: Float64Array, workspace: BalanceWorkspace): void {
  assemble(d, excess, workspace, true);
}

function assemble(d: Discretisation, excess: Float64Array, workspace: BalanceWorkspace, withTangent: boolean): void {
  const { mesh, layers, measure, reference } = d;
  const { imbalance, tangent, conductance, sources, element } = workspace;
  const m = mesh.order + 1;
  const p = tangent.halfBandwidth;
  const w = tangent.width;
  const t = tangent.data;
  const k = conductance.data;
  imbalance.fill(0);
  sources.fill(0);
  if (withTangent) {
    t.fill(0);
    k.fill(0);
  }

  for (let e = 0; e < mesh.elementFirstNode.length; e++) {
    const first = mesh.elementFirstNode[e]!;
    const local = elementMatrices(mesh, layers, measure, e, excess, reference, element, false);
    for (let a = 0; a < m; a++) {
      const node = first + a;
      const ta = excess[node]!;
      let conducted = 0;
      for (let b = 0; b < m; b++) if (b !== a) conducted += local.conductance[a * m + b]! * (excess[first + b]! - ta);
      imbalance[node] += local.load[a]! - conducted;
      sources[node] += local.load[a]!;
      if (!withTangent) continue;
      // Entry (node, first + b) sits at offset b − a + p of the node's band row.
      for (let b = 0; b < m; b++) {
        t[node * w + b - a + p] += local.tangent[a * m + b]!;
        k[node * w + b - a + p] += local.conductance[a * m + b]!;
      }
    }
  }

  for (const contact of mesh.contacts) {
    const g = measure(mesh.positions[contact.innerNode]!) / contact.resistance;
    const flow = g * (excess[contact.innerNode]! - excess[contact.outerNode]!);
    imbalance[contact.innerNode] -= flow;
    imbalance[contact.outerNode] += flow;
    if (withTangent) {
      for (const matrix of [tangent, conductance]) {
        matrix.add(contact.innerNode, contact.innerNode, g);
        matrix.add(contact.outerNode, contact.outerNode, g);
        matrix.add(contact.innerNode, contact.outerNode, -g);
        matrix.add(contact.outerNode, contact.innerNode, -g);
      }
    }
  }

  for (const face of d.faces) {
    const c = face.condition;
    if (c.kind === 'flux') {
      imbalance[face.node] += c.flux * face.measure;
      sources[face.node] += c.flux * face.measure;
    } else if (c.kind === 'film') {
      const surface = reference + excess[face.node]!;
      const { exchange, heatIn } = filmHeatIn(c, surface);
      imbalance[face.node] += heatIn * face.measure;
      sources[face.node] += heatIn * face.measure;
      if (withTangent) tangent.add(face.node, face.node, -filmHeatInSlope(c, surface, exchange) * face.measure);
    }
    // A fixed face adds nothing here: its row is set aside (stage 1) and read as the reaction.
  }
}

/**
 * The imbalance of the linearised balance after a correction x on the free nodes first … last:
 * imbalance(θ) − tangent·x, for iterative refinement of a Newton correction. It is evaluated at
 * the corrected temperatures θ + x, as sources − conduction(θ + x) − (tangent − conductance)·x,
 * with the conduction in difference form for the same reason as the imbalance: the conducted heat
 * then comes from temperature differences across each element, not from two large products.
 * The rest of the tangent (the λ' terms and the film's slope) has no large entries to cancel.
 * `corrected` is scratch space for θ + x.
 */
export function linearisedImbalance(
  workspace: BalanceWorkspace,
  temperatures: Float64Array,
  x: Float64Array,
  first: number,
  last: number,
  corrected: Float64Array,
  out: Float64Array,
): void {
  const { tangent, conductance, sources } = workspace;
  const p = tangent.halfBandwidth;
  const w = tangent.width;
  const t = tangent.data;
  const k = conductance.data;
  corrected.set(temperatures);
  for (let i = first; i <= last; i++) corrected[i] += x[i]!;
  for (let i = first; i <= last; i++) {
    const ti = corrected[i]!;
    let outflow = 0;
    for (let j = Math.max(0, i - p); j <= Math.min(tangent.size - 1, i + p); j++) {
      const at = i * w + j - i + p;
      if (j !== i) outflow += k[at]! * (corrected[j]! - ti);
      if (j >= first && j <= last) outflow += (t[at]! - k[at]!) * x[j]!;
    }
    out[i] = sources[i]! - outflow;
  }
}
