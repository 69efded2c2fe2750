/** What the schedule page and its sizing worker say to each other (structured-clone data only). */
import type { PipeSize } from '../../../app/index.js';
import type { UnitSystem } from '../../../app/base/unit-systems.js';
import type { MaterialProperties } from '../../../app/materials/material-properties.js';
import type { KeyedSizedRun, ScheduleRun, ScheduleSettings } from '../../../app/api/contract.js';

export type SizeRequest =
  | {
      readonly kind: 'size';
      readonly jobId: number;
      readonly runs: readonly ScheduleRun[];
      readonly settings: ScheduleSettings;
      /** Library material ids by name, as the runs and services name them. */
      readonly materialIds: Readonly<Record<string, number>>;
      /** The library's materials, by id. */
      readonly materials: readonly (readonly [number, MaterialProperties])[];
      readonly pipeSizes: readonly PipeSize[];
      /** The project's units, in which each run's reason reads. */
      readonly unitSystem: UnitSystem;
    }
  /** Stop between runs; what was sized so far has already been posted. */
  | { readonly kind: 'cancel'; readonly jobId: number };

export type SizeAnswer =
  /** Runs sized since the last message, and how far the job has come. */
  | { readonly kind: 'progress'; readonly jobId: number; readonly done: number; readonly total: number; readonly results: readonly KeyedSizedRun[] }
  | { readonly kind: 'finished'; readonly jobId: number; readonly done: number; readonly total: number; readonly complete: boolean }
  | { readonly kind: 'failed'; readonly jobId: number; readonly message: string };
