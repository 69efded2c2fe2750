/**
 * A value of a known kind of quantity as people read it: converted to the unit the kind prints
 * with (in SI the DISPLAY_SCALE of app/base/quantities: mm, %, g/(m²·day)…; in US customary units
 * the table of app/base/unit-systems), rounded to the kind's precision and followed by its unit:
 * "18.6 °C", "53.2 W/m", "0.28 W/(m²·K)", "50.0 mm", "122.0 °F". Null means "does not apply" and
 * prints as "—". Every rendering of the report model (text, screen, paper) writes its
 * numbers through here, so a figure reads alike everywhere.
 */
import { needsExponentForm, numberText } from '../base/number-text.js';
import type { QuantityName } from '../base/quantities.js';
import { displayPrecision, toDisplay, unitLabel, type UnitSystem } from '../base/unit-systems.js';
import type { ReportTable } from './report-model.js';

export const NOT_APPLICABLE = '—';

/** The value without its unit (for a table cell whose column header carries the unit). */
export function formatQuantityNumber(value: number | null, quantity: QuantityName, system: UnitSystem = 'SI'): string {
  if (value === null) return NOT_APPLICABLE;
  if (!Number.isFinite(value)) throw new Error(`A non-finite ${quantity} (${String(value)}) reached the report: the builder must give null or a number.`);
  return numberText(toDisplay(value, quantity, system), displayPrecision(quantity, system));
}

/** The unit a kind prints with; empty for a dimensionless number. */
export function quantityUnit(quantity: QuantityName, system: UnitSystem = 'SI'): string {
  return unitLabel(quantity, system);
}

/** In a project's unit system (app/base/unit-systems) when one is given; SI otherwise. */
export function formatQuantity(value: number | null, quantity: QuantityName, system: UnitSystem = 'SI'): string {
  const text = formatQuantityNumber(value, quantity, system);
  const unit = quantityUnit(quantity, system);
  return value === null || unit === '' ? text : `${text} ${unit}`;
}

/**
 * The cells of a report table as text, each column in one notation: where one number of a column
 * reads in exponent form ("5.78 × 10⁻⁵" among "0.000134"), every number of that column does
 * ("1.34 × 10⁻⁴"), each still at its kind's precision; other columns read as formatQuantityNumber
 * writes them. Text cells stay as they are.
 */
export function tableCellTexts(table: ReportTable, system: UnitSystem = 'SI'): string[][] {
  const inExponentForm = table.columns.map((_, j) =>
    table.rows.some((row) => {
      const cell = row[j];
      return cell !== undefined && typeof cell !== 'string' && cell.value !== null && Number.isFinite(cell.value) && needsExponentForm(toDisplay(cell.value, cell.quantity, system), displayPrecision(cell.quantity, system));
    }),
  );
  return table.rows.map((row) =>
    row.map((cell, j) => {
      if (typeof cell === 'string') return cell;
      if (!inExponentForm[j] || cell.value === null) return formatQuantityNumber(cell.value, cell.quantity, system);
      return numberText(toDisplay(cell.value, cell.quantity, system), displayPrecision(cell.quantity, system), true);
    }),
  );
}
