import { describe, expect, it } from 'vitest';
import { calculateFlatSurface } from '../../app/cases/flat/flat-surface-calculation.js';
import type { FlatSurfaceInput } from '../../app/cases/flat/flat-surface-input.js';
import { outerSurfaceExchange } from '../../app/physics/index.js';
import { aluminium, inputErrorOf, material, mineralWool, steel, tankWall } from './pipe-fixtures.js';

describe('flat surface against the series-resistance formula q = Δθ / (1/h_i + Σ d/λ + 1/h_se) (Incropera, Fundamentals of Heat and Mass Transfer, ch. 3, composite plane wall)', () => {
  const input = tankWall({
    layers: [
      { material: material('Inner slab', 0.045, { emissivity: 0.9 }), thickness: 0.08 },
      { material: material('Outer slab', 0.037, { emissivity: 0.9 }), thickness: 0.05 },
    ],
    surfaceMethod: { kind: 'fixed-coefficient', coefficient: 18 },
    area: 64,
    operatingHours: 3000,
  });
  const layers = 0.008 / 50 + 0.08 / 0.045 + 0.05 / 0.037 + 0.0009 / 160;

  it('fluid inside and a fixed outer coefficient: heat flow density, totals and temperatures within 1e-6', () => {
    const q = (85 - 5) / (1 / 300 + layers + 1 / 18);
    const result = calculateFlatSurface(input);
    expect(Math.abs(result.heatFlowDensity - q) / q).toBeLessThan(1e-6);
    expect(result.heatLoss).toBeCloseTo(result.heatFlowDensity * 64, 9);
    expect(result.annualEnergy).toBeCloseTo((result.heatFlowDensity * 64 * 3000) / 1000, 6);
    expect(Math.abs(result.innerSurfaceTemperature - (85 - q / 300))).toBeLessThan(1e-6);
    expect(Math.abs(result.surfaceTemperature - (5 + q / 18))).toBeLessThan(1e-6);
    expect(Math.abs(result.interfaces[1]!.temperature - (85 - q * (1 / 300 + 0.008 / 50 + 0.08 / 0.045)))).toBeLessThan(1e-6);
    expect(Math.abs(result.layerResistance - layers) / layers).toBeLessThan(1e-9);
    expect(result.layers.map((l) => l.name)).toEqual(['wall (Steel)', 'insulation layer 1 (Inner slab)', 'insulation layer 2 (Outer slab)', 'jacket (Aluminium sheet)']);
    expect(result.energyBalance.relativeResidual).toBeLessThan(1e-9);
  });

  it('fixed inner surface temperature, no wall sheet', () => {
    const result = calculateFlatSurface({ ...input, wall: undefined, inner: { kind: 'surface', temperature: 85 } });
    const q = 80 / (layers - 0.008 / 50 + 1 / 18);
    expect(Math.abs(result.heatFlowDensity - q) / q).toBeLessThan(1e-6);
    expect(result.innerSurfaceTemperature).toBe(85);
  });
});

describe('flat surface with the surface physics', () => {
  it('the coefficient is outerSurfaceExchange at the converged surface temperature (vertical wall in wind)', () => {
    const result = calculateFlatSurface(tankWall());
    const exchange = outerSurfaceExchange({
      shape: { kind: 'vertical-wall', height: 6 },
      exposure: { kind: 'outdoor', windSpeed: 3 },
      method: { kind: 'correlations' },
      airTemperature: 5,
      emissivity: 0.13,
    })(result.surfaceTemperature);
    expect(result.surfaceCoefficient.total).toBeCloseTo(exchange.coefficient, 12);
    expect(result.surfaceCoefficient.convection).toBeCloseTo(exchange.convection, 12);
    expect(result.surfaceCoefficient.radiation).toBeCloseTo(exchange.radiation, 12);
    const q = exchange.coefficient * (result.surfaceTemperature - exchange.ambient);
    expect(Math.abs(q - result.heatFlowDensity) / q).toBeLessThan(1e-8);
  });

  it('a hot horizontal surface loses more facing up than facing down (buoyant plume rises freely from a hot upper face; Incropera ch. 9, horizontal plates)', () => {
    const horizontal = (facing: 'up' | 'down'): FlatSurfaceInput =>
      tankWall({ surface: { kind: 'horizontal', facing, characteristicLength: 1 }, ambient: { airTemperature: 20, relativeHumidity: 0.5, exposure: { kind: 'indoor' } } });
    const up = calculateFlatSurface(horizontal('up'));
    const down = calculateFlatSurface(horizontal('down'));
    expect(up.surfaceCoefficient.convection).toBeGreaterThan(down.surfaceCoefficient.convection);
    expect(up.heatFlowDensity).toBeGreaterThan(down.heatFlowDensity);
  });

  it('emissivity 0: no radiation', () => {
    const result = calculateFlatSurface(tankWall({ jacket: { material: aluminium, thickness: 0.0009, emissivity: 0 } }));
    expect(result.surfaceCoefficient.radiation).toBe(0);
  });

  it('heat flow falls strictly with insulation thickness and rises with the inner temperature', () => {
    let previous = Infinity;
    for (const t of [0.02, 0.04, 0.06, 0.08, 0.1, 0.15, 0.2, 0.3]) {
      const q = calculateFlatSurface(tankWall({ layers: [{ material: mineralWool, thickness: t }] })).heatFlowDensity;
      expect(q).toBeLessThan(previous);
      previous = q;
    }
    previous = -Infinity;
    for (let t = 20; t <= 240; t += 20) {
      const q = calculateFlatSurface(tankWall({ inner: { kind: 'fluid', temperature: t, coefficient: 300 } })).heatFlowDensity;
      expect(q).toBeGreaterThan(previous);
      previous = q;
    }
  });
});

describe('flat surface input errors', () => {
  const cases: [string, FlatSurfaceInput, string, RegExp][] = [
    ['area 0', tankWall({ area: 0 }), 'area', /greater than 0 m²/],
    ['negative height', tankWall({ surface: { kind: 'vertical', height: -1 } }), 'surface.height', /at least 0\.01 and at most 1000 m/],
    ['unknown facing', tankWall({ surface: { kind: 'horizontal', facing: 'sideways' as never, characteristicLength: 1 } }), 'surface.facing', /'up', 'down'/],
    ['simplified formulas on a horizontal surface', tankWall({ surface: { kind: 'horizontal', facing: 'up', characteristicLength: 1 }, surfaceMethod: { kind: 'simplified' } }), 'surfaceMethod.kind', /no formula for a horizontal surface/],
    ['wall thickness 0', tankWall({ wall: { material: steel, thickness: 0 } }), 'wall.thickness', /at least 0\.000001 and at most 2 m/],
    ['relative humidity 1.2', tankWall({ ambient: { airTemperature: 5, relativeHumidity: 1.2, exposure: { kind: 'indoor' } } }), 'ambient.relativeHumidity', /0 up to 100 %/],
    ['wind below 0', tankWall({ ambient: { airTemperature: 5, relativeHumidity: 0.8, exposure: { kind: 'outdoor', windSpeed: -3 } } }), 'ambient.exposure.windSpeed', /between 0 m\/s and 60 m\/s/],
    ['jacket emissivity 1.5', tankWall({ jacket: { material: aluminium, thickness: 0.001, emissivity: 1.5 } }), 'jacket.emissivity', /between 0 and 1/],
  ];
  for (const [what, input, field, range] of cases) {
    it(what, () => {
      const error = inputErrorOf(() => calculateFlatSurface(input));
      expect(error.field).toBe(field);
      expect(error.message).toMatch(range);
    });
  }
});
