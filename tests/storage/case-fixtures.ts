/**
 * Complete, solvable case inputs for every test that stores a case. The projects service refuses,
 * when a case is added or saved, a case the engine could not solve, so a stored case must carry
 * everything its solve needs. Materials are library materials by id; the seed materials named in
 * SEED carry what a solve needs (μ on wall layers, emissivity on surface materials).
 *
 * Conditions are an invented demo site, not a design: common practice, no source.
 */

/** Seed materials the fixtures use, by their names in data/materials/*.csv. */
export const SEED = {
  pipeSteel: 'Carbon steel pipe',
  pipeInsulation: 'Rock wool pipe section, typical curve',
  cladding: 'Aluminium cladding, bright rolled',
  wallBoard: 'Mineral wool board',
  wallMasonry: 'Clay brick masonry 1700',
} as const;

export type SeedIds = { readonly [K in keyof typeof SEED]: number };

/** The ids of the SEED materials in a library, looked up by name. */
export function seedIds(findByName: (name: string) => { id: number } | undefined): SeedIds {
  const ids = {} as Record<keyof typeof SEED, number>;
  for (const [key, name] of Object.entries(SEED) as [keyof typeof SEED, string][]) {
    const found = findByName(name);
    if (!found) throw new Error(`The library has no seed material "${name}".`);
    ids[key] = found.id;
  }
  return ids;
}

/** A wall, inside to outside, of the given materials (each layer 50 mm thicker than the one before). */
export function wallInputs(materialIds: readonly number[], extra: Record<string, unknown> = {}) {
  return {
    schemaVersion: 1,
    kind: 'wall' as const,
    heatFlowDirection: 'horizontal',
    inside: { temperature: 20, relativeHumidity: 0.5 },
    outside: { temperature: -5, relativeHumidity: 0.85 },
    area: 12.5,
    layers: materialIds.map((materialId, i) => ({ materialId, thickness: 0.05 * (i + 1) })),
    ...extra,
  };
}

export interface PipeMaterials {
  /** The pipe wall's material. */
  readonly pipe: number;
  /** Insulation layers, inside first (each 40 mm thick). */
  readonly insulation: readonly number[];
  /** A jacket over the insulation; without one the outer insulation layer needs its own emissivity. */
  readonly jacket?: number;
}

/** A horizontal hot-water pipe indoors (114.3 mm steel pipe, 75 °C, still air at 15 °C). */
export function pipeInputs(materials: PipeMaterials, extra: Record<string, unknown> = {}) {
  return {
    schemaVersion: 1,
    kind: 'pipe' as const,
    pipe: { outerDiameter: 0.1143, wallThickness: 0.0036, materialId: materials.pipe },
    inner: { kind: 'surface', temperature: 75 },
    layers: materials.insulation.map((materialId) => ({ materialId, thickness: 0.04 })),
    ...(materials.jacket === undefined ? {} : { jacket: { materialId: materials.jacket, thickness: 0.0006 } }),
    orientation: 'horizontal',
    ambient: { airTemperature: 15, relativeHumidity: 0.6, exposure: { kind: 'indoor' } },
    length: 20,
    ...extra,
  };
}
