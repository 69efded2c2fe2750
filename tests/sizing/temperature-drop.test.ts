/**
 * The fluid temperature along an insulated run (app/cases/sizing/temperature-drop.ts), from the
 * heat balance of the flowing fluid ṁ·c_p·dT/dx = −q'(T), against closed-form solutions:
 * - constant U' (q' = U'·(T − T_sink)): the exponential law
 *     T_out = T_sink + (T_in − T_sink)·exp(−U'·L/(ṁ·c_p)),
 *   Incropera et al., Fundamentals of Heat and Mass Transfer, internal flow with a constant
 *   surrounding temperature (ch. 8, the ΔT_o/ΔT_i = exp(−UA/(ṁc_p)) result); ISO 12241 gives the
 *   same exponential for the temperature drop along a pipe (from memory);
 * - U' = a + b·(T − T_sink), a Bernoulli (logistic) equation solved by hand below; with it the
 *   observed order of the exponential midpoint rule (2) and the tolerance of the step doubling.
 */
import { describe, expect, it } from 'vitest';
import { MAX_RUN_STEPS, outletTemperatureWithSteps, runTemperatures, TEMPERATURE_DROP_TOLERANCE, type RunFlow } from '../../app/cases/sizing/temperature-drop.js';

/** A hot water line (invented figures for the test): 500 m, 0.05 kg/s of water. */
const hot = { inletTemperature: 150, sinkTemperature: 10, length: 500, massFlow: 0.05, specificHeat: 4190 } as const;
const capacityRate = hot.massFlow * hot.specificHeat;

/** Exponential law (Incropera, internal flow, constant surrounding temperature). */
function exponentialOutlet(inlet: number, sink: number, u: number, length: number, rate: number): number {
  return sink + (inlet - sink) * Math.exp((-u * length) / rate);
}

/**
 * U'(T) = a + b·θ with θ = T − T_sink, so q' = aθ + bθ², and with κ = 1/(ṁc_p)
 *   dθ/dx = −κ(aθ + bθ²).
 * Put u = 1/θ: du/dx = −θ'/θ² = κ(a·u + b), linear, so u(x) = (1/θ₀ + b/a)·e^{aκx} − b/a, and
 *   θ(x) = a·θ₀·e^{−aκx} / (a + b·θ₀·(1 − e^{−aκx})).
 * (Check: x = 0 gives θ₀; b = 0 gives the exponential law; dθ/dx at 0 is −κ(aθ₀ + bθ₀²).)
 */
function bernoulliOutlet(inlet: number, sink: number, a: number, b: number, length: number, rate: number): number {
  const theta0 = inlet - sink;
  const e = Math.exp((-a * length) / rate);
  return sink + (a * theta0 * e) / (a + b * theta0 * (1 - e));
}

// W/(m·K) and W/(m·K²): U' rises from 0.3 at the sink to 0.58 at the inlet, strongly non-constant
// (λ of the insulation and the surface coefficient both grow with temperature; invented figures).
const a = 0.3;
const b = 0.002;
const varying: RunFlow = { ...hot, heatLossAt: (t) => (a + b * (t - hot.sinkTemperature)) * (t - hot.sinkTemperature) };
const varyingExact = bernoulliOutlet(hot.inletTemperature, hot.sinkTemperature, a, b, hot.length, capacityRate);

describe('constant U\': the exponential law (Incropera, internal flow; ISO 12241)', () => {
  const u = 0.45;
  const flow: RunFlow = { ...hot, heatLossAt: (t) => u * (t - hot.sinkTemperature) };
  const exact = exponentialOutlet(hot.inletTemperature, hot.sinkTemperature, u, hot.length, capacityRate);

  it('one step is the exact solution to round-off', () => {
    expect(Math.abs(outletTemperatureWithSteps(flow, 1) - exact)).toBeLessThan(1e-12 * hot.inletTemperature);
  });

  it('the accepted result is exact to round-off after the first doubling', () => {
    const r = runTemperatures(flow);
    expect(Math.abs(r.outletTemperature - exact)).toBeLessThan(1e-12 * hot.inletTemperature);
    expect(r.steps).toBe(2);
    expect(r.estimatedError).toBeLessThan(1e-12);
    expect(r.drop).toBeCloseTo(hot.inletTemperature - exact, 10);
    // The inlet and the two-step midpoints, each solved once.
    expect(r.evaluations).toBeLessThanOrEqual(5);
  });
});

