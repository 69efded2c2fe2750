/**
 * A ReportChart as a static SVG for paper: axes with nice ticks and their units, the interfaces
 * as numbered dotted verticals, each series with its own dash pattern and point shape (the
 * screen's series styles, app/report/drawing/series-styles), reference series dashed, a legend,
 * and month names on a category axis. Sized by its viewBox and drawn at the page's width, so it
 * prints sharp at any size; legible in greyscale because nothing depends on colour alone.
 */
import { spreadLabels } from '../drawing/label-spread.js';
import { seriesStyles, type PointShape, type SeriesStyle } from '../drawing/series-styles.js';
import type { ReportChart } from '../report-model.js';
import { niceAxis, scaleOf, tickText, type Axis } from './chart-axis.js';
import { escapeAttribute, escapeHtml, escapeSvgText } from './escape-html.js';
import type { PrintText } from './print-text.js';

export const CHART_WIDTH = 640;
export const CHART_HEIGHT = 300;
/** The plot's box inside the viewBox: room on the left for the y ticks and title, below for the x ticks and title. */
export const PLOT = { left: 74, right: 626, bottom: 246 } as const;
const TOP_WITH_MARKERS = 26;
const TOP = 12;
/** A series with more points than this is drawn as a line with a point shape every few points. */
const MOST_POINTS_SHOWN = 24;
/** Drawing units between the point shapes along a dense line. */
const SHAPE_SPACING = 70;
const POINT_RADIUS = 3.6;
const INK = '#1f2429';
const SOFT = '#56606a';
const RULE = '#c9ccd0';

