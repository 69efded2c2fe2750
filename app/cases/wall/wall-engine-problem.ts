/**
 * The engine problem of a wall: a planar stack of the included layers with a film on each face,
 * h = 1/R_si towards the inside air and h = 1/R_se towards the outside air (surface resistances as
 * fixed film coefficients, as ISO 6946 treats them).
 */
import type { Layer, SteadyProblem } from '../../fe/problem.js';
import type { ThermalStack } from './wall-thermal-stack.js';

export function wallEngineProblem(stack: ThermalStack, insideTemperature: number, outsideTemperature: number): SteadyProblem {
  const layers: Layer[] = stack.layers
    .filter((l) => l.included)
    .map((l) => ({ name: l.name, thickness: l.thickness, conductivity: l.conductivity }));
  return {
    geometry: { kind: 'planar' },
    layers,
    inner: { kind: 'film', coefficient: 1 / stack.insideSurfaceResistance, ambient: insideTemperature },
    outer: { kind: 'film', coefficient: 1 / stack.outsideSurfaceResistance, ambient: outsideTemperature },
  };
}
