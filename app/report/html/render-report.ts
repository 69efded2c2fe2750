/**
 * The one HTML rendering of a project's printed report (app/report/project-report): the cover
 * with the firm's letterhead and the project's particulars, a summary table of every case, each
 * case on its own pages (subject, key figures, checks, every section of its report, the energy
 * balance, assumptions, warnings, methods and sources), and the cautions once at the end, each
 * verdict pointing to its own by number. Pure functions of the model returning strings: the
 * app's preview pane shows the body ({@html}), Electron's printToPDF and the command line print
 * the whole document. No style attribute anywhere (the app's CSP is style-src 'self'), no script,
 * no address outside the document; the stylesheet (data/report/report-print.css) does the rest.
 */
import type { CaseReport } from '../report-model.js';
import type { ProjectReport, ReportedCase, SummaryLine } from '../project-report.js';
import { blockHtml, figuresHtml, verdictHtml } from './render-blocks.js';
import { escapeAttribute, escapeHtml } from './escape-html.js';
import { printText, type PrintText } from './print-text.js';
import { VERDICT_WORDS, kindWords } from '../report-words.js';

/** Printed among the cautions where the report uses the demo's invented materials or climates. */
export const DEMO_DATA_CAUTION =
  'Demo data: the materials and climates marked “(demo)” or “invented” are invented, indicative values that come with Lamina ' +
  'to show how it works. They are not product data or measured climates and are not for design.';

export interface ReportAssets {
  /** The print stylesheet and the @font-face rules (fonts as data: URLs), inlined in <style>. */
  readonly css: string;
}

/** The report's markup: `<article class="lamina-report paper-a4|paper-letter">…</article>`. */
export function renderReportBody(report: ProjectReport): string {
  const print = printText(report.project.unitSystem);
  const cautions = reportCautions(report);
  const paper = report.letterhead.paper === 'Letter' ? 'paper-letter' : 'paper-a4';
  return (
    `<article class="lamina-report ${paper}" lang="en">` +
    coverHtml(report) +
    summaryHtml(report, print) +
    report.cases.map((c, i) => caseHtml(c, i, report.cases.length, print, cautions)).join('') +
    scheduleHtml(report.schedule, print) +
    cautionsHtml(cautions) +
    `</article>`
  );
}

/** A standalone document for printing: the body, the stylesheet and the footer line inline, nothing fetched. */
export function renderReportDocument(report: ProjectReport, assets: ReportAssets): string {
  const title = `${report.project.name.trim() || 'Project'}: calculation report`;
  return (
    `<!doctype html>\n<html lang="en"><head><meta charset="utf-8">` +
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; img-src data:; font-src data:; style-src 'unsafe-inline'">` +
    `<meta name="color-scheme" content="light"><title>${escapeAttribute(title)}</title>` +
    `<style>${assets.css}\n:root { --lamina-footer: ${cssString(report.footer)}; }</style></head>` +
    `<body class="lamina-report-document">${renderReportBody(report)}</body></html>\n`
  );
}

/** A CSS string literal: quotes, backslashes and line breaks escaped, and "<" so that no text can close the <style>. */
export function cssString(text: string): string {
  return `"${text.replace(/[\\"<>\n\r\f]/g, (c) => `\\${c.charCodeAt(0).toString(16).toUpperCase()} `)}"`;
}

