/**
 * The check of a case file's sizing.economics: each field in its range, or one InputError whose
 * sentence names the field and the range ("sizing.economics.discountRate must be at least 0 and at
 * most 0.5 (got 0.9)."). The ranges carry their quantity kinds, so a form in US units or per cent
 * states them in its own units. Ranges are common practice, no source: wide enough for any real
 * appraisal, narrow enough to catch a per-cent figure typed as a fraction (5 for 0.05).
 */
import { isObject, rejectUnknownKeys, requireNumberIn, requireWholeNumber } from '../../base/field-checks.js';
import { InputError } from '../../base/input-error.js';
import type { NumberRange } from '../../base/number-range.js';
import { MAX_COST_NAME_LENGTH, requireNamingText, validateInstalledCostTable } from './installed-cost-table-checks.js';
import type { SizingEconomics } from './sizing-model.js';

export const ECONOMICS_RANGES = {
  /** Per kWh of purchased energy; 0 is refused: with free energy no insulation pays, and a blank box is more likely. */
  energyPrice: { min: 0, minExclusive: true, max: 1000, unit: '', quantity: 'pricePerEnergy' },
  /** A price may fall; beyond ±50 %/a it is no longer a forecast. */
  priceEscalation: { min: -0.5, max: 0.5, unit: '', quantity: 'ratePerYear' },
  /** A boiler's efficiency (0 < η ≤ 1) or a chiller's or heat pump's COP (up to 10). */
  generationEfficiency: { min: 0, minExclusive: true, max: 10, unit: '', quantity: 'factor' },
  discountRate: { min: 0, max: 0.5, unit: '', quantity: 'ratePerYear' },
  /** kg CO₂ per kWh purchased: fuels are below 0.4 and lignite-fired grid electricity about 1.1 (from memory); 10 leaves room for any mix. */
  emissionFactor: { min: 0, max: 10, unit: 'kg/kWh', quantity: 'emissionFactor' },
} as const satisfies Record<string, NumberRange>;

/** Whole years of service evaluated. */
export const ECONOMICS_YEARS = { min: 1, max: 100 } as const;
export const MAX_EMISSION_SOURCE_LENGTH = 300;
export const MAX_CURRENCY_LENGTH = 12;

const KEYS = ['energyPrice', 'priceEscalation', 'generationEfficiency', 'discountRate', 'years', 'emissionFactor', 'emissionSource', 'costTable', 'currency'] as const;

/** The economics, checked and copied (only the known fields). `field` is where they sit in the case file. */
export function validateSizingEconomics(value: unknown, field = 'sizing.economics'): SizingEconomics {
  if (!isObject(value)) throw new InputError(field, `${field} must be an object: energyPrice, priceEscalation, generationEfficiency, discountRate, years, emissionFactor, emissionSource and costTable.`);
  rejectUnknownKeys(value, KEYS, field);
  const number = (key: keyof typeof ECONOMICS_RANGES): number => requireNumberIn(`${field}.${key}`, value[key], ECONOMICS_RANGES[key]);
  const economics: SizingEconomics = {
    energyPrice: number('energyPrice'),
    priceEscalation: number('priceEscalation'),
    generationEfficiency: number('generationEfficiency'),
    discountRate: number('discountRate'),
    years: requireWholeNumber(`${field}.years`, value['years'], ECONOMICS_YEARS.min, ECONOMICS_YEARS.max),
    emissionFactor: number('emissionFactor'),
    emissionSource: requireNamingText(`${field}.emissionSource`, value['emissionSource'], MAX_EMISSION_SOURCE_LENGTH),
    costTable: costTable(value['costTable'], `${field}.costTable`),
  };
  const currency = value['currency'];
  if (currency === undefined) return economics;
  return { ...economics, currency: requireNamingText(`${field}.currency`, currency, MAX_CURRENCY_LENGTH) };
}

/** A table's name (found in the shipped or the user's tables by the caller) or the table itself. */
function costTable(value: unknown, field: string): SizingEconomics['costTable'] {
  if (typeof value === 'string') return requireNamingText(field, value, MAX_COST_NAME_LENGTH);
  if (isObject(value)) return validateInstalledCostTable(value, field);
  throw new InputError(field, `${field} must be the name of an installed-cost table or a table { name, basis, points, source }.`);
}
