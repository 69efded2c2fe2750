/** The build-up's pure parts: library references, the thickness series, layer means from a solve, the material search's words. */
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { solveCase } from '../../app/index.js';
import { pipeSizeCatalogue } from '../../main/pipe-sizes/pipe-size-catalogue.js';
import { addLayer, chooseMaterial, referencedMaterialIds, removeLayer } from '../../renderer/src/case-editor/build-up.js';
import { getAt } from '../../renderer/src/case-editor/case-paths.js';
import { layerMeansOf } from '../../renderer/src/case-editor/layer-means.js';
import { familyOf, parseThicknessSeries, thicknessesFor } from '../../renderer/src/case-editor/thickness-series.js';
import { materialFacts } from '../../renderer/src/case-editor/material-choice.js';
import type { MaterialProperties } from '../../app/materials/material-properties.js';

const root = path.resolve(import.meta.dirname, '..', '..');
const series = parseThicknessSeries(fs.readFileSync(path.join(root, 'data', 'insulation-thickness-series.csv'), 'utf8'));

describe('build-up', () => {
  it('finds every library reference, and a chosen material replaces an inline one', () => {
    const doc = { pipe: { materialId: 3 }, layers: [{ material: { name: 'x', conductivity: 0.04 }, thickness: 0.05 }], jacket: { materialId: 7, thickness: 0.001 }, extra: { coatingMaterialId: 9 } };
    expect(referencedMaterialIds(doc).sort()).toEqual([3, 7, 9]);
    const chosen = chooseMaterial(doc, 'layers[0]', 12);
    expect(getAt(chosen, 'layers[0]')).toEqual({ thickness: 0.05, materialId: 12 });
    expect(getAt(removeLayer(addLayer(chosen, 5), 0), 'layers')).toEqual([{ materialId: 5, thickness: 0.05 }]);
  });

  it('gives a material the thickness series of its product family (data/insulation-thickness-series.csv)', () => {
    expect(familyOf('Rock wool pipe section, typical curve', series.keys())).toBe('mineral wool pipe section');
    expect(familyOf('Elastomeric foam tube, typical curve', series.keys())).toBe('elastomeric foam tube');
    expect(familyOf('Mineral wool board', series.keys())).toBeNull();
    // The series in the file, in mm: 20, 25, 30, 40, 50, 60, 70, 80, 100, 120.
    expect(thicknessesFor(series, 'Glass wool pipe section, typical curve').map((t) => Math.round(t * 1000))).toEqual([20, 25, 30, 40, 50, 60, 70, 80, 100, 120]);
  });

  it('reads each slot mean temperature from a solved pipe (pipe wall, both insulation layers, jacket)', () => {
    const steam = JSON.parse(fs.readFileSync(path.join(root, 'data', 'examples', 'pipe-steam-outdoor.json'), 'utf8'));
    const solved = solveCase(steam, { resolveMaterial: () => undefined, pipeSizes: pipeSizeCatalogue() });
    const means = layerMeansOf(solved.result);
    expect(Object.keys(means)).toEqual(['pipe', 'layers[0]', 'layers[1]', 'jacket']);
    // Temperatures fall outwards from the 180 °C steam to the 5 °C air.
    expect(means['pipe']! > means['layers[0]']! && means['layers[0]']! > means['layers[1]']! && means['layers[1]']! > means['jacket']!).toBe(true);
  });

  it('reads each wall layer mean as the middle of its faces', () => {
    const wall = JSON.parse(fs.readFileSync(path.join(root, 'data', 'examples', 'wall-winter-condensation.json'), 'utf8'));
    const solved = solveCase(wall, { resolveMaterial: () => undefined });
    const means = layerMeansOf(solved.result);
    expect(Object.keys(means)).toEqual(['layers[0]', 'layers[1]', 'layers[2]', 'layers[3]']);
    expect(means['layers[0]']! < 20 && means['layers[3]']! > -5).toBe(true);
  });

  it('describes a material by λ where it works, its service range and μ', () => {
    const wool: MaterialProperties = {
      name: 'wool', category: 'insulation', conductivity: { kind: 'table', points: [[10, 0.035], [50, 0.04]] }, density: null, specificHeat: null,
      vapourResistanceFactor: 1, equivalentAirLayerThickness: null, emissivity: null, minServiceTemperature: 0, maxServiceTemperature: 300,
    };
    // λ at 30 °C lies halfway along the straight line between the two points: 0.0375.
    expect(materialFacts(wool, 30, 'SI')).toEqual(['λ 0.0375 W/(m·K) at 30.0 °C', 'service 0.0 °C to 300.0 °C', 'μ 1']);
    expect(materialFacts({ ...wool, vapourResistanceFactor: Number.POSITIVE_INFINITY }, undefined, 'IP')[0]).toBe('λ 0.243 Btu·in/(h·ft²·°F) at 50.0 °F');
  });
});
