import type { CaseInputs } from './case-inputs.js';

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
  readonly date: string;
  readonly unitSystem: UnitSystem;
  readonly notes: string;
}

export const PROJECT_FIELDS = ['name', 'client', 'site', 'reference', 'engineer', 'revision', 'date', 'unitSystem', 'notes'] as const;

export interface ProjectSummary extends ProjectFields {
  readonly id: number;
  readonly caseCount: number;
  readonly createdAt: string;
  readonly updatedAt: string;
  /** Set while the project is in the recycle bin. */
  readonly deletedAt: string | null;
}

/** One calculation case: inputs only. Results are recomputed by the engine, never stored. */
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
