/**
 * The plain-data description of a wall or roof (a planar building element), in SI: thicknesses in
 * m, temperatures in °C, relative humidity as a fraction 0..1, resistances in m²·K/W, opening areas
 * in mm² per m (vertical air layers) or per m² (horizontal air layers), area in m².
 *
 * Layers are ordered from the inside (warm side in winter) to the outside.
 */
import type { AirCondition } from '../../physics/air-condition.js';
import type { InsideHumiditySource } from '../../checks/mould-humidity-classes.js';
import type { MaterialProperties } from '../../materials/material-properties.js';
import type { AirLayerVentilation, HeatFlowDirection } from '../../physics/index.js';
import type { MonthlyClimate } from '../../checks/monthly-climate.js';

/** A layer of a material with a known thickness. */
export interface WallMaterialLayer {
  readonly kind?: 'material';
  readonly name?: string;
  readonly material: MaterialProperties;
  /** m, > 0 */
  readonly thickness: number;
}

/** An air layer (cavity) treated by the ISO 6946 rules for unventilated, slightly and well ventilated layers. */
export interface WallAirLayer {
  readonly kind: 'air-layer';
  readonly name?: string;
  /** m, > 0 and at most 0.3 */
  readonly thickness: number;
  readonly ventilation: AirLayerVentilation;
  /** Opening area A_v, mm² per m of length (vertical layer) or per m² of area (horizontal layer); required for 'slightly-ventilated'. */
  readonly openingArea?: number;
  /** Emissivities of the two faces bounding the layer, 0..1; default [0.9, 0.9]. */
  readonly emissivities?: readonly [number, number];
}

export type WallLayer = WallMaterialLayer | WallAirLayer;

export type { AirCondition } from '../../physics/air-condition.js';
export type { InsideHumiditySource } from '../../checks/mould-humidity-classes.js';

/** 'standard': the ISO 6946 table for the heat-flow direction; or given values (m²·K/W, > 0). */
export type SurfaceResistanceChoice = 'standard' | { readonly inside: number; readonly outside: number };

export interface WallMoistureInput {
  /** Default { kind: 'measured' }. */
  readonly insideHumidity?: InsideHumiditySource;
  /** Monthly climate for the monthly mould and interstitial-condensation procedures. */
  readonly climate?: MonthlyClimate;
}

export interface WallInput {
  readonly name?: string;
  /** Inside → outside. */
  readonly layers: readonly WallLayer[];
  readonly heatFlowDirection: HeatFlowDirection;
  readonly inside: AirCondition;
  readonly outside: AirCondition;
  /** Default 'standard'. */
  readonly surfaceResistances?: SurfaceResistanceChoice;
  /** Element area, m² (> 0); default 1. */
  readonly area?: number;
  readonly moisture?: WallMoistureInput;
}

export function isAirLayer(layer: WallLayer): layer is WallAirLayer {
  return (layer as WallAirLayer).kind === 'air-layer';
}
