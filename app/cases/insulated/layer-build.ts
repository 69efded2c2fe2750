/**
 * Turns an ordered list of (material, thickness) into the FE engine's layers. Shared by the pipe,
 * flat-surface and wall calculations so they all hand the engine the same thing: the material's
 * name, its conductivity model (constant, polynomial or table in °C) and, where the material
 * gives them, density and specific heat for transient use. Validation of the numbers is the
 * engine's job (it names the field `layers[i].…`); the calculations validate their own inputs first.
 */
import type { Layer } from '../../fe/problem.js';
import type { MaterialProperties } from '../../materials/material-properties.js';

export interface MaterialLayer {
  readonly material: MaterialProperties;
  /** m, > 0 */
  readonly thickness: number;
}

export function toEngineLayers(layers: readonly MaterialLayer[]): Layer[] {
  return layers.map(({ material, thickness }) => ({
    name: material.name,
    thickness,
    conductivity: material.conductivity,
    ...(material.density !== null && material.density !== undefined ? { density: material.density } : {}),
    ...(material.specificHeat !== null && material.specificHeat !== undefined ? { specificHeat: material.specificHeat } : {}),
  }));
}
