/**
 * Results of a solve, as plain data. Extensive quantities are per m² of wall (planar) or per
 * metre of pipe (axisymmetric), as `basis` says; heat flux densities are always W/m² at the
 * position given. Heat flows through the body are positive outwards (towards the outer face);
 * heat at a face is given as the heat entering the body there.
 */
import type { FlowBasis } from './measure.js';
import type { FaceName } from './face-conditions.js';
import type { ElementOrder, FilmExchange } from './problem.js';

export interface FaceResult {
  readonly face: FaceName;
  readonly position: number;
  readonly temperature: number;
  readonly condition: 'temperature' | 'flux' | 'film';
  /** Heat entering the body through this face, W/m² (planar) or W/m (axisymmetric). */
  readonly heatIn: number;
  /** Heat flux density entering the body at this face, W/m². */
  readonly heatFluxDensityIn: number;
  /** For a fixed-temperature face: the reaction recovered from the rows set aside (equals heatIn). */
  readonly reaction?: number;
  /** For a film face: the coefficient and sink temperature at the converged surface temperature. */
  readonly film?: FilmExchange;
}

export interface InterfaceResult {
  /** Interface i lies between layer i and layer i + 1. */
  readonly index: number;
  readonly position: number;
  /** Temperature on the inner side and on the outer side (they differ only across a contact resistance). */
  readonly temperatureInnerSide: number;
  readonly temperatureOuterSide: number;
  readonly contactResistance: number;
  /** Heat flow across the interface, outwards, W/m² or W/m. */
  readonly heatFlow: number;
  /** Heat flux density across the interface, outwards, W/m². */
  readonly heatFluxDensity: number;
}

export interface LayerResult {
  readonly index: number;
  readonly name?: string;
  readonly innerPosition: number;
  readonly outerPosition: number;
  readonly innerTemperature: number;
  readonly outerTemperature: number;
  /** Arithmetic mean of the layer's face temperatures, °C. */
  readonly meanTemperature: number;
  /** Outward heat flow entering the layer's inner side and leaving its outer side. */
  readonly heatFlowInner: number;
  readonly heatFlowOuter: number;
  /** Heat generated in the layer (W/m² or W/m). */
  readonly generated: number;
  /** Conductivity model evaluated at the mean temperature, W/(m·K). */
  readonly conductivityAtMeanTemperature: number;
  /**
   * The conductivity that gives the layer's heat flow from its face temperatures (the integral
   * mean of λ(T) over the layer's temperature range), W/(m·K); absent where it is undefined
   * (no temperature difference, or heat generated in the layer).
   */
  readonly effectiveConductivity?: number;
  /** Thermal resistance ΔT / heat flow: m²·K/W (planar) or m·K/W (axisymmetric); absent where undefined. */
  readonly thermalResistance?: number;
}

export interface EnergyBalance {
  readonly heatInInner: number;
  readonly heatInOuter: number;
  readonly generated: number;
  /** heatInInner + heatInOuter + generated: zero for an exact steady state. */
  readonly residual: number;
  /** |residual| divided by the largest of the terms' magnitudes. */
  readonly relativeResidual: number;
}

export interface MeshSummary {
  readonly order: ElementOrder;
  readonly elementsPerLayer: readonly number[];
  readonly nodeCount: number;
}

export interface SteadyResult {
  readonly basis: FlowBasis;
  readonly positions: readonly number[];
  readonly temperatures: readonly number[];
  readonly faces: { readonly inner: FaceResult; readonly outer: FaceResult };
  readonly interfaces: readonly InterfaceResult[];
  readonly layers: readonly LayerResult[];
  readonly balance: EnergyBalance;
  /** Newton iterations (each a linearisation and a band solve): 1 for a linear problem. */
  readonly iterations: number;
  /** Largest nodal temperature change in the last iteration, K (0 for a linear problem). */
  readonly lastChange: number;
  readonly mesh: MeshSummary;
}

export interface TransientEnergyBalance {
  /**
   * Heat stored in the body between the initial condition and the end, ∫ρc(T_end − T_initial)dV, or
   * ∫ρ(H(T_end) − H(T_initial))dV with the enthalpy H of a layer with a phase change (latent heat included).
   */
  readonly stored: number;
  /** Net heat in through both faces plus heat generated, integrated over time (including the heat a fixed face puts in at t = 0⁺ when it differs from the initial temperature). */
  readonly netIn: number;
  readonly residual: number;
  readonly relativeResidual: number;
}

export interface TransientResult {
  readonly basis: FlowBasis;
  readonly positions: readonly number[];
  /** Times, s, starting with 0. */
  readonly times: readonly number[];
  /** Nodal temperatures at each time, °C. */
  readonly temperatures: readonly (readonly number[])[];
  /** Heat entering through each face during each step (step average), W/m² or W/m; one entry per step. */
  readonly heatIn: { readonly inner: readonly number[]; readonly outer: readonly number[] };
  readonly balance: TransientEnergyBalance;
  /**
   * Only when a layer has a phase change: at each time, per layer, the mass fraction below the
   * phase change (solid), or null for a layer without one.
   */
  readonly solidFraction?: readonly (readonly (number | null)[])[];
  /** Largest number of nonlinear iterations any step needed. */
  readonly maxIterations: number;
  readonly mesh: MeshSummary;
}
