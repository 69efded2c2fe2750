import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { calculatePipe } from '../../app/cases/pipe/pipe-calculation.js';
import { VERTICAL_PIPE_DEFAULT_HEIGHT_CAP } from '../../app/cases/pipe/pipe-input.js';
import { conductivityAt } from '../../app/fe/conductivity.js';
import { outerSurfaceExchange, STEFAN_BOLTZMANN } from '../../app/physics/index.js';
import { aluminium, foam, hotPipe, material, mineralWool, steel } from './pipe-fixtures.js';

const TWO_PI = 2 * Math.PI;

describe('pipe against the logarithmic formula Q\' = Δθ / ΣR\' (Incropera, Fundamentals of Heat and Mass Transfer, ch. 3, radial conduction and composite cylinder)', () => {
  const D = 0.1683;
  const wall = 0.00711;
  const r0 = D / 2 - wall;
  const r1 = D / 2;
  const r2 = r1 + 0.06;
  const r3 = r2 + 0.04;
  const r4 = r3 + 0.0008;
  const layersResistance =
    Math.log(r1 / r0) / (TWO_PI * 50) + Math.log(r2 / r1) / (TWO_PI * 0.045) + Math.log(r3 / r2) / (TWO_PI * 0.035) + Math.log(r4 / r3) / (TWO_PI * 160);
  const input = hotPipe({
    pipe: { outerDiameter: D, wallThickness: wall, material: steel },
    inner: { kind: 'surface', temperature: 180 },
    layers: [
      { material: material('Inner wool', 0.045, { emissivity: 0.9 }), thickness: 0.06 },
      { material: material('Outer wool', 0.035, { emissivity: 0.9 }), thickness: 0.04 },
    ],
    jacket: { material: aluminium, thickness: 0.0008 },
    surfaceMethod: { kind: 'fixed-coefficient', coefficient: 12 },
    ambient: { airTemperature: 10, relativeHumidity: 0.7, exposure: { kind: 'indoor' } },
    length: 75,
    operatingHours: 5000,
  });

  it('fixed inner surface temperature and fixed outer film coefficient: heat loss, surface and interface temperatures within 1e-6', () => {
    const outerFilm = 1 / (12 * Math.PI * 2 * r4);
    const q = (180 - 10) / (layersResistance + outerFilm);
    const result = calculatePipe(input);
    expect(Math.abs(result.heatLossPerMetre - q) / q).toBeLessThan(1e-6);
    expect(result.heatLoss).toBeCloseTo(result.heatLossPerMetre * 75, 9);
    expect(result.annualEnergy).toBeCloseTo((result.heatLossPerMetre * 75 * 5000) / 1000, 6);
    expect(result.outerDiameter).toBeCloseTo(2 * r4, 14);
    expect(Math.abs(result.heatFlowDensityAtSurface - q / (Math.PI * 2 * r4)) / q).toBeLessThan(1e-6);
    expect(Math.abs(result.surfaceTemperature - (10 + q * outerFilm))).toBeLessThan(1e-6);
    // Each interface sits after the resistances inside it: θ_j = θ_i − Q'·Σ_{k<j} R'_k.
    const expected = [
      180 - q * (Math.log(r1 / r0) / (TWO_PI * 50)),
      180 - q * (Math.log(r1 / r0) / (TWO_PI * 50) + Math.log(r2 / r1) / (TWO_PI * 0.045)),
      180 - q * (layersResistance - Math.log(r4 / r3) / (TWO_PI * 160)),
    ];
    expect(result.interfaces.map((i) => [i.innerLayer, i.outerLayer])).toEqual([
      ['pipe wall (Steel)', 'insulation layer 1 (Inner wool)'],
      ['insulation layer 1 (Inner wool)', 'insulation layer 2 (Outer wool)'],
      ['insulation layer 2 (Outer wool)', 'jacket (Aluminium sheet)'],
    ]);
    result.interfaces.forEach((f, i) => expect(Math.abs(f.temperature - expected[i]!)).toBeLessThan(1e-6));
    expect(result.interfaces.map((i) => i.position)).toEqual([r1, r2, r3].map((r) => expect.closeTo(r, 14)));
    // With a fixed coefficient the split is all "convection" (the user's h_se), no radiation term.
    expect(result.surfaceCoefficient).toEqual({ total: 12, convection: 12, radiation: 0, sinkTemperature: 10 });
    expect(result.emissivity).toBeNull();
    expect(result.energyBalance.relativeResidual).toBeLessThan(1e-9);
    // The film reaches the engine as a function, which it cannot know is constant: one solve, and one that confirms no change.
    expect(result.iterations).toBe(2);
  });

  it('fluid inside with a film coefficient adds 1/(h_i·π·d_i) to the series (Incropera ch. 3)', () => {
    const result = calculatePipe({ ...input, inner: { kind: 'fluid', temperature: 180, coefficient: 800 } });
    const total = 1 / (800 * Math.PI * 2 * r0) + layersResistance + 1 / (12 * Math.PI * 2 * r4);
    const q = 170 / total;
    expect(Math.abs(result.heatLossPerMetre - q) / q).toBeLessThan(1e-6);
    expect(Math.abs(result.innerSurfaceTemperature - (180 - q / (800 * Math.PI * 2 * r0)))).toBeLessThan(1e-6);
  });

  it('a fixed surface resistance R_se acts as 1/h_se per m² of outer surface', () => {
    const a = calculatePipe({ ...input, surfaceMethod: { kind: 'fixed-resistance', resistance: 1 / 12 } });
    expect(Math.abs(a.heatLossPerMetre - calculatePipe(input).heatLossPerMetre)).toBeLessThan(1e-9);
  });

  it('polynomial λ(θ): the layer carries the integral-mean conductivity λ_m = a0 + a1(θ1+θ2)/2 + a2(θ1²+θ1θ2+θ2²)/3, exact for a cylinder (Kirchhoff transform, Carslaw & Jaeger §1.7)', () => {
    const coefficients = [0.0337, 1.1e-4, 1.7e-7]; // illustrative rock-wool curve of the reference notes §5.2
    const wool = material('Curved wool', { kind: 'polynomial', coefficients }, { emissivity: 0.9 });
    const result = calculatePipe({ ...input, layers: [{ material: wool, thickness: 0.1 }], jacket: undefined });
    const layer = result.layers[1]!;
    const [t1, t2] = [layer.innerTemperature, layer.outerTemperature];
    const mean = coefficients[0]! + (coefficients[1]! * (t1 + t2)) / 2 + (coefficients[2]! * (t1 * t1 + t1 * t2 + t2 * t2)) / 3;
    expect(Math.abs(layer.effectiveConductivity! - mean) / mean).toBeLessThan(1e-6);
    expect(layer.conductivityAtMeanTemperature).toBeCloseTo(conductivityAt(wool.conductivity, (t1 + t2) / 2), 14);
    // Q' = 2π λ_m (θ1 − θ2) / ln(r2/r1) through that layer.
    const q = (TWO_PI * mean * (t1 - t2)) / Math.log((r1 + 0.1) / r1);
    expect(Math.abs(result.heatLossPerMetre - q) / q).toBeLessThan(1e-6);
  });
});

