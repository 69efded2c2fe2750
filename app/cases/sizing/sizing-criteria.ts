/**
 * Each sizing criterion at one thickness: met or not, the margin in the criterion's own quantity
 * (positive or zero = met: K for temperatures, W/m or W/m² for heat, s for freeze times), and one
 * sentence saying what was required and what the thickness gives, written through QuantityText so
 * a US project reads °F, Btu and inches. The economic criterion needs the whole series (the least
 * lifecycle cost), so it is judged separately (economicOutcome).
 */
import type { QuantityText } from '../../base/quantity-text.js';
import { DEFAULT_TOUCH_LIMIT } from '../../checks/personnel-protection.js';
import type { CriterionOutcome, SizingCriteria } from './sizing-model.js';
import { heatQuantity, type SizingBasis } from './sizing-words.js';

/** What one thickness gives, as the criteria read it. */
export interface ThicknessFigures {
  /** W/m or W/m², positive = lost. */
  readonly heatLoss: number;
  /** °C */
  readonly surfaceTemperature: number;
  /** °C, of the ambient air. */
  readonly dewPoint: number;
  /** K, inlet minus outlet; null when not computed. */
  readonly temperatureDrop: number | null;
  /** s; Infinity when never reached in the simulated time; null when not computed. */
  readonly timeToZero: number | null;
  readonly timeToFraction: number | null;
  /** s, until ice first forms at the pipe wall (shown beside the time to 0 °C, not judged); absent when not computed. */
  readonly timeToFirstIce?: number | null;
}

export interface CriteriaContext {
  readonly basis: SizingBasis;
  /** °C, the case's touch limit (the surface criterion's default). */
  readonly touchLimit: number | undefined;
  /** m, the run (pipe), for the temperature-change sentence. */
  readonly runLength: number | null;
  readonly text: QuantityText;
}

/** Every criterion switched on but the economic one, in the order of `criteria`'s keys. */
export function physicalOutcomes(criteria: SizingCriteria, f: ThicknessFigures, context: CriteriaContext): CriterionOutcome[] {
  const { text } = context;
  const t = (v: number) => text.figure(v, 'temperature');
  const k = (v: number) => text.figure(Math.abs(v), 'temperatureDifference');
  const outcomes: CriterionOutcome[] = [];
  const push = (criterion: CriterionOutcome['criterion'], margin: number, reason: string) => outcomes.push({ criterion, met: margin >= 0, margin, reason });

  if (criteria.maxSurfaceTemperature) {
    const limit = criteria.maxSurfaceTemperature.limit ?? context.touchLimit ?? DEFAULT_TOUCH_LIMIT;
    const margin = limit - f.surfaceTemperature;
    const limitText = text.given(limit, 'temperature');
    push('maxSurfaceTemperature', margin, margin >= 0
      ? `The surface is at ${t(f.surfaceTemperature)}, ${k(margin)} within the limit of ${limitText}.`
      : `The surface is at ${t(f.surfaceTemperature)}, ${k(margin)} above the limit of ${limitText}.`);
  }
  if (criteria.noCondensation) {
    const required = criteria.noCondensation.margin;
    const above = f.surfaceTemperature - f.dewPoint;
    const margin = above - required;
    const position = above >= 0 ? `${k(above)} above` : `${k(above)} below`;
    const requiredText = text.given(required, 'temperatureDifference');
    push('noCondensation', margin, margin >= 0
      ? `The surface, at ${t(f.surfaceTemperature)}, is ${position} the dew point of the air (${t(f.dewPoint)}); at least ${requiredText} is required.`
      : `The surface, at ${t(f.surfaceTemperature)}, is ${position} the dew point of the air (${t(f.dewPoint)}), ${k(margin)} short of the ${requiredText} required.`);
  }
  if (criteria.maxHeatLoss) {
    const quantity = heatQuantity(context.basis);
    const limit = criteria.maxHeatLoss.limit;
    const margin = limit - Math.abs(f.heatLoss);
    const word = f.heatLoss >= 0 ? 'heat loss' : 'heat gain';
    const limitText = text.given(limit, quantity);
    push('maxHeatLoss', margin, margin >= 0
      ? `The ${word} is ${text.figure(Math.abs(f.heatLoss), quantity)}, within the limit of ${limitText}.`
      : `The ${word} is ${text.figure(Math.abs(f.heatLoss), quantity)}, ${text.figure(-margin, quantity)} above the limit of ${limitText}.`);
  }
  if (criteria.maxTemperatureDrop && f.temperatureDrop !== null) {
    const limit = criteria.maxTemperatureDrop.limit;
    const margin = limit - Math.abs(f.temperatureDrop);
    const change = f.temperatureDrop >= 0 ? 'cools' : 'warms';
    const run = context.runLength === null ? '' : ` over the ${text.figure(context.runLength, 'length')} run`;
    const limitText = text.given(limit, 'fluidTemperatureChange');
    const dk = (v: number) => text.figure(Math.abs(v), 'fluidTemperatureChange');
    push('maxTemperatureDrop', margin, margin >= 0
      ? `The fluid ${change} by ${dk(f.temperatureDrop)}${run}, within the ${limitText} allowed.`
      : `The fluid ${change} by ${dk(f.temperatureDrop)}${run}, ${dk(margin)} more than the ${limitText} allowed.`);
  }
  if (criteria.freezeProtection && f.timeToZero !== null) {
    const c = criteria.freezeProtection;
    const h = (s: number) => text.figure(s, 'timeHours');
    const reached = (s: number, what: string) => (Number.isFinite(s) ? `${what} after ${h(s)}` : `${what} not within the simulated time`);
    const margins = [f.timeToZero - c.minTimeToZero];
    const parts = [`${reached(f.timeToZero, `the water at the centre reaches ${text.given(0, 'temperature')}`)} (at least ${h(c.minTimeToZero)} required)`];
    if (c.fraction !== undefined && c.minTimeToFraction !== undefined && f.timeToFraction !== null) {
      margins.push(f.timeToFraction - c.minTimeToFraction);
      parts.push(`${reached(f.timeToFraction, `${text.figure(c.fraction, 'fraction')} of the water has frozen`)} (at least ${h(c.minTimeToFraction)} required)`);
    }
    const margin = Math.min(...margins);
    const sentence = parts.join(', and ');
    push('freezeProtection', margin, `${sentence.charAt(0).toUpperCase()}${sentence.slice(1)}.`);
  }
  return outcomes;
}

/**
 * The economic criterion at a row: met at the row of least lifecycle cost, with the margin the
 * least cost less the row's (0 there, negative elsewhere) in the currency unit.
 */
export function economicOutcome(lifecycleCost: number, least: { readonly cost: number; readonly thickness: number }, text: QuantityText, currency: string): CriterionOutcome {
  const margin = least.cost - lifecycleCost;
  const met = lifecycleCost === least.cost;
  const money = (v: number) => `${text.number(v, 'money')} ${currency}`;
  return {
    criterion: 'economic',
    met,
    margin: met ? 0 : margin,
    reason: met
      ? `The least lifecycle cost of the series, ${money(lifecycleCost)}.`
      : `Its lifecycle cost, ${money(lifecycleCost)}, is ${money(-margin)} more than the least, at ${text.figure(least.thickness, 'thickness')}.`,
  };
}
