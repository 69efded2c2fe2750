/** Results of a wall or roof calculation, as plain data (SI; per m² unless stated). */
import type { WallDynamicCharacteristics } from './wall-dynamic.js';
import type { CombinedMethodResult } from './wall-combined-method.js';
import type { StackBridgedLayer, VentilationApplied } from './wall-thermal-stack.js';
import type { UCorrections } from './wall-u-corrections.js';

export interface WallLayerResult {
  /** Index in the input's layer list. */
  readonly index: number;
  readonly name: string;
  readonly kind: 'material' | 'air-layer';
  /** m */
  readonly thickness: number;
  /** False for a well ventilated air layer and everything outside it (ignored by the ISO 6946 rule). */
  readonly included: boolean;
  /** Resistance in the total R_T, m²·K/W (from the engine's solution); null when the layer is not included. */
  readonly thermalResistance: number | null;
  /** d/λ at 10 °C, or R_g of an air layer, before any slightly-ventilated scaling, m²·K/W. */
  readonly nominalThermalResistance: number;
  /** Factor on the resistance from the slightly-ventilated rule (1 elsewhere). */
  readonly resistanceScale: number;
  /** For an air layer: R_g in m²·K/W and whether the table or the annex formula gave it. */
  readonly airLayer?: { readonly resistance: number; readonly method: 'table' | 'formula' };
  /** For a bridged layer: its sections, λ''_j and the resistance it carries (its share of the combined method's R_T). */
  readonly bridged?: StackBridgedLayer;
  /** Conductivity that carries the layer's heat flow (integral mean of λ(T)), W/(m·K); null when not included. */
  readonly effectiveConductivity: number | null;
  /** Face temperatures, °C; null when not included. */
  readonly innerTemperature: number | null;
  readonly outerTemperature: number | null;
}

export interface WallResult {
  /** U = 1/R_T, W/(m²·K), full precision. */
  readonly uValue: number;
  /** U rounded to 2 significant figures, as ISO 6946 asks for the final value (from memory). */
  readonly uValueRounded: number;
  /**
   * U_c = U + ΔU with the ISO 6946 Annex F corrections for air gaps and fasteners, W/(m²·K); equal
   * to uValue when no layer carries either. A target U is checked against this value.
   */
  readonly correctedUValue: number;
  readonly correctedUValueRounded: number;
  /** The Annex F corrections; null when no counted layer has air gaps or fasteners. */
  readonly corrections: UCorrections | null;
  /** The ISO 6946 combined method (R'_T, R''_T, R_T, e) of the counted element; null when no counted layer is bridged. */
  readonly combinedMethod: CombinedMethodResult | null;
  /** q/(θ_i − θ_e) from the engine's heat flow: agrees with uValue; null when θ_i = θ_e. */
  readonly uValueFromHeatFlow: number | null;
  /** R_T = R_si + Σ R_j + R_se, m²·K/W. */
  readonly totalResistance: number;
  /** R_si and R_se in force, m²·K/W (R_se after the ventilation rules). */
  readonly insideSurfaceResistance: number;
  readonly outsideSurfaceResistance: number;
  readonly layers: readonly WallLayerResult[];
  /** Inside and outside surface temperatures θ_si, θ_se, °C (outside = the face the engine's outer film acts on). */
  readonly insideSurfaceTemperature: number;
  readonly outsideSurfaceTemperature: number;
  /** Temperatures at the interfaces between consecutive included layers, °C, inside → outside. */
  readonly interfaceTemperatures: readonly number[];
  /** Heat flow density q, W/m², positive outwards. */
  readonly heatFlowDensity: number;
  /** Heat flow through the element Φ = q·A, W. */
  readonly heatFlow: number;
  /** m² */
  readonly area: number;
  /** The engine's energy balance: residual in W/m² and relative to the largest term. */
  readonly energyBalance: { readonly residual: number; readonly relativeResidual: number };
  readonly ventilation: VentilationApplied;
  /** Positions (m from the inside face) and temperatures (°C) of the engine's nodes. */
  readonly profile: { readonly positions: readonly number[]; readonly temperatures: readonly number[] };
  /** ISO 13786 characteristics for a 24 h cycle; null when a counted layer lacks density or specific heat. */
  readonly dynamic: WallDynamicCharacteristics | null;
}
