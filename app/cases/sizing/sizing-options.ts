/**
 * The case file's "sizing" block of a pipe or flat case, checked and copied into SizingOptions
 * (sizing-model.ts): the layer to size, the thickness series, the criteria switched on and the
 * economics. Every refusal is one InputError whose sentence names the field and the allowed range
 * ("sizing.criteria.noCondensation.margin must be at least 0 and at most 20 K (got 30)."). The
 * freeze and fluid-temperature criteria need a run of pipe: a flat case refuses them by name.
 *
 *   "sizing": { "layer": 0, "series": { "kind": "material" },
 *               "criteria": { "noCondensation": { "margin": 1 }, "maxHeatLoss": { "limit": 12 } } }
 *
 * Series: { kind: 'material' } (the sized material's product family), { kind: 'named', family },
 * { kind: 'range', from, to, step } (m) or { kind: 'list', thicknesses } (m). A range and a list
 * are turned into thicknesses here; the families need the thickness-series data and are resolved
 * with the case (sizing-series.ts).
 */
import { isObject, rejectUnknownKeys, requireArray, requireNumberIn, requireObject } from '../../base/field-checks.js';
import { InputError } from '../../base/input-error.js';
import { enteredPart } from '../../base/quantity-sentence.js';
import { shownValue } from '../../base/shown-value.js';
import { requireNamingText } from './installed-cost-table-checks.js';
import { validateSizingEconomics } from './sizing-economics-checks.js';
import type { SizingCriteria, SizingOptions, ThicknessSeriesChoice } from './sizing-model.js';
import { MAX_FAMILY_NAME_LENGTH, MAX_SERIES_THICKNESSES, SIZING_RANGES as R } from './sizing-ranges.js';

export type SizedKind = 'pipe' | 'flat';

const S = 'sizing';
/** Every criterion a sizing block may switch on, in the order the table and the report list them. */
export const SIZING_CRITERIA = ['maxSurfaceTemperature', 'noCondensation', 'maxHeatLoss', 'maxTemperatureDrop', 'freezeProtection', 'economic'] as const;
const PIPE_ONLY: readonly string[] = ['maxTemperatureDrop', 'freezeProtection'];

/** The sizing block checked against a case of `kind` with `layerCount` insulation layers. */
export function parseSizingOptions(value: unknown, kind: SizedKind, layerCount: number): SizingOptions {
  if (!isObject(value)) throw new InputError(S, `${S} must be an object: layer, series and criteria (and economics for costs).`);
  rejectUnknownKeys(value, ['layer', 'series', 'criteria', 'economics'], S);
  const layer = value['layer'];
  if (typeof layer !== 'number' || !Number.isInteger(layer) || layer < 0 || layer >= layerCount) {
    throw new InputError(`${S}.layer`, `${S}.layer must be a whole number from 0 to ${layerCount - 1}, the index of an insulation layer in layers (got ${shownValue(layer)}).`);
  }
  const series = parseSeries(value['series'], `${S}.series`);
  const criteria = parseCriteria(value['criteria'], `${S}.criteria`, kind);
  const economics = value['economics'] === undefined ? undefined : validateSizingEconomics(value['economics'], `${S}.economics`);
  if (criteria.economic !== undefined && economics === undefined) {
    throw new InputError(`${S}.economics`, `${S}.criteria.economic needs ${S}.economics: the energy price, rates, years, emission factor and installed-cost table.`);
  }
  return { layer, series, criteria, ...(economics !== undefined ? { economics } : {}) };
}

function parseSeries(value: unknown, field: string): ThicknessSeriesChoice {
  const series = requireObject(value, field);
  switch (series['kind']) {
    case 'material':
      rejectUnknownKeys(series, ['kind'], field);
      return { kind: 'material' };
    case 'named':
      rejectUnknownKeys(series, ['kind', 'family'], field);
      return { kind: 'named', family: requireNamingText(`${field}.family`, series['family'], MAX_FAMILY_NAME_LENGTH) };
    case 'range':
      rejectUnknownKeys(series, ['kind', 'from', 'to', 'step'], field);
      return parseRange(series, field);
    case 'list': {
      rejectUnknownKeys(series, ['kind', 'thicknesses'], field);
      const list = requireArray(series['thicknesses'], `${field}.thicknesses`, 1, MAX_SERIES_THICKNESSES);
      const thicknesses = list.map((t, i) => requireNumberIn(`${field}.thicknesses[${i}]`, t, R.thickness));
      return { kind: 'list', thicknesses: [...new Set(thicknesses)].sort((a, b) => a - b) };
    }
    default:
      throw new InputError(`${field}.kind`, `${field}.kind must be one of 'material', 'named', 'range', 'list' (got ${shownValue(series['kind'])}).`);
  }
}

