/**
 * The vapour side of a wall for the Glaser-type method: the equivalent air layer thickness s_d of
 * each layer the thermal model includes (built by the wall case from its layers), and the solved
 * temperatures at the points between layers with their saturation pressures. Pure: the
 * temperatures come from a state the wall case solved once.
 */
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

export interface VapourStackAtCondition {
  readonly layers: readonly VapourLayer[];
  /** Temperatures at points 0 (inside surface) … N (outside surface of the included stack), °C. */
  readonly temperatures: readonly number[];
  readonly saturation: readonly number[];
  /** Names of the points, for reports. */
  readonly pointNames: readonly string[];
}

/** The vapour layers with the solved temperature and the saturation pressure at each point between them. */
export function vapourStackAt(layers: readonly VapourLayer[], pointNames: readonly string[], temperatures: readonly number[]): VapourStackAtCondition {
  return { layers, temperatures, saturation: temperatures.map((t) => saturationPressure(t)), pointNames };
}
