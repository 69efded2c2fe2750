import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { FilmCoefficient } from '../../app/fe/problem.js';
import {
  combinedConvection,
  forcedConvectionCylinder,
  forcedConvectionPlate,
  InputError,
  naturalConvectionHorizontalCylinder,
  naturalConvectionVerticalSurface,
  outerSurfaceExchange,
  radiationCoefficient,
  simplifiedConvection,
  type OuterSurfaceSpec,
} from '../../app/physics/index.js';
import { thrownBy } from './thrown-error.js';

const horizontalPipeIndoors: OuterSurfaceSpec = {
  shape: { kind: 'pipe', orientation: 'horizontal', outerDiameter: 0.15 },
  exposure: { kind: 'indoor' },
  method: { kind: 'correlations' },
  airTemperature: 20,
  emissivity: 0.9,
};

function fieldOf(action: () => unknown): string {
  const error = thrownBy(action);
  expect(error).toBeInstanceOf(InputError);
  return (error as InputError).field;
}

describe('outer surface exchange', () => {
  it('is a FilmCoefficient the FE engine accepts', () => {
    // Type-level check against app/fe/problem.ts: the returned function may be passed as a film coefficient.
    const coefficient: FilmCoefficient = outerSurfaceExchange(horizontalPipeIndoors);
    expect(typeof coefficient).toBe('function');
  });

  it('indoor pipe: h = h_c (Churchill–Chu) + h_r, sink = air when the surroundings are at the air temperature', () => {
    const exchange = outerSurfaceExchange(horizontalPipeIndoors)(45);
    const hc = naturalConvectionHorizontalCylinder({ surfaceTemperature: 45, airTemperature: 20, diameter: 0.15 }).coefficient;
    const hr = radiationCoefficient(0.9, 45, 20);
    expect(exchange.convection).toBeCloseTo(hc, 12);
    expect(exchange.radiation).toBeCloseTo(hr, 12);
    expect(exchange.coefficient).toBeCloseTo(hc + hr, 12);
    expect(exchange.ambient).toBeCloseTo(20, 12);
    // Plausibility (common practice, no source): an indoor painted pipe surface sees h_se of roughly 8–12 W/(m²·K).
    expect(exchange.coefficient).toBeGreaterThan(8);
    expect(exchange.coefficient).toBeLessThan(12);
  });

  it('surroundings at another temperature move the sink: θ = (h_c θ_a + h_r θ_r)/(h_c + h_r)', () => {
    const exchange = outerSurfaceExchange({ ...horizontalPipeIndoors, surroundingsTemperature: 5 })(45);
    expect(exchange.ambient).toBeCloseTo((exchange.convection * 20 + exchange.radiation * 5) / exchange.coefficient, 12);
    // Heat balance identity: h(θ_s − θ_sink) = h_c(θ_s − θ_a) + h_r(θ_s − θ_r).
    expect(exchange.coefficient * (45 - exchange.ambient)).toBeCloseTo(exchange.convection * 25 + exchange.radiation * 40, 9);
  });

  it('ε = 0 gives no radiation and the air as the sink', () => {
    const exchange = outerSurfaceExchange({ ...horizontalPipeIndoors, emissivity: 0, surroundingsTemperature: -30 })(60);
    expect(exchange.radiation).toBe(0);
    expect(exchange.ambient).toBeCloseTo(20, 12);
  });

  it('guards h_c + h_r = 0: coefficient 0 and the air as the sink, never NaN', () => {
    const exchange = outerSurfaceExchange({
      ...horizontalPipeIndoors,
      method: { kind: 'fixed-convection', coefficient: 0 },
      emissivity: 0,
    })(30);
    expect(exchange.coefficient).toBe(0);
    expect(exchange.ambient).toBe(20);
  });

  it('the effective sink lies between the air and the surroundings (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -40, max: 300, noNaN: true }),
        fc.double({ min: -30, max: 40, noNaN: true }),
        fc.double({ min: -40, max: 40, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 15, noNaN: true }),
        (surface, air, surroundings, emissivity, windSpeed) => {
          const exchange = outerSurfaceExchange({
            shape: { kind: 'pipe', orientation: 'horizontal', outerDiameter: 0.1 },
            exposure: { kind: 'outdoor', windSpeed },
            method: { kind: 'correlations' },
            airTemperature: air,
            surroundingsTemperature: surroundings,
            emissivity,
          })(surface);
          const slack = 1e-9 * (1 + Math.abs(air) + Math.abs(surroundings));
          expect(exchange.ambient).toBeGreaterThanOrEqual(Math.min(air, surroundings) - slack);
          expect(exchange.ambient).toBeLessThanOrEqual(Math.max(air, surroundings) + slack);
          expect(Number.isFinite(exchange.coefficient)).toBe(true);
          expect(exchange.coefficient).toBeGreaterThanOrEqual(0);
        },
      ),
    );
  });

  it('h_r rises with the surface temperature (property)', () => {
    const f = outerSurfaceExchange({ ...horizontalPipeIndoors, surroundingsTemperature: 10 });
    fc.assert(
      fc.property(fc.double({ min: -40, max: 300, noNaN: true }), fc.double({ min: 0.5, max: 50, noNaN: true }), (surface, step) => {
        expect(f(surface + step).radiation).toBeGreaterThan(f(surface).radiation);
      }),
    );
  });

  it('outdoors, convection combines wind and buoyancy (n = 3) and exceeds each part', () => {
    const spec: OuterSurfaceSpec = { ...horizontalPipeIndoors, exposure: { kind: 'outdoor', windSpeed: 2 }, airTemperature: 0 };
    const exchange = outerSurfaceExchange(spec)(20);
    const condition = { surfaceTemperature: 20, airTemperature: 0, diameter: 0.15 };
    const natural = naturalConvectionHorizontalCylinder(condition);
    const forced = forcedConvectionCylinder({ ...condition, windSpeed: 2 });
    expect(exchange.convection).toBeCloseTo(combinedConvection(forced, natural).coefficient, 12);
    expect(exchange.convection).toBeGreaterThanOrEqual(natural.coefficient);
    expect(exchange.convection).toBeGreaterThanOrEqual(forced.coefficient);
    // Wind 0 outdoors is still air.
    const still = outerSurfaceExchange({ ...spec, exposure: { kind: 'outdoor', windSpeed: 0 } })(20);
    expect(still.convection).toBeCloseTo(natural.coefficient, 12);
  });

  it('walls and vertical pipes use the vertical-surface correlation, wind along the wall', () => {
    const wall = outerSurfaceExchange({
      shape: { kind: 'vertical-wall', height: 2.5 },
      exposure: { kind: 'outdoor', windSpeed: 3 },
      method: { kind: 'correlations' },
      airTemperature: -5,
      emissivity: 0.9,
    })(2);
    const natural = naturalConvectionVerticalSurface({ surfaceTemperature: 2, airTemperature: -5, height: 2.5 });
    const forced = forcedConvectionPlate({ surfaceTemperature: 2, airTemperature: -5, length: 2.5, windSpeed: 3 });
    expect(wall.convection).toBeCloseTo(Math.cbrt(natural.coefficient ** 3 + forced.coefficient ** 3), 12);
    const riser = outerSurfaceExchange({
      shape: { kind: 'pipe', orientation: 'vertical', outerDiameter: 0.2, height: 3 },
      exposure: { kind: 'indoor' },
      method: { kind: 'correlations' },
      airTemperature: 20,
      emissivity: 0.9,
    })(50);
    const plate = naturalConvectionVerticalSurface({ surfaceTemperature: 50, airTemperature: 20, height: 3, diameter: 0.2 });
    expect(riser.convection).toBeCloseTo(plate.coefficient, 12);
  });

  it('horizontal surfaces use the facing and the sign of θ_s − θ_a', () => {
    const surface = (facing: 'up' | 'down') =>
      outerSurfaceExchange({
        shape: { kind: 'horizontal-surface', facing, characteristicLength: 0.5 },
        exposure: { kind: 'indoor' },
        method: { kind: 'correlations' },
        airTemperature: 20,
        emissivity: 0.9,
      })(50);
    expect(surface('up').convection).toBeGreaterThan(surface('down').convection);
  });

  it('the simplified method uses the trade formulas, keeping the still-air value as a floor in wind', () => {
    const simplified: OuterSurfaceSpec = { ...horizontalPipeIndoors, method: { kind: 'simplified' } };
    const indoor = outerSurfaceExchange(simplified)(50);
    expect(indoor.convection).toBeCloseTo(
      simplifiedConvection({ case: 'horizontal-pipe-natural', temperatureDifference: 30, length: 0.15 }).coefficient,
      12,
    );
    const windy = outerSurfaceExchange({ ...simplified, exposure: { kind: 'outdoor', windSpeed: 5 } })(50);
    expect(windy.convection).toBeCloseTo(
      simplifiedConvection({ case: 'pipe-wind', temperatureDifference: 30, length: 0.15, windSpeed: 5 }).coefficient,
      12,
    );
    expect(windy.warnings.length).toBe(1); // caution on the turbulent pipe-in-wind row
    const breeze = outerSurfaceExchange({ ...simplified, exposure: { kind: 'outdoor', windSpeed: 1e-4 } })(50);
    expect(breeze.convection).toBeCloseTo(indoor.convection, 12);
    expect(fieldOf(() =>
      outerSurfaceExchange({
        ...simplified,
        shape: { kind: 'horizontal-surface', facing: 'up', characteristicLength: 1 },
      }),
    )).toBe('method');
  });

  it('fixed coefficient and fixed resistance replace the whole film to the air', () => {
    const fixed = outerSurfaceExchange({ ...horizontalPipeIndoors, method: { kind: 'fixed-coefficient', coefficient: 10 } })(70);
    expect(fixed).toMatchObject({ coefficient: 10, ambient: 20, radiation: 0 });
    const resistance = outerSurfaceExchange({ ...horizontalPipeIndoors, method: { kind: 'fixed-resistance', resistance: 0.04 } })(70);
    expect(resistance.coefficient).toBeCloseTo(25, 12);
    const convectionOnly = outerSurfaceExchange({ ...horizontalPipeIndoors, method: { kind: 'fixed-convection', coefficient: 4 } })(70);
    expect(convectionOnly.coefficient).toBeCloseTo(4 + radiationCoefficient(0.9, 70, 20), 12);
  });

  it('bad inputs give one sentence naming the field and the allowed range', () => {
    const bad = (patch: Partial<OuterSurfaceSpec>) => () => outerSurfaceExchange({ ...horizontalPipeIndoors, ...patch });
    expect(bad({ emissivity: 1.5 })).toThrow('emissivity must be between 0 and 1 (got 1.5).');
    expect(fieldOf(bad({ emissivity: -0.2 }))).toBe('emissivity');
    expect(bad({ exposure: { kind: 'outdoor', windSpeed: -3 } })).toThrow('exposure.windSpeed must be 0 m/s or more (got -3).');
    expect(bad({ shape: { kind: 'pipe', orientation: 'horizontal', outerDiameter: 0 } })).toThrow(
      'shape.outerDiameter must be greater than 0 m (got 0).',
    );
    expect(fieldOf(bad({ shape: { kind: 'pipe', orientation: 'horizontal', outerDiameter: -0.1 } }))).toBe('shape.outerDiameter');
    expect(fieldOf(bad({ shape: { kind: 'pipe', orientation: 'vertical', outerDiameter: 0.1 } }))).toBe('shape.height');
    expect(fieldOf(bad({ shape: { kind: 'vertical-wall', height: Number.NaN } }))).toBe('shape.height');
    expect(fieldOf(bad({ airTemperature: -400 }))).toBe('airTemperature');
    expect(fieldOf(bad({ method: { kind: 'fixed-resistance', resistance: 0 } }))).toBe('method.resistance');
    expect(fieldOf(bad({ method: { kind: 'guess' } as never }))).toBe('method.kind');
    expect(fieldOf(bad({ emissivity: undefined }))).toBe('emissivity');
    expect(fieldOf(() => outerSurfaceExchange(horizontalPipeIndoors)(Number.NaN))).toBe('surfaceTemperature');
  });
});
