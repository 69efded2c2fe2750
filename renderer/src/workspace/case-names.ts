/** The names new cases are given: free within the project, and within the storage layer's limit. */
import { PROJECT_LIMITS } from '../../../app/api/project-limits.js';

/** `base`, or `base 2`, `base 3`, … whichever no case of the project has yet (compared without regard to case). */
export function freeCaseName(base: string, takenNames: readonly string[]): string {
  const taken = new Set(takenNames.map((name) => name.toLowerCase()));
  const trimmed = base.trim().slice(0, PROJECT_LIMITS.caseName - 4);
  let candidate = trimmed;
  for (let n = 2; taken.has(candidate.toLowerCase()); n++) candidate = `${trimmed} ${n}`;
  return candidate;
}

/** A case read from a file is named by its title, or by the file's name without its extension. */
export function nameOfCaseFile(fileName: string, json: unknown): string {
  const title = (json as { title?: unknown } | null)?.title;
  if (typeof title === 'string' && title.trim() !== '') return title.trim();
  return fileName.replace(/\.json$/i, '').trim() || 'Case from a file';
}
