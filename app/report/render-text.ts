/**
 * The plain-text rendering of a report (`lamina solve --format text`): what a person reads in a
 * terminal, in the order they need it: what was calculated, the key figures, the verdicts, the
 * sections, the energy balance that proves the solve, then assumptions, warnings, sources and the
 * cautions. Plain words and aligned columns, no markup; paragraphs wrap at TEXT_WIDTH. Charts are
 * drawn by the screen and paper renderings; here a chart points to the table that holds its
 * figures, or, when no table does, prints its series as a short table. A cross-section points to
 * the table of its layers.
 */
import type { CheckVerdict } from '../checks/check-result.js';
import { formatQuantity, quantityUnit, tableCellTexts } from './format-quantity.js';
import type { CaseReport, ReportBlock, ReportCell, ReportChart, ReportCrossSection, ReportFigure, ReportSection, ReportTable, ReportVerdict } from './report-model.js';

export const TEXT_WIDTH = 100;

const VERDICT_WORDS: Record<CheckVerdict, string> = {
  pass: 'PASS',
  fail: 'FAIL',
  warning: 'REVIEW',
  'not-applicable': 'N/A',
};
const VERDICT_COLUMN = 9;

export function renderReportText(report: CaseReport): string {
  const parts: string[][] = [[report.title, ...wrap(report.subject, '')]];
  if (report.keyFigures.length > 0) parts.push(['Key figures', ...figureLines(report.keyFigures, '  ')]);
  if (report.verdicts.length > 0) parts.push(['Checks', ...report.verdicts.flatMap(verdictLines)]);
  for (const section of report.sections) parts.push([section.heading, ...blocksLines(section.blocks)]);
  const balance = report.energyBalance;
  parts.push([
    'Energy balance',
    ...wrap(
      `Residual ${formatQuantity(balance.residual, balance.quantity)}, relative to the largest term ${formatQuantity(balance.relativeResidual, 'relativeResidual')}.`,
      '  ',
    ),
  ]);
  const lists: [string, readonly string[]][] = [
    ['Assumptions', report.assumptions],
    ['Warnings', report.warnings],
    ['Sources', report.sources],
    ['Cautions', report.cautions],
  ];
  for (const [heading, items] of lists) if (items.length > 0) parts.push([heading, ...items.flatMap((item) => wrap(item, '  • ', '    '))]);
  return parts.map((lines) => lines.join('\n')).join('\n\n') + '\n';
}

/** One section alone, as the whole report prints it (`lamina size --format text` prints the sizing section). */
export function renderSectionText(section: ReportSection): string {
  return [section.heading, ...blocksLines(section.blocks)].join('\n') + '\n';
}

function verdictLines(v: ReportVerdict): string[] {
  const head = `  ${VERDICT_WORDS[v.verdict].padEnd(VERDICT_COLUMN)}${v.title}${v.margin ? `: ${v.margin}` : ''}`;
  return [head, ...wrap(v.reason, ' '.repeat(2 + VERDICT_COLUMN))];
}

function blocksLines(blocks: readonly ReportBlock[]): string[] {
  const lines: string[] = [];
  blocks.forEach((block, i) => {
    if (i > 0) lines.push('');
    if (block.kind === 'figures') lines.push(...figureLines(block.figures, '  '));
    else if (block.kind === 'table') lines.push(...tableLines(block.table));
    else if (block.kind === 'chart') lines.push(...chartLines(block.chart));
    else if (block.kind === 'cross-section') lines.push(...crossSectionLines(block.crossSection));
    else lines.push(...block.paragraphs.flatMap((p) => wrap(p, '  ')));
  });
  return lines;
}

function figureLines(figures: readonly ReportFigure[], indent: string): string[] {
  const width = Math.max(...figures.map((f) => f.label.length));
  return figures.map((f) => `${indent}${f.label.padEnd(width)}  ${formatQuantity(f.value, f.quantity)}${f.note ? `  (${f.note})` : ''}`);
}

/** Columns aligned: text to the left, numbers to the right, each header with its unit. */
function tableLines(table: ReportTable): string[] {
  const headers = table.columns.map((c) => {
    const unit = c.quantity ? quantityUnit(c.quantity) : '';
    return unit ? `${c.label} (${unit})` : c.label;
  });
  const rows = tableCellTexts(table);
  const widths = headers.map((h, j) => Math.max(h.length, ...rows.map((r) => (r[j] ?? '').length)));
  const numeric = table.columns.map((c) => c.quantity !== undefined);
  const line = (cells: readonly string[]) =>
    ('    ' + cells.map((text, j) => (numeric[j] ? text.padStart(widths[j]!) : text.padEnd(widths[j]!))).join('  ')).trimEnd();
  return [`  ${table.title}`, line(headers), ...rows.map(line)];
}

function chartLines(chart: ReportChart): string[] {
  if (chart.tabulatedIn !== undefined) {
    return wrap(`Chart "${chart.title}": drawn on screen and in the printed report; the table "${chart.tabulatedIn}" lists its figures.`, '  ');
  }
  const sharedX = chart.series.every(
    (s) => s.points.length === chart.series[0]!.points.length && s.points.every((p, k) => p[0] === chart.series[0]!.points[k]![0]),
  );
  const categories = chart.x.categories;
  const xColumn = categories ? { label: chart.x.label } : { label: chart.x.label, quantity: chart.x.quantity };
  const xCell = (x: number): ReportCell => (categories ? (categories[x] ?? String(x)) : { value: x, quantity: chart.x.quantity });
  const tables: ReportTable[] = sharedX
    ? [
        {
          title: `Chart "${chart.title}", as figures:`,
          columns: [xColumn, ...chart.series.map((s) => ({ label: s.name, quantity: chart.y.quantity }))],
          rows: chart.series[0]!.points.map((p, k) => [
            xCell(p[0]),
            ...chart.series.map((s) => ({ value: s.points[k]![1], quantity: chart.y.quantity })),
          ]),
        },
      ]
    : chart.series.map((s) => ({
        title: `Chart "${chart.title}", ${s.name}, as figures:`,
        columns: [xColumn, { label: chart.y.label, quantity: chart.y.quantity }],
        rows: s.points.map(([x, y]) => [
          xCell(x),
          { value: y, quantity: chart.y.quantity },
        ]),
      }));
  const markers = (chart.markers ?? []).map((m) => `    marked at ${categories ? (categories[m.x] ?? String(m.x)) : formatQuantity(m.x, chart.x.quantity)}: ${m.label}`);
  return [...tables.flatMap((t, i) => [...(i > 0 ? [''] : []), ...tableLines(t)]), ...markers];
}

/** A cross-section is a picture of figures a table of the report already lists: point to that table. */
function crossSectionLines(section: ReportCrossSection): string[] {
  return wrap(`Cross-section "${section.title}": drawn on screen and in the printed report; the table "${section.tabulatedIn}" lists its layers.`, '  ');
}

/** Words of `text` in lines of at most TEXT_WIDTH characters, the first after `first`, the rest after `rest`. */
function wrap(text: string, first: string, rest: string = first): string[] {
  const lines: string[] = [];
  let line = first;
  let empty = true;
  for (const word of text.split(/\s+/).filter((w) => w !== '')) {
    if (!empty && line.length + 1 + word.length > TEXT_WIDTH) {
      lines.push(line);
      line = rest + word;
    } else {
      line += (empty ? '' : ' ') + word;
    }
    empty = false;
  }
  lines.push(line);
  return lines;
}
