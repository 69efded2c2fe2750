/**
 * The axes of a printed chart: "nice" tick values (1, 2 or 5 times a power of ten, about five to
 * a side), the range they span, and the straight-line mapping from a value to the drawing.
 */

export interface Axis {
  /** The range drawn, in the values' units. */
  readonly min: number;
  readonly max: number;
  readonly ticks: readonly number[];
  /** Decimals the tick labels need for their step. */
  readonly decimals: number;
}

const STEPS = [1, 2, 2.5, 5, 10];

/** A step of 1, 2, 2.5 or 5 × 10ⁿ that cuts `span` into about `count` pieces. */
export function niceStep(span: number, count: number): number {
  const raw = span / count;
  const power = 10 ** Math.floor(Math.log10(raw));
  return STEPS.find((s) => s * power >= raw)! * power;
}

/**
 * An axis over [low, high]. `extend` widens the range out to the ticks round it (for values: the
 * plot starts and ends on a tick); otherwise the range stays the data's (positions through a
 * build-up start at its inside face) and the ticks fall inside it.
 */
export function niceAxis(low: number, high: number, extend: boolean, count = 5): Axis {
  if (high - low < 1e-12 * Math.max(1, Math.abs(low), Math.abs(high))) {
    const half = Math.abs(low) > 0 ? Math.abs(low) * 0.1 : 1;
    return niceAxis(low - half, high + half, true, count);
  }
  const step = niceStep(high - low, count);
  const first = extend ? Math.floor(low / step + 1e-9) * step : Math.ceil(low / step - 1e-9) * step;
  const last = extend ? Math.ceil(high / step - 1e-9) * step : Math.floor(high / step + 1e-9) * step;
  const ticks: number[] = [];
  for (let k = 0; first + k * step <= last + step * 1e-9; k++) ticks.push(roundTo(first + k * step, step));
  let decimals = 0;
  while (decimals < 12 && Math.abs(step * 10 ** decimals - Math.round(step * 10 ** decimals)) > 1e-6) decimals++;
  return { min: extend ? first : low, max: extend ? last : high, ticks, decimals };
}

/** A tick label: fixed decimals, the true minus sign, never "−0". */
export function tickText(value: number, decimals: number): string {
  const text = value.toFixed(decimals);
  return /[1-9]/.test(text) ? text.replace('-', '\u2212') : text.replace('-', '');
}

/** From a value to the drawing: `from`…`to` in drawing units for axis.min…axis.max. */
export function scaleOf(axis: Pick<Axis, 'min' | 'max'>, from: number, to: number): (value: number) => number {
  return (value) => from + ((value - axis.min) / (axis.max - axis.min)) * (to - from);
}

/** Removes the binary noise of k·step (0.30000000000000004 → 0.3). */
function roundTo(value: number, step: number): number {
  const digits = Math.max(0, 12 - Math.floor(Math.log10(Math.abs(step))));
  return Number(value.toFixed(Math.min(20, digits)));
}
