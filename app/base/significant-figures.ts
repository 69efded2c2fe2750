/** Rounding of reported values. ISO 6946 gives the final U-value to 2 significant figures (from memory). */
import parameters from '../../data/physics/iso13788-moisture-parameters.json' with { type: 'json' };

export const U_VALUE_SIGNIFICANT_FIGURES: number = parameters.uValueSignificantFigures.value;

/** x rounded to n significant figures (0 stays 0). */
export function roundToSignificantFigures(x: number, figures: number): number {
  if (x === 0 || !Number.isFinite(x)) return x;
  return Number(x.toPrecision(figures));
}
