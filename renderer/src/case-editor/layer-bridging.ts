/**
 * A wall layer's bridging sections, air gaps and fixings as the build-up editor changes them:
 * sections side by side with the layer's own material (timber studs in mineral wool), the level of
 * air gaps through the insulation and mechanical fixings that cross it (the ISO 6946 combined
 * method and its Annex F corrections, which the engine works out). A section's area is a plain
 * fraction of the face (0.063), as the report's table and the engine's refusals state it. Every change returns a new case
 * (case-paths), so undo steps through it like any other edit. Each box is a field of the case file
 * with its quantity, its allowed range (the engine's own) and the value it starts from.
 *
 * Starting values are common practice, no source, meant to be changed: a section takes a tenth of
 * the face (0.1); a fixing is steel (about 50 W/(m·K), from memory) with a 5 mm round shank, 6 per m².
 */
import { QUANTITY_RANGES as R } from '../../../app/base/quantity-ranges.js';
import { BRIDGE_FRACTION_RANGE, FASTENER_RANGES, MAXIMUM_BRIDGES_PER_LAYER } from '../../../app/cases/wall/wall-validation.js';
import { getAt, setAt, type Json, type JsonObject } from './case-paths.js';
import type { ChoiceField, NumberField } from './case-form-fields.js';

export { MAXIMUM_BRIDGES_PER_LAYER };

export const DEFAULT_BRIDGE_FRACTION = 0.1;
/** A steel fixing with a 5 mm round shank, six to the square metre. */
export const DEFAULT_FASTENERS = { conductivity: 50, perSquareMetre: 6, crossSectionArea: Math.PI * 0.0025 ** 2 } as const;

const objectAt = (doc: Json, path: string): JsonObject | undefined => {
  const value = getAt(doc, path);
  return value !== null && typeof value === 'object' && !Array.isArray(value) ? value : undefined;
};

/** The places of a case's material layers (not its air layers); build-up.ts reads this module, so it is not imported from there. */
function materialLayerIndices(doc: Json): number[] {
  const layers = getAt(doc, 'layers');
  if (!Array.isArray(layers)) return [];
  return layers.flatMap((l, i) => (l !== null && typeof l === 'object' && !Array.isArray(l) && l['kind'] !== 'air-layer' ? [i] : []));
}

/** The bridging sections of layer `index` (none for a homogeneous layer). */
export function bridgesOf(doc: Json, index: number): JsonObject[] {
  const bridges = getAt(doc, `layers[${index}].bridges`);
  return Array.isArray(bridges) ? (bridges.filter((b) => b !== null && typeof b === 'object' && !Array.isArray(b)) as JsonObject[]) : [];
}

export function canAddBridge(doc: Json, index: number): boolean {
  return bridgesOf(doc, index).length < MAXIMUM_BRIDGES_PER_LAYER;
}

/** A new section of a library material, taking a starting share of the face. */
export function addBridge(doc: Json, index: number, materialId: number): Json {
  if (!canAddBridge(doc, index)) return doc;
  return setAt(doc, `layers[${index}].bridges`, [...bridgesOf(doc, index), { materialId, fraction: DEFAULT_BRIDGE_FRACTION }]);
}

/** Removes section `k`; a layer left with none is homogeneous again (the case file has no empty list). */
export function removeBridge(doc: Json, index: number, k: number): Json {
  const left = bridgesOf(doc, index).filter((_, j) => j !== k);
  return setAt(doc, `layers[${index}].bridges`, left.length > 0 ? left : undefined);
}

/** A section's own name; empty text leaves it out, so the report names the section by its material. */
export function nameBridge(doc: Json, index: number, k: number, name: string): Json {
  return setAt(doc, `layers[${index}].bridges[${k}].name`, name.trim() === '' ? undefined : name);
}

export function bridgeFractionField(index: number, k: number): NumberField {
  return {
    type: 'number',
    path: `layers[${index}].bridges[${k}].fraction`,
    label: 'Area fraction of the face',
    // A plain fraction, as the report's table of sections and the engine's refusal give it.
    quantity: 'factor',
    range: BRIDGE_FRACTION_RANGE,
    initial: DEFAULT_BRIDGE_FRACTION,
  };
}

/** The ISO 6946 Annex F levels of air gaps, in words a site engineer would use. */
export const AIR_GAP_LEVELS = [
  { value: '0', label: 'Level 0: no gaps that matter', hint: 'Boards fit tightly, or their joints are staggered or sealed: no correction.' },
  { value: '1', label: 'Level 1: gaps through the insulation', hint: 'Gaps run from the warm side of the insulation to the cold side, but air does not circulate between the two sides.' },
  { value: '2', label: 'Level 2: gaps with air moving round it', hint: 'Gaps through the insulation join cavities, so air circulates freely between its warm and cold sides.' },
] as const;

export function airGapLevelOf(doc: Json, index: number): string {
  const level = getAt(doc, `layers[${index}].airGapLevel`);
  return typeof level === 'number' ? String(level) : '0';
}

