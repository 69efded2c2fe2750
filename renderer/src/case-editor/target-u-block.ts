/**
 * A wall case's "targetU" block as the editor's "Reach a target U-value" section changes it: one
 * layer whose thickness varies over a series, and the U-value to reach. The engine solves the wall
 * at each thickness and picks the thinnest that reaches the target (app/cases/wall/wall-target-u);
 * the section shows the report's table of it and puts the chosen thickness into the layer. Every
 * change returns a new case (case-paths), so undo steps through it like any other edit.
 *
 * The case file names the layer by its own name, or by its material's name when it has none; a
 * layer whose name another layer shares is given a name of its own when it is chosen, so that the
 * block names exactly one layer.
 *
 * Starting values are common practice, no source, meant to be changed: a target of
 * 0.25 W/(m²·K), thicknesses from 20 to 300 mm in 20 mm steps.
 */
import type { NumberRange } from '../../../app/base/number-range.js';
import { QUANTITY_RANGES as R } from '../../../app/base/quantity-ranges.js';
import { TARGET_U_RANGE } from '../../../app/cases/wall/wall-validation.js';
import { TARGET_TABLE } from '../../../app/cases/wall/wall-bridging-report.js';
import { conductivityAt } from '../../../app/fe/conductivity.js';
import type { MaterialProperties } from '../../../app/materials/material-properties.js';
import type { CaseReport, ReportChart, ReportSection, ReportTable } from '../../../app/report/report-model.js';
import type { TableMarks } from '../report-view/table-marks.js';
import { getAt, setAt, type Json, type JsonObject } from './case-paths.js';
import { isAirLayer, layersOf } from './build-up.js';
import type { CaseKindName, ChoiceField, NumberField } from './case-form-fields.js';

export const TARGET_U = 'targetU';
/** The report section the engine builds for a target (wall-bridging-report targetUSections). */
export const TARGET_U_SECTION = 'target-u';
export { TARGET_TABLE };

export const TARGET_START = { value: 0.25, thicknesses: { from: 0.02, to: 0.3, step: 0.02 } } as const;

type Library = ReadonlyMap<number, MaterialProperties>;

export function targetUBlock(doc: Json): JsonObject | undefined {
  const block = getAt(doc, TARGET_U);
  return block !== null && typeof block === 'object' && !Array.isArray(block) ? block : undefined;
}

/** The layer's material: from the library when it is a reference, else as the case file writes it. */
function materialOf(layer: JsonObject, library: Library): { name?: string; category?: string; conductivity?: MaterialProperties['conductivity'] } | undefined {
  const id = layer['materialId'];
  if (typeof id === 'number') return library.get(id);
  const inline = layer['material'];
  return inline !== null && typeof inline === 'object' && !Array.isArray(inline) ? (inline as { name?: string }) : undefined;
}

/** The name the case file's block names a layer by: its own, else its material's (as the engine reads it). */
export function layerName(doc: Json, index: number, library: Library): string | undefined {
  const layer = layersOf(doc)[index];
  if (!layer || isAirLayer(layer)) return undefined;
  if (typeof layer['name'] === 'string') return layer['name'];
  const name = materialOf(layer, library)?.name;
  return typeof name === 'string' ? name : undefined;
}

/** The layers whose thickness may vary: material layers that count in the U-value (inside a well ventilated air layer). */
export function targetLayers(doc: Json): number[] {
  const layers = layersOf(doc);
  const ventilated = layers.findIndex((l) => isAirLayer(l) && l['ventilation'] === 'well-ventilated');
  return layers.flatMap((l, i) => (!isAirLayer(l) && (ventilated < 0 || i < ventilated) ? [i] : []));
}

/** The layer the block names, by its place; null when it names none, or more than one. */
export function targetLayerIndex(doc: Json, library: Library): number | null {
  const named = getAt(doc, `${TARGET_U}.layer`);
  if (typeof named !== 'string') return null;
  const matches = layersOf(doc).flatMap((_, i) => (layerName(doc, i, library) === named ? [i] : []));
  return matches.length === 1 ? matches[0]! : null;
}

