/**
 * The economic thickness: the row of the series with the least lifecycle cost. The search is over
 * the discrete series the insulation is sold in (no interpolation between thicknesses: a thickness
 * between two products cannot be bought).
 *
 * Ties go to the thinner row: it costs the same over the years and uses less material and space.
 * Two costs count as tied when they differ by at most TIE_TOLERANCE of their size, so that round-off
 * in a sum of thousands never picks a thicker row over an equal thinner one.
 */

export const TIE_TOLERANCE = 1e-9;

export interface CostedThickness {
  readonly thickness: number;
  /** null when the row has no economics (it cannot be chosen). */
  readonly lifecycleCost: number | null;
}

function tied(a: number, b: number): boolean {
  return Math.abs(a - b) <= TIE_TOLERANCE * Math.max(Math.abs(a), Math.abs(b));
}

/** The row of least lifecycle cost (ties → thinner), in any order of rows; null when no row has a cost. */
export function leastLifecycleCostRow<T extends CostedThickness>(rows: readonly T[]): T | null {
  let best: T | null = null;
  for (const row of rows) {
    const cost = row.lifecycleCost;
    if (cost === null || !Number.isFinite(cost)) continue;
    if (best === null) {
      best = row;
      continue;
    }
    const bestCost = best.lifecycleCost as number;
    const cheaper = cost < bestCost && !tied(cost, bestCost);
    const thinnerAtSameCost = tied(cost, bestCost) && row.thickness < best.thickness;
    if (cheaper || thinnerAtSameCost) best = row;
  }
  return best;
}
