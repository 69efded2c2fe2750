/**
 * Plausibility warnings of a solved conduction case (app/checks/plausibility-warnings.ts): each
 * layer's conductivity table read outside its points, temperatures above what any construction
 * meets, an extreme inner radius.
 */
import { SI_TEXT, type QuantityText } from '../../base/quantity-text.js';
import type { SteadyProblem } from '../../fe/problem.js';
import {
  conductivityUseWarnings,
  geometryPlausibilityWarnings,
  layerSpansOfProfile,
  temperaturePlausibilityWarnings,
} from '../../checks/plausibility-warnings.js';

/** Layer boundaries as the engine places them: x from 0 (planar) or r from the inner radius. */
function layerBounds(problem: SteadyProblem): { innerPosition: number; outerPosition: number }[] {
  let position = problem.geometry.kind === 'axisymmetric' ? problem.geometry.innerRadius : 0;
  return problem.layers.map((layer) => {
    const innerPosition = position;
    position += layer.thickness;
    return { innerPosition, outerPosition: position };
  });
}

/** `text` writes the warnings' figures in the project's units. */
export function conductionWarnings(problem: SteadyProblem, positions: readonly number[], snapshots: readonly (readonly number[])[], text: QuantityText = SI_TEXT): string[] {
  const spans = layerSpansOfProfile(positions, snapshots, layerBounds(problem));
  const highest = Math.max(...spans.map((s) => s.highest));
  return [
    ...geometryPlausibilityWarnings(problem.geometry.kind === 'axisymmetric' ? problem.geometry.innerRadius : null, text),
    ...temperaturePlausibilityWarnings(highest, text),
    ...conductivityUseWarnings(problem.layers.map((l, i) => ({ name: l.name ?? `Layer ${i + 1}`, conductivity: l.conductivity, ...spans[i]! })), text),
  ];
}
