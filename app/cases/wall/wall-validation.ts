/**
 * Edge validation of a wall input. Each failure is one InputError sentence naming the field path
 * (e.g. `layers[2].thickness`) and the allowed range, so a bad value never reaches the engine as NaN.
 */
import classTable from '../../../data/physics/humidity-classes.json' with { type: 'json' };
import { requireFinite, requireNumberIn, requirePositive } from '../../base/field-checks.js';
import type { QuantityName } from '../../base/quantities.js';
import { enteredPart, rangePart } from '../../base/quantity-sentence.js';
import { QUANTITY_RANGES } from '../../base/quantity-ranges.js';
import { InputError } from '../../fe/errors.js';
import { airLayerVentilation, HEAT_FLOW_DIRECTIONS } from '../../physics/index.js';
import type { MonthlyClimate } from '../../checks/monthly-climate.js';
import type { NumberRange } from '../../base/number-range.js';
import { combinedPathCount, MAXIMUM_COMBINED_PATHS } from './wall-combined-method.js';
import { isAirLayer, type AirCondition, type WallInput, type WallMaterialLayer } from './wall-input.js';
import { ventOpeningQuantity } from './vent-opening.js';

const VENTILATIONS = ['unventilated', 'slightly-ventilated', 'well-ventilated'] as const;

import { shownValue as shown } from '../../base/shown-value.js';

/** A finite number; `quantity` is the kind of `unit`, so a refusal reads in a project's units. */
function finite(field: string, value: unknown, unit: string, quantity?: QuantityName): number {
  return requireFinite(field, value, unit, quantity);
}

/** Relative humidity as a fraction; the message states the range both ways (0 to 1 = 0 to 100 %). */
export function requireRelativeHumidity(field: string, value: unknown): number {
  const v = finite(field, value, 'fraction 0..1');
  if (v < 0 || v > 1) {
    // Parts, so a form showing humidity in per cent says "at least 0 and at most 100 % (got 150 %)".
    const allowed = rangePart({ min: 0, max: 1, unit: '' }, 'relativeHumidity', 'a fraction from 0 to 1 (0 to 100 %)');
    throw new InputError(field, [`${field} must be `, allowed, ' (got ', enteredPart(v, 'relativeHumidity', String(v)), ').']);
  }
  return v;
}

export function requireAirCondition(field: string, value: unknown): AirCondition {
  if (!value || typeof value !== 'object') {
    throw new InputError(field, `${field} must be an object with a temperature in °C and a relativeHumidity from 0 to 1 (0 to 100 %).`);
  }
  const c = value as AirCondition;
  const t = finite(`${field}.temperature`, c.temperature, '°C', 'temperature');
  if (t < -100 || t > 100) {
    const celsius = (v: number, si: string) => enteredPart(v, 'temperature', si);
    throw new InputError(`${field}.temperature`, [`${field}.temperature must be between `, celsius(-100, '-100 °C'), ' and ', celsius(100, '100 °C'), ' (got ', celsius(t, String(t)), ').']);
  }
  requireRelativeHumidity(`${field}.relativeHumidity`, c.relativeHumidity);
  return c;
}

export function validateClimate(field: string, climate: MonthlyClimate): void {
  if (!climate || typeof climate !== 'object' || !Array.isArray(climate.months) || climate.months.length !== 12) {
    throw new InputError(`${field}.months`, `${field}.months must list exactly 12 months.`);
  }
  climate.months.forEach((m, i) => {
    const f = `${field}.months[${i}]`;
    if (typeof m.days !== 'number' || !Number.isInteger(m.days) || m.days < 28 || m.days > 31) {
      throw new InputError(`${f}.days`, `${f}.days must be a whole number of days from 28 to 31 (got ${shown(m.days)}).`);
    }
    requireAirCondition(`${f}.outside`, m.outside);
    requireAirCondition(`${f}.inside`, m.inside);
  });
}

