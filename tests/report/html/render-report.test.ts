/**
 * The printed report's HTML (app/report/html) of the demo project: every case, the letterhead and
 * the particulars, each key figure as the project's QuantityText writes solveCase's value, each
 * verdict in words, the cautions once; and what the app's CSP and a standalone document demand:
 * no style attribute, no script, no address outside the document, every text escaped.
 */
import { describe, expect, it } from 'vitest';
import { quantityText } from '../../../app/base/quantity-text.js';
import { solveCase } from '../../../app/cases/solve-case.js';
import { renderReportBody, renderReportDocument, cssString } from '../../../app/report/html/render-report.js';
import { escapeHtml } from '../../../app/report/html/escape-html.js';
import { VERDICT_WORDS } from '../../../app/report/report-words.js';
import { caseContext } from '../../../main/cases/case-context.js';
import { DEMO, demoCases, demoReport, demoStoredCases } from './demo-report.js';

const SUPERSCRIPT: Readonly<Record<string, string>> = { '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '+': '⁺', '\u2212': '⁻' };

/**
 * The text a reader sees: tags removed, the five entities the escape writes turned back, and a
 * raised <sup> run read as the superscript characters it stands for ("10<sup>−5</sup>" as "10⁻⁵").
 */
function visibleText(html: string): string {
  return html
    .replace(/<sup>([^<]*)<\/sup>/g, (_, digits: string) => [...digits].map((c) => SUPERSCRIPT[c] ?? c).join(''))
    .replace(/<[^>]*>/g, ' ')
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&amp;/g, '&')
    .replace(/\s+/g, ' ');
}

