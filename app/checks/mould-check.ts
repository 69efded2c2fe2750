/**
 * Mould and surface condensation on the inside surface of a wall or roof (ISO 13788 method,
 * reference notes §4): the element's temperature factor f_Rsi, computed with the engine using
 * R_si = 0.25 m²·K/W (from memory), against the critical factor f_Rsi,min from the surface
 * humidity limit (0.8 mould, 1.0 condensation). Monthly: the design month is the one with the
 * largest f_Rsi,min over the climate; the element passes if its f_Rsi exceeds that value.
 */
import { solveWall } from '../cases/wall/wall-calculation.js';
import type { MonthlyClimate } from './monthly-climate.js';
import type { AirCondition, WallInput } from '../cases/wall/wall-input.js';
import { validateClimate, validateWallInput } from '../cases/wall/wall-validation.js';
import { InputError } from '../fe/errors.js';
import type { CheckResult } from './check-result.js';
import { describeInsideHumidity, insideVapourPressure } from './mould-humidity-classes.js';
import { MOISTURE_CAUTION } from './mould-moisture-caution.js';
import {
  CONDENSATION_SURFACE_HUMIDITY_LIMIT,
  minimumTemperatureFactor,
  MOULD_CHECK_INSIDE_SURFACE_RESISTANCE,
  MOULD_SURFACE_HUMIDITY_LIMIT,
  temperatureFactor,
} from './mould-temperature-factor.js';

export interface MouldCheckOptions {
  /** R_si for the check, m²·K/W; default 0.25 (opaque elements). */
  readonly insideSurfaceResistance?: number;
}

export interface SurfaceHumidityCondition {
  /** Month name, or 'design condition' for the single-condition check. */
  readonly label: string;
  readonly inside: AirCondition;
  readonly outside: AirCondition;
  /** p_i, Pa */
  readonly insideVapourPressure: number;
  /** f_Rsi,min for mould (0.8) and for surface condensation (1.0); null where θ_i ≤ θ_e (no heating need, factor undefined) or p_i = 0. */
  readonly minimumFactorMould: number | null;
  readonly minimumFactorCondensation: number | null;
}

export interface MouldAssessment {
  /** f_Rsi of the element (at the design condition of the mould criterion), dimensionless. */
  readonly temperatureFactor: number | null;
  readonly insideSurfaceResistance: number;
  /** θ_si with that R_si at the design condition, °C. */
  readonly insideSurfaceTemperature: number | null;
  readonly conditions: readonly SurfaceHumidityCondition[];
  /** Index into `conditions` of the design condition for mould and for condensation (largest f_Rsi,min); null if none applies. */
  readonly designIndexMould: number | null;
  readonly designIndexCondensation: number | null;
  readonly mould: CheckResult;
  readonly surfaceCondensation: CheckResult;
}

function conditionOf(label: string, inside: AirCondition, outside: AirCondition, input: WallInput): SurfaceHumidityCondition {
  const pi = insideVapourPressure(input.moisture?.insideHumidity, inside, outside);
  const applies = inside.temperature > outside.temperature && pi > 0;
  return {
    label,
    inside,
    outside,
    insideVapourPressure: pi,
    minimumFactorMould: applies ? minimumTemperatureFactor(pi, MOULD_SURFACE_HUMIDITY_LIMIT, inside.temperature, outside.temperature) : null,
    minimumFactorCondensation: applies
      ? minimumTemperatureFactor(pi, CONDENSATION_SURFACE_HUMIDITY_LIMIT, inside.temperature, outside.temperature)
      : null,
  };
}

function designIndex(conditions: readonly SurfaceHumidityCondition[], pick: (c: SurfaceHumidityCondition) => number | null): number | null {
  let best: number | null = null;
  conditions.forEach((c, i) => {
    const f = pick(c);
    if (f !== null && (best === null || f > pick(conditions[best]!)!)) best = i;
  });
  return best;
}

function elementFactor(input: WallInput, c: SurfaceHumidityCondition, rsi: number): { factor: number; surface: number } {
  const { steady } = solveWall(input, c.inside.temperature, c.outside.temperature, { insideSurfaceResistance: rsi });
  const surface = steady.faces.inner.temperature;
  return { factor: temperatureFactor(surface, c.inside.temperature, c.outside.temperature), surface };
}

