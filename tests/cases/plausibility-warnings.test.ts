/**
 * Results that rest on inputs used beyond what backs them carry a warning, never silence: a
 * conductivity table read beyond its points or a curve beyond the material's service range, a
 * temperature no insulated construction meets (above 3000 °C, common practice, no source), an inner
 * radius below 0.1 mm. The warning is in solveCase's answer and in the text rendering of its report.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { renderReportText, solveCase } from '../../app/index.js';

const root = path.resolve(__dirname, '..', '..');
const example = (name: string) => JSON.parse(readFileSync(path.join(root, 'data', 'examples', name), 'utf8')) as Record<string, any>;
const context = { resolveMaterial: () => undefined };

describe('plausibility warnings', () => {
  it('conduction: 1e6 °C, a 0.05 mm bore and a table read far beyond its last point', () => {
    const solved = solveCase(
      {
        schemaVersion: 1,
        kind: 'conduction',
        geometry: { kind: 'axisymmetric', innerRadius: 0.00005 },
        layers: [{ name: 'Fireclay', thickness: 0.1, conductivity: { kind: 'table', points: [[0, 1], [500, 1.2]] } }],
        inner: { kind: 'temperature', temperature: 1e6 },
        outer: { kind: 'film', coefficient: 10, ambient: 20 },
      },
      context,
    );
    expect(solved.warnings).toEqual([
      "The inner radius of 0.0500 mm is below 0.1 mm, smaller than any tube; check the inputs' units (metres).",
      "Temperatures reach 1.000e+6 °C, above the 3000 °C of any insulated or lined construction in service; check the inputs' units.",
      'Fireclay: its conductivity table covers 0 to 500 °C but the layer reaches 1000000.0 °C; beyond the table the end value is used unchanged.',
    ]);
    expect(renderReportText(solved.report)).toContain('its conductivity table covers 0 to 500 °C');
  });

  it('pipe: an insulation table that stops below the layer’s hottest face', () => {
    const pipe = example('pipe-hot-water-plant-room.json');
    pipe.layers[0].material.conductivity = { kind: 'table', points: [[10, 0.035], [50, 0.04]] };
    const solved = solveCase(pipe, context);
    expect(solved.warnings.some((w) => /its conductivity table covers 10 to 50 °C but the layer reaches 80\.0 °C/.test(w))).toBe(true);
  });

  it('wall: a layer whose table starts above the cold face', () => {
    const wall = example('wall-masonry-cavity.json');
    const insulation = wall.layers.findIndex((l: any) => l.material && /wool|board|insulation/i.test(l.material.name));
    expect(insulation).toBeGreaterThanOrEqual(0);
    wall.layers[insulation].material.conductivity = { kind: 'table', points: [[15, 0.034], [40, 0.037]] };
    const solved = solveCase(wall, context);
    expect(solved.warnings.some((w) => /its conductivity table covers 15 to 40 °C but the layer reaches/.test(w))).toBe(true);
    expect(solved.report.warnings.length).toBe(solved.warnings.length);
  });

  it('no warning for the examples as shipped', () => {
    for (const name of ['pipe-hot-water-plant-room.json', 'wall-masonry-cavity.json', 'conduction-cold-store-wall.json']) {
      expect(solveCase(example(name), context).warnings, name).toEqual([]);
    }
  });
});
