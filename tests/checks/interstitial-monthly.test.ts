/**
 * The monthly interstitial-condensation procedure (ISO 13788, from memory: start month, accumulation,
 * evaporation limited to what is stored, wet interfaces held at saturation) on a small invented
 * climate, with the totals checked by hand from the Glaser formulas.
 */
import { describe, expect, it } from 'vitest';
import type { MonthlyClimate } from '../../app/cases/wall/wall.js';
import { DEMO_CLIMATES } from '../../app/cases/wall/wall.js';
import { checkInterstitialMonthly } from './wall-moisture.js';
import { layer, material, wall } from '../assemblies/wall-fixtures.js';
import { pSat } from './iso13788-saturation.js';

const DELTA0 = 2e-10; // ISO 13788, from memory
const NAMES = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];
const DAYS = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
const COLD = { inside: { temperature: 20, relativeHumidity: 0.6 }, outside: { temperature: -5, relativeHumidity: 0.8 } };
const MILD = { inside: { temperature: 20, relativeHumidity: 0.5 }, outside: { temperature: 15, relativeHumidity: 0.7 } };
// Invented test climate: three cold months, nine mild ones.
const climate: MonthlyClimate = {
  name: 'test-three-cold-months',
  label: 'invented test climate',
  months: NAMES.map((month, i) => ({ month, days: DAYS[i]!, ...(i < 3 ? COLD : MILD) })),
};
const input = wall([
  layer(material('plasterboard', 0.25, 10), 0.0125),
  layer(material('mineral wool', 0.04, 1), 0.1),
  layer(material('plywood', 0.13, 200), 0.012),
]);

describe('monthly procedure, hand-checked totals', () => {
  // Temperatures at the wool/plywood interface by the series formula (ISO 6946 R_si 0.13, R_se 0.04).
  const R = [0.13, 0.0125 / 0.25, 0.1 / 0.04, 0.012 / 0.13, 0.04];
  const RT = R.reduce((a, b) => a + b, 0);
  const share = (R[0]! + R[1]! + R[2]!) / RT;
  const sdIn = 10 * 0.0125 + 1 * 0.1;
  const sdOut = 200 * 0.012;
  const rate = (c: typeof COLD): number => {
    const theta2 = c.inside.temperature - share * (c.inside.temperature - c.outside.temperature);
    const ps = pSat(theta2);
    const pi = c.inside.relativeHumidity * pSat(c.inside.temperature);
    const pe = c.outside.relativeHumidity * pSat(c.outside.temperature);
    return (DELTA0 * (pi - ps)) / sdIn - (DELTA0 * (ps - pe)) / sdOut;
  };
  const gCold = rate(COLD); // condensation, > 0
  const gMild = rate(MILD); // evaporation from the wet interface, < 0
  const expected: number[] = [];
  let m = 0;
  for (let i = 0; i < 12; i++) {
    m = Math.max(0, m + (i < 3 ? gCold : gMild) * DAYS[i]! * 86_400);
    expected.push(m);
  }

  it('the hand numbers condense in winter and evaporate in the mild months', () => {
    expect(gCold).toBeGreaterThan(0);
    expect(gMild).toBeLessThan(0);
    expect(expected[11]).toBe(0);
  });

  it('starts in January (first condensing month after a dry one), accumulates and dries out as computed by hand', () => {
    const r = checkInterstitialMonthly(input, climate);
    expect(r.startMonthIndex).toBe(0);
    expect(r.condensesEveryMonth).toBe(false);
    r.months.forEach((month, i) => {
      expect(month.month).toBe(NAMES[i]);
      expect(Math.abs(month.totalAccumulated - expected[i]!)).toBeLessThanOrEqual(1e-9 * Math.max(...expected));
      expect(month.accumulated[1]).toBe(0);
    });
    expect(Math.abs(r.maxAccumulated - expected[2]!)).toBeLessThan(1e-12);
    expect(r.maxAccumulatedMonth).toBe('Mar');
    expect(r.maxAccumulatedPoint).toBe('interface between mineral wool and plywood');
    expect(r.driesOut).toBe(true);
    expect(r.remainingAtEnd).toBe(0);
    expect(r.check.verdict).toBe('warning');
  });

  it('the start month follows the first condensing month after a dry one, wherever it falls in the year', () => {
    const shifted: MonthlyClimate = { ...climate, months: [...climate.months.slice(5), ...climate.months.slice(0, 5)] };
    const r = checkInterstitialMonthly(input, shifted);
    expect(shifted.months[r.startMonthIndex!]!.month).toBe('Jan');
    expect(r.months.map((mo) => mo.month)).toEqual(NAMES);
    expect(Math.abs(r.maxAccumulated - expected[2]!)).toBeLessThan(1e-12);
  });

  it('evaporation is limited to what is stored: never a negative amount', () => {
    const r = checkInterstitialMonthly(input, climate);
    for (const month of r.months) for (const a of month.accumulated) expect(a).toBeGreaterThanOrEqual(0);
    // April evaporates less than its full potential only if the store runs out; here it does not.
    expect(r.months[3]!.change[2]).toBeCloseTo(gMild * 30 * 86_400, 12);
  });

  it('a wall that never condenses passes with no start month', () => {
    const r = checkInterstitialMonthly(input, { ...climate, months: climate.months.map((mo) => ({ ...mo, ...MILD })) });
    expect(r.startMonthIndex).toBeNull();
    expect(r.maxAccumulated).toBe(0);
    expect(r.check.verdict).toBe('pass');
  });

  it('too much winter condensation: does not dry out, fails', () => {
    const wet: MonthlyClimate = { ...climate, months: climate.months.map((mo, i) => (i < 9 ? { ...mo, ...COLD } : mo)) };
    const r = checkInterstitialMonthly(input, wet);
    expect(r.driesOut).toBe(false);
    expect(r.remainingAtEnd).toBeGreaterThan(0);
    expect(r.check.verdict).toBe('fail');
    expect(r.check.caution).toMatch(/local building codes/);
  });

  it('the shipped climates are labelled DEMO and run through the procedure', () => {
    for (const c of DEMO_CLIMATES) {
      expect(c.label).toMatch(/^DEMO/);
      const r = checkInterstitialMonthly(input, c);
      expect(r.months).toHaveLength(12);
      expect(r.climateLabel).toMatch(/not for design/);
    }
  });
});
