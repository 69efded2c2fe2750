/**
 * Dynamic thermal characteristics of a plane multilayer element for a periodic cycle (daily by
 * default), by the heat transfer matrix method of ISO 13786:2017, clause 6 (matrices: see
 * heat-transfer-matrix.ts for their conventions). From the element matrix Z (inside = side 1):
 *
 *   periodic thermal transmittance  Y_ie = Y₁₂ = −1/Z₁₂       (heat into the inside per outside θ̂)
 *   inside thermal admittance       Y_ii = Y₁₁ = −Z₁₁/Z₁₂
 *   outside thermal admittance      Y_ee = Y₂₂ = −Z₂₂/Z₁₂
 *   decrement factor                f = |Y₁₂|/U
 *   time shift of each Y            Δt = (T/2π)·arg Y
 *   areal heat capacities           κ₁ = (T/2π)·|(Z₁₁ − 1)/Z₁₂|,  κ₂ = (T/2π)·|(Z₂₂ − 1)/Z₁₂|
 *
 * (the standard's "dynamic thermal characteristics" and "heat capacities" sub-clauses; the
 * surface resistances are part of Z, since the characteristics relate the inside and outside
 * environments, not the two surfaces).
 *
 * Time shift, sign and phase: with θ̂ ∝ e^{+iωt} a negative Δt is a lag: the heat flow into the
 * inside peaks |Δt| after the outside temperature does. Δt is kept with the standard's sign. A
 * heavy wall delays its transmittance by more than T/2, beyond the principal argument (−π, π], so
 * the phase is followed continuously from the steady state (ω = 0, where every Y is real and
 * positive) up to ω = 2π/T, and the argument taken on that branch: a lag of 14 h reads −14 h, not
 * +10 h. The admittances stay within (0, π/2) and read the same either way.
 */
import { argument, divide, modulus, negate, subtract, ONE, type Complex } from './complex-number.js';
import { InputError } from './errors.js';
import {
  layerMatrix,
  multiplyMatrices,
  periodicPenetrationDepth,
  resistanceMatrix,
  type HeatTransferMatrix,
  type StoringLayer,
} from './heat-transfer-matrix.js';
import { requireNonNegative, requirePositive } from './input-checks.js';

/** The period of ISO 13786's daily cycle, s. */
export const DAILY_PERIOD = 86_400;

/** A layer of an element: one that stores heat, or a pure resistance (an air layer, m²·K/W). */
export type PeriodicLayer =
  | ({ readonly kind: 'material' } & StoringLayer)
  | { readonly kind: 'resistance'; readonly resistance: number };

export interface PeriodicElement {
  /** Inside → outside. */
  readonly layers: readonly PeriodicLayer[];
  /** R_si and R_se, m²·K/W. */
  readonly insideSurfaceResistance: number;
  readonly outsideSurfaceResistance: number;
}

/** A complex characteristic as its amplitude and its time shift. */
export interface PeriodicFigure {
  /** |Y|, W/(m²·K) */
  readonly amplitude: number;
  /** (T/2π)·arg Y on the branch continuous from the steady state, s; negative = lag. */
  readonly timeShift: number;
}

export interface PeriodicResponse {
  /** s */
  readonly period: number;
  /** Steady U = 1/R_T, W/(m²·K) (the ω → 0 limit of Y_ie). */
  readonly uValue: number;
  /** Y_ie: heat flow density into the inside per unit outside temperature amplitude. */
  readonly periodicTransmittance: PeriodicFigure;
  /** f = |Y_ie|/U */
  readonly decrementFactor: number;
  /** Y_ii and Y_ee */
  readonly insideAdmittance: PeriodicFigure;
  readonly outsideAdmittance: PeriodicFigure;
  /** κ₁ and κ₂, J/(m²·K) */
  readonly insideArealHeatCapacity: number;
  readonly outsideArealHeatCapacity: number;
  /** The element matrix Z = Z_se·Z_N⋯Z₁·Z_si at the period. */
  readonly matrix: HeatTransferMatrix;
}

/**
 * Above this total thickness in periodic penetration depths (Σ d/δ) cosh ξ approaches the
 * largest double; such an element (90 m of concrete for a day) transmits nothing periodic.
 */
const MAXIMUM_PENETRATION_DEPTHS = 500;

