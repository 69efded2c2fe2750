/**
 * Freeze protection of stagnant water in an insulated pipe (app/cases/sizing/freeze-protection.ts
 * and its parts), against outside references:
 * - the lumped-capacitance times with latent heat (freeze-lumped.ts) against the closed form
 *     t₀ = R·C·ln((T_i − T_∞)/(T_f − T_∞)),   t_f = t₀ + f·m·L·R/(T_f − T_∞),
 *   the lumped-capacitance analysis of Incropera et al., Fundamentals of Heat and Mass Transfer,
 *   ch. 5 (eq. 5.6, the exponential decay of a body with negligible internal resistance), with the
 *   latent heat drawn off at the freezing point at the constant rate (T_f − T_∞)/R; ASHRAE
 *   Handbook—Fundamentals (insulation, freeze protection of pipes) gives this estimate (from memory);
 * - the simulation in the lumped limit (contents of huge conductivity, a thin metal wall, a fixed
 *   surface coefficient, insulation that stores next to nothing) against those closed forms;
 * - the heat balance over a freeze, latent heat included;
 * - the simulation with no latent heat against the exact transient solution of a solid cylinder
 *   cooled through a surface coefficient (Bessel series; Carslaw & Jaeger, Conduction of Heat in
 *   Solids, §7.7; Incropera et al. ch. 5, infinite cylinder), the cylinder counterpart of the slab
 *   series the transient foundation tests use (tests/fe/transient.test.ts);
 * - time-step convergence, the default step against the step-converged times, and the default
 *   freezing range against its narrow-range limit;
 * - refusals and the warm-air case.
 * Materials are typical indicative figures for tests only (common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import { DEFAULT_FREEZING_RANGE, WATER, type FreezingContents } from '../../app/cases/sizing/freeze-contents.js';
import { CENTRE_TOLERANCE, freezeTimes, type FreezeInput } from '../../app/cases/sizing/freeze-protection.js';
import { lumpedFreezeTimes } from '../../app/cases/sizing/freeze-lumped.js';
import { InputError } from '../../app/fe/errors.js';
import type { MaterialProperties } from '../../app/materials/material-properties.js';
import { material } from '../assemblies/pipe-fixtures.js';

const steel = material('Steel', 50, { category: 'pipe', emissivity: 0.8, density: 7850, specificHeat: 460 });
const wool = material('Mineral wool', 0.04, { category: 'insulation', emissivity: 0.9, density: 100, specificHeat: 1030 });

/** DN50 steel pipe, 30 mm mineral wool, 10 °C water, −10 °C air, 5 m/s wind (invented scenario). */
const dn50: FreezeInput = {
  pipe: { outerDiameter: 0.0603, wallThickness: 0.0029, material: steel },
  layers: [{ material: wool, thickness: 0.03 }],
  initialTemperature: 10,
  airTemperature: -10,
  windSpeed: 5,
};

/** The InputError `run` throws (fails the test when it throws anything else or nothing). */
function refusal(run: () => unknown): InputError {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(InputError);
    return error as InputError;
  }
  throw new Error('expected an InputError, got none');
}

const relative = (value: number, reference: number) => Math.abs(value - reference) / Math.abs(reference);

