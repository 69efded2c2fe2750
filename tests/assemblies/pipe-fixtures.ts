/**
 * Materials and inputs shared by the pipe and flat-surface tests. Values are typical indicative
 * figures for tests only (common practice, no source), except where a comment names a source.
 */
import type { MaterialProperties } from '../../app/materials/material-properties.js';
import type { PipeInput } from '../../app/cases/pipe/pipe-input.js';
import type { FlatSurfaceInput } from '../../app/cases/flat/flat-surface-input.js';
import { InputError } from '../../app/fe/errors.js';

export function material(name: string, conductivity: number | MaterialProperties['conductivity'], extra: Partial<MaterialProperties> = {}): MaterialProperties {
  return {
    name,
    category: 'other',
    conductivity: typeof conductivity === 'number' ? { kind: 'constant', value: conductivity } : conductivity,
    density: null,
    specificHeat: null,
    vapourResistanceFactor: null,
    equivalentAirLayerThickness: null,
    emissivity: null,
    minServiceTemperature: null,
    maxServiceTemperature: null,
    ...extra,
  };
}

// λ of steel and aluminium: ISO 10456 / EN 12524 generic values (reference notes §5.1).
export const steel = material('Steel', 50, { category: 'pipe', emissivity: 0.8 });
export const aluminium = material('Aluminium sheet', 160, { category: 'cladding', emissivity: 0.13 });
export const mineralWool = material('Mineral wool', 0.04, { category: 'insulation', emissivity: 0.9, maxServiceTemperature: 250 });
export const foam = material('Elastomeric foam', 0.036, { category: 'insulation', emissivity: 0.9, minServiceTemperature: -50, maxServiceTemperature: 105 });

/** DN100 steel pipe, 50 mm mineral wool, aluminium jacket, indoors. */
export function hotPipe(overrides: Partial<PipeInput> = {}): PipeInput {
  return {
    pipe: { outerDiameter: 0.1143, wallThickness: 0.0036, material: steel },
    inner: { kind: 'fluid', temperature: 90, coefficient: 1500 },
    layers: [{ material: mineralWool, thickness: 0.05 }],
    jacket: { material: aluminium, thickness: 0.0008 },
    orientation: 'horizontal',
    ambient: { airTemperature: 20, relativeHumidity: 0.5, exposure: { kind: 'indoor' } },
    length: 30,
    operatingHours: 8000,
    ...overrides,
  };
}

/** A 6 m high tank wall: 8 mm steel, 100 mm mineral wool, aluminium jacket, outdoors. */
export function tankWall(overrides: Partial<FlatSurfaceInput> = {}): FlatSurfaceInput {
  return {
    wall: { material: steel, thickness: 0.008 },
    inner: { kind: 'fluid', temperature: 85, coefficient: 300 },
    layers: [{ material: mineralWool, thickness: 0.1 }],
    jacket: { material: aluminium, thickness: 0.0009 },
    surface: { kind: 'vertical', height: 6 },
    ambient: { airTemperature: 5, relativeHumidity: 0.8, exposure: { kind: 'outdoor', windSpeed: 3 } },
    area: 120,
    operatingHours: 8760,
    ...overrides,
  };
}

/** The InputError `action` throws (fails the test when it throws something else or nothing). */
export function inputErrorOf(action: () => unknown): InputError {
  try {
    action();
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected an InputError, but the call returned normally');
}