export function chartSvg(chart: ReportChart, print: PrintText): string {
  const categories = chart.x.categories;
  const styles = seriesStyles(chart.series);
  const markers = (chart.markers ?? []).map((m) => ({ ...m, at: categories ? m.x : print.plotted(m.x, chart.x.quantity) }));
  const top = markers.length > 0 ? TOP_WITH_MARKERS : TOP;
  const series = chart.series.map((s) => s.points.map(([x, y]) => [categories ? x : print.plotted(x, chart.x.quantity), print.plotted(y, chart.y.quantity)] as const));
  const all = series.flat();
  // A chart with no points still draws its empty axes rather than failing.
  const ys = all.length > 0 ? all.map((p) => p[1]) : [0, 1];
  const yAxis = niceAxis(Math.min(...ys), Math.max(...ys), true);
  const yOf = scaleOf(yAxis, PLOT.bottom, top);
  let xOf: (x: number) => number;
  let xTicks: { at: number; text: string }[];
  if (categories) {
    const band = (PLOT.right - PLOT.left) / Math.max(1, categories.length);
    xOf = (x) => PLOT.left + (x + 0.5) * band;
    // A month's name is cut to its first three letters where the band is too narrow for it.
    const short = categories.some((c) => c.length * 6.2 > band);
    xTicks = categories.map((c, i) => ({ at: xOf(i), text: short ? c.slice(0, 3) : c }));
  } else {
    const xs = all.length > 0 ? all.map((p) => p[0]) : [0, 1];
    const xAxis: Axis = niceAxis(Math.min(...xs), Math.max(...xs), false, 6);
    xOf = scaleOf(xAxis, PLOT.left, PLOT.right);
    xTicks = xAxis.ticks.map((t) => ({ at: xOf(t), text: tickText(t, xAxis.decimals) }));
  }
  const xTitle = print.labelWithUnit(capitalise(chart.x.label), categories ? undefined : chart.x.quantity);
  const yTitle = print.labelWithUnit(capitalise(chart.y.label), chart.y.quantity);

  // The grid and the ticks are one path each, and each tick label a plain <text>: a chart prints as
  // a few dozen elements, not hundreds, which keeps a long report quick to print.
  const parts: string[] = [];
  const grid = yAxis.ticks.map((t) => `M${PLOT.left} ${n(yOf(t))}H${PLOT.right}`).join('');
  const tickMarks = xTicks.map((t) => `M${n(t.at)} ${PLOT.bottom}v5`).join('');
  parts.push(`<path class="grid" d="${grid}" fill="none" stroke="${RULE}" stroke-width="0.7"/>`);
  parts.push(`<path class="ticks" d="${tickMarks}" fill="none" stroke="${SOFT}" stroke-width="0.8"/>`);
  for (const t of yAxis.ticks) {
    parts.push(`<text class="tick y" data-value="${t}" x="${PLOT.left - 6}" y="${n(yOf(t) + 3.8)}" text-anchor="end">${escapeSvgText(tickText(t, yAxis.decimals))}</text>`);
  }
  for (const t of xTicks) {
    parts.push(`<text class="tick x" x="${n(t.at)}" y="${PLOT.bottom + 18}" text-anchor="middle">${escapeSvgText(t.text)}</text>`);
  }
  parts.push(`<rect class="frame" x="${PLOT.left}" y="${top}" width="${PLOT.right - PLOT.left}" height="${PLOT.bottom - top}" fill="none" stroke="${SOFT}" stroke-width="0.8"/>`);

  const shownMarkers = markers.filter((m) => xOf(m.at) >= PLOT.left - 0.5 && xOf(m.at) <= PLOT.right + 0.5);
  const numberXs = spreadLabels(shownMarkers.map((m) => xOf(m.at)), 12, PLOT.left, PLOT.right + 6);
  shownMarkers.forEach((m, i) => {
    const x = n(xOf(m.at));
    parts.push(
      `<g class="marker"><line x1="${x}" y1="${top}" x2="${x}" y2="${PLOT.bottom}" stroke="${SOFT}" stroke-width="0.9" stroke-dasharray="2 3"/>` +
        `<text x="${n(numberXs[i]!)}" y="${top - 5}" text-anchor="middle">${markers.indexOf(m) + 1}</text></g>`,
    );
  });

  series.forEach((points, i) => {
    const style = styles[i]!;
    const dash = style.dash.length > 0 ? ` stroke-dasharray="${style.dash.join(' ')}"` : '';
    const line = points.map(([x, y]) => `${n(xOf(x))},${n(yOf(y))}`).join(' ');
    const shapes = pointShapes(style, shapesAlong(points.map(([x, y]) => [xOf(x), yOf(y)] as const)));
    parts.push(
      `<g class="series" data-series="${i}"><polyline points="${line}" fill="none" stroke="${style.colour}" stroke-width="${style.width}" stroke-linejoin="round"${dash}/>${shapes}</g>`,
    );
  });

  parts.push(`<text class="axis-title" x="${n((PLOT.left + PLOT.right) / 2)}" y="${CHART_HEIGHT - 14}" text-anchor="middle">${escapeSvgText(xTitle)}</text>`);
  const middle = n((top + PLOT.bottom) / 2);
  const yLines = besideTheAxis(yTitle);
  const yText = yLines.map((line, k) => `<tspan x="-${middle}" dy="${k === 0 ? 0 : 13}">${escapeSvgText(line)}</tspan>`).join('');
  // Turned a quarter anticlockwise about the origin: (x, y) of the text is (−page y, page x).
  parts.push(`<text class="axis-title" transform="rotate(-90)" x="-${middle}" y="${yLines.length > 1 ? 12 : 18}" text-anchor="middle">${yText}</text>`);

  const legend = chart.series
    .map((s, i) => `<li>${legendSwatch(styles[i]!)}<span>${escapeHtml(s.name)}${s.reference ? ' (reference)' : ''}</span></li>`)
    .join('');
  const markerWords = shownMarkers.length > 0
    ? `<span class="chart-markers">Dotted lines, numbered at the top: ${escapeHtml(
        markers.map((m, i) => `${i + 1} at ${categories ? (categories[m.x] ?? String(m.x)) : print.withUnit(m.x, chart.x.quantity)}, ${m.label}`).join('; '),
      )}.</span>`
    : '';
  return (
    `<figure class="chart"><figcaption><span class="chart-title">${escapeHtml(chart.title)}</span>${markerWords}</figcaption>` +
    `<svg class="chart-plot" viewBox="0 0 ${CHART_WIDTH} ${CHART_HEIGHT}" width="100%" role="img" aria-label="${escapeAttribute(chart.title)}" font-size="11" fill="${INK}">${parts.join('')}</svg>` +
    `<ul class="chart-legend">${legend}</ul></figure>`
  );
}

/**
 * Where a series shows its point shape: at every point of a short series; along a dense profile,
 * at points at least SHAPE_SPACING apart on the drawing, and its last, so the shape names the line
 * in greyscale without piling up where the points crowd (a thin pipe wall).
 */
