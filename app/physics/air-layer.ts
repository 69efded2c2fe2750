/**
 * Thermal resistance of an unventilated air layer in a building element (ISO 6946), by the
 * annex formula R_g = 1/(h_a + E·h_r0) and by the standard's table (data, labelled from memory in
 * data/physics/iso6946-air-layers.json), plus the rules for slightly and well ventilated layers.
 *
 * h_a (conduction/convection across the layer, W/(m²·K)), d in m:
 *   horizontal heat flow  max(1.25, 0.025/d)
 *   upward                max(1.95, 0.025/d)
 *   downward              max(0.12·d^−0.44, 0.025/d)
 * E = 1/(1/ε₁ + 1/ε₂ − 1); h_r0 = 4σT_m³.
 */
import table from '../../data/physics/iso6946-air-layers.json' with { type: 'json' };
import { InputError } from './errors.js';
import { HEAT_FLOW_DIRECTIONS, type HeatFlowDirection } from './heat-flow-direction.js';
import { requireFinite, requireInRange, requireNonNegative, requireOneOf } from './input-checks.js';
import { blackBodyRadiationCoefficient } from './radiation.js';

export const AIR_LAYER_SOURCE: string = table.source;
/** Largest air-layer thickness the formula and table cover, m. */
export const AIR_LAYER_MAXIMUM_THICKNESS: number = table.formula.maximumThickness;

export interface AirLayerInput {
  /** m, 0 … 0.3 */
  readonly thickness: number;
  readonly direction: HeatFlowDirection;
  /** Emissivities of the two faces bounding the layer, 0..1; default 0.9 each. */
  readonly emissivities?: readonly [number, number];
  /** θ_m in °C; default 10 °C. */
  readonly meanTemperature?: number;
}

function thicknessOf(input: AirLayerInput): number {
  return requireInRange('thickness', input.thickness, 0, AIR_LAYER_MAXIMUM_THICKNESS, 'm');
}

/** Effective emittance E = 1/(1/ε₁ + 1/ε₂ − 1) between two parallel grey faces. */
export function effectiveEmittance(first: number, second: number): number {
  const e1 = requireInRange('emissivities[0]', first, 0, 1);
  const e2 = requireInRange('emissivities[1]', second, 0, 1);
  if (e1 === 0 || e2 === 0) return 0;
  return 1 / (1 / e1 + 1 / e2 - 1);
}

/** h_a across a layer of thickness d (m) for the heat-flow direction, W/(m²·K). */
export function airLayerConvectionCoefficient(thickness: number, direction: HeatFlowDirection): number {
  const d = requireNonNegative('thickness', thickness, 'm');
  const dir = requireOneOf('direction', direction, HEAT_FLOW_DIRECTIONS);
  const f = table.formula;
  const conduction = d === 0 ? Number.POSITIVE_INFINITY : f.conductionNumerator / d;
  const floor =
    dir === 'horizontal'
      ? f.horizontalMinimum
      : dir === 'upward'
        ? f.upwardMinimum
        : f.downwardFactor * d ** f.downwardExponent;
  return Math.max(floor, conduction);
}

/** R_g by the annex formula, m²·K/W (0 for a layer of zero thickness). */
export function airLayerResistance(input: AirLayerInput): number {
  const d = thicknessOf(input);
  if (d === 0) return 0;
  const [e1, e2] = input.emissivities ?? [0.9, 0.9];
  const E = effectiveEmittance(e1, e2);
  const hr0 = blackBodyRadiationCoefficient(input.meanTemperature ?? 10);
  return 1 / (airLayerConvectionCoefficient(d, input.direction) + E * hr0);
}

/** R_g from the standard's table (high-emissivity faces), interpolated linearly in thickness. */
export function airLayerResistanceFromTable(thickness: number, direction: HeatFlowDirection): number {
  const mm = requireInRange('thickness', thickness, 0, AIR_LAYER_MAXIMUM_THICKNESS, 'm') * 1000;
  const dir = requireOneOf('direction', direction, HEAT_FLOW_DIRECTIONS);
  const rows = table.rows;
  let i = 0;
  while (i < rows.length - 2 && mm > rows[i + 1]!.thickness) i++;
  const a = rows[i]!;
  const b = rows[i + 1]!;
  const t = (mm - a.thickness) / (b.thickness - a.thickness);
  return a[dir] + t * (b[dir] - a[dir]);
}

export type AirLayerVentilation = 'unventilated' | 'slightly-ventilated' | 'well-ventilated';

/**
 * Classifies a layer by its opening area A_v, mm² per m of length (vertical layers) or per m² of
 * area (horizontal layers): ≤ 500 unventilated, ≤ 1500 slightly ventilated, above well ventilated.
 */
export function airLayerVentilation(openingArea: number): AirLayerVentilation {
  const a = requireNonNegative('openingArea', openingArea, 'mm² per m or per m²');
  const v = table.ventilation;
  if (a <= v.unventilatedMaximum) return 'unventilated';
  if (a <= v.slightlyVentilatedMaximum) return 'slightly-ventilated';
  return 'well-ventilated';
}

/**
 * Total resistance of an element with a slightly ventilated layer:
 * R_T = (1500 − A_v)/1000 · R_T,u + (A_v − 500)/1000 · R_T,v, where R_T,u is the total with the
 * layer taken as unventilated and R_T,v with it taken as well ventilated.
 */
export function slightlyVentilatedTotalResistance(
  openingArea: number,
  unventilatedTotal: number,
  wellVentilatedTotal: number,
): number {
  const v = table.ventilation;
  const a = requireInRange('openingArea', openingArea, v.unventilatedMaximum, v.slightlyVentilatedMaximum, 'mm² per m or per m²');
  const span = v.slightlyVentilatedMaximum - v.unventilatedMaximum;
  const ru = requireNonNegative('unventilatedTotal', unventilatedTotal, 'm²·K/W');
  const rv = requireNonNegative('wellVentilatedTotal', wellVentilatedTotal, 'm²·K/W');
  return ((v.slightlyVentilatedMaximum - a) / span) * ru + ((a - v.unventilatedMaximum) / span) * rv;
}

/**
 * Well ventilated layer: the layer and every layer outside it are ignored, and the outer surface
 * resistance becomes the inside surface resistance of the same direction (still air behind the
 * cladding). Returns the R_se to use, given the element's R_si for that direction.
 */
export function wellVentilatedOutsideResistance(insideSurfaceResistance: number): number {
  const r = requireFinite('insideSurfaceResistance', insideSurfaceResistance, 'm²·K/W');
  if (!(r > 0)) {
    throw new InputError('insideSurfaceResistance', `insideSurfaceResistance must be greater than 0 m²·K/W (got ${r}).`);
  }
  return r;
}
