/**
 * Where the next solve of a sweep starts: the face and interface temperatures of a solved stack
 * (inner face, each interface, outer face). Neighbouring thicknesses, or neighbouring fluid
 * temperatures along a run, have fields that differ little, so Newton started here needs fewer
 * iterations and still stops at the same tolerance (app/fe/steady-start.ts).
 */
import type { SteadyStart } from '../../fe/steady-solve.js';

export function stackStart(layers: readonly { readonly innerTemperature: number; readonly outerTemperature: number }[]): SteadyStart {
  return { faceTemperatures: [layers[0]!.innerTemperature, ...layers.map((l) => l.outerTemperature)] };
}
