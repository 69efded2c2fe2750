/**
 * The marks a cross-section's patterned fills carry (masonry hatched, air dotted, the bore lined),
 * as plain geometry inside the band or ring: one <path> per layer, in solid colours. Not SVG
 * <pattern>s: Chromium prints every use of a pattern as a tile group of its own, which made a
 * long report's PDF twice the size and a second slower to print. The marks fall on the same
 * 6-unit grid of the drawing for every layer, so neighbouring layers' marks line up.
 */
import type { FillPattern } from '../drawing/material-palette.js';

/** A band (plane wall): x from…to, y top…bottom. */
export interface BandRegion {
  readonly kind: 'band';
  readonly from: number;
  readonly to: number;
  readonly top: number;
  readonly bottom: number;
}

/** A ring (pipe): radii inner…outer about a centre; inner 0 is a full disc (the bore). */
export interface RingRegion {
  readonly kind: 'ring';
  readonly cx: number;
  readonly cy: number;
  readonly inner: number;
  readonly outer: number;
}

export type MarkRegion = BandRegion | RingRegion;

const SPACING = 6;
const DOT_RADIUS = 0.9;
/** The marks' colours: what the screen's translucent marks give on their category's colour. */
const MARKS: Readonly<Record<Exclude<FillPattern, 'none'>, string>> = {
  hatch: 'fill="none" stroke="#dfc5b7" stroke-width="1.1"',
  dots: 'fill="#848a8f"',
  lines: 'fill="none" stroke="#97a3aa" stroke-width="0.8"',
};

/** The pattern's marks in the region as one <path>, or '' for a fill without a pattern. */
export function patternMarks(pattern: FillPattern, region: MarkRegion): string {
  if (pattern === 'none') return '';
  const d = pattern === 'dots' ? dots(region) : pattern === 'hatch' ? hatch(region) : lines(region);
  return d === '' ? '' : `<path class="marks-${pattern}" d="${d}" ${MARKS[pattern]}/>`;
}

/** Lines x + y = 6k (rising to the right), cut to the region. */
function hatch(region: MarkRegion): string {
  const [x0, x1, y0, y1] = bounds(region);
  const out: string[] = [];
  for (let c = Math.ceil((x0 + y0) / SPACING) * SPACING; c <= x1 + y1; c += SPACING) {
    // The line through (c/2, c/2) along (1, −1)/√2.
    for (const [a, b] of cut(region, c / 2, c / 2, Math.SQRT1_2, -Math.SQRT1_2)) out.push(segment(c / 2, c / 2, Math.SQRT1_2, -Math.SQRT1_2, a, b));
  }
  return out.join('');
}

/** Horizontal lines y = 6k + 3, cut to the region. */
function lines(region: MarkRegion): string {
  const [x0, , y0, y1] = bounds(region);
  const out: string[] = [];
  for (let y = Math.ceil((y0 - 3) / SPACING) * SPACING + 3; y <= y1; y += SPACING) {
    for (const [a, b] of cut(region, x0, y, 1, 0)) out.push(segment(x0, y, 1, 0, a, b));
  }
  return out.join('');
}

/** Dots at (6i + 3, 6j + 3) whose whole disc lies inside the region. */
function dots(region: MarkRegion): string {
  const [x0, x1, y0, y1] = bounds(region);
  const out: string[] = [];
  const r = DOT_RADIUS;
  for (let y = Math.ceil((y0 - 3) / SPACING) * SPACING + 3; y <= y1; y += SPACING) {
    for (let x = Math.ceil((x0 - 3) / SPACING) * SPACING + 3; x <= x1; x += SPACING) {
      const inside =
        region.kind === 'band'
          ? x - r >= region.from && x + r <= region.to && y - r >= region.top && y + r <= region.bottom
          : Math.hypot(x - region.cx, y - region.cy) >= region.inner + r && Math.hypot(x - region.cx, y - region.cy) <= region.outer - r;
      if (inside) out.push(`M${n(x - r)} ${n(y)}a${r} ${r} 0 1 0 ${2 * r} 0a${r} ${r} 0 1 0 ${-2 * r} 0Z`);
    }
  }
  return out.join('');
}

function bounds(region: MarkRegion): [number, number, number, number] {
  return region.kind === 'band'
    ? [region.from, region.to, region.top, region.bottom]
    : [region.cx - region.outer, region.cx + region.outer, region.cy - region.outer, region.cy + region.outer];
}

/**
 * Where the line p + t·u (u a unit vector) runs inside the region: the t intervals, each longer
 * than a hair.
 */
function cut(region: MarkRegion, px: number, py: number, ux: number, uy: number): [number, number][] {
  let spans: [number, number][];
  if (region.kind === 'band') {
    let lo = -Infinity;
    let hi = Infinity;
    for (const [p, u, min, max] of [[px, ux, region.from, region.to], [py, uy, region.top, region.bottom]] as const) {
      if (Math.abs(u) < 1e-12) {
        if (p < min || p > max) return [];
        continue;
      }
      const [a, b] = [(min - p) / u, (max - p) / u].sort((s, t) => s - t) as [number, number];
      lo = Math.max(lo, a);
      hi = Math.min(hi, b);
    }
    spans = [[lo, hi]];
  } else {
    // The foot of the perpendicular from the centre, at t0; the half-chord of a circle of radius R is √(R² − d²).
    const t0 = (region.cx - px) * ux + (region.cy - py) * uy;
    const d = Math.hypot(px + t0 * ux - region.cx, py + t0 * uy - region.cy);
    if (d >= region.outer) return [];
    const outer = Math.sqrt(region.outer ** 2 - d ** 2);
    const inner = d < region.inner ? Math.sqrt(region.inner ** 2 - d ** 2) : 0;
    spans = inner > 0 ? [[t0 - outer, t0 - inner], [t0 + inner, t0 + outer]] : [[t0 - outer, t0 + outer]];
  }
  return spans.filter(([a, b]) => b - a > 0.05);
}

function segment(px: number, py: number, ux: number, uy: number, a: number, b: number): string {
  return `M${n(px + a * ux)} ${n(py + a * uy)}L${n(px + b * ux)} ${n(py + b * uy)}`;
}

function n(value: number): string {
  return String(Math.round(value * 100) / 100);
}