describe('U\' = a + b·(T − T_sink): Bernoulli equation solved by hand', () => {
  it('the outlet converges to the closed form at order 2 (errors at n, 2n, 4n; ratio ≈ 4)', () => {
    // Observed: 8.1e-3, 2.0e-3, 5.0e-4 K at 16, 32, 64 steps (ratios 4.06, 4.03; from 4.3 at 1 → 2 steps).
    const errors = [16, 32, 64].map((n) => Math.abs(outletTemperatureWithSteps(varying, n) - varyingExact));
    // Strongly non-linear: the errors are far above round-off.
    expect(errors[2]!).toBeGreaterThan(1e-5);
    for (let i = 1; i < errors.length; i++) {
      const ratio = errors[i - 1]! / errors[i]!;
      expect(ratio).toBeGreaterThan(3.9);
      expect(ratio).toBeLessThan(4.1);
    }
  });

  it('runTemperatures meets its tolerance against the closed form, and a tighter one', () => {
    for (const tolerance of [TEMPERATURE_DROP_TOLERANCE, 1e-6]) {
      const r = runTemperatures(varying, tolerance);
      expect(Math.abs(r.outletTemperature - varyingExact)).toBeLessThanOrEqual(tolerance);
      expect(r.estimatedError).toBeLessThanOrEqual(tolerance);
      expect(r.steps).toBeLessThanOrEqual(MAX_RUN_STEPS);
      expect(r.drop).toBeCloseTo(hot.inletTemperature - r.outletTemperature, 12);
      // The estimate is an estimate, not a bound far off the true error (second order: a third of the change).
      expect(Math.abs(r.outletTemperature - varyingExact)).toBeLessThan(3 * r.estimatedError + 1e-12);
    }
  });

  it('a chilled line in warm surroundings warms: negative drop, the same closed form', () => {
    // Chilled water at 6 °C through a 28 °C plant room: θ < 0, q' < 0 (heat gained).
    const chilled = { ...hot, inletTemperature: 6, sinkTemperature: 28, length: 800 };
    const flow: RunFlow = { ...chilled, heatLossAt: (t) => (a - 0.004 * (t - 28)) * (t - 28) };
    // U' = a + b·θ with b = −0.004 and θ < 0: U' from 0.388 at the inlet down to 0.3 at the sink.
    const exact = bernoulliOutlet(6, 28, a, -0.004, 800, capacityRate);
    const r = runTemperatures(flow);
    expect(r.outletTemperature).toBeGreaterThan(6);
    expect(r.outletTemperature).toBeLessThan(28);
    expect(r.drop).toBeLessThan(0);
    expect(Math.abs(r.outletTemperature - exact)).toBeLessThanOrEqual(TEMPERATURE_DROP_TOLERANCE);
  });

  it('a fluid already at the sink temperature stays there', () => {
    const r = runTemperatures({ ...varying, inletTemperature: hot.sinkTemperature });
    expect(r.outletTemperature).toBe(hot.sinkTemperature);
    expect(r.drop).toBe(0);
  });
});

describe('a heat loss that is not a finite number is refused, not integrated', () => {
  for (const bad of [NaN, Infinity, -Infinity]) {
    it(`q' = ${bad}`, () => {
      let calls = 0;
      const flow: RunFlow = {
        ...hot,
        heatLossAt: (t) => {
          calls++;
          return t < 100 ? bad : 0.4 * (t - hot.sinkTemperature);
        },
      };
      expect(() => runTemperatures(flow)).toThrow(/heat loss at .* °C was not a finite number/);
      expect(() => outletTemperatureWithSteps(flow, 3)).toThrow(/not a finite number/);
      // Refused at the first bad solve, not after every doubling up to MAX_RUN_STEPS.
      expect(calls).toBeLessThan(20);
    });
  }
});
