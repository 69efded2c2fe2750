/**
 * The project form's edge: what a person typed in each box, checked field by field. A field that
 * fails its check is never sent (and never cleared): the box keeps the text and shows one sentence
 * naming the field and what is allowed. The limits are the storage layer's own (app/api/project-limits.ts).
 */
import type { ProjectFields, UnitSystem } from '../../../app/api/contract.js';
import { PROJECT_LIMITS } from '../../../app/api/project-limits.js';
import { PROJECT_FIELDS, UNIT_SYSTEMS } from '../../../app/api/project-types.js';

export type ProjectField = (typeof PROJECT_FIELDS)[number];


export const PROJECT_FIELD_LABELS: Readonly<Record<ProjectField, string>> = {
  name: 'Project name',
  client: 'Client',
  site: 'Site',
  reference: 'Reference',
  engineer: 'Engineer',
  checker: 'Checker',
  revision: 'Revision',
  revisionNote: 'Revision note',
  date: 'Date',
  unitSystem: 'Units',
  notes: 'Notes',
};

/** The boxes as typed: every field is text, so a half-typed value stays on screen. */
export type ProjectDraft = { -readonly [K in ProjectField]: string };

export function draftOfProject(fields: ProjectFields): ProjectDraft {
  const draft = {} as ProjectDraft;
  for (const field of PROJECT_FIELDS) draft[field] = fields[field];
  return draft;
}

export type FieldReading = { readonly ok: true; readonly value: string } | { readonly ok: false; readonly message: string };

const CONTROL_CHARACTERS = /[\u0000-\u0008\u000B\u000C\u000E-\u001F]/;

function readText(field: ProjectField, raw: string, min: number, max: number): FieldReading {
  const value = raw.trim();
  const label = PROJECT_FIELD_LABELS[field];
  if (value.length < min || value.length > max) {
    return { ok: false, message: min > 0 ? `${label} must be ${min} to ${max} characters long.` : `${label} must be at most ${max} characters long.` };
  }
  if (CONTROL_CHARACTERS.test(value)) return { ok: false, message: `${label} must not contain control characters.` };
  return { ok: true, value };
}

/** A real calendar day written YYYY-MM-DD (so 2025-02-30 is refused), or empty. */
export function isCalendarDate(text: string): boolean {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text);
  if (!m) return false;
  const [year, month, day] = [Number(m[1]), Number(m[2]), Number(m[3])];
  const date = new Date(Date.UTC(year, month - 1, day));
  return date.getUTCFullYear() === year && date.getUTCMonth() === month - 1 && date.getUTCDate() === day;
}

/** One field's check, the same the storage layer makes, in the words of the form. */
export function readProjectField(field: ProjectField, raw: string): FieldReading {
  switch (field) {
    case 'name':
      return readText(field, raw, 1, PROJECT_LIMITS.name);
    case 'revision':
      return readText(field, raw, 0, PROJECT_LIMITS.revision);
    case 'revisionNote':
      return readText(field, raw, 0, PROJECT_LIMITS.revisionNote);
    case 'notes':
      return readText(field, raw, 0, PROJECT_LIMITS.notes);
    case 'date': {
      const value = raw.trim();
      if (value === '' || isCalendarDate(value)) return { ok: true, value };
      return { ok: false, message: 'Date must be a calendar date written YYYY-MM-DD (for example 2025-04-09), or left empty.' };
    }
    case 'unitSystem':
      return (UNIT_SYSTEMS as readonly string[]).includes(raw)
        ? { ok: true, value: raw as UnitSystem }
        : { ok: false, message: `Units must be one of ${UNIT_SYSTEMS.join(', ')}.` };
    default:
      return readText(field, raw, 0, PROJECT_LIMITS.text);
  }
}

/** Where a refusal from the Node side belongs: its field (e.g. "date" or "changes.date") if it is a project field. */
export function projectFieldOf(serverField: string | undefined): ProjectField | undefined {
  const last = serverField?.split('.').pop();
  return (PROJECT_FIELDS as readonly string[]).includes(last ?? '') ? (last as ProjectField) : undefined;
}
