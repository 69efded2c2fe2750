/**
 * The blocks of a case report as HTML for paper: figures as a list of label and value, tables
 * with their header in <thead> (repeated at the top of each page a long table runs onto) and the
 * units in the headers as on screen, paragraphs, charts and cross-sections as SVG. Every number
 * is written through the project's QuantityText (print-text.ts).
 */
import type { ReportBlock, ReportCell, ReportChart, ReportFigure, ReportTable, ReportVerdict } from '../report-model.js';
import { tableCellTexts } from '../format-quantity.js';
import { escapeHtml } from './escape-html.js';
import type { PrintText } from './print-text.js';
import { VERDICT_WORDS } from '../report-words.js';
import { chartSvg } from './svg-chart.js';
import { crossSectionSvg } from './svg-cross-section.js';

/** Rows of a table kept whole on one page (about a third of a page at most). */
const SHORT_TABLE_ROWS = 14;

export function figuresHtml(figures: readonly ReportFigure[], print: PrintText, className = 'figures'): string {
  const items = figures.map(
    (f) =>
      `<div class="figure-row"><dt>${escapeHtml(f.label)}</dt><dd><span class="value">${escapeHtml(print.withUnit(f.value, f.quantity))}</span>` +
      `${f.note ? ` <span class="note">${escapeHtml(f.note)}</span>` : ''}</dd></div>`,
  );
  return `<dl class="${className}">${items.join('')}</dl>`;
}

export function tableHtml(table: ReportTable, print: PrintText): string {
  const numeric = table.columns.map((c) => c.quantity !== undefined);
  const head = table.columns
    .map((c, j) => `<th scope="col"${numeric[j] ? ' class="num"' : ''}>${escapeHtml(print.labelWithUnit(c.label, c.quantity))}</th>`)
    .join('');
  // Each column in one notation, as on screen and in the text report (format-quantity tableCellTexts).
  const cells = tableCellTexts(table, print.text.system);
  const rows = table.rows
    .map((row, r) => `<tr>${row.map((c, j) => `<td${typeof c === 'string' && !numeric[j] ? '' : ' class="num"'}>${escapeHtml(cells[r]![j]!)}</td>`).join('')}</tr>`)
    .join('');
  // A short table is kept on one page, its caption with it; a long one runs on with its header repeated.
  const short = table.rows.length <= SHORT_TABLE_ROWS ? ' short-table' : '';
  return `<table class="data${short}"><caption>${escapeHtml(table.title)}</caption><thead><tr>${head}</tr></thead><tbody>${rows}</tbody></table>`;
}

/** A chart whose figures no table of the report lists also prints them as a table, so none is only a picture. */
function chartFiguresHtml(chart: ReportChart, print: PrintText): string {
  if (chart.tabulatedIn !== undefined) {
    return `<p class="chart-note">The table “${escapeHtml(chart.tabulatedIn)}” lists the figures of this chart.</p>`;
  }
  const categories = chart.x.categories;
  const xColumn = categories ? { label: capitalise(chart.x.label) } : { label: capitalise(chart.x.label), quantity: chart.x.quantity };
  const xCell = (x: number): ReportCell => (categories ? (categories[x] ?? String(x)) : { value: x, quantity: chart.x.quantity });
  const first = chart.series[0];
  const sharedX = first !== undefined && chart.series.every((s) => s.points.length === first.points.length && s.points.every((p, k) => p[0] === first.points[k]![0]));
  const tables: ReportTable[] = sharedX
    ? [
        {
          title: `${chart.title}, as figures`,
          columns: [xColumn, ...chart.series.map((s) => ({ label: capitalise(s.name), quantity: chart.y.quantity }))],
          rows: first.points.map((p, k) => [xCell(p[0]), ...chart.series.map((s) => ({ value: s.points[k]![1], quantity: chart.y.quantity }))]),
        },
      ]
    : chart.series.map((s) => ({
        title: `${chart.title}: ${s.name}, as figures`,
        columns: [xColumn, { label: capitalise(chart.y.label), quantity: chart.y.quantity }],
        rows: s.points.map(([x, y]) => [xCell(x), { value: y, quantity: chart.y.quantity }]),
      }));
  return tables.map((t) => tableHtml(t, print)).join('');
}

export function blockHtml(block: ReportBlock, print: PrintText): string {
  switch (block.kind) {
    case 'figures':
      return figuresHtml(block.figures, print);
    case 'table':
      return tableHtml(block.table, print);
    case 'paragraphs':
      return block.paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join('');
    case 'chart':
      return chartSvg(block.chart, print) + chartFiguresHtml(block.chart, print);
    case 'cross-section':
      return crossSectionSvg(block.crossSection, print);
  }
}

/**
 * A verdict with its margin and reason; its caution is printed once in the report's cautions,
 * numbered, and the verdict points to it by number.
 */
export function verdictHtml(v: ReportVerdict, cautionNumber: number | undefined): string {
  const margin = v.margin ? `: <span class="margin">${escapeHtml(v.margin)}</span>` : '';
  const caution = cautionNumber !== undefined ? ` <span class="caution-ref">See caution ${cautionNumber}.</span>` : '';
  return (
    `<div class="verdict verdict-${v.verdict}"><p class="verdict-head"><span class="verdict-word">${VERDICT_WORDS[v.verdict]}</span> ` +
    `<span class="verdict-title">${escapeHtml(v.title)}</span>${margin}</p><p class="reason">${escapeHtml(v.reason)}${caution}</p></div>`
  );
}

/** "Temperature"; a label that starts with a symbol ("s_d from the inside") keeps its case. */
function capitalise(words: string): string {
  return /^\S*_/.test(words) ? words : words.charAt(0).toUpperCase() + words.slice(1);
}
