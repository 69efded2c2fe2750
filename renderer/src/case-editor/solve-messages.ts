/** What the page and the solving worker say to each other (structured-clone data only). */
import type { PipeSize } from '../../../app/index.js';
import type { UnitSystem } from '../../../app/base/unit-systems.js';
import type { Sentence } from '../../../app/base/quantity-sentence.js';
import type { CaseReport } from '../../../app/report/report-model.js';
import type { MaterialProperties } from '../../../app/materials/material-properties.js';
import type { SizingResult } from '../../../app/cases/sizing/sizing-model.js';

export interface SolveRequest {
  readonly id: number;
  readonly caseJson: unknown;
  /** The library materials the case refers to, by id. */
  readonly materials: readonly (readonly [number, MaterialProperties])[];
  /** The project's units, in which the report's sentences read. */
  readonly unitSystem: UnitSystem;
  /** Sent with the first request only; the worker keeps them. */
  readonly pipeSizes?: readonly PipeSize[];
}

export type SolveAnswer =
  | {
      readonly id: number;
      readonly ok: true;
      readonly report: CaseReport;
      /** Mean temperature (°C) of each material slot's layer, by slot path ("layers[1]", "jacket"). */
      readonly layerMeans: Readonly<Record<string, number>>;
      /** The table across the thickness series and the choice, for a case with a "sizing" block. */
      readonly sizing: SizingResult | null;
      /** Time the solve took inside the worker, ms. */
      readonly solveMs: number;
    }
  | {
      readonly id: number;
      readonly ok: false;
      /** The case path the engine names, when it names one. */
      readonly field?: string;
      /** The sentence as the command line would print it (SI; US units in a US project). */
      readonly message: string;
      /** A refusal of the input: its sentence as parts, for the page to write in the boxes' units and words. */
      readonly sentence?: Sentence;
      readonly solveMs: number;
    };
