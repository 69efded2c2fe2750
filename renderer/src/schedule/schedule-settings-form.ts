/**
 * The schedule's settings as the settings form holds them while they are edited: every number as
 * the text typed in its box (in the project's units), so nothing typed is lost while a value is
 * wrong or the Node side refuses the whole; every list entry with a key that survives a rename.
 * Pure: adding, renaming, editing and removing entries return a new draft; `readDraft` turns the
 * texts into ScheduleSettings (SI) or names each box whose text cannot be stored. The ranges are
 * those parseScheduleSettings (app/schedules/schedule-settings) checks again on the Node side;
 * here they let a box say what is wrong in its own units ("150 %", not "1.5").
 */
import { isInRange, type NumberRange } from '../../../app/base/number-range.js';
import type { QuantityName } from '../../../app/base/quantities.js';
import { unitLabel, type UnitSystem } from '../../../app/base/unit-systems.js';
import { MAX_CURRENCY_LENGTH, SCHEDULE_SETTING_RANGES } from '../../../app/schedules/schedule-settings.js';
import type { ConditionSet, ScheduleEconomics, ScheduleRun, ScheduleSettings, ServiceRule } from '../../../app/schedules/schedule-model.js';
import type { NumberField } from '../case-editor/case-form-fields.js';
import { DEFAULT_TOUCH_LIMIT } from '../../../app/checks/personnel-protection.js';
import { boxText, hintValue, rangeHint, storedValueFor } from '../case-editor/field-text.js';
import { CRITERION_SWITCHES, criterionFields } from '../case-editor/sizing-fields.js';

/** The criteria a service may size to: a case's, less the economic thickness (a schedule sizes to physical criteria). */
export const SCHEDULE_CRITERIA = ['maxSurfaceTemperature', 'noCondensation', 'maxHeatLoss', 'maxTemperatureDrop', 'freezeProtection'] as const;
export type ScheduleCriterion = (typeof SCHEDULE_CRITERIA)[number];

/** One number box of the form: where it sits in the settings, what it reads, its unit and range. */
export interface SettingsBox {
  /** The last segment of the settings path ("relativeHumidity", "limit"). */
  readonly key: string;
  readonly label: string;
  readonly quantity: QuantityName;
  readonly range: NumberRange;
  /** SI value a new entry (or a criterion switched on) starts from. */
  readonly initial: number;
  /** May be left empty (the criterion then takes the engine's own value). */
  readonly optional: boolean;
  /** What an empty box means, in the project's units ("60 °C, the usual touch limit"). */
  readonly emptyMeans?: (system: UnitSystem) => string;
}

const R = SCHEDULE_SETTING_RANGES;

export const CONDITION_BOXES: readonly SettingsBox[] = [
  { key: 'airTemperature', label: 'Air temperature', quantity: 'temperature', range: R.airTemperature, initial: 20, optional: false },
  { key: 'relativeHumidity', label: 'Relative humidity', quantity: 'relativeHumidity', range: R.relativeHumidity, initial: 0.5, optional: false },
];
/** Outdoors only: a set indoors is in still air. */
export const WIND_BOX: SettingsBox = { key: 'windSpeed', label: 'Wind speed', quantity: 'windSpeed', range: R.windSpeed, initial: 3, optional: false };

export const HOURS_BOX: SettingsBox = { key: 'operatingHours', label: 'Operating hours per year', quantity: 'hours', range: R.operatingHours, initial: 8760, optional: false };

/** Starting values of the economics are placeholders (common practice, no source): the job's own figures replace them. */
export const ECONOMICS_BOXES: readonly SettingsBox[] = [
  { key: 'energyPrice', label: 'Energy price per kWh bought (fuel or electricity)', quantity: 'pricePerEnergy', range: R.energyPrice, initial: 0.1, optional: false },
  { key: 'generationEfficiency', label: 'Efficiency of heat generation (or COP of cooling)', quantity: 'factor', range: R.generationEfficiency, initial: 0.9, optional: false },
  { key: 'emissionFactor', label: 'CO₂ per energy bought (fuel or electricity)', quantity: 'emissionFactor', range: R.emissionFactor, initial: 0.2, optional: false },
];
export const MAX_CURRENCY = MAX_CURRENCY_LENGTH;
export const MAX_NAME = 80;

