/**
 * The physical properties of a material as the calculations use them, in SI (W/(m·K), kg/m³,
 * J/(kg·K), m, °C). `null` means "not given". Storage (main/services) keeps the same fields plus
 * identity and bookkeeping; calculations receive resolved properties, never a database id.
 */
import type { ConductivityModel } from '../fe/conductivity.js';

export const MATERIAL_CATEGORIES = ['building', 'insulation', 'pipe', 'cladding', 'membrane', 'air-layer', 'other'] as const;
export type MaterialCategory = (typeof MATERIAL_CATEGORIES)[number];

export interface MaterialProperties {
  readonly name: string;
  readonly category: MaterialCategory;
  readonly conductivity: ConductivityModel;
  readonly density: number | null;
  readonly specificHeat: number | null;
  /** μ, dimensionless (1 for still air); Infinity for vapour-tight materials (metal, glass). */
  readonly vapourResistanceFactor: number | null;
  /** s_d in m, for membranes whose thickness is not modelled. */
  readonly equivalentAirLayerThickness: number | null;
  /** Total hemispherical emissivity of the material's exposed surface, 0–1. */
  readonly emissivity: number | null;
  readonly minServiceTemperature: number | null;
  readonly maxServiceTemperature: number | null;
  /** Where the values come from (standard, data sheet, "from memory"). */
  readonly source?: string;
}
