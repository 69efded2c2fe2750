/**
 * The printed chart (app/report/html/svg-chart): where a data point lands is checked against the
 * axis mapping read back from the drawing's own ticks (a straight line through two labelled
 * ticks on each axis), with the values converted here by hand from SI (m → mm; °C → °F by
 * θ_F = 1.8·θ_C + 32, the definition of the Fahrenheit scale); and what makes a chart legible in
 * greyscale: every series its own dash pattern and point shape, reference series dashed.
 */
import { describe, expect, it } from 'vitest';
import { niceAxis, niceStep, tickText } from '../../../app/report/html/chart-axis.js';
import { printText } from '../../../app/report/html/print-text.js';
import { chartSvg } from '../../../app/report/html/svg-chart.js';
import type { ReportChart } from '../../../app/report/report-model.js';
import { demoCases } from './demo-report.js';

function chartsOf(unitSystem: 'SI' | 'IP'): ReportChart[] {
  return demoCases(unitSystem).flatMap((c) =>
    'report' in c ? c.report.sections.flatMap((s) => s.blocks.flatMap((b) => (b.kind === 'chart' ? [b.chart] : []))) : [],
  );
}

/** A linear map through two (value, drawing) pairs. */
function lineThrough(a: readonly [number, number], b: readonly [number, number]): (v: number) => number {
  return (v) => a[1] + ((v - a[0]) * (b[1] - a[1])) / (b[0] - a[0]);
}

/**
 * The y ticks (value, y) and x ticks (label, x) as the SVG draws them: the grid path has one
 * horizontal "M x y H x" per y tick and the tick path one "M x y v 5" per x tick, in the order of
 * their labels.
 */
function ticks(svg: string) {
  const values = [...svg.matchAll(/<text class="tick y" data-value="([^"]+)"/g)].map((m) => Number(m[1]));
  const gridYs = [...(/<path class="grid" d="([^"]*)"/.exec(svg)?.[1] ?? '').matchAll(/M[^ ]+ ([^H]+)H/g)].map((m) => Number(m[1]));
  const labels = [...svg.matchAll(/<text class="tick x"[^>]*>([^<]+)<\/text>/g)].map((m) => m[1]!);
  const tickXs = [...(/<path class="ticks" d="([^"]*)"/.exec(svg)?.[1] ?? '').matchAll(/M([^ ]+) /g)].map((m) => Number(m[1]));
  expect(gridYs.length).toBe(values.length);
  expect(tickXs.length).toBe(labels.length);
  const y = values.map((v, k) => [v, gridYs[k]!] as const);
  const x = labels.map((label, k) => [label, tickXs[k]!] as const);
  return { y, x };
}

function polylines(svg: string): [number, number][][] {
  return [...svg.matchAll(/<polyline points="([^"]+)"/g)].map((m) => m[1]!.split(' ').map((p) => p.split(',').map(Number) as [number, number]));
}

const number = (label: string) => Number(label.replace('\u2212', '-'));

