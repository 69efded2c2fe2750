import type { ConductivityModel } from '../../app/fe/conductivity.js';

/** What a material is used as; drives filtering in the library and which pickers offer it. */
export const MATERIAL_CATEGORIES = ['building', 'insulation', 'pipe', 'cladding', 'membrane', 'air-layer', 'other'] as const;
export type MaterialCategory = (typeof MATERIAL_CATEGORIES)[number];

/**
 * The editable content of a material, in SI: W/(m·K), kg/m³, J/(kg·K), m, °C. `null` means "not
 * given". A vapour-tight material (metal, glass) has vapourResistanceFactor = Infinity.
 */
export interface MaterialInput {
  readonly name: string;
  readonly category: MaterialCategory;
  readonly conductivity: ConductivityModel;
  readonly density: number | null;
  readonly specificHeat: number | null;
  /** μ, dimensionless (1 for still air). */
  readonly vapourResistanceFactor: number | null;
  /** s_d in m, for membranes whose thickness is not modelled. */
  readonly equivalentAirLayerThickness: number | null;
  readonly emissivity: number | null;
  readonly minServiceTemperature: number | null;
  readonly maxServiceTemperature: number | null;
  readonly source: string;
  readonly notes: string;
}

export interface Material extends MaterialInput {
  readonly id: number;
  readonly builtIn: boolean;
  readonly createdAt: string;
  readonly updatedAt: string;
}

export type MaterialOrigin = 'all' | 'built-in' | 'user';

export interface MaterialFilter {
  /** Matched, case-insensitively, against name, source and notes. */
  readonly search?: string;
  readonly category?: MaterialCategory;
  readonly origin?: MaterialOrigin;
}

/** Where a material is used: the reason a deletion is refused. */
export interface MaterialUsage {
  readonly projectId: number;
  readonly projectName: string;
  readonly caseId: number;
  readonly caseName: string;
  readonly inRecycleBin: boolean;
}

export const MATERIAL_FIELDS = [
  'name', 'category', 'conductivity', 'density', 'specificHeat', 'vapourResistanceFactor', 'equivalentAirLayerThickness',
  'emissivity', 'minServiceTemperature', 'maxServiceTemperature', 'source', 'notes',
] as const;