/** A criterion's boxes: the sizing panel's own fields (labels, quantities, ranges), keyed by their last segment. */
export function criterionBoxes(criterion: ScheduleCriterion): readonly SettingsBox[] {
  return criterionFields(criterion, 'pipe')
    .filter((f): f is NumberField => f.type === 'number')
    .map((f) => {
      const key = f.path.slice(f.path.lastIndexOf('.') + 1);
      // A run's case has no touch limit of its own, so an empty limit is the engine's default one.
      const emptyMeans = f.whenEmpty === undefined ? undefined
        : criterion === 'maxSurfaceTemperature' ? (system: UnitSystem) => `${hintValue(DEFAULT_TOUCH_LIMIT, 'temperature', system)}, Lamina's usual touch limit`
        : (system: UnitSystem) => f.whenEmpty!({}, { pipeSizes: [], unitSystem: system });
      return { key, label: f.label, quantity: f.quantity, range: f.range, initial: f.initial, optional: emptyMeans !== undefined, ...(emptyMeans ? { emptyMeans } : {}) };
    });
}

export interface ConditionSetDraft {
  readonly key: number;
  readonly name: string;
  readonly exposure: 'indoor' | 'outdoor';
  /** Box texts by box key (airTemperature, relativeHumidity, windSpeed). */
  readonly texts: Readonly<Record<string, string>>;
  /** SI values the texts were shown from: an untouched box keeps every stored digit (storedValueFor). */
  readonly stored: Readonly<Record<string, number>>;
}

export interface CriterionDraft {
  readonly on: boolean;
  /** Kept while switched off, so switching back on brings back what was typed. */
  readonly texts: Readonly<Record<string, string>>;
  readonly stored: Readonly<Record<string, number>>;
}

export interface ServiceDraft {
  readonly key: number;
  readonly service: string;
  readonly material: string;
  readonly criteria: Readonly<Record<ScheduleCriterion, CriterionDraft>>;
  /** Criteria of the stored service this form does not offer, carried through unchanged. */
  readonly otherCriteria: Readonly<Record<string, unknown>>;
}

export interface SettingsDraft {
  readonly conditionSets: readonly ConditionSetDraft[];
  readonly services: readonly ServiceDraft[];
  readonly operatingHours: string;
  readonly economicsOn: boolean;
  readonly economics: Readonly<Record<string, string>>;
  /** SI values the hours and economics boxes were shown from, by box key. */
  readonly stored: Readonly<Record<string, number>>;
  readonly currency: string;
  readonly nextKey: number;
}

const textOf = (value: unknown, box: SettingsBox, system: UnitSystem): string => (typeof value === 'number' ? boxText(value, box.quantity, system) : '');
/** The boxes' texts and SI values, from `values` where it has a number, else each box's start. */
function boxesFrom(boxes: readonly SettingsBox[], values: Readonly<Record<string, unknown>> | undefined, system: UnitSystem): { texts: Record<string, string>; stored: Record<string, number> } {
  const stored: Record<string, number> = {};
  for (const b of boxes) {
    const value = values === undefined ? (b.optional ? undefined : b.initial) : values[b.key];
    if (typeof value === 'number') stored[b.key] = value;
  }
  return { texts: Object.fromEntries(boxes.map((b) => [b.key, textOf(stored[b.key], b, system)])), stored };
}

function criteriaDraft(criteria: Readonly<Record<string, unknown>>, system: UnitSystem): Record<ScheduleCriterion, CriterionDraft> {
  const entries = SCHEDULE_CRITERIA.map((c) => {
    const stored = criteria[c];
    const boxes = criterionBoxes(c);
    if (stored === undefined || stored === null || typeof stored !== 'object') return [c, { on: false, ...boxesFrom(boxes, undefined, system) }] as const;
    return [c, { on: true, ...boxesFrom(boxes, stored as Record<string, unknown>, system) }] as const;
  });
  return Object.fromEntries(entries) as Record<ScheduleCriterion, CriterionDraft>;
}

/** The stored settings as the boxes show them in `system`. */
export function draftOf(settings: ScheduleSettings, system: UnitSystem): SettingsDraft {
  let key = 0;
  const conditionSets = settings.conditionSets.map((s) => ({
    key: key++,
    name: s.name,
    exposure: s.exposure,
    // Indoors the wind box is hidden; it starts from the usual outdoor value should the set go outdoors.
    ...boxesFrom([...CONDITION_BOXES, WIND_BOX], { ...s, ...(s.exposure === 'indoor' ? { windSpeed: WIND_BOX.initial } : {}) }, system),
  }));
  const services = settings.services.map((r) => ({
    key: key++,
    service: r.service,
    material: r.material,
    criteria: criteriaDraft(r.criteria, system),
    otherCriteria: Object.fromEntries(Object.entries(r.criteria).filter(([c]) => !(SCHEDULE_CRITERIA as readonly string[]).includes(c))),
  }));
  const e = settings.economics;
  const economics = boxesFrom(ECONOMICS_BOXES, e === null ? undefined : { ...e }, system);
  return {
    conditionSets,
    services,
    operatingHours: boxText(settings.operatingHours, HOURS_BOX.quantity, system),
    economicsOn: e !== null,
    economics: economics.texts,
    stored: { ...economics.stored, operatingHours: settings.operatingHours },
    currency: e?.currency ?? 'EUR',
    nextKey: key,
  };
}

