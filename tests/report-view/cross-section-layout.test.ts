/**
 * The cross-section drawing's geometry, from the reports of the example cases: to scale where every
 * layer is wide enough to see, a thin jacket or membrane widened to the minimum and marked "not to
 * scale" (only then), labels that do not overlap, and each temperature label at its face.
 */
import { describe, expect, it } from 'vitest';
import { crossSectionLayout, MINIMUM_WIDTH, type CrossSectionLayout } from '../../app/report/drawing/cross-section-layout.js';
import { quantityText } from '../../renderer/src/report-view/quantity-text.js';
import { crossSectionOf, exampleReport } from './report-fixtures.js';

const text = quantityText('SI');
const layoutOf = (file: string) => {
  const section = crossSectionOf(exampleReport(file));
  return { section, layout: crossSectionLayout(section, text) };
};

/** Drawing units per metre of each layer. */
const scales = (layout: CrossSectionLayout, thicknesses: readonly number[]) => layout.layers.map((l, i) => (l.to - l.from) / thicknesses[i]!);

/** Labels of one row at least `width` apart, rows alternating. */
function expectApart(xs: readonly number[], width: number) {
  for (let i = 2; i < xs.length; i++) expect(xs[i]! - xs[i - 2]!).toBeGreaterThanOrEqual(width - 1e-9);
}

describe('crossSectionLayout', () => {
  it('draws the chilled-water pipe to scale: bore and rings share one scale, no footnote', () => {
    const { section, layout } = layoutOf('pipe-chilled-water.json');
    expect(section.geometry).toBe('cylinder');
    expect(layout.notToScale).toBeNull();
    expect(layout.description).toMatch(/ Drawn to scale\.$/);
    expect(layout.layers.every((l) => !l.widened)).toBe(true);
    const scale = layout.bore!.radius / (section.geometry === 'cylinder' ? section.innerRadius : NaN);
    for (const s of scales(layout, section.layers.map((l) => l.thickness))) expect(s).toBeCloseTo(scale, 9);
    // Rings are concentric and touch: each starts where the one inside it ends.
    expect(layout.layers[0]!.from).toBeCloseTo(layout.bore!.radius, 12);
    for (let i = 1; i < layout.layers.length; i++) expect(layout.layers[i]!.from).toBeCloseTo(layout.layers[i - 1]!.to, 12);
    expect(layout.bore!.diameter).toBe('70.3 mm');
  });

  it('widens the 0.7 mm jacket and 3.6 mm pipe wall of the plant-room pipe, marks them alone not to scale, bore and insulation to one scale', () => {
    const { section, layout } = layoutOf('pipe-hot-water-plant-room.json');
    // 107.85 mm of radius on 112 px: 1.04 px per mm puts the 3.6 mm wall at 3.7 px and the jacket at 0.7 px, under the 4 px minimum.
    expect(section.layers.map((l) => l.thickness)).toEqual([0.0036, 0.05, 0.0007]);
    expect(layout.layers.map((l) => l.widened)).toEqual([true, false, true]);
    for (const i of [0, 2]) expect(layout.layers[i]!.to - layout.layers[i]!.from).toBeCloseTo(MINIMUM_WIDTH, 12);
    expect(layout.layers.map((l) => l.badge.text)).toEqual(['1*', '2', '3*']);
    expect(layout.bore!.widened).toBe(false);
    const insulation = layout.layers[1]!;
    expect((insulation.to - insulation.from) / 0.05).toBeCloseTo(layout.bore!.radius / 0.05355, 9);
    expect(layout.notToScale).toBe('* Not to scale: drawn wider so that they show.');
    expect(layout.description).toContain('3 jacket: Aluminium jacket sheet (demo), 0.7 mm');
    expect(layout.description).toMatch(/Drawn to scale except layer 1 \(3\.6 mm\) and layer 3 \(0\.7 mm\), drawn wider so that they show\.$/);
  });

  it('lays a timber-frame wall out as bands, widening its two membranes and labelling only the faces with a temperature', () => {
    const { section, layout } = layoutOf('wall-timber-frame-vcl.json');
    expect(layout.geometry).toBe('plane');
    expect(layout.layers.filter((l) => l.widened).map((l) => l.name)).toEqual(['polyethylene vapour control layer (s_d 50 m)', 'breather membrane (s_d 0.02 m)']);
    expect(layout.description).toContain('Drawn to scale except layer 2 (0.2 mm) and layer 5 (0.5 mm)');
    // Bands are side by side from the left edge to the right edge of the drawing.
    for (let i = 1; i < layout.layers.length; i++) expect(layout.layers[i]!.from).toBeCloseTo(layout.layers[i - 1]!.to, 12);
    // The cladding and its cavity lie outside a well ventilated air layer: their outer faces have no temperature.
    const given = section.temperatures.filter((t) => t !== null);
    expect(layout.temperatures.map((t) => t.text)).toEqual(given.map((t) => `${t! < 0 ? '−' : ''}${Math.abs(t!).toFixed(1)} °C`));
    layout.temperatures.forEach((t, i) => {
      const face = i === 0 ? layout.layers[0]!.from : layout.layers[i - 1]!.to;
      expect(t.anchorX).toBeCloseTo(face, 12);
    });
  });

  it('keeps badges and temperature labels apart and inside the drawing', () => {
    for (const file of ['wall-timber-frame-vcl.json', 'pipe-steam-outdoor.json', 'flat-hot-tank-wall.json']) {
      const { layout } = layoutOf(file);
      const badges = layout.layers.map((l) => l.badge.x);
      for (let i = 1; i < badges.length; i++) expect(badges[i]! - badges[i - 1]!).toBeGreaterThanOrEqual(2 * 9);
      const widest = Math.max(...layout.temperatures.map((t) => t.text.length * 6.4));
      expectApart(layout.temperatures.map((t) => t.x), widest);
      for (const t of layout.temperatures) {
        expect(t.x - widest / 2).toBeGreaterThanOrEqual(0);
        expect(t.x + widest / 2).toBeLessThanOrEqual(layout.width);
        expect(t.y).toBeLessThan(layout.height);
      }
      for (const n of [layout.width, layout.height, ...badges, ...layout.temperatures.flatMap((t) => [t.x, t.y, t.anchorX, t.anchorY])]) expect(Number.isFinite(n)).toBe(true);
    }
  });
});
