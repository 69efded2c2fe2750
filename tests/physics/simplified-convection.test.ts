import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { writeSentence } from '../../app/base/quantity-sentence.js';
import { quantityText } from '../../app/base/quantity-text.js';
import {
  InputError,
  SIMPLIFIED_CONVECTION_TABLE,
  simplifiedConvection,
  type SimplifiedCaseRow,
} from '../../app/physics/index.js';

describe('simplified convection formulas (ISO 12241:2008 / VDI 2055-1 style)', () => {
  it('evaluates each formula as written in the standard', () => {
    // Formulas of reference notes §1.3 (horizontal pipe and pipe-in-wind rows from memory; vertical
    // and plane-wall rows confirmed in a public formula collection citing EN ISO 12241).
    const horizontalLaminar = simplifiedConvection({ case: 'horizontal-pipe-natural', temperatureDifference: 30, length: 0.2 });
    expect(horizontalLaminar.regime).toBe('laminar'); // D³ΔT = 0.24 ≤ 10
    expect(horizontalLaminar.coefficient).toBeCloseTo(1.25 * (30 / 0.2) ** 0.25, 12);
    const horizontalTurbulent = simplifiedConvection({ case: 'horizontal-pipe-natural', temperatureDifference: 30, length: 1 });
    expect(horizontalTurbulent.coefficient).toBeCloseTo(1.21 * 30 ** (1 / 3), 12);
    const wallWind = simplifiedConvection({ case: 'wall-wind', temperatureDifference: 5, length: 2, windSpeed: 3 });
    expect(wallWind.coefficient).toBeCloseTo(3.96 * Math.sqrt(3 / 2), 12); // v·H = 6 ≤ 8
    const wallWindTurbulent = simplifiedConvection({ case: 'wall-wind', temperatureDifference: 5, length: 3, windSpeed: 4 });
    expect(wallWindTurbulent.coefficient).toBeCloseTo((5.76 * 4 ** 0.8) / 3 ** 0.2, 12);
    const pipeWind = simplifiedConvection({ case: 'pipe-wind', temperatureDifference: 5, length: 0.05, windSpeed: 1 });
    expect(pipeWind.coefficient).toBeCloseTo(8.1e-3 / 0.05 + 3.14 * Math.sqrt(1 / 0.05), 12); // v·D = 0.05
  });

  it('reproduces the reference-notes figures at the natural-convection limit and for a pipe in wind', () => {
    // Reference notes §1.3 [C]: vertical, H = 1 m, ΔT = 10 K: 2.35 (laminar) vs 3.75 (turbulent).
    expect(simplifiedConvection({ case: 'vertical-natural', temperatureDifference: 10, length: 1 }).coefficient).toBeCloseTo(2.35, 2);
    const justAbove = simplifiedConvection({ case: 'vertical-natural', temperatureDifference: 10.0001, length: 1 });
    expect(justAbove.regime).toBe('turbulent');
    expect(justAbove.coefficient).toBeCloseTo(3.75, 2);
    // Reference notes §1.3 [C]: 44.5 W/(m²·K) at D = 0.2 m, v = 5 m/s, with a caution attached.
    const pipe = simplifiedConvection({ case: 'pipe-wind', temperatureDifference: 10, length: 0.2, windSpeed: 5 });
    expect(pipe.coefficient).toBeCloseTo(44.5, 1);
    expect(pipe.warnings).toHaveLength(1);
    expect(writeSentence(pipe.warnings[0]!)).toBe(
      'The simplified pipe-in-wind formula for v·D above the threshold gives about twice the Churchill–Bernstein coefficient (44.5 against 20.8 W/(m²·K) at D = 0.2 m, v = 5 m/s), so treat the result with caution.',
    );
    // In US units its figures are converted (NIST SP 811, Appendix B: 1 Btu/(h·ft²·°F) =
    // 5.678263 W/(m²·K), 1 in = 0.0254 m, 1 mph = 0.44704 m/s): 44.5 → 7.84, 20.8 → 3.66,
    // 0.2 m → 7.874 in, 5 m/s → 11 mph (to the 2 figures of a wind speed).
    expect(writeSentence(pipe.warnings[0]!, quantityText('IP'))).toBe(
      'The simplified pipe-in-wind formula for v·D above the threshold gives about twice the Churchill–Bernstein coefficient (7.84 against 3.66 Btu/(h·ft²·°F) at D = 7.874 in, v = 11 mph), so treat the result with caution.',
    );
    expect(simplifiedConvection({ case: 'vertical-natural', temperatureDifference: 10, length: 1 }).warnings).toEqual([]);
  });

  it('the pipe-in-wind branches meet (5.1 % apart, for every D) at the data threshold v·D = 0.0855 m²/s', () => {
    // Reference notes §1.3 [C]: the branches meet for any D at v·D ≈ 8.55e-2 m²/s. At fixed v·D both
    // branches scale as 1/D, so the gap is one number: 8.9·0.0855^0.9/(8.1e-3 + 3.14·√0.0855) = 1.0506.
    const row = SIMPLIFIED_CONVECTION_TABLE.find((r) => r.id === 'pipe-wind')!;
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 2, noNaN: true }), (diameter) => {
        expect(row.threshold).toBe(0.0855);
        const v = row.threshold / diameter;
        const laminar = 8.1e-3 / diameter + 3.14 * Math.sqrt(v / diameter);
        const turbulent = (8.9 * v ** 0.9) / diameter ** 0.1;
        expect(turbulent / laminar).toBeCloseTo((8.9 * 0.0855 ** 0.9) / (8.1e-3 + 3.14 * Math.sqrt(0.0855)), 9);
        expect(Math.abs(turbulent / laminar - 1)).toBeLessThan(0.051);
      }),
    );
  });

  it('reads its coefficients from the data table, so an edited table changes the result', () => {
    const edited: SimplifiedCaseRow[] = SIMPLIFIED_CONVECTION_TABLE.map((r) =>
      r.id === 'vertical-natural' ? { ...r, laminar: { ...r.laminar, factor: 2.64 } } : r,
    );
    const base = simplifiedConvection({ case: 'vertical-natural', temperatureDifference: 5, length: 1 });
    const changed = simplifiedConvection({ case: 'vertical-natural', temperatureDifference: 5, length: 1 }, edited);
    expect(changed.coefficient).toBeCloseTo(2 * base.coefficient, 12);
    for (const row of SIMPLIFIED_CONVECTION_TABLE) {
      expect(row.laminar.label.length).toBeGreaterThan(0);
      expect(row.turbulent.label.length).toBeGreaterThan(0);
    }
  });

  it('rejects a missing or negative wind speed and a non-positive length', () => {
    expect(() => simplifiedConvection({ case: 'pipe-wind', temperatureDifference: 5, length: 0.1 })).toThrow(InputError);
    expect(() => simplifiedConvection({ case: 'pipe-wind', temperatureDifference: 5, length: 0.1, windSpeed: -1 })).toThrow(
      'windSpeed must be 0 m/s or more (got -1).',
    );
    expect(() => simplifiedConvection({ case: 'vertical-natural', temperatureDifference: 5, length: 0 })).toThrow(
      'length must be greater than 0 m (got 0).',
    );
  });
});
