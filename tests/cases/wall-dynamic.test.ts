/**
 * The wall kind's dynamic thermal characteristics (ISO 13786:2017, 24 h cycle): the wall result's
 * `dynamic` against the worked case computed by hand in tests/physics/periodic-response.test.ts
 * (200 mm concrete inside 100 mm EPS, R_si 0.13, R_se 0.04), the element it is built from (the
 * U-value's own layers, air layers as R_g, layers outside a well ventilated air layer left out),
 * the null result with its assumption when a layer lacks density or specific heat, and the report's
 * table.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { solveCase } from '../../app/index.js';
import { calculateWall, type WallInput, type WallLayer } from '../../app/cases/wall/wall.js';
import { DYNAMIC_TABLE } from '../../app/cases/wall/wall-dynamic-report.js';
import type { MaterialProperties } from '../../app/materials/material-properties.js';
import { periodicResponse } from '../../app/physics/index.js';
import type { ReportTable } from '../../app/report/report-model.js';
import { caseContext } from '../../main/cases/case-context.js';

const root = path.resolve(__dirname, '..', '..');

function material(name: string, conductivity: number, density: number | null, specificHeat: number | null): MaterialProperties {
  return {
    name,
    category: 'building',
    conductivity: { kind: 'constant', value: conductivity },
    density,
    specificHeat,
    vapourResistanceFactor: 10,
    equivalentAirLayerThickness: null,
    emissivity: null,
    minServiceTemperature: null,
    maxServiceTemperature: null,
  };
}

const layer = (m: MaterialProperties, thickness: number): WallLayer => ({ material: m, thickness });
const wall = (layers: readonly WallLayer[]): WallInput => ({
  layers,
  heatFlowDirection: 'horizontal',
  inside: { temperature: 20, relativeHumidity: 0.5 },
  outside: { temperature: -5, relativeHumidity: 0.85 },
});

// Generic values (reference notes §5.1, ISO 10456 style, from memory): test data only.
const concrete = material('concrete', 2.0, 2400, 1000);
const eps = material('EPS', 0.035, 20, 1450);
const brick = material('clay brick', 0.77, 1700, 1000);
const cladding = material('timber cladding', 0.13, null, null);

describe('the wall result carries the ISO 13786 characteristics for a 24 h cycle', () => {
  it('200 mm concrete inside 100 mm EPS with the standard R_si 0.13 and R_se 0.04: the figures worked by hand (ISO 13786:2017)', () => {
    const r = calculateWall(wall([layer(concrete, 0.2), layer(eps, 0.1)]));
    const d = r.dynamic!;
    expect(d.period).toBe(86_400);
    // Hand-worked figures: tests/physics/periodic-response.test.ts, worked case 2.
    expect(d.uValue).toBeCloseTo(0.31978072, 8);
    expect(d.uValue).toBeCloseTo(r.uValue, 12);
    expect(d.periodicTransmittance.amplitude).toBeCloseTo(0.055310207, 8);
    expect(d.periodicTransmittance.timeShift / 3600).toBeCloseTo(-7.6893245, 6);
    expect(d.decrementFactor).toBeCloseTo(0.17296292, 7);
    expect(d.insideArealHeatCapacity / 1000).toBeCloseTo(83.748561, 5);
    expect(d.outsideArealHeatCapacity / 1000).toBeCloseTo(5.3476838, 6);
    expect('matrix' in d).toBe(false);
  });

  it('an unventilated air layer enters as its R_g, and f = |Y_ie|/U with the wall’s own U', () => {
    const r = calculateWall(wall([layer(concrete, 0.1), layer(eps, 0.08), { kind: 'air-layer', thickness: 0.05, ventilation: 'unventilated' }, layer(brick, 0.1)]));
    const rg = r.layers[2]!.thermalResistance!;
    expect(rg).toBeCloseTo(0.18, 12); // ISO 6946 table, 50 mm horizontal (from memory)
    const expected = periodicResponse({
      layers: [
        { kind: 'material', thickness: 0.1, conductivity: 2.0, density: 2400, specificHeat: 1000 },
        { kind: 'material', thickness: 0.08, conductivity: 0.035, density: 20, specificHeat: 1450 },
        { kind: 'resistance', resistance: rg },
        { kind: 'material', thickness: 0.1, conductivity: 0.77, density: 1700, specificHeat: 1000 },
      ],
      insideSurfaceResistance: 0.13,
      outsideSurfaceResistance: 0.04,
    });
    const d = r.dynamic!;
    expect(d.periodicTransmittance.amplitude).toBeCloseTo(expected.periodicTransmittance.amplitude, 12);
    expect(d.periodicTransmittance.timeShift).toBeCloseTo(expected.periodicTransmittance.timeShift, 6);
    expect(d.insideAdmittance.amplitude).toBeCloseTo(expected.insideAdmittance.amplitude, 10);
    expect(d.decrementFactor).toBeCloseTo(d.periodicTransmittance.amplitude / r.uValue, 12);
  });

  it('layers outside a well ventilated air layer are left out, as for the U-value, and need no heat capacity', () => {
    const r = calculateWall(wall([layer(concrete, 0.2), layer(eps, 0.1), { kind: 'air-layer', thickness: 0.025, ventilation: 'well-ventilated' }, layer(cladding, 0.02)]));
    const d = r.dynamic!;
    expect(d).not.toBeNull();
    expect(d.uValue).toBeCloseTo(r.uValue, 12);
    // ISO 6946: the outside surface resistance becomes the inside one for the same direction (0.13).
    const expected = periodicResponse({
      layers: [
        { kind: 'material', thickness: 0.2, conductivity: 2.0, density: 2400, specificHeat: 1000 },
        { kind: 'material', thickness: 0.1, conductivity: 0.035, density: 20, specificHeat: 1450 },
      ],
      insideSurfaceResistance: 0.13,
      outsideSurfaceResistance: r.outsideSurfaceResistance,
    });
    expect(r.outsideSurfaceResistance).toBeCloseTo(0.13, 12);
    expect(d.periodicTransmittance.amplitude).toBeCloseTo(expected.periodicTransmittance.amplitude, 12);
  });

  it('a counted layer without density or specific heat: no characteristics, and the report says which layer and what it lacks', () => {
    const input = wall([layer(concrete, 0.2), layer(material('render', 1.0, 1800, null), 0.015), layer(material('mystery board', 0.2, null, null), 0.012)]);
    expect(calculateWall(input).dynamic).toBeNull();
    const json = {
      kind: 'wall',
      schemaVersion: 1,
      heatFlowDirection: 'horizontal',
      inside: input.inside,
      outside: input.outside,
      layers: input.layers.map((l) => ('material' in l ? { thickness: l.thickness, material: { ...l.material, conductivity: 1, vapourResistanceFactor: 10 } } : l)),
    };
    const solved = solveCase(json, caseContext(null));
    expect(solved.report.sections.some((s) => s.id === 'dynamic')).toBe(false);
    expect(solved.report.assumptions).toContain(
      'The dynamic thermal characteristics (ISO 13786) are not given: layer "render" has no specific heat and layer "mystery board" has no density or specific heat; the periodic calculation needs both for every layer but an air layer.',
    );
  });
});

describe('the wall report', () => {
  it('the masonry cavity example shows the table "Dynamic thermal characteristics (ISO 13786, 24 h cycle)" and names the standard', () => {
    const json = JSON.parse(readFileSync(path.join(root, 'data', 'examples', 'wall-masonry-cavity.json'), 'utf8'));
    const solved = solveCase(json, caseContext(null));
    const result = solved.result as { wall: { dynamic: { periodicTransmittance: { amplitude: number; timeShift: number }; decrementFactor: number } | null } };
    const d = result.wall.dynamic!;
    const section = solved.report.sections.find((s) => s.id === 'dynamic')!;
    const table = section.blocks.find((b): b is { kind: 'table'; table: ReportTable } => b.kind === 'table')!.table;
    expect(table.title).toBe(DYNAMIC_TABLE);
    expect(table.columns.map((c) => c.quantity)).toEqual([undefined, 'thermalAdmittance', 'timeHours']);
    expect(table.rows.map((r) => r[0])).toEqual(['periodic thermal transmittance Y_ie', 'inside thermal admittance Y_ii', 'outside thermal admittance Y_ee']);
    expect(table.rows[0]![1]).toEqual({ value: d.periodicTransmittance.amplitude, quantity: 'thermalAdmittance' });
    expect(table.rows[0]![2]).toEqual({ value: d.periodicTransmittance.timeShift, quantity: 'timeHours' });
    // A masonry wall delays the daily wave by hours and damps it well below the steady U.
    expect(d.periodicTransmittance.timeShift).toBeLessThan(-3 * 3600);
    expect(d.decrementFactor).toBeGreaterThan(0);
    expect(d.decrementFactor).toBeLessThan(1);
    expect(solved.report.sources.some((s) => s.includes('ISO 13786:2017'))).toBe(true);
  });
});
