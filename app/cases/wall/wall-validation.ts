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
import { isAirLayer, type AirCondition, type WallInput } from './wall-input.js';
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
  });
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
}
