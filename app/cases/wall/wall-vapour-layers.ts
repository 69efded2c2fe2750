/**
 * The vapour side of a wall case: the s_d of each layer the thermal model includes, s_d,j = μ_j·d_j
 * (or the material's own s_d, for membranes whose thickness is not modelled), still air μ = 1 in
 * air layers, and the names of the points between them for reports. Validated when the case is
 * parsed (wall-validation.ts asks for μ or s_d on every layer whenever moisture is checked).
 */
import { InputError } from '../../base/input-error.js';
import { enteredPart } from '../../base/quantity-sentence.js';
import type { VapourLayer } from '../../checks/interstitial-vapour-stack.js';
import { isAirLayer, type WallInput } from './wall-input.js';
import type { ThermalStack } from './wall-thermal-stack.js';

export interface WallVapourLayers {
  readonly layers: readonly VapourLayer[];
  /** Inside surface, each interface, outside surface (or the face of a well ventilated layer). */
  readonly pointNames: readonly string[];
}

/** s_d of each included layer; throws InputError naming the field where μ and s_d are both missing or out of range. */
export function vapourLayers(input: WallInput, includedIndices: readonly number[], names: readonly string[]): VapourLayer[] {
  return includedIndices.map((index, j) => {
    const layer = input.layers[index]!;
    const field = `layers[${index}].material`;
    if (isAirLayer(layer)) return { index, name: names[j]!, sd: layer.thickness };
    const m = layer.material;
    if (m.equivalentAirLayerThickness !== null && m.equivalentAirLayerThickness !== undefined) {
      const sd = m.equivalentAirLayerThickness;
      if (typeof sd !== 'number' || Number.isNaN(sd) || !(sd > 0)) {
        const shown = typeof sd === 'number' && Number.isFinite(sd) ? enteredPart(sd, 'equivalentAirLayerThickness', String(sd)) : String(sd);
        throw new InputError(`${field}.equivalentAirLayerThickness`, [`${field}.equivalentAirLayerThickness must be greater than `, enteredPart(0, 'equivalentAirLayerThickness', '0 m'), ' (or Infinity for vapour-tight) (got ', shown, ').']);
      }
      return { index, name: names[j]!, sd };
    }
    const mu = m.vapourResistanceFactor;
    if (mu === null || mu === undefined) {
      throw new InputError(
        `${field}.vapourResistanceFactor`,
        `${field}.vapourResistanceFactor is needed for the moisture checks: give μ (1 or more, Infinity for vapour-tight) or an equivalentAirLayerThickness s_d in m.`,
      );
    }
    if (typeof mu !== 'number' || Number.isNaN(mu) || !(mu > 0)) {
      throw new InputError(`${field}.vapourResistanceFactor`, `${field}.vapourResistanceFactor must be greater than 0 (1 for still air, Infinity for vapour-tight) (got ${String(mu)}).`);
    }
    return { index, name: names[j]!, sd: mu * layer.thickness };
  });
}

/** The vapour layers of the included part of the stack, with the names of the points between them. */
export function wallVapourLayers(input: WallInput, stack: ThermalStack): WallVapourLayers {
  const included = stack.layers.filter((l) => l.included);
  const layers = vapourLayers(
    input,
    included.map((l) => l.index),
    included.map((l) => l.name),
  );
  const ventilated = stack.ventilation.rule === 'well-ventilated';
  const pointNames = Array.from({ length: layers.length + 1 }, (_, k) => {
    if (k === 0) return 'inside surface';
    if (k === layers.length) return ventilated ? 'face of the well ventilated air layer' : 'outside surface';
    return `interface between ${layers[k - 1]!.name} and ${layers[k]!.name}`;
  });
  return { layers, pointNames };
}
