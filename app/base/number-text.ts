/**
 * How Lamina writes a number for people: rounded to a number of decimals or of significant
 * figures, with a true minus sign (U+2212), never "−0.0", and without exponent notation for
 * ordinary magnitudes (3 significant figures of 1234.5 read "1230", of 0.0012345 "0.00123").
 * Only magnitudes below 1e-4 or from 1e9 up are written as "3.70 × 10⁻¹¹", where a row of zeros
 * would hide the digits. A non-finite number is a bug upstream (design notes: a NaN never reaches
 * a screen or a report), so it throws instead of printing "NaN".
 */
import type { Precision } from './quantities.js';

const MINUS = '\u2212';
const SMALLEST_PLAIN = 1e-4;
const LARGEST_PLAIN = 1e9;
/** Significant figures of the mantissa when a value rounded by decimals needs exponent form. */
const EXPONENT_FORM_FIGURES = 3;
const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

/**
 * `inExponentForm` writes a non-zero value rounded to significant figures as "1.34 × 10⁻⁴" even
 * where it would read plainly: a table column uses it for every cell once one cell needs it, so a
 * column reads in one notation (see needsExponentForm).
 */
export function numberText(value: number, precision: Precision, inExponentForm = false): string {
  if (!Number.isFinite(value)) throw new Error(`numberText was given ${String(value)}: a non-finite value must not reach a report.`);
  const magnitude = Math.abs(value);
  let digits: string;
  if ('significant' in precision) {
    const rounded = Number(magnitude.toPrecision(precision.significant));
    digits = rounded !== 0 && (inExponentForm || rounded < SMALLEST_PLAIN || rounded >= LARGEST_PLAIN)
      ? exponentForm(rounded, precision.significant)
      : plainSignificant(rounded, precision.significant);
  } else {
    digits = magnitude >= LARGEST_PLAIN ? exponentForm(magnitude, EXPONENT_FORM_FIGURES) : magnitude.toFixed(precision.decimals);
  }
  // A value that rounds to zero prints without a sign, so "−0.0" never appears.
  return value < 0 && /[1-9]/.test(digits) ? MINUS + digits : digits;
}

/**
 * Whether numberText writes the value in exponent form. Only a kind rounded to significant figures
 * is ever written so within the documented ranges; one rounded to decimals would need 1e9 or more.
 */
export function needsExponentForm(value: number, precision: Precision): boolean {
  const magnitude = Math.abs(value);
  if (!('significant' in precision)) return magnitude >= LARGEST_PLAIN;
  const rounded = Number(magnitude.toPrecision(precision.significant));
  return rounded !== 0 && (rounded < SMALLEST_PLAIN || rounded >= LARGEST_PLAIN);
}

/** `rounded` (already at `figures` significant figures) written out in full. */
function plainSignificant(rounded: number, figures: number): string {
  if (rounded === 0) return '0';
  const exponent = Number(rounded.toExponential(figures - 1).split('e')[1]);
  return rounded.toFixed(Math.max(0, figures - 1 - exponent));
}

function exponentForm(magnitude: number, figures: number): string {
  const [mantissa, exponent] = magnitude.toExponential(figures - 1).split('e') as [string, string];
  const power = String(Number(exponent)).replace(/./g, (c) => SUPERSCRIPT[c] ?? c);
  return `${mantissa} × 10${power}`;
}

/** A number as the user gave it (a limit, a design condition), in its shortest form, with the true minus sign. */
export function numberAsGiven(value: number): string {
  if (!Number.isFinite(value)) throw new Error(`numberAsGiven was given ${String(value)}: a non-finite value must not reach a report.`);
  return value < 0 ? MINUS + String(-value) : String(Math.abs(value));
}
