import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import psychrolib from 'psychrolib';
import { CONDENSATION_WARNING_MARGIN, surfaceCondensationCheck } from '../../app/checks/surface-condensation.js';
import { calculatePipe } from '../../app/cases/pipe/pipe-calculation.js';
import { dewPoint } from '../../app/physics/index.js';
import { foam, hotPipe } from '../assemblies/pipe-fixtures.js';

psychrolib.SetUnitSystem(psychrolib.SI);

describe('surface condensation check', () => {
  it('dew point of 20 °C / 50 % air from the ISO 13788 Annex formulas, recomputed here (reference notes §3, formula from memory)', () => {
    // p = φ·610.5·exp(17.269θ/(237.3+θ)); θ_d = 237.3x/(17.269 − x), x = ln(p/610.5).
    const x = Math.log((0.5 * 610.5 * Math.exp((17.269 * 20) / (237.3 + 20))) / 610.5);
    const expected = (237.3 * x) / (17.269 - x);
    const result = surfaceCondensationCheck({ surfaceTemperature: 15, airTemperature: 20, relativeHumidity: 0.5 });
    expect(result.dewPoint).toBeCloseTo(expected, 10);
    // Outside reference: psychrolib (ASHRAE Hyland–Wexler); the two saturation formulas differ by
    // about 0.1 % in pressure near 20 °C, i.e. a few hundredths of a kelvin in dew point.
    expect(Math.abs(result.dewPoint - psychrolib.GetTDewPointFromRelHum(20, 0.5))).toBeLessThan(0.05);
    expect(result.margin).toEqual({ value: 15 - expected, unit: 'K', reference: 'the dew point of the air', safeSide: 'above' });
    // θ_d = 9.26 °C for 20 °C / 50 % by the formulas above: 15 − 9.26 = 5.7 K.
    expect(result.reason).toBe('No condensation: the surface, at 15.0 °C, is 5.7 K above the dew point of the air, 9.3 °C (air 20.0 °C at 50 % relative humidity).');
  });

  it('the margin changes sign exactly where the surface temperature crosses the dew point', () => {
    const air = { airTemperature: 24, relativeHumidity: 0.65 };
    const dew = dewPoint(24, 0.65);
    const at = surfaceCondensationCheck({ ...air, surfaceTemperature: dew });
    expect(at.margin!.value).toBe(0);
    expect(at.verdict).toBe('fail');
    const above = surfaceCondensationCheck({ ...air, surfaceTemperature: dew + 1e-9 });
    expect(above.margin!.value).toBeGreaterThan(0);
    expect(above.verdict).toBe('warning');
    const below = surfaceCondensationCheck({ ...air, surfaceTemperature: dew - 1e-9 });
    expect(below.margin!.value).toBeLessThan(0);
    expect(below.verdict).toBe('fail');
  });

  it('warning below a 1 K margin (common practice, no source), pass from 1 K', () => {
    expect(CONDENSATION_WARNING_MARGIN).toBe(1);
    const dew = dewPoint(24, 0.65);
    expect(surfaceCondensationCheck({ airTemperature: 24, relativeHumidity: 0.65, surfaceTemperature: dew + 0.99 }).verdict).toBe('warning');
    expect(surfaceCondensationCheck({ airTemperature: 24, relativeHumidity: 0.65, surfaceTemperature: dew + 1 }).verdict).toBe('pass');
  });

  it('property: the margin is θ_s − θ_dew and the verdict is fail exactly when θ_s ≤ θ_dew', () => {
    fc.assert(
      fc.property(fc.double({ min: -20, max: 45, noNaN: true }), fc.double({ min: 0.05, max: 1, noNaN: true }), fc.double({ min: -30, max: 60, noNaN: true }), (air, rh, surface) => {
        const result = surfaceCondensationCheck({ airTemperature: air, relativeHumidity: rh, surfaceTemperature: surface });
        const dew = dewPoint(air, rh);
        expect(result.margin!.value).toBe(surface - dew);
        expect(result.verdict === 'fail').toBe(surface <= dew);
      }),
    );
  });

  it('carries the caution that defers to local codes and licensed professional practice', () => {
    const result = surfaceCondensationCheck({ airTemperature: 20, relativeHumidity: 0.5, surfaceTemperature: 19 });
    expect(result.caution).toMatch(/local codes and licensed professional practice/);
    expect(result.reason).not.toMatch(/memory|confidence|ISO/);
  });

  it('says in plain words how far the surface is from the dew point, on either side', () => {
    const dew = dewPoint(20, 0.5);
    const wet = surfaceCondensationCheck({ airTemperature: 20, relativeHumidity: 0.5, surfaceTemperature: dew - 2 });
    expect(wet.reason).toBe('Water condenses: the surface, at 7.3 °C, is 2.0 K below the dew point of the air, 9.3 °C (air 20.0 °C at 50 % relative humidity).');
    const close = surfaceCondensationCheck({ airTemperature: 20, relativeHumidity: 0.5, surfaceTemperature: dew + 0.5 });
    expect(close.reason).toBe(
      'No condensation at the design conditions, but the surface, at 9.8 °C, is only 0.5 K above the dew point of the air, 9.3 °C ' +
        '(air 20.0 °C at 50 % relative humidity); humidity and temperatures vary in service, so keep at least 1 K.',
    );
  });

  it('a chilled pipe in humid air: thin insulation sweats, thicker insulation keeps the surface above the dew point', () => {
    const chilled = (thickness: number) =>
      calculatePipe(
        hotPipe({
          inner: { kind: 'fluid', temperature: 5, coefficient: 1200 },
          layers: [{ material: foam, thickness }],
          jacket: undefined,
          ambient: { airTemperature: 28, relativeHumidity: 0.8, exposure: { kind: 'indoor' } },
        }),
      ).checks.surfaceCondensation;
    const thin = chilled(0.006);
    const thick = chilled(0.05);
    expect(thin.verdict).toBe('fail');
    expect(thin.margin!.value).toBeLessThan(0);
    expect(thick.margin!.value).toBeGreaterThan(thin.margin!.value);
    expect(thick.verdict).not.toBe('fail');
  });
});
