/**
 * Where the ISO 6946 combined method is out of its depth, a warning beside the result:
 * - a bridge of metal: the standard leaves insulation bridged by metal out of its scope (a public
 *   summary of ISO 6946:2007 says so); such an element wants a numerical calculation (ISO 10211).
 *   "Metal" is read as λ of 10 W/(m·K) or more (common practice, no source: metals start near
 *   15 W/(m·K), non-metals stay below about 5);
 * - limits far apart: a ratio R'_T/R''_T above 1.5, which the standard names as the edge of the
 *   method (from memory).
 */
import { SI_TEXT, type QuantityText } from '../../base/quantity-text.js';
import { isAirLayer, type WallInput } from './wall-input.js';
import type { WallResult } from './wall-result.js';

/** A bridge at or above this conductivity is taken as metal, W/(m·K) (common practice, no source). */
export const METAL_BRIDGE_CONDUCTIVITY = 10;
/** Largest ratio of the upper to the lower limit the combined method is meant for (ISO 6946, from memory). */
export const MAXIMUM_LIMIT_RATIO = 1.5;

export function bridgingWarnings(input: WallInput, wall: WallResult, text: QuantityText = SI_TEXT): string[] {
  const metal = wall.layers.flatMap((l) => {
    const given = input.layers[l.index]!;
    if (!l.included || isAirLayer(given) || !l.bridged) return [];
    return l.bridged.sections.slice(1).filter((s) => s.conductivity >= METAL_BRIDGE_CONDUCTIVITY).map((s) => ({ layer: l.name, section: s.name }));
  });
  const combined = wall.combinedMethod;
  return [
    ...metal.map(
      (m) =>
        `${m.layer} is bridged by ${m.section}, a conductivity of ${text.figure(METAL_BRIDGE_CONDUCTIVITY, 'conductivity')} or more (a metal): ISO 6946 leaves insulation bridged by metal out of its scope, so take the U-value from a numerical calculation (ISO 10211) instead.`,
    ),
    ...(combined && combined.upperLimit / combined.lowerLimit > MAXIMUM_LIMIT_RATIO
      ? [`The upper limit R'_T is ${(combined.upperLimit / combined.lowerLimit).toFixed(2)} times the lower limit R''_T, above the ${MAXIMUM_LIMIT_RATIO} the combined method is meant for: take the U-value from a numerical calculation (ISO 10211) instead.`]
      : []),
  ];
}
