/**
 * The conductivity-over-temperature check of a pipe or flat surface: every material (the pipe wall
 * or plate, each insulation layer, the jacket) over the span from the inner temperature to the air
 * and surroundings temperatures, between which the whole build-up lies.
 */
import type { JsonObject } from '../../base/field-checks.js';
import type { MaterialProperties } from '../../materials/material-properties.js';
import { requireConductivitiesOver, type CaseMaterialUse } from '../case-conductivity-span.js';
import type { InsulatedSurfaceInput } from './insulated-inputs.js';

/** `file` is the case file as parsed (for which entries name a library id); `plate` the pipe wall or flat plate entry. */
export function requireInsulatedConductivities(
  file: JsonObject,
  input: InsulatedSurfaceInput,
  plate: { readonly entry: 'pipe' | 'wall'; readonly material: MaterialProperties } | null,
): void {
  const layers = file['layers'] as unknown[];
  const uses: CaseMaterialUse[] = [
    ...(plate ? [{ ...plate, raw: file[plate.entry] }] : []),
    ...input.layers.map((l, i) => ({ entry: `layers[${i}]`, raw: layers[i], material: l.material })),
    ...(input.jacket ? [{ entry: 'jacket', raw: file['jacket'], material: input.jacket.material }] : []),
  ];
  const { airTemperature, surroundingsTemperature } = input.ambient;
  requireConductivitiesOver(uses, [input.inner.temperature, airTemperature, surroundingsTemperature ?? airTemperature]);
}