describe('renderReportBody of the demo project', () => {
  const report = demoReport();
  const html = renderReportBody(report);
  const text = visibleText(html);

  it('is one article of the report, on A4 by default', () => {
    expect(html.startsWith('<article class="lamina-report paper-a4"')).toBe(true);
    expect(html.endsWith('</article>')).toBe(true);
    expect(renderReportBody(demoReport({ letterhead: { paper: 'Letter' } }))).toMatch(/^<article class="lamina-report paper-letter"/);
  });

  it('names the firm, the client and every particular on the cover, with the revision line', () => {
    expect(text).toContain('Brackwater Thermal Engineering Ltd (invented firm)');
    expect(text).toContain(DEMO.project['client']!);
    expect(text).toContain(DEMO.project['site']!);
    expect(text).toContain('BTE-DEMO-001');
    expect(text).toContain('A. Checker (invented)');
    expect(text).toContain('Revision B, 2026-12-02: Issued for comment');
    expect(text).toContain('Telephone +44 1632 960000');
    expect(text).toContain('Produced with Lamina 0.1.0.');
    expect(html).toMatch(/<img class="logo" src="data:image\/png;base64,[A-Za-z0-9+/=]+"/);
  });

  it('prints every case title, in the summary and as the heading of its own pages', () => {
    for (const c of DEMO.cases) {
      const name = escapeHtml(c.name);
      expect(html).toContain(`<td class="case-name">${name}</td>`);
      expect(html).toContain(`<h2>${name}</h2>`);
    }
  });

  it('prints each key figure as the QuantityText of the project writes the value solveCase gives', () => {
    const text = quantityText('SI');
    const context = caseContext(null);
    for (const stored of demoStoredCases()) {
      const solved = solveCase(stored.inputs, context).report;
      for (const f of solved.keyFigures) {
        expect(f.value).not.toBeNull();
        expect(html).toContain(`<span class="value">${escapeHtml(text.figure(f.value!, f.quantity))}</span>`);
      }
    }
    // One figure written out, so the check above is seen to compare real text: the hot-water pipe's loss.
    expect(html).toContain('<span class="value">20.4 W/m</span>');
  });

  it('writes each verdict as a word, in the summary and beside its check with margin and reason', () => {
    for (const c of report.cases) {
      if (!('report' in c)) throw new Error('every demo case solves');
      for (const v of c.report.verdicts) {
        expect(html).toContain(`<span class="verdict-word verdict-${v.verdict}">${VERDICT_WORDS[v.verdict]}</span> ${escapeHtml(v.title)}`);
        expect(html).toContain(`<span class="verdict-word">${VERDICT_WORDS[v.verdict]}</span> <span class="verdict-title">${escapeHtml(v.title)}</span>`);
        if (v.margin) expect(html).toContain(`${escapeHtml(v.title)}</span>: <span class="margin">${escapeHtml(v.margin)}</span>`);
        expect(text).toContain(v.reason);
      }
    }
    expect(text).toContain('Pass Surface condensation');
    expect(html).toContain('Surface condensation</span>: <span class="margin">18.6 K above the dew point</span>');
    expect(text).toContain('Review Interstitial condensation (design condition)');
  });

  it('prints the cautions once, numbered, each verdict pointing to its own', () => {
    const cautionsAt = html.indexOf('<section class="cautions">');
    expect(cautionsAt).toBeGreaterThan(0);
    for (const caution of report.cautions) {
      const escaped = escapeHtml(caution);
      expect(html.indexOf(escaped)).toBeGreaterThan(cautionsAt);
      expect(html.indexOf(escaped)).toBe(html.lastIndexOf(escaped));
    }
    expect(text).toContain('Demo data: the materials and climates marked “(demo)”');
    expect(text).toContain('See caution 1.');
  });

  it('prints every section heading, the sources and the energy balance of each case', () => {
    for (const c of report.cases) {
      if (!('report' in c)) continue;
      for (const s of c.report.sections) expect(html).toContain(`<h3>${escapeHtml(s.heading)}</h3>`);
      for (const source of c.report.sources) expect(text).toContain(source);
    }
    expect(text).toContain('Methods, standards and sources');
    expect((html.match(/<h3>Energy balance<\/h3>/g) ?? []).length).toBe(DEMO.cases.length);
  });

  it('puts every table header in a thead, so that a table that runs on repeats it', () => {
    const tables = html.match(/<table[\s\S]*?<\/table>/g) ?? [];
    expect(tables.length).toBeGreaterThan(10);
    for (const t of tables) expect(t).toMatch(/<thead><tr>(<th scope="col"[^>]*>[^<]*<\/th>)+<\/tr><\/thead><tbody>/);
    expect(html).toContain('<th scope="col" class="num">Thickness (mm)</th>');
  });

  it('writes each table column in one notation (the warm-deck roof: its monthly change all in "× 10ⁿ")', () => {
    // The exponent is raised with ordinary digits and U+2212 (the font has no ⁻ ⁴ ⁵, escape-html.ts).
    expect(html).toContain('<td class="num">5.78 × 10<sup>\u22125</sup></td>');
    expect(html).toContain('<td class="num">1.34 × 10<sup>\u22124</sup></td><td class="num">0.000134</td>');
    for (const t of html.match(/<table[\s\S]*?<\/table>/g) ?? []) {
      const rows = [...t.matchAll(/<tr>([\s\S]*?)<\/tr>/g)].slice(1).map((r) => [...r[1]!.matchAll(/<td class="num">((?:[^<]|<\/?sup>)*)<\/td>/g)].map((c) => c[1]!));
      const columns = Math.max(0, ...rows.map((r) => r.length));
      for (let j = 0; j < columns; j++) {
        const forms = new Set(rows.map((r) => r[j]).filter((c): c is string => c !== undefined && /\d/.test(c) && c !== '0').map((c) => c.includes('× 10')));
        expect(forms.size).toBeLessThanOrEqual(1);
      }
    }
  });

  it('has no style attribute, no script and no event handler', () => {
    expect(html).not.toMatch(/\sstyle=/i);
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toMatch(/\son[a-z]+=/i);
  });

  it('draws the patterned fills as marks in each layer, so no pattern id can clash between drawings', () => {
    expect(html).not.toContain('<pattern');
    expect(html).not.toMatch(/\sid="/);
    expect(html).toMatch(/<path class="marks-(hatch|dots|lines)" d="M/);
  });
});

describe('renderReportDocument', () => {
  const css = '.lamina-report { color: black; }';
  const html = renderReportDocument(demoReport(), { css });

  it('is a whole document with the stylesheet and the footer line inline', () => {
    expect(html.startsWith('<!doctype html>')).toBe(true);
    expect(html).toContain(`<style>${css}`);
    expect(html).toContain(':root { --lamina-footer: "BTE-DEMO-001 revision B"; }');
    expect(html).toContain('<body class="lamina-report-document"><article class="lamina-report');
  });

  it('has no script and no http(s) address: it prints offline', () => {
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toMatch(/https?:/i);
    expect(html).not.toMatch(/\sstyle=/i);
  });

  it('writes the footer as a CSS string that no text can break out of', () => {
    expect(cssString('A "B" \\ </style>')).toBe('"A \\22 B\\22  \\5C  \\3C /style\\3E "');
  });
});

describe('escaping', () => {
  it('escapes the five characters of markup', () => {
    expect(escapeHtml(`<script>alert("x") & 'y'</script>`)).toBe('&lt;script&gt;alert(&quot;x&quot;) &amp; &#39;y&#39;&lt;/script&gt;');
  });

  it('prints a case and a firm named "<script>…" as text, never as markup', () => {
    const cases = demoCases();
    const evil = '<script>alert(1)</script>';
    const report = demoReport({
      letterhead: { firmName: `${evil} Ltd`, address: `1 <b>Lane</b>\nTown`, email: 'a"b@c.invalid' },
      cases: cases.map((c, i) => (i === 0 ? { ...c, name: `${evil} pipe` } : c)),
    });
    const html = renderReportDocument(report, { css: '' });
    expect(html).not.toContain('<script');
    expect(html).not.toContain('<b>');
    expect(html).toContain('&lt;script&gt;alert(1)&lt;/script&gt; Ltd');
    expect(html).toContain('<h2>&lt;script&gt;alert(1)&lt;/script&gt; pipe</h2>');
    expect(html).toContain('alt="Logo of &lt;script&gt;alert(1)&lt;/script&gt; Ltd"');
    expect(html).toContain('1 &lt;b&gt;Lane&lt;/b&gt;<br>Town');
  });
});

describe('a case that could not be calculated', () => {
  it('prints its name and the sentence that says why, and the others still print', () => {
    const cases = demoCases();
    const failed = { id: 99, name: 'Loft hatch (removed material)', kind: 'wall', error: 'layers[0].materialId: no material with id 7 in the library.' };
    const html = renderReportBody(demoReport({ cases: [...cases, failed] }));
    expect(html).toContain('<h2>Loft hatch (removed material)</h2>');
    expect(html).toContain('This case could not be calculated: layers[0].materialId: no material with id 7 in the library.');
    expect(html).toContain('Could not be calculated: layers[0].materialId');
    for (const c of DEMO.cases) expect(html).toContain(`<h2>${escapeHtml(c.name)}</h2>`);
  });
});

describe('a project in US customary units', () => {
  const report = demoReport({ unitSystem: 'IP' });
  const html = renderReportBody(report);

  it('prints its key figures in US units, as the US QuantityText writes them', () => {
    const text = quantityText('IP');
    for (const c of report.cases) {
      if (!('report' in c)) throw new Error('every demo case solves');
      for (const f of c.report.keyFigures) expect(html).toContain(`<span class="value">${escapeHtml(text.figure(f.value!, f.quantity))}</span>`);
    }
    expect(html).toContain('<span class="value">21.2 Btu/(h·ft)</span>');
    expect(html).toContain('°F');
    expect(html).toContain('<th scope="col" class="num">Thickness (in)</th>');
    expect(html).toContain('in US customary units');
  });

  it('prints no °C, except where a cited data file states the conditions of its own table', () => {
    const withoutSources = html.replace(/<section class="case-part sources">[\s\S]*?<\/section>/g, '');
    expect(withoutSources).not.toContain('°C');
    // data/physics/iso6946-air-layers.json cites the ISO 6946 air-layer table "at a mean temperature about 10 °C".
    const cited = [...html.matchAll(/.{40}°C/g)].map((m) => m[0]);
    for (const c of cited) expect(c).toMatch(/mean temperature about 10 °C$/);
  });
});

describe('a project without cases and without a letterhead', () => {
  it('prints its cover, says it has no cases, and still prints the general caution', () => {
    const report = demoReport({ cases: [], letterhead: { firmName: '', address: '', telephone: '', email: '', logo: null } });
    const html = renderReportBody(report);
    expect(html).not.toContain('class="letterhead"');
    expect(html).toContain('This project has no cases yet.');
    expect(html).toContain('<h1>Orrin Valley Creamery (demo)</h1>');
    expect(html).toContain(escapeHtml(report.cautions[report.cautions.length - 1]!));
  });
});
