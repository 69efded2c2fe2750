/**
 * One time step of a body with a phase change, solved by Newton's method on the step's heat balance
 * in enthalpy form. At every free node
 *   R_a = ∫ρ(H(Tⁿ⁺¹) − H(Tⁿ))N_a dμ / Δt − imbalance_a(Tⁿ⁺θ) = 0,
 * the heat taken up by the node's share of the body over the step, less the heat conducted,
 * generated and let in through the faces at Tⁿ⁺θ = θTⁿ⁺¹ + (1−θ)Tⁿ (the θ-method of
 * transient-solve.ts, with λ and films at Tⁿ⁺θ as there). The storage term is the enthalpy change
 * itself, the chord capacity (H(Tⁿ⁺¹) − H(Tⁿ))/(Tⁿ⁺¹ − Tⁿ) times the temperature change, so the heat
 * stored over a run is ∫ρ(H(T_end) − H(T_0))dμ exactly, and it equals the heat let in to within the
 * residual Newton leaves: latent heat included, however far a step jumps across the freezing range.
 *
 * Why Newton, and not the fixed-point (Picard) iteration of the other steps: a node that barely
 * enters the range in a step sees a chord capacity far below the latent L/w of the range, and the
 * fixed point then swings the node in and out of the range without end (the map's slope there is
 * (L/w)/chord − 1 ≫ 1). Newton's tangent, ρH'(Tⁿ⁺¹)/Δt plus θ times the conduction and film
 * tangent (tangent-assembly.ts), follows the kinks of H; a backtracking line search on the largest
 * nodal imbalance, as in the steady solve, stops it cycling across the two ends of the range.
 */
import { BandedMatrix, factorBanded, substituteBanded, ZeroPivotError } from './banded-matrix.js';
import type { Discretisation } from './discretisation.js';
import { ConvergenceError, SingularProblemError } from './errors.js';
import { filmHeatIn, freeNodeRange, imposeFixedTemperatures } from './face-conditions.js';
import { assembleEnthalpyStorage } from './phase-change-integrals.js';
import { assembleTangent, newBalanceWorkspace } from './tangent-assembly.js';

export interface LatentStepOutcome {
  readonly temperatures: Float64Array;
  readonly heatInInner: number;
  readonly heatInOuter: number;
  readonly generated: number;
  readonly iterations: number;
}

/** The smallest fraction of a Newton step the line search tries before taking it anyway. */
const MIN_STEP_FRACTION = 1 / 64;
/**
 * Below this change (K) a correction that no longer halves is the round-off of the imbalance (a
 * steel wall beside insulation), not a slow convergence: Newton's changes shrink quadratically there.
 */
const ROUND_OFF_LEVEL = 1e-7;

export function latentStep(d: Discretisation, previous: Float64Array, dt: number, theta: number, tolerance: number, maxIterations: number): LatentStepOutcome {
  const n = previous.length;
  const order = d.mesh.order;
  const next = Float64Array.from(previous);
  imposeFixedTemperatures(d.faces, next, d.reference);
  const { first, last } = freeNodeRange(d.faces, n);
  const workspace = newBalanceWorkspace(d);
  const midpoint = new Float64Array(n);
  const stored = new Float64Array(n);
  const capacity = new BandedMatrix(n, order);
  const jacobian = new BandedMatrix(n, order);
  const residual = new Float64Array(n);
  const start = new Float64Array(n);

  /** Fills the residual and the matrices at `next`; returns the largest nodal imbalance (W/m² or W/m). */
  const evaluate = (): number => {
    for (let i = 0; i < n; i++) midpoint[i] = theta * next[i]! + (1 - theta) * previous[i]!;
    assembleTangent(d, midpoint, workspace);
    stored.fill(0);
    capacity.data.fill(0);
    assembleEnthalpyStorage(d.mesh, d.layers, d.measure, previous, next, d.reference, stored, capacity);
    let largest = 0;
    for (let i = 0; i < n; i++) {
      residual[i] = stored[i]! / dt - workspace.imbalance[i]!;
      if (i >= first && i <= last) largest = Math.max(largest, Math.abs(residual[i]!));
    }
    return largest;
  };

  let imbalance = evaluate();
  let lastChange = Infinity;
  let iteration = 0;
  while (first <= last) {
    iteration++;
    // d R/d Tⁿ⁺¹ = ρH'/Δt + θ·(conduction and film tangent at Tⁿ⁺θ).
    for (let k = 0; k < jacobian.data.length; k++) jacobian.data[k] = capacity.data[k]! / dt + theta * workspace.tangent.data[k]!;
    try {
      factorBanded(jacobian, first, last);
    } catch (error) {
      if (error instanceof ZeroPivotError) throw new SingularProblemError('A time step with a phase change has a singular system: give every layer a density and specific heat above 0.');
      throw error;
    }
    const correction = Float64Array.from(residual);
    substituteBanded(jacobian, correction, first, last);
    let change = 0;
    for (let i = first; i <= last; i++) change = Math.max(change, Math.abs(correction[i]!));
    if (!Number.isFinite(change)) throw new ConvergenceError(iteration, change, 'A time step with a phase change diverged: temperatures stopped being finite numbers.');

    // Take the step, or the largest halving of it that does not make the imbalance worse.
    start.set(next);
    let fraction = 1;
    for (;;) {
      for (let i = first; i <= last; i++) next[i] = start[i]! - fraction * correction[i]!;
      const trial = evaluate();
      if (trial <= imbalance || fraction * change <= tolerance || fraction <= MIN_STEP_FRACTION) {
        imbalance = trial;
        break;
      }
      fraction /= 2;
    }
    const converged = change <= tolerance || (change <= ROUND_OFF_LEVEL && change > lastChange / 2);
    if (converged && fraction === 1) break;
    lastChange = change;
    if (iteration >= maxIterations) {
      throw new ConvergenceError(
        iteration,
        change,
        `A time step with a phase change did not converge in ${iteration} iterations: the last temperature change was ${change.toExponential(3)} K.`,
      );
    }
  }
  if (first > last) evaluate();

  // Stage 3: the heat in through each face over the step, at Tⁿ⁺θ, as the balance used it.
  let natural = 0;
  const heat = d.faces.map((face) => {
    const c = face.condition;
    // At a fixed face the row set aside: what the node's share takes up less what reaches it otherwise.
    if (c.kind === 'temperature') return residual[face.node]!;
    const q = c.kind === 'flux' ? c.flux * face.measure : filmHeatIn(c, d.reference + midpoint[face.node]!).heatIn * face.measure;
    natural += q;
    return q;
  });
  let sources = 0;
  for (let i = 0; i < n; i++) sources += workspace.sources[i]!;
  return { temperatures: next, heatInInner: heat[0]!, heatInOuter: heat[1]!, generated: sources - natural, iterations: Math.max(1, iteration) };
}
