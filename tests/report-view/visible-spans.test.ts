/**
 * Layer widths in a cross-section drawing: to scale, except that none is narrower than the
 * minimum, and only the widened ones are flagged. Expected values are worked by hand from the
 * lengths given (plain proportion, no source needed).
 */
import { describe, expect, it } from 'vitest';
import { visibleSpans } from '../../app/report/drawing/visible-spans.js';

const widths = (spans: ReturnType<typeof visibleSpans>) => spans.map((s) => s.end - s.start);

describe('visibleSpans', () => {
  it('lays lengths end to end in proportion when every one is wide enough', () => {
    const spans = visibleSpans([0.1, 0.3, 0.1], 500, 4);
    expect(widths(spans).map((w) => Number(w.toFixed(9)))).toEqual([100, 300, 100]);
    expect(spans.map((s) => s.start)).toEqual([0, 100, 400]);
    expect(spans.every((s) => !s.widened)).toBe(true);
  });

  it('widens a 0.7 mm jacket beside 100 mm of insulation to the minimum and keeps the rest in proportion', () => {
    // 3.6 mm pipe wall, 100 mm insulation, 0.7 mm jacket on 512 px: to scale the jacket would be
    // 512 × 0.7 / 104.3 = 3.44 px, under the 4 px minimum. It takes 4 px; the other two share the
    // remaining 508 px as 3.6 : 100.
    const spans = visibleSpans([0.0036, 0.1, 0.0007], 512, 4);
    expect(spans.map((s) => s.widened)).toEqual([false, false, true]);
    const [wall, insulation, jacket] = widths(spans);
    expect(jacket).toBe(4);
    expect(wall! / insulation!).toBeCloseTo(0.036, 12);
    expect(wall! + insulation!).toBeCloseTo(508, 9);
    expect(spans[2]!.end).toBeCloseTo(512, 9);
  });

  it('widens again where widening one length pushes another under the minimum', () => {
    // 1, 1.042 and 24 on 100 px with a 4 px minimum: at first only the 1 falls under (3.840 px per
    // unit; the 1.042 gets 4.001 px). The other two then share 96 px at 3.834 px per unit, which
    // puts the 1.042 at 3.995 px: widened too, and the 24 takes the last 92 px.
    const spans = visibleSpans([1, 1.042, 24], 100, 4);
    expect(spans.map((s) => s.widened)).toEqual([true, true, false]);
    expect(widths(spans)).toEqual([4, 4, 92]);
  });

  it('gives equal shares when there is no room for every length at the minimum', () => {
    const spans = visibleSpans([1, 1, 1000], 6, 4);
    expect(widths(spans)).toEqual([2, 2, 2]);
    expect(spans[2]!.end).toBe(6);
  });

  it('draws nothing for no lengths', () => {
    expect(visibleSpans([], 100, 4)).toEqual([]);
  });
});