/** Throws InputError for the first bad field; returns nothing. */
export function validateWallInput(input: WallInput): void {
  if (!input || typeof input !== 'object') throw new InputError('wall', 'wall must be an object describing the layers and conditions.');
  if (!Array.isArray(input.layers) || input.layers.length < 1 || input.layers.length > 100) {
    throw new InputError('layers', 'layers must list 1 to 100 layers, inside to outside.');
  }
  if (!(HEAT_FLOW_DIRECTIONS as readonly unknown[]).includes(input.heatFlowDirection)) {
    throw new InputError(
      'heatFlowDirection',
      `heatFlowDirection must be one of ${HEAT_FLOW_DIRECTIONS.map((d) => `'${d}'`).join(', ')} (got ${shown(input.heatFlowDirection)}).`,
    );
  }
  input.layers.forEach((layer, i) => {
    const f = `layers[${i}]`;
    if (!layer || typeof layer !== 'object') throw new InputError(f, `${f} must be a material layer or an air layer.`);
    if (isAirLayer(layer)) {
      requireNumberIn(`${f}.thickness`, layer.thickness, QUANTITY_RANGES.airLayerThickness);
      if (!(VENTILATIONS as readonly unknown[]).includes(layer.ventilation)) {
        throw new InputError(`${f}.ventilation`, `${f}.ventilation must be one of ${VENTILATIONS.map((v) => `'${v}'`).join(', ')} (got ${shown(layer.ventilation)}).`);
      }
      // Per m of a vertical layer or per m² of a horizontal one: the kind the figures convert as.
      const opening = ventOpeningQuantity(input.heatFlowDirection);
      const area = (v: number, si: string, bare = true) => enteredPart(v, opening, si, bare);
      if (layer.openingArea !== undefined) {
        const a = requireNumberIn(`${f}.openingArea`, layer.openingArea, { ...QUANTITY_RANGES.openingArea, quantity: opening });
        const implied = airLayerVentilation(a);
        if (implied !== layer.ventilation) {
          throw new InputError(`${f}.ventilation`, [
            `${f}.ventilation is '${layer.ventilation}' but an opening area of `,
            area(a, `${a} mm² per m (or per m²)`, false),
            ` makes the layer '${implied}' (≤ `,
            area(500, '500'),
            ' unventilated, ',
            area(500, '500'),
            ' to ',
            area(1500, '1500'),
            ' slightly, above ',
            area(1500, '1500'),
            ' well ventilated).',
          ]);
        }
      } else if (layer.ventilation === 'slightly-ventilated') {
        throw new InputError(`${f}.openingArea`, [`${f}.openingArea is needed for a slightly ventilated layer: give a value above `, area(500, '500'), ' and up to ', area(1500, '1500 mm² per m (or per m²)', false), '.']);
      }
      if (layer.emissivities !== undefined) {
        if (!Array.isArray(layer.emissivities) || layer.emissivities.length !== 2) {
          throw new InputError(`${f}.emissivities`, `${f}.emissivities must be a pair of numbers from 0 to 1.`);
        }
        layer.emissivities.forEach((e, k) => {
          const v = finite(`${f}.emissivities[${k}]`, e, 'fraction');
          if (v < 0 || v > 1) throw new InputError(`${f}.emissivities[${k}]`, `${f}.emissivities[${k}] must be from 0 to 1 (got ${v}).`);
        });
      }
      return;
    }
    requireNumberIn(`${f}.thickness`, layer.thickness, QUANTITY_RANGES.wallLayerThickness);
    if (!layer.material || typeof layer.material !== 'object' || !layer.material.conductivity) {
      throw new InputError(`${f}.material`, `${f}.material must give the material's properties, at least its conductivity in W/(m·K).`);
    }
    validateLayerBridgesAndCorrections(layer, f);
  });
  requireFewEnoughPaths(input);
  requireAirCondition('inside', input.inside);
  requireAirCondition('outside', input.outside);
  const rs = input.surfaceResistances ?? 'standard';
  if (rs !== 'standard') {
    if (typeof rs !== 'object') {
      throw new InputError('surfaceResistances', `surfaceResistances must be 'standard' or an object { inside, outside } in m²·K/W.`);
    }
    for (const side of ['inside', 'outside'] as const) {
      const v = requirePositive(`surfaceResistances.${side}`, rs[side], 'm²·K/W', 'thermalResistance');
      const resistance = (x: number, si: string, bare = false) => enteredPart(x, 'thermalResistance', si, bare);
      if (v > 10) throw new InputError(`surfaceResistances.${side}`, [`surfaceResistances.${side} must be greater than `, resistance(0, '0', true), ' and at most ', resistance(10, '10 m²·K/W'), ' (got ', resistance(v, String(v)), ').']);
    }
  }
  if (input.area !== undefined) requireNumberIn('area', input.area, QUANTITY_RANGES.area);
  const h = input.moisture?.insideHumidity;
  if (h !== undefined && h.kind !== 'measured' && h.kind !== 'class') {
    throw new InputError('moisture.insideHumidity.kind', `moisture.insideHumidity.kind must be 'measured' or 'class' (got ${shown((h as { kind?: unknown }).kind)}).`);
  }
  if (h?.kind === 'class') {
    const ids = classTable.classes.map((c) => c.humidityClass);
    if (!ids.includes(h.humidityClass)) {
      throw new InputError(
        'moisture.insideHumidity.humidityClass',
        `moisture.insideHumidity.humidityClass must be a whole number from ${Math.min(...ids)} to ${Math.max(...ids)} (got ${shown(h.humidityClass)}).`,
      );
    }
  }
  if (input.moisture?.climate !== undefined) validateClimate('moisture.climate', input.moisture.climate);
  if (input.targetU !== undefined) validateTargetU(input);
}