/** `base`, or `base 2`, `base 3`…: the first that none of `taken` is (names compare as the Node side does, ignoring case). */
export function freshName(base: string, taken: readonly string[]): string {
  const used = new Set(taken.map((t) => t.trim().toLowerCase()));
  for (let n = 1; ; n++) {
    const name = n === 1 ? base : `${base} ${n}`;
    if (!used.has(name.toLowerCase())) return name;
  }
}

export function addConditionSet(draft: SettingsDraft, system: UnitSystem): SettingsDraft {
  const set: ConditionSetDraft = {
    key: draft.nextKey,
    name: freshName('New surroundings', draft.conditionSets.map((s) => s.name)),
    exposure: 'indoor',
    ...boxesFrom([...CONDITION_BOXES, WIND_BOX], undefined, system),
  };
  return { ...draft, conditionSets: [...draft.conditionSets, set], nextKey: draft.nextKey + 1 };
}

export function editConditionSet(draft: SettingsDraft, index: number, change: { name?: string; exposure?: 'indoor' | 'outdoor'; box?: { key: string; text: string } }): SettingsDraft {
  return {
    ...draft,
    conditionSets: draft.conditionSets.map((s, i) =>
      i !== index
        ? s
        : {
            ...s,
            ...(change.name !== undefined ? { name: change.name } : {}),
            ...(change.exposure !== undefined ? { exposure: change.exposure } : {}),
            texts: change.box ? { ...s.texts, [change.box.key]: change.box.text } : s.texts,
          },
    ),
  };
}

export function removeConditionSet(draft: SettingsDraft, index: number): SettingsDraft {
  return { ...draft, conditionSets: draft.conditionSets.filter((_, i) => i !== index) };
}

/** A new service starts on the touch limit with `material` (the first insulation of the library, say). */
export function addService(draft: SettingsDraft, material: string, system: UnitSystem): SettingsDraft {
  const criteria = criteriaDraft({ maxSurfaceTemperature: { limit: 50 } }, system);
  const service: ServiceDraft = { key: draft.nextKey, service: freshName('new service', draft.services.map((s) => s.service)), material, criteria, otherCriteria: {} };
  return { ...draft, services: [...draft.services, service], nextKey: draft.nextKey + 1 };
}

export function editService(draft: SettingsDraft, index: number, change: { service?: string; material?: string }): SettingsDraft {
  return { ...draft, services: draft.services.map((s, i) => (i === index ? { ...s, ...change } : s)) };
}

export function switchCriterion(draft: SettingsDraft, index: number, criterion: ScheduleCriterion, on: boolean): SettingsDraft {
  return {
    ...draft,
    services: draft.services.map((s, i) => (i === index ? { ...s, criteria: { ...s.criteria, [criterion]: { ...s.criteria[criterion], on } } } : s)),
  };
}

export function typeCriterion(draft: SettingsDraft, index: number, criterion: ScheduleCriterion, key: string, text: string): SettingsDraft {
  return {
    ...draft,
    services: draft.services.map((s, i) => {
      if (i !== index) return s;
      const c = s.criteria[criterion];
      return { ...s, criteria: { ...s.criteria, [criterion]: { ...c, texts: { ...c.texts, [key]: text } } } };
    }),
  };
}

export function removeService(draft: SettingsDraft, index: number): SettingsDraft {
  return { ...draft, services: draft.services.filter((_, i) => i !== index) };
}

export type DraftReading = { readonly ok: true; readonly settings: ScheduleSettings } | { readonly ok: false; readonly errors: ReadonlyMap<string, string> };

