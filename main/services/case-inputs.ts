import { CASE_KINDS, type CaseInputs, type CaseKind } from '../../app/api/project-types.js';
import { InputError, parseCase, type CaseContext } from '../../app/index.js';
import { isPlainObject, requireId } from './validate.js';

/**
 * The stored inputs of a case: versioned JSON, a case file as `lamina solve` reads it, with
 * materials inline or by library id. Checked here as an envelope, then completely by the engine's
 * parseCase before it is stored (`checkCaseSolvable`):
 *   { "schemaVersion": 1, "kind": "pipe" | "flat" | "wall", ..., "layers": [{ "materialId": 3, "thickness": 0.05 }, ...] }
 * Any property named `materialId` or ending in `MaterialId` (e.g. a pipe's wall or a cladding)
 * anywhere in the inputs is a reference to a material and must name one that exists.
 */
export const CASE_INPUTS_SCHEMA_VERSION = 1;
export { CASE_KINDS, type CaseInputs, type CaseKind };

const MAX_INPUTS_BYTES = 1_000_000;
const MAX_DEPTH = 32;

export function isMaterialReferenceKey(key: string): boolean {
  return key === 'materialId' || key.endsWith('MaterialId');
}

/**
 * Checks the envelope and that the value is plain JSON (finite numbers, no functions, bounded
 * depth). What the case means is checked by the engine: see `checkCaseSolvable`.
 */
export function validateCaseInputs(value: unknown, field = 'inputs'): CaseInputs {
  if (!isPlainObject(value)) throw new InputError(field, `${field} must be an object.`);
  assertPlainJson(value, field, 0);
  if (value['schemaVersion'] !== CASE_INPUTS_SCHEMA_VERSION) {
    throw new InputError(`${field}.schemaVersion`, `${field}.schemaVersion must be ${CASE_INPUTS_SCHEMA_VERSION}.`);
  }
  if (typeof value['kind'] !== 'string' || !(CASE_KINDS as readonly string[]).includes(value['kind'])) {
    throw new InputError(`${field}.kind`, `${field}.kind must be one of ${CASE_KINDS.join(', ')}.`);
  }
  for (const { path, id } of materialReferences(value)) requireId(id, `${field}${path}`);
  if (JSON.stringify(value).length > MAX_INPUTS_BYTES) throw new InputError(field, `${field} must be at most ${MAX_INPUTS_BYTES} characters of JSON.`);
  return value as unknown as CaseInputs;
}

function assertPlainJson(value: unknown, path: string, depth: number): void {
  if (depth > MAX_DEPTH) throw new InputError(path, `${path} is nested more than ${MAX_DEPTH} levels deep.`);
  if (value === null || typeof value === 'string' || typeof value === 'boolean') return;
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new InputError(path, `${path} must be a finite number.`);
    return;
  }
  if (Array.isArray(value)) {
    value.forEach((v, i) => assertPlainJson(v, `${path}[${i}]`, depth + 1));
    return;
  }
  if (isPlainObject(value)) {
    for (const [k, v] of Object.entries(value)) assertPlainJson(v, `${path}.${k}`, depth + 1);
    return;
  }
  throw new InputError(path, `${path} must be plain JSON data (text, numbers, true/false, lists, objects).`);
}

/** Every material reference in the inputs, with where it sits. */
export function materialReferences(value: unknown, path = ''): { path: string; id: unknown }[] {
  const found: { path: string; id: unknown }[] = [];
  if (Array.isArray(value)) value.forEach((v, i) => found.push(...materialReferences(v, `${path}[${i}]`)));
  else if (isPlainObject(value)) {
    for (const [k, v] of Object.entries(value)) {
      if (isMaterialReferenceKey(k)) found.push({ path: `${path}.${k}`, id: v });
      else found.push(...materialReferences(v, `${path}.${k}`));
    }
  }
  return found;
}

export function materialIdsOf(inputs: CaseInputs): number[] {
  return [...new Set(materialReferences(inputs).map((r) => r.id as number))];
}

/** A copy of the inputs with every material reference passed through `map`. */
export function remapMaterialIds(value: unknown, map: (id: number) => number): unknown {
  if (Array.isArray(value)) return value.map((v) => remapMaterialIds(v, map));
  if (isPlainObject(value)) {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) out[k] = isMaterialReferenceKey(k) && typeof v === 'number' ? map(v) : remapMaterialIds(v, map);
    return out;
  }
  return value;
}

/**
 * Refuses, now rather than at the next solve, a case the engine could not solve: every field,
 * every material reference and everything the solve needs (such as an outer surface emissivity).
 * Called on every write of a case (add, duplicate, import, save); never on reading, so a library
 * that holds cases stored before this check still opens and lists them.
 */
export function checkCaseSolvable(inputs: CaseInputs, context: CaseContext): void {
  parseCase(inputs, context);
}
