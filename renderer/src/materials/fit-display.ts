/**
 * How the fit panel writes a fitted curve: its coefficients to a fixed number of significant
 * figures (the same digits on screen and in the conductivity field, so what is shown is what is
 * used), the equation λ = a0 + a1·θ + …, and the curve sampled for the chart. Never NaN.
 */

/**
 * Five significant figures: data sheets print λ to 2–3 figures, and rounding the coefficients to 5
 * moves a curve by about 1e-6 W/(m·K) over a few hundred °C, far below any data sheet's rounding.
 */
export const COEFFICIENT_FIGURES = 5;

export function roundCoefficients(coefficients: readonly number[], figures = COEFFICIENT_FIGURES): number[] {
  return coefficients.map((c) => (c === 0 ? 0 : Number(c.toPrecision(figures))));
}

const SUPERSCRIPT_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';

function superscript(exponent: number): string {
  const digits = String(Math.abs(exponent)).split('').map((d) => SUPERSCRIPT_DIGITS[Number(d)]).join('');
  return (exponent < 0 ? '⁻' : '') + digits;
}

/** A coefficient's size, e.g. "0.033676" or "1.1021 × 10⁻⁴" (tiny or huge ones in powers of ten). */
export function formatMagnitude(value: number, figures = COEFFICIENT_FIGURES): string {
  const size = Math.abs(value);
  if (!Number.isFinite(size)) return '–';
  if (size === 0) return '0';
  if (size >= 1e-3 && size < 1e4) return size.toPrecision(figures);
  const [mantissa, exponent] = size.toExponential(figures - 1).split('e');
  return `${mantissa} × 10${superscript(Number(exponent))}`;
}

export interface EquationTerm {
  /** '' before the first term when it is positive, else ' + ' or ' − ' (a true minus sign). */
  readonly sign: string;
  readonly magnitude: string;
  /** '', '·θ', '·θ²' or '·θ³'. */
  readonly power: string;
}

const POWERS = ['', '·θ', '·θ²', '·θ³', '·θ⁴', '·θ⁵'];

/** λ = a0 + a1·θ + a2·θ² … as terms, so the page can mark each coefficient. */
export function equationTerms(coefficients: readonly number[]): EquationTerm[] {
  return coefficients.map((c, j) => ({
    sign: j === 0 ? (c < 0 ? '−' : '') : c < 0 ? ' − ' : ' + ',
    magnitude: formatMagnitude(c),
    power: POWERS[j] ?? `·θ${superscript(j)}`,
  }));
}

export function evaluatePolynomial(coefficients: readonly number[], theta: number): number {
  return coefficients.reduceRight((sum, c) => sum * theta + c, 0);
}

/** The curve over the service range as (θ, λ) pairs, for the chart. */
export function sampleCurve(coefficients: readonly number[], low: number, high: number, count = 61): [number, number][] {
  return Array.from({ length: count }, (_, i) => {
    const theta = low + ((high - low) * i) / (count - 1);
    return [theta, evaluatePolynomial(coefficients, theta)];
  });
}

const upToFiveFigures = new Intl.NumberFormat('en-GB', { maximumSignificantDigits: COEFFICIENT_FIGURES, useGrouping: false });
const fiveFigures = new Intl.NumberFormat('en-GB', {
  minimumSignificantDigits: COEFFICIENT_FIGURES, maximumSignificantDigits: COEFFICIENT_FIGURES, useGrouping: false,
});

/**
 * A conductivity in the residual table, to the figures the coefficients carry; a true minus sign.
 * `allFigures` keeps trailing zeros (a fitted 0.082000), else they are dropped (a given 0.082).
 */
export function formatConductivity(value: number, allFigures = false): string {
  if (!Number.isFinite(value)) return '–';
  return (allFigures ? fiveFigures : upToFiveFigures).format(Object.is(value, -0) ? 0 : value).replace(/^-/, '−');
}

/** A sentence from the Node side starts with the request field's name ("points must …"): capitalise it. */
export function asSentence(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
