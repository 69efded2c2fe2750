/**
 * The text alternative of a chart: its series as tables a screen reader can walk, with the units
 * in the headers, and the marked lines in words. Series that share their x values make one table
 * with a column each; otherwise each series gets its own table (a reference line drawn from two
 * points is not interpolated into values it does not have).
 */
import type { ReportChart } from '../../../app/report/report-model.js';
import type { QuantityText } from './quantity-text.js';

export interface ChartTable {
  readonly caption: string;
  readonly headers: readonly string[];
  readonly rows: readonly (readonly string[])[];
}

export interface ChartText {
  readonly tables: readonly ChartTable[];
  /** Each marked line: where ("60.3 mm", "November") and what it marks. */
  readonly markers: readonly { readonly at: string; readonly label: string }[];
}

export function chartText(chart: ReportChart, text: QuantityText): ChartText {
  const categories = chart.x.categories;
  const xHeader = categories ? capitalise(chart.x.label) : text.labelWithUnit(capitalise(chart.x.label), chart.x.quantity);
  const xCell = (x: number) => (categories ? (categories[x] ?? text.number(x, 'count')) : text.number(x, chart.x.quantity));
  const yCell = (y: number) => text.number(y, chart.y.quantity);
  const first = chart.series[0];
  const sharedX =
    first !== undefined &&
    chart.series.every((s) => s.points.length === first.points.length && s.points.every((p, k) => p[0] === first.points[k]![0]));
  const tables: ChartTable[] = sharedX
    ? [
        {
          caption: chart.title,
          headers: [xHeader, ...chart.series.map((s) => text.labelWithUnit(capitalise(s.name), chart.y.quantity))],
          rows: first.points.map((p, k) => [xCell(p[0]), ...chart.series.map((s) => yCell(s.points[k]![1]))]),
        },
      ]
    : chart.series.map((s) => ({
        caption: `${chart.title}: ${s.name}`,
        headers: [xHeader, text.labelWithUnit(capitalise(chart.y.label), chart.y.quantity)],
        rows: s.points.map(([x, y]) => [xCell(x), yCell(y)]),
      }));
  const markers = (chart.markers ?? []).map((m) => ({
    at: categories ? (categories[m.x] ?? text.number(m.x, 'count')) : text.withUnit(m.x, chart.x.quantity),
    label: m.label,
  }));
  return { tables, markers };
}

function capitalise(words: string): string {
  return words.charAt(0).toUpperCase() + words.slice(1);
}
