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
 * K: the default width of the freezing range, ±0.05 K about the freezing point. The reported times
 * are those of the water reaching the range (first ice: its top; the centre: within a tolerance of
 * its top), so they come early by about the time to cool through half the range; the frozen
 * fraction's time is barely affected. On a DN50 steel pipe with 30 mm of mineral wool at −10 °C
 * (tests/sizing/freeze-protection.test.ts) the times to 0 °C and to first ice are 0.8 % early and
 * the time to half frozen 0.1 % early against the range's w → 0 limit; with the earlier ±0.25 K
 * they were 3.6 % early. All on the safe side, and the error grows as the air nears the freezing
 * point. The enthalpy form conserves heat however narrow the range, and the default mesh resolves
 * it (the times move by under 0.01 % when the mesh is refined).
 */
export const DEFAULT_FREEZING_RANGE = 0.1;

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
