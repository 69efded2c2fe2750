/**
 * A small library and a timber-frame wall as the case editor holds them (materials by library id),
 * shared by the bridging and target-U tests. Materials are test data only (generic λ values of the
 * kind ISO 10456 tabulates, from memory); the wall is the worked wall of
 * tests/assemblies/bridged-layers.test.ts, so its hand calculation applies.
 */
import type { MaterialProperties } from '../../app/materials/material-properties.js';
import type { WallAnalysis } from '../../app/cases/wall/wall-analysis.js';
import { solveCase, type SolvedCase } from '../../app/index.js';
import type { Json } from '../../renderer/src/case-editor/case-paths.js';

const material = (name: string, category: MaterialProperties['category'], lambda: number): MaterialProperties => ({
  name, category, conductivity: { kind: 'constant', value: lambda }, density: 500, specificHeat: 1000, vapourResistanceFactor: 10,
  equivalentAirLayerThickness: null, emissivity: 0.9, minServiceTemperature: null, maxServiceTemperature: null,
});

export const LIBRARY: ReadonlyMap<number, MaterialProperties> = new Map([
  [1, material('Plasterboard (test)', 'building', 0.25)],
  [2, material('Mineral wool (test)', 'insulation', 0.04)],
  [3, material('Timber (test)', 'building', 0.13)],
  [4, material('Sheathing (test)', 'building', 0.15)],
]);

/** Inside → outside: plasterboard 12.5 mm, mineral wool 100 mm, sheathing 15 mm; horizontal heat flow. */
export const WALL: Json = {
  kind: 'wall',
  schemaVersion: 1,
  heatFlowDirection: 'horizontal',
  inside: { temperature: 20, relativeHumidity: 0.5 },
  outside: { temperature: -5, relativeHumidity: 0.85 },
  layers: [
    { materialId: 1, thickness: 0.0125 },
    { materialId: 2, thickness: 0.1 },
    { materialId: 4, thickness: 0.015 },
  ],
};

export const solveWall = (doc: Json): SolvedCase => solveCase(doc, { resolveMaterial: (id) => LIBRARY.get(id), unitSystem: 'SI' });
export const analysisOf = (doc: Json): WallAnalysis => solveWall(doc).result as WallAnalysis;