function verdictFor(
  check: 'mould' | 'surface-condensation-inside',
  limit: number,
  factor: number | null,
  condition: SurfaceHumidityCondition | null,
  minimum: number | null,
  source: string,
): CheckResult {
  const title = check === 'mould' ? 'Mould risk on the inside surface' : 'Condensation on the inside surface';
  const criterion = `a surface relative humidity of at most ${limit * 100} % (${check === 'mould' ? 'mould' : 'surface condensation'})`;
  if (factor === null || condition === null || minimum === null) {
    return {
      check,
      title,
      verdict: 'not-applicable',
      reason: 'The inside is not warmer than the outside in any condition given (or the inside air is dry), so the temperature factor does not apply.',
      caution: MOISTURE_CAUTION,
    };
  }
  const margin = factor - minimum;
  const where = `${condition.label} (θ_i ${condition.inside.temperature} °C, θ_e ${condition.outside.temperature} °C, p_i ${condition.insideVapourPressure.toFixed(0)} Pa from ${source})`;
  const pass = factor > minimum;
  const impossible = minimum >= 1 ? ' The critical factor is 1 or more: no wall can avoid it at this inside humidity; reduce the humidity (ventilation).' : '';
  return {
    check,
    title,
    verdict: pass ? 'pass' : 'fail',
    margin: { value: margin, unit: 'temperature factor (dimensionless)' },
    reason: pass
      ? `f_Rsi = ${factor.toFixed(3)} exceeds the critical f_Rsi,min = ${minimum.toFixed(3)} for ${criterion} at ${where}.`
      : `f_Rsi = ${factor.toFixed(3)} does not exceed the critical f_Rsi,min = ${minimum.toFixed(3)} for ${criterion} at ${where}: risk expected.${impossible}`,
    caution: MOISTURE_CAUTION,
  };
}

function assess(input: WallInput, conditions: SurfaceHumidityCondition[], options: MouldCheckOptions): MouldAssessment {
  const rsi = options.insideSurfaceResistance ?? MOULD_CHECK_INSIDE_SURFACE_RESISTANCE;
  if (typeof rsi !== 'number' || !Number.isFinite(rsi) || !(rsi > 0) || rsi > 10) {
    throw new InputError('insideSurfaceResistance', `insideSurfaceResistance must be greater than 0 and at most 10 m²·K/W (got ${String(rsi)}).`);
  }
  const source = describeInsideHumidity(input.moisture?.insideHumidity);
  const iMould = designIndex(conditions, (c) => c.minimumFactorMould);
  const iCond = designIndex(conditions, (c) => c.minimumFactorCondensation);
  const atMould = iMould === null ? null : elementFactor(input, conditions[iMould]!, rsi);
  const atCond = iCond === null ? null : elementFactor(input, conditions[iCond]!, rsi);
  return {
    temperatureFactor: atMould?.factor ?? null,
    insideSurfaceResistance: rsi,
    insideSurfaceTemperature: atMould?.surface ?? null,
    conditions,
    designIndexMould: iMould,
    designIndexCondensation: iCond,
    mould: verdictFor(
      'mould',
      MOULD_SURFACE_HUMIDITY_LIMIT,
      atMould?.factor ?? null,
      iMould === null ? null : conditions[iMould]!,
      iMould === null ? null : conditions[iMould]!.minimumFactorMould,
      source,
    ),
    surfaceCondensation: verdictFor(
      'surface-condensation-inside',
      CONDENSATION_SURFACE_HUMIDITY_LIMIT,
      atCond?.factor ?? null,
      iCond === null ? null : conditions[iCond]!,
      iCond === null ? null : conditions[iCond]!.minimumFactorCondensation,
      source,
    ),
  };
}

/** The check at the wall's own inside and outside conditions (one design condition). */
export function checkMouldAtDesignCondition(input: WallInput, options: MouldCheckOptions = {}): MouldAssessment {
  validateWallInput(input);
  return assess(input, [conditionOf('design condition', input.inside, input.outside, input)], options);
}

/** The monthly check over a climate (default: the wall's moisture.climate). */
export function checkMouldMonthly(input: WallInput, climate?: MonthlyClimate, options: MouldCheckOptions = {}): MouldAssessment {
  validateWallInput(input);
  const c = climate ?? input.moisture?.climate;
  if (!c) throw new InputError('moisture.climate', 'moisture.climate is needed for the monthly check: give 12 months of inside and outside conditions or the name of a shipped climate.');
  validateClimate('moisture.climate', c);
  return assess(
    input,
    c.months.map((m) => conditionOf(m.month, m.inside, m.outside, input)),
    options,
  );
}