describe('chartSvg', () => {
  const profile = chartsOf('SI').find((c) => c.title === 'Temperature through the build-up')!;
  const svg = chartSvg(profile, printText('SI'));

  it('puts each point where the axes, read from their ticks, say it belongs (positions in mm, temperatures in °C)', () => {
    const t = ticks(svg);
    expect(t.y.length).toBeGreaterThanOrEqual(3);
    expect(t.x.length).toBeGreaterThanOrEqual(3);
    const yOf = lineThrough(t.y[0]!, t.y[t.y.length - 1]!);
    const xOf = lineThrough([number(t.x[0]![0]), t.x[0]![1]], [number(t.x[t.x.length - 1]![0]), t.x[t.x.length - 1]![1]]);
    const drawn = polylines(svg)[0]!;
    const points = profile.series[0]!.points;
    expect(drawn.length).toBe(points.length);
    for (const k of [0, Math.floor(points.length / 2), points.length - 1]) {
      const [radius, temperature] = points[k]!;
      // Drawing coordinates are written to 0.01 unit.
      expect(Math.abs(drawn[k]![0] - xOf(radius * 1000))).toBeLessThan(0.011);
      expect(Math.abs(drawn[k]![1] - yOf(temperature))).toBeLessThan(0.011);
    }
  });

  it('draws the interfaces as dotted verticals at their positions, numbered, and names them in the caption', () => {
    const t = ticks(svg);
    const xOf = lineThrough([number(t.x[0]![0]), t.x[0]![1]], [number(t.x[t.x.length - 1]![0]), t.x[t.x.length - 1]![1]]);
    const lines = [...svg.matchAll(/<g class="marker"><line x1="([^"]+)"[^>]*stroke-dasharray="2 3"\/><text[^>]*>(\d+)<\/text>/g)];
    expect(lines.length).toBe(profile.markers!.length);
    profile.markers!.forEach((m, i) => {
      expect(Math.abs(Number(lines[i]![1]) - xOf(m.x * 1000))).toBeLessThan(0.011);
      expect(lines[i]![2]).toBe(String(i + 1));
    });
    expect(svg).toContain(`1 at 57.1 mm, ${profile.markers![0]!.label}`);
  });

  it('dashes the reference series, keeps the first solid, and gives each its own point shape and a legend entry', () => {
    expect(profile.series.map((s) => Boolean(s.reference))).toEqual([false, true]);
    const series = [...svg.matchAll(/<g class="series" data-series="\d"><polyline [^>]*?\/>(<path class="points" data-shape="([^"]+)" d="M[^"]+"[^>]*>)/g)];
    expect(series.length).toBe(2);
    expect(series[0]![0]).not.toContain('stroke-dasharray');
    expect(series[1]![0]).toContain('stroke-dasharray="6 4"');
    expect(series[0]![2]).not.toBe(series[1]![2]);
    expect(svg).toContain('<span>dew point of the air (reference)</span>');
    expect(svg).toContain('viewBox="0 0 640 300" width="100%"');
    expect(svg).toContain('>Temperature (°C)</tspan>');
    expect(svg).toContain('>Radius (mm)</text>');
  });

  it('writes a US chart in °F and inches: the same point lands where 1.8·θ + 32 and m/0.0254 say', () => {
    const us = chartsOf('IP').find((c) => c.title === 'Temperature through the build-up')!;
    const usSvg = chartSvg(us, printText('IP'));
    expect(usSvg).toContain('>Temperature (°F)</tspan>');
    expect(usSvg).toContain('>Radius (in)</text>');
    const t = ticks(usSvg);
    const yOf = lineThrough(t.y[0]!, t.y[t.y.length - 1]!);
    const xOf = lineThrough([number(t.x[0]![0]), t.x[0]![1]], [number(t.x[t.x.length - 1]![0]), t.x[t.x.length - 1]![1]]);
    const [radius, temperature] = us.series[0]!.points[0]!;
    const drawn = polylines(usSvg)[0]![0]!;
    expect(Math.abs(drawn[0] - xOf(radius / 0.0254))).toBeLessThan(0.011);
    expect(Math.abs(drawn[1] - yOf(1.8 * temperature + 32))).toBeLessThan(0.011);
  });

  it('puts month k of a monthly chart on the tick that names it', () => {
    const monthly = chartsOf('SI').find((c) => c.x.categories !== undefined)!;
    const monthlySvg = chartSvg(monthly, printText('SI'));
    const t = ticks(monthlySvg);
    expect(t.x.map(([label]) => label)).toEqual(monthly.x.categories!.map((m) => m.slice(0, 3)));
    const drawn = polylines(monthlySvg)[0]!;
    monthly.series[0]!.points.forEach(([k], i) => expect(drawn[i]![0]).toBeCloseTo(t.x[k]![1], 2));
  });

  it('has no style attribute and escapes its texts', () => {
    const named: ReportChart = { ...profile, title: '<script>x</script>', series: profile.series.map((s) => ({ ...s, name: 'a<b' })) };
    const out = chartSvg(named, printText('SI'));
    expect(out).not.toMatch(/\sstyle=/);
    expect(out).not.toContain('<script>');
    expect(out).toContain('&lt;script&gt;x&lt;/script&gt;');
    expect(out).toContain('<span>a&lt;b</span>');
  });
});

describe('niceAxis', () => {
  it('steps by 1, 2, 2.5 or 5 times a power of ten', () => {
    expect(niceStep(87, 5)).toBe(20);
    expect(niceStep(0.9, 5)).toBe(0.2);
    expect(niceStep(1200, 5)).toBe(250);
  });

  it('widens a value axis out to the ticks round the data, and keeps a position axis to the data', () => {
    expect(niceAxis(11.1, 80, true)).toEqual({ min: 0, max: 80, ticks: [0, 20, 40, 60, 80], decimals: 0 });
    const position = niceAxis(53.5, 107.8, false, 6);
    expect([position.min, position.max]).toEqual([53.5, 107.8]);
    expect(position.ticks).toEqual([60, 70, 80, 90, 100]);
  });

  it('gives a flat series a range round it, and writes ticks with the decimals their step needs', () => {
    const flat = niceAxis(0, 0, true);
    expect(flat.min).toBeLessThan(0);
    expect(flat.max).toBeGreaterThan(0);
    expect(niceAxis(0, 0.9, true).ticks).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
    expect(niceAxis(0, 0.9, true).decimals).toBe(1);
    expect(tickText(-0.5, 1)).toBe('\u22120.5');
    expect(tickText(-0.0001, 1)).toBe('0.0');
  });
});

describe('a chart without points', () => {
  it('draws its empty axes, not NaN', () => {
    const empty: ReportChart = { title: 'Nothing yet', x: { label: 'position', quantity: 'position' }, y: { label: 'temperature', quantity: 'temperature' }, series: [] };
    const svg = chartSvg(empty, printText('SI'));
    expect(svg).not.toContain('NaN');
    expect(svg).not.toContain('Infinity');
    expect(svg).toContain('<text class="tick y"');
  });
});