/** The box's text as an SI value within its range, or the sentence to show beside it (in the box's units). */
function readBox(text: string, stored: number | undefined, box: SettingsBox, system: UnitSystem, errors: Map<string, string>, path: string): number | undefined {
  if (box.optional && text.trim() === '') return undefined;
  const read = storedValueFor(text, stored, box.quantity, system, box.label);
  if (!read.ok) {
    errors.set(path, read.message);
    return undefined;
  }
  if (!isInRange(read.value, box.range)) {
    const unit = unitLabel(box.quantity, system);
    const hint = rangeHint(box.range, box.quantity, system);
    errors.set(path, `${box.label} may not be ${text.trim()}${unit ? ` ${unit}` : ''}: ${hint.charAt(0).toLowerCase()}${hint.slice(1)}.`);
    return undefined;
  }
  return read.value;
}

/**
 * The draft as settings to store, or every box whose text cannot be stored (by its settings path,
 * "conditionSets[1].relativeHumidity"). Names, materials and criteria are left to the Node side
 * to judge; its refusal names the path, which `boxOfRefusal` places.
 */
export function readDraft(draft: SettingsDraft, system: UnitSystem): DraftReading {
  const errors = new Map<string, string>();
  const conditionSets: ConditionSet[] = draft.conditionSets.map((s, i) => {
    const at = `conditionSets[${i}]`;
    const box = (b: SettingsBox) => readBox(s.texts[b.key] ?? '', s.stored[b.key], b, system, errors, `${at}.${b.key}`);
    const air = box(CONDITION_BOXES[0]!);
    const rh = box(CONDITION_BOXES[1]!);
    const wind = s.exposure === 'outdoor' ? box(WIND_BOX) : 0;
    return { name: s.name.trim(), airTemperature: air ?? NaN, relativeHumidity: rh ?? NaN, exposure: s.exposure, windSpeed: wind ?? NaN };
  });
  const services: ServiceRule[] = draft.services.map((s, i) => {
    const criteria: Record<string, unknown> = { ...s.otherCriteria };
    for (const c of SCHEDULE_CRITERIA) {
      const d = s.criteria[c];
      if (!d.on) continue;
      const values: Record<string, number> = {};
      for (const box of criterionBoxes(c)) {
        const value = readBox(d.texts[box.key] ?? '', d.stored[box.key], box, system, errors, `services[${i}].criteria.${c}.${box.key}`);
        if (value !== undefined) values[box.key] = value;
      }
      criteria[c] = values;
    }
    return { service: s.service.trim(), material: s.material, criteria };
  });
  const operatingHours = readBox(draft.operatingHours, draft.stored['operatingHours'], HOURS_BOX, system, errors, 'operatingHours');
  let economics: ScheduleEconomics | null = null;
  if (draft.economicsOn) {
    const [price, efficiency, emission] = ECONOMICS_BOXES.map((b) => readBox(draft.economics[b.key] ?? '', draft.stored[b.key], b, system, errors, `economics.${b.key}`));
    economics = { energyPrice: price ?? NaN, generationEfficiency: efficiency ?? NaN, emissionFactor: emission ?? NaN, currency: draft.currency.trim() };
  }
  if (errors.size > 0) return { ok: false, errors };
  return { ok: true, settings: { conditionSets, services, operatingHours: operatingHours ?? NaN, economics } };
}

