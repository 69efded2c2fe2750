/**
 * The printed cross-section (app/report/html/svg-cross-section) draws the layout the screen draws
 * (app/report/drawing/cross-section-layout): the same band edges and ring radii, to scale; its
 * fills read in greyscale (lightness or pattern tells every category apart); no style attribute.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { crossSectionLayout } from '../../../app/report/drawing/cross-section-layout.js';
import { BORE_FILL, CATEGORY_FILLS } from '../../../app/report/drawing/material-palette.js';
import { printText } from '../../../app/report/html/print-text.js';
import { crossSectionSvg } from '../../../app/report/html/svg-cross-section.js';
import type { ReportCrossSection } from '../../../app/report/report-model.js';
import { demoCases } from './demo-report.js';

function sections(): ReportCrossSection[] {
  return demoCases().flatMap((c) =>
    'report' in c ? c.report.sections.flatMap((s) => s.blocks.flatMap((b) => (b.kind === 'cross-section' ? [b.crossSection] : []))) : [],
  );
}

/** Relative luminance of an sRGB colour (WCAG 2 definition, from IEC 61966-2-1). */
function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255).map((c) => (c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r! + 0.7152 * g! + 0.0722 * b!;
}

describe('crossSectionSvg', () => {
  const print = printText('SI');

  it('draws a plane build-up with the band edges of the shared layout', () => {
    const wall = sections().find((s) => s.geometry === 'plane')!;
    const layout = crossSectionLayout(wall, print);
    const svg = crossSectionSvg(wall, print);
    const rects = [...svg.matchAll(/<rect x="([^"]+)" y="[^"]+" width="([^"]+)" height="[^"]+" fill="#/g)].map((m) => [Number(m[1]), Number(m[2])]);
    expect(rects.length).toBe(layout.layers.length);
    layout.layers.forEach((l, i) => {
      expect(rects[i]![0]).toBeCloseTo(l.from, 2);
      expect(rects[i]![1]).toBeCloseTo(l.to - l.from, 2);
    });
    for (const t of layout.temperatures) expect(svg).toContain(`>${t.text}</text>`);
    expect(svg).toContain(`viewBox="0 0 ${layout.width} `);
  });

  it('draws a pipe as rings round the bore at the layout radii, the bore to scale with them', () => {
    const pipe = sections().find((s) => s.geometry === 'cylinder')!;
    const layout = crossSectionLayout(pipe, print);
    const svg = crossSectionSvg(pipe, print);
    const radii = [...svg.matchAll(/<circle cx="[^"]+" cy="[^"]+" r="([^"]+)" fill="none"/g)].map((m) => Number(m[1]));
    for (const l of layout.layers) expect(radii.some((r) => Math.abs(r - l.to) < 0.006)).toBe(true);
    expect(radii.some((r) => Math.abs(r - layout.bore!.radius) < 0.006)).toBe(true);
    expect(svg).toContain(`bore ${layout.bore!.diameter} across`);
  });

  it('keys every layer by number, name and thickness, and names each fill in the legend', () => {
    for (const s of sections()) {
      const svg = crossSectionSvg(s, print);
      s.layers.forEach((l, i) => expect(svg).toContain(`<span class="layer-number">${i + 1}</span><span>${l.name.replace(/&/g, '&amp;')}, `));
      for (const category of new Set(s.layers.map((l) => l.category))) expect(svg).toContain(`<span>${CATEGORY_FILLS[category].label}</span>`);
      expect(svg).not.toMatch(/\sstyle=/);
    }
  });

  it('tells every pair of fills apart in greyscale: by lightness or by pattern (common practice, no source: 0.05 apart in luminance)', () => {
    const fills = [...Object.values(CATEGORY_FILLS), BORE_FILL];
    for (let i = 0; i < fills.length; i++) {
      for (let j = i + 1; j < fills.length; j++) {
        const [a, b] = [fills[i]!, fills[j]!];
        const apart = Math.abs(luminance(a.colour) - luminance(b.colour)) >= 0.05 || a.pattern !== b.pattern;
        expect(apart, `${a.label} and ${b.label}`).toBe(true);
      }
    }
  });
});

describe('the key swatches (spans the print stylesheet paints)', () => {
  const css = readFileSync(path.resolve(import.meta.dirname, '../../../data/report/report-print.css'), 'utf8');

  it('has a rule for every fill, in the fill’s own colour, and no <svg> per swatch', () => {
    const fills: [string, string][] = [...Object.entries(CATEGORY_FILLS).map(([c, f]) => [c, f.colour] as [string, string]), ['bore', BORE_FILL.colour]];
    for (const [name, colour] of fills) {
      const rule = new RegExp(`\\.swatch\\.fill-${name} \\{[^}]*${colour}`);
      expect(css, name).toMatch(rule);
    }
    const wall = sections().find((s) => s.geometry === 'plane')!;
    const svg = crossSectionSvg(wall, printText('SI'));
    expect(svg).not.toContain('<svg class="swatch"');
    expect(svg).toContain(`<span class="swatch fill-${wall.layers[0]!.category}" aria-hidden="true"></span>`);
  });

  it('draws the patterns as marks inside their layer, with no <pattern> and no opacity', () => {
    for (const s of sections()) {
      const svg = crossSectionSvg(s, printText('SI'));
      expect(svg).not.toMatch(/<pattern|opacity=/);
    }
  });
});
