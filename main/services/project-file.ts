import type { ProjectFile } from '../../app/api/project-types.js';
import { materialReferences, validateCaseInputs, type CaseInputs } from './case-inputs.js';
import type { MaterialInput } from './material-types.js';
import { validateMaterialInput } from './material-validation.js';
import { validateProjectFields, validateCaseDraft } from './project-validation.js';
import { validateLetterhead } from './letterhead-validation.js';
import type { Letterhead } from '../../app/report/project-report.js';
import type { ProjectFields } from './project-types.js';
import { requireBoundedNesting } from '../../app/base/json-depth.js';
import { InputError } from '../../app/index.js';
import { rejectUnknownKeys, requireId, requireObject } from './validate.js';
import type { ScheduleRun, ScheduleSettings } from '../../app/schedules/schedule-model.js';
import { parseScheduleSettings } from '../../app/schedules/schedule-settings.js';
import { runFromObject } from '../../app/schedules/run-object.js';
import { MAX_SCHEDULE_RUNS } from '../../app/schedules/schedule-csv-read.js';

/**
 * The project exchange file: one JSON document holding the project's fields, its cases' inputs
 * and every material those inputs use, so it can be opened on a machine with a different library.
 * Case inputs refer to materials by `fileId`, which only means something inside the file.
 */
export const PROJECT_FILE_FORMAT = 'lamina-project';
/**
 * The version this Lamina writes. 2 added the project's checker and revision note and the
 * letterhead; 3 the schedule of pipe runs; version 1 and 2 files are still read.
 */
export const PROJECT_FILE_VERSION = 3;
const READABLE_VERSIONS: readonly number[] = [1, 2, 3];
/** Runs of a schedule a file may hold (as many as a schedule may). */
const MAX_FILE_RUNS = MAX_SCHEDULE_RUNS;

export type { ProjectFile };

export interface CheckedProjectFile {
  readonly project: ProjectFields;
  /** The letterhead the file carries, or null (a version 1 file, or one written without). */
  readonly letterhead: Letterhead | null;
  readonly materials: readonly { fileId: number; material: MaterialInput }[];
  readonly cases: readonly { name: string; inputs: CaseInputs }[];
  /** The schedule, checked run by run as the grid checks an edit; null when the file has none. */
  readonly schedule: { readonly settings: ScheduleSettings | null; readonly runs: readonly ScheduleRun[] } | null;
}

const MAX_FILE_MATERIALS = 1000;
const MAX_FILE_CASES = 1000;

/** JSON has no Infinity: a vapour-tight μ is written as the string "inf". */
export function projectFileToJson(file: ProjectFile): string {
  return JSON.stringify(file, (key, value) => (key === 'vapourResistanceFactor' && value === Infinity ? 'inf' : value), 2) + '\n';
}

export function projectFileFromJson(text: string): unknown {
  let value: unknown;
  try {
    value = JSON.parse(text, (key, item) => (key === 'vapourResistanceFactor' && item === 'inf' ? Infinity : item));
  } catch (error) {
    throw new InputError('file', `The project file is not valid JSON (${(error as Error).message.replace(/\s+/g, ' ')}).`);
  }
  // Before anything walks it recursively (the checks below, a copy, a stringify).
  requireBoundedNesting(value, 'The project file');
  return value;
}

