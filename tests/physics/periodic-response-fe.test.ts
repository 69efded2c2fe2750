/**
 * Cross-check of the ISO 13786 transfer-matrix method by the transient finite-element engine:
 * the same wall, between an inside kept at 0 °C and an outside whose air temperature is
 * sin(2πt/T) °C (T = 24 h), with the surface films R_si and R_se as film conditions, is stepped
 * (Crank–Nicolson, quadratic elements) from rest through 16 cycles, by when the start-up has died
 * away (checked: the state at the end of the last two cycles agrees to 1e-6 K). The last cycle's
 * heat flow into the inside and into the outside face, projected on e^{iωt}, gives the complex
 * periodic transmittance Y_ie and outside admittance Y_ee, which must agree with the matrix method:
 *
 *   stated tolerance: 1 % on the amplitude and 0.1 h on the time shift with 4 elements per layer
 *   and 48 steps a day (30 min), falling as Δt² (log-log slope within 0.1 of 2) as the mesh and
 *   the step are halved together; 3e-4 and 0.002 h at 16 elements and 192 steps a day.
 *
 * Crank–Nicolson is second order in time (design notes; tests/fe/transient.test.ts measures it);
 * the quadratic elements' spatial error is far below the temporal one at these meshes, so the
 * combined error follows the time step. An air layer is a contact resistance in the engine, which
 * is exactly the pure resistance the standard makes of it.
 */
import { describe, expect, it } from 'vitest';
import { solveTransient, type FaceCondition, type Layer } from '../../app/fe/index.js';
import { complex, type Complex } from '../../app/physics/complex-number.js';
import { periodicResponse, type PeriodicFigure, type PeriodicLayer } from '../../app/physics/index.js';
import { logLogSlope } from '../fe/exact-solutions.js';

const DAY = 86_400;
const OMEGA = (2 * Math.PI) / DAY;
const RSI = 0.13;
const RSE = 0.04;
const CYCLES = 16;

interface FeResponse {
  /** Heat flow density into the inside, per unit outside temperature amplitude. */
  readonly transmittance: Complex;
  /** Heat flow density into the outside face, per unit outside temperature amplitude. */
  readonly outsideAdmittance: Complex;
  /** Largest change of a nodal temperature over the last cycle, K (0 in a periodic state). */
  readonly drift: number;
}

/** The wall as the engine's layers: a pure resistance becomes a contact resistance after the layer inside it. */
function engineLayers(layers: readonly PeriodicLayer[], elements: number): Layer[] {
  const out: Layer[] = [];
  for (const l of layers) {
    if (l.kind === 'resistance') {
      const previous = out.pop()!;
      out.push({ ...previous, contactResistanceToNext: (previous.contactResistanceToNext ?? 0) + l.resistance });
    } else {
      out.push({ thickness: l.thickness, conductivity: { kind: 'constant', value: l.conductivity }, density: l.density, specificHeat: l.specificHeat, elements });
    }
  }
  return out;
}

function feResponse(layers: readonly PeriodicLayer[], elements: number, stepsPerDay: number): FeResponse {
  const film = (resistance: number, ambient: number): FaceCondition => ({ kind: 'film', coefficient: 1 / resistance, ambient });
  const r = solveTransient({
    geometry: { kind: 'planar' },
    layers: engineLayers(layers, elements),
    inner: film(RSI, 0),
    outer: film(RSE, 0),
    // Outside air sin(ωt): it starts at 0 °C, the wall's initial temperature, so the start is smooth.
    facesAt: (t) => ({ inner: film(RSI, 0), outer: film(RSE, Math.sin(OMEGA * t)) }),
    initialTemperature: 0,
    timeStep: DAY / stepsPerDay,
    duration: CYCLES * DAY,
    scheme: 'crank-nicolson',
  });
  // Each step's heat flow is its Crank–Nicolson average, the value at the middle of the step.
  const project = (flows: readonly number[], sign: number): Complex => {
    let re = 0;
    let im = 0;
    flows.slice(-stepsPerDay).forEach((q, k) => {
      const t = ((CYCLES - 1) * stepsPerDay + k + 0.5) * (DAY / stepsPerDay);
      re += sign * q * Math.cos(OMEGA * t);
      im -= sign * q * Math.sin(OMEGA * t);
    });
    // Q̂ = (2/m)·Σ q e^{−iωt}; the outside temperature is Re[−i·e^{iωt}], so Y = Q̂/(−i) = i·Q̂.
    return complex((-2 * im) / stepsPerDay, (2 * re) / stepsPerDay);
  };
  const end = r.temperatures.at(-1)!;
  const dayBefore = r.temperatures[(CYCLES - 1) * stepsPerDay]!;
  return {
    transmittance: project(r.heatIn.inner, -1),
    outsideAdmittance: project(r.heatIn.outer, 1),
    drift: Math.max(...end.map((v, i) => Math.abs(v - dayBefore[i]!))),
  };
}

