/**
 * Mould and surface condensation on the inside surface of a wall or roof (ISO 13788 method,
 * reference notes §4): the element's temperature factor f_Rsi, from the inside surface
 * temperature the wall case solved with R_si = 0.25 m²·K/W (from memory), against the critical
 * factor f_Rsi,min from the surface humidity limit (0.8 mould, 1.0 condensation). Monthly: the
 * design month is the one with the largest f_Rsi,min over the climate; the element passes if its
 * f_Rsi exceeds that value. In two steps, so that the wall is solved only where it matters:
 * `surfaceHumidityConditions` and `mouldDesignIndices` need no solve; the wall case then solves
 * the design condition(s) and `assessMould` judges them.
 */
import { SI_TEXT, type QuantityText } from '../base/quantity-text.js';
import type { AirCondition } from '../physics/air-condition.js';
import type { CheckResult } from './check-result.js';
import { describeInsideHumidity, insideVapourPressure, type InsideHumiditySource } from './mould-humidity-classes.js';
import { MOISTURE_CAUTION } from './mould-moisture-caution.js';
import {
  CONDENSATION_SURFACE_HUMIDITY_LIMIT,
  minimumTemperatureFactor,
  MOULD_SURFACE_HUMIDITY_LIMIT,
  temperatureFactor,
} from './mould-temperature-factor.js';

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

function conditionOf(label: string, inside: AirCondition, outside: AirCondition, humidity: InsideHumiditySource | undefined): SurfaceHumidityCondition {
  const pi = insideVapourPressure(humidity, inside, outside);
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

function verdictFor(
  check: 'mould' | 'surface-condensation-inside',
  limit: number,
  factor: number | null,
  condition: SurfaceHumidityCondition | null,
  minimum: number | null,
  source: string,
  text: QuantityText,
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
  const climate = (t: number) => text.keepingSi(`${t} °C`, t, 'temperature');
  const where = `${conditionPhrase(condition.label)} (θ_i ${climate(condition.inside.temperature)}, θ_e ${climate(condition.outside.temperature)}, p_i ${text.figure(condition.insideVapourPressure, 'vapourPressure')} from ${source})`;
  const pass = factor > minimum;
  const impossible = minimum >= 1 ? ' The critical factor is 1 or more: no wall can avoid it at this inside humidity; reduce the humidity (ventilation).' : '';
  return {
    check,
    title,
    verdict: pass ? 'pass' : 'fail',
    margin: { value: margin, unit: 'temperature factor (dimensionless)' },
    reason: pass
      ? `f_Rsi = ${factor.toFixed(3)} exceeds the critical f_Rsi,min = ${minimum.toFixed(3)} for ${criterion} ${where}.`
      : `f_Rsi = ${factor.toFixed(3)} does not exceed the critical f_Rsi,min = ${minimum.toFixed(3)} for ${criterion} ${where}: risk expected.${impossible}`,
    caution: MOISTURE_CAUTION,
  };
}

/** When a condition holds, as a sentence says it: "in January" (a month), or "at the design condition". */
export function conditionPhrase(label: string): string {
  return label === 'design condition' ? 'at the design condition' : `in ${label}`;
}

/** The conditions to judge (one design condition, or each month), with their critical factors; no solve needed. */
export function surfaceHumidityConditions(
  pairs: readonly { readonly label: string; readonly inside: AirCondition; readonly outside: AirCondition }[],
  humidity: InsideHumiditySource | undefined,
): SurfaceHumidityCondition[] {
  return pairs.map((p) => conditionOf(p.label, p.inside, p.outside, humidity));
}

/** The design condition of each criterion: the one with the largest critical factor (null if none applies). */
export function mouldDesignIndices(conditions: readonly SurfaceHumidityCondition[]): { readonly mould: number | null; readonly condensation: number | null } {
  return { mould: designIndex(conditions, (c) => c.minimumFactorMould), condensation: designIndex(conditions, (c) => c.minimumFactorCondensation) };
}

/**
 * The verdicts, from the inside surface temperature solved (with `insideSurfaceResistance`) at
 * each criterion's design condition; null where that criterion has none.
 */
export function assessMould(
  conditions: readonly SurfaceHumidityCondition[],
  design: { readonly mould: number | null; readonly condensation: number | null },
  solvedSurface: { readonly mould: number | null; readonly condensation: number | null },
  insideSurfaceResistance: number,
  humidity: InsideHumiditySource | undefined,
  text: QuantityText = SI_TEXT,
): MouldAssessment {
  const source = describeInsideHumidity(humidity);
  const factorAt = (index: number | null, surface: number | null) => {
    if (index === null || surface === null) return null;
    const c = conditions[index]!;
    return { factor: temperatureFactor(surface, c.inside.temperature, c.outside.temperature), surface };
  };
  const atMould = factorAt(design.mould, solvedSurface.mould);
  const criterion = (check: 'mould' | 'surface-condensation-inside', limit: number, index: number | null, at: typeof atMould, minimum: (c: SurfaceHumidityCondition) => number | null) =>
    verdictFor(check, limit, at?.factor ?? null, index === null ? null : conditions[index]!, index === null ? null : minimum(conditions[index]!), source, text);
  return {
    temperatureFactor: atMould?.factor ?? null,
    insideSurfaceResistance,
    insideSurfaceTemperature: atMould?.surface ?? null,
    conditions,
    designIndexMould: design.mould,
    designIndexCondensation: design.condensation,
    mould: criterion('mould', MOULD_SURFACE_HUMIDITY_LIMIT, design.mould, atMould, (c) => c.minimumFactorMould),
    surfaceCondensation: criterion(
      'surface-condensation-inside',
      CONDENSATION_SURFACE_HUMIDITY_LIMIT,
      design.condensation,
      factorAt(design.condensation, solvedSurface.condensation),
      (c) => c.minimumFactorCondensation,
    ),
  };
}