function parseRange(series: Record<string, unknown>, field: string): ThicknessSeriesChoice {
  const from = requireNumberIn(`${field}.from`, series['from'], R.thickness);
  const to = requireNumberIn(`${field}.to`, series['to'], R.thickness);
  const step = requireNumberIn(`${field}.step`, series['step'], R.step);
  const metres = (v: number) => enteredPart(v, 'thickness', `${v} m`);
  if (!(to >= from)) throw new InputError(`${field}.to`, [`${field}.to must be at least ${field}.from (`, metres(from), ') (got ', metres(to), ').']);
  const count = rangeCount(from, to, step);
  if (count > MAX_SERIES_THICKNESSES) {
    throw new InputError(`${field}.step`, [`${field}.step gives ${count} thicknesses from `, metres(from), ' to ', metres(to), `; at most ${MAX_SERIES_THICKNESSES} are tried: take a larger step or a shorter range.`]);
  }
  return { kind: 'range', from, to, step };
}

/** Thicknesses from, from + step, … up to `to`; `to` within a millionth of a step counts as reached (round-off of decimal steps). */
function rangeCount(from: number, to: number, step: number): number {
  return Math.floor((to - from) / step + 1e-6) + 1;
}

/** The thicknesses (m, rising) of a range series. */
export function rangeThicknesses(from: number, to: number, step: number): number[] {
  const count = rangeCount(from, to, step);
  // Each from k·step, not by repeated addition, so round-off does not build up along the range; then
  // to the nanometre, so 0.02 + 4 × 0.01 is the 0.06 m a table or a cost list names.
  return Array.from({ length: count }, (_, k) => Math.min(Math.round((from + k * step) * 1e9) / 1e9, to));
}

function parseCriteria(value: unknown, field: string, kind: SizedKind): SizingCriteria {
  const criteria = requireObject(value, field);
  rejectUnknownKeys(criteria, SIZING_CRITERIA, field);
  const on = SIZING_CRITERIA.filter((c) => criteria[c] !== undefined);
  if (on.length === 0) throw new InputError(field, `${field} must switch on at least one of ${SIZING_CRITERIA.join(', ')}.`);
  const pipeOnly = on.find((c) => PIPE_ONLY.includes(c));
  if (kind === 'flat' && pipeOnly !== undefined) {
    throw new InputError(`${field}.${pipeOnly}`, `${field}.${pipeOnly} applies to a pipe run only; a flat case cannot use it.`);
  }
  const out: { -readonly [K in keyof SizingCriteria]: SizingCriteria[K] } = {};
  const at = (name: string) => `${field}.${name}`;
  const number = (o: Record<string, unknown>, name: string, key: string, range: (typeof R)[keyof typeof R]) => requireNumberIn(`${at(name)}.${key}`, o[key], range);
  for (const name of on) {
    const o = requireObject(criteria[name], at(name));
    switch (name) {
      case 'maxSurfaceTemperature':
        rejectUnknownKeys(o, ['limit'], at(name));
        out.maxSurfaceTemperature = o['limit'] === undefined ? {} : { limit: number(o, name, 'limit', R.surfaceTemperatureLimit) };
        break;
      case 'noCondensation':
        rejectUnknownKeys(o, ['margin'], at(name));
        out.noCondensation = { margin: number(o, name, 'margin', R.condensationMargin) };
        break;
      case 'maxHeatLoss':
        rejectUnknownKeys(o, ['limit'], at(name));
        out.maxHeatLoss = { limit: number(o, name, 'limit', kind === 'pipe' ? R.heatLossPerMetre : R.heatLossPerSquareMetre) };
        break;
      case 'maxTemperatureDrop':
        rejectUnknownKeys(o, ['massFlow', 'specificHeat', 'limit'], at(name));
        out.maxTemperatureDrop = {
          massFlow: number(o, name, 'massFlow', R.massFlow),
          specificHeat: number(o, name, 'specificHeat', R.specificHeat),
          limit: number(o, name, 'limit', R.temperatureDropLimit),
        };
        break;
      case 'freezeProtection':
        out.freezeProtection = parseFreeze(o, at(name));
        break;
      case 'economic':
        rejectUnknownKeys(o, [], at(name));
        out.economic = {};
        break;
    }
  }
  return out;
}

function parseFreeze(o: Record<string, unknown>, field: string): NonNullable<SizingCriteria['freezeProtection']> {
  rejectUnknownKeys(o, ['initialTemperature', 'airTemperature', 'windSpeed', 'minTimeToZero', 'fraction', 'minTimeToFraction'], field);
  const n = (key: string, range: (typeof R)[keyof typeof R]) => requireNumberIn(`${field}.${key}`, o[key], range);
  const base = {
    initialTemperature: n('initialTemperature', R.freezeInitialTemperature),
    airTemperature: n('airTemperature', R.freezeAirTemperature),
    windSpeed: n('windSpeed', R.freezeWindSpeed),
    minTimeToZero: n('minTimeToZero', R.minTimeToZero),
  };
  const hasFraction = o['fraction'] !== undefined;
  if (hasFraction !== (o['minTimeToFraction'] !== undefined)) {
    const missing = hasFraction ? 'minTimeToFraction' : 'fraction';
    throw new InputError(`${field}.${missing}`, `${field}.fraction and ${field}.minTimeToFraction go together: give both (the part of the water and the time before it may have frozen) or neither.`);
  }
  if (!hasFraction) return base;
  return { ...base, fraction: n('fraction', R.freezeFraction), minTimeToFraction: n('minTimeToFraction', R.minTimeToFraction) };
}
