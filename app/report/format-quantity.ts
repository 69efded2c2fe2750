/**
 * A value of a known kind of quantity as people read it: scaled to the unit the kind prints with
 * (app/base/quantities DISPLAY_SCALE: mm, %, g/(m²·day)…), rounded to the kind's precision and
 * followed by its unit: "18.6 °C", "53.2 W/m", "0.28 W/(m²·K)", "50.0 mm". Null means "does not
 * apply" and prints as "—". Every rendering of the report model (text, screen, paper) writes its
 * numbers through here, so a figure reads alike everywhere.
 */
import { numberText } from '../base/number-text.js';
import { DISPLAY_SCALE, QUANTITIES, type QuantityName } from '../base/quantities.js';

export const NOT_APPLICABLE = '—';

/** The value without its unit (for a table cell whose column header carries the unit). */
export function formatQuantityNumber(value: number | null, quantity: QuantityName): string {
  if (value === null) return NOT_APPLICABLE;
  if (!Number.isFinite(value)) throw new Error(`A non-finite ${quantity} (${String(value)}) reached the report: the builder must give null or a number.`);
  return numberText(value * (DISPLAY_SCALE[quantity] ?? 1), QUANTITIES[quantity].precision);
}

/** The unit a kind prints with; empty for a dimensionless number. */
export function quantityUnit(quantity: QuantityName): string {
  return QUANTITIES[quantity].unit;
}

export function formatQuantity(value: number | null, quantity: QuantityName): string {
  const text = formatQuantityNumber(value, quantity);
  const unit = quantityUnit(quantity);
  return value === null || unit === '' ? text : `${text} ${unit}`;
}
