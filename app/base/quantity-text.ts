/**
 * How a sentence writes a figure in the project's units: one small formatter, built once from the
 * unit system, that every check and report builder writes its numbers through, so that a reason, a
 * margin or a subject line reads in °F and inches in a US project and in °C and millimetres in an
 * SI one. Values stay SI; the conversion is the one table of app/base/unit-systems.
 *
 * Some sentences write a figure their own way in SI (a condensation rate to 0.01 g/(m²·day), a
 * climate temperature as the file gives it); `keepingSi` keeps that text in SI, so SI reports read
 * exactly as they always did, and gives the converted figure at the kind's US precision otherwise,
 * because a number as written in °C is not one as written in °F.
 */
import { numberAsGiven, numberText } from './number-text.js';
import type { QuantityName } from './quantities.js';
import { displayPrecision, toDisplay, unitLabel, type UnitSystem } from './unit-systems.js';

export interface QuantityText {
  readonly system: UnitSystem;
  /** "18.6 °C" in SI, "65.5 °F" in US units, at the kind's precision. */
  figure(value: number, quantity: QuantityName): string;
  /** The number alone, as `figure` writes it. */
  number(value: number, quantity: QuantityName): string;
  /** A value the user gave (a limit): in its shortest form in SI ("60 °C"), converted and rounded otherwise ("140.0 °F"). */
  given(value: number, quantity: QuantityName): string;
  /** The number alone, as `given` writes it ("−50" of "−50 to 105 °C"). */
  givenNumber(value: number, quantity: QuantityName): string;
  /**
   * A value as typed or a documented bound, converted, in its shortest form to 6 significant
   * figures ("78.7402 in", "−459.67 °F"): the form of the field hints, so a refusal's bounds read
   * as the hint beside the box shows them.
   */
  entered(value: number, quantity: QuantityName): string;
  /** The number alone, as `entered` writes it. */
  enteredNumber(value: number, quantity: QuantityName): string;
  /** `siText` (the sentence's own SI wording of `value`) in SI; `figure(value, quantity)` otherwise. */
  keepingSi(siText: string, value: number, quantity: QuantityName): string;
  /** The unit of a kind ("°F", "in"); empty for a dimensionless number. */
  unit(quantity: QuantityName): string;
}

export function quantityText(system: UnitSystem = 'SI'): QuantityText {
  const unit = (quantity: QuantityName): string => unitLabel(quantity, system);
  const withUnit = (text: string, quantity: QuantityName): string => (unit(quantity) === '' ? text : `${text} ${unit(quantity)}`);
  const number = (value: number, quantity: QuantityName): string => numberText(toDisplay(value, quantity, system), displayPrecision(quantity, system));
  const figure = (value: number, quantity: QuantityName): string => withUnit(number(value, quantity), quantity);
  const givenNumber = (value: number, quantity: QuantityName): string =>
    system === 'SI' ? numberAsGiven(toDisplay(value, quantity, system)) : number(value, quantity);
  const enteredNumber = (value: number, quantity: QuantityName): string => shortestForm(Number(toDisplay(value, quantity, system).toPrecision(ENTERED_DIGITS)));
  return {
    system,
    figure,
    number,
    entered: (value, quantity) => withUnit(enteredNumber(value, quantity), quantity),
    enteredNumber,
    given: (value, quantity) => withUnit(givenNumber(value, quantity), quantity),
    givenNumber,
    keepingSi: (siText, value, quantity) => (system === 'SI' ? siText : figure(value, quantity)),
    unit,
  };
}

/** Significant figures of an entered value or bound: enough for any typed number, few enough to hide conversion noise. */
const ENTERED_DIGITS = 6;

/** "78.7402", "1.8e7" from 100 000 up (as the field hints write large bounds), with the true minus sign. */
function shortestForm(value: number): string {
  const text = Math.abs(value) >= 1e5 ? value.toExponential().replace('e+', 'e') : String(Object.is(value, -0) ? 0 : value);
  return text.replace(/^-/, '\u2212');
}

/** The formatter of an SI project, for callers that give no unit system. */
export const SI_TEXT: QuantityText = quantityText('SI');
