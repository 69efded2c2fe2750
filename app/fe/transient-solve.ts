/**
 * Implicit time stepping of ρc ∂T/∂t = ∇·(λ∇T) + q̇ on the steady solver's mesh, by the θ-method:
 *   (C/Δt + θK) Tⁿ⁺¹ = (C/Δt − (1−θ)K) Tⁿ + F,   θ = 1 backward Euler, θ = ½ Crank–Nicolson.
 * Every step runs the same three stages as the steady solve: essential conditions set aside, the
 * reduced band system solved, and the heat entering each face recovered from the rows set aside,
 * so that the energy balance (heat stored = net heat in) can be reported over the whole run.
 * Temperature-dependent properties are iterated within each step (Picard) with λ taken at Tⁿ⁺θ.
 *
 * A layer with a phase change stores heat as ρH(T) (phase-change.ts): its steps are solved in
 * enthalpy form by Newton's method (latent-step.ts), and the heat stored over the run is taken as
 * ∫ρ(H(T_end) − H(T_start))dμ, which equals the net heat in to within the iteration tolerance.
 * Problems without one take the fixed-point path below, unchanged.
 */
import { assembleSystem } from './assembly.js';
import { BandedMatrix } from './banded-matrix.js';
import { discretise, summariseMesh, withFaceConditions, type Discretisation } from './discretisation.js';
import { ConvergenceError } from './errors.js';
import { applyFaceConditions, naturalHeatIn } from './face-conditions.js';
import { flowBasisFor } from './measure.js';
import { latentStep } from './latent-step.js';
import { hasPhaseChange } from './phase-change.js';
import { enthalpyChange, solidFractions } from './phase-change-integrals.js';
import type { TransientProblem } from './problem.js';
import { solveWithEssentialConditions } from './reduced-solve.js';
import type { TransientResult } from './result.js';
import { DEFAULT_MAX_ITERATIONS, DEFAULT_TEMPERATURE_TOLERANCE } from './steady-solve.js';
import { assertFinite } from './steady-recovery.js';
import { validateTransientProblem } from './validate.js';

interface StepOutcome {
  readonly temperatures: Float64Array;
  readonly heatInInner: number;
  readonly heatInOuter: number;
  readonly generated: number;
  readonly iterations: number;
}

