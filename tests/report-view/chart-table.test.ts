/**
 * The text alternative of a chart: the same figures the chart draws, as tables with the units in
 * the headers, and each marked line in words. Checked against the solved result the chart was
 * built from (the example cases through solveCase).
 */
import { describe, expect, it } from 'vitest';
import type { ReportChart } from '../../app/report/report-model.js';
import { chartText } from '../../renderer/src/report-view/chart-table.js';
import { quantityText } from '../../renderer/src/report-view/quantity-text.js';
import { chartOf, exampleReport } from './report-fixtures.js';

const text = quantityText('SI');

describe('chartText', () => {
  it('gives each series its own table where their x values differ, with units in the headers', () => {
    const chart = chartOf(exampleReport('pipe-hot-water-plant-room.json'), 'Temperature through the build-up');
    const { tables, markers } = chartText(chart, text);
    expect(tables.map((t) => t.caption)).toEqual(['Temperature through the build-up: temperature', 'Temperature through the build-up: dew point of the air']);
    expect(tables[0]!.headers).toEqual(['Radius (mm)', 'Temperature (°C)']);
    // One row per face: the bore wall, two interfaces and the outer surface, radius in mm to 0.1.
    const temperature = chart.series[0]!;
    expect(tables[0]!.rows).toEqual(temperature.points.map(([r, t]) => [(r * 1000).toFixed(1), t.toFixed(1)]));
    expect(tables[1]!.rows).toHaveLength(2);
    expect(markers).toEqual(chart.markers!.map((m) => ({ at: `${(m.x * 1000).toFixed(1)} mm`, label: m.label })));
  });

  it('makes one table with a column per series where they share their x values, months by name', () => {
    const report = exampleReport('wall-winter-condensation.json');
    const chart = chartOf(report, 'Condensate stored month by month');
    const { tables } = chartText(chart, text);
    expect(tables).toHaveLength(1);
    const [table] = tables;
    expect(table!.headers[0]).toBe('Month');
    expect(table!.headers.slice(1)).toEqual(chart.series.map((s) => `${s.name.charAt(0).toUpperCase()}${s.name.slice(1)} (kg/m²)`));
    expect(table!.rows.map((r) => r[0])).toEqual(chart.series[0]!.points.map(([x]) => chart.x.categories![x]));
    expect(table!.rows).toHaveLength(chart.series[0]!.points.length);
  });

  it('writes a dimensionless axis without an empty unit', () => {
    const chart: ReportChart = {
      title: 'Factor',
      x: { label: 'step', quantity: 'count' },
      y: { label: 'temperature factor', quantity: 'temperatureFactor' },
      series: [{ name: 'factor', points: [[1, 0.7512], [2, 0.8]] }],
    };
    const { tables, markers } = chartText(chart, text);
    expect(tables[0]!.headers).toEqual(['Step', 'Factor']);
    expect(tables[0]!.rows).toEqual([['1', '0.751'], ['2', '0.800']]);
    expect(markers).toEqual([]);
  });
});
