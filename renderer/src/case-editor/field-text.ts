/**
 * Numbers at the edge of the form: the stored SI value as the project's unit system shows it in a
 * box, and typed text back to the SI value to store. Conversion goes through the engine's one
 * table (app/base/unit-systems); nothing else in the editor knows a unit.
 */
import type { QuantityName } from '../../../app/base/quantities.js';
import type { NumberRange } from '../../../app/base/number-range.js';
import { fromDisplay, toDisplay, unitLabel, type UnitSystem } from '../../../app/base/unit-systems.js';
import { numberText } from '../../../app/base/number-text.js';
import { quantityText } from '../../../app/base/quantity-text.js';

/**
 * Digits a box shows: six, as a hint does, so that a converted value reads as a person would write
 * it (50 mm -> "1.9685" in, not "1.96850393701"), and binary noise never shows (0.0036 m -> "3.6" mm).
 * Nothing is lost by it: an untouched or retyped box keeps every stored digit (storedValueFor), and
 * a typed value is stored as typed, converted.
 */
const BOX_DIGITS = 6;

export function boxText(stored: number, quantity: QuantityName, system: UnitSystem): string {
  const shown = Number(toDisplay(stored, quantity, system).toPrecision(BOX_DIGITS));
  return String(Object.is(shown, -0) ? 0 : shown);
}

/**
 * A value in a hint or a list label, not in a box: six significant digits read well ("Default
 * 32.8084 ft") and nothing is stored from them, so they need not round-trip.
 */
export function hintValue(stored: number, quantity: QuantityName, system: UnitSystem): string {
  return quantityText(system).entered(stored, quantity);
}

export type TextReading = { readonly ok: true; readonly value: number } | { readonly ok: false; readonly message: string };

/** Typed text to the stored SI value; a decimal comma is read as a point, a minus sign as "-". */
export function readBoxText(text: string, quantity: QuantityName, system: UnitSystem, label: string): TextReading {
  const cleaned = text.trim().replace(',', '.').replace('−', '-');
  const unit = unitLabel(quantity, system);
  if (cleaned === '' || !/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(cleaned)) {
    return { ok: false, message: `${label} must be a number${unit ? ` in ${unit}` : ''}.` };
  }
  return { ok: true, value: fromDisplay(Number(cleaned), quantity, system) };
}

/**
 * The value to store for typed text: unchanged when the text reads as the stored value already
 * shows (so an untouched or retyped number keeps every stored digit), else the converted value.
 */
export function storedValueFor(text: string, current: number | undefined, quantity: QuantityName, system: UnitSystem, label: string): TextReading {
  if (current !== undefined && Number.isFinite(current) && text.trim() === boxText(current, quantity, system)) return { ok: true, value: current };
  return readBoxText(text, quantity, system, label);
}

/** From here up a bound's entered form is "1e5"; a hint writes it out. */
const WRITTEN_OUT_FROM = 1e5;

/**
 * A bound of a hint as a person writes it: the entered form (six significant digits, shortest,
 * as a refusal states the bound) below 100 000, and the digits written out from there up
 * ("100000 W/m", not "1e5 W/m"), by the project's number writer.
 */
function boundText(value: number, quantity: QuantityName, system: UnitSystem): string {
  const shown = toDisplay(value, quantity, system);
  return Math.abs(shown) >= WRITTEN_OUT_FROM ? numberText(shown, { significant: BOX_DIGITS }) : quantityText(system).enteredNumber(value, quantity);
}

/** "Allowed −100 to 200 °C" in the project's units (a range's open ends say "above" and "below"). */
export function rangeHint(range: NumberRange, quantity: QuantityName, system: UnitSystem): string {
  const unit = quantityText(system).unit(quantity);
  const bound = (value: number) => boundText(value, quantity, system);
  const from = range.minExclusive ? `above ${bound(range.min)}` : bound(range.min);
  const to = range.maxExclusive ? `below ${bound(range.max)}` : bound(range.max);
  return `Allowed ${from} to ${to}${unit ? ` ${unit}` : ''}`;
}
