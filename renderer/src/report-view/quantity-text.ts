/**
 * How the report view writes and plots quantities in the project's unit system: the one place the
 * unit system meets the engine's formatting (app/report/format-quantity) and its conversion table
 * (app/base/unit-systems). Every number the view shows, and every value a chart plots, goes
 * through here; the report model itself stays SI.
 */
import type { UnitSystem } from '../../../app/api/contract.js';
import type { QuantityName } from '../../../app/base/quantities.js';
import { toDisplay } from '../../../app/base/unit-systems.js';
import { formatQuantity, formatQuantityNumber, quantityUnit, tableCellTexts } from '../../../app/report/format-quantity.js';
import type { ReportTable } from '../../../app/report/report-model.js';

export interface QuantityText {
  /** "18.6 °C", "50.0 mm"; "—" where the value does not apply. */
  readonly withUnit: (value: number | null, quantity: QuantityName) => string;
  /** The number alone, for a table cell whose header carries the unit. */
  readonly number: (value: number | null, quantity: QuantityName) => string;
  /** A table's cells, numbers without units, each column in one notation. */
  readonly cells: (table: ReportTable) => string[][];
  /** The unit a kind is read in; empty for a dimensionless number. */
  readonly unit: (quantity: QuantityName) => string;
  /** A stored (SI) value in the unit it is read in, for a chart axis: metres of a position become millimetres (or inches). */
  readonly plotted: (value: number, quantity: QuantityName) => number;
  /** "Thickness (mm)": a label with its unit, or the label alone for a dimensionless number. */
  readonly labelWithUnit: (label: string, quantity: QuantityName | undefined) => string;
}

export function quantityText(unitSystem: UnitSystem = 'SI'): QuantityText {
  const unit = (quantity: QuantityName) => quantityUnit(quantity, unitSystem);
  return {
    withUnit: (value, quantity) => formatQuantity(value, quantity, unitSystem),
    number: (value, quantity) => formatQuantityNumber(value, quantity, unitSystem),
    cells: (table) => tableCellTexts(table, unitSystem),
    unit,
    plotted: (value, quantity) => toDisplay(value, quantity, unitSystem),
    labelWithUnit: (label, quantity) => {
      const u = quantity ? unit(quantity) : '';
      return u === '' ? label : `${label} (${u})`;
    },
  };
}
