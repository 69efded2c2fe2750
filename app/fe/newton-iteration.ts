/**
 * Stages 1 and 2 of the steady solve, repeated by Newton's method until the temperatures stop
 * changing. Each iteration linearises the heat balance at the current temperatures
 * (tangent-assembly.ts), factors the tangent on the free nodes (the fixed faces' rows and columns
 * set aside) and solves for the correction that removes the nodal imbalance. Near the solution
 * the change shrinks quadratically, so a λ(T) layer under a radiating film converges in a handful
 * of iterations. A linear problem (constant λ, fixed film coefficients) is solved by its first.
 *
 * The first correction is refined twice against the same factors, with the residual of the linear
 * system in difference form: it is the whole temperature field (up to hundreds of kelvin), and
 * elimination loses digits of it when a thin metal layer makes the system ill-conditioned. Later
 * corrections are small, so their elimination error is too, and each iteration corrects the last.
 *
 * Converged means the largest change is below the tolerance, or below the round-off level of the
 * temperatures themselves when that is larger: stored temperatures are rounded to about 1e-16 of
 * their value, and next to a steel layer whose conductance is 10⁶ W/(m·K) that rounding alone is
 * an imbalance which moves the next correction by ~1e-10 K. No iteration can remove it.
 *
 * Safeguard for a start far from the solution (strong radiation, a thin layer on a hot pipe): when
 * a whole step would leave a larger imbalance than before, the step is halved until it does not
 * (a backtracking line search), down to MIN_STEP_FRACTION of the step. Before that, a step is
 * shortened to move no node further than the span of the temperatures the faces name, when the
 * solution is known to lie within that span (see stepLimit).
 */
import { BandedMatrix, factorBanded, substituteBanded, ZeroPivotError } from './banded-matrix.js';
import type { Discretisation } from './discretisation.js';
import { ConvergenceError, SingularProblemError } from './errors.js';
import { freeNodeRange, imposeFixedTemperatures } from './face-conditions.js';
import { assembleImbalance, assembleTangent, linearisedImbalance, newBalanceWorkspace, type BalanceWorkspace } from './tangent-assembly.js';

export interface SteadyIterate {
  /** Excess temperatures over Discretisation.reference. */
  readonly temperatures: Float64Array;
  /** Newton iterations (tangent factorisations); 1 for a linear problem. */
  readonly iterations: number;
  /** Largest nodal temperature change of the last iteration, K; 0 for a linear problem. */
  readonly lastChange: number;
}

const REFINEMENT_STEPS = 2;
/** The smallest fraction of a Newton step the line search tries before taking it anyway. */
const MIN_STEP_FRACTION = 1 / 64;
/**
 * Steps below this (K) are taken whole: Newton converges quadratically there, and the imbalance is
 * close enough to round-off that comparing two of them would say nothing.
 */
const LINE_SEARCH_FLOOR = 1e-6;
/** Changes above this (K) are far above any round-off level, so it is not estimated for them. */
const ROUND_OFF_CHECK_BELOW = 1e-6;

export function iterateToSteadyState(d: Discretisation, guess: Float64Array, tolerance: number, maxIterations: number): SteadyIterate {
  const n = d.mesh.positions.length;
  const temperatures = Float64Array.from(guess);
  // Stage 1: fixed faces take their temperatures; the others are solved for.
  imposeFixedTemperatures(d.faces, temperatures, d.reference);
  const { first, last } = freeNodeRange(d.faces, n);
  if (first > last) return { temperatures, iterations: 1, lastChange: 0 };

  const workspace = newBalanceWorkspace(d);
  const solver = new CorrectionSolver(workspace, n, first, last);
  const previous = new Float64Array(n);
  // A linear problem is solved by its first correction and never limits a step.
  const limit = d.nonlinear ? stepLimit(d) : Infinity;

  assembleTangent(d, temperatures, workspace);
  let imbalance = largestMagnitude(workspace.imbalance, first, last);
  for (let iteration = 1; ; iteration++) {
    // Stage 2: the correction that removes the imbalance, from the factored tangent.
    const correction = solver.solve(temperatures, iteration === 1 ? REFINEMENT_STEPS : 0);
    if (!d.nonlinear) {
      addTo(temperatures, correction, 1, first, last);
      return { temperatures, iterations: 1, lastChange: 0 };
    }
    const change = largestMagnitude(correction, first, last);
    if (!Number.isFinite(change)) break;
    if (change <= tolerance || (change <= ROUND_OFF_CHECK_BELOW && change <= solver.roundOffLevel(temperatures))) {
      addTo(temperatures, correction, 1, first, last);
      return { temperatures, iterations: iteration, lastChange: change };
    }
    if (iteration === maxIterations) {
      addTo(temperatures, correction, 1, first, last);
      throw notConverged(d, temperatures, workspace, iteration, change, tolerance, first, last);
    }
    // Take the step (within the limit), or the largest halving of it that does not make the imbalance worse.
    previous.set(temperatures);
    let fraction = change > limit ? limit / change : 1;
    for (;;) {
      temperatures.set(previous);
      addTo(temperatures, correction, fraction, first, last);
      assembleTangent(d, temperatures, workspace);
      const trial = largestMagnitude(workspace.imbalance, first, last);
      if (trial <= imbalance || fraction * change <= LINE_SEARCH_FLOOR || fraction <= MIN_STEP_FRACTION) {
        imbalance = trial;
        break;
      }
      fraction /= 2;
    }
  }
  throw new ConvergenceError(maxIterations, Number.NaN, 'The nonlinear solve diverged: temperatures stopped being finite numbers.');
}