/** Most bridges one layer may carry. */
export const MAXIMUM_BRIDGES_PER_LAYER = 8;
/** Area fraction of a bridge: 0 (none) up to but not including the whole face. */
export const BRIDGE_FRACTION_RANGE: NumberRange = { min: 0, max: 1, maxExclusive: true, unit: '(a share of the face area)' };
/** Fastener figures (ISO 6946 Annex F): conductivity, number per m², cross-section of one fastener. */
export const FASTENER_RANGES = {
  conductivity: QUANTITY_RANGES.conductivity,
  perSquareMetre: { min: 0, minExclusive: true, max: 1000, unit: 'fasteners per square metre of element' },
  crossSectionArea: { min: 0, minExclusive: true, max: 0.01, unit: 'm²', quantity: 'area' },
} as const satisfies Record<string, NumberRange>;
/** A target U-value, W/(m²·K). */
export const TARGET_U_RANGE: NumberRange = { min: 0, minExclusive: true, max: 10, unit: 'W/(m²·K)', quantity: 'uValue' };
/** Most thicknesses a target-U series may list. */
export const MAXIMUM_TARGET_THICKNESSES = 100;

/** The bridges of a material layer, its air-gap level and its fasteners. */
function validateLayerBridgesAndCorrections(layer: WallMaterialLayer, f: string): void {
  if (layer.bridges !== undefined) {
    if (!Array.isArray(layer.bridges) || layer.bridges.length < 1 || layer.bridges.length > MAXIMUM_BRIDGES_PER_LAYER) {
      throw new InputError(`${f}.bridges`, `${f}.bridges must list 1 to ${MAXIMUM_BRIDGES_PER_LAYER} bridging sections (or be left out for a homogeneous layer).`);
    }
    layer.bridges.forEach((b, k) => {
      const g = `${f}.bridges[${k}]`;
      if (!b || typeof b !== 'object') throw new InputError(g, `${g} must be an object { material or materialId, fraction }.`);
      if (!b.material || typeof b.material !== 'object' || !b.material.conductivity) {
        throw new InputError(`${g}.material`, `${g}.material must give the bridge's properties, at least its conductivity in W/(m·K).`);
      }
      requireNumberIn(`${g}.fraction`, b.fraction, BRIDGE_FRACTION_RANGE);
    });
    const bridged = layer.bridges.reduce((s, b) => s + b.fraction, 0);
    if (!(bridged < 1)) {
      throw new InputError(
        `${f}.bridges`,
        `${f}.bridges: the fractions add up to ${Number(bridged.toPrecision(6))}, but they must add up to less than 1, the rest of the area being the layer's own material.`,
      );
    }
  }
  if (layer.airGapLevel !== undefined && !([0, 1, 2] as unknown[]).includes(layer.airGapLevel)) {
    throw new InputError(`${f}.airGapLevel`, `${f}.airGapLevel must be 0, 1 or 2 (the ISO 6946 levels of air gaps) (got ${shown(layer.airGapLevel)}).`);
  }
  const fasteners = layer.fasteners;
  if (fasteners !== undefined) {
    if (!fasteners || typeof fasteners !== 'object') {
      throw new InputError(`${f}.fasteners`, `${f}.fasteners must be an object { conductivity, perSquareMetre, crossSectionArea, lengthInLayer }.`);
    }
    requireNumberIn(`${f}.fasteners.conductivity`, fasteners.conductivity, FASTENER_RANGES.conductivity);
    requireNumberIn(`${f}.fasteners.perSquareMetre`, fasteners.perSquareMetre, FASTENER_RANGES.perSquareMetre);
    requireNumberIn(`${f}.fasteners.crossSectionArea`, fasteners.crossSectionArea, FASTENER_RANGES.crossSectionArea);
    if (fasteners.lengthInLayer !== undefined) {
      const thickness = (v: number, si: string, bare = true) => enteredPart(v, 'thickness', si, bare);
      const d1 = requireFinite(`${f}.fasteners.lengthInLayer`, fasteners.lengthInLayer, 'm', 'thickness');
      if (!(d1 > 0 && d1 <= layer.thickness)) {
        throw new InputError(`${f}.fasteners.lengthInLayer`, [
          `${f}.fasteners.lengthInLayer must be greater than `,
          thickness(0, '0'),
          ' and at most the layer thickness ',
          thickness(layer.thickness, `${layer.thickness} m`, false),
          ' (got ',
          thickness(d1, String(d1)),
          ').',
        ]);
      }
    }
  }
}

