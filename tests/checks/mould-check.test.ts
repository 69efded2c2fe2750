/**
 * Mould and surface condensation by the temperature-factor method of ISO 13788 (reference notes §4,
 * from memory): f_Rsi = (θ_si − θ_e)/(θ_i − θ_e) with R_si = 0.25 m²·K/W; f_Rsi,min from the surface
 * humidity limit 0.8 (mould) or 1.0 (condensation); internal humidity classes (from memory, medium
 * confidence). Hand calculations use the ISO 13788 Magnus form and its inverse (from memory).
 */
import { describe, expect, it } from 'vitest';
import type { MonthlyClimate } from '../../app/cases/wall/wall.js';
import { classVapourPressureExcess, insideVapourPressure, minimumTemperatureFactor } from '../../app/checks/interstitial.js';
import { checkMouldAtDesignCondition, checkMouldMonthly } from './wall-moisture.js';
import { InputError } from '../../app/fe/index.js';
import { layer, material, thrownBy, wall } from '../assemblies/wall-fixtures.js';
import { pSat } from './iso13788-saturation.js';

/** Inverse over water (p ≥ 610.5 Pa): θ = 237.3·x/(17.269 − x), x = ln(p/610.5). */
function dewWater(p: number): number {
  const x = Math.log(p / 610.5);
  return (237.3 * x) / (17.269 - x);
}

const concrete = material('concrete', 2.0, 100);
const insulation = material('insulation board', 0.04, 50);
const poor = wall([layer(concrete, 0.2)], { inside: { temperature: 20, relativeHumidity: 0.6 }, outside: { temperature: 0, relativeHumidity: 0.8 } });

describe('temperature factor and its critical value, by hand', () => {
  // R'_T = 0.25 + 0.2/2.0 + 0.04 = 0.39; f_Rsi = 1 − 0.25/0.39.
  const fRsi = 1 - 0.25 / 0.39;
  // p_i = 0.6·p_sat(20); θ_si,min from p_i/0.8; f_Rsi,min = (θ_si,min − 0)/(20 − 0).
  const pi = 0.6 * pSat(20);
  const fMinMould = dewWater(pi / 0.8) / 20;
  const fMinCond = dewWater(pi / 1.0) / 20;

  it('f_Rsi of a 200 mm concrete wall with R_si = 0.25 is 1 − 0.25/0.39', () => {
    const r = checkMouldAtDesignCondition(poor);
    expect(r.insideSurfaceResistance).toBe(0.25);
    expect(Math.abs(r.temperatureFactor! - fRsi)).toBeLessThan(1e-9);
  });

  it('f_Rsi,min for mould (80 %) and condensation (100 %) match the hand values', () => {
    expect(Math.abs(minimumTemperatureFactor(pi, 0.8, 20, 0) - fMinMould)).toBeLessThan(1e-9);
    const r = checkMouldAtDesignCondition(poor);
    expect(Math.abs(r.conditions[0]!.minimumFactorMould! - fMinMould)).toBeLessThan(1e-9);
    expect(Math.abs(r.conditions[0]!.minimumFactorCondensation! - fMinCond)).toBeLessThan(1e-9);
    // The bare concrete wall fails both.
    expect(r.mould.verdict).toBe('fail');
    expect(r.surfaceCondensation.verdict).toBe('fail');
    expect(Math.abs(r.mould.margin!.value - (fRsi - fMinMould))).toBeLessThan(1e-9);
    expect(r.mould.caution).toMatch(/licensed professional/);
  });

  it('the mould verdict flips exactly where f_Rsi crosses f_Rsi,min (insulation thickness d*)', () => {
    // f_Rsi = 1 − 0.25/R'_T = f_min ⇔ R'_T = 0.25/(1 − f_min) ⇔ d* = 0.04·(0.25/(1 − f_min) − 0.39).
    const dStar = 0.04 * (0.25 / (1 - fMinMould) - 0.39);
    const at = (d: number) => checkMouldAtDesignCondition({ ...poor, layers: [layer(insulation, d), layer(concrete, 0.2)] });
    const below = at(dStar * (1 - 1e-6));
    const above = at(dStar * (1 + 1e-6));
    expect(below.mould.verdict).toBe('fail');
    expect(above.mould.verdict).toBe('pass');
    expect(below.mould.margin!.value).toBeLessThan(0);
    expect(above.mould.margin!.value).toBeGreaterThan(0);
  });

  it('not applicable when the inside is not warmer than the outside', () => {
    const r = checkMouldAtDesignCondition({ ...poor, outside: { temperature: 25, relativeHumidity: 0.6 } });
    expect(r.mould.verdict).toBe('not-applicable');
    expect(r.temperatureFactor).toBeNull();
  });
});

