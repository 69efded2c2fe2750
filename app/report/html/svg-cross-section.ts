/**
 * A ReportCrossSection as a static SVG for paper, from the same layout as the screen's drawing
 * (app/report/drawing/cross-section-layout): bands or rings to scale, numbered badges, the
 * temperature at each face, a key of the layers and a legend of the fills. The fills differ in
 * lightness and, for the categories that sit side by side most often, in pattern, so the drawing
 * reads on a monochrome printer.
 */
import { crossSectionLayout } from '../drawing/cross-section-layout.js';
import { BORE_FILL, CATEGORY_FILLS, categoriesUsed } from '../drawing/material-palette.js';
import type { MaterialCategory } from '../../materials/material-properties.js';
import type { ReportCrossSection } from '../report-model.js';
import { patternMarks } from './cross-section-marks.js';
import { escapeAttribute, escapeHtml, escapeSvgText } from './escape-html.js';
import type { PrintText } from './print-text.js';

const INK = '#1f2429';
const SOFT = '#56606a';

export function crossSectionSvg(section: ReportCrossSection, print: PrintText): string {
  const layout = crossSectionLayout(section, { withUnit: (value, quantity) => print.withUnit(value, quantity) });
  const parts: string[] = [];
  const edge = `fill="none" stroke="${INK}" stroke-width="0.8"`;
  if (layout.geometry === 'plane') {
    const height = layout.bandBottom - layout.bandTop;
    for (const layer of layout.layers) {
      const fill = CATEGORY_FILLS[layer.category];
      parts.push(`<rect x="${n(layer.from)}" y="${layout.bandTop}" width="${n(layer.to - layer.from)}" height="${height}" fill="${fill.colour}"/>`);
      parts.push(patternMarks(fill.pattern, { kind: 'band', from: layer.from, to: layer.to, top: layout.bandTop, bottom: layout.bandBottom }));
    }
    for (const layer of layout.layers) parts.push(`<line x1="${n(layer.to)}" y1="${layout.bandTop}" x2="${n(layer.to)}" y2="${layout.bandBottom}" ${edge}/>`);
    const first = layout.layers[0];
    const last = layout.layers[layout.layers.length - 1];
    if (first && last) parts.push(`<rect x="${n(first.from)}" y="${layout.bandTop}" width="${n(last.to - first.from)}" height="${height}" ${edge}/>`);
  } else {
    const { x, y } = layout.centre;
    const circle = (r: number, sweep: 0 | 1) => `M ${n(x - r)} ${y} a ${n(r)} ${n(r)} 0 1 ${sweep} ${n(2 * r)} 0 a ${n(r)} ${n(r)} 0 1 ${sweep} ${n(-2 * r)} 0 Z`;
    // Two circles in one path, the inner drawn the other way round: a ring with a hole (nonzero rule).
    const ring = (outer: number, inner: number) => `${circle(outer, 1)}${inner > 0 ? ` ${circle(inner, 0)}` : ''}`;
    for (const layer of [...layout.layers].reverse()) {
      const fill = CATEGORY_FILLS[layer.category];
      parts.push(`<path d="${ring(layer.to, layer.from)}" fill="${fill.colour}"/>`);
      parts.push(patternMarks(fill.pattern, { kind: 'ring', cx: x, cy: y, inner: layer.from, outer: layer.to }));
      parts.push(`<circle cx="${x}" cy="${y}" r="${n(layer.to)}" ${edge}/>`);
    }
    if (layout.bore) {
      const r = n(layout.bore.radius);
      parts.push(`<circle cx="${x}" cy="${y}" r="${r}" fill="${BORE_FILL.colour}"/>`);
      parts.push(patternMarks(BORE_FILL.pattern, { kind: 'ring', cx: x, cy: y, inner: 0, outer: layout.bore.radius }));
      parts.push(`<circle cx="${x}" cy="${y}" r="${r}" ${edge}/>`);
    }
    const outer = layout.layers[layout.layers.length - 1]?.to ?? 0;
    parts.push(`<line x1="${x}" y1="${y}" x2="${n(x + outer)}" y2="${y}" stroke="${INK}" stroke-width="0.8" stroke-dasharray="4 3"/>`);
  }
  for (const layer of layout.layers) {
    const b = layer.badge;
    parts.push(
      `<g class="badge"><line x1="${n(b.anchorX)}" y1="${n(b.anchorY)}" x2="${n(b.x)}" y2="${n(b.y + 9)}" stroke="${SOFT}" stroke-width="0.8"/>` +
        `<circle cx="${n(b.x)}" cy="${n(b.y)}" r="9" fill="#ffffff" stroke="${INK}" stroke-width="1"${layer.widened ? ' stroke-dasharray="2 2"' : ''}/>` +
        `<text x="${n(b.x)}" y="${n(b.y + 3.5)}" text-anchor="middle" font-size="10" font-weight="600">${escapeSvgText(b.text)}</text></g>`,
    );
  }
  for (const t of layout.temperatures) {
    parts.push(
      `<g class="temperature"><line x1="${n(t.anchorX)}" y1="${n(t.anchorY)}" x2="${n(t.x)}" y2="${n(t.y - 11)}" stroke="${SOFT}" stroke-width="0.8"/>` +
        `<text x="${n(t.x)}" y="${n(t.y)}" text-anchor="middle" font-size="11">${escapeSvgText(t.text)}</text></g>`,
    );
  }
  if (layout.notToScale) parts.push(`<text x="6" y="${layout.height - 8}" font-size="11" fill="${SOFT}">${escapeSvgText(layout.notToScale)}</text>`);

  // A key's swatch is a <span> the stylesheet paints (its class per fill, report-print.css), not a
  // small <svg> of its own: a long report has hundreds of them.
  const swatch = (fill: MaterialCategory | 'bore') => `<span class="swatch fill-${fill}" aria-hidden="true"></span>`;
  const key = layout.layers
    .map((l) => `<li>${swatch(l.category)}<span class="layer-number">${l.number}</span><span>${escapeHtml(`${l.name}, ${l.thickness}`)}${l.widened ? ' <em>(not to scale)</em>' : ''}</span></li>`)
    .join('');
  const legend = [...categoriesUsed(section.layers.map((l) => l.category)), ...(layout.bore ? ['bore' as const] : [])]
    .map((fill) => `<li>${swatch(fill)}<span>${escapeHtml(fill === 'bore' ? BORE_FILL.label : CATEGORY_FILLS[fill].label)}</span></li>`)
    .join('');
  const caption = `${layout.bore ? `a pipe with its bore ${layout.bore.diameter} across` : 'inside on the left'}; ${layout.notToScale ? 'to scale except where marked not to scale' : 'to scale'}; temperatures at each face.`;
  return (
    `<figure class="cross-section ${layout.geometry}"><figcaption><span class="figure-title">${escapeHtml(section.title)}</span>, ${escapeHtml(caption)}</figcaption>` +
    `<div class="cross-section-drawing"><svg class="cross-section-plot" viewBox="0 0 ${layout.width} ${n(layout.height)}" width="${layout.width}" height="${n(layout.height)}" role="img" aria-label="${escapeAttribute(layout.description)}" fill="${INK}">${parts.join('')}</svg>` +
    `<div class="cross-section-keys"><ol class="layer-key">${key}</ol><ul class="fill-legend">${legend}</ul></div></div></figure>`
  );
}

function n(value: number): string {
  return String(Math.round(value * 100) / 100);
}
