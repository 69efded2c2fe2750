/**
 * Bad input raises a typed error whose message is one sentence naming the field and the allowed range.
 */
import { describe, expect, it } from 'vitest';
import { InputError, SingularProblemError, solveSteady, solveTransient, type SteadyProblem } from '../../app/fe/index.js';

const good: SteadyProblem = {
  geometry: { kind: 'planar' },
  layers: [{ thickness: 0.1, conductivity: { kind: 'constant', value: 1 } }],
  inner: { kind: 'temperature', temperature: 20 },
  outer: { kind: 'temperature', temperature: 0 },
};

function expectInputError(problem: unknown, field: string, pattern: RegExp) {
  try {
    solveSteady(problem as SteadyProblem);
  } catch (e) {
    expect(e).toBeInstanceOf(InputError);
    expect((e as InputError).field).toBe(field);
    expect((e as Error).message).toMatch(pattern);
    expect((e as Error).message.trim().split(/(?<=\.)\s+(?=[A-Z])/).length).toBe(1);
    return;
  }
  throw new Error('expected an InputError');
}

describe('input validation', () => {
  it('zero or negative thickness', () => {
    expectInputError({ ...good, layers: [{ ...good.layers[0], thickness: 0 }] }, 'layers[0].thickness', /layers\[0\]\.thickness must be greater than 0 m \(got 0\)\./);
    expectInputError({ ...good, layers: [{ ...good.layers[0], thickness: -0.01 }] }, 'layers[0].thickness', /greater than 0 m/);
  });
  it('conductivity not above zero', () => {
    expectInputError({ ...good, layers: [{ thickness: 0.1, conductivity: { kind: 'constant', value: 0 } }] }, 'layers[0].conductivity.value', /greater than 0 W\/\(m·K\)/);
    expectInputError({ ...good, layers: [{ thickness: 0.1, conductivity: { kind: 'table', points: [[10, 0.04], [5, 0.05]] } }] }, 'layers[0].conductivity.points[1][0]', /above the previous point's temperature/);
  });
  it('a conductivity curve that turns non-positive inside the solved range', () => {
    expectInputError(
      { ...good, inner: { kind: 'temperature', temperature: 300 }, layers: [{ thickness: 0.1, conductivity: { kind: 'polynomial', coefficients: [0.04, -2e-4] } }] },
      'layers[0].conductivity',
      /layers\[0\]\.conductivity falls to .* W\/\(m·K\) at .* °C; it must stay above 0/,
    );
  });
  it('inner radius not above zero for a pipe', () => {
    expectInputError({ ...good, geometry: { kind: 'axisymmetric', innerRadius: 0 } }, 'geometry.innerRadius', /geometry\.innerRadius must be greater than 0 m/);
  });
  it('temperatures below absolute zero and NaN', () => {
    expectInputError({ ...good, inner: { kind: 'temperature', temperature: -300 } }, 'inner.temperature', /below absolute zero \(−273\.15 °C\)/);
    expectInputError({ ...good, outer: { kind: 'film', coefficient: 5, ambient: Number.NaN } }, 'outer.ambient', /finite number in °C/);
    expectInputError({ ...good, layers: [{ thickness: Number.NaN, conductivity: { kind: 'constant', value: 1 } }] }, 'layers[0].thickness', /finite number/);
  });
  it('missing conditions and unknown kinds', () => {
    expectInputError({ ...good, outer: undefined }, 'outer', /outer is missing/);
    expectInputError({ ...good, inner: { kind: 'convection' } }, 'inner.kind', /"temperature", "flux" or "film"/);
    expectInputError({ ...good, geometry: { kind: 'sphere' } }, 'geometry.kind', /"planar" or "axisymmetric"/);
    expectInputError({ ...good, layers: [] }, 'layers', /1 to 100 layers/);
  });
  it('no fixed temperature and no film', () => {
    expectInputError({ ...good, inner: { kind: 'flux', flux: 10 }, outer: { kind: 'flux', flux: -10 } }, 'outer', /temperature level is undetermined/);
    expect(() => solveSteady({ ...good, inner: { kind: 'flux', flux: 10 }, outer: { kind: 'film', coefficient: 0, ambient: 0 } })).toThrowError(SingularProblemError);
  });
  it('transient problems need capacity and a positive time step', () => {
    expect(() => solveTransient({ ...good, initialTemperature: 0, timeStep: 10, duration: 100 })).toThrowError(/layers\[0\]\.density must be a finite number in kg\/m³/);
    expect(() =>
      solveTransient({ ...good, layers: [{ ...good.layers[0]!, density: 1, specificHeat: 1 }], initialTemperature: 0, timeStep: 0, duration: 100 }),
    ).toThrowError(/timeStep must be greater than 0 s/);
  });
});