describe('outer film from the surface physics', () => {
  it('the reported coefficient is outerSurfaceExchange at the converged surface temperature, and Q\' = h_se(θ_s − θ_sink)·πD', () => {
    const input = hotPipe({ ambient: { airTemperature: 15, surroundingsTemperature: 5, relativeHumidity: 0.6, exposure: { kind: 'outdoor', windSpeed: 3 } } });
    const result = calculatePipe(input);
    const exchange = outerSurfaceExchange({
      shape: { kind: 'pipe', orientation: 'horizontal', outerDiameter: result.outerDiameter },
      exposure: { kind: 'outdoor', windSpeed: 3 },
      method: { kind: 'correlations' },
      airTemperature: 15,
      surroundingsTemperature: 5,
      emissivity: 0.13,
    })(result.surfaceTemperature);
    expect(result.surfaceCoefficient.total).toBeCloseTo(exchange.coefficient, 12);
    expect(result.surfaceCoefficient.convection).toBeCloseTo(exchange.convection, 12);
    expect(result.surfaceCoefficient.radiation).toBeCloseTo(exchange.radiation, 12);
    expect(result.surfaceCoefficient.sinkTemperature).toBeCloseTo(exchange.ambient, 12);
    const surfaceLoss = exchange.coefficient * (result.surfaceTemperature - exchange.ambient) * Math.PI * result.outerDiameter;
    expect(Math.abs(surfaceLoss - result.heatLossPerMetre) / result.heatLossPerMetre).toBeLessThan(1e-8);
    // Radiation part: h_r = εσ(T_s² + T_r²)(T_s + T_r) (Stefan–Boltzmann law linearised exactly, Incropera et al. §1.2.3).
    const Ts = result.surfaceTemperature + 273.15;
    const Tr = 5 + 273.15;
    expect(result.surfaceCoefficient.radiation).toBeCloseTo(0.13 * STEFAN_BOLTZMANN * (Ts * Ts + Tr * Tr) * (Ts + Tr), 12);
    expect(result.emissivity).toEqual({ value: 0.13, from: 'jacket.material.emissivity', source: "the value of the jacket's material" });
    expect(result.energyBalance.relativeResidual).toBeLessThan(1e-9);
    expect(result.iterations).toBeGreaterThan(1);
  });

  it('emissivity 0 on the jacket: the radiation part is exactly 0 (h_r = εσ…, Stefan–Boltzmann law, Incropera et al. §1.2.3)', () => {
    const result = calculatePipe(hotPipe({ jacket: { material: aluminium, thickness: 0.0008, emissivity: 0 } }));
    expect(result.surfaceCoefficient.radiation).toBe(0);
    expect(result.surfaceCoefficient.total).toBe(result.surfaceCoefficient.convection);
    expect(result.emissivity).toEqual({ value: 0, from: 'jacket.emissivity', source: 'as given for the jacket surface' });
  });

  it('a higher-emissivity jacket runs cooler and loses more heat (more radiation)', () => {
    const low = calculatePipe(hotPipe({ jacket: { material: aluminium, thickness: 0.0008, emissivity: 0.05 } }));
    const high = calculatePipe(hotPipe({ jacket: { material: aluminium, thickness: 0.0008, emissivity: 0.9 } }));
    expect(high.surfaceTemperature).toBeLessThan(low.surfaceTemperature);
    expect(high.heatLossPerMetre).toBeGreaterThan(low.heatLossPerMetre);
  });

  it('without a jacket the outermost insulation material gives the emissivity', () => {
    const result = calculatePipe(hotPipe({ jacket: undefined }));
    expect(result.emissivity).toEqual({ value: 0.9, from: 'layers[0].material.emissivity', source: 'the value of the material of layer 1, with no jacket over it' });
  });

  it('vertical pipe: the height defaults to the run length capped at 3 m, and a given height is used as is', () => {
    expect(VERTICAL_PIPE_DEFAULT_HEIGHT_CAP).toBe(3);
    const long = calculatePipe(hotPipe({ orientation: 'vertical', length: 20 }));
    expect(long.height).toBe(3);
    expect(long.assumptions.some((a) => a.includes('capped at 3 m'))).toBe(true);
    expect(calculatePipe(hotPipe({ orientation: 'vertical', length: 1.5 })).height).toBe(1.5);
    const given = calculatePipe(hotPipe({ orientation: 'vertical', height: 8, length: 20 }));
    expect(given.height).toBe(8);
    const exchange = outerSurfaceExchange({
      shape: { kind: 'pipe', orientation: 'vertical', outerDiameter: given.outerDiameter, height: 8 },
      exposure: { kind: 'indoor' },
      method: { kind: 'correlations' },
      airTemperature: 20,
      emissivity: 0.13,
    })(given.surfaceTemperature);
    expect(given.surfaceCoefficient.convection).toBeCloseTo(exchange.convection, 12);
    expect(calculatePipe(hotPipe()).height).toBeNull();
  });
});

