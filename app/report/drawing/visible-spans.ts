/**
 * Lengths laid end to end on a span of a drawing, to scale, except that none is drawn narrower
 * than `minimum`: a 0.7 mm jacket beside 100 mm of insulation would be a fraction of a pixel.
 * A widened length takes the minimum and the others share what is left, still in proportion to
 * each other; the widened ones are flagged so that the drawing can say "not to scale" there, and
 * only there.
 */
export interface VisibleSpan {
  /** Distance from the start of the span to where this length starts, in drawing units. */
  readonly start: number;
  readonly end: number;
  /** True where the length is drawn wider than to scale. */
  readonly widened: boolean;
}

export function visibleSpans(lengths: readonly number[], span: number, minimum: number): VisibleSpan[] {
  if (lengths.length === 0) return [];
  // With more lengths than room for each at the minimum, each gets an equal share instead.
  const floor = Math.min(minimum, span / lengths.length);
  const widened = lengths.map(() => false);
  for (;;) {
    const scale = scaleFor(lengths, widened, span, floor);
    const more = lengths.map((l, i) => !widened[i] && l * scale < floor);
    if (!more.some(Boolean)) {
      let at = 0;
      return lengths.map((l, i) => {
        const width = widened[i] ? floor : l * scale;
        const piece = { start: at, end: at + width, widened: widened[i]! };
        at += width;
        return piece;
      });
    }
    more.forEach((m, i) => {
      if (m) widened[i] = true;
    });
  }
}

/** Drawing units per unit of length for the lengths not widened, once the widened ones have their minimum. */
function scaleFor(lengths: readonly number[], widened: readonly boolean[], span: number, floor: number): number {
  const free = lengths.reduce((sum, l, i) => (widened[i] ? sum : sum + l), 0);
  const left = span - floor * widened.filter(Boolean).length;
  return free > 0 ? left / free : 0;
}