/** The upper limit of the combined method takes every combination of sections: their number is bounded. */
function requireFewEnoughPaths(input: WallInput): void {
  const counts = input.layers.flatMap((l) => (!isAirLayer(l) && l.bridges && l.bridges.length > 0 ? [l.bridges.length + 1] : []));
  const paths = combinedPathCount(counts);
  if (paths > MAXIMUM_COMBINED_PATHS) {
    throw new InputError('layers', `layers: the bridged layers make ${paths} parallel paths through the element (the product of their sections), but at most ${MAXIMUM_COMBINED_PATHS} are supported.`);
  }
}

function validateTargetU(input: WallInput): void {
  const t = input.targetU!;
  if (!t || typeof t !== 'object') throw new InputError('targetU', 'targetU must be an object { layer, thicknesses, value }.');
  const layer = input.layers[t.layer];
  if (typeof t.layer !== 'number' || !Number.isInteger(t.layer) || !layer || isAirLayer(layer)) {
    throw new InputError('targetU.layer', `targetU.layer must name one of the material layers (got ${shown(t.layer)}).`);
  }
  const ventilated = input.layers.findIndex((l) => isAirLayer(l) && l.ventilation === 'well-ventilated');
  if (ventilated >= 0 && t.layer > ventilated) {
    throw new InputError('targetU.layer', `targetU.layer must name a layer that counts in the U-value, not one outside the well ventilated air layer layers[${ventilated}] (got layers[${t.layer}]).`);
  }
  if (!Array.isArray(t.thicknesses) || t.thicknesses.length < 1 || t.thicknesses.length > MAXIMUM_TARGET_THICKNESSES) {
    throw new InputError('targetU.thicknesses', `targetU.thicknesses must list 1 to ${MAXIMUM_TARGET_THICKNESSES} thicknesses in m, or give { from, to, step }.`);
  }
  t.thicknesses.forEach((d, k) => requireNumberIn(`targetU.thicknesses[${k}]`, d, QUANTITY_RANGES.wallLayerThickness));
  requireNumberIn('targetU.value', t.value, TARGET_U_RANGE);
}
