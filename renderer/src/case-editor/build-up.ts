/**
 * The build-up of a case as the editor changes it: the pipe or plate a case starts from, its layers
 * inside to outside, and the jacket. Every change returns a new case (case-paths), so undo keeps
 * each step. Materials are library references (`materialId`) or inline objects a case file brought
 * with it; choosing a material from the library replaces an inline one.
 */
import type { NumberRange } from '../../../app/base/number-range.js';
import { QUANTITY_RANGES as R } from '../../../app/base/quantity-ranges.js';
import type { MaterialProperties } from '../../../app/materials/material-properties.js';
import { getAt, setAt, type Json, type JsonObject } from './case-paths.js';
import type { CaseKindName } from './case-form-fields.js';
import { bridgingPaths } from './layer-bridging.js';

/** A place in the case that holds one material: the pipe, a flat plate, a layer, the jacket. */
export interface MaterialSlot {
  /** Path of the object holding `material` or `materialId` ("layers[2]", "jacket"). */
  readonly entry: string;
  readonly label: string;
  /** Range of the slot's `thickness`; null where the slot has no thickness of its own (the pipe). */
  readonly thickness: NumberRange | null;
}

export const DEFAULT_LAYER_THICKNESS = 0.05;
export const DEFAULT_JACKET_THICKNESS = 0.0007;
export const DEFAULT_PLATE_THICKNESS = 0.006;
export const DEFAULT_AIR_LAYER_THICKNESS = 0.025;

const layerRange = (kind: CaseKindName): NumberRange => (kind === 'wall' ? R.wallLayerThickness : R.insulationThickness);

export function layersOf(doc: Json): JsonObject[] {
  const layers = getAt(doc, 'layers');
  return Array.isArray(layers) ? (layers.filter((l) => l !== null && typeof l === 'object' && !Array.isArray(l)) as JsonObject[]) : [];
}

export const isAirLayer = (layer: Json | undefined): boolean => (layer as JsonObject | undefined)?.['kind'] === 'air-layer';

/** The material slots of the case in build-up order, inside first. */
export function materialSlots(kind: CaseKindName, doc: Json): MaterialSlot[] {
  const slots: MaterialSlot[] = [];
  if (kind === 'pipe') slots.push({ entry: 'pipe', label: 'Pipe material', thickness: null });
  if (kind === 'flat' && getAt(doc, 'wall') !== undefined) slots.push({ entry: 'wall', label: 'Plate behind the insulation', thickness: R.insulationThickness });
  layersOf(doc).forEach((layer, i) => {
    if (!isAirLayer(layer)) slots.push({ entry: `layers[${i}]`, label: `Layer ${i + 1}`, thickness: layerRange(kind) });
  });
  if (kind !== 'wall' && getAt(doc, 'jacket') !== undefined) slots.push({ entry: 'jacket', label: 'Jacket', thickness: R.jacketThickness });
  return slots;
}

/** Paths of the build-up's controls, for placing the engine's complaints beside them. */
export function buildUpPaths(kind: CaseKindName, doc: Json): string[] {
  const paths = ['layers'];
  for (const slot of materialSlots(kind, doc)) {
    paths.push(slot.entry, `${slot.entry}.material`);
    if (slot.thickness) paths.push(`${slot.entry}.thickness`);
  }
  layersOf(doc).forEach((layer, i) => {
    if (isAirLayer(layer)) paths.push(`layers[${i}]`, `layers[${i}].thickness`, `layers[${i}].ventilation`, `layers[${i}].openingArea`);
  });
  if (kind === 'wall') paths.push(...bridgingPaths(doc));
  if (getAt(doc, 'jacket') !== undefined) paths.push('jacket.emissivity');
  return paths;
}

/** The engine names a library reference `….materialId` and an inline one `….material`: one control shows both. */
export function normaliseMaterialPath(path: string): string {
  return path.replace(/\.materialId$/, '.material').replace(/\.material\..*$/, '.material');
}

export interface EntryMaterial {
  readonly name: string;
  /** The library id, or null for a material written into the case file. */
  readonly id: number | null;
  readonly properties: MaterialProperties | undefined;
}

/** What a slot's material is, looked up in the library when it is a reference. */
export function entryMaterial(doc: Json, entry: string, library: ReadonlyMap<number, MaterialProperties>): EntryMaterial | null {
  const id = getAt(doc, `${entry}.materialId`);
  if (typeof id === 'number') {
    const found = library.get(id);
    return { name: found?.name ?? `Material ${id} (not in the library)`, id, properties: found };
  }
  const inline = getAt(doc, `${entry}.material`);
  if (inline && typeof inline === 'object' && !Array.isArray(inline)) {
    const name = typeof inline['name'] === 'string' ? inline['name'] : 'Unnamed material';
    return { name: `${name} (in this case file)`, id: null, properties: undefined };
  }
  return null;
}

export function chooseMaterial(doc: Json, entry: string, materialId: number): Json {
  return setAt(setAt(doc, `${entry}.material`, undefined), `${entry}.materialId`, materialId);
}

export function addLayer(doc: Json, materialId: number, thickness = DEFAULT_LAYER_THICKNESS): Json {
  return setAt(doc, 'layers', [...layersOf(doc), { materialId, thickness }]);
}

/** A wall's unventilated air layer (a cavity); its ventilation and size are edited in place. */
export function addAirLayer(doc: Json): Json {
  return setAt(doc, 'layers', [...layersOf(doc), { kind: 'air-layer', thickness: DEFAULT_AIR_LAYER_THICKNESS, ventilation: 'unventilated' }]);
}

export function removeLayer(doc: Json, index: number): Json {
  return setAt(doc, 'layers', layersOf(doc).filter((_, i) => i !== index));
}

/** Moves the layer at `from` to position `to` (clamped to the list). */
export function moveLayer(doc: Json, from: number, to: number): Json {
  const layers = layersOf(doc);
  const target = Math.max(0, Math.min(layers.length - 1, to));
  if (from === target || from < 0 || from >= layers.length) return doc;
  const [moved] = layers.splice(from, 1);
  layers.splice(target, 0, moved!);
  return setAt(doc, 'layers', layers);
}

export function addJacket(doc: Json, materialId: number): Json {
  return setAt(doc, 'jacket', { materialId, thickness: DEFAULT_JACKET_THICKNESS });
}

export function addPlate(doc: Json, materialId: number): Json {
  return setAt(doc, 'wall', { materialId, thickness: DEFAULT_PLATE_THICKNESS });
}

/** The library ids a case refers to: any `materialId` or `…MaterialId` property, at any depth. */
export function referencedMaterialIds(doc: Json): number[] {
  const ids = new Set<number>();
  const visit = (node: Json) => {
    if (Array.isArray(node)) node.forEach(visit);
    else if (node !== null && typeof node === 'object') {
      for (const [key, value] of Object.entries(node)) {
        if ((key === 'materialId' || key.endsWith('MaterialId')) && typeof value === 'number') ids.add(value);
        else visit(value);
      }
    }
  };
  visit(doc);
  return [...ids];
}
