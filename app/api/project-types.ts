/**
 * Projects and their cases as the API carries them. Pure declarations: main/services validates and
 * stores them. A case stores inputs only; results are recomputed by the engine, never stored.
 */
import type { Letterhead } from '../report/project-report.js';
import type { MaterialInput } from './material-types.js';

export const UNIT_SYSTEMS = ['SI', 'IP'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

/** What a person types about a project. `date` is YYYY-MM-DD or empty. */
export interface ProjectFields {
  readonly name: string;
  readonly client: string;
  readonly site: string;
  readonly reference: string;
  readonly engineer: string;
  readonly revision: string;
  /** What the revision changed or why it is issued ("Issued for comment"). */
  readonly revisionNote: string;
  /** Who checked the calculation. */
  readonly checker: string;
  readonly date: string;
  readonly unitSystem: UnitSystem;
  readonly notes: string;
}

export const PROJECT_FIELDS = [
  'name', 'client', 'site', 'reference', 'engineer', 'checker', 'revision', 'revisionNote', 'date', 'unitSystem', 'notes',
] as const;

export interface ProjectSummary extends ProjectFields {
  readonly id: number;
  readonly caseCount: number;
  readonly createdAt: string;
  readonly updatedAt: string;
  /** Set while the project is in the recycle bin. */
  readonly deletedAt: string | null;
}

export const CASE_KINDS = ['pipe', 'flat', 'wall'] as const;
export type CaseKind = (typeof CASE_KINDS)[number];

/**
 * The stored inputs of a case: versioned JSON. Any property named `materialId` or ending in
 * `MaterialId` is a reference to a material in the library.
 */
export interface CaseInputs {
  readonly schemaVersion: number;
  readonly kind: CaseKind;
  readonly layers: readonly { readonly materialId: number; readonly thickness: number; readonly [key: string]: unknown }[];
  readonly [key: string]: unknown;
}

/** One calculation case: inputs only. */
export interface ProjectCase {
  readonly id: number;
  readonly projectId: number;
  readonly name: string;
  readonly position: number;
  readonly inputs: CaseInputs;
  readonly createdAt: string;
  readonly updatedAt: string;
}

export interface Project extends ProjectSummary {
  readonly cases: readonly ProjectCase[];
}

export interface CaseDraft {
  readonly name: string;
  readonly inputs: unknown;
}

/**
 * The project exchange file: the project's fields, its cases' inputs and every material those
 * inputs use. Case inputs refer to materials by `fileId`, which only means something in the file.
 * From formatVersion 2 it also carries the letterhead the project's report prints with, so a
 * colleague's copy prints the same; version 1 files have none (and no checker or revision note).
 */
import type { ScheduleRun, ScheduleSettings } from '../schedules/schedule-model.js';

export interface ProjectFile {
  readonly format: 'lamina-project';
  readonly formatVersion: number;
  readonly exportedAt: string;
  readonly project: ProjectFields;
  readonly letterhead?: Letterhead;
  readonly materials: readonly ({ readonly fileId: number } & MaterialInput)[];
  readonly cases: readonly { readonly name: string; readonly inputs: CaseInputs }[];
  /** Version 3: the schedule of pipe runs (materials by name) and its settings (null: the shipped defaults). */
  readonly schedule?: { readonly settings: ScheduleSettings | null; readonly runs: readonly ScheduleRun[] };
}
