/** How the page writes numbers: a few significant figures, a true minus sign, never "NaN". */
const significant = new Intl.NumberFormat('en-GB', { maximumSignificantDigits: 4, useGrouping: false });

export function formatValue(value: number): string {
  if (!Number.isFinite(value)) return '–';
  const text = significant.format(Object.is(value, -0) ? 0 : value);
  return text.replace(/^-/, '−');
}

/** Residuals: tiny numbers in powers of ten, e.g. "2.8 × 10⁻¹⁵". */
export function formatSmall(value: number): string {
  if (!Number.isFinite(value)) return '–';
  if (value === 0) return '0';
  const [mantissa, exponent] = value.toExponential(1).split('e');
  const superscript = (exponent ?? '0')
    .replace('+', '')
    .split('')
    .map((c) => '⁰¹²³⁴⁵⁶⁷⁸⁹'[Number(c)] ?? (c === '-' ? '⁻' : c))
    .join('');
  return `${(mantissa ?? '').replace(/^-/, '−')} × 10${superscript}`;
}