/** Checks the whole file before anything is written. */
export function readProjectFile(value: unknown): CheckedProjectFile {
  const raw = requireObject(value, 'file');
  if (raw['format'] !== PROJECT_FILE_FORMAT) throw new InputError('format', `format must be "${PROJECT_FILE_FORMAT}"; this is not a Lamina project file.`);
  const version = raw['formatVersion'];
  if (typeof version !== 'number' || !READABLE_VERSIONS.includes(version)) {
    throw new InputError('formatVersion', `formatVersion must be ${READABLE_VERSIONS.slice(0, -1).join(', ')} or ${READABLE_VERSIONS.at(-1)} (the file was written by a Lamina this version cannot read).`);
  }
  const keys = ['format', 'formatVersion', 'exportedAt', 'project', 'materials', 'cases'];
  rejectUnknownKeys(raw, version >= 3 ? [...keys, 'letterhead', 'schedule'] : version >= 2 ? [...keys, 'letterhead'] : keys, 'file');
  const project = validateProjectFields(raw['project']);
  const letterhead = raw['letterhead'] === undefined || raw['letterhead'] === null ? null : fileLetterhead(raw['letterhead']);
  const rawMaterials = raw['materials'];
  if (!Array.isArray(rawMaterials) || rawMaterials.length > MAX_FILE_MATERIALS) {
    throw new InputError('materials', `materials must be a list of at most ${MAX_FILE_MATERIALS} materials.`);
  }
  const fileIds = new Set<number>();
  const materials = rawMaterials.map((m, i) => {
    const { fileId, ...rest } = requireObject(m, `materials[${i}]`);
    const id = requireId(fileId, `materials[${i}].fileId`);
    if (fileIds.has(id)) throw new InputError(`materials[${i}].fileId`, `materials[${i}].fileId ${id} is used twice in the file.`);
    fileIds.add(id);
    try {
      return { fileId: id, material: validateMaterialInput(rest) };
    } catch (error) {
      if (error instanceof InputError) throw new InputError(`materials[${i}].${error.field}`, `materials[${i}]: ${error.message}`);
      throw error;
    }
  });
  const rawCases = raw['cases'];
  if (!Array.isArray(rawCases) || rawCases.length > MAX_FILE_CASES) throw new InputError('cases', `cases must be a list of at most ${MAX_FILE_CASES} cases.`);
  const cases = rawCases.map((c, i) => {
    let draft;
    try {
      draft = validateCaseDraft(c, `cases[${i}]`);
    } catch (error) {
      if (error instanceof InputError) throw new InputError(`cases[${i}].${error.field}`, `cases[${i}]: ${error.message}`);
      throw error;
    }
    for (const ref of materialReferences(draft.inputs)) {
      if (!fileIds.has(ref.id as number)) throw new InputError(`cases[${i}].inputs${ref.path}`, `cases[${i}].inputs${ref.path} refers to material ${String(ref.id)}, which the file does not include.`);
    }
    return { name: draft.name, inputs: validateCaseInputs(draft.inputs) };
  });
  return { project, letterhead, materials, cases, schedule: raw['schedule'] === undefined ? null : fileSchedule(raw['schedule']) };
}

function fileSchedule(value: unknown): { settings: ScheduleSettings | null; runs: ScheduleRun[] } {
  const schedule = requireObject(value, 'schedule');
  rejectUnknownKeys(schedule, ['settings', 'runs'], 'schedule');
  const settings = schedule['settings'] === null || schedule['settings'] === undefined ? null : parseScheduleSettings(schedule['settings'], 'schedule.settings');
  const rawRuns = schedule['runs'];
  if (!Array.isArray(rawRuns) || rawRuns.length > MAX_FILE_RUNS) throw new InputError('schedule.runs', `schedule.runs must be a list of at most ${MAX_FILE_RUNS} runs.`);
  const seen = new Set<string>();
  return {
    settings,
    runs: rawRuns.map((r, i) => {
      const run = runFromObject(r, `schedule.runs[${i}]`);
      if (seen.has(run.reference.toLowerCase())) throw new InputError(`schedule.runs[${i}].reference`, `schedule.runs[${i}] repeats the reference '${run.reference}'; each run needs its own.`);
      seen.add(run.reference.toLowerCase());
      return run;
    }),
  };
}

function fileLetterhead(value: unknown): Letterhead {
  try {
    return validateLetterhead(value);
  } catch (error) {
    if (error instanceof InputError) throw new InputError(`letterhead.${error.field}`, `The file's letterhead cannot be used: ${error.message}`);
    throw error;
  }
}