const asComplex = (f: PeriodicFigure): Complex => complex(f.amplitude * Math.cos(OMEGA * f.timeShift), f.amplitude * Math.sin(OMEGA * f.timeShift));
const relativeError = (a: Complex, b: Complex) => Math.hypot(a.re - b.re, a.im - b.im) / Math.hypot(b.re, b.im);
const amplitudeError = (fe: Complex, f: PeriodicFigure) => Math.abs(Math.hypot(fe.re, fe.im) / f.amplitude - 1);
/** Time shifts compared on the circle: the engine's phase is only known modulo one period. */
function shiftErrorHours(fe: Complex, f: PeriodicFigure): number {
  const difference = Math.atan2(fe.im, fe.re) - OMEGA * f.timeShift;
  const wrapped = difference - 2 * Math.PI * Math.round(difference / (2 * Math.PI));
  return Math.abs(wrapped / OMEGA / 3600);
}

const concrete: PeriodicLayer = { kind: 'material', thickness: 0.2, conductivity: 2.0, density: 2400, specificHeat: 1000 };
const eps: PeriodicLayer = { kind: 'material', thickness: 0.1, conductivity: 0.035, density: 20, specificHeat: 1450 };
// A cavity wall (invented example): dense block, mineral wool, an unventilated 50 mm air layer (R_g 0.18, ISO 6946 table, from memory), brick.
const cavityWall: PeriodicLayer[] = [
  { kind: 'material', thickness: 0.1, conductivity: 1.13, density: 2000, specificHeat: 1000 },
  { kind: 'material', thickness: 0.08, conductivity: 0.035, density: 30, specificHeat: 1030 },
  { kind: 'resistance', resistance: 0.18 },
  { kind: 'material', thickness: 0.1, conductivity: 0.77, density: 1700, specificHeat: 1000 },
];

const LEVELS = [
  { elements: 4, stepsPerDay: 48 },
  { elements: 8, stepsPerDay: 96 },
  { elements: 16, stepsPerDay: 192 },
] as const;

describe('transient finite elements under a sinusoidal outside temperature agree with the transfer matrices', () => {
  for (const [name, layers] of [
    ['200 mm concrete', [concrete]],
    ['200 mm concrete inside 100 mm EPS', [concrete, eps]],
    ['a cavity wall with an air layer', cavityWall],
  ] as const) {
    it(`${name}: Y_ie and Y_ee within the stated tolerance, the error falling as Δt²`, () => {
      const matrix = periodicResponse({ layers, insideSurfaceResistance: RSI, outsideSurfaceResistance: RSE });
      const runs = LEVELS.map((level) => feResponse(layers, level.elements, level.stepsPerDay));
      for (const run of runs) expect(run.drift).toBeLessThan(1e-6);

      const [coarse, , fine] = runs;
      expect(amplitudeError(coarse!.transmittance, matrix.periodicTransmittance)).toBeLessThan(0.01);
      expect(shiftErrorHours(coarse!.transmittance, matrix.periodicTransmittance)).toBeLessThan(0.1);
      expect(amplitudeError(fine!.transmittance, matrix.periodicTransmittance)).toBeLessThan(3e-4);
      expect(shiftErrorHours(fine!.transmittance, matrix.periodicTransmittance)).toBeLessThan(0.002);
      expect(amplitudeError(fine!.outsideAdmittance, matrix.outsideAdmittance)).toBeLessThan(3e-4);
      expect(shiftErrorHours(fine!.outsideAdmittance, matrix.outsideAdmittance)).toBeLessThan(0.002);

      const steps = LEVELS.map((l) => DAY / l.stepsPerDay);
      for (const [figure, of] of [
        [matrix.periodicTransmittance, (r: FeResponse) => r.transmittance],
        [matrix.outsideAdmittance, (r: FeResponse) => r.outsideAdmittance],
      ] as const) {
        const errors = runs.map((r) => relativeError(of(r), asComplex(figure)));
        expect(errors[1]!).toBeLessThan(errors[0]!);
        expect(errors[2]!).toBeLessThan(errors[1]!);
        expect(Math.abs(logLogSlope(steps, errors) - 2)).toBeLessThan(0.1);
      }
    }, 30_000);
  }
});
