/**
 * Range checks of a conductivity model as a case file gives it, on top of the engine's structural
 * checks (app/fe/validate.ts): every value a user typed must be a conductivity a real material can
 * have, and a polynomial must stay within that range over the temperatures the case will meet,
 * since a curve fitted between 0 and 300 °C can run to zero or to thousands outside it.
 */
import { InputError } from '../base/input-error.js';
import { isObject, requireNumberIn } from '../base/field-checks.js';
import { shownValue } from '../base/shown-value.js';
import { describeRange } from '../base/number-range.js';
import { enteredPart, figurePart, rangePart } from '../base/quantity-sentence.js';
import { QUANTITY_RANGES } from '../base/quantity-ranges.js';
import { conductivityAt, type ConductivityModel } from '../fe/conductivity.js';
import { validateConductivity } from '../fe/validate.js';
import { MATERIAL_LIMITS } from './material-limits.js';

const TABLE_TEMPERATURE = MATERIAL_LIMITS.temperature;
const MAX_TABLE_POINTS = MATERIAL_LIMITS.maxTablePoints;
const MAX_POLYNOMIAL_TERMS = 8;
const CONDUCTIVITY_KINDS = ['constant', 'polynomial', 'table'] as const;
/** Samples of a polynomial between the case's lowest and highest temperature. */
const POLYNOMIAL_SAMPLES = 64;

/** Structure, then every number in its documented range. */
export function validateConductivityModel(model: unknown, field: string): ConductivityModel {
  // Present but neither a model nor (in a case file) a number: say what it must be, not that it is missing.
  if (model !== undefined && model !== null && !isObject(model)) {
    throw new InputError(
      field,
      `${field} must be a number in W/(m·K), ${describeRange(QUANTITY_RANGES.conductivity)}, or a conductivity model (constant, polynomial or table) (got ${shownValue(model)}).`,
    );
  }
  const m = model as ConductivityModel;
  if (isObject(model) && !(CONDUCTIVITY_KINDS as readonly unknown[]).includes(model['kind'])) {
    throw new InputError(`${field}.kind`, `${field}.kind must be "constant", "polynomial" or "table"; got ${shownValue(model['kind'])}.`);
  }
  if (m && typeof m === 'object' && m.kind === 'polynomial' && Array.isArray(m.coefficients) && m.coefficients.length > MAX_POLYNOMIAL_TERMS) {
    throw new InputError(`${field}.coefficients`, `${field}.coefficients must list 1 to ${MAX_POLYNOMIAL_TERMS} numbers (a0 + a1·θ + …, θ in °C).`);
  }
  if (m && typeof m === 'object' && m.kind === 'table' && Array.isArray(m.points) && m.points.length > MAX_TABLE_POINTS) {
    throw new InputError(`${field}.points`, `${field}.points must list 1 to ${MAX_TABLE_POINTS} (temperature °C, conductivity W/(m·K)) pairs.`);
  }
  validateConductivity(m, field);
  switch (m.kind) {
    case 'constant':
      requireNumberIn(`${field}.value`, m.value, QUANTITY_RANGES.conductivity);
      break;
    case 'polynomial':
      m.coefficients.forEach((a, i) => requireNumberIn(`${field}.coefficients[${i}]`, a, QUANTITY_RANGES.polynomialCoefficient));
      requireNumberIn(`${field}.coefficients[0]`, m.coefficients[0], QUANTITY_RANGES.conductivity);
      break;
    case 'table':
      m.points.forEach(([t, k], i) => {
        requireNumberIn(`${field}.points[${i}][0]`, t, TABLE_TEMPERATURE);
        requireNumberIn(`${field}.points[${i}][1]`, k, QUANTITY_RANGES.conductivity);
      });
      break;
  }
  return m;
}

/**
 * A polynomial's λ stays within the conductivity range from `low` to `high` °C (the case's lowest
 * and highest named temperature, between which every solved temperature lies). A table is held
 * constant beyond its ends and a constant is one value, so both were settled by their points.
 */
export function requireConductivityOver(model: ConductivityModel, field: string, low: number, high: number): void {
  if (model.kind !== 'polynomial') return;
  const range = QUANTITY_RANGES.conductivity;
  for (let i = 0; i <= POLYNOMIAL_SAMPLES; i++) {
    const t = low + ((high - low) * i) / POLYNOMIAL_SAMPLES;
    const k = conductivityAt(model, t);
    if (!(k >= range.min && k <= range.max)) {
      const gives = Number.isFinite(k) ? figurePart(k, 'conductivity', `${k.toPrecision(3)} W/(m·K)`) : 'no finite value';
      throw new InputError(field, [
        `${field} gives `,
        gives,
        ' at ',
        figurePart(t, 'temperature', `${t.toPrecision(4)} °C`),
        ', but must stay ',
        rangePart({ ...range, quantity: 'conductivity' }, 'conductivity', describeRange(range)),
        " over the case's temperatures (",
        enteredPart(low, 'temperature', String(low), true),
        ' to ',
        enteredPart(high, 'temperature', `${high} °C`),
        ').',
      ]);
    }
  }
}
