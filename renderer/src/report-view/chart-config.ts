/**
 * A ReportChart as a chart.js line chart: values in the units they are read in, a linear x axis
 * (or the named categories, such as months, where the chart gives them), each series in its own
 * dash pattern and point shape, the markers for the interface plugin, no animation. Pure: the
 * same chart, ink and units give the same configuration, so the component only hands it over.
 */
import type { ChartConfiguration } from 'chart.js';
import type { ReportChart } from '../../../app/report/report-model.js';
// The marker plugin's options type, which also declares them among chart.js's plugin options.
import type { InterfaceMarkerOptions } from './interface-markers.js';
import type { QuantityText } from './quantity-text.js';
import { seriesStyles } from '../../../app/report/drawing/series-styles.js';

/** The page's colours and font, read from its style sheet by the component. */
export interface ChartInk {
  readonly ink: string;
  readonly soft: string;
  readonly rule: string;
  readonly fontFamily: string;
}

export type LinePoint = { x: number | string; y: number };
export type ReportChartConfiguration = ChartConfiguration<'line', LinePoint[], string>;

/** A series with few points shows them; a dense profile is a line only. */
const MOST_POINTS_SHOWN = 24;
const FONT_SIZE = 12;

export function chartConfiguration(chart: ReportChart, ink: ChartInk, text: QuantityText): ReportChartConfiguration {
  const categories = chart.x.categories;
  const styles = seriesStyles(chart.series);
  const xOf = (x: number): number | string => (categories ? (categories[x] ?? String(x)) : text.plotted(x, chart.x.quantity));
  const font = { family: ink.fontFamily, size: FONT_SIZE };
  const title = (label: string, quantity: ReportChart['x']['quantity'] | undefined) => ({
    display: true,
    text: text.labelWithUnit(label, quantity),
    color: ink.soft,
    font,
  });
  const markers: InterfaceMarkerOptions = {
    positions: (chart.markers ?? []).map((m) => (categories ? m.x : text.plotted(m.x, chart.x.quantity))),
    colour: ink.soft,
    font: `${FONT_SIZE - 1}px ${ink.fontFamily}`,
  };
  const common = { ticks: { color: ink.soft, font }, grid: { color: ink.rule }, border: { color: ink.soft } };
  return {
    type: 'line',
    data: {
      ...(categories ? { labels: [...categories] } : {}),
      datasets: chart.series.map((s, i) => {
        const style = styles[i]!;
        const shown = s.points.length <= MOST_POINTS_SHOWN;
        return {
          label: s.name,
          data: s.points.map(([x, y]) => ({ x: xOf(x), y: text.plotted(y, chart.y.quantity) })),
          borderColor: style.colour,
          backgroundColor: style.colour,
          borderWidth: style.width,
          borderDash: [...style.dash],
          pointStyle: style.point,
          pointRadius: shown ? 3 : 0,
          pointHoverRadius: 4,
          tension: 0,
        };
      }),
    },
    options: {
      animation: false,
      responsive: true,
      maintainAspectRatio: false,
      // Room above the plot for the marker numbers.
      layout: { padding: { top: chart.markers && chart.markers.length > 0 ? 14 : 4, right: 8 } },
      scales: {
        x: categories
          ? { type: 'category', title: title(chart.x.label, undefined), ...common }
          : { type: 'linear', title: title(chart.x.label, chart.x.quantity), ...common },
        y: { type: 'linear', title: { ...title(chart.y.label, chart.y.quantity), text: besideTheAxis(text.labelWithUnit(chart.y.label, chart.y.quantity)) }, ...common },
      },
      plugins: {
        legend: { position: 'bottom', labels: { color: ink.ink, font, boxWidth: 32, boxHeight: 2 } },
        tooltip: { enabled: true },
        interfaceMarkers: markers,
      },
    },
  };
}

/**
 * A y-axis title runs up the plot's short side: a long one ("stored condensate (kg/m²)") is set on
 * two lines, the unit under the words, so it is not cut off on a low chart.
 */
export function besideTheAxis(title: string, longest = 20): string | string[] {
  const unitAt = title.lastIndexOf(' (');
  return title.length > longest && unitAt > 0 ? [title.slice(0, unitAt), title.slice(unitAt + 1)] : title;
}
