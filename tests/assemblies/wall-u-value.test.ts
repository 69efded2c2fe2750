/**
 * Wall and roof U-values against ISO 6946: the series-resistance formula
 * R_T = R_si + Σ d_j/λ_j + R_g + R_se, U = 1/R_T (ISO 6946, reference notes §2), the standard
 * surface resistances (ISO 6946 table, confirmed on a secondary page) and air-layer resistances
 * (ISO 6946 table, from memory), and the rules for ventilated air layers (from memory).
 */
import { describe, expect, it } from 'vitest';
import { calculateWall, roundToSignificantFigures } from '../../app/cases/wall/wall.js';
import type { ConductivityModel } from '../../app/fe/index.js';
import { layer, material, wall } from './wall-fixtures.js';

const plaster = material('gypsum plaster', 0.4, 10);
const block = material('concrete block', 1.15, 100);
const wool = material('mineral wool', 0.035, 1);
const brick = material('clay brick', 0.77, 10);

function relative(a: number, b: number): number {
  return Math.abs(a - b) / Math.abs(b);
}

describe('U-value by the series-resistance formula (ISO 6946)', () => {
  it('a four-layer wall with an unventilated 25 mm cavity: U = 1/R_T within 1e-9', () => {
    const input = wall([
      layer(plaster, 0.013),
      layer(block, 0.1),
      layer(wool, 0.075),
      { kind: 'air-layer', thickness: 0.025, ventilation: 'unventilated' },
      layer(brick, 0.1025),
    ]);
    const r = calculateWall(input);
    // ISO 6946: R_si 0.13 (horizontal), R_se 0.04; R_g(25 mm, horizontal) = 0.18 from the table (from memory).
    const RT = 0.13 + 0.013 / 0.4 + 0.1 / 1.15 + 0.075 / 0.035 + 0.18 + 0.1025 / 0.77 + 0.04;
    expect(relative(r.totalResistance, RT)).toBeLessThan(1e-9);
    expect(relative(r.uValue, 1 / RT)).toBeLessThan(1e-9);
    // The engine's own heat flow gives the same U.
    expect(relative(r.uValueFromHeatFlow!, 1 / RT)).toBeLessThan(1e-9);
    expect(relative(r.heatFlowDensity, 25 / RT)).toBeLessThan(1e-9);
    // ISO 6946 final value to 2 significant figures (from memory).
    expect(r.uValueRounded).toBe(Number((1 / RT).toPrecision(2)));
    expect(r.layers[3]!.airLayer).toEqual({ resistance: 0.18, method: 'table' });
  });

  it('layer resistances, surface and interface temperatures follow θ = θ_i − q·ΣR (series formula)', () => {
    const r = calculateWall(wall([layer(plaster, 0.013), layer(wool, 0.1), layer(brick, 0.1025)]));
    const R = [0.013 / 0.4, 0.1 / 0.035, 0.1025 / 0.77];
    const RT = 0.13 + R[0]! + R[1]! + R[2]! + 0.04;
    const q = 25 / RT;
    r.layers.forEach((l, j) => expect(relative(l.thermalResistance!, R[j]!)).toBeLessThan(1e-9));
    expect(Math.abs(r.insideSurfaceTemperature - (20 - q * 0.13))).toBeLessThan(1e-9);
    expect(Math.abs(r.interfaceTemperatures[0]! - (20 - q * (0.13 + R[0]!)))).toBeLessThan(1e-9);
    expect(Math.abs(r.interfaceTemperatures[1]! - (20 - q * (0.13 + R[0]! + R[1]!)))).toBeLessThan(1e-9);
    expect(Math.abs(r.outsideSurfaceTemperature - (-5 + q * 0.04))).toBeLessThan(1e-9);
    expect(r.energyBalance.relativeResidual).toBeLessThan(1e-12);
  });

  it('the standard surface resistances per heat-flow direction: R_si 0.10 / 0.13 / 0.17, R_se 0.04', () => {
    // ISO 6946 surface resistance table (confirmed on a secondary page reproducing it).
    const expected = { upward: 0.1, horizontal: 0.13, downward: 0.17 } as const;
    for (const direction of ['upward', 'horizontal', 'downward'] as const) {
      const r = calculateWall(wall([layer(wool, 0.1)], { heatFlowDirection: direction }));
      expect(r.insideSurfaceResistance).toBe(expected[direction]);
      expect(r.outsideSurfaceResistance).toBe(0.04);
      expect(relative(r.uValue, 1 / (expected[direction] + 0.1 / 0.035 + 0.04))).toBeLessThan(1e-9);
    }
  });

  it('given surface resistances replace the table values', () => {
    const r = calculateWall(wall([layer(wool, 0.1)], { surfaceResistances: { inside: 0.2, outside: 0.1 } }));
    expect(relative(r.uValue, 1 / (0.2 + 0.1 / 0.035 + 0.1))).toBeLessThan(1e-9);
  });

  it('air layers take the ISO 6946 table values for their thickness and direction (from memory)', () => {
    // Table: 50 mm upward 0.16; 100 mm downward 0.22; 5 mm any 0.11; 15 mm horizontal 0.17.
    const cases = [
      { d: 0.05, dir: 'upward', R: 0.16 },
      { d: 0.1, dir: 'downward', R: 0.22 },
      { d: 0.005, dir: 'horizontal', R: 0.11 },
      { d: 0.015, dir: 'horizontal', R: 0.17 },
    ] as const;
    for (const c of cases) {
      const r = calculateWall(
        wall([layer(wool, 0.1), { kind: 'air-layer', thickness: c.d, ventilation: 'unventilated' }, layer(brick, 0.1)], { heatFlowDirection: c.dir }),
      );
      expect(r.layers[1]!.thermalResistance).toBeCloseTo(c.R, 12);
      const rsi = { upward: 0.1, horizontal: 0.13, downward: 0.17 }[c.dir];
      expect(relative(r.totalResistance, rsi + 0.1 / 0.035 + c.R + 0.1 / 0.77 + 0.04)).toBeLessThan(1e-9);
    }
  });

  it('a low-emissivity cavity face switches to the annex formula and raises R_g', () => {
    const r = calculateWall(
      wall([layer(wool, 0.1), { kind: 'air-layer', thickness: 0.025, ventilation: 'unventilated', emissivities: [0.9, 0.05] }, layer(brick, 0.1)]),
    );
    expect(r.layers[1]!.airLayer!.method).toBe('formula');
    expect(r.layers[1]!.thermalResistance!).toBeGreaterThan(0.18 * 2.5);
  });

  it('well ventilated layer: the layer and everything outside it are ignored, R_se = R_si of the direction (ISO 6946, from memory)', () => {
    const r = calculateWall(
      wall([
        layer(plaster, 0.013),
        layer(wool, 0.14),
        { kind: 'air-layer', thickness: 0.025, ventilation: 'well-ventilated', openingArea: 2000 },
        layer(material('timber cladding', 0.13, 50), 0.02),
      ]),
    );
    const RT = 0.13 + 0.013 / 0.4 + 0.14 / 0.035 + 0.13;
    expect(relative(r.uValue, 1 / RT)).toBeLessThan(1e-9);
    expect(r.outsideSurfaceResistance).toBe(0.13);
    expect(r.layers[2]!.included).toBe(false);
    expect(r.layers[3]!.included).toBe(false);
    expect(r.layers[3]!.thermalResistance).toBeNull();
    expect(r.ventilation.rule).toBe('well-ventilated');
  });

  it('slightly ventilated layer: R_T = (1500 − A_v)/1000·R_T,u + (A_v − 500)/1000·R_T,v (ISO 6946, from memory)', () => {
    const cladding = material('timber cladding', 0.13, 50);
    const A = 800;
    const r = calculateWall(
      wall([layer(wool, 0.1), { kind: 'air-layer', thickness: 0.025, ventilation: 'slightly-ventilated', openingArea: A }, layer(cladding, 0.02)]),
    );
    const RTu = 0.13 + 0.1 / 0.035 + 0.18 + 0.02 / 0.13 + 0.04;
    const RTv = 0.13 + 0.1 / 0.035 + 0.13;
    const RT = ((1500 - A) / 1000) * RTu + ((A - 500) / 1000) * RTv;
    expect(relative(r.totalResistance, RT)).toBeLessThan(1e-9);
    expect(relative(r.uValueFromHeatFlow!, 1 / RT)).toBeLessThan(1e-9);
    // The inner layers keep their own resistance; only the part from the air layer outwards is scaled.
    expect(relative(r.layers[0]!.thermalResistance!, 0.1 / 0.035)).toBeLessThan(1e-9);
  });

  it('a temperature-dependent conductivity: U from the heat flow equals 1/R_T assembled from the layer results', () => {
    const curve: ConductivityModel = { kind: 'polynomial', coefficients: [0.033, 1.5e-4] };
    const r = calculateWall(wall([layer(plaster, 0.013), { material: { ...wool, conductivity: curve }, thickness: 0.1 }]));
    expect(relative(r.uValueFromHeatFlow!, r.uValue)).toBeLessThan(1e-9);
    // Kirchhoff: the integral-mean λ over the layer's range is a0 + a1·(θ1 + θ2)/2 (Kirchhoff transform, Carslaw & Jaeger §1.7).
    const l = r.layers[1]!;
    expect(relative(l.effectiveConductivity!, 0.033 + 1.5e-4 * ((l.innerTemperature! + l.outerTemperature!) / 2))).toBeLessThan(1e-8);
  });

  it('equal inside and outside temperatures still give U (no heat flows, U from the resistances)', () => {
    const r = calculateWall(wall([layer(wool, 0.1)], { outside: { temperature: 20, relativeHumidity: 0.5 } }));
    expect(r.uValueFromHeatFlow).toBeNull();
    expect(relative(r.uValue, 1 / (0.13 + 0.1 / 0.035 + 0.04))).toBeLessThan(1e-9);
    expect(r.heatFlow).toBe(0);
  });

  it('heat flow through the element is q·A', () => {
    const r = calculateWall(wall([layer(wool, 0.1)], { area: 12.5 }));
    expect(relative(r.heatFlow, 12.5 * r.heatFlowDensity)).toBeLessThan(1e-12);
  });

  it('rounds to 2 significant figures', () => {
    expect(roundToSignificantFigures(0.3642, 2)).toBe(0.36);
    expect(roundToSignificantFigures(0.1692, 2)).toBe(0.17);
    expect(roundToSignificantFigures(1.2345, 2)).toBe(1.2);
    expect(roundToSignificantFigures(0.0996, 2)).toBe(0.1);
  });
});