function coverHtml(report: ProjectReport): string {
  const { letterhead: l, project: p } = report;
  const logo = l.logo ? `<img class="logo" src="data:${escapeAttribute(l.logo.mediaType)};base64,${l.logo.base64.replace(/[^A-Za-z0-9+/=]/g, '')}" alt="${escapeAttribute(l.firmName ? `Logo of ${l.firmName}` : 'Logo')}">` : '';
  const address = l.address.split(/\r?\n/).map((line) => line.trim()).filter(Boolean).map(escapeHtml).join('<br>');
  const contact = [l.telephone.trim() ? `Telephone ${l.telephone.trim()}` : '', l.email.trim() ? `E-mail ${l.email.trim()}` : ''].filter(Boolean);
  const firm = [
    l.firmName.trim() ? `<p class="firm-name">${escapeHtml(l.firmName.trim())}</p>` : '',
    address ? `<p class="firm-address">${address}</p>` : '',
    contact.length > 0 ? `<p class="firm-contact">${contact.map(escapeHtml).join(' · ')}</p>` : '',
  ].join('');
  const letterhead = logo || firm ? `<header class="letterhead">${logo}<div class="firm">${firm}</div></header>` : '';
  const particulars: [string, string][] = [
    ['Client', p.client],
    ['Project', p.name],
    ['Site', p.site],
    ['Reference', p.reference],
    ['Revision', p.revision],
    ['Date', p.date],
    ['Engineer', p.engineer],
    ['Checker', p.checker],
  ];
  const rows = particulars
    .filter(([, value]) => value.trim() !== '')
    .map(([label, value]) => `<div class="particular"><dt>${label}</dt><dd>${escapeHtml(value.trim())}</dd></div>`)
    .join('');
  const revision = p.revision.trim()
    ? `<p class="revision-line">${escapeHtml(`Revision ${p.revision.trim()}${p.date.trim() ? `, ${p.date.trim()}` : ''}${p.revisionNote.trim() ? `: ${p.revisionNote.trim()}` : ''}`)}</p>`
    : '';
  const units = report.project.unitSystem === 'IP' ? 'US customary units' : 'SI units';
  return (
    `<section class="cover">${letterhead}<div class="cover-title"><p class="report-kind">Heat and moisture calculation report</p>` +
    `<h1>${escapeHtml(p.name.trim() || 'Project')}</h1></div><dl class="particulars">${rows}</dl>${revision}` +
    `<p class="cover-contents">${report.cases.length} ${report.cases.length === 1 ? 'case' : 'cases'}${report.schedule?.length ? ' and the schedule of pipe runs with its bill of quantities' : ''}, in ${units}. The cautions at the end of this report apply to every case.</p>` +
    `<p class="produced-by">Produced with ${escapeHtml(report.producedBy)}.</p></section>`
  );
}

function summaryHtml(report: ProjectReport, print: PrintText): string {
  if (report.summary.length === 0) return `<section class="summary"><h2>Summary of the cases</h2><p>This project has no cases yet.</p></section>`;
  const rows = report.summary.map((line, i) => summaryRow(line, i, print)).join('');
  return (
    `<section class="summary"><h2>Summary of the cases</h2><table class="data summary-table"><thead><tr>` +
    `<th scope="col">No.</th><th scope="col">Kind</th><th scope="col">Case</th><th scope="col">Build-up and size</th><th scope="col">Key figure</th><th scope="col">Checks</th>` +
    `</tr></thead><tbody>${rows}</tbody></table></section>`
  );
}

function summaryRow(line: SummaryLine, i: number, print: PrintText): string {
  const key = line.keyFigure
    ? `<span class="key-label">${escapeHtml(line.keyFigure.label)}</span> <span class="value">${escapeHtml(print.withUnit(line.keyFigure.value, line.keyFigure.quantity))}</span>`
    : '—';
  const verdicts = line.error !== undefined
    ? '<span class="verdict-word verdict-none">Not calculated</span>'
    : line.verdicts.length === 0
      ? '—'
      : `<ul class="summary-verdicts">${line.verdicts.map((v) => `<li><span class="verdict-word verdict-${v.verdict}">${VERDICT_WORDS[v.verdict]}</span> ${escapeHtml(v.title)}</li>`).join('')}</ul>`;
  const subject = line.error !== undefined ? `<span class="case-error">Could not be calculated: ${escapeHtml(line.error)}</span>` : escapeHtml(line.subject);
  return (
    `<tr><td class="num">${i + 1}</td><td>${escapeHtml(kindWords(line.kind))}</td><td class="case-name">${escapeHtml(line.title)}</td>` +
    `<td>${subject}</td><td>${key}</td><td>${verdicts}</td></tr>`
  );
}

