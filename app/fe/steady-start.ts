/**
 * A starting guess for the steady Newton iteration from a solve of a similar problem: the
 * temperatures at its faces and interfaces. A sweep over one layer's thickness, or over a fluid
 * temperature along a run, solves many problems whose fields differ little; Newton started from the
 * neighbour's field needs fewer iterations than from the uniform guess, and converges to the same
 * solution (the tolerance decides where it stops, not the start).
 *
 * Within a layer the guess follows the profile of constant conductivity: straight in x (planar),
 * straight in ln r (axisymmetric), so for such layers it is already exact between the given faces.
 */
import type { Discretisation } from './discretisation.js';

export interface SteadyStart {
  /** °C at the inner face, at each interface, and at the outer face: one more value than layers. */
  readonly faceTemperatures: readonly number[];
}

/** Excess temperatures over d.reference at every node, or null when the start does not fit the problem. */
export function startingTemperatures(d: Discretisation, start: SteadyStart): Float64Array | null {
  const faces = start.faceTemperatures;
  const { mesh } = d;
  if (faces.length !== mesh.layerNodes.length + 1 || !faces.every(Number.isFinite)) return null;
  const logarithmic = mesh.geometry.kind === 'axisymmetric';
  const coordinate = (x: number): number => (logarithmic ? Math.log(x) : x);
  const guess = new Float64Array(mesh.positions.length);
  mesh.layerNodes.forEach(([first, last], layer) => {
    const a = coordinate(mesh.positions[first]!);
    const b = coordinate(mesh.positions[last]!);
    const inner = faces[layer]! - d.reference;
    const outer = faces[layer + 1]! - d.reference;
    for (let node = first; node <= last; node++) {
      // A layer from the axis (ln 0) has no logarithmic profile: its nodes take its inner value.
      const s = b > a && Number.isFinite(a) ? (coordinate(mesh.positions[node]!) - a) / (b - a) : 0;
      guess[node] = inner + s * (outer - inner);
    }
  });
  return guess;
}