/** Splits "services[0].criteria.maxHeatLoss.limit" into its segments ("services", 0, "criteria", …). */
function segmentsOf(path: string): (string | number)[] {
  return path.split(/\.|(?=\[)/).filter((s) => s !== '').map((s) => (/^\[\d+\]$/.test(s) ? Number(s.slice(1, -1)) : s));
}
const joined = (segments: readonly (string | number)[]) => segments.map((s, i) => (typeof s === 'number' ? `[${s}]` : i === 0 ? s : `.${s}`)).join('');

/**
 * The box a refusal of the Node side belongs to: its path without the leading "settings.", or the
 * nearest parent the form shows (a service's criteria as a whole, say), else the form as a whole
 * (null). `shown` holds the paths of the boxes the form shows now.
 */
export function boxOfRefusal(field: string | undefined, shown: ReadonlySet<string>): string | null {
  if (field === undefined) return null;
  const segments = segmentsOf(field.replace(/^settings\.?/, ''));
  for (let n = segments.length; n > 0; n--) {
    const candidate = joined(segments.slice(0, n));
    if (shown.has(candidate)) return candidate;
  }
  return null;
}

/** Every path the form shows a box (or a group) for now, for placing a refusal. */
export function shownPaths(draft: SettingsDraft): Set<string> {
  const paths = new Set<string>(['conditionSets', 'services', 'operatingHours']);
  draft.conditionSets.forEach((s, i) => {
    for (const k of ['name', 'exposure', 'airTemperature', 'relativeHumidity', ...(s.exposure === 'outdoor' ? ['windSpeed'] : [])]) paths.add(`conditionSets[${i}].${k}`);
  });
  draft.services.forEach((s, i) => {
    paths.add(`services[${i}].service`).add(`services[${i}].material`).add(`services[${i}].criteria`);
    for (const c of SCHEDULE_CRITERIA) {
      if (!s.criteria[c].on) continue;
      paths.add(`services[${i}].criteria.${c}`);
      for (const b of criterionBoxes(c)) paths.add(`services[${i}].criteria.${c}.${b.key}`);
    }
  });
  if (draft.economicsOn) {
    paths.add('economics').add('economics.currency');
    for (const b of ECONOMICS_BOXES) paths.add(`economics.${b.key}`);
  }
  return paths;
}

/** The id of a box's element: "schedule-settings-conditionSets-1-relativeHumidity". */
export function boxId(path: string): string {
  return `schedule-settings-${segmentsOf(path).join('-')}`;
}

/**
 * Names the runs give that the draft no longer holds (a set or service renamed or removed), with
 * how many runs give each: those runs cannot be sized until they name one that exists.
 */
export function namesLeftBehind(draft: SettingsDraft, runs: readonly ScheduleRun[]): { readonly locations: readonly [string, number][]; readonly services: readonly [string, number][] } {
  const sets = new Set(draft.conditionSets.map((s) => s.name.trim().toLowerCase()));
  const services = new Set(draft.services.map((s) => s.service.trim().toLowerCase()));
  const count = (names: string[]) => [...names.reduce((m, n) => m.set(n, (m.get(n) ?? 0) + 1), new Map<string, number>())];
  return {
    locations: count(runs.map((r) => r.location).filter((l) => l !== 'indoor' && l !== 'outdoor' && !sets.has(l.toLowerCase()))),
    services: count(runs.map((r) => r.service).filter((s) => !services.has(s.toLowerCase()))),
  };
}

/** Words for the settings' own fields, by the last segment of the path the Node side names. */
const FIELD_WORDS: Readonly<Record<string, string>> = {
  name: 'name', service: 'name', material: 'material', exposure: 'exposure', airTemperature: 'air temperature', relativeHumidity: 'relative humidity',
  windSpeed: 'wind speed', criteria: 'criteria', currency: 'currency', operatingHours: 'operating hours per year',
};

function wordsFor(rest: string): string | undefined {
  const criterion = /^criteria\.(\w+)(?:\.(\w+))?$/.exec(rest);
  if (criterion && (SCHEDULE_CRITERIA as readonly string[]).includes(criterion[1]!)) {
    const c = criterion[1] as ScheduleCriterion;
    const box = criterion[2] === undefined ? undefined : criterionBoxes(c).find((b) => b.key === criterion[2]);
    return box ? box.label.toLowerCase() : `${CRITERION_WORDS[c].label.toLowerCase()} criterion`;
  }
  return FIELD_WORDS[rest] ?? ECONOMICS_BOXES.find((b) => b.key === rest)?.label.toLowerCase();
}

/**
 * A refusal of the Node side as a person at the form reads it: each settings path it names
 * ("settings.conditionSets[4].name") in the form's words ("the name of condition set 5"), the
 * sentence opening with a capital. A path the form has no words for is left as written.
 */
export function refusalInWords(message: string): string {
  const worded = message.replace(/settings\.(conditionSets|services)\[(\d+)\](?:\.([\w.]+))?|settings\.(operatingHours|economics(?:\.\w+)?)/g, (whole, list?: string, index?: string, rest?: string, top?: string) => {
    if (top !== undefined) {
      const words = top === 'economics' ? 'the costs and CO₂' : wordsFor(top.replace(/^economics\./, ''));
      return words === undefined ? whole : `the ${words}`;
    }
    const entry = `${list === 'services' ? 'service' : 'condition set'} ${Number(index) + 1}`;
    if (rest === undefined) return entry;
    const words = wordsFor(rest);
    return words === undefined ? whole : `the ${words} of ${entry}`;
  });
  return worded === message ? message : worded.charAt(0).toUpperCase() + worded.slice(1);
}

/** What each criterion's switch says: the sizing panel's words. */
export const CRITERION_WORDS: Readonly<Record<ScheduleCriterion, { readonly label: string; readonly hint: string }>> = CRITERION_SWITCHES;
