import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { blackBodyRadiationCoefficient, InputError, radiationCoefficient, STEFAN_BOLTZMANN } from '../../app/physics/index.js';

describe('radiation coefficient', () => {
  it('4σT³ at −10/0/10/20/30 °C gives 4.13/4.62/5.15/5.71/6.32 W/(m²·K)', () => {
    // Reference notes §1.2 [C]; ISO 6946 tabulates ≈ 4.1/4.6/5.1/5.7/6.3 (from memory).
    const expected: [number, number][] = [
      [-10, 4.13],
      [0, 4.62],
      [10, 5.15],
      [20, 5.71],
      [30, 6.32],
    ];
    for (const [theta, h] of expected) {
      expect(blackBodyRadiationCoefficient(theta)).toBeCloseTo(h, 2);
      // With T_s = T_r the exact form reduces to 4εσT³.
      expect(radiationCoefficient(1, theta, theta)).toBeCloseTo(blackBodyRadiationCoefficient(theta), 12);
    }
  });

  it('h_r·(T_s − T_r) equals the Stefan–Boltzmann net exchange εσ(T_s⁴ − T_r⁴)', () => {
    // Exact factorisation T_s⁴ − T_r⁴ = (T_s² + T_r²)(T_s + T_r)(T_s − T_r) (Stefan–Boltzmann law, Incropera et al. §1.2.3; reference notes §1.2).
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: -50, max: 500, noNaN: true }),
        fc.double({ min: -50, max: 60, noNaN: true }),
        (emissivity, surface, surroundings) => {
          const Ts = surface + 273.15;
          const Tr = surroundings + 273.15;
          const net = emissivity * STEFAN_BOLTZMANN * (Ts ** 4 - Tr ** 4);
          const linear = radiationCoefficient(emissivity, surface, surroundings) * (Ts - Tr);
          expect(Math.abs(linear - net)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(net)));
        },
      ),
    );
  });

  it('is zero for ε = 0 and rises with the surface temperature', () => {
    expect(radiationCoefficient(0, 80, 10)).toBe(0);
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 1, noNaN: true }),
        fc.double({ min: -50, max: 400, noNaN: true }),
        fc.double({ min: 0.1, max: 50, noNaN: true }),
        (emissivity, surface, step) => {
          expect(radiationCoefficient(emissivity, surface + step, 15)).toBeGreaterThan(radiationCoefficient(emissivity, surface, 15));
        },
      ),
    );
  });

  it('rejects an emissivity outside 0..1 and a temperature below absolute zero', () => {
    expect(() => radiationCoefficient(1.2, 20, 20)).toThrow(InputError);
    expect(() => radiationCoefficient(1.2, 20, 20)).toThrow('emissivity must be between 0 and 1 (got 1.2).');
    expect(() => radiationCoefficient(-0.1, 20, 20)).toThrow(/emissivity must be between 0 and 1/);
    expect(() => radiationCoefficient(0.9, -300, 20)).toThrow(/surfaceTemperature must be above absolute zero/);
  });
});