export function solveTransient(problem: TransientProblem): TransientResult {
  validateTransientProblem(problem);
  const base = discretise(problem, 'transient');
  const theta = (problem.scheme ?? 'crank-nicolson') === 'crank-nicolson' ? 0.5 : 1;
  const tolerance = problem.options?.temperatureTolerance ?? DEFAULT_TEMPERATURE_TOLERANCE;
  const maxIterations = problem.options?.maxIterations ?? DEFAULT_MAX_ITERATIONS;
  const latent = base.layers.some(hasPhaseChange);
  const nonlinear = base.nonlinear || problem.facesAt !== undefined || latent;
  const steps = Math.max(1, Math.ceil(problem.duration / problem.timeStep - 1e-9));

  const conditionsAt = (t: number): Discretisation =>
    problem.facesAt ? withFaceConditions(base, problem.facesAt(t).inner, problem.facesAt(t).outer) : base;

  const initial = initialTemperatures(base, problem.initialTemperature);
  let current: Float64Array = Float64Array.from(initial);
  imposeEssential(conditionsAt(0), current);
  const absolute = (excess: Float64Array) => Array.from(excess, (v) => v + base.reference);

  const fractions = (excess: Float64Array) => solidFractions(base.mesh, base.layers, base.measure, excess, base.reference);
  const times = [0];
  const temperatures: number[][] = [absolute(current)];
  const solidFraction: (number | null)[][] | undefined = latent ? [fractions(current)] : undefined;
  const heatInInner: number[] = [];
  const heatInOuter: number[] = [];
  // A fixed face that differs from the initial temperature jumps at t = 0⁺; the heat that jump
  // puts into the capacity of the face nodes enters through that face at once and is counted here.
  let netIn = storedHeat(base, initial, current);
  let worstIterations = 0;
  let time = 0;

  for (let s = 0; s < steps; s++) {
    const dt = s === steps - 1 ? problem.duration - time : problem.timeStep;
    const outcome =
      s === 0 && theta < 1
        ? startupStep(conditionsAt, time, current, dt, nonlinear, latent, tolerance, maxIterations)
        : step(conditionsAt(time + theta * dt), current, dt, theta, nonlinear, latent, tolerance, maxIterations);
    current = outcome.temperatures;
    time = s === steps - 1 ? problem.duration : time + dt;
    times.push(time);
    temperatures.push(absolute(current));
    heatInInner.push(outcome.heatInInner);
    heatInOuter.push(outcome.heatInOuter);
    netIn += dt * (outcome.heatInInner + outcome.heatInOuter + outcome.generated);
    worstIterations = Math.max(worstIterations, outcome.iterations);
    if (solidFraction) solidFraction.push(fractions(current));
    if (problem.stopWhen?.({ time, temperatures: temperatures.at(-1)!, solidFraction: solidFraction?.at(-1) ?? base.layers.map(() => null) })) break;
  }

  const stored = storedHeat(base, initial, current);
  const residual = stored - netIn;
  const scale = Math.max(Math.abs(stored), Math.abs(netIn));
  return {
    basis: flowBasisFor(base.mesh.geometry),
    positions: Array.from(base.mesh.positions),
    times,
    temperatures,
    heatIn: { inner: heatInInner, outer: heatInOuter },
    balance: { stored, netIn, residual, relativeResidual: scale > 0 ? Math.abs(residual) / scale : 0 },
    ...(solidFraction ? { solidFraction } : {}),
    maxIterations: worstIterations,
    mesh: summariseMesh(base.mesh),
  };
}

/** Initial excess temperatures over the reference (see Discretisation.reference). */
function initialTemperatures(d: Discretisation, initial: TransientProblem['initialTemperature']): Float64Array {
  const values = new Float64Array(d.mesh.positions.length);
  for (let i = 0; i < values.length; i++) values[i] = (typeof initial === 'number' ? initial : initial(d.mesh.positions[i]!)) - d.reference;
  assertFinite(values);
  return values;
}

/** The state at t = 0⁺: fixed faces take their prescribed temperature at once. */
function imposeEssential(d: Discretisation, temperatures: Float64Array): void {
  for (const face of d.faces) if (face.condition.kind === 'temperature') temperatures[face.node] = face.condition.temperature - d.reference;
}

/**
 * Crank–Nicolson amplifies the stiffest modes by almost −1 per step, so a sudden change of face
 * temperature (or a thin metal layer, whose modes are very stiff) would leave a ringing that never
 * dies out. Taking the first step as four backward-Euler quarter steps damps those modes at once
 * and keeps second-order accuracy (Rannacher, Numer. Math. 43 (1984) 309–327; Luskin & Rannacher,
 * SIAM J. Numer. Anal. 19 (1982)). The step is reported as one, with its average heat flows.
 */
const STARTUP_SUBSTEPS = 4;

function startupStep(
  conditionsAt: (t: number) => Discretisation,
  time: number,
  start: Float64Array,
  dt: number,
  nonlinear: boolean,
  latent: boolean,
  tolerance: number,
  maxIterations: number,
): StepOutcome {
  const h = dt / STARTUP_SUBSTEPS;
  let temperatures = start;
  let inner = 0;
  let outer = 0;
  let generated = 0;
  let iterations = 0;
  for (let k = 0; k < STARTUP_SUBSTEPS; k++) {
    const o = step(conditionsAt(time + (k + 1) * h), temperatures, h, 1, nonlinear, latent, tolerance, maxIterations);
    temperatures = o.temperatures;
    inner += o.heatInInner / STARTUP_SUBSTEPS;
    outer += o.heatInOuter / STARTUP_SUBSTEPS;
    generated += o.generated / STARTUP_SUBSTEPS;
    iterations = Math.max(iterations, o.iterations);
  }
  return { temperatures, heatInInner: inner, heatInOuter: outer, generated, iterations };
}

