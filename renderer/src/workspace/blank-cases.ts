/**
 * The cases a project starts from when a person adds one "from blank": complete and solvable, so a
 * new case shows its key figure and checks at once, built from seed materials of the library
 * found by name. The conditions are an ordinary starting point to edit, not a design: common
 * practice, no source.
 */
import type { CaseKind, Material } from '../../../app/api/contract.js';

/** Seed materials (data/materials/*.csv) the blank cases are built from, by their library names. */
export const BLANK_CASE_MATERIALS = {
  pipeSteel: 'Carbon steel pipe',
  pipeSection: 'Rock wool pipe section, typical curve',
  jacket: 'Aluminium cladding, bright rolled',
  board: 'Mineral wool board',
  plaster: 'Gypsum plaster 1000',
  brick: 'Clay brick masonry 1700',
  render: 'Cement-sand render and mortar',
} as const;

type SeedKey = keyof typeof BLANK_CASE_MATERIALS;

export const BLANK_CASE_NAMES: Readonly<Record<CaseKind, string>> = {
  pipe: 'New pipe run',
  flat: 'New flat surface',
  wall: 'New wall or roof',
};

function seedIds(library: readonly Material[], wanted: readonly SeedKey[]): Record<SeedKey, number> {
  const ids = {} as Record<SeedKey, number>;
  for (const key of wanted) {
    const name = BLANK_CASE_MATERIALS[key];
    const found = library.find((m) => m.name === name);
    if (!found) throw new Error(`A blank case needs the library material "${name}", which is not in the library.`);
    ids[key] = found.id;
  }
  return ids;
}

/** DN50 steel hot-water pipe at 80 °C, 40 mm of rock wool pipe section under aluminium, indoors. */
function blankPipe(library: readonly Material[]) {
  const ids = seedIds(library, ['pipeSteel', 'pipeSection', 'jacket']);
  return {
    schemaVersion: 1,
    kind: 'pipe',
    pipe: { size: { series: 'steel-iso', nominal: 'DN50' }, materialId: ids.pipeSteel },
    inner: { kind: 'surface', temperature: 80 },
    layers: [{ materialId: ids.pipeSection, thickness: 0.04 }],
    jacket: { materialId: ids.jacket, thickness: 0.0006 },
    orientation: 'horizontal',
    ambient: { airTemperature: 20, relativeHumidity: 0.5, exposure: { kind: 'indoor' } },
    length: 10,
    operatingHours: 8760,
  };
}

/** A 2 m high vertical steel tank wall at 70 °C, 80 mm of mineral wool board under aluminium, indoors. */
function blankFlat(library: readonly Material[]) {
  const ids = seedIds(library, ['pipeSteel', 'board', 'jacket']);
  return {
    schemaVersion: 1,
    kind: 'flat',
    wall: { materialId: ids.pipeSteel, thickness: 0.006 },
    inner: { kind: 'surface', temperature: 70 },
    layers: [{ materialId: ids.board, thickness: 0.08 }],
    jacket: { materialId: ids.jacket, thickness: 0.0008 },
    surface: { kind: 'vertical', height: 2 },
    ambient: { airTemperature: 20, relativeHumidity: 0.5, exposure: { kind: 'indoor' } },
    area: 10,
    operatingHours: 8760,
  };
}

/**
 * A plastered brick wall insulated outside with mineral wool under render: 20 °C inside, −5 °C
 * outside, the monthly moisture check on a demo climate.
 */
function blankWall(library: readonly Material[]) {
  const ids = seedIds(library, ['plaster', 'brick', 'board', 'render']);
  return {
    schemaVersion: 1,
    kind: 'wall',
    heatFlowDirection: 'horizontal',
    inside: { temperature: 20, relativeHumidity: 0.5 },
    outside: { temperature: -5, relativeHumidity: 0.85 },
    area: 10,
    layers: [
      { materialId: ids.plaster, thickness: 0.013 },
      { materialId: ids.brick, thickness: 0.215 },
      { materialId: ids.board, thickness: 0.1 },
      { materialId: ids.render, thickness: 0.015 },
    ],
    moisture: { insideHumidity: { kind: 'class', humidityClass: 3, safetyFactor: true }, climate: 'demo-cold-inland' },
  };
}

const BUILDERS: Readonly<Record<CaseKind, (library: readonly Material[]) => unknown>> = {
  pipe: blankPipe,
  flat: blankFlat,
  wall: blankWall,
};

/** The inputs of a new case of `kind`, on the library's seed materials. */
export function blankCaseInputs(kind: CaseKind, library: readonly Material[]): unknown {
  return BUILDERS[kind](library);
}
