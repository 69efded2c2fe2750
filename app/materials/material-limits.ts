/**
 * The allowed range of every material field, in SI. One table for the storage checks
 * (main/services/material-validation.ts) and the library form in the renderer, so both refuse the
 * same values with the same ranges. Wide enough for every real material, narrow enough to catch a
 * unit slip.
 */
import type { NumberRange } from '../base/number-range.js';

export { describeRange, isInRange, type NumberRange } from '../base/number-range.js';

export const MATERIAL_LIMITS = {
  name: 120,
  source: 500,
  notes: 4000,
  conductivity: { min: 0, minExclusive: true, max: 1000, unit: 'W/(m·K)', quantity: 'conductivity' },
  density: { min: 0, minExclusive: true, max: 25000, unit: 'kg/m³', quantity: 'density' },
  specificHeat: { min: 0, minExclusive: true, max: 20000, unit: 'J/(kg·K)', quantity: 'specificHeat' },
  vapourResistanceFactor: { min: 1, max: 1e7, unit: '(or vapour-tight)' },
  equivalentAirLayerThickness: { min: 0, max: 10000, unit: 'm', quantity: 'equivalentAirLayerThickness' },
  emissivity: { min: 0, minExclusive: true, max: 1, unit: '' },
  temperature: { min: -273.15, max: 2000, unit: '°C', quantity: 'temperature' },
  polynomialCoefficient: { min: -1000, max: 1000, unit: '' },
  maxPolynomialTerms: 6,
  maxTablePoints: 100,
} as const satisfies Record<string, number | NumberRange>;
