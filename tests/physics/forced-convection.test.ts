import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  combinedConvection,
  cylinderCrossFlowNusselt,
  forcedConvectionCylinder,
  forcedConvectionPlate,
  naturalConvectionHorizontalCylinder,
  plateParallelFlowNusselt,
} from '../../app/physics/index.js';

describe('cylinder in cross-flow, Churchill–Bernstein', () => {
  it('matches the textbook formula at fixed Re and Pr', () => {
    // Incropera & DeWitt eq. 7.54 (Churchill & Bernstein 1977).
    for (const re of [100, 1e4, 1e5, 1e6]) {
      const pr = 0.71;
      const byHand =
        0.3 +
        ((0.62 * Math.sqrt(re) * Math.cbrt(pr)) / Math.pow(1 + Math.pow(0.4 / pr, 2 / 3), 0.25)) *
          Math.pow(1 + Math.pow(re / 282000, 5 / 8), 4 / 5);
      expect(cylinderCrossFlowNusselt(re, pr).nusselt).toBeCloseTo(byHand, 9);
    }
  });

  it('reproduces the reference-notes figure of 20.8 W/(m²·K) at D = 0.2 m, v = 5 m/s', () => {
    // Reference notes §1.3 ([C], derived there from Churchill–Bernstein with air near 20 °C).
    const result = forcedConvectionCylinder({ surfaceTemperature: 20, airTemperature: 20, diameter: 0.2, windSpeed: 5 });
    expect(result.coefficient).toBeCloseTo(20.8, 1);
    // Re = vD/ν with ν(20 °C) = 1.516e-5 m²/s (Çengel & Ghajar table).
    expect(result.reynolds).toBeCloseTo((5 * 0.2) / 1.516e-5, 3);
    expect(result.warnings).toEqual([]);
  });

  it('warns when Re·Pr ≤ 0.2 and not above', () => {
    expect(cylinderCrossFlowNusselt(0.1, 0.71).warnings[0]).toMatch(/Re_D·Pr > 0.2/);
    expect(cylinderCrossFlowNusselt(10, 0.71).warnings).toEqual([]);
  });
});

describe('flat plate in parallel flow', () => {
  it('matches the laminar and mixed textbook formulas', () => {
    // Incropera & DeWitt eqs 7.30 and 7.38: 0.664Re^½Pr^⅓; (0.037Re^0.8 − 871)Pr^⅓ (Re_c = 5e5).
    expect(plateParallelFlowNusselt(1e5, 0.71).nusselt).toBeCloseTo(0.664 * Math.sqrt(1e5) * Math.cbrt(0.71), 9);
    expect(plateParallelFlowNusselt(1e7, 0.71).nusselt).toBeCloseTo((0.037 * 1e7 ** 0.8 - 871) * Math.cbrt(0.71), 6);
  });

  it('is continuous at the transition Reynolds number 5e5', () => {
    // 0.664·√5e5 = 469.5 and 0.037·(5e5)^0.8 − 871 = 469.8: the mixed form is built to match (Incropera §7.2.3).
    const below = plateParallelFlowNusselt(5e5, 0.71).nusselt;
    const above = plateParallelFlowNusselt(5e5 * (1 + 1e-9), 0.71).nusselt;
    expect(Math.abs(above / below - 1)).toBeLessThan(1e-3);
  });

  it('warns above Re = 1e8 and for Pr outside 0.6…60', () => {
    expect(plateParallelFlowNusselt(2e8, 0.71).warnings).toHaveLength(1);
    expect(plateParallelFlowNusselt(1e6, 0.5).warnings[0]).toMatch(/Pr = 0.500 is outside/);
    expect(plateParallelFlowNusselt(1e6, 0.71).warnings).toEqual([]);
    const wall = forcedConvectionPlate({ surfaceTemperature: 5, airTemperature: 0, length: 3, windSpeed: 4 });
    expect(wall.coefficient).toBeGreaterThan(0);
    expect(wall.warnings).toEqual([]);
  });
});

describe('combined natural and forced convection (n = 3)', () => {
  it('h = (h_F³ + h_N³)^(1/3) and never below either part for transverse flow', () => {
    // Incropera & DeWitt eq. 9.66 (Churchill), n = 3.
    fc.assert(
      fc.property(
        fc.double({ min: -30, max: 150, noNaN: true }),
        fc.double({ min: 0.01, max: 20, noNaN: true }),
        fc.double({ min: 0.01, max: 1.5, noNaN: true }),
        (surfaceTemperature, windSpeed, diameter) => {
          const condition = { surfaceTemperature, airTemperature: 10, diameter };
          const natural = naturalConvectionHorizontalCylinder(condition);
          const forced = forcedConvectionCylinder({ ...condition, windSpeed });
          const mixed = combinedConvection(forced, natural);
          expect(mixed.coefficient).toBeCloseTo(Math.cbrt(forced.coefficient ** 3 + natural.coefficient ** 3), 9);
          expect(mixed.coefficient).toBeGreaterThanOrEqual(natural.coefficient);
          expect(mixed.coefficient).toBeGreaterThanOrEqual(forced.coefficient);
        },
      ),
    );
  });

  it('opposing flow subtracts and never goes below zero', () => {
    const natural = naturalConvectionHorizontalCylinder({ surfaceTemperature: 60, airTemperature: 10, diameter: 0.1 });
    const forced = forcedConvectionCylinder({ surfaceTemperature: 60, airTemperature: 10, diameter: 0.1, windSpeed: 0.05 });
    const opposing = combinedConvection(forced, natural, 'opposing');
    expect(opposing.coefficient).toBeGreaterThanOrEqual(0);
    expect(opposing.coefficient).toBeLessThan(combinedConvection(forced, natural).coefficient);
  });
});
