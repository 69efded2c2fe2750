/**
 * Addresses of values inside a case file, written as the engine's InputError names them
 * ("layers[0].thickness", "ambient.exposure.windSpeed"). The editor reads and writes the case
 * through these paths, so a field and the engine's complaint about it share one name, and every
 * part of the file the form does not show (notes, inline materials, emissivities) is kept as is.
 */
export type Json = null | boolean | number | string | Json[] | { [key: string]: Json };
export type JsonObject = { [key: string]: Json };

/** "layers[2].material.name" -> ["layers", 2, "material", "name"]. */
export function pathSegments(path: string): (string | number)[] {
  const segments: (string | number)[] = [];
  for (const part of path.split('.')) {
    const match = /^([^[\]]*)((?:\[\d+\])*)$/.exec(part);
    if (!match) throw new Error(`"${path}" is not a case path.`);
    if (match[1]) segments.push(match[1]);
    for (const index of match[2]!.matchAll(/\[(\d+)\]/g)) segments.push(Number(index[1]));
  }
  return segments;
}

export function getAt(doc: Json, path: string): Json | undefined {
  let at: Json | undefined = doc;
  for (const segment of pathSegments(path)) {
    if (at === null || typeof at !== 'object') return undefined;
    at = (at as Record<string | number, Json>)[segment];
  }
  return at;
}

/**
 * A copy of the case with the value at the path set (objects on the way are made when missing),
 * or removed when `value` is undefined. The original is never changed: each edit is a new
 * snapshot, which is what undo keeps.
 */
export function setAt(doc: Json, path: string, value: Json | undefined): Json {
  return setIn(doc, pathSegments(path), value);
}

function setIn(node: Json | undefined, segments: readonly (string | number)[], value: Json | undefined): Json {
  const [head, ...rest] = segments;
  if (head === undefined) return value as Json;
  if (typeof head === 'number') {
    const list = Array.isArray(node) ? [...node] : [];
    if (rest.length === 0 && value === undefined) list.splice(head, 1);
    else list[head] = setIn(list[head], rest, value);
    return list;
  }
  const object: JsonObject = node !== null && typeof node === 'object' && !Array.isArray(node) ? { ...node } : {};
  if (rest.length === 0 && value === undefined) delete object[head];
  else object[head] = setIn(object[head], rest, value);
  return object;
}

/** The DOM id of the control for a path: "layers[0].thickness" -> "case-layers-0-thickness". */
export function fieldDomId(path: string): string {
  return `case-${pathSegments(path).join('-')}`;
}

/**
 * The field on screen that an engine complaint belongs to: the path itself when the form shows
 * it, else its nearest shown parent ("layers[1].material.conductivity" belongs to the material
 * picker of "layers[1].material", which the form shows as the layer's material), else the case
 * as a whole (null). `shown` holds the paths of the fields the form shows now.
 */
export function fieldForError(errorPath: string | undefined, shown: ReadonlySet<string>): string | null {
  if (errorPath === undefined) return null;
  let segments: (string | number)[];
  try {
    segments = pathSegments(errorPath);
  } catch {
    return null;
  }
  for (let n = segments.length; n > 0; n--) {
    const candidate = joinSegments(segments.slice(0, n));
    if (shown.has(candidate)) return candidate;
  }
  return null;
}

export function joinSegments(segments: readonly (string | number)[]): string {
  return segments.map((s, i) => (typeof s === 'number' ? `[${s}]` : i === 0 ? s : `.${s}`)).join('');
}
