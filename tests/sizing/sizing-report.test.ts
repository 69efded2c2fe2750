/**
 * The sizing section of a report (app/cases/sizing/sizing-report) from a sizing result built here:
 * the choice and its governing criterion in words, the chosen row marked, every failing cell with
 * its shortfall, a freeze time never reached in words, the costs with their factors, two charts
 * (heat loss and lifecycle cost do not share a y quantity), a project's units, and the text
 * rendering. The numbers are invented for the test; only the section's wording of them is checked.
 */
import { describe, expect, it } from 'vitest';
import { quantityText, SI_TEXT } from '../../app/base/quantity-text.js';
import { sizingSection } from '../../app/cases/sizing/sizing-report.js';
import { tableCellTexts } from '../../app/report/format-quantity.js';
import { renderReportText } from '../../app/report/render-text.js';
import type { CaseReport, ReportChart, ReportSection, ReportTable } from '../../app/report/report-model.js';
import { FROZEN, HOT } from './sizing-result-fixture.js';

const tables = (s: ReportSection): ReportTable[] => s.blocks.flatMap((b) => (b.kind === 'table' ? [b.table] : []));
const charts = (s: ReportSection): ReportChart[] => s.blocks.flatMap((b) => (b.kind === 'chart' ? [b.chart] : []));
const paragraphs = (s: ReportSection): string[] => s.blocks.flatMap((b) => (b.kind === 'paragraphs' ? b.paragraphs : []));

/** The section as the only section of a report, in the text rendering. */
function asText(section: ReportSection): string {
  const report: CaseReport = {
    kind: 'pipe',
    title: 'Sized pipe',
    subject: 'A pipe.',
    keyFigures: [],
    verdicts: [],
    sections: [section],
    energyBalance: { residual: 0, relativeResidual: 0, quantity: 'heatFlowPerLength' },
    assumptions: [],
    warnings: [],
    sources: [],
    cautions: [],
  };
  return renderReportText(report);
}

