import { describe, expect, it } from 'vitest';
import {
  horizontalCylinderNusselt,
  horizontalCylinderNusseltLaminar,
  horizontalPlateNusselt,
  naturalConvectionHorizontalCylinder,
  naturalConvectionHorizontalPlate,
  naturalConvectionVerticalSurface,
  verticalPlateNusselt,
  verticalPlateNusseltLaminar,
} from '../../app/physics/index.js';

// Air at a film temperature of 20 °C, Çengel & Ghajar table (reference notes §1.5).
const AIR20 = { k: 0.02514, nu: 1.516e-5, alpha: 2.074e-5, pr: 0.7309, beta: 1 / 293.15 };

/** Ra = g β ΔT L³/(ν α), g = 9.81 m/s², by hand (Incropera & DeWitt, ch. 9). */
function rayleighAt20(deltaT: number, length: number): number {
  return (9.81 * AIR20.beta * deltaT * length ** 3) / (AIR20.nu * AIR20.alpha);
}

describe('horizontal cylinder, Churchill–Chu', () => {
  it('matches the textbook formula at fixed Ra and Pr', () => {
    // Incropera & DeWitt eq. 9.34 (Churchill & Chu 1975): Nu = {0.60 + 0.387Ra^(1/6)/[1+(0.559/Pr)^(9/16)]^(8/27)}².
    const ra = 1e6;
    const pr = 0.71;
    const byHand = (0.6 + (0.387 * Math.pow(ra, 1 / 6)) / Math.pow(1 + Math.pow(0.559 / pr, 9 / 16), 8 / 27)) ** 2;
    expect(horizontalCylinderNusselt(ra, pr).nusselt).toBeCloseTo(byHand, 10);
    // Hand arithmetic: (0.559/0.71)^(9/16) = 0.8742; 1.8742^(8/27) = 1.2046; (0.6 + 3.870/1.2046)² = 14.54.
    expect(byHand).toBeCloseTo(14.54, 1);
    // Laminar variant, Churchill & Chu: Nu = 0.36 + 0.518 Ra^¼/[1+(0.559/Pr)^(9/16)]^(4/9).
    const laminar = 0.36 + (0.518 * ra ** 0.25) / (1 + (0.559 / pr) ** (9 / 16)) ** (4 / 9);
    expect(horizontalCylinderNusseltLaminar(ra, pr).nusselt).toBeCloseTo(laminar, 10);
    // Independent cross-check: Morgan's power laws (Incropera & DeWitt Table 9.1, from memory):
    // Nu = 0.480Ra^¼ (1e4–1e7), 0.125Ra^⅓ (1e7–1e12); the two fits agree within 10 %.
    expect(Math.abs(horizontalCylinderNusselt(1e6, pr).nusselt / (0.48 * 1e6 ** 0.25) - 1)).toBeLessThan(0.1);
    expect(Math.abs(horizontalCylinderNusselt(1e9, pr).nusselt / (0.125 * 1e3) - 1)).toBeLessThan(0.1);
  });

  it('computes h = Nu·k/D with properties at the film temperature', () => {
    // Surface 40 °C, air 0 °C: film 20 °C (a table row); D = 0.1 m.
    const result = naturalConvectionHorizontalCylinder({ surfaceTemperature: 40, airTemperature: 0, diameter: 0.1 });
    const ra = rayleighAt20(40, 0.1);
    const nu = (0.6 + (0.387 * ra ** (1 / 6)) / (1 + (0.559 / AIR20.pr) ** (9 / 16)) ** (8 / 27)) ** 2;
    expect(result.rayleigh).toBeCloseTo(ra, 3);
    expect(result.coefficient).toBeCloseTo((nu * AIR20.k) / 0.1, 10);
    expect(result.filmTemperature).toBe(20);
    expect(result.warnings).toEqual([]);
  });

  it('warns above Ra = 1e12 and not inside the range', () => {
    expect(horizontalCylinderNusselt(1e13, 0.71).warnings).toHaveLength(1);
    expect(horizontalCylinderNusselt(1e13, 0.71).warnings[0]).toMatch(/above the correlation's range \(Ra_D ≤ 1e12\)/);
    expect(horizontalCylinderNusselt(1e11, 0.71).warnings).toEqual([]);
    expect(horizontalCylinderNusseltLaminar(2e9, 0.71).warnings).toHaveLength(1);
    expect(horizontalCylinderNusseltLaminar(1e8, 0.71).warnings).toEqual([]);
  });
});

describe('vertical plate and cylinder, Churchill–Chu', () => {
  it('matches the textbook formulas at fixed Ra and Pr', () => {
    // Incropera & DeWitt eq. 9.26: Nu = {0.825 + 0.387Ra^(1/6)/[1+(0.492/Pr)^(9/16)]^(8/27)}²;
    // eq. 9.27 (Ra ≤ 1e9): Nu = 0.68 + 0.670Ra^¼/[1+(0.492/Pr)^(9/16)]^(4/9).
    for (const ra of [1e5, 1e8, 1e11]) {
      const pr = 0.72;
      const all = (0.825 + (0.387 * ra ** (1 / 6)) / (1 + (0.492 / pr) ** (9 / 16)) ** (8 / 27)) ** 2;
      const lam = 0.68 + (0.67 * ra ** 0.25) / (1 + (0.492 / pr) ** (9 / 16)) ** (4 / 9);
      expect(verticalPlateNusselt(ra, pr).nusselt).toBeCloseTo(all, 9);
      expect(verticalPlateNusseltLaminar(ra, pr).nusselt).toBeCloseTo(lam, 9);
    }
    expect(verticalPlateNusseltLaminar(1e10, 0.72).warnings[0]).toMatch(/above the laminar range/);
    expect(verticalPlateNusseltLaminar(1e8, 0.72).warnings).toEqual([]);
  });

  it('computes a wall coefficient from the film properties', () => {
    // Wall 2 m high at 10 °C in air at 30 °C (film 20 °C), cold wall: same correlation (symmetry of buoyancy).
    const result = naturalConvectionVerticalSurface({ surfaceTemperature: 10, airTemperature: 30, height: 2 });
    const ra = rayleighAt20(20, 2);
    const nu = (0.825 + (0.387 * ra ** (1 / 6)) / (1 + (0.492 / AIR20.pr) ** (9 / 16)) ** (8 / 27)) ** 2;
    expect(result.coefficient).toBeCloseTo((nu * AIR20.k) / 2, 10);
    expect(result.warnings).toEqual([]);
  });

  it('warns for a slender vertical cylinder (D/L < 35/Gr^¼) and not for a thick one', () => {
    // Incropera & DeWitt §9.6.3: a vertical cylinder behaves as a plate if D/L ≥ 35/Gr_L^¼.
    const slender = naturalConvectionVerticalSurface({ surfaceTemperature: 50, airTemperature: 20, height: 3, diameter: 0.02 });
    expect(slender.warnings).toHaveLength(1);
    expect(slender.warnings[0]).toMatch(/slender cylinder/);
    const thick = naturalConvectionVerticalSurface({ surfaceTemperature: 40, airTemperature: 20, height: 1, diameter: 0.5 });
    expect(thick.warnings).toEqual([]);
  });
});

describe('horizontal plates', () => {
  it('matches the textbook formulas at fixed Ra', () => {
    // Incropera & DeWitt 7th ed. eqs 9.30–9.32: upper hot 0.54Ra^¼ (1e4–1e7), 0.15Ra^⅓ (1e7–1e11); lower hot 0.52Ra^(1/5).
    expect(horizontalPlateNusselt(1e6, 'hot-up-or-cold-down').nusselt).toBeCloseTo(0.54 * 1e6 ** 0.25, 10);
    expect(horizontalPlateNusselt(1e9, 'hot-up-or-cold-down').nusselt).toBeCloseTo(0.15 * 1e3, 10);
    expect(horizontalPlateNusselt(1e6, 'hot-down-or-cold-up').nusselt).toBeCloseTo(0.52 * 1e6 ** 0.2, 10);
  });

  it('warns outside each range and not inside', () => {
    expect(horizontalPlateNusselt(1e3, 'hot-up-or-cold-down').warnings).toHaveLength(1);
    expect(horizontalPlateNusselt(1e12, 'hot-up-or-cold-down').warnings).toHaveLength(1);
    expect(horizontalPlateNusselt(1e8, 'hot-up-or-cold-down').warnings).toEqual([]);
    expect(horizontalPlateNusselt(1e10, 'hot-down-or-cold-up').warnings[0]).toMatch(/outside the correlation's range \(1e4 to 1e9\)/);
    expect(horizontalPlateNusselt(1e7, 'hot-down-or-cold-up').warnings).toEqual([]);
  });

  it('a hot face up or a cold face down gets the larger coefficient', () => {
    // Incropera & DeWitt §9.6.2: buoyant flow leaves freely from a hot upper or cold lower face.
    const base = { airTemperature: 20, characteristicLength: 0.5 };
    const hotUp = naturalConvectionHorizontalPlate({ ...base, surfaceTemperature: 60, facing: 'up' });
    const hotDown = naturalConvectionHorizontalPlate({ ...base, surfaceTemperature: 60, facing: 'down' });
    const coldUp = naturalConvectionHorizontalPlate({ ...base, surfaceTemperature: -20, facing: 'up' });
    const coldDown = naturalConvectionHorizontalPlate({ ...base, surfaceTemperature: -20, facing: 'down' });
    expect(hotUp.coefficient).toBeGreaterThan(hotDown.coefficient);
    expect(coldDown.coefficient).toBeGreaterThan(coldUp.coefficient);
    expect(hotUp.correlation).toMatch(/hot-up-or-cold-down/);
    expect(coldUp.correlation).toMatch(/hot-down-or-cold-up/);
    // Same film temperature (40 °C) and ΔT: the hot-up and cold-down faces give the same numbers.
    const a = naturalConvectionHorizontalPlate({ ...base, airTemperature: 30, surfaceTemperature: 50, facing: 'up' });
    const b = naturalConvectionHorizontalPlate({ ...base, airTemperature: 50, surfaceTemperature: 30, facing: 'down' });
    expect(a.coefficient).toBeCloseTo(b.coefficient, 12);
  });
});
