/**
 * The monthly interstitial-condensation procedure of ISO 13788 (reference notes §4, from memory):
 * 1. Start month: with the element dry, find the first month with condensation that follows a month
 *    without; if every month condenses, start with the climate's first month (our rule, no source).
 * 2. Run twelve months from there. Each month's temperature profile is the state the wall case
 *    solved for that month (moisture does not change it); an interface that holds water is held
 *    at saturation (so the vapour profile is re-checked every month),
 *    g_c = g_in − g_out there may be negative (evaporation), and the stored amount
 *    M_a ← max(0, M_a + g_c·t_month): evaporation is limited to what is stored.
 * 3. Report the largest accumulated amount and whether everything has evaporated at the end of the
 *    twelve months (dries out within the year).
 */
import { SI_TEXT, type QuantityText } from '../base/quantity-text.js';
import type { ClimateMonth, MonthlyClimate } from './monthly-climate.js';
import { monthDuration } from './monthly-climate.js';
import type { CheckResult } from './check-result.js';
import { interstitialStateAt, type InterstitialOptions, type InterstitialState } from './interstitial-condensation.js';
import type { VapourStackAtCondition } from './interstitial-vapour-stack.js';
import type { InsideHumiditySource } from './mould-humidity-classes.js';
import { MOISTURE_CAUTION } from './mould-moisture-caution.js';

export interface InterstitialMonth {
  readonly month: string;
  readonly days: number;
  readonly state: InterstitialState;
  /** Water condensed (> 0) or evaporated (< 0) at each point this month, kg/m² (evaporation already limited to what was stored). */
  readonly change: readonly number[];
  /** Water stored at each point at the end of the month, kg/m². */
  readonly accumulated: readonly number[];
  /** Sum over the points, kg/m². */
  readonly totalAccumulated: number;
}

export interface InterstitialMonthlyResult {
  readonly climateName: string;
  readonly climateLabel: string;
  /** Index in the climate of the month the calculation starts with; null when no month condenses. */
  readonly startMonthIndex: number | null;
  /** True when every month condenses with the element dry (start month by our fallback rule). */
  readonly condensesEveryMonth: boolean;
  /** Twelve months in calculation order. */
  readonly months: readonly InterstitialMonth[];
  /** Largest total stored water over the year, kg/m², with the month and the point holding most at that time. */
  readonly maxAccumulated: number;
  readonly maxAccumulatedMonth: string | null;
  readonly maxAccumulatedPoint: string | null;
  /** Water left at the end of the twelve months, kg/m². */
  readonly remainingAtEnd: number;
  readonly driesOut: boolean;
  readonly check: CheckResult;
}

function condenses(state: InterstitialState): boolean {
  return state.points.some((p) => p.condensationRate > 0);
}

/** `stacks[i]` is the vapour stack solved at month i of the climate (same order). */
export function checkInterstitialMonthly(
  c: MonthlyClimate,
  stacks: readonly VapourStackAtCondition[],
  humidity: InsideHumiditySource | undefined,
  options: InterstitialOptions = {},
  text: QuantityText = SI_TEXT,
): InterstitialMonthlyResult {
  const months: readonly ClimateMonth[] = c.months;
  const dry = months.map((m, i) => interstitialStateAt(stacks[i]!, m.inside, m.outside, humidity, options));
  const wetMonths = dry.map(condenses);
  const anyCondensation = wetMonths.some(Boolean);
  const everyMonth = wetMonths.every(Boolean);
  let start: number | null = null;
  if (anyCondensation) {
    start = everyMonth ? 0 : wetMonths.findIndex((w, i) => w && !wetMonths[(i + 11) % 12]);
  }

  const pointCount = dry[0]!.points.length;
  let stored: number[] = new Array(pointCount).fill(0);
  const record: InterstitialMonth[] = [];
  let maxAccumulated = 0;
  let maxMonth: string | null = null;
  let maxPoint: string | null = null;
  for (let step = 0; step < 12; step++) {
    const i = ((start ?? 0) + step) % 12;
    const m = months[i]!;
    const wet = stored.map((w) => w > 0);
    const state = wet.some(Boolean) ? interstitialStateAt(stacks[i]!, m.inside, m.outside, humidity, options, wet) : dry[i]!;
    const t = monthDuration(m);
    const next = stored.map((w, k) => Math.max(0, w + state.points[k]!.condensationRate * t));
    const change = next.map((w, k) => w - stored[k]!);
    stored = next;
    const total = stored.reduce((s, w) => s + w, 0);
    if (total > maxAccumulated) {
      maxAccumulated = total;
      maxMonth = m.month;
      const k = stored.indexOf(Math.max(...stored));
      maxPoint = state.points[k]!.name;
    }
    record.push({ month: m.month, days: m.days, state, change, accumulated: stored, totalAccumulated: total });
  }
  const remainingAtEnd = stored.reduce((s, w) => s + w, 0);
  const driesOut = remainingAtEnd === 0;
  const reserves = dry.map((s) => s.saturationReserve).filter((r): r is number => r !== null);
  const reserve = reserves.length ? Math.min(...reserves) : null;
  const kg = (x: number) => text.keepingSi(`${x.toFixed(3)} kg/m²`, x, 'massPerArea');
  const verdict: CheckResult['verdict'] = !anyCondensation ? 'pass' : driesOut ? 'warning' : 'fail';
  const reason = !anyCondensation
    ? `No interstitial condensation in any month of the ${c.name} climate.`
    : driesOut
      ? `Condensation from ${months[start!]!.month}, at most ${kg(maxAccumulated)} (${maxMonth}, ${maxPoint}); it all evaporates within the year. Check the amount against the materials' tolerance and local limits.`
      : `Condensation from ${months[start!]!.month} accumulates to ${kg(maxAccumulated)} (${maxMonth}, ${maxPoint}) and ${kg(remainingAtEnd)} is still there after twelve months: the element does not dry out within the year.`;
  return {
    climateName: c.name,
    climateLabel: c.label,
    startMonthIndex: start,
    condensesEveryMonth: everyMonth,
    months: record,
    maxAccumulated,
    maxAccumulatedMonth: maxMonth,
    maxAccumulatedPoint: maxPoint,
    remainingAtEnd,
    driesOut,
    check: {
      check: 'interstitial-condensation-monthly',
      title: 'Interstitial condensation (monthly, over a year)',
      verdict,
      ...(reserve !== null ? { margin: { value: reserve, unit: 'Pa' } } : {}),
      reason,
      caution: MOISTURE_CAUTION,
    },
  };
}
