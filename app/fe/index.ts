/** Public API of the finite-element core. */
export type { ConductivityModel } from './conductivity.js';
export { conductivityAt, conductivitySlopeAt, isConstantConductivity } from './conductivity.js';
export type {
  ElementOrder,
  FaceCondition,
  FilmCoefficient,
  FilmExchange,
  Geometry,
  Layer,
  PhaseChange,
  SolverOptions,
  SteadyProblem,
  TimeScheme,
  TransientProblem,
  TransientState,
} from './problem.js';
export type {
  EnergyBalance,
  FaceResult,
  InterfaceResult,
  LayerResult,
  MeshSummary,
  SteadyResult,
  TransientEnergyBalance,
  TransientResult,
} from './result.js';
export { ConvergenceError, InputError, SingularProblemError } from './errors.js';
export { solveSteady } from './steady-solve.js';
export { solveTransient } from './transient-solve.js';
export type { EnthalpyCurve } from './phase-change.js';
export { enthalpyCurve, liquidFraction, specificEnthalpy } from './phase-change.js';
export { BandedMatrix, solveBanded } from './banded-matrix.js';
export { ABSOLUTE_ZERO_CELSIUS } from './validate.js';
