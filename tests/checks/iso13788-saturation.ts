/**
 * The ISO 13788 annex saturation pressure, written out independently of app/physics so the moisture
 * tests compute their hand references from the published form (from memory): over water for
 * θ ≥ 0 °C, over ice below.
 */
export function pSat(theta: number): number {
  return theta >= 0 ? 610.5 * Math.exp((17.269 * theta) / (237.3 + theta)) : 610.5 * Math.exp((21.875 * theta) / (265.5 + theta));
}
