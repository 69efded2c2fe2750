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

/**
 * A section of another material that crosses a layer side by side with the layer's own material
 * (timber studs between mineral wool, rafters, battens): an inhomogeneous layer in ISO 6946 terms.
 */
export interface WallBridge {
  readonly name?: string;
  readonly material: MaterialProperties;
  /** Share of the element's face area this section takes, 0 ≤ f < 1 (38 mm studs at 600 mm centres: 38/600). */
  readonly fraction: number;
}

/** ISO 6946 Annex F levels of air gaps in an insulation layer: 0 none that matter, 1 gaps through the layer, 2 gaps with free air circulation. */
export type AirGapLevel = 0 | 1 | 2;

/** Mechanical fasteners that cross an insulation layer (ISO 6946 Annex F correction). */
export interface WallFasteners {
  /** λ_f of the fastener, W/(m·K). */
  readonly conductivity: number;
  /** n_f, fasteners per m² of element. */
  readonly perSquareMetre: number;
  /** A_f, cross-section of one fastener, m². */
  readonly crossSectionArea: number;
  /** d_1, the length of the fastener inside the layer, m (≤ the layer's thickness); left out: it crosses the whole layer. */
  readonly lengthInLayer?: number;
}

/** A layer of a material with a known thickness. */
export interface WallMaterialLayer {
  readonly kind?: 'material';
  readonly name?: string;
  /** The layer's own material; with bridges, the section that takes the rest of the area (the infill). */
  readonly material: MaterialProperties;
  /** m, > 0 */
  readonly thickness: number;
  /** Sections of other materials side by side with `material`, each with its area fraction; their fractions add up to less than 1. */
  readonly bridges?: readonly WallBridge[];
  /** Air gaps in this (insulation) layer, for the ISO 6946 Annex F correction ΔU_g; default 0. */
  readonly airGapLevel?: AirGapLevel;
  /** Fasteners crossing this layer, for the ISO 6946 Annex F correction ΔU_f. */
  readonly fasteners?: WallFasteners;
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

/**
 * The smallest thickness of one layer, from a series, that brings the U-value (with the
 * corrections) to a target; the case's own thickness of that layer is left as given.
 */
export interface WallTargetU {
  /** Index of the material layer whose thickness varies. */
  readonly layer: number;
  /** Thicknesses to try, m, rising. */
  readonly thicknesses: readonly number[];
  /** Target U-value, W/(m²·K). */
  readonly value: number;
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
  readonly targetU?: WallTargetU;
}

export function isAirLayer(layer: WallLayer): layer is WallAirLayer {
  return (layer as WallAirLayer).kind === 'air-layer';
}
