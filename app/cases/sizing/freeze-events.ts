/**
 * The moments a freeze simulation reports, read off the run step by step.
 */
import type { EnthalpyCurve } from '../../fe/phase-change.js';
import type { TransientState } from '../../fe/problem.js';

/**
 * K: the centre counts as at the freezing point once within this of it. In still water the liquid
 * inside the ice only approaches the freezing point (in the model, the top of the freezing range,
 * where the ice front is), so "reached" needs a margin; 0.1 K is below what a site thermometer
 * resolves (common practice, no source).
 */
export const CENTRE_TOLERANCE = 0.1;

interface Sample {
  readonly time: number;
  readonly centre: number;
  readonly wall: number;
  readonly solid: number;
}

/** The time `value` falls to `level` on the straight line through two samples (before, after). */
function lineCrossing(t1: number, v1: number, t2: number, v2: number, level: number): number {
  return t1 + ((v1 - level) / (v1 - v2)) * (t2 - t1);
}

/**
 * The time in [t1, t2] at which the parabola through (t0, v0), (t1, v1), (t2, v2) falls to `level`,
 * with v1 > level ≥ v2 (so there is one; found by bisection, which needs nothing more).
 */
function parabolaCrossing(t0: number, v0: number, t1: number, v1: number, t2: number, v2: number, level: number): number {
  const at = (t: number) =>
    (v0 * (t - t1) * (t - t2)) / ((t0 - t1) * (t0 - t2)) + (v1 * (t - t0) * (t - t2)) / ((t1 - t0) * (t1 - t2)) + (v2 * (t - t0) * (t - t1)) / ((t2 - t0) * (t2 - t1));
  let low = t1;
  let high = t2;
  for (let k = 0; k < 60; k++) {
    const middle = (low + high) / 2;
    if (at(middle) > level) low = middle;
    else high = middle;
  }
  return (low + high) / 2;
}

/**
 * Watches the run, sample by sample (TransientProblem.stopWhen), for the events; the caller ends
 * the run once those it needs are known. Each is timed within the step where it happens, second
 * order in the step:
 * - first ice: the water at the wall reaches the top of the freezing range, where the model starts
 *   to release latent heat. Up to that moment nothing in the water has begun to freeze and the
 *   wall's temperature is a smooth function of time; in the step that crosses it the temperature
 *   stalls in the range. So the crossing is extrapolated along the last two samples above it (the
 *   smooth trajectory), not interpolated towards the stalled one, which would place it late by up
 *   to a step;
 * - the centre within CENTRE_TOLERANCE of the top of the freezing range: on the parabola through
 *   the last three samples (the centre's temperature curves strongly as it nears the range);
 * - the solid mass fraction reaching `fraction`, on the straight line between two samples (the
 *   mass-weighted fraction grows smoothly), except when the step ends with all the water frozen:
 *   the fraction stops at 1 within that step, so the crossing is extrapolated along the last two
 *   samples, as for the first ice.
 * Until two earlier samples exist, each is interpolated on a straight line.
 */
export function eventWatcher(curve: EnthalpyCurve, t0: number, fraction: number | null, wallNode: number) {
  const centreLimit = curve.liquidus + CENTRE_TOLERANCE;
  const iceLimit = curve.liquidus;
  let earlier: Sample | null = null;
  let last: Sample = { time: 0, centre: t0, wall: t0, solid: 0 };
  // Water that starts within the tolerance of the range is at the freezing point from the start.
  let zero = t0 <= centreLimit ? 0 : Infinity;
  let firstIce = Infinity;
  let frozen = Infinity;
  return {
    update(state: TransientState): void {
      const now: Sample = { time: state.time, centre: state.temperatures[0]!, wall: state.temperatures[wallNode]!, solid: state.solidFraction[0]! };
      if (firstIce === Infinity && now.wall <= iceLimit) {
        const slope = earlier === null ? 0 : (last.wall - earlier.wall) / (last.time - earlier.time);
        firstIce =
          slope < 0
            ? Math.min(now.time, Math.max(last.time, last.time + (iceLimit - last.wall) / slope))
            : lineCrossing(last.time, last.wall, now.time, now.wall, iceLimit);
      }
      if (zero === Infinity && now.centre <= centreLimit) {
        zero =
          earlier === null
            ? lineCrossing(last.time, last.centre, now.time, now.centre, centreLimit)
            : parabolaCrossing(earlier.time, earlier.centre, last.time, last.centre, now.time, now.centre, centreLimit);
      }
      if (fraction !== null && frozen === Infinity && now.solid >= fraction) {
        const rate = earlier === null ? 0 : (last.solid - earlier.solid) / (last.time - earlier.time);
        frozen =
          now.solid >= 1 && rate > 0
            ? Math.min(now.time, Math.max(last.time, last.time + (fraction - last.solid) / rate))
            : lineCrossing(last.time, -last.solid, now.time, -now.solid, -fraction);
      }
      earlier = last;
      last = now;
    },
    timeToZero: () => zero,
    timeToFirstIce: () => firstIce,
    timeToFraction: () => frozen,
  };
}