describe('lumped-capacitance times with latent heat (Incropera ch. 5, eq. 5.6; ASHRAE Fundamentals, from memory)', () => {
  // Per metre: R' = 2.5 m·K/W, C' = 9000 J/(m·K), m' = 2 kg/m, L = 333.6 kJ/kg; 12 °C → −8 °C.
  const p = { resistance: 2.5, heatCapacity: 9000, contentsMass: 2, latentHeat: 333600, initialTemperature: 12, freezingTemperature: 0, sinkTemperature: -8 };

  it('matches the closed form, worked by hand', () => {
    const r = lumpedFreezeTimes({ ...p, fraction: 0.5 });
    // t₀ = 2.5 · 9000 · ln(20/8) = 22500 · 0.916291 = 20616.5 s.
    const t0 = 2.5 * 9000 * Math.log(20 / 8);
    expect(t0).toBeCloseTo(20616.5, 0);
    expect(relative(r.timeToFreezing, t0)).toBeLessThan(1e-14);
    // t_f − t₀ = 0.5 · 2 · 333600 · 2.5 / 8 = 104250 s.
    expect(relative(r.timeToFraction!, t0 + 104250)).toBeLessThan(1e-14);
  });

  it('no fraction asked: none reported; a sink not below freezing: never', () => {
    expect(lumpedFreezeTimes({ ...p, fraction: null }).timeToFraction).toBeNull();
    const warm = lumpedFreezeTimes({ ...p, sinkTemperature: 0, fraction: 1 });
    expect(warm.timeToFreezing).toBe(Infinity);
    expect(warm.timeToFraction).toBe(Infinity);
  });
});

/**
 * The lumped limit: contents of (unphysically) high conductivity, so Bi = h'·r/λ ≪ 1 inside; a
 * thin, highly conductive wall; a fixed surface coefficient, so the resistance is constant; an
 * insulation that stores next to nothing (the lumped model gives it no heat capacity).
 */
const lumpedContents: FreezingContents = { ...WATER, liquidConductivity: 1e4, solidConductivity: 1e4 };
const lightWool = material('Light wool', 0.04, { category: 'insulation', emissivity: 0.9, density: 0.01, specificHeat: 1000 });
const copper = material('Copper', 380, { category: 'pipe', emissivity: 0.3, density: 8900, specificHeat: 385 });
const lumpedCase: FreezeInput = {
  pipe: { outerDiameter: 0.0603, wallThickness: 0.001, material: copper },
  layers: [{ material: lightWool, thickness: 0.02 }],
  initialTemperature: 10,
  airTemperature: -10,
  windSpeed: 0,
  surfaceMethod: { kind: 'fixed-coefficient', coefficient: 10 },
  contents: lumpedContents,
  fraction: 0.5,
};

