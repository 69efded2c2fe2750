/**
 * The report view's markup, rendered on the server by Svelte's own `render` from the reports of
 * the example cases: every part in reading order, units in the table headers, each chart with
 * its table alternative, each cross-section named and described, the out-of-date state spoken,
 * and no NaN, undefined or Infinity anywhere. (Charts draw on a canvas only in a browser.)
 */
import { readdirSync } from 'node:fs';
import path from 'node:path';
import { render } from 'svelte/server';
import { describe, expect, it } from 'vitest';
import { formatQuantity } from '../../app/report/format-quantity.js';
import type { CaseReport } from '../../app/report/report-model.js';
import CaseReportView from '../../renderer/src/report-view/CaseReportView.svelte';
import CrossSection from '../../renderer/src/report-view/CrossSection.svelte';
import { quantityText } from '../../renderer/src/report-view/quantity-text.js';
import { crossSectionOf, exampleReport } from './report-fixtures.js';

const examples = readdirSync(path.resolve(import.meta.dirname, '../../data/examples')).filter((f) => /^(pipe|flat|wall)-.*\.json$/.test(f));

/** The markup without Svelte's hydration comments, and the text a reader sees (tags dropped, entities read). */
function markupOf(report: CaseReport, props: Record<string, unknown> = {}) {
  const html = render(CaseReportView, { props: { report, ...props } }).body.replace(/<!--[^]*?-->/g, '');
  const words = html
    .replace(/<style[^]*?<\/style>/g, '')
    .replace(/<[^>]+>/g, ' ')
    .replace(/&amp;/g, '&')
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/\s+/g, ' ')
    // A tag dropped before punctuation leaves a space that the page does not show.
    .replace(/ (?=[,.:;])/g, '');
  return { html, words };
}

const escaped = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/"/g, '&quot;');

describe('CaseReportView on the server', () => {
  it.each(examples)('%s: every part of the report, in reading order, with no NaN', (file) => {
    const report = exampleReport(file);
    const { html, words } = markupOf(report);
    expect(html).not.toMatch(/NaN|undefined|Infinity/);
    // Reading order: key figures, checks, energy balance, sections, then the lists, cautions last.
    const order = [
      report.keyFigures[0]!.label,
      'Checks',
      'Energy balance',
      ...report.sections.map((s) => s.heading),
      ...(report.assumptions.length > 0 ? ['Assumptions'] : []),
      'Sources',
      'Cautions',
    ];
    const at = order.map((heading) => words.indexOf(` ${heading} `));
    expect(at.every((i) => i >= 0), `headings found: ${order.filter((_, k) => at[k]! < 0).join(', ')}`).toBe(true);
    expect([...at].sort((a, b) => a - b)).toEqual(at);
    for (const f of report.keyFigures) expect(words).toContain(`${f.label} ${formatQuantity(f.value, f.quantity)}`);
    for (const v of report.verdicts) {
      expect(words).toContain(`${v.title}${v.margin ? `: ${v.margin}` : ''}`);
      expect(words).toContain(v.reason);
    }
    // Each caution once in the list of cautions, once beside each verdict that carries it.
    for (const c of report.cautions) expect(words.split(c).length - 1).toBe(1 + report.verdicts.filter((v) => v.caution === c).length);
    // Units in the table headers.
    for (const s of report.sections)
      for (const b of s.blocks)
        if (b.kind === 'table') for (const c of b.table.columns) if (c.quantity === 'thickness') expect(html).toContain('>Thickness (mm)</th>');
    // Not out of date: the status region is there, empty, for a later announcement.
    expect(html).toMatch(/<p class="stale-note[^"]*" role="status" aria-live="polite"><\/p>/);
  });

  it('gives every chart a caption, a toggle and its series as a table for screen readers', () => {
    const report = exampleReport('wall-winter-condensation.json');
    const { html } = markupOf(report);
    const charts = report.sections.flatMap((s) => s.blocks.flatMap((b) => (b.kind === 'chart' ? [b.chart] : [])));
    expect(charts.length).toBeGreaterThan(1);
    expect(html.split('<canvas').length - 1).toBe(charts.length);
    expect(html.split('aria-expanded="false"').length - 1).toBe(charts.length);
    expect(html.split('>Show as table</button>').length - 1).toBe(charts.length);
    // The plot is an image labelled by its caption and described by the tables, which are in the page (visually hidden).
    const plots = [...html.matchAll(/<div class="plot[^"]*" role="img" aria-labelledby="([^"]+)" aria-describedby="([^"]+)">/g)];
    expect(plots).toHaveLength(charts.length);
    for (const [, caption, tables] of plots) {
      expect(html).toContain(`<figcaption id="${caption}"`);
      expect(html).toMatch(new RegExp(`<div id="${tables}" class="tables[^"]*visually-hidden`));
    }
    for (const chart of charts) expect(html).toContain(escaped(chart.title));
    expect(html).toMatch(/<th scope="col"[^>]*>Month<\/th>/);
  });

  it('names the layers of the cross-section in its description and key, and marks only the thin ones not to scale', () => {
    const text = quantityText('SI');
    const thin = render(CrossSection, { props: { section: crossSectionOf(exampleReport('pipe-hot-water-plant-room.json')), text } }).body;
    expect(thin).toMatch(/<svg[^>]* role="img" aria-label="Build-up to scale\. Rings round a bore 107\.1 mm across: 1 pipe wall: Carbon steel \(demo\), 3\.6 mm; /);
    expect(thin.match(/<em[^>]*> \(not to scale\)<\/em>/g)).toHaveLength(2);
    expect(thin).toContain('to scale except where marked not to scale');
    expect(thin).toContain('>* Not to scale: drawn wider so that they show.</text>');
    expect(thin).toContain('Drawn to scale except layer 1 (3.6 mm) and layer 3 (0.7 mm), drawn wider so that they show.');
    for (const label of ['Pipe or vessel metal', 'Insulation', 'Cladding or jacket', 'Bore']) expect(thin).toContain(label);

    const toScale = render(CrossSection, { props: { section: crossSectionOf(exampleReport('pipe-chilled-water.json')), text } }).body;
    expect(toScale).not.toMatch(/not to scale/i);
    expect(toScale).toContain('; to scale;');
  });

  it('gives two drawings on one page their own pattern ids', () => {
    const report = exampleReport('pipe-hot-water-plant-room.json');
    const other = { kind: 'cross-section' as const, crossSection: crossSectionOf(exampleReport('pipe-chilled-water.json')) };
    const { html } = markupOf({ ...report, sections: [...report.sections, { id: 'chilled', heading: 'Chilled water', blocks: [other] }] });
    const ids = [...html.matchAll(/<pattern id="([^"]+)"/g)].map((m) => m[1]);
    // Both pipes draw their bore with the same line pattern: one definition each, under different ids.
    expect(html.split('<figure class="cross-section').length - 1).toBe(2);
    expect(ids.filter((id) => id!.endsWith('-lines'))).toHaveLength(2);
    expect(new Set(ids).size).toBe(ids.length);
    for (const [, id] of html.matchAll(/fill="url\(#([^)]+)\)"/g)) expect(ids).toContain(id);
  });

  it('says plainly, and to screen readers, that figures are out of date', () => {
    const { html, words } = markupOf(exampleReport('flat-tank-roof.json'), { stale: true });
    expect(html).toMatch(/<article class="case-report[^"]*stale/);
    expect(html).toMatch(/role="status" aria-live="polite"><span class="stale-label[^"]*">Out of date<\/span>/);
    expect(words).toContain('These results are for the last valid input');
  });
});
