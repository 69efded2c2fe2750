/**
 * The report view in a US customary project: figures, table headers, chart axes and plotted
 * values, and the cross-section's labels all in the project's units, converted from the SI model.
 * Conversions checked against the exact definitions NIST SP 811 gives: θ(°F) = 1.8·θ(°C) + 32,
 * 1 in = 25.4 mm and 1 ft = 0.3048 m exactly, and its factor 1 Btu_IT/h = 0.29307107017222 W
 * (1055.05585262 J / 3600 s).
 */
import { render } from 'svelte/server';
import { describe, expect, it } from 'vitest';
import CaseReportView from '../../renderer/src/report-view/CaseReportView.svelte';
import { chartConfiguration } from '../../renderer/src/report-view/chart-config.js';
import { crossSectionLayout } from '../../app/report/drawing/cross-section-layout.js';
import { quantityText } from '../../renderer/src/report-view/quantity-text.js';
import { chartOf, crossSectionOf, exampleReport } from './report-fixtures.js';

const us = quantityText('IP');
const ink = { ink: '#111111', soft: '#555555', rule: '#dddddd', fontFamily: 'sans-serif' };

describe('a US customary project', () => {
  it('plots the temperature profile in °F against the radius in inches', () => {
    const chart = chartOf(exampleReport('pipe-hot-water-plant-room.json'), 'Temperature through the build-up');
    const config = chartConfiguration(chart, ink, us);
    const points = config.data.datasets[0]!.data as { x: number; y: number }[];
    chart.series[0]!.points.forEach(([r, t], k) => {
      // NIST SP 811: 1 in = 0.0254 m exactly; θ/°F = 1.8 θ/°C + 32.
      expect(points[k]!.x).toBeCloseTo(r / 0.0254, 10);
      expect(points[k]!.y).toBeCloseTo(1.8 * t + 32, 10);
    });
    const scales = config.options!.scales as Record<string, { title: { text: string } }>;
    expect(scales['x']!.title.text).toBe('radius (in)');
    expect(scales['y']!.title.text).toBe('temperature (°F)');
    expect(config.options!.plugins!.interfaceMarkers!.positions).toEqual(chart.markers!.map((m) => expect.closeTo(m.x / 0.0254, 10)));
  });

  it('labels the cross-section faces in °F and the layers in inches', () => {
    const section = crossSectionOf(exampleReport('pipe-hot-water-plant-room.json'));
    const layout = crossSectionLayout(section, us);
    expect(layout.temperatures[0]!.text).toBe(`${(1.8 * section.temperatures[0]! + 32).toFixed(1)} °F`);
    expect(layout.layers[1]!.thickness).toBe(`${(section.layers[1]!.thickness / 0.0254).toFixed(3)} in`);
  });

  it('shows every figure and table header in US units (sentences the engine wrote keep theirs)', () => {
    const report = exampleReport('pipe-steam-outdoor.json');
    const html = render(CaseReportView, { props: { report, unitSystem: 'IP' } }).body.replace(/<!--[^]*?-->/g, '');
    const values = [...html.matchAll(/<span class="value[^"]*">([^<]*)<\/span>/g)].map((m) => m[1]!);
    const headers = [...html.matchAll(/<th scope="col"[^>]*>([^<]*)<\/th>/g)].map((m) => m[1]!);
    // W/m to Btu/(h·ft): times 0.3048 m per ft, divided by 0.29307107017222 W per Btu/h.
    expect(values).toContain(`${((report.keyFigures[0]!.value! * 0.3048) / 0.29307107017222).toPrecision(3)} Btu/(h·ft)`);
    expect(headers).toContain('Thickness (in)');
    expect(headers).toContain('Mean temperature (°F)');
    for (const shown of [...values, ...headers]) expect(shown).not.toMatch(/°C|W\/|mm|m²|\(m\)|kWh/);
    expect(html).not.toMatch(/NaN|undefined|Infinity/);
  });
});
