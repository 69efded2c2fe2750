import { describe, expect, it } from 'vitest';
import airLayerTable from '../../data/physics/iso6946-air-layers.json' with { type: 'json' };
import {
  airLayerResistance,
  airLayerResistanceFromTable,
  airLayerVentilation,
  effectiveEmittance,
  InputError,
  slightlyVentilatedTotalResistance,
  standardSurfaceResistances,
  wellVentilatedOutsideResistance,
} from '../../app/physics/index.js';

const DIRECTIONS = ['upward', 'horizontal', 'downward'] as const;

describe('unventilated air layers (ISO 6946)', () => {
  it('the table is labelled as recalled', () => {
    expect(airLayerTable.label).toBe('from memory');
  });

  it('the formula R_g = 1/(h_a + E·h_r0) reproduces every table entry within ±0.005', () => {
    // ISO 6946 air-layer table and annex formula, both from memory (reference notes §2, [C] agreement ±0.005).
    for (const row of airLayerTable.rows) {
      for (const direction of DIRECTIONS) {
        const formula = airLayerResistance({ thickness: row.thickness / 1000, direction });
        expect(Math.abs(formula - row[direction])).toBeLessThanOrEqual(0.005);
      }
    }
  });

  it('the 25 mm horizontal entry by hand: 1/(1.25 + 0.818·5.15) = 0.183', () => {
    // E = 1/(1/0.9 + 1/0.9 − 1) = 0.818; h_r0 = 4σ(283.15 K)³ = 5.15 (reference notes §1.2, §2).
    expect(effectiveEmittance(0.9, 0.9)).toBeCloseTo(0.8182, 4);
    expect(airLayerResistance({ thickness: 0.025, direction: 'horizontal' })).toBeCloseTo(1 / (1.25 + 0.8182 * 5.15), 3);
  });

  it('table lookup interpolates linearly between rows and hits the rows exactly', () => {
    expect(airLayerResistanceFromTable(0.025, 'downward')).toBeCloseTo(0.19, 12);
    expect(airLayerResistanceFromTable(0.0375, 'downward')).toBeCloseTo(0.2, 12);
    expect(airLayerResistanceFromTable(0, 'upward')).toBe(0);
  });

  it('a low-emissivity face raises the resistance sharply', () => {
    // E falls from 0.82 to about 0.05 with one foil face (ε = 0.05): radiation nearly vanishes.
    const foil = airLayerResistance({ thickness: 0.025, direction: 'horizontal', emissivities: [0.9, 0.05] });
    expect(foil).toBeGreaterThan(2.5 * airLayerResistance({ thickness: 0.025, direction: 'horizontal' }));
  });

  it('rejects layers thicker than 0.3 m and negative thickness', () => {
    expect(() => airLayerResistance({ thickness: 0.4, direction: 'upward' })).toThrow(InputError);
    expect(() => airLayerResistanceFromTable(-0.01, 'upward')).toThrow('thickness must be between 0 m and 0.3 m (got -0.01).');
  });
});

describe('ventilated air layers (ISO 6946 rules, from memory)', () => {
  it('classifies by opening area: ≤ 500 unventilated, ≤ 1500 slightly, above well ventilated', () => {
    expect(airLayerVentilation(0)).toBe('unventilated');
    expect(airLayerVentilation(500)).toBe('unventilated');
    expect(airLayerVentilation(1000)).toBe('slightly-ventilated');
    expect(airLayerVentilation(1500)).toBe('slightly-ventilated');
    expect(airLayerVentilation(1501)).toBe('well-ventilated');
    expect(() => airLayerVentilation(-1)).toThrow(/openingArea must be 0/);
  });

  it('slightly ventilated: R_T = (1500 − A_v)/1000·R_T,u + (A_v − 500)/1000·R_T,v', () => {
    expect(slightlyVentilatedTotalResistance(500, 3.0, 2.6)).toBeCloseTo(3.0, 12);
    expect(slightlyVentilatedTotalResistance(1500, 3.0, 2.6)).toBeCloseTo(2.6, 12);
    expect(slightlyVentilatedTotalResistance(1000, 3.0, 2.6)).toBeCloseTo(2.8, 12);
    expect(() => slightlyVentilatedTotalResistance(2000, 3, 2.6)).toThrow(/openingArea must be between 500/);
  });

  it('well ventilated: the outer surface resistance becomes R_si of the same direction', () => {
    expect(wellVentilatedOutsideResistance(standardSurfaceResistances('horizontal').inside)).toBe(0.13);
    expect(() => wellVentilatedOutsideResistance(0)).toThrow(InputError);
  });
});
