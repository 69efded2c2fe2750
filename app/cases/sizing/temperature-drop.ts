/**
 * The temperature of a fluid flowing along an insulated run: the heat balance of the fluid,
 *
 *   ṁ·c_p·dT/dx = −q'(T),
 *
 * integrated over the run's length, with q'(T) the heat lost per metre (W/m) by the full
 * temperature-dependent solve of the pipe at the local fluid temperature T (λ(T) of every layer,
 * the surface film at its own surface temperature). One evaluation at the inlet would take q' as
 * fixed; a long hot line cools, its insulation conducts less and its surface exchanges less, so
 * the outlet is found by integrating.
 *
 * The step is an exponential integrator. Write q' = U'(T)·(T − T_sink), with U'(T) the run's
 * effective transmittance per metre at fluid temperature T; over a step of length h that holds
 * U' at its value at the middle of the step, the balance is solved exactly:
 *
 *   T(x + h) = T_sink + (T(x) − T_sink)·exp(−U'(T_mid)·h/(ṁ·c_p)),
 *
 * with T_mid from the same formula over h/2 at U'(T(x)) (exponential midpoint rule, second order).
 * With constant properties and a fixed surface coefficient U' is constant and one step is the exact
 * solution: the exponential law of a pipe in uniform surroundings (Incropera, "Fundamentals of Heat
 * and Mass Transfer", internal flow with a constant surrounding temperature; ISO 12241 states it
 * for pipes). Otherwise the number of steps is doubled until two successive results agree to
 * within the tolerance.
 */

/** K: the outlet temperature is accepted when its estimated error is at most this. */
export const TEMPERATURE_DROP_TOLERANCE = 1e-4;
/** Steps along the run at most (2^12): far beyond what any smooth q'(T) needs at second order. */
export const MAX_RUN_STEPS = 4096;

export interface RunFlow {
  /** °C at the start of the run. */
  readonly inletTemperature: number;
  /** °C: the temperature the run exchanges heat with (q' = 0 there). */
  readonly sinkTemperature: number;
  /** m */
  readonly length: number;
  /** kg/s */
  readonly massFlow: number;
  /** J/(kg·K) */
  readonly specificHeat: number;
  /** W/m lost by the run at a fluid temperature (°C): positive when heat is lost, negative when gained. */
  readonly heatLossAt: (fluidTemperature: number) => number;
}

export interface RunTemperatures {
  /** °C at the end of the run. */
  readonly outletTemperature: number;
  /** K, inlet minus outlet: positive when the fluid cools, negative when it warms. */
  readonly drop: number;
  /** Steps of the accepted result. */
  readonly steps: number;
  /** Evaluations of q' (solves) the integration made. */
  readonly evaluations: number;
  /** K, the estimated error of the accepted outlet temperature (a third of the change from half the steps). */
  readonly estimatedError: number;
}

/**
 * U'(T) = q'(T)/(T − T_sink), each temperature's q' solved once (the step doubling meets the inlet
 * again at every level). At the sink itself there is no flow and nothing to integrate: U' is 0.
 */
function transmittance(flow: RunFlow): { at: (t: number) => number; count: () => number } {
  const known = new Map<number, number>();
  return {
    at(t: number): number {
      const difference = t - flow.sinkTemperature;
      if (difference === 0) return 0;
      let u = known.get(t);
      if (u === undefined) {
        const loss = flow.heatLossAt(t);
        // Checked here, at once: an infinite q' would give U' = ∞, a step straight to the sink and
        // then U' = 0 (no change at all), a finite but meaningless outlet; NaN would only surface
        // after every doubling up to MAX_RUN_STEPS, each a solve.
        if (!Number.isFinite(loss)) {
          throw new Error(`The fluid temperature along the run could not be integrated: the heat loss at ${t} °C was not a finite number (${loss}).`);
        }
        u = loss / difference;
        known.set(t, u);
      }
      return u;
    },
    count: () => known.size,
  };
}

function outletWith(flow: RunFlow, steps: number, u: (t: number) => number): number {
  const sink = flow.sinkTemperature;
  // The exponent per unit of U': step length over the flow's heat capacity rate.
  const kappa = flow.length / steps / (flow.massFlow * flow.specificHeat);
  let t = flow.inletTemperature;
  for (let k = 0; k < steps; k++) {
    const middle = sink + (t - sink) * Math.exp((-u(t) * kappa) / 2);
    t = sink + (t - sink) * Math.exp(-u(middle) * kappa);
  }
  return t;
}

/** The outlet temperature with a given number of equal steps (for tests of the order of the method). */
export function outletTemperatureWithSteps(flow: RunFlow, steps: number): number {
  return outletWith(flow, steps, transmittance(flow).at);
}

/** The outlet temperature, the steps doubled from one until two results agree within `tolerance` (K). */
export function runTemperatures(flow: RunFlow, tolerance = TEMPERATURE_DROP_TOLERANCE): RunTemperatures {
  const u = transmittance(flow);
  let steps = 1;
  let coarse = outletWith(flow, steps, u.at);
  for (;;) {
    const fine = outletWith(flow, 2 * steps, u.at);
    // Second order: the finer result's error is about a third of the change from the coarser one.
    const estimatedError = Math.abs(fine - coarse) / 3;
    steps *= 2;
    if (!Number.isFinite(fine)) {
      throw new Error('The fluid temperature along the run could not be integrated: the flow gave a temperature that is not a finite number (check the mass flow, specific heat and length).');
    }
    if (estimatedError <= tolerance || steps >= MAX_RUN_STEPS) {
      if (estimatedError > tolerance) {
        throw new Error(`The fluid temperature along the run did not settle to ${tolerance} K in ${steps} steps (last change ${estimatedError.toExponential(2)} K).`);
      }
      return { outletTemperature: fine, drop: flow.inletTemperature - fine, steps, evaluations: u.count(), estimatedError };
    }
    coarse = fine;
  }
}
