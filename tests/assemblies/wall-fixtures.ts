/** Small builders for wall tests: generic materials (values in the style of ISO 10456 tables, from memory; test data only). */
import type { WallInput, WallLayer } from '../../app/cases/wall/wall.js';
import type { MaterialProperties } from '../../app/materials/material-properties.js';

export function material(name: string, conductivity: number, vapourResistanceFactor: number | null = null, sd: number | null = null): MaterialProperties {
  return {
    name,
    category: 'building',
    conductivity: { kind: 'constant', value: conductivity },
    density: null,
    specificHeat: null,
    vapourResistanceFactor,
    equivalentAirLayerThickness: sd,
    emissivity: null,
    minServiceTemperature: null,
    maxServiceTemperature: null,
  };
}

export function layer(m: MaterialProperties, thickness: number): WallLayer {
  return { material: m, thickness };
}

export function wall(layers: readonly WallLayer[], overrides: Partial<WallInput> = {}): WallInput {
  return {
    layers,
    heatFlowDirection: 'horizontal',
    inside: { temperature: 20, relativeHumidity: 0.5 },
    outside: { temperature: -5, relativeHumidity: 0.85 },
    ...overrides,
  };
}

export { thrownBy } from '../physics/thrown-error.js';
