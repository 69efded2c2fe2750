/** Rounding of reported values. ISO 6946 gives the final U-value to 2 significant figures (from memory). */

export const U_VALUE_SIGNIFICANT_FIGURES = 2;

/** x rounded to n significant figures (0 stays 0). */
export function roundToSignificantFigures(x: number, figures: number): number {
  if (x === 0 || !Number.isFinite(x)) return x;
  return Number(x.toPrecision(figures));
}
