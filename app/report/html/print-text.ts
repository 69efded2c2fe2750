/**
 * How the printed report writes its numbers: through the one QuantityText of the project's unit
 * system (app/base/quantity-text), so a US project prints °F and Btu/(h·ft) exactly as its
 * sentences do, and a value that does not apply prints "—".
 */
import { quantityText, type QuantityText } from '../../base/quantity-text.js';
import type { QuantityName } from '../../base/quantities.js';
import { toDisplay, type UnitSystem } from '../../base/unit-systems.js';
import { NOT_APPLICABLE } from '../format-quantity.js';

export interface PrintText {
  readonly text: QuantityText;
  /** "18.6 °C", or "—" where the value does not apply. */
  withUnit(value: number | null, quantity: QuantityName): string;
  /** The number alone, for a table cell whose header carries the unit. */
  number(value: number | null, quantity: QuantityName): string;
  /** "Thickness (mm)": a label with its unit, or the label alone for a dimensionless number. */
  labelWithUnit(label: string, quantity: QuantityName | undefined): string;
  /** A stored SI value in the unit it is read in, for a chart axis. */
  plotted(value: number, quantity: QuantityName): number;
}

export function printText(system: UnitSystem): PrintText {
  const text = quantityText(system);
  return {
    text,
    withUnit: (value, quantity) => (value === null ? NOT_APPLICABLE : text.figure(value, quantity)),
    number: (value, quantity) => (value === null ? NOT_APPLICABLE : text.number(value, quantity)),
    labelWithUnit: (label, quantity) => {
      const unit = quantity ? text.unit(quantity) : '';
      return unit === '' ? label : `${label} (${unit})`;
    },
    plotted: (value, quantity) => toDisplay(value, quantity, system),
  };
}
