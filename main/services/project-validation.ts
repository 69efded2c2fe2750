import { validateCaseInputs, type CaseInputs } from './case-inputs.js';
import { PROJECT_FIELDS, UNIT_SYSTEMS, type ProjectFields } from './project-types.js';
import { InputError } from '../../app/index.js';
import { optionalText, rejectUnknownKeys, requireObject, requireOneOf, requireText } from './validate.js';

export { PROJECT_LIMITS } from '../../app/api/project-limits.js';
import { PROJECT_LIMITS } from '../../app/api/project-limits.js';

function validateDate(value: unknown): string {
  const text = optionalText(value, 'date', 10);
  if (text === '') return '';
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text);
  const d = m ? new Date(Date.UTC(+m[1]!, +m[2]! - 1, +m[3]!)) : undefined;
  if (!m || !d || d.getUTCFullYear() !== +m[1]! || d.getUTCMonth() !== +m[2]! - 1 || d.getUTCDate() !== +m[3]!) {
    throw new InputError('date', 'date must be a calendar date written YYYY-MM-DD, or empty.');
  }
  return text;
}

/** Validates new project fields; only `name` is required. */
export function validateProjectFields(value: unknown): ProjectFields {
  const raw = requireObject(value, 'project');
  rejectUnknownKeys(raw, PROJECT_FIELDS, 'project');
  return {
    name: requireText(raw['name'], 'name', { min: 1, max: PROJECT_LIMITS.name }),
    client: optionalText(raw['client'], 'client', PROJECT_LIMITS.text),
    site: optionalText(raw['site'], 'site', PROJECT_LIMITS.text),
    reference: optionalText(raw['reference'], 'reference', PROJECT_LIMITS.text),
    engineer: optionalText(raw['engineer'], 'engineer', PROJECT_LIMITS.text),
    checker: optionalText(raw['checker'], 'checker', PROJECT_LIMITS.text),
    revision: optionalText(raw['revision'], 'revision', PROJECT_LIMITS.revision),
    revisionNote: optionalText(raw['revisionNote'], 'revisionNote', PROJECT_LIMITS.revisionNote),
    date: validateDate(raw['date']),
    unitSystem: raw['unitSystem'] === undefined ? 'SI' : requireOneOf(raw['unitSystem'], 'unitSystem', UNIT_SYSTEMS),
    notes: optionalText(raw['notes'], 'notes', PROJECT_LIMITS.notes),
  };
}

/** Validates a partial update and merges it over the current fields. */
export function mergeProjectFields(current: ProjectFields, changes: unknown): ProjectFields {
  const raw = requireObject(changes, 'changes');
  rejectUnknownKeys(raw, PROJECT_FIELDS, 'changes');
  const base: Record<string, unknown> = {};
  for (const key of PROJECT_FIELDS) base[key] = current[key];
  return validateProjectFields({ ...base, ...raw });
}

export function validateCaseDraft(value: unknown, field = 'case'): { name: string; inputs: CaseInputs } {
  const raw = requireObject(value, field);
  rejectUnknownKeys(raw, ['name', 'inputs'], field);
  return {
    name: requireText(raw['name'], 'name', { min: 1, max: PROJECT_LIMITS.caseName }),
    inputs: validateCaseInputs(raw['inputs']),
  };
}