function caseHtml(c: ReportedCase, i: number, count: number, print: PrintText, cautions: readonly string[]): string {
  const head =
    `<header class="case-head"><p class="case-number">Case ${i + 1} of ${count} · ${escapeHtml(kindWords(c.kind))}</p>` +
    `<h2>${escapeHtml(c.name)}</h2>`;
  if (!('report' in c)) {
    return `<section class="case case-failed">${head}</header><p class="case-error">This case could not be calculated: ${escapeHtml(c.error)}</p></section>`;
  }
  const r = c.report;
  const title = r.title.trim() && r.title.trim() !== c.name.trim() ? `<p class="case-title">${escapeHtml(r.title)}</p>` : '';
  const parts = [`<section class="case">${head}${title}<p class="subject">${escapeHtml(r.subject)}</p></header>`];
  if (r.keyFigures.length > 0) parts.push(`<section class="case-part key"><h3>Key figures</h3>${figuresHtml(r.keyFigures, print, 'figures key-figures')}</section>`);
  if (r.verdicts.length > 0) {
    const verdicts = r.verdicts.map((v) => verdictHtml(v, v.caution ? cautions.indexOf(v.caution) + 1 || undefined : undefined)).join('');
    parts.push(`<section class="case-part checks"><h3>Checks</h3>${verdicts}</section>`);
  }
  r.sections.forEach((s) => {
    const blocks = s.blocks.map((b) => blockHtml(b, print)).join('');
    parts.push(`<section class="case-part section-${escapeAttribute(s.id)}"><h3>${escapeHtml(s.heading)}</h3>${blocks}</section>`);
  });
  parts.push(energyBalanceHtml(r, print));
  const lists: [string, string, readonly string[]][] = [
    ['assumptions', 'Assumptions', r.assumptions],
    ['warnings', 'Warnings', r.warnings],
    ['sources', 'Methods, standards and sources', r.sources],
  ];
  for (const [id, heading, items] of lists) {
    if (items.length > 0) parts.push(`<section class="case-part ${id}"><h3>${heading}</h3><ul>${items.map((t) => `<li>${escapeHtml(t)}</li>`).join('')}</ul></section>`);
  }
  parts.push('</section>');
  return parts.join('');
}

/** The project's schedule and bill of quantities, after the cases, each section from a new page. */
function scheduleHtml(sections: ProjectReport['schedule'], print: PrintText): string {
  if (sections === undefined || sections.length === 0) return '';
  return sections
    .map((s) => `<section class="case schedule section-${escapeAttribute(s.id)}"><header class="case-head"><p class="case-number">Schedule</p><h2>${escapeHtml(s.heading)}</h2></header>${s.blocks.map((b) => blockHtml(b, print)).join('')}</section>`)
    .join('');
}

function energyBalanceHtml(r: CaseReport, print: PrintText): string {
  const b = r.energyBalance;
  const sentence = `Residual ${print.withUnit(b.residual, b.quantity)}, relative to the largest term ${print.withUnit(b.relativeResidual, 'relativeResidual')}.`;
  return `<section class="case-part energy-balance"><h3>Energy balance</h3><p>${escapeHtml(sentence)}</p></section>`;
}

/** The model's cautions, and the note on demo data where the report uses any. */
function reportCautions(report: ProjectReport): string[] {
  const texts = report.cases.flatMap((c) => ('report' in c ? [c.report.title, c.report.subject, ...c.report.sources, ...c.report.assumptions] : [c.name]));
  const demo = [report.project.name, ...texts].some((t) => /\(demo\)|demo data|invented/i.test(t));
  return demo ? [...report.cautions, DEMO_DATA_CAUTION] : [...report.cautions];
}

function cautionsHtml(cautions: readonly string[]): string {
  return (
    `<section class="cautions"><h2>Cautions</h2><p>These cautions apply to every case of this report; a check’s caution is numbered here and named beside its verdict.</p>` +
    `<ol class="caution-list">${cautions.map((c) => `<li>${escapeHtml(c)}</li>`).join('')}</ol></section>`
  );
}