/** The ISO 13786 characteristics of `element` for a cycle of `period` seconds (validated here). */
export function periodicResponse(element: PeriodicElement, period: number = DAILY_PERIOD): PeriodicResponse {
  validateElement(element, period);
  const depths = penetrationDepths(element, period);
  if (depths > MAXIMUM_PENETRATION_DEPTHS) {
    throw new InputError(
      'layers',
      `The layers are ${depths.toPrecision(3)} periodic penetration depths thick in all; the periodic calculation supports up to ${MAXIMUM_PENETRATION_DEPTHS}.`,
    );
  }

  // Follow the phases from the steady state: ω_k = ω·(k/n)², so ξ grows by equal steps of at most
  // 1/4 and no argument moves by anything near π between two steps.
  const steps = 8 + Math.ceil(4 * depths);
  let phases = { transmittance: 0, inside: 0, outside: 0 };
  let last: ReturnType<typeof characteristicsAt> | undefined;
  for (let k = 1; k <= steps; k++) {
    last = characteristicsAt(element, period * (steps / k) ** 2);
    phases = {
      transmittance: continued(phases.transmittance, argument(last.y12)),
      inside: continued(phases.inside, argument(last.y11)),
      outside: continued(phases.outside, argument(last.y22)),
    };
  }

  const at = last!;
  const z = at.matrix;
  const uValue = 1 / totalResistance(element);
  const toTime = period / (2 * Math.PI);
  const response: PeriodicResponse = {
    period,
    uValue,
    periodicTransmittance: { amplitude: modulus(at.y12), timeShift: toTime * phases.transmittance },
    decrementFactor: modulus(at.y12) / uValue,
    insideAdmittance: { amplitude: modulus(at.y11), timeShift: toTime * phases.inside },
    outsideAdmittance: { amplitude: modulus(at.y22), timeShift: toTime * phases.outside },
    insideArealHeatCapacity: toTime * modulus(divide(subtract(z.z11, ONE), z.z12)),
    outsideArealHeatCapacity: toTime * modulus(divide(subtract(z.z22, ONE), z.z12)),
    matrix: z,
  };
  assertFinite(response);
  return response;
}

/** Z = Z_se · Z_N ⋯ Z₁ · Z_si for the period. */
export function elementMatrix(element: PeriodicElement, period: number): HeatTransferMatrix {
  let z = resistanceMatrix(element.insideSurfaceResistance);
  for (const layer of element.layers) {
    z = multiplyMatrices(layer.kind === 'resistance' ? resistanceMatrix(layer.resistance) : layerMatrix(layer, period), z);
  }
  return multiplyMatrices(resistanceMatrix(element.outsideSurfaceResistance), z);
}

/** R_T = R_si + Σ d/λ + Σ R + R_se, m²·K/W. */
function totalResistance(element: PeriodicElement): number {
  return element.layers.reduce(
    (sum, l) => sum + (l.kind === 'resistance' ? l.resistance : l.thickness / l.conductivity),
    element.insideSurfaceResistance + element.outsideSurfaceResistance,
  );
}

function characteristicsAt(element: PeriodicElement, period: number): { matrix: HeatTransferMatrix; y12: Complex; y11: Complex; y22: Complex } {
  const matrix = elementMatrix(element, period);
  return {
    matrix,
    y12: negate(divide(ONE, matrix.z12)),
    y11: negate(divide(matrix.z11, matrix.z12)),
    y22: negate(divide(matrix.z22, matrix.z12)),
  };
}

/** The argument `principal` moved onto the branch nearest the previous phase. */
function continued(previous: number, principal: number): number {
  const turns = Math.round((previous - principal) / (2 * Math.PI));
  return principal + turns * 2 * Math.PI;
}

function penetrationDepths(element: PeriodicElement, period: number): number {
  return element.layers.reduce((sum, l) => sum + (l.kind === 'resistance' ? 0 : l.thickness / periodicPenetrationDepth(l, period)), 0);
}

function validateElement(element: PeriodicElement, period: number): void {
  requirePositive('period', period, 's', 'time');
  requireNonNegative('insideSurfaceResistance', element.insideSurfaceResistance, 'm²·K/W', 'thermalResistance');
  requireNonNegative('outsideSurfaceResistance', element.outsideSurfaceResistance, 'm²·K/W', 'thermalResistance');
  if (element.layers.length === 0) throw new InputError('layers', 'layers must hold at least one layer.');
  element.layers.forEach((layer, i) => {
    const f = `layers[${i}]`;
    if (layer.kind === 'resistance') {
      requireNonNegative(`${f}.resistance`, layer.resistance, 'm²·K/W', 'thermalResistance');
      return;
    }
    requirePositive(`${f}.thickness`, layer.thickness, 'm', 'thickness');
    requirePositive(`${f}.conductivity`, layer.conductivity, 'W/(m·K)', 'conductivity');
    requirePositive(`${f}.density`, layer.density, 'kg/m³', 'density');
    requirePositive(`${f}.specificHeat`, layer.specificHeat, 'J/(kg·K)', 'specificHeat');
  });
  if (!(totalResistance(element) > 0)) throw new InputError('layers', 'The element must have a thermal resistance greater than 0 m²·K/W in all.');
}

/** Inside the engine a NaN never reaches a report: a non-finite figure is a bug, said plainly. */
function assertFinite(response: PeriodicResponse): void {
  const figures = [
    response.uValue,
    response.periodicTransmittance.amplitude,
    response.periodicTransmittance.timeShift,
    response.decrementFactor,
    response.insideAdmittance.amplitude,
    response.insideAdmittance.timeShift,
    response.outsideAdmittance.amplitude,
    response.outsideAdmittance.timeShift,
    response.insideArealHeatCapacity,
    response.outsideArealHeatCapacity,
  ];
  if (!figures.every(Number.isFinite)) throw new Error('The periodic response gave a figure that is not finite; this is a bug in the calculation.');
}
