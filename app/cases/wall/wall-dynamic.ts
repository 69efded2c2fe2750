/**
 * The wall's dynamic thermal characteristics for a daily cycle (ISO 13786:2017, transfer-matrix
 * method, app/physics/periodic-response.ts), from the same element the U-value describes: the
 * counted layers with the conductivity that carries their steady heat flow, each air layer as its
 * resistance R_g, and the surface resistances R_si and R_se in force. So f = |Y_ie|/U uses the
 * report's own U, and Y_ie tends to that U for a long period.
 *
 * Every counted material layer needs its density and specific heat; when one lacks either, there
 * is no result (null) and the report says which layer.
 *
 * A bridged layer counts as one layer with the conductivity of its resistance in the U-value, the
 * area-weighted density ρ = Σ f_m·ρ_m and the specific heat that keeps its heat capacity,
 * c = Σ f_m·ρ_m·c_m / ρ (our modelling choice: the sections' capacities side by side, no source).
 */
import { DAILY_PERIOD, periodicResponse, type PeriodicLayer, type PeriodicResponse } from '../../physics/periodic-response.js';
import { isAirLayer, type WallInput, type WallMaterialLayer } from './wall-input.js';
import type { WallLayerResult } from './wall-result.js';

/** The ISO 13786 figures of a wall for its 24 h cycle (the element matrix itself is left out). */
export type WallDynamicCharacteristics = Omit<PeriodicResponse, 'matrix'>;

/** A counted material layer that lacks what the periodic calculation needs, and what it lacks. */
export interface LayerLackingHeatCapacity {
  readonly name: string;
  readonly missing: 'density' | 'specific heat' | 'density or specific heat';
}

/** The counted material layers without a density or a specific heat, inside → outside. */
export function layersLackingHeatCapacity(input: WallInput, layers: readonly WallLayerResult[]): LayerLackingHeatCapacity[] {
  return layers.flatMap((l): LayerLackingHeatCapacity[] => {
    const given = input.layers[l.index]!;
    if (!l.included || isAirLayer(given)) return [];
    const materials = [given.material, ...(given.bridges ?? []).map((b) => b.material)];
    const noDensity = materials.some((m) => m.density === null);
    const noSpecificHeat = materials.some((m) => m.specificHeat === null);
    if (!noDensity && !noSpecificHeat) return [];
    return [{ name: l.name, missing: noDensity && noSpecificHeat ? 'density or specific heat' : noDensity ? 'density' : 'specific heat' }];
  });
}

/** The characteristics, or null when a counted material layer lacks its density or specific heat. */
export function wallDynamicCharacteristics(
  input: WallInput,
  layers: readonly WallLayerResult[],
  insideSurfaceResistance: number,
  outsideSurfaceResistance: number,
): WallDynamicCharacteristics | null {
  if (layersLackingHeatCapacity(input, layers).length > 0) return null;
  const element: PeriodicLayer[] = layers.flatMap((l): PeriodicLayer[] => {
    const given = input.layers[l.index]!;
    if (!l.included || l.thermalResistance === null) return [];
    if (isAirLayer(given)) return [{ kind: 'resistance', resistance: l.thermalResistance }];
    const capacity = heatCapacityOf(given);
    return [
      {
        kind: 'material',
        thickness: l.thickness,
        conductivity: l.thickness / l.thermalResistance,
        density: capacity.density,
        specificHeat: capacity.specificHeat,
      },
    ];
  });
  const { matrix: _matrix, ...figures } = periodicResponse({ layers: element, insideSurfaceResistance, outsideSurfaceResistance }, DAILY_PERIOD);
  return figures;
}

/** ρ and c of a layer; for a bridged layer the area-weighted ρ and the c that keeps Σ f_m·ρ_m·c_m. */
function heatCapacityOf(layer: WallMaterialLayer): { density: number; specificHeat: number } {
  const bridges = layer.bridges ?? [];
  const own = 1 - bridges.reduce((s, b) => s + b.fraction, 0);
  const sections = [{ fraction: own, material: layer.material }, ...bridges];
  const density = sections.reduce((s, m) => s + m.fraction * m.material.density!, 0);
  const capacity = sections.reduce((s, m) => s + m.fraction * m.material.density! * m.material.specificHeat!, 0);
  return { density, specificHeat: capacity / density };
}