/**
 * The largest nodal change one step may make, K. With no heat entering inside the build-up or
 * through a face (no generation, no flux face), every temperature of the solution lies between the
 * coldest and hottest temperature the faces name (the maximum principle), so from an iterate within
 * that span a larger change can only overshoot. A steep λ(θ) makes exactly such steps: where λ is
 * 0.04 W/(m·K) beside a table point of 1000, the tangent sees the small value and proposes thousands
 * of kelvin, and the halvings of the line search stop short of undoing that, so Newton cycles. With
 * a heat source the solution may leave the span, and no limit applies.
 */
function stepLimit(d: Discretisation): number {
  const conditions = d.faces.map((f) => f.condition);
  if (d.layers.some((l) => (l.heatGeneration ?? 0) !== 0) || conditions.some((c) => c.kind === 'flux' && c.flux !== 0)) return Infinity;
  const named = conditions.flatMap((c) => (c.kind === 'temperature' ? [c.temperature] : c.kind === 'film' ? [c.ambient] : []));
  // Below 1 K the limit would only slow a solve whose faces name (nearly) one temperature.
  return named.length === 0 ? Infinity : Math.max(1, Math.max(...named) - Math.min(...named));
}

/** Solves tangent·correction = imbalance on the free nodes: elimination, then refinement. */
class CorrectionSolver {
  private readonly factors: BandedMatrix;
  private readonly correction: Float64Array;
  private readonly residual: Float64Array;
  private readonly corrected: Float64Array;

  constructor(
    private readonly workspace: BalanceWorkspace,
    n: number,
    private readonly first: number,
    private readonly last: number,
  ) {
    const band = workspace.tangent.data.length;
    const storage = new Float64Array(band + 3 * n);
    this.factors = new BandedMatrix(n, workspace.tangent.halfBandwidth, storage.subarray(0, band));
    this.correction = storage.subarray(band, band + n);
    this.residual = storage.subarray(band + n, band + 2 * n);
    this.corrected = storage.subarray(band + 2 * n);
  }

  /** The correction at the given temperatures, at which the workspace was assembled, refined `refinements` times. */
  solve(temperatures: Float64Array, refinements: number): Float64Array {
    const { workspace, factors, correction, residual, corrected, first, last } = this;
    factors.data.set(workspace.tangent.data);
    try {
      factorBanded(factors, first, last);
    } catch (error) {
      if (error instanceof ZeroPivotError) {
        throw new SingularProblemError(
          'inner and outer leave the temperature level undetermined: give at least one face a fixed temperature or a film with a coefficient greater than 0 W/(m²·K).',
        );
      }
      throw error;
    }
    correction.set(workspace.imbalance);
    substituteBanded(factors, correction, first, last);
    for (let step = 0; step < refinements; step++) {
      linearisedImbalance(workspace, temperatures, correction, first, last, corrected, residual);
      substituteBanded(factors, residual, first, last);
      addTo(correction, residual, 1, first, last);
    }
    return correction;
  }

  /**
   * The change in temperature that rounding the temperatures to double precision can cause: each
   * stored θ_j is within ε|θ_j| of its exact value, so the imbalance at node i is uncertain by up
   * to ε·Σ_j |k_ij|·(|θ_i| + |θ_j|); the tangent's factors carry that to the temperatures.
   * Valid after solve() at the same temperatures.
   */
  roundOffLevel(temperatures: Float64Array): number {
    const { workspace, factors, residual, first, last } = this;
    const { conductance } = workspace;
    const p = conductance.halfBandwidth;
    const w = conductance.width;
    for (let i = first; i <= last; i++) {
      let uncertainty = 0;
      for (let j = Math.max(0, i - p); j <= Math.min(conductance.size - 1, i + p); j++) {
        if (j !== i) uncertainty += Math.abs(conductance.data[i * w + j - i + p]!) * (Math.abs(temperatures[i]!) + Math.abs(temperatures[j]!));
      }
      residual[i] = Number.EPSILON * uncertainty;
    }
    substituteBanded(factors, residual, first, last);
    return largestMagnitude(residual, first, last);
  }
}

function notConverged(
  d: Discretisation,
  temperatures: Float64Array,
  workspace: BalanceWorkspace,
  iterations: number,
  change: number,
  tolerance: number,
  first: number,
  last: number,
): ConvergenceError {
  // The heat that does not balance at the free nodes, at the temperatures the solve stopped at.
  assembleImbalance(d, temperatures, workspace);
  const imbalance = largestMagnitude(workspace.imbalance, first, last);
  const unit = d.mesh.geometry.kind === 'planar' ? 'W/m²' : 'W/m';
  return new ConvergenceError(
    iterations,
    change,
    `The nonlinear solve did not converge in ${iterations} iterations: the last temperature change was ${change.toExponential(3)} K against a tolerance of ${tolerance} K, leaving a nodal heat imbalance of up to ${imbalance.toExponential(3)} ${unit}.`,
  );
}

function addTo(values: Float64Array, step: Float64Array, fraction: number, first: number, last: number): void {
  for (let i = first; i <= last; i++) values[i] += fraction * step[i]!;
}

function largestMagnitude(values: Float64Array, first: number, last: number): number {
  let largest = 0;
  for (let i = first; i <= last; i++) {
    const v = Math.abs(values[i]!);
    // A non-finite value must not look small: NaN fails every comparison.
    if (Number.isNaN(v)) return v;
    if (v > largest) largest = v;
  }
  return largest;
}