describe('internal humidity classes (ISO 13788 annex, from memory, medium confidence)', () => {
  it('class excess is full at or below 0 °C, falls linearly to 0 at 20 °C', () => {
    expect(classVapourPressureExcess(3, -5)).toBe(810);
    expect(classVapourPressureExcess(3, 0)).toBe(810);
    expect(classVapourPressureExcess(3, 10)).toBeCloseTo(405, 12);
    expect(classVapourPressureExcess(3, 25)).toBe(0);
    expect(classVapourPressureExcess(5, -10)).toBe(1350);
  });

  it('p_i = p_e + Δp, with the 1.1 safety factor on Δp when chosen', () => {
    const outside = { temperature: 5, relativeHumidity: 0.9 };
    const inside = { temperature: 20, relativeHumidity: 0.5 };
    const pe = 0.9 * pSat(5);
    expect(insideVapourPressure({ kind: 'class', humidityClass: 2 }, inside, outside)).toBeCloseTo(pe + 540 * 0.75, 9);
    expect(insideVapourPressure({ kind: 'class', humidityClass: 2, safetyFactor: true }, inside, outside)).toBeCloseTo(pe + 1.1 * 540 * 0.75, 9);
    expect(insideVapourPressure({ kind: 'measured' }, inside, outside)).toBeCloseTo(0.5 * pSat(20), 9);
  });

  it('an unknown class is an InputError naming the field and the range', () => {
    const e = thrownBy(() => checkMouldAtDesignCondition({ ...poor, moisture: { insideHumidity: { kind: 'class', humidityClass: 7 } } }));
    expect(e).toBeInstanceOf(InputError);
    expect((e as InputError).field).toBe('moisture.insideHumidity.humidityClass');
    expect((e as InputError).message).toContain('from 1 to 5');
  });
});

describe('monthly mould check: the design month has the largest f_Rsi,min', () => {
  it('picks that month by hand and judges the wall there', () => {
    // Invented test climate; inside 20 °C with the given RH each month.
    const spec: [number, number, number][] = [
      [0, 0.85, 0.55],
      [5, 0.8, 0.65],
      [10, 0.75, 0.6],
      ...Array.from({ length: 9 }, (): [number, number, number] => [22, 0.6, 0.5]),
    ];
    const climate: MonthlyClimate = {
      name: 'test',
      label: 'invented test climate',
      months: spec.map(([te, phie, phii], i) => ({
        month: `M${i + 1}`,
        days: 30,
        outside: { temperature: te, relativeHumidity: phie },
        inside: { temperature: 20, relativeHumidity: phii },
      })),
    };
    const hand = spec.slice(0, 3).map(([te, , phii]) => (dewWater((phii * pSat(20)) / 0.8) - te) / (20 - te));
    const designHand = hand.indexOf(Math.max(...hand));
    const r = checkMouldMonthly(wall([layer(insulation, 0.05), layer(concrete, 0.2)]), climate);
    expect(r.designIndexMould).toBe(designHand);
    expect(Math.abs(r.conditions[designHand]!.minimumFactorMould! - hand[designHand]!)).toBeLessThan(1e-9);
    // Months with θ_e ≥ θ_i have no factor.
    expect(r.conditions[5]!.minimumFactorMould).toBeNull();
    const fRsi = 1 - 0.25 / (0.25 + 0.05 / 0.04 + 0.1 + 0.04);
    expect(Math.abs(r.temperatureFactor! - fRsi)).toBeLessThan(1e-9);
    expect(r.mould.verdict).toBe(fRsi > hand[designHand]! ? 'pass' : 'fail');
    // The month is named as a sentence says when something holds: "in M2", not "at M2".
    expect(r.mould.reason).toContain(`(mould) in M${designHand + 1} (θ_i 20 °C`);
    expect(r.surfaceCondensation.reason).toContain(`(surface condensation) in M`);
  });

  it('a single design condition reads "at the design condition"', () => {
    const r = checkMouldAtDesignCondition(poor);
    expect(r.mould.reason).toContain('(mould) at the design condition (θ_i 20 °C, θ_e 0 °C');
    expect(r.surfaceCondensation.reason).toContain('(surface condensation) at the design condition (θ_i');
  });
});
