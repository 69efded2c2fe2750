/**
 * The chart.js configuration of a report chart: no animation, values in the units they are read
 * in, months on a category axis, and every series of a chart told apart by its dash pattern and
 * point shape as well as its colour, so that it reads in greyscale.
 */
import { describe, expect, it } from 'vitest';
import type { ReportChart } from '../../app/report/report-model.js';
import { besideTheAxis, chartConfiguration, type ChartInk } from '../../renderer/src/report-view/chart-config.js';
import { quantityText } from '../../renderer/src/report-view/quantity-text.js';
import { seriesStyles } from '../../app/report/drawing/series-styles.js';
import { chartOf, exampleReport } from './report-fixtures.js';

const ink: ChartInk = { ink: '#111111', soft: '#555555', rule: '#dddddd', fontFamily: 'sans-serif' };
const text = quantityText('SI');

describe('chartConfiguration', () => {
  it('plots a temperature profile on a linear axis in millimetres, markers included, without animation', () => {
    const chart = chartOf(exampleReport('pipe-steam-outdoor.json'), 'Temperature through the build-up');
    const config = chartConfiguration(chart, ink, text);
    expect(config.options?.animation).toBe(false);
    expect(config.options?.scales?.['x']?.type).toBe('linear');
    const x = config.options?.scales?.['x'] as { title: { text: string } };
    expect(x.title.text).toBe('radius (mm)');
    expect(config.data.datasets[0]!.data).toEqual(chart.series[0]!.points.map(([r, t]) => ({ x: r * 1000, y: t })));
    expect(config.options?.plugins?.interfaceMarkers?.positions).toEqual(chart.markers!.map((m) => m.x * 1000));
    // The dew point is a reference line: dashed, while the temperature is solid.
    expect(config.data.datasets[0]!.borderDash).toEqual([]);
    expect(config.data.datasets[1]!.borderDash!.length).toBeGreaterThan(0);
  });

  it('puts months on a category axis by name', () => {
    const chart = chartOf(exampleReport('wall-winter-condensation.json'), 'Condensate stored month by month');
    const config = chartConfiguration(chart, ink, text);
    expect(config.options?.scales?.['x']?.type).toBe('category');
    expect(config.data.labels).toEqual(chart.x.categories);
    expect(config.data.datasets[0]!.data.map((p) => p.x)).toEqual(chart.series[0]!.points.map(([m]) => chart.x.categories![m]));
  });

  it('shows the points of a short series and only the line of a dense one', () => {
    const dense: ReportChart = {
      title: 'Dense',
      x: { label: 'x', quantity: 'position' },
      y: { label: 'y', quantity: 'temperature' },
      series: [
        { name: 'few', points: [[0, 1], [0.1, 2]] },
        { name: 'many', points: Array.from({ length: 40 }, (_, k) => [k / 100, k] as const) },
      ],
    };
    const [few, many] = chartConfiguration(dense, ink, text).data.datasets;
    expect(few!.pointRadius).toBe(3);
    expect(many!.pointRadius).toBe(0);
  });
});

describe('seriesStyles', () => {
  it('gives every series of a chart its own dash pattern and point shape, reference lines always dashed', () => {
    const series = [{}, { reference: true }, {}, { reference: true }, {}, {}];
    const styles = seriesStyles(series);
    const keys = styles.map((s) => `${s.dash.join(',')}|${s.point}`);
    expect(new Set(keys).size).toBe(series.length);
    expect(new Set(styles.map((s) => s.dash.join(','))).size).toBe(series.length);
    styles.forEach((s, i) => {
      if (series[i]!.reference) expect(s.dash.length).toBeGreaterThan(0);
    });
    expect(styles[0]!.dash).toEqual([]);
  });

  it('sets a long y-axis title on two lines, the unit under the words, and keeps a short one whole', () => {
    expect(besideTheAxis('stored condensate (kg/m²)')).toEqual(['stored condensate', '(kg/m²)']);
    expect(besideTheAxis('temperature (°C)')).toBe('temperature (°C)');
    expect(besideTheAxis('a title with no unit at all, long')).toBe('a title with no unit at all, long');
  });
});
