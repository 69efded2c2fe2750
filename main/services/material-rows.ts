import type { Material, MaterialCategory, MaterialInput } from './material-types.js';
import { validateConductivity } from './material-validation.js';

/** The materials table's row shape and the two-way mapping to the typed Material. */
export interface MaterialRow {
  id: number;
  name: string;
  category: string;
  conductivity: string;
  density: number | null;
  specific_heat: number | null;
  mu: number | null;
  sd: number | null;
  emissivity: number | null;
  min_service_temp: number | null;
  max_service_temp: number | null;
  source: string;
  notes: string;
  built_in: number;
  seed_key: string | null;
  created_at: string;
  updated_at: string;
}

export function materialFromRow(row: MaterialRow): Material {
  return {
    id: row.id,
    name: row.name,
    category: row.category as MaterialCategory,
    // Re-checked on the way out: a hand-edited database must not feed the engine a bad curve.
    conductivity: validateConductivity(JSON.parse(row.conductivity)),
    density: row.density,
    specificHeat: row.specific_heat,
    vapourResistanceFactor: row.mu,
    equivalentAirLayerThickness: row.sd,
    emissivity: row.emissivity,
    minServiceTemperature: row.min_service_temp,
    maxServiceTemperature: row.max_service_temp,
    source: row.source,
    notes: row.notes,
    builtIn: row.built_in === 1,
    createdAt: row.created_at,
    updatedAt: row.updated_at,
  };
}

/** Named parameters for INSERT/UPDATE statements. */
export function materialParameters(input: MaterialInput) {
  return {
    name: input.name,
    category: input.category,
    conductivity: JSON.stringify(input.conductivity),
    density: input.density,
    specific_heat: input.specificHeat,
    mu: input.vapourResistanceFactor,
    sd: input.equivalentAirLayerThickness,
    emissivity: input.emissivity,
    min_service_temp: input.minServiceTemperature,
    max_service_temp: input.maxServiceTemperature,
    source: input.source,
    notes: input.notes,
  };
}

/** True when two materials carry the same data (names and notes aside): used to reuse on import. */
export function sameMaterialData(a: MaterialInput, b: MaterialInput): boolean {
  const data = (m: MaterialInput) => {
    const { name: _name, notes: _notes, ...rest } = materialParameters(m);
    return JSON.stringify(rest, (_k, v) => (v === Infinity ? 'inf' : v));
  };
  return a.category === b.category && data(a) === data(b);
}

export function materialInputOf(material: Material): MaterialInput {
  const { id: _id, builtIn: _b, createdAt: _c, updatedAt: _u, ...input } = material;
  return input;
}