describe('the simulation in the lumped limit agrees with the lumped closed forms', () => {
  const r = freezeTimes(lumpedCase);
  const ri = 0.0603 / 2 - 0.001;
  const m = WATER.density * Math.PI * ri * ri;
  const c = m * WATER.liquidSpecificHeat + 8900 * 385 * Math.PI * (0.03015 ** 2 - ri ** 2);
  // R' by hand: ln(r₂/r₁)/(2πλ) for the wall and the wool, 1/(2π·r₃·h) for the surface.
  const r3 = 0.03015 + 0.02;
  const resistance = Math.log(0.03015 / ri) / (2 * Math.PI * 380) + Math.log(r3 / 0.03015) / (2 * Math.PI * 0.04) + 1 / (2 * Math.PI * r3 * 10);
  const lumpedTo = (temperature: number) => resistance * c * Math.log((10 + 10) / (temperature + 10));
  const top = WATER.freezingTemperature + DEFAULT_FREEZING_RANGE / 2;

  it('the resistance and heat capacity it compares with are those by hand', () => {
    expect(relative(r.lumped.resistance, resistance)).toBeLessThan(1e-9);
    expect(relative(r.lumped.heatCapacity, c)).toBeLessThan(1e-12);
    expect(relative(r.lumped.timeToFreezing, lumpedTo(0))).toBeLessThan(1e-9);
  });

  it('first ice and the centre at 0 °C: the exponential cooling to the temperatures they are defined at, within 0.01 %', () => {
    // Ice first forms when the water reaches the top of the freezing range; the centre counts as at
    // 0 °C within CENTRE_TOLERANCE of that. Both are the lumped exponential to those temperatures.
    // Observed: 6e-6 for both.
    expect(relative(r.timeToFirstIce, lumpedTo(top))).toBeLessThan(1e-4);
    expect(relative(r.timeToZero, lumpedTo(top + CENTRE_TOLERANCE))).toBeLessThan(1e-4);
    // Against the lumped time to exactly 0 °C they are early by the cooling through those last
    // 0.05 K and 0.15 K: ln(20/10.05)/ln 2 − 1 = −0.7 % and ln(20/10.15)/ln 2 − 1 = −2.1 %, the
    // safe side (see DEFAULT_FREEZING_RANGE and CENTRE_TOLERANCE).
    expect(r.timeToFirstIce / r.lumped.timeToFreezing - 1).toBeCloseTo(Math.log(20 / 10.05) / Math.LN2 - 1, 3);
    expect(r.timeToZero / r.lumped.timeToFreezing - 1).toBeCloseTo(Math.log(20 / 10.15) / Math.LN2 - 1, 3);
  });

  it('half frozen: the lumped t₀ + f·m·L·R/(T_f − T_∞) within 0.3 %', () => {
    const expected = lumpedTo(0) + (0.5 * m * WATER.latentHeat * resistance) / 10;
    expect(relative(r.lumped.timeToFraction!, expected)).toBeLessThan(1e-9);
    // Observed 0.22 % early: the spread range releases its latent heat from +0.05 °C down, so the
    // water sits up to 0.05 K warmer than the sharp model's 0 °C and loses heat that much faster.
    expect(r.timeToFraction!).toBeLessThan(expected);
    expect(relative(r.timeToFraction!, expected)).toBeLessThan(3e-3);
  });

  it('the heat given up is the sensible heat plus f·m·L, and the balance closes', () => {
    // Uniform water in the range at the end: its temperature from the solid fraction s (linear
    // across the range), and the enthalpy H(T) of the spread range (app/fe/phase-change.ts comment),
    // by hand: given up per kg = H(T_i) − H(T_end) = c_l(T_i − T_f) + s·L + c_s·w/2 − c_s·σ − (c_l − c_s)σ²/(2w),
    // σ = T_end − (T_f − w/2) = (1 − s)w.
    const s = r.frozenFractionAtEnd;
    const w = DEFAULT_FREEZING_RANGE;
    const sigma = (1 - s) * w;
    const { liquidSpecificHeat: cl, solidSpecificHeat: cs, latentHeat: L } = WATER;
    const waterGivenUp = m * (cl * 10 + s * L + (cs * w) / 2 - cs * sigma - ((cl - cs) * sigma * sigma) / (2 * w));
    const endTemperature = -w / 2 + sigma;
    const wallGivenUp = (c - m * cl) * (10 - endTemperature);
    expect(s).toBeGreaterThanOrEqual(0.5);
    expect(r.energyBalance.relativeResidual).toBeLessThan(1e-9);
    // The latent part dominates: s·m·L is about 79 % of the heat given up.
    expect((s * m * L) / -r.energyBalance.stored).toBeGreaterThan(0.75);
    expect(relative(-r.energyBalance.stored, waterGivenUp + wallGivenUp)).toBeLessThan(1e-3);
  });
});

describe('the heat balance of a realistic freeze', () => {
  it('stored heat (sensible and latent) equals the heat let out through the surface', () => {
    const r = freezeTimes({ ...dn50, fraction: 0.5 });
    expect(r.timeToFirstIce).toBeLessThan(r.timeToZero);
    expect(r.timeToZero).toBeLessThan(r.timeToFraction!);
    expect(r.energyBalance.relativeResidual).toBeLessThan(1e-8);
    // At least the latent heat of the half frozen and the water's sensible heat down to 0 °C left.
    const ri = 0.0603 / 2 - 0.0029;
    const m = WATER.density * Math.PI * ri * ri;
    expect(-r.energyBalance.stored).toBeGreaterThan(m * (r.frozenFractionAtEnd * WATER.latentHeat + WATER.liquidSpecificHeat * 10));
  });
});