/** The block names layer `index`; a name another layer shares is made the layer's own first ("… (layer 3)"). */
export function chooseTargetLayer(doc: Json, index: number, library: Library): Json {
  const name = layerName(doc, index, library) ?? `Layer ${index + 1}`;
  const shared = layersOf(doc).some((_, i) => i !== index && layerName(doc, i, library) === name);
  if (!shared) return setAt(doc, `${TARGET_U}.layer`, name);
  const own = `${name} (layer ${index + 1})`;
  return setAt(setAt(doc, `layers[${index}].name`, own), `${TARGET_U}.layer`, own);
}

/** The layer a new target varies: the last insulation layer that counts, else the one of lowest conductivity. */
export function firstTargetLayer(doc: Json, library: Library): number | undefined {
  const candidates = targetLayers(doc);
  const layers = layersOf(doc);
  const insulation = candidates.filter((i) => materialOf(layers[i]!, library)?.category === 'insulation');
  if (insulation.length > 0) return insulation[insulation.length - 1];
  const lambda = (i: number) => {
    const c = materialOf(layers[i]!, library)?.conductivity;
    return c === undefined ? Number.POSITIVE_INFINITY : conductivityAt(c, 10);
  };
  return [...candidates].sort((a, b) => lambda(a) - lambda(b))[0];
}

/** The target switched on: the layer most likely meant, thicknesses in even steps, a starting target. */
export function startTargetU(doc: Json, library: Library): Json {
  const layer = firstTargetLayer(doc, library);
  const started = setAt(doc, TARGET_U, { layer: '', thicknesses: { ...TARGET_START.thicknesses }, value: TARGET_START.value });
  return layer === undefined ? started : chooseTargetLayer(started, layer, library);
}

export function stopTargetU(doc: Json): Json {
  return setAt(doc, TARGET_U, undefined);
}

export type ThicknessesKind = 'range' | 'list';

export function thicknessesKind(doc: Json): ThicknessesKind {
  return Array.isArray(getAt(doc, `${TARGET_U}.thicknesses`)) ? 'list' : 'range';
}

/** The thicknesses a case file lists, rising, m (none for a range). */
export function listedThicknesses(doc: Json): number[] {
  const list = getAt(doc, `${TARGET_U}.thicknesses`);
  return Array.isArray(list) ? [...new Set(list.filter((d): d is number => typeof d === 'number'))].sort((a, b) => a - b) : [];
}

const THICKNESSES_CHOICE: ChoiceField = {
  type: 'choice',
  path: `${TARGET_U}.thicknesses`,
  label: 'Thicknesses to try',
  options: (doc) => [
    { value: 'range', label: 'In even steps from the thinnest to the thickest' },
    ...(thicknessesKind(doc) === 'list' ? [{ value: 'list', label: 'The list written in this case file' }] : []),
  ],
  read: thicknessesKind,
  // A list becomes the range it spans, in 10 mm steps; a list cannot be typed here, only kept.
  write: (doc, value) => {
    if (value !== 'range') return doc;
    const list = listedThicknesses(doc);
    const range = list.length > 0 ? { from: list[0]!, to: list[list.length - 1]!, step: 0.01 } : { ...TARGET_START.thicknesses };
    return setAt(doc, `${TARGET_U}.thicknesses`, range);
  },
};

const inRange = (doc: Json) => thicknessesKind(doc) === 'range';
const thickness = (path: string, label: string, initial: number, range: NumberRange = R.wallLayerThickness): NumberField => ({
  type: 'number', path: `${TARGET_U}.thicknesses.${path}`, label, quantity: 'thickness', range, initial, shown: inRange,
});

export const TARGET_VALUE_FIELD: NumberField = { type: 'number', path: `${TARGET_U}.value`, label: 'Target U-value', quantity: 'uValue', range: TARGET_U_RANGE, initial: TARGET_START.value };

