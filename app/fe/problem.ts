/**
 * The plain-data description of a 1D conduction problem, in SI units.
 *
 * Temperatures are in degrees Celsius (an SI derived unit, and the unit every conductivity curve
 * and design condition is published in); the few places that need kelvin (radiation, the
 * absolute-zero check) convert locally. Lengths in metres, conductivities in W/(m·K), heat flow
 * densities in W/m², volumetric generation in W/m³, contact resistances in m²·K/W.
 *
 * Position runs from the inner face (x = 0, or r = innerRadius) to the outer face.
 */
import type { ConductivityModel } from './conductivity.js';

/**
 * Planar: per m² of wall. Axisymmetric: per metre of pipe, inner radius > 0; or 0 for a solid
 * cylinder (a pipe's contents) in a transient problem, whose inner face is then the axis: see
 * validate.ts.
 */
export type Geometry =
  | { readonly kind: 'planar' }
  | { readonly kind: 'axisymmetric'; readonly innerRadius: number };

export interface Layer {
  readonly name?: string;
  /** m, > 0 */
  readonly thickness: number;
  readonly conductivity: ConductivityModel;
  /** kg/m³, needed for transient problems. */
  readonly density?: number;
  /** J/(kg·K), needed for transient problems. */
  readonly specificHeat?: number;
  /** W/m³, uniform within the layer; default 0. */
  readonly heatGeneration?: number;
  /** Thermal contact resistance between this layer and the next one, m²·K/W; default 0 (perfect contact). */
  readonly contactResistanceToNext?: number;
  /** Override of the number of elements in this layer. */
  readonly elements?: number;
  /** Latent heat taken up or given off over a narrow temperature range (transient problems; a steady solve stores no heat). */
  readonly phaseChange?: PhaseChange;
}

/**
 * A phase change of a layer's material (water freezing): the latent heat is spread evenly over
 * `temperature` ± `range`/2, and the layer's `specificHeat` holds above the range (see phase-change.ts).
 */
export interface PhaseChange {
  /** °C, the middle of the range: the freezing (melting) point. */
  readonly temperature: number;
  /** J/kg, ≥ 0 (0 leaves only the change of specific heat). */
  readonly latentHeat: number;
  /** K, > 0: the width of the range over which the latent heat is released. */
  readonly range: number;
  /** J/(kg·K) below the range (the solid); default the layer's specificHeat. */
  readonly solidSpecificHeat?: number;
}

/** Coefficient and sink temperature of a film (convection, or convection plus linearised radiation). */
export interface FilmExchange {
  /** W/(m²·K), ≥ 0 */
  readonly coefficient: number;
  /** °C */
  readonly ambient: number;
}

/**
 * A film coefficient, either fixed or a function of the surface temperature (°C) supplied by the
 * caller. The function may return a bare coefficient (sink = the condition's ambient) or a whole
 * exchange, which lets convection to the air and radiation to different surroundings combine into
 * one effective sink temperature.
 */
export type FilmCoefficient = number | ((surfaceTemperature: number) => number | FilmExchange);

export type FaceCondition =
  /** Essential condition: the face temperature is known, °C. */
  | { readonly kind: 'temperature'; readonly temperature: number }
  /** Prescribed heat flow density into the body through this face, W/m². */
  | { readonly kind: 'flux'; readonly flux: number }
  /** Film: heat in = h·(ambient − surface) per m² of this face. */
  | { readonly kind: 'film'; readonly coefficient: FilmCoefficient; readonly ambient: number };

export type ElementOrder = 1 | 2;

export interface SolverOptions {
  /** Element order: 1 linear, 2 quadratic. Default 2. */
  readonly order?: ElementOrder;
  /**
   * Convergence tolerance on the largest nodal temperature change between iterations, K. Default
   * 1e-10. A steady solve also stops when the change is down to the round-off level of the
   * temperatures, should that be larger (see newton-iteration.ts).
   */
  readonly temperatureTolerance?: number;
  /** Largest number of nonlinear iterations (Newton iterations in a steady solve). Default 200. */
  readonly maxIterations?: number;
}

export interface SteadyProblem {
  readonly geometry: Geometry;
  /** Ordered from the inner face outwards. */
  readonly layers: readonly Layer[];
  readonly inner: FaceCondition;
  readonly outer: FaceCondition;
  readonly options?: SolverOptions;
}

export type TimeScheme = 'backward-euler' | 'crank-nicolson';

export interface TransientProblem extends SteadyProblem {
  /** Initial temperature, °C: uniform, or one value per node of the mesh the solver builds (advanced use). */
  readonly initialTemperature: number | ((position: number) => number);
  /** s, > 0 */
  readonly timeStep: number;
  /** s, > 0; the number of steps is ceil(duration / timeStep). */
  readonly duration: number;
  /** Default 'crank-nicolson'. */
  readonly scheme?: TimeScheme;
  /** Face conditions that change with time (s); when given they replace inner/outer at each step. */
  readonly facesAt?: (time: number) => { readonly inner: FaceCondition; readonly outer: FaceCondition };
  /**
   * Checked after every step; returning true ends the run there, before `duration` (which is then
   * the longest time simulated). For a run that lasts until something happens (a pipe's water has
   * frozen), so the caller need not guess the duration.
   */
  readonly stopWhen?: (state: TransientState) => boolean;
}

/** The state after a step, as stopWhen sees it. */
export interface TransientState {
  /** s */
  readonly time: number;
  /** Nodal temperatures, °C. */
  readonly temperatures: readonly number[];
  /** Per layer: the mass fraction below its phase change (solid), or null for a layer without one. */
  readonly solidFraction: readonly (number | null)[];
}
