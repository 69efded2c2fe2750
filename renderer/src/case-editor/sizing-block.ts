/**
 * The case file's "sizing" block as the case editor's sizing panel changes it: switched on with a
 * layer, a series and a first criterion that suits the case; each criterion switched on with
 * starting values; the economics added or removed; the chosen thickness written into the sized
 * layer. Every change returns a new case (case-paths), so undo steps through it like any other edit,
 * and the block is saved with the case.
 *
 * Starting values are common practice, no source, meant to be changed: a 1 K margin over the dew
 * point, 2 K of temperature change along a run, 12 h before stagnant water reaches 0 °C.
 */
import type { SizingCriterionName } from '../../../app/cases/sizing/sizing-model.js';
import { getAt, setAt, type Json, type JsonObject } from './case-paths.js';
import { isAirLayer, layersOf } from './build-up.js';
import type { CaseKindName } from './case-form-fields.js';

export const SIZING = 'sizing';

export function sizingBlock(doc: Json): JsonObject | undefined {
  const block = getAt(doc, SIZING);
  return block !== null && typeof block === 'object' && !Array.isArray(block) ? block : undefined;
}

export function criterionOn(doc: Json, criterion: SizingCriterionName): boolean {
  return getAt(doc, `${SIZING}.criteria.${criterion}`) !== undefined;
}

export function economicsOn(doc: Json): boolean {
  return getAt(doc, `${SIZING}.economics`) !== undefined;
}

/** The layers that can be sized: every layer that is not an air layer, by its place in `layers`. */
export function sizableLayers(doc: Json): number[] {
  return layersOf(doc).flatMap((layer, i) => (isAirLayer(layer) ? [] : [i]));
}

/** A line or vessel colder than its air gains heat and may sweat: it is sized against condensation first, else to the touch limit. */
function runsCold(doc: Json): boolean {
  const inside = getAt(doc, 'inner.temperature');
  const air = getAt(doc, 'ambient.airTemperature');
  return typeof inside === 'number' && typeof air === 'number' && inside < air;
}

/**
 * Sizing switched on: the last layer that can be sized (the outer insulation is the one usually
 * chosen), the series of its material's product family, and one criterion that suits the case.
 */
export function startSizing(doc: Json): Json {
  const layers = sizableLayers(doc);
  const layer = layers[layers.length - 1] ?? 0;
  const criteria: JsonObject = runsCold(doc) ? { noCondensation: { margin: 1 } } : { maxSurfaceTemperature: {} };
  return setAt(doc, SIZING, { layer, series: { kind: 'material' }, criteria });
}

export function stopSizing(doc: Json): Json {
  return setAt(doc, SIZING, undefined);
}

/** Values a criterion starts from when switched on (the module comment says where they come from). */
function criterionStart(criterion: SizingCriterionName, kind: CaseKindName): Json {
  switch (criterion) {
    case 'maxSurfaceTemperature':
      return {};
    case 'noCondensation':
      return { margin: 1 };
    case 'maxHeatLoss':
      return { limit: kind === 'pipe' ? 30 : 50 };
    case 'maxTemperatureDrop':
      return { massFlow: 0.5, specificHeat: 4190, limit: 2 };
    case 'freezeProtection':
      return { initialTemperature: 5, airTemperature: -10, windSpeed: 5, minTimeToZero: 12 * 3600 };
    case 'economic':
      return {};
  }
}

/**
 * Economics a user starts from and then replaces with the job's own figures: a price and an
 * emission factor the panel says are placeholders (invented, for a first look only).
 */
export const ECONOMICS_START: JsonObject = {
  energyPrice: 0.08,
  priceEscalation: 0.03,
  generationEfficiency: 0.9,
  discountRate: 0.05,
  years: 15,
  emissionFactor: 0.2,
  emissionSource: 'placeholder figure: replace with the factor your energy supplier or national inventory publishes',
};

/** The economic criterion needs the economics: switching it on adds them, with the first cost table of the basis. */
export function switchCriterion(doc: Json, criterion: SizingCriterionName, on: boolean, kind: CaseKindName, costTable: string): Json {
  const path = `${SIZING}.criteria.${criterion}`;
  if (!on) return setAt(doc, path, undefined);
  const next = setAt(doc, path, criterionStart(criterion, kind));
  return criterion === 'economic' && !economicsOn(next) ? switchEconomics(next, true, costTable) : next;
}

/** Without economics there is no lifecycle cost, so the economic criterion goes with them. */
export function switchEconomics(doc: Json, on: boolean, costTable: string): Json {
  if (on) return setAt(doc, `${SIZING}.economics`, { ...ECONOMICS_START, costTable });
  return setAt(setAt(doc, `${SIZING}.economics`, undefined), `${SIZING}.criteria.economic`, undefined);
}

export type SeriesKind = 'material' | 'named' | 'range';

/** The series the block names, as the panel's choice reads it ("named:PIR pipe section"). */
export function seriesChoice(doc: Json): string {
  const kind = getAt(doc, `${SIZING}.series.kind`);
  if (kind === 'named') return `named:${String(getAt(doc, `${SIZING}.series.family`) ?? '')}`;
  return kind === 'range' ? 'range' : 'material';
}

/** A range starts at the thinnest and ends at the thickest the families sell, in 10 mm steps. */
export function chooseSeries(doc: Json, choice: string): Json {
  if (choice.startsWith('named:')) return setAt(doc, `${SIZING}.series`, { kind: 'named', family: choice.slice('named:'.length) });
  if (choice === 'range') return setAt(doc, `${SIZING}.series`, { kind: 'range', from: 0.02, to: 0.2, step: 0.01 });
  return setAt(doc, `${SIZING}.series`, { kind: 'material' });
}

export function chooseLayer(doc: Json, layer: number): Json {
  return setAt(doc, `${SIZING}.layer`, layer);
}

/** "Use this thickness": the sized layer takes the chosen thickness. */
export function useThickness(doc: Json, thickness: number): Json {
  const layer = getAt(doc, `${SIZING}.layer`);
  return typeof layer === 'number' ? setAt(doc, `layers[${layer}].thickness`, thickness) : doc;
}

/** The sized layer's thickness in the case, m (undefined when the block names no such layer). */
export function sizedThickness(doc: Json): number | undefined {
  const layer = getAt(doc, `${SIZING}.layer`);
  const thickness = typeof layer === 'number' ? getAt(doc, `layers[${layer}].thickness`) : undefined;
  return typeof thickness === 'number' ? thickness : undefined;
}
