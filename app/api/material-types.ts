/**
 * Materials as the library stores them and the API carries them (SI: W/(m·K), kg/m³, J/(kg·K), m,
 * °C). Pure declarations: main/services validates and stores these, the renderer shows and edits
 * them. `null` means "not given"; a vapour-tight material has vapourResistanceFactor = Infinity.
 */
import type { ConductivityModel } from '../fe/conductivity.js';
import { MATERIAL_CATEGORIES, type MaterialCategory, type MaterialProperties } from '../materials/material-properties.js';

export { MATERIAL_CATEGORIES, type MaterialCategory };
export type { ConductivityModel };

/**
 * The editable content of a material: its physical properties (the same fields the calculations
 * take) plus a required source and notes.
 */
export interface MaterialInput extends MaterialProperties {
  readonly source: string;
  readonly notes: string;
}

export interface Material extends MaterialInput {
  readonly id: number;
  readonly builtIn: boolean;
  readonly createdAt: string;
  readonly updatedAt: string;
}

export const MATERIAL_ORIGINS = ['all', 'built-in', 'user'] as const;
export type MaterialOrigin = (typeof MATERIAL_ORIGINS)[number];

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

/** One bad row of a CSV import: its line number in the file (header = line 1) and the reason. */
export interface CsvProblem {
  readonly line: number;
  readonly message: string;
}

/** A CSV import is all or nothing: either every row was added, or none and every problem is listed. */
export type CsvImportResult =
  | { readonly ok: true; readonly created: readonly Material[] }
  | { readonly ok: false; readonly problems: readonly CsvProblem[] };

/** A least-squares conductivity curve through data-sheet points. */
export interface ConductivityFit {
  readonly model: Extract<ConductivityModel, { kind: 'polynomial' }>;
  /** Root-mean-square of (fitted − given), W/(m·K). */
  readonly rmsResidual: number;
  /** Largest |fitted − given|, W/(m·K). */
  readonly maxResidual: number;
  /** Residual per point, in the order given. */
  readonly residuals: readonly number[];
}
