/**
 * Transient conduction against exact solutions:
 * - A slab 0 ≤ x ≤ L at uniform θ0 whose faces are stepped to θs: Fourier series
 *   θ* = Σ 4/((2n+1)π) sin((2n+1)πx/L) exp(−(2n+1)²π²Fo), Fo = αt/L²
 *   (Carslaw & Jaeger, Conduction of Heat in Solids, §3.3; Incropera et al. ch. 5, plane wall).
 * - A slab with initial profile sin(πx/L) and faces at 0 decays as sin(πx/L)·exp(−π²Fo)
 *   (single Fourier mode, same sources): used for the time-step convergence rates.
 */
import { describe, expect, it } from 'vitest';
import { solveTransient, type TransientProblem } from '../../app/fe/index.js';
import { logLogSlope, slabStepResponse } from './exact-solutions.js';

const L = 0.2;
const k = 1.4;
const rho = 2000;
const c = 900;
const alpha = k / (rho * c);
const slab = { thickness: L, conductivity: { kind: 'constant' as const, value: k }, density: rho, specificHeat: c };

describe('slab suddenly exposed to a new face temperature (Fourier series)', () => {
  for (const scheme of ['backward-euler', 'crank-nicolson'] as const) {
    it(`${scheme}: within 1e-3 of the step at Fo = 0.02, 0.05, 0.1, 0.3`, () => {
      const fouriers = [0.02, 0.05, 0.1, 0.3];
      const dt = (scheme === 'backward-euler' ? 2e-5 : 2e-4) * (L * L) / alpha;
      const result = solveTransient({
        geometry: { kind: 'planar' },
        layers: [{ ...slab, elements: 40 }],
        inner: { kind: 'temperature', temperature: 80 },
        outer: { kind: 'temperature', temperature: 80 },
        initialTemperature: 10,
        timeStep: dt,
        duration: 0.3 * (L * L) / alpha,
        scheme,
      });
      for (const fo of fouriers) {
        const step = result.times.findIndex((t) => Math.abs(t - (fo * L * L) / alpha) < dt / 2);
        expect(step).toBeGreaterThan(0);
        const foExact = (result.times[step]! * alpha) / (L * L);
        result.positions.forEach((x, i) => {
          const exact = 80 + (10 - 80) * slabStepResponse(x, L, foExact);
          expect(Math.abs(result.temperatures[step]![i]! - exact) / 70).toBeLessThan(1e-3);
        });
      }
      // Energy: heat stored = net heat in through the faces over the run.
      expect(result.balance.relativeResidual).toBeLessThan(1e-9);
      // And the stored heat matches the exact ρcL(θ̄ − θ0) with θ̄ from the series mean 1 − Σ 8/((2n+1)²π²)e^{…}.
      const foEnd = 0.3;
      let meanStar = 0;
      for (let n = 0; n < 200; n++) meanStar += (8 / ((2 * n + 1) ** 2 * Math.PI ** 2)) * Math.exp(-((2 * n + 1) ** 2) * Math.PI ** 2 * foEnd);
      const exactStored = rho * c * L * (80 - 10) * (1 - meanStar);
      expect(Math.abs(result.balance.stored - exactStored) / exactStored).toBeLessThan(2e-3);
    });
  }

  it('observed time-step convergence: slope 1 for backward Euler, 2 for Crank–Nicolson', () => {
    const fo = 0.1;
    const duration = (fo * L * L) / alpha;
    const exactCentre = Math.exp(-Math.PI * Math.PI * fo);
    for (const [scheme, expected] of [['backward-euler', 1], ['crank-nicolson', 2]] as const) {
      const steps = [10, 20, 40, 80];
      const errors = steps.map((n) => {
        const p: TransientProblem = {
          geometry: { kind: 'planar' },
          layers: [{ ...slab, elements: 64 }],
          inner: { kind: 'temperature', temperature: 0 },
          outer: { kind: 'temperature', temperature: 0 },
          initialTemperature: (x) => Math.sin((Math.PI * x) / L),
          timeStep: duration / n,
          duration,
          scheme,
        };
        const r = solveTransient(p);
        const mid = r.positions.findIndex((x) => Math.abs(x - L / 2) < 1e-12);
        return Math.abs(r.temperatures.at(-1)![mid]! - exactCentre);
      });
      const slope = logLogSlope(steps.map((n) => duration / n), errors);
      expect(Math.abs(slope - expected)).toBeLessThan(0.1);
    }
  });

  it('a film face and heat generation: energy balance closes and the late state is the steady one', () => {
    const r = solveTransient({
      geometry: { kind: 'axisymmetric', innerRadius: 0.01 },
      layers: [{ ...slab, thickness: 0.03, heatGeneration: 5e3, elements: 20 }],
      inner: { kind: 'flux', flux: 0 },
      outer: { kind: 'film', coefficient: 25, ambient: 5 },
      initialTemperature: 5,
      timeStep: 200,
      duration: 4e5,
      scheme: 'backward-euler',
    });
    expect(r.balance.relativeResidual).toBeLessThan(1e-9);
    // At steady state all generated heat leaves through the film: Q' = q̇π(r2² − r1²).
    const generated = 5e3 * Math.PI * (0.04 ** 2 - 0.01 ** 2);
    expect(Math.abs(-r.heatIn.outer.at(-1)! - generated) / generated).toBeLessThan(1e-6);
  });
});

describe('Crank–Nicolson start-up on a stiff metal layer', () => {
  it('keeps every temperature between the initial and the face temperatures (maximum principle)', () => {
    // A 3 mm stainless wall (α ≈ 4e-6 m²/s, element time scale ~0.03 s) stepped with Δt = 60 s:
    // without damping of the stiff modes, Crank–Nicolson rings far below the face temperature.
    // The exact solution obeys the maximum principle (Carslaw & Jaeger §1.6), so any value outside
    // [10, 70] °C is a numerical artefact.
    const r = solveTransient({
      geometry: { kind: 'planar' },
      layers: [
        { thickness: 0.003, conductivity: { kind: 'constant', value: 17 }, density: 7900, specificHeat: 500 },
        { thickness: 0.05, conductivity: { kind: 'constant', value: 0.026 }, density: 40, specificHeat: 1400 },
      ],
      inner: { kind: 'temperature', temperature: 10 },
      outer: { kind: 'temperature', temperature: 70 },
      initialTemperature: 70,
      timeStep: 60,
      duration: 3600,
      scheme: 'crank-nicolson',
    });
    const all = r.temperatures.flat();
    expect(Math.min(...all)).toBeGreaterThanOrEqual(10 - 1e-6);
    expect(Math.max(...all)).toBeLessThanOrEqual(70 + 1e-6);
    expect(r.heatIn.inner.every((q) => q <= 0)).toBe(true);
    expect(r.balance.relativeResidual).toBeLessThan(1e-9);
  });
});
