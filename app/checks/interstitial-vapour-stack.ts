/**
 * The vapour side of a wall for the Glaser-type method: the equivalent air layer thickness of each
 * layer the thermal model includes, s_d,j = μ_j·d_j (or the material's own s_d, for membranes whose
 * thickness is not modelled), still air μ = 1 in air layers, and the temperatures at the points
 * between layers from the steady engine solution with the ISO 6946 surface resistances.
 */
import { solveWall } from '../cases/wall/wall-calculation.js';
import { isAirLayer, type WallInput } from '../cases/wall/wall-input.js';
import { InputError } from '../fe/errors.js';
import { saturationPressure } from '../physics/index.js';
import parameters from '../../data/physics/iso13788-moisture-parameters.json' with { type: 'json' };

/** δ₀, vapour permeability of still air, kg/(m·s·Pa): the ISO 13788 value, from memory (data/physics/iso13788-moisture-parameters.json). */
export const VAPOUR_PERMEABILITY_OF_AIR: number = parameters.vapourPermeabilityOfAir.value;

export interface VapourLayer {
  /** Index in the input's layer list. */
  readonly index: number;
  readonly name: string;
  /** s_d, m; Infinity for a vapour-tight layer. */
  readonly sd: number;
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
        throw new InputError(`${field}.equivalentAirLayerThickness`, `${field}.equivalentAirLayerThickness must be greater than 0 m (or Infinity for vapour-tight) (got ${String(sd)}).`);
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

export interface VapourStackAtCondition {
  readonly layers: readonly VapourLayer[];
  /** Temperatures at points 0 (inside surface) … N (outside surface of the included stack), °C. */
  readonly temperatures: readonly number[];
  readonly saturation: readonly number[];
  /** Names of the points, for reports. */
  readonly pointNames: readonly string[];
}

/** Solves the wall for θ_i, θ_e and returns the vapour layers with the temperatures and saturation pressures at their faces. */
export function vapourStackAt(input: WallInput, insideTemperature: number, outsideTemperature: number): VapourStackAtCondition {
  const { stack, steady } = solveWall(input, insideTemperature, outsideTemperature);
  const included = stack.layers.filter((l) => l.included);
  const layers = vapourLayers(
    input,
    included.map((l) => l.index),
    included.map((l) => l.name),
  );
  const temperatures = [steady.faces.inner.temperature, ...steady.interfaces.map((i) => i.temperatureInnerSide), steady.faces.outer.temperature];
  const saturation = temperatures.map((t) => saturationPressure(t));
  const ventilated = stack.ventilation.rule === 'well-ventilated';
  const pointNames = temperatures.map((_, k) => {
    if (k === 0) return 'inside surface';
    if (k === layers.length) return ventilated ? 'face of the well ventilated air layer' : 'outside surface';
    return `interface between ${layers[k - 1]!.name} and ${layers[k]!.name}`;
  });
  return { layers, temperatures, saturation, pointNames };
}
