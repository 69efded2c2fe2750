import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import psychrolib from 'psychrolib';
import {
  dewPoint,
  InputError,
  relativeHumidity,
  saturationPressure,
  vapourConcentration,
  vapourPressure,
  vapourPressureFromConcentration,
} from '../../app/physics/index.js';
import { thrownBy } from './thrown-error.js';

psychrolib.SetUnitSystem(psychrolib.SI);

/*
 * Dew-point tolerance. A relative error e in p_sat moves the dew point by about
 * e·(c+θ)²/(b·c) (derivative of the Magnus inverse): with the ISO water constants that is
 * 0.18 %·(237.3+θ_d)²/(17.269·237.3) ≤ 0.0018·17 K ≈ 0.03 K for dew points 0…40 °C; over ice
 * 0.5 %·(265.5+θ)²/(21.875·265.5) ≈ 0.055 K near −20 °C. Measured against psychrolib: 0.018 K and
 * 0.047 K. Checks: 0.03 K (water) and 0.06 K (ice, frost points −20…0 °C).
 */
describe('dew point', () => {
  it('matches the documented psychrolib example GetTDewPointFromRelHum(25, 0.8) = 21.3094 °C', () => {
    // psychrolib documentation example; the library itself reproduces it.
    expect(psychrolib.GetTDewPointFromRelHum(25, 0.8)).toBeCloseTo(21.3094, 4);
    expect(Math.abs(dewPoint(25, 0.8) - 21.3094)).toBeLessThan(0.03);
  });

  it('follows psychrolib (Hyland–Wexler) within the formula difference', () => {
    for (let theta = -20; theta <= 50; theta += 1) {
      for (let rh = 0.05; rh <= 1; rh += 0.05) {
        const ours = dewPoint(theta, rh);
        if (ours < -20) continue;
        // psychrolib GetTDewPointFromRelHum (SI), ASHRAE Hyland–Wexler saturation curve.
        const reference = psychrolib.GetTDewPointFromRelHum(theta, Math.min(rh, 1));
        expect(Math.abs(ours - reference)).toBeLessThan(ours >= 0 ? 0.03 : 0.06);
      }
    }
  });

  it('equals the air temperature at 100 % RH and falls as RH falls', () => {
    // Definition of the dew point (ISO 13788 §3): saturation at the air temperature itself.
    expect(dewPoint(20, 1)).toBeCloseTo(20, 10);
    fc.assert(
      fc.property(
        fc.double({ min: -30, max: 60, noNaN: true }),
        fc.double({ min: 0.02, max: 0.98, noNaN: true }),
        (theta, rh) => {
          const lower = dewPoint(theta, rh);
          expect(lower).toBeLessThan(theta);
          expect(lower).toBeLessThan(dewPoint(theta, rh + 0.01));
        },
      ),
    );
  });

  it('rejects RH outside 0..1 with one sentence naming the field and the unit', () => {
    expect(() => dewPoint(20, 1.2)).toThrow(InputError);
    expect(() => dewPoint(20, 1.2)).toThrow(
      'relativeHumidity must be a fraction above 0 and at most 1 (above 0 up to 100 %) (got 1.2).',
    );
    expect(() => dewPoint(20, 0)).toThrow(/relativeHumidity must be a fraction above 0/);
    expect(() => vapourPressure(20, -0.1)).toThrow('relativeHumidity must be a fraction from 0 to 1 (0 to 100 %) (got -0.1).');
    expect(() => vapourPressure(20, 50)).toThrow(/got 50/);
    const error = thrownBy(() => vapourPressure(20, 80));
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).field).toBe('relativeHumidity');
  });
});

describe('vapour pressure, relative humidity, concentration', () => {
  it('vapour pressure and RH agree with psychrolib', () => {
    // psychrolib GetVapPresFromRelHum / GetRelHumFromVapPres (Hyland–Wexler): ISO formula within 0.2 %.
    expect(vapourPressure(20, 0.5) / psychrolib.GetVapPresFromRelHum(20, 0.5)).toBeCloseTo(1, 2);
    expect(relativeHumidity(20, 1169.4)).toBeCloseTo(psychrolib.GetRelHumFromVapPres(20, 1169.4), 3);
  });

  it('RH and vapour pressure are inverse to each other', () => {
    // Definition φ = p/p_sat (ISO 13788 §3).
    fc.assert(
      fc.property(fc.double({ min: -30, max: 60, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (theta, rh) => {
        expect(relativeHumidity(theta, vapourPressure(theta, rh))).toBeCloseTo(rh, 12);
      }),
    );
  });

  it('vapour concentration is p/(R_v T) with R_v = 461.5 J/(kg·K)', () => {
    // Ideal-gas law for water vapour (ISO 13788 §3; R_v = 461.5 J/(kg·K)).
    // 20 °C saturated: 2337 Pa / (461.5 · 293.15) = 0.017274 kg/m³ (≈ 17.3 g/m³, the familiar
    // saturation humidity of air at 20 °C).
    expect(vapourConcentration(2337, 20)).toBeCloseTo(2337 / (461.5 * 293.15), 12);
    expect(vapourConcentration(saturationPressure(20), 20) * 1000).toBeCloseTo(17.27, 1);
    expect(vapourPressureFromConcentration(vapourConcentration(1500, 5), 5)).toBeCloseTo(1500, 9);
    expect(() => vapourConcentration(-1, 20)).toThrow(/vapourPressure must be 0 Pa or more/);
  });
});
