/**
 * Places labels along a line as near as possible to what each names, in order, at least `gap`
 * apart and between `low` and `high`: pushed right where they crowd, then back left from the end
 * where the last would overflow. Where the line is too short for all of them at `gap`, they are
 * spaced evenly from `low` to `high` instead (closer than `gap`, but in order and inside).
 */
export function spreadLabels(targets: readonly number[], gap: number, low: number, high: number): number[] {
  const n = targets.length;
  if (n === 0) return [];
  if (gap * (n - 1) > high - low) return targets.map((_, i) => (n === 1 ? (low + high) / 2 : low + ((high - low) * i) / (n - 1)));
  const at = targets.map((t) => Math.min(high, Math.max(low, t)));
  for (let i = 1; i < n; i++) at[i] = Math.max(at[i]!, at[i - 1]! + gap);
  at[n - 1] = Math.min(at[n - 1]!, high);
  for (let i = n - 2; i >= 0; i--) at[i] = Math.min(at[i]!, at[i + 1]! - gap);
  return at;
}
