/**
 * The Glaser-type construction of ISO 13788 (reference notes §4): a hand-computed wall with one
 * condensation interface, computed step by step from the formulas (s_d = μ·d, p_sat by the ISO 13788
 * Magnus form, from memory, g = δ₀·Δp/Δs_d with δ₀ = 2e-10 kg/(m·s·Pa), from memory), and invariants.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { constructVapourProfile } from '../../app/checks/interstitial.js';
import { checkInterstitialAtDesignCondition } from './wall-moisture.js';
import { layer, material, wall } from '../assemblies/wall-fixtures.js';
import { pSat } from './iso13788-saturation.js';

const DELTA0 = 2e-10; // ISO 13788, from memory
function relative(a: number, b: number): number {
  return Math.abs(a - b) / Math.abs(b);
}

describe('hand-computed Glaser case: plasterboard / mineral wool / plywood, 20 °C 60 % inside, −5 °C 80 % outside', () => {
  const input = wall(
    [layer(material('plasterboard', 0.25, 10), 0.0125), layer(material('mineral wool', 0.04, 1), 0.1), layer(material('plywood', 0.13, 200), 0.012)],
    { inside: { temperature: 20, relativeHumidity: 0.6 }, outside: { temperature: -5, relativeHumidity: 0.8 } },
  );
  // Step 1, temperatures (ISO 6946 R_si 0.13, R_se 0.04, series formula).
  const R = [0.13, 0.0125 / 0.25, 0.1 / 0.04, 0.012 / 0.13, 0.04];
  const RT = R.reduce((a, b) => a + b, 0);
  const theta = [0, 1, 2, 3].map((k) => 20 - (25 * R.slice(0, k + 1).reduce((a, b) => a + b, 0)) / RT);
  // Step 2, s_d = μ·d: 0.125, 0.1, 2.4 m.
  const sd = [10 * 0.0125, 1 * 0.1, 200 * 0.012];
  // Step 3, boundary vapour pressures.
  const pi = 0.6 * pSat(20);
  const pe = 0.8 * pSat(-5);
  // Step 4, the straight line crosses saturation at the wool/plywood interface (point 2).
  const psat2 = pSat(theta[2]!);
  const straightAt2 = pi - ((pi - pe) * (sd[0]! + sd[1]!)) / (sd[0]! + sd[1]! + sd[2]!);
  // Step 5, fluxes and condensation rate.
  const gIn = (DELTA0 * (pi - psat2)) / (sd[0]! + sd[1]!);
  const gOut = (DELTA0 * (psat2 - pe)) / sd[2]!;
  const gc = gIn - gOut;

  it('the hand numbers describe one condensation interface', () => {
    expect(straightAt2).toBeGreaterThan(psat2);
    // Point 1 stays below saturation on the new line from p_i to p_sat,2.
    const at1 = pi - ((pi - psat2) * sd[0]!) / (sd[0]! + sd[1]!);
    expect(at1).toBeLessThan(pSat(theta[1]!));
    expect(gc).toBeGreaterThan(0);
  });

  it('the check reproduces the temperatures, saturation pressures, vapour line and g_c within 1e-9', () => {
    const r = checkInterstitialAtDesignCondition(input);
    r.points.forEach((p, k) => {
      expect(Math.abs(p.temperature - theta[k]!)).toBeLessThan(1e-9);
      expect(relative(p.saturationPressure, pSat(theta[k]!))).toBeLessThan(1e-9);
    });
    expect(relative(r.points[2]!.vapourPressure!, psat2)).toBeLessThan(1e-12);
    expect(relative(r.points[0]!.vapourPressure!, pi)).toBeLessThan(1e-12);
    expect(relative(r.points[3]!.vapourPressure!, pe)).toBeLessThan(1e-12);
    expect(relative(r.points[2]!.condensationRate, gc)).toBeLessThan(1e-9);
    expect(r.points[1]!.condensationRate).toBe(0);
    expect(relative(r.totalCondensationRate, gc)).toBeLessThan(1e-9);
    expect(relative(r.layers[2]!.flux, gOut)).toBeLessThan(1e-9);
    // Margin: p_sat − straight line at the worst interface, negative here.
    expect(relative(r.saturationReserve!, psat2 - straightAt2)).toBeLessThan(1e-9);
    expect(r.check.verdict).toBe('warning');
    expect(r.check.reason).toContain('interface between mineral wool and plywood');
    expect(r.check.caution).toMatch(/licensed professional/);
  });

  it('a vapour control layer on the warm side removes the condensation', () => {
    const tight = wall(
      [
        layer(material('plasterboard', 0.25, 10), 0.0125),
        layer(material('vapour control layer', 0.33, null, 100), 0.0002),
        layer(material('mineral wool', 0.04, 1), 0.1),
        layer(material('plywood', 0.13, 200), 0.012),
      ],
      { inside: { temperature: 20, relativeHumidity: 0.6 }, outside: { temperature: -5, relativeHumidity: 0.8 } },
    );
    const r = checkInterstitialAtDesignCondition(tight);
    expect(r.totalCondensationRate).toBe(0);
    expect(r.check.verdict).toBe('pass');
    expect(r.check.margin!.value).toBeGreaterThan(0);
  });
});

describe('construction invariants', () => {
  const arbitrary = fc.record({
    sd: fc.array(fc.double({ min: 0.01, max: 50, noNaN: true }), { minLength: 1, maxLength: 6 }),
    pi: fc.double({ min: 100, max: 2500, noNaN: true }),
    pe: fc.double({ min: 50, max: 2000, noNaN: true }),
    seed: fc.array(fc.double({ min: 0, max: 3000, noNaN: true }), { minLength: 7, maxLength: 7 }),
  });

  it('no condensation where the straight vapour line stays below saturation everywhere (ISO 13788 principle)', () => {
    fc.assert(
      fc.property(arbitrary, ({ sd, pi, pe, seed }) => {
        const total = sd.reduce((a, b) => a + b, 0);
        let x = 0;
        const line = [pi, ...sd.map((s) => ((x += s), pi + ((pe - pi) * x) / total))];
        const saturation = line.map((p, k) => p + 1 + seed[k]!); // always above the line
        const r = constructVapourProfile({ layerSd: sd, saturation, insidePressure: pi, outsidePressure: pe, vapourPermeabilityOfAir: DELTA0 });
        expect(r.condensationRate.every((g) => g === 0)).toBe(true);
        r.pressure.forEach((p, k) => expect(Math.abs(p! - line[k]!)).toBeLessThan(1e-9 * Math.max(pi, pe)));
      }),
    );
  });

  it('the profile never exceeds saturation, is convex in s_d, and condensation rates are never negative when dry', () => {
    fc.assert(
      fc.property(arbitrary, ({ sd, pi, pe, seed }) => {
        const saturation = [Math.max(pi, seed[0]!), ...sd.slice(0, -1).map((_, k) => 50 + seed[k + 1]!), Math.max(pe, seed[6]!)];
        const r = constructVapourProfile({ layerSd: sd, saturation, insidePressure: pi, outsidePressure: pe, vapourPermeabilityOfAir: DELTA0 });
        r.pressure.forEach((p, k) => expect(p!).toBeLessThanOrEqual(saturation[k]! * (1 + 1e-12)));
        r.condensationRate.forEach((g) => expect(g).toBeGreaterThanOrEqual(-1e-20));
        // Convex: the slope (−flux) never decreases going outwards.
        for (let j = 1; j < sd.length; j++) expect(r.layerFlux[j]!).toBeLessThanOrEqual(r.layerFlux[j - 1]! + 1e-9 * Math.abs(r.layerFlux[j - 1]!) + 1e-20);
      }),
    );
  });
});

describe('vapour-tight layers (μ = ∞)', () => {
  it('no vapour crosses a vapour-tight layer; the warm side stays at p_i when it is below saturation', () => {
    const r = constructVapourProfile({
      layerSd: [0.1, Number.POSITIVE_INFINITY, 0.5],
      saturation: [2300, 2000, 900, 500],
      insidePressure: 1200,
      outsidePressure: 350,
      vapourPermeabilityOfAir: DELTA0,
    });
    expect(r.pressure).toEqual([1200, 1200, 350, 350]);
    expect(r.layerFlux).toEqual([0, 0, 0]);
    expect(r.condensationRate.every((g) => g === 0)).toBe(true);
  });

  it('vapour condenses on the warm face of a cold vapour-tight layer at g_c = δ₀(p_i − p_sat)/s_d, nothing leaves', () => {
    const r = constructVapourProfile({
      layerSd: [0.1, 0.2, Number.POSITIVE_INFINITY],
      saturation: [2300, 1500, 600, 500],
      insidePressure: 1200,
      outsidePressure: 350,
      vapourPermeabilityOfAir: DELTA0,
    });
    expect(r.pressure[2]).toBe(600);
    expect(relative(r.condensationRate[2]!, (DELTA0 * (1200 - 600)) / 0.3)).toBeLessThan(1e-12);
    expect(r.condensationRate[1]).toBe(0);
  });

  it('a part sealed on both sides has no defined vapour pressure (null, never NaN)', () => {
    const r = constructVapourProfile({
      layerSd: [Number.POSITIVE_INFINITY, 0.3, Number.POSITIVE_INFINITY],
      saturation: [2300, 1500, 600, 500],
      insidePressure: 1200,
      outsidePressure: 350,
      vapourPermeabilityOfAir: DELTA0,
    });
    expect(r.pressure).toEqual([1200, null, null, 350]);
    expect(r.condensationRate).toEqual([0, 0, 0, 0]);
  });

  it('a vapour-tight material in a wall (μ = Infinity) is handled end to end', () => {
    const steel = material('steel sheet', 50, Number.POSITIVE_INFINITY);
    const r = checkInterstitialAtDesignCondition(wall([layer(material('mineral wool', 0.04, 1), 0.1), layer(steel, 0.001)]));
    expect(r.layers[1]!.vapourTight).toBe(true);
    expect(r.layers[1]!.sdShown).toBeNull();
    expect(r.points[2]!.sdFromInside).toBeNull();
    // The steel's warm face is near −5 °C, far below the inside dew point: condensation there.
    expect(r.points[1]!.condensationRate).toBeGreaterThan(0);
    expect(JSON.stringify(r)).not.toContain('NaN');
  });

  it('inside air above saturation at the surface is reported as surface condensation and held at saturation', () => {
    const r = constructVapourProfile({ layerSd: [1], saturation: [1000, 500], insidePressure: 1200, outsidePressure: 300, vapourPermeabilityOfAir: DELTA0 });
    expect(r.surfaceCondensation.inside).toBe(true);
    expect(r.pressure[0]).toBe(1000);
  });
});
