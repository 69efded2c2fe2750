import type { ConductivityModel } from '../../app/fe/conductivity.js';
import { MATERIAL_CATEGORIES, MATERIAL_FIELDS, type MaterialInput } from './material-types.js';
import { MATERIAL_LIMITS } from '../../app/api/material-limits.js';
import { polynomialMinimumOn } from './polynomial-minimum.js';
import { InputError } from '../../app/index.js';
import {
  optionalNumber, optionalText, rejectUnknownKeys, requireNumber, requireObject, requireOneOf, requireText,
} from './validate.js';

export { MATERIAL_LIMITS };

export function validateConductivity(value: unknown, field = 'conductivity'): ConductivityModel {
  const model = requireObject(value, field);
  const kind = requireOneOf(model['kind'], `${field}.kind`, ['constant', 'polynomial', 'table'] as const);
  if (kind === 'constant') {
    rejectUnknownKeys(model, ['kind', 'value'], field);
    return { kind, value: requireNumber(model['value'], `${field}.value`, MATERIAL_LIMITS.conductivity) };
  }
  if (kind === 'polynomial') {
    rejectUnknownKeys(model, ['kind', 'coefficients'], field);
    const raw = model['coefficients'];
    if (!Array.isArray(raw) || raw.length < 1 || raw.length > MATERIAL_LIMITS.maxPolynomialTerms) {
      throw new InputError(`${field}.coefficients`, `${field}.coefficients must list 1 to ${MATERIAL_LIMITS.maxPolynomialTerms} numbers (a0, a1, ... in °C).`);
    }
    return { kind, coefficients: raw.map((c, i) => requireNumber(c, `${field}.coefficients[${i}]`, MATERIAL_LIMITS.polynomialCoefficient)) };
  }
  rejectUnknownKeys(model, ['kind', 'points'], field);
  const raw = model['points'];
  if (!Array.isArray(raw) || raw.length < 2 || raw.length > MATERIAL_LIMITS.maxTablePoints) {
    throw new InputError(`${field}.points`, `${field}.points must list 2 to ${MATERIAL_LIMITS.maxTablePoints} [°C, W/(m·K)] pairs.`);
  }
  const points = raw.map((p, i): [number, number] => {
    if (!Array.isArray(p) || p.length !== 2) throw new InputError(`${field}.points[${i}]`, `${field}.points[${i}] must be a [°C, W/(m·K)] pair.`);
    return [
      requireNumber(p[0], `${field}.points[${i}] temperature`, MATERIAL_LIMITS.temperature),
      requireNumber(p[1], `${field}.points[${i}] conductivity`, MATERIAL_LIMITS.conductivity),
    ];
  });
  for (let i = 1; i < points.length; i++) {
    if (points[i]![0] <= points[i - 1]![0]) {
      throw new InputError(`${field}.points`, `${field}.points must have strictly increasing temperatures (point ${i + 1} is not above point ${i}).`);
    }
  }
  return { kind, points };
}

function vapourResistanceFactorOf(value: unknown): number | null {
  if (value === Infinity) return Infinity;
  return optionalNumber(value, 'vapourResistanceFactor', MATERIAL_LIMITS.vapourResistanceFactor);
}

/** Checks a whole material; every field is checked before the cross-field rules. */
export function validateMaterialInput(value: unknown, field = 'material'): MaterialInput {
  const raw = requireObject(value, field);
  rejectUnknownKeys(raw, MATERIAL_FIELDS, field);
  const input: MaterialInput = {
    name: requireText(raw['name'], 'name', { min: 1, max: MATERIAL_LIMITS.name }),
    category: requireOneOf(raw['category'], 'category', MATERIAL_CATEGORIES),
    conductivity: validateConductivity(raw['conductivity']),
    density: optionalNumber(raw['density'], 'density', MATERIAL_LIMITS.density),
    specificHeat: optionalNumber(raw['specificHeat'], 'specificHeat', MATERIAL_LIMITS.specificHeat),
    vapourResistanceFactor: vapourResistanceFactorOf(raw['vapourResistanceFactor']),
    equivalentAirLayerThickness: optionalNumber(raw['equivalentAirLayerThickness'], 'equivalentAirLayerThickness', MATERIAL_LIMITS.equivalentAirLayerThickness),
    emissivity: optionalNumber(raw['emissivity'], 'emissivity', MATERIAL_LIMITS.emissivity),
    minServiceTemperature: optionalNumber(raw['minServiceTemperature'], 'minServiceTemperature', MATERIAL_LIMITS.temperature),
    maxServiceTemperature: optionalNumber(raw['maxServiceTemperature'], 'maxServiceTemperature', MATERIAL_LIMITS.temperature),
    source: optionalText(raw['source'], 'source', MATERIAL_LIMITS.source),
    notes: optionalText(raw['notes'], 'notes', MATERIAL_LIMITS.notes),
  };
  const { minServiceTemperature: low, maxServiceTemperature: high } = input;
  if (low !== null && high !== null && low >= high) {
    throw new InputError('maxServiceTemperature', `maxServiceTemperature must be above minServiceTemperature (${low} °C).`);
  }
  if (input.conductivity.kind === 'polynomial') assertPolynomialPositive(input.conductivity.coefficients, low, high);
  return input;
}

/**
 * A polynomial extrapolates wildly, so it needs a service range and must stay positive on all of it.
 * (A table is held constant beyond its ends and its points are each positive, so it is positive everywhere.)
 */
export function assertPolynomialPositive(coefficients: readonly number[], low: number | null, high: number | null): void {
  if (low === null || high === null) {
    throw new InputError('minServiceTemperature', 'minServiceTemperature and maxServiceTemperature are required for a polynomial conductivity (the curve is only trusted inside that range).');
  }
  const lowest = polynomialMinimumOn(coefficients, low, high);
  if (!(lowest.value > 0)) {
    throw new InputError('conductivity', `conductivity must stay above 0 W/(m·K) from ${low} to ${high} °C, but the polynomial reaches ${lowest.value.toPrecision(3)} W/(m·K) at ${lowest.x.toFixed(1)} °C.`);
  }
}
