/**
 * The insulation layers of a case with the sized one at another thickness, and the diameter the
 * sized layer goes on (what an installed-cost table per metre of pipe is read by).
 */
import type { MaterialLayer } from '../insulated/layer-build.js';

export function withLayerThickness(layers: readonly MaterialLayer[], index: number, thickness: number): MaterialLayer[] {
  return layers.map((l, i) => (i === index ? { ...l, thickness } : l));
}

/** m: the pipe's outer diameter plus twice every insulation layer inside the sized one. */
export function diameterUnderLayer(pipeOuterDiameter: number, layers: readonly MaterialLayer[], index: number): number {
  return layers.slice(0, index).reduce((d, l) => d + 2 * l.thickness, pipeOuterDiameter);
}