/** The boxes under the layer choice: the target, how the thicknesses are given, and the range's three. */
export const TARGET_U_FIELDS: readonly (NumberField | ChoiceField)[] = [
  TARGET_VALUE_FIELD,
  THICKNESSES_CHOICE,
  thickness('from', 'Thinnest to try', TARGET_START.thicknesses.from),
  thickness('to', 'Thickest to try', TARGET_START.thicknesses.to),
  thickness('step', 'Step between thicknesses', TARGET_START.thicknesses.step, { ...R.wallLayerThickness, min: 0, minExclusive: true }),
];

/** The paths of the section's controls the case shows now (none for a pipe or flat case, or with no target). */
export function shownTargetUPaths(kind: CaseKindName, doc: Json): string[] {
  if (kind !== 'wall' || targetUBlock(doc) === undefined) return [];
  return [TARGET_U, `${TARGET_U}.layer`, ...TARGET_U_FIELDS.filter((f) => f.type !== 'number' || !f.shown || f.shown(doc)).map((f) => f.path)];
}

/** The words the section names its controls by, for a refusal that opens with their path. */
export function targetUFieldName(path: string): string | undefined {
  const listed = /^targetU\.thicknesses\[(\d+)\]$/.exec(path);
  if (listed) return `Thickness ${Number(listed[1]) + 1} of the list to try`;
  if (path === TARGET_U) return 'The target U-value';
  if (path === `${TARGET_U}.layer`) return 'Layer to vary';
  return TARGET_U_FIELDS.find((f) => f.path === path)?.label;
}

/** The report's section for the target, when the case has one and it was solved. */
export function targetUSection(report: CaseReport | null): ReportSection | undefined {
  return report?.sections.find((s) => s.id === TARGET_U_SECTION);
}

/** The thickness the engine chose, m, read from the section's figures; null when none of the series reaches the target. */
export function chosenTargetThickness(section: ReportSection | undefined): number | null {
  for (const block of section?.blocks ?? []) {
    if (block.kind !== 'figures') continue;
    const chosen = block.figures.find((f) => f.label.startsWith('Chosen thickness'));
    if (chosen) return chosen.value;
  }
  return null;
}

/** The chosen thickness put into the varied layer. */
export function useTargetThickness(doc: Json, index: number, thicknessValue: number): Json {
  return setAt(doc, `layers[${index}].thickness`, thicknessValue);
}

/** The choices of the layer box: each layer that may vary, by its place and the name the block uses; a first "choose" when the block names none. */
export function targetLayerOptions(doc: Json, library: Library): { value: string; label: string }[] {
  const options = targetLayers(doc).map((i) => ({ value: String(i), label: `Layer ${i + 1}: ${layerName(doc, i, library) ?? 'no material'}` }));
  return targetLayerIndex(doc, library) === null ? [{ value: '', label: 'Choose a layer…' }, ...options] : options;
}

/** The table of U across the series, as the report's section holds it. */
export function targetUTable(section: ReportSection | undefined): ReportTable | undefined {
  for (const block of section?.blocks ?? []) if (block.kind === 'table' && block.table.title === TARGET_TABLE) return block.table;
  return undefined;
}

/** The chart of U against thickness, as the report's section holds it. */
export function targetUChart(section: ReportSection | undefined): ReportChart | undefined {
  for (const block of section?.blocks ?? []) if (block.kind === 'chart') return block.chart;
  return undefined;
}

/** The report's sentence saying why that thickness (or that none of the series will do). */
export function targetUReason(section: ReportSection | undefined): string | undefined {
  for (const block of section?.blocks ?? []) if (block.kind === 'paragraphs') return block.paragraphs[0];
  return undefined;
}

/** The chosen thickness's row marked (shaded and bold, as the sizing panel marks its choice); no failures to explain, the last column says yes or no. */
export function targetUMarks(table: ReportTable, chosen: number | null): TableMarks {
  return {
    testId: 'target-u-table',
    rows: table.rows.map((row) => {
      const cell = row[0];
      const marked = chosen !== null && typeof cell === 'object' && cell !== null && typeof cell.value === 'number' && Math.abs(cell.value - chosen) < 1e-9;
      return { marked, ...(marked ? { testId: 'target-u-chosen-row' } : {}), failures: [] };
    }),
  };
}
