/**
 * The name a copy is offered under: `base`, or `base 2`, `base 3`, ... whichever no material has
 * yet (names compare without regard to case, as the library does). Cut like the library's own copy
 * names, leaving room for the number within the name limit.
 */
import { MATERIAL_LIMITS } from '../../../app/api/material-limits.js';

export function freeCopyName(base: string, takenNames: readonly string[]): string {
  const taken = new Set(takenNames.map((name) => name.toLowerCase()));
  const trimmed = base.slice(0, MATERIAL_LIMITS.name - 4);
  let candidate = trimmed;
  for (let n = 2; taken.has(candidate.toLowerCase()); n++) candidate = `${trimmed} ${n}`;
  return candidate;
}