function shapesAlong(points: readonly (readonly [number, number])[]): (readonly [number, number])[] {
  if (points.length <= MOST_POINTS_SHOWN) return [...points];
  const shown: (readonly [number, number])[] = [];
  for (const p of points) {
    const last = shown[shown.length - 1];
    if (!last || Math.hypot(p[0] - last[0], p[1] - last[1]) >= SHAPE_SPACING) shown.push(p);
  }
  const end = points[points.length - 1]!;
  const last = shown[shown.length - 1]!;
  if (last !== end) {
    if (Math.hypot(end[0] - last[0], end[1] - last[1]) < SHAPE_SPACING / 2) shown.pop();
    shown.push(end);
  }
  return shown;
}

/**
 * A series' point shapes as one <path> in its colour (data-shape names the shape): the crosses
 * stroked, the others filled; a circle is two arcs.
 */
function pointShapes(style: SeriesStyle, at: readonly (readonly [number, number])[]): string {
  if (at.length === 0) return '';
  const r = POINT_RADIUS;
  const outline: Record<PointShape, (x: number, y: number) => string> = {
    circle: (x, y) => `M${n(x - r)} ${n(y)}a${r} ${r} 0 1 0 ${n(2 * r)} 0a${r} ${r} 0 1 0 ${n(-2 * r)} 0Z`,
    rect: (x, y) => `M${n(x - r * 0.9)} ${n(y - r * 0.9)}h${n(1.8 * r)}v${n(1.8 * r)}h${n(-1.8 * r)}Z`,
    triangle: (x, y) => `M${n(x)} ${n(y - 1.15 * r)}L${n(x + r)} ${n(y + 0.75 * r)}L${n(x - r)} ${n(y + 0.75 * r)}Z`,
    rectRot: (x, y) => `M${n(x)} ${n(y - 1.2 * r)}L${n(x + 1.2 * r)} ${n(y)}L${n(x)} ${n(y + 1.2 * r)}L${n(x - 1.2 * r)} ${n(y)}Z`,
    crossRot: (x, y) => `M${n(x - r)} ${n(y - r)}L${n(x + r)} ${n(y + r)}M${n(x - r)} ${n(y + r)}L${n(x + r)} ${n(y - r)}`,
    star: (x, y) =>
      `M${n(x - r)} ${n(y)}L${n(x + r)} ${n(y)}M${n(x)} ${n(y - r)}L${n(x)} ${n(y + r)}` +
      `M${n(x - 0.7 * r)} ${n(y - 0.7 * r)}L${n(x + 0.7 * r)} ${n(y + 0.7 * r)}M${n(x - 0.7 * r)} ${n(y + 0.7 * r)}L${n(x + 0.7 * r)} ${n(y - 0.7 * r)}`,
  };
  const stroked = style.point === 'crossRot' || style.point === 'star';
  const paint = stroked ? `fill="none" stroke="${style.colour}" stroke-width="1.4"` : `fill="${style.colour}" stroke="${style.colour}" stroke-width="0.8"`;
  return `<path class="points" data-shape="${style.point}" d="${at.map(([x, y]) => outline[style.point](x, y)).join('')}" ${paint}/>`;
}

function legendSwatch(style: SeriesStyle): string {
  const dash = style.dash.length > 0 ? ` stroke-dasharray="${style.dash.join(' ')}"` : '';
  return (
    `<svg class="swatch" viewBox="0 0 40 12" width="40" height="12" aria-hidden="true">` +
    `<line x1="1" y1="6" x2="39" y2="6" stroke="${style.colour}" stroke-width="${style.width}"${dash}/>${pointShapes(style, [[20, 6]])}</svg>`
  );
}

/** A long y title ("Stored condensate (kg/m²)") on two lines, the unit under the words. */
function besideTheAxis(title: string, longest = 24): string[] {
  const unitAt = title.lastIndexOf(' (');
  return title.length > longest && unitAt > 0 ? [title.slice(0, unitAt), title.slice(unitAt + 1)] : [title];
}

/** "Temperature"; a label that starts with a symbol ("s_d from the inside") keeps its case. */
function capitalise(words: string): string {
  return /^\S*_/.test(words) ? words : words.charAt(0).toUpperCase() + words.slice(1);
}

/** Drawing coordinates to 0.01 unit: sharp enough, and short. */
function n(value: number): string {
  return String(Math.round(value * 100) / 100);
}
