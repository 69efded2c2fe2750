/**
 * What both the steady and the transient solvers build first: the mesh, the measure and the two
 * faces with their conditions, plus an initial temperature guess for nonlinear iteration.
 */
import { isConstantConductivity } from './conductivity.js';
import type { Face } from './face-conditions.js';
import { measureFor, type Measure } from './measure.js';
import { buildMesh, usesExactLayers, type Mesh, type MeshPurpose } from './mesh.js';
import type { FaceCondition, Layer, SteadyProblem } from './problem.js';
import type { MeshSummary } from './result.js';

export interface Discretisation {
  readonly mesh: Mesh;
  readonly measure: Measure;
  readonly layers: readonly Layer[];
  readonly faces: readonly [Face, Face];
  /** True when λ depends on temperature or a film coefficient depends on the surface temperature. */
  readonly nonlinear: boolean;
  /**
   * The solver works with excess temperatures θ = T − reference, the reference being the mean of
   * the temperatures the conditions name. Heat flows come from differences of nodal values; with
   * values near zero those differences keep all their digits, even for a 500 °C pipe whose steel
   * wall carries a temperature drop of a few millikelvin.
   */
  readonly reference: number;
}

export function discretise(problem: SteadyProblem, purpose: MeshPurpose = 'steady'): Discretisation {
  const order = problem.options?.order;
  const mesh = buildMesh(problem.geometry, problem.layers, order ?? 2, purpose, usesExactLayers(problem.layers, order, purpose));
  const measure = measureFor(problem.geometry);
  const last = mesh.positions.length - 1;
  const faces = [
    { name: 'inner', node: 0, measure: measure(mesh.positions[0]!), condition: problem.inner },
    { name: 'outer', node: last, measure: measure(mesh.positions[last]!), condition: problem.outer },
  ] as const satisfies readonly [Face, Face];
  const nonlinear =
    problem.layers.some((l) => !isConstantConductivity(l.conductivity)) ||
    [problem.inner, problem.outer].some((c) => c.kind === 'film' && typeof c.coefficient === 'function');
  return { mesh, measure, layers: problem.layers, faces, nonlinear, reference: namedTemperatureMean([problem.inner, problem.outer]) };
}

function namedTemperatureMean(conditions: readonly FaceCondition[]): number {
  const named = conditions
    .map((c) => (c.kind === 'temperature' ? c.temperature : c.kind === 'film' ? c.ambient : undefined))
    .filter((t): t is number => t !== undefined);
  return named.length > 0 ? named.reduce((a, b) => a + b, 0) / named.length : 20;
}

export function withFaceConditions(d: Discretisation, inner: FaceCondition, outer: FaceCondition): Discretisation {
  return { ...d, faces: [{ ...d.faces[0], condition: inner }, { ...d.faces[1], condition: outer }] };
}

/** A uniform first guess: the reference temperature itself (zero excess everywhere). */
export function initialGuess(d: Discretisation): Float64Array {
  return new Float64Array(d.mesh.positions.length);
}

export function summariseMesh(mesh: Mesh): MeshSummary {
  return { order: mesh.order, elementsPerLayer: [...mesh.elementsPerLayer], nodeCount: mesh.positions.length };
}