describe('invariants', () => {
  it('heat loss rises strictly with the pipe temperature (sweep 30–300 °C, correlations, λ(θ) table)', () => {
    const wool = material('Wool curve', { kind: 'table', points: [[10, 0.035], [50, 0.04], [100, 0.046], [200, 0.062], [300, 0.082]] }, { emissivity: 0.9 });
    let previous = -Infinity;
    for (let t = 30; t <= 300; t += 15) {
      const q = calculatePipe(hotPipe({ inner: { kind: 'fluid', temperature: t, coefficient: 1500 }, layers: [{ material: wool, thickness: 0.05 }] })).heatLossPerMetre;
      expect(q).toBeGreaterThan(previous);
      previous = q;
    }
  });

  it('heat loss falls strictly with insulation thickness (property test over pipe size, temperature, wind)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.02, max: 0.6, noNaN: true }),
        fc.double({ min: 40, max: 400, noNaN: true }),
        fc.double({ min: 0, max: 15, noNaN: true }),
        fc.double({ min: 0.005, max: 0.15, noNaN: true }),
        (diameter, temperature, wind, thickness) => {
          const base = (t: number) =>
            calculatePipe(
              hotPipe({
                pipe: { outerDiameter: diameter, wallThickness: diameter / 20, material: steel },
                inner: { kind: 'surface', temperature },
                layers: [{ material: mineralWool, thickness: t }],
                ambient: { airTemperature: 10, relativeHumidity: 0.6, exposure: { kind: 'outdoor', windSpeed: wind } },
              }),
            ).heatLossPerMetre;
          expect(base(thickness * 1.25)).toBeLessThan(base(thickness));
        },
      ),
      { numRuns: 40 },
    );
  });

  it('a chilled line gains heat: heat loss and annual energy are negative', () => {
    const result = calculatePipe(
      hotPipe({
        inner: { kind: 'fluid', temperature: 6, coefficient: 1200 },
        layers: [{ material: foam, thickness: 0.019 }],
        jacket: undefined,
        ambient: { airTemperature: 28, relativeHumidity: 0.7, exposure: { kind: 'indoor' } },
      }),
    );
    expect(result.heatLossPerMetre).toBeLessThan(0);
    expect(result.annualEnergy).toBeLessThan(0);
    expect(result.surfaceTemperature).toBeGreaterThan(6);
    expect(result.surfaceTemperature).toBeLessThan(28);
  });

  it('layer temperatures fall monotonically outwards for a hot pipe, and each layer reports its mean and λ', () => {
    const result = calculatePipe(hotPipe());
    const faces = [result.innerSurfaceTemperature, ...result.interfaces.map((i) => i.temperature), result.surfaceTemperature];
    for (let i = 1; i < faces.length; i++) expect(faces[i]!).toBeLessThan(faces[i - 1]!);
    result.layers.forEach((l, i) => {
      expect(l.innerTemperature).toBeCloseTo(faces[i]!, 12);
      expect(l.meanTemperature).toBeCloseTo((l.innerTemperature + l.outerTemperature) / 2, 12);
    });
    expect(result.layers.map((l) => [l.role, l.conductivityAtMeanTemperature])).toEqual([
      ['pipe-wall', 50],
      ['insulation', 0.04],
      ['jacket', 160],
    ]);
  });
});