/** Level 0 is the layer as the case file leaves it when no level is given: no correction. */
export function airGapField(index: number): ChoiceField {
  const path = `layers[${index}].airGapLevel`;
  return {
    type: 'choice',
    path,
    label: 'Air gaps in this layer',
    options: () => AIR_GAP_LEVELS.map(({ value, label }) => ({ value, label })),
    read: (doc) => airGapLevelOf(doc, index),
    write: (doc, value) => setAt(doc, path, value === '0' ? undefined : Number(value)),
  };
}

export function fastenersOn(doc: Json, index: number): boolean {
  return objectAt(doc, `layers[${index}].fasteners`) !== undefined;
}

export function addFasteners(doc: Json, index: number): Json {
  return setAt(doc, `layers[${index}].fasteners`, { ...DEFAULT_FASTENERS });
}

export function removeFasteners(doc: Json, index: number): Json {
  return setAt(doc, `layers[${index}].fasteners`, undefined);
}

export function fastenerFields(index: number): NumberField[] {
  const f = `layers[${index}].fasteners`;
  return [
    { type: 'number', path: `${f}.conductivity`, label: 'Conductivity of a fixing', quantity: 'conductivity', range: FASTENER_RANGES.conductivity, initial: DEFAULT_FASTENERS.conductivity },
    { type: 'number', path: `${f}.perSquareMetre`, label: 'Fixings per m² of the element', quantity: 'count', range: { ...FASTENER_RANGES.perSquareMetre, unit: '' }, initial: DEFAULT_FASTENERS.perSquareMetre },
    { type: 'number', path: `${f}.crossSectionArea`, label: 'Cross-section of one fixing', quantity: 'area', range: FASTENER_RANGES.crossSectionArea, initial: DEFAULT_FASTENERS.crossSectionArea },
    {
      type: 'number', path: `${f}.lengthInLayer`, label: 'Length of a fixing inside the layer', quantity: 'thickness', range: { ...R.wallLayerThickness, min: 0, minExclusive: true },
      initial: 0.1, whenEmpty: () => 'the whole layer',
    },
  ];
}

/** The diameter of a round shank of that cross-section, m, so a person can check an area typed in m². */
export function shankDiameter(crossSectionArea: number): number {
  return Math.sqrt((4 * crossSectionArea) / Math.PI);
}

/** What a layer's "studs, air gaps and fixings" disclosure holds, in a few words for its closed summary. */
export function bridgingSummary(doc: Json, index: number): string {
  const parts: string[] = [];
  const sections = bridgesOf(doc, index);
  if (sections.length > 0) {
    const share = sections.reduce((s, b) => s + (typeof b['fraction'] === 'number' ? b['fraction'] : 0), 0);
    parts.push(`${sections.length === 1 ? '1 section' : `${sections.length} sections`} over ${Number(share.toPrecision(3))} of the face`);
  }
  const level = airGapLevelOf(doc, index);
  if (level !== '0') parts.push(`air gaps at level ${level}`);
  if (fastenersOn(doc, index)) parts.push('fixings');
  return parts.length > 0 ? parts.join(', ') : 'none';
}

/** Paths of the bridging controls of every material layer of a wall, for placing the engine's complaints beside them. */
export function bridgingPaths(doc: Json): string[] {
  return materialLayerIndices(doc).flatMap((i) => {
    const l = `layers[${i}]`;
    const sections = bridgesOf(doc, i).flatMap((_, k) => [`${l}.bridges[${k}]`, `${l}.bridges[${k}].material`, `${l}.bridges[${k}].name`, `${l}.bridges[${k}].fraction`]);
    const fixings = fastenersOn(doc, i) ? [`${l}.fasteners`, ...fastenerFields(i).map((f) => f.path)] : [];
    return [`${l}.bridges`, ...sections, `${l}.airGapLevel`, ...fixings];
  });
}

const FASTENER_WORDS: Record<string, string> = {
  conductivity: 'Conductivity of a fixing',
  perSquareMetre: 'Fixings per m²',
  crossSectionArea: 'Cross-section of one fixing',
  lengthInLayer: 'Length of a fixing inside the layer',
};

/** The words the form names a bridging control by ("Area fraction of section 1 in layer 3"), or undefined. */
export function bridgingFieldName(path: string): string | undefined {
  const section = /^layers\[(\d+)\]\.bridges\[(\d+)\](?:\.(fraction|material|materialId|name))?$/.exec(path);
  if (section) {
    const where = `section ${Number(section[2]) + 1} in layer ${Number(section[1]) + 1}`;
    const what = section[3] === undefined ? 'Bridging' : { fraction: 'Area fraction', material: 'Material', materialId: 'Material', name: 'Name' }[section[3] as 'fraction'];
    return `${what} of ${where}`;
  }
  const layer = /^layers\[(\d+)\]\.(bridges|airGapLevel|fasteners)(?:\.(conductivity|perSquareMetre|crossSectionArea|lengthInLayer))?$/.exec(path);
  if (!layer) return undefined;
  const n = Number(layer[1]) + 1;
  if (layer[3] !== undefined) return `${FASTENER_WORDS[layer[3]]} in layer ${n}`;
  return { bridges: `The bridging sections of layer ${n}`, airGapLevel: `Air gaps in layer ${n}`, fasteners: `The fixings of layer ${n}` }[layer[2] as 'bridges'];
}
