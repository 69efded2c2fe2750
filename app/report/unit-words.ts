/**
 * The unit a label names in words, in the project's units: "Heat loss per metre" in SI reads
 * "Heat loss per foot" in a US project, whose figure is in Btu/(h·ft); "per m² of surface" reads
 * "per ft² of surface". The words follow the units of app/base/unit-systems for lengths and areas.
 */
import type { QuantityText } from '../base/quantity-text.js';

/** "metre" or "foot": the length unit of a per-length figure, spelt out. */
export function lengthUnitWord(text: QuantityText): string {
  return text.system === 'SI' ? 'metre' : 'foot';
}

/** "m²" or "ft²": the area unit of a per-area figure. */
export function areaUnitSymbol(text: QuantityText): string {
  return text.unit('area');
}
