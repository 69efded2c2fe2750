/**
 * Interstitial condensation at one design condition, by the Glaser-type method of ISO 13788
 * (reference notes §4): from a solved state (temperatures at every interface from the steady
 * engine solution with the ISO 6946 surface resistances, and their saturation pressures), the
 * tightest vapour line under saturation and the condensation rate g_c = g_in − g_out where it
 * touches. A function of the solved state only: it never solves the wall itself.
 */
import { SI_TEXT, type QuantityText } from '../base/quantity-text.js';
import type { AirCondition } from '../physics/air-condition.js';
import { saturationPressure } from '../physics/index.js';
import type { CheckResult } from './check-result.js';
import { constructVapourProfile, unlimitedVapourProfile, type GlaserProfile } from './glaser-construction.js';
import { insideVapourPressure, describeInsideHumidity, type InsideHumiditySource } from './mould-humidity-classes.js';
import { MOISTURE_CAUTION } from './mould-moisture-caution.js';
import { VAPOUR_PERMEABILITY_OF_AIR, type VapourLayer, type VapourStackAtCondition } from './interstitial-vapour-stack.js';

export interface InterstitialOptions {
  /** δ₀, kg/(m·s·Pa); default 2e-10 (ISO 13788, from memory). */
  readonly vapourPermeabilityOfAir?: number;
}

export interface InterstitialPoint {
  readonly name: string;
  /** Cumulative s_d from the inside surface, m; null beyond a vapour-tight layer. */
  readonly sdFromInside: number | null;
  /** °C */
  readonly temperature: number;
  /** Pa */
  readonly saturationPressure: number;
  /** Pa; null inside a part sealed on both sides by vapour-tight layers. */
  readonly vapourPressure: number | null;
  /** kg/(m²·s): > 0 condensation, < 0 evaporation, 0 elsewhere. */
  readonly condensationRate: number;
}

export interface InterstitialState {
  readonly insideVapourPressure: number;
  readonly outsideVapourPressure: number;
  readonly layers: readonly (VapourLayer & { readonly vapourTight: boolean; readonly sdShown: number | null; readonly flux: number })[];
  readonly points: readonly InterstitialPoint[];
  /** Sum of positive g_c, kg/(m²·s). */
  readonly totalCondensationRate: number;
  /** Smallest p_sat − p of the unlimited vapour line over the interior points, Pa (negative: the line crosses saturation). */
  readonly saturationReserve: number | null;
  readonly surfaceCondensation: GlaserProfile['surfaceCondensation'];
}

/** The Glaser state of the wall at one solved condition (with wet interfaces held at saturation). */
export function interstitialStateAt(
  v: VapourStackAtCondition,
  inside: AirCondition,
  outside: AirCondition,
  humidity: InsideHumiditySource | undefined,
  options: InterstitialOptions = {},
  wet?: readonly boolean[],
): InterstitialState {
  const pi = insideVapourPressure(humidity, inside, outside);
  const pe = outside.relativeHumidity * saturationPressure(outside.temperature);
  const layerSd = v.layers.map((l) => l.sd);
  const profile = constructVapourProfile({
    layerSd,
    saturation: v.saturation,
    insidePressure: pi,
    outsidePressure: pe,
    vapourPermeabilityOfAir: options.vapourPermeabilityOfAir ?? VAPOUR_PERMEABILITY_OF_AIR,
    ...(wet ? { wet } : {}),
  });
  const unlimited = unlimitedVapourProfile(layerSd, pi, pe);
  let reserve: number | null = null;
  for (let k = 1; k < layerSd.length; k++) {
    const u = unlimited[k];
    if (u === null || u === undefined) continue;
    const r = v.saturation[k]! - u;
    if (reserve === null || r < reserve) reserve = r;
  }
  let cumulative: number | null = 0;
  const points: InterstitialPoint[] = v.temperatures.map((t, k) => {
    if (k > 0 && cumulative !== null) cumulative = Number.isFinite(layerSd[k - 1]!) ? cumulative + layerSd[k - 1]! : null;
    return {
      name: v.pointNames[k]!,
      sdFromInside: cumulative,
      temperature: t,
      saturationPressure: v.saturation[k]!,
      vapourPressure: profile.pressure[k]!,
      condensationRate: profile.condensationRate[k]!,
    };
  });
  return {
    insideVapourPressure: pi,
    outsideVapourPressure: pe,
    // Field by field: an object spread here cost more than the rest of the check.
    layers: v.layers.map((l, j) => ({
      index: l.index,
      name: l.name,
      sd: l.sd,
      vapourTight: !Number.isFinite(l.sd),
      sdShown: Number.isFinite(l.sd) ? l.sd : null,
      flux: profile.layerFlux[j]!,
    })),
    points,
    totalCondensationRate: profile.condensationRate.reduce((s, g) => s + Math.max(0, g), 0),
    saturationReserve: reserve,
    surfaceCondensation: profile.surfaceCondensation,
  };
}

export interface InterstitialDesignResult extends InterstitialState {
  readonly check: CheckResult;
}

/** The check at the wall's own inside and outside conditions, from the state solved at them. */
export function checkInterstitialAtDesignCondition(
  stack: VapourStackAtCondition,
  inside: AirCondition,
  outside: AirCondition,
  humidity: InsideHumiditySource | undefined,
  options: InterstitialOptions = {},
  text: QuantityText = SI_TEXT,
): InterstitialDesignResult {
  const state = interstitialStateAt(stack, inside, outside, humidity, options);
  const condensing = state.points.filter((p) => p.condensationRate > 0);
  const perDay = (g: number) => text.keepingSi(`${(g * 86_400 * 1000).toFixed(2)} g/(m²·day)`, g, 'condensationRate');
  const pressure = (p: number) => text.figure(p, 'vapourPressure');
  const source = describeInsideHumidity(humidity);
  const check: CheckResult = {
    check: 'interstitial-condensation',
    title: 'Interstitial condensation (design condition)',
    verdict: condensing.length === 0 ? 'pass' : 'warning',
    ...(state.saturationReserve !== null ? { margin: { value: state.saturationReserve, unit: 'Pa' } } : {}),
    reason:
      condensing.length === 0
        ? `No interstitial condensation at the design condition (p_i ${pressure(state.insideVapourPressure)} from ${source}, p_e ${pressure(state.outsideVapourPressure)}): the vapour pressure stays below saturation at every interface.`
        : `Condensation at the design condition at the ${condensing.map((p) => `${p.name} (${perDay(p.condensationRate)})`).join(', ')}; run the monthly procedure to see whether it dries out within the year.`,
    caution: MOISTURE_CAUTION,
  };
  // Field by field: a spread followed by a field is a slow path in V8 (app/cases/with-fields.ts).
  return {
    insideVapourPressure: state.insideVapourPressure,
    outsideVapourPressure: state.outsideVapourPressure,
    layers: state.layers,
    points: state.points,
    totalCondensationRate: state.totalCondensationRate,
    saturationReserve: state.saturationReserve,
    surfaceCondensation: state.surfaceCondensation,
    check,
  };
}
