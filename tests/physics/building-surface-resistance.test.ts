import { describe, expect, it } from 'vitest';
import {
  externalConvectionCoefficient,
  insideSurfaceResistance,
  InputError,
  outsideSurfaceResistance,
  standardSurfaceResistances,
  surfaceResistanceFromCoefficients,
} from '../../app/physics/index.js';

describe('ISO 6946 surface resistances', () => {
  it('gives the conventional table values', () => {
    // ISO 6946 table (via a secondary page reproducing it; reference notes §2): R_si 0.10/0.13/0.17, R_se 0.04.
    expect(standardSurfaceResistances('upward')).toEqual({ inside: 0.1, outside: 0.04 });
    expect(standardSurfaceResistances('horizontal')).toEqual({ inside: 0.13, outside: 0.04 });
    expect(standardSurfaceResistances('downward')).toEqual({ inside: 0.17, outside: 0.04 });
  });

  it('the annex basis 1/(h_c + ε·4σT_m³) reproduces the table to its two decimals', () => {
    // Reference notes §2 [C]: 1/(2.5 + 0.9·5.71) = 0.131; h_ci 5.0/2.5/0.7, h_ce = 4 + 4v (from memory).
    expect(1 / (2.5 + 0.9 * 5.71)).toBeCloseTo(0.131, 3);
    expect(surfaceResistanceFromCoefficients({ convection: 2.5, emissivity: 0.9, meanTemperature: 20 })).toBeCloseTo(0.131, 3);
    for (const direction of ['upward', 'horizontal', 'downward'] as const) {
      const table = standardSurfaceResistances(direction);
      expect(Math.abs(insideSurfaceResistance(direction) - table.inside)).toBeLessThan(0.005);
    }
    // R_se: 1/(4 + 4·4 + 0.9·4.62) = 0.0414 → 0.04.
    expect(externalConvectionCoefficient(4)).toBe(20);
    expect(Math.abs(outsideSurfaceResistance() - 0.04)).toBeLessThan(0.005);
  });

  it('a low-emissivity surface has a larger resistance; ε = 0 and h_c = 0 gives no film', () => {
    // Physics of the basis: less radiation, less exchange.
    expect(insideSurfaceResistance('horizontal', 0.05)).toBeGreaterThan(insideSurfaceResistance('horizontal', 0.9));
    expect(surfaceResistanceFromCoefficients({ convection: 0, emissivity: 0, meanTemperature: 20 })).toBe(Number.POSITIVE_INFINITY);
  });

  it('rejects a bad direction, emissivity or wind speed naming the field', () => {
    expect(() => standardSurfaceResistances('sideways' as never)).toThrow(InputError);
    expect(() => standardSurfaceResistances('sideways' as never)).toThrow(
      "direction must be one of 'upward', 'horizontal', 'downward' (got \"sideways\").",
    );
    expect(() => insideSurfaceResistance('upward', 2)).toThrow('emissivity must be between 0 and 1 (got 2).');
    expect(() => externalConvectionCoefficient(-1)).toThrow('windSpeed must be 0 m/s or more (got -1).');
  });
});