// ---------------------------------------------------------------------------------------------
// Exact solution: a solid cylinder at T_i cooled through a surface coefficient h to T_∞.
// θ* = (T − T_∞)/(T_i − T_∞) = Σ C_n·exp(−ζ_n²·Fo)·J₀(ζ_n·r/r_o), Fo = αt/r_o²,
// C_n = (2/ζ_n)·J₁(ζ_n)/(J₀²(ζ_n) + J₁²(ζ_n)), ζ_n the roots of ζ·J₁(ζ) = Bi·J₀(ζ), Bi = h·r_o/λ
// (Carslaw & Jaeger §7.7; Incropera et al. eqs. 5.49–5.50 for the infinite cylinder).

/** Bessel's integral J_n(x) = (1/π)∫₀^π cos(nτ − x·sin τ)dτ (Abramowitz & Stegun 9.1.21), by the
 * trapezoidal rule, exact to round-off for a smooth periodic integrand with enough points. */
function besselJ(n: 0 | 1, x: number): number {
  const points = 256;
  let sum = 0;
  for (let k = 0; k < points; k++) {
    const tau = ((k + 0.5) * Math.PI) / points;
    sum += Math.cos(n * tau - x * Math.sin(tau));
  }
  return sum / points;
}

function cylinderEigenvalues(biot: number, count: number): number[] {
  const f = (z: number) => z * besselJ(1, z) - biot * besselJ(0, z);
  const roots: number[] = [];
  let a = 1e-9;
  while (roots.length < count) {
    const b = a + 0.05;
    if (f(a) * f(b) <= 0) {
      let lo = a;
      let hi = b;
      for (let k = 0; k < 60; k++) {
        const mid = (lo + hi) / 2;
        if (f(lo) * f(mid) <= 0) hi = mid;
        else lo = mid;
      }
      roots.push((lo + hi) / 2);
    }
    a = b;
  }
  return roots;
}

function cylinderResponse(biot: number, radiusFraction: number, fourier: number, roots: readonly number[]): number {
  let s = 0;
  for (const z of roots) {
    const j0 = besselJ(0, z);
    const j1 = besselJ(1, z);
    s += ((2 / z) * j1 / (j0 * j0 + j1 * j1)) * Math.exp(-z * z * fourier) * besselJ(0, z * radiusFraction);
  }
  return s;
}