function step(
  d: Discretisation,
  previous: Float64Array,
  dt: number,
  theta: number,
  nonlinear: boolean,
  latent: boolean,
  tolerance: number,
  maxIterations: number,
): StepOutcome {
  if (latent) return latentStep(d, previous, dt, theta, tolerance, maxIterations);
  const n = previous.length;
  let guess: Float64Array = Float64Array.from(previous);
  let lastChange = Infinity;
  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    // Properties and film coefficients at Tⁿ⁺θ from the current guess of Tⁿ⁺¹.
    const midpoint = new Float64Array(n);
    for (let i = 0; i < n; i++) midpoint[i] = theta * guess[i]! + (1 - theta) * previous[i]!;
    const system = assembleSystem(d.mesh, d.layers, d.measure, midpoint, d.reference);
    const conductance = system.conductance;
    const load = Float64Array.from(system.load);
    const { essential, films } = applyFaceConditions(conductance, load, d.faces, midpoint, d.reference);

    // (C/Δt + θK) Tⁿ⁺¹ = C/Δt·Tⁿ − (1−θ)K·Tⁿ + F
    const matrix = new BandedMatrix(n, conductance.halfBandwidth);
    for (let k = 0; k < matrix.data.length; k++) matrix.data[k] = system.capacity.data[k]! / dt + theta * conductance.data[k]!;
    const cTn = system.capacity.multiply(previous);
    const kTn = conductance.multiply(previous);
    const rhs = new Float64Array(n);
    for (let i = 0; i < n; i++) rhs[i] = cTn[i]! / dt - (1 - theta) * kTn[i]! + load[i]!;
    const next = solveWithEssentialConditions(matrix, rhs, essential);

    let change = 0;
    for (let i = 0; i < n; i++) change = Math.max(change, Math.abs(next[i]! - guess[i]!));
    guess = next;
    lastChange = change;
    if (!nonlinear || change <= tolerance) {
      assertFinite(next);
      // Stage 3: heat in through each face over the step, from the rows of the full system.
      const rowTotals = matrix.multiply(next);
      const heat = d.faces.map((face, f) =>
        face.condition.kind === 'temperature'
          ? rowTotals[face.node]! - rhs[face.node]!
          : naturalHeatIn(face, films[f], theta * next[face.node]! + (1 - theta) * previous[face.node]!, d.reference),
      );
      let generated = 0;
      for (let i = 0; i < n; i++) generated += system.load[i]!;
      return { temperatures: next, heatInInner: heat[0]!, heatInOuter: heat[1]!, generated, iterations: iteration };
    }
  }
  throw new ConvergenceError(
    maxIterations,
    lastChange,
    `A time step did not converge in ${maxIterations} iterations: the last temperature change was ${lastChange.toExponential(3)} K.`,
  );
}

/**
 * ∫ρc (T_end − T_start) dμ, with the consistent capacity matrix (exact for the interpolated fields);
 * ∫ρ(H(T_end) − H(T_start))dμ when a layer has a phase change.
 */
function storedHeat(d: Discretisation, start: Float64Array, end: Float64Array): number {
  if (d.layers.some(hasPhaseChange)) return enthalpyChange(d.mesh, d.layers, d.measure, start, end, d.reference);
  const system = assembleSystem(d.mesh, d.layers, d.measure, end, d.reference);
  const delta = new Float64Array(start.length);
  for (let i = 0; i < delta.length; i++) delta[i] = end[i]! - start[i]!;
  return system.capacity.multiply(delta).reduce((a, b) => a + b, 0);
}