describe('sizingSection of a hot pipe sized to a surface limit, with economics', () => {
  const section = sizingSection(HOT, SI_TEXT, 'per-metre');

  it('says what was chosen and which criterion governs, with the engine’s reason', () => {
    expect(section.id).toBe('sizing');
    expect(paragraphs(section).slice(0, 2)).toEqual([
      'Chosen: 40.0 mm of Rock wool, the thinnest of the series that meets every criterion switched on; the surface temperature limit governs.',
      'The surface temperature limit is the last criterion met as the thickness grows.',
    ]);
  });

  it('tabulates heat and surface across the series per metre, the chosen and the least-cost rows marked in words', () => {
    const [heat] = tables(section);
    expect(heat!.title).toBe('Rock wool across the thickness series, per metre of pipe');
    expect(heat!.columns.map((c) => c.label)).toEqual(['Thickness', 'Heat loss', 'Surface temperature', 'Above the dew point', 'Energy lost per year', 'Choice']);
    expect(tableCellTexts(heat!).map((r) => [r[0], r[1], r[2], r[5]])).toEqual([
      ['20.0', '60.0', '62.5', ''],
      ['30.0', '45.0', '57.1', 'least lifecycle cost'],
      ['40.0', '38.0', '52.4', 'chosen'],
      ['50.0', '33.0', '49.0', ''],
    ]);
  });

  it('gives one verdict column per criterion, each failing cell with its shortfall', () => {
    const criteria = tables(section).find((t) => t.title === 'Each criterion switched on, at each thickness')!;
    expect(criteria.columns.map((c) => c.label)).toEqual(['Thickness', 'Surface temperature limit', 'Least lifecycle cost', 'Choice']);
    expect(tableCellTexts(criteria).map((r) => r.slice(1, 3))).toEqual([
      ['fails by 7.5 K', 'costs 200.0 EUR more'],
      ['fails by 2.1 K', 'least cost'],
      ['met', 'costs 20.00 EUR more'],
      ['met', 'costs 60.00 EUR more'],
    ]);
  });

  it('lists cost and CO₂ with the energy’s present value, and the two factors', () => {
    const cost = tables(section).find((t) => t.title.startsWith('Cost and CO₂'))!;
    expect(cost.columns.map((c) => c.quantity ?? null)).toEqual(['thickness', 'moneyPerYear', 'emissionsPerYear', 'money', 'money', 'money', null]);
    // Present value of the energy = lifecycle − installed: 720 − 31 at 40 mm.
    expect(tableCellTexts(cost)[2]!.slice(3, 6)).toEqual(['31.00', '689.0', '720.0']);
    const figures = section.blocks.flatMap((b) => (b.kind === 'figures' ? b.figures : []));
    expect(figures.map((f) => [f.label, f.value])).toEqual([
      ['Present-value factor of the energy cost', 15.62],
      ['Annuity factor', 0.06403],
      ['Thickness of least lifecycle cost', 0.03],
    ]);
  });

  it('charts heat loss and lifecycle cost against thickness apart, as they differ in quantity', () => {
    const [heat, cost] = charts(section);
    expect([heat!.y.quantity, cost!.y.quantity]).toEqual(['heatFlowPerLength', 'money']);
    expect(heat!.series[0]!.points).toEqual([[0.02, 60], [0.03, 45], [0.04, 38], [0.05, 33]]);
    expect(cost!.series.map((s) => s.name)).toEqual(['installed cost of the insulation', 'energy cost over the years, present value', 'lifecycle cost']);
    expect(cost!.series[2]!.points.map((p) => p[1])).toEqual([900, 700, 720, 760]);
  });

  it('ends with the caution and the assumptions, as sentences', () => {
    const last = paragraphs(section).slice(-2);
    expect(last[0]).toMatch(/confirm it against local codes and licensed professional practice/);
    expect(last[1]).toBe('Energy price 0.08 per kWh, escalating 3 % a year.');
  });

  it('reads in a US project’s units', () => {
    const us = sizingSection(HOT, quantityText('IP'), 'per-metre');
    expect(paragraphs(us)[0]).toMatch(/^Chosen: 1\.575 in of Rock wool/);
    expect(tables(us)[0]!.title).toBe('Rock wool across the thickness series, per foot of pipe');
    expect(sizingSection(HOT, quantityText('IP'), 'per-square-metre').blocks.some((b) => b.kind === 'table' && b.table.title.endsWith('per ft² of surface'))).toBe(true);
  });

  it('renders as text with every column headed by its unit', () => {
    const text = asText(section);
    expect(text).toContain('Heat loss (W/m)');
    expect(text).toContain('CO₂ per year (kg/a)');
    expect(text).not.toMatch(/NaN|undefined|Infinity/);
  });
});

describe('sizingSection when no thickness meets every criterion', () => {
  const section = sizingSection(FROZEN, SI_TEXT, 'per-metre');

  it('names the criterion that fails at the thickest option and by how much', () => {
    expect(paragraphs(section)[0]).toBe('No thickness of the series meets every criterion switched on. At the thickest, 30.0 mm of PIR, the freeze protection fails by 3.50 h.');
    expect(paragraphs(section)).toContain('The thickest option still lets the water reach 0 °C too soon.');
  });

  it('shows the freeze times, a time never reached in words, and no cost table without economics', () => {
    // The freeze times have a table of their own, after the heat table.
    const standing = tables(section).find((t) => t.title === 'The water standing still after the flow stops, across the thickness series')!;
    expect(standing.columns.map((c) => c.label)).toContain('Time until the water reaches 0 °C');
    const fraction = standing.columns.findIndex((c) => c.label === 'Time until the given fraction has frozen');
    expect(tableCellTexts(standing).map((r) => r[fraction])).toEqual(['20.00', 'not reached']);
    expect(tables(section).some((t) => t.title.startsWith('Cost'))).toBe(false);
    expect(charts(section)).toHaveLength(1);
    const criteria = tables(section).find((t) => t.title === 'Each criterion switched on, at each thickness')!;
    expect(tableCellTexts(criteria).map((r) => r[1])).toEqual(['fails by 4.00 h', 'fails by 3.50 h']);
    expect(asText(section)).not.toMatch(/NaN|undefined|Infinity/);
  });
});