/** Fo at which θ* at r/r_o falls to `level` (θ* falls monotonically in time), by bisection. */
function fourierAt(biot: number, radiusFraction: number, level: number, roots: readonly number[]): number {
  let lo = 0;
  let hi = 10;
  for (let k = 0; k < 80; k++) {
    const mid = (lo + hi) / 2;
    if (cylinderResponse(biot, radiusFraction, mid, roots) > level) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

describe('no latent heat: the exact cooling of a solid cylinder (Bessel series, Carslaw & Jaeger §7.7)', () => {
  // The contents as one homogeneous cylinder (the same properties liquid and solid, a latent heat
  // 1e-9 J/kg, nothing); the wall and a thin jacket-like layer store next to nothing, so with the
  // surface film they act as a series resistance R', i.e. a coefficient h = 1/(2π·r_i·R') at r_i.
  const contents: FreezingContents = { ...WATER, solidSpecificHeat: WATER.liquidSpecificHeat, solidConductivity: WATER.liquidConductivity, latentHeat: 1e-9 };
  const thinWall = material('Weightless wall', 400, { category: 'pipe', density: 1e-3, specificHeat: 1 });
  const thinLayer = material('Weightless layer', 0.05, { category: 'insulation', density: 1e-3, specificHeat: 1 });
  const ri = 0.025;
  const input: FreezeInput = {
    pipe: { outerDiameter: 2 * (ri + 0.0005), wallThickness: 0.0005, material: thinWall },
    layers: [{ material: thinLayer, thickness: 0.002 }],
    initialTemperature: 10,
    airTemperature: -10,
    windSpeed: 0,
    surfaceMethod: { kind: 'fixed-coefficient', coefficient: 30 },
    contents,
  };
  const r2 = ri + 0.0005;
  const r3 = r2 + 0.002;
  const resistance = Math.log(r2 / ri) / (2 * Math.PI * 400) + Math.log(r3 / r2) / (2 * Math.PI * 0.05) + 1 / (2 * Math.PI * r3 * 30);
  const h = 1 / (2 * Math.PI * ri * resistance);
  const biot = (h * ri) / WATER.liquidConductivity;
  const alpha = WATER.liquidConductivity / (WATER.density * WATER.liquidSpecificHeat);
  const roots = cylinderEigenvalues(biot, 30);
  const exactTime = (radiusFraction: number, temperature: number) => (fourierAt(biot, radiusFraction, (temperature + 10) / 20, roots) * ri * ri) / alpha;

  it('the series itself: θ* = 1 at Fo = 0 inside, and ζ₁ for Bi = 1 is 1.2558 (Incropera Table 5.1)', () => {
    const rootsBiOne = cylinderEigenvalues(1, 1);
    expect(rootsBiOne[0]!).toBeCloseTo(1.2558, 4);
    expect(cylinderResponse(biot, 0.5, 1e-4, roots)).toBeCloseTo(1, 2);
    expect(biot).toBeGreaterThan(0.5);
    expect(biot).toBeLessThan(2);
  });

  it('the centre and the wall reach the event temperatures at the exact times, within 0.01 %', () => {
    const r = freezeTimes(input);
    const top = DEFAULT_FREEZING_RANGE / 2;
    const centre = exactTime(0, top + CENTRE_TOLERANCE);
    const wall = exactTime(1, top);
    // Observed: 1.5e-6 (centre) and 2.1e-5 (wall).
    expect(relative(r.timeToZero, centre)).toBeLessThan(1e-4);
    expect(relative(r.timeToFirstIce, wall)).toBeLessThan(1e-4);
    expect(r.energyBalance.relativeResidual).toBeLessThan(1e-8);
  });

  it('time-step convergence: order 2 (Crank–Nicolson), errors at Δt, Δt/2, Δt/4 fall by about 4', () => {
    const top = DEFAULT_FREEZING_RANGE / 2;
    const centre = exactTime(0, top + CENTRE_TOLERANCE);
    const coarse = 4 * freezeTimes(input).timeStep;
    const errors = [1, 2, 4].map((k) => Math.abs(freezeTimes({ ...input, numerics: { timeStep: coarse / k } }).timeToZero - centre));
    for (let i = 1; i < errors.length; i++) {
      const order = Math.log2(errors[i - 1]! / errors[i]!);
      expect(order).toBeGreaterThan(1.7);
      expect(order).toBeLessThan(2.5);
    }
  });
});

describe('time step and freezing range of a realistic freeze', () => {
  it('the times at Δt, Δt/2, Δt/4 (Δt the default) converge, and the default is within 0.1 % of the limit', () => {
    const base = freezeTimes(dn50);
    const runs = [base, ...[2, 4].map((k) => freezeTimes({ ...dn50, numerics: { timeStep: base.timeStep / k } }))];
    for (const key of ['timeToZero', 'timeToFirstIce'] as const) {
      const [t1, t2, t4] = runs.map((r) => r[key]);
      // Second order: the Δt/4 result is off the limit by about (t2 − t4)/3; the default by (t1 − t4)·4/3.
      const limit = t4! + (t4! - t2!) / 3;
      expect(relative(t1!, limit)).toBeLessThan(1e-3);
      // The changes shrink on halving (the observed order, near 2, is recorded in the report).
      expect(Math.abs(t2! - t4!)).toBeLessThan(Math.abs(t1! - t2!));
    }
  });

  it('the fraction frozen: the default steps within 0.1 % of a run at a quarter of the second stage step', () => {
    const base = freezeTimes({ ...dn50, fraction: 0.5 });
    expect(base.fractionTimeStep!).toBeGreaterThan(base.timeStep);
    const fine = freezeTimes({ ...dn50, fraction: 0.5, numerics: { timeStep: base.fractionTimeStep! / 4 } });
    expect(relative(base.timeToFraction!, fine.timeToFraction!)).toBeLessThan(1e-3);
  });

  it('the default freezing range: times early by under 1 % (0 °C, first ice) and 0.2 % (half frozen) against the narrow-range limit', () => {
    // The times are first order in the range w (the events sit at its top): extrapolate from w and w/2.
    const at = (w: number) => freezeTimes({ ...dn50, fraction: 0.5, numerics: { freezingRange: w } });
    const [wide, narrow] = [at(DEFAULT_FREEZING_RANGE), at(DEFAULT_FREEZING_RANGE / 2)];
    for (const [key, bound] of [['timeToZero', 1e-2], ['timeToFirstIce', 1e-2], ['timeToFraction', 2e-3]] as const) {
      const limit = 2 * narrow[key]! - wide[key]!;
      expect(wide[key]!).toBeLessThanOrEqual(limit);
      expect(relative(wide[key]!, limit)).toBeLessThan(bound);
    }
  });
});

describe('refusals and the cases that never freeze', () => {
  const noDensity: MaterialProperties = { ...wool, density: null };
  const noHeat: MaterialProperties = { ...steel, specificHeat: null };

  it('a layer without density or specific heat: the field is named', () => {
    expect(refusal(() => freezeTimes({ ...dn50, layers: [{ material: noDensity, thickness: 0.03 }] })).field).toBe('layers[0].material.density');
    expect(refusal(() => freezeTimes({ ...dn50, pipe: { ...dn50.pipe, material: noHeat } })).field).toBe('pipe.material.specificHeat');
    const e = refusal(() => freezeTimes({ ...dn50, jacket: { material: { ...noDensity, name: 'Sheet' }, thickness: 0.0005 } }));
    expect(e.field).toBe('jacket.material.density');
    expect(e.message).toMatch(/jacket\.material\.density is needed for the freeze simulation/);
  });

  it('initial temperature inside the freezing range, or below it: refused', () => {
    for (const t of [DEFAULT_FREEZING_RANGE / 4, 0, -5]) {
      const e = refusal(() => freezeTimes({ ...dn50, initialTemperature: t }));
      expect(e.field).toBe('initialTemperature');
      expect(e.message).toMatch(/above .* the top of the freezing range/);
    }
    expect(refusal(() => freezeTimes({ ...dn50, initialTemperature: 0.4, numerics: { freezingRange: 1 } })).field).toBe('initialTemperature');
  });

  it('warm air and surroundings: never freezes (Infinity), with no run', () => {
    const r = freezeTimes({ ...dn50, airTemperature: 5, fraction: 0.5 });
    expect(r.timeToZero).toBe(Infinity);
    expect(r.timeToFirstIce).toBe(Infinity);
    expect(r.timeToFraction).toBe(Infinity);
    expect(r.steps).toBe(0);
    expect(r.lumped.timeToFreezing).toBe(Infinity);
    expect(r.assumptions.at(-1)).toMatch(/never freezes/);
    expect(r.cautions.join(' ')).toMatch(/local codes/);
  });

  it('cold, but not within the longest time simulated: Infinity, having simulated to maxTime', () => {
    const r = freezeTimes({ ...dn50, airTemperature: -1, maxTime: 3600, fraction: 0.5 });
    expect(r.timeToZero).toBe(Infinity);
    expect(r.timeToFirstIce).toBe(Infinity);
    expect(r.timeToFraction).toBe(Infinity);
    expect(r.simulatedTime).toBeCloseTo(3600, 6);
    expect(r.frozenFractionAtEnd).toBe(0);
  });
});
