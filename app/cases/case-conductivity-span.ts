/**
 * λ(θ) of every material of a pipe, flat or wall case within the conductivity range over the span
 * of the temperatures the case names. Without heat generation every solved temperature lies in
 * that span, so a polynomial fitted between 0 and 300 °C that runs to zero or to thousands of
 * W/(m·K) inside it is refused before the solve, naming the case's own field (the engine's check
 * during the solve could only name its layer index, which counts the pipe wall and jacket too).
 */
import { isObject } from '../base/field-checks.js';
import { requireConductivityOver } from '../materials/conductivity-checks.js';
import type { MaterialProperties } from '../materials/material-properties.js';

export interface CaseMaterialUse {
  /** The entry holding the material, e.g. "layers[0]" or "jacket". */
  readonly entry: string;
  /** The entry as the file gives it: inline "material" or a library "materialId". */
  readonly raw: unknown;
  readonly material: MaterialProperties;
}

/** Where the user gave the conductivity: the inline model, or the library id that brought it. */
function conductivityField(use: CaseMaterialUse): string {
  return isObject(use.raw) && use.raw['materialId'] !== undefined ? `${use.entry}.materialId` : `${use.entry}.material.conductivity`;
}

export function requireConductivitiesOver(uses: readonly CaseMaterialUse[], temperatures: readonly number[]): void {
  const low = Math.min(...temperatures);
  const high = Math.max(...temperatures);
  for (const use of uses) requireConductivityOver(use.material.conductivity, conductivityField(use), low, high);
}
