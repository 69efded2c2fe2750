/**
 * What freezes in the pipe: the contents' properties (water by default, from
 * data/physics/water-ice-properties.json, with its source) and the engine layer they become, a solid
 * cylinder from the axis whose latent heat is spread over a narrow range at the freezing point.
 */
import waterIce from '../../../data/physics/water-ice-properties.json' with { type: 'json' };
import { requirePositive } from '../../base/field-checks.js';
import type { Layer, PhaseChange } from '../../fe/problem.js';
import { requireObjectField, requireTemperatureIn } from '../insulated/insulated-inputs.js';

export interface FreezingContents {
  /** kg/m³, of the liquid; the mass per metre is kept through freezing. */
  readonly density: number;
  /** J/(kg·K) */
  readonly liquidSpecificHeat: number;
  readonly solidSpecificHeat: number;
  /** W/(m·K) */
  readonly liquidConductivity: number;
  readonly solidConductivity: number;
  /** J/kg */
  readonly latentHeat: number;
  /** °C */
  readonly freezingTemperature: number;
}

export const WATER: FreezingContents = {
  density: waterIce.water.density,
  liquidSpecificHeat: waterIce.water.specificHeat,
  solidSpecificHeat: waterIce.ice.specificHeat,
  liquidConductivity: waterIce.water.conductivity,
  solidConductivity: waterIce.ice.conductivity,
  latentHeat: waterIce.latentHeat,
  freezingTemperature: waterIce.freezingTemperature,
};

export const WATER_SOURCE = `${waterIce.source} (${waterIce.label})`;

/**
 * K: the default width of the freezing range, ±0.25 K about the freezing point. Narrow enough that
 * the sensible heat inside it is under 1 % of the latent heat (c·w/L ≈ 0.6 %), and the times move
 * by well under 1 % when it is halved (tests/sizing/freeze-protection.test.ts); wide enough to be
 * resolved by the default mesh.
 */
export const DEFAULT_FREEZING_RANGE = 0.5;

export function validateContents(field: string, contents: unknown): void {
  requireObjectField(field, contents, 'the contents: density, specific heats, conductivities, latent heat and freezing temperature');
  const c = contents as FreezingContents;
  requirePositive(`${field}.density`, c.density, 'kg/m³');
  requirePositive(`${field}.liquidSpecificHeat`, c.liquidSpecificHeat, 'J/(kg·K)');
  requirePositive(`${field}.solidSpecificHeat`, c.solidSpecificHeat, 'J/(kg·K)');
  requirePositive(`${field}.liquidConductivity`, c.liquidConductivity, 'W/(m·K)');
  requirePositive(`${field}.solidConductivity`, c.solidConductivity, 'W/(m·K)');
  requirePositive(`${field}.latentHeat`, c.latentHeat, 'J/kg');
  requireTemperatureIn(`${field}.freezingTemperature`, c.freezingTemperature, [-100, 100]);
}

/**
 * The contents as the engine's first layer, from the axis to the pipe's inner radius. The
 * conductivity goes from the solid's to the liquid's across the freezing range, in step with the
 * liquid fraction (a table joined by a straight line and held beyond its ends).
 */
export function contentsLayer(contents: FreezingContents, radius: number, range: number, elements: number): Layer & { readonly phaseChange: PhaseChange } {
  const t = contents.freezingTemperature;
  return {
    name: 'contents',
    thickness: radius,
    conductivity: {
      kind: 'table',
      points: [
        [t - range / 2, contents.solidConductivity],
        [t + range / 2, contents.liquidConductivity],
      ],
    },
    density: contents.density,
    specificHeat: contents.liquidSpecificHeat,
    phaseChange: { temperature: t, latentHeat: contents.latentHeat, range, solidSpecificHeat: contents.solidSpecificHeat },
    elements,
  };
}
