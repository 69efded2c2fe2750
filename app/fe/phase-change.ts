/**
 * Latent heat of a layer, as an enthalpy H(T) per kilogram (J/kg) and the capacities derived from it.
 *
 * A sharp phase change (water freezing at exactly 0 °C) makes H jump by the latent heat L at one
 * temperature, which no finite-element field can follow. The jump is spread evenly over a narrow
 * range w centred on the phase-change temperature T_m: the liquid fraction φ rises linearly from 0 at
 * T_s = T_m − w/2 to 1 at T_l = T_m + w/2, and the sensible specific heat goes with it from the solid's
 * c_s to the liquid's c_l. So
 *   H(T) = c_s (T − T_m)                                     T ≤ T_s
 *   H(T) = −c_s w/2 + c_s s + (c_l − c_s) s²/(2w) + L s/w    T_s < T < T_l,  s = T − T_s
 *   H(T) = L + c_l (T − T_m)                                 T ≥ T_l
 * which equals the sharp enthalpy outside the range (zero for solid at T_m), so the heat to cool from
 * any temperature above the range to any below it is exactly the sharp model's. A time step stores
 * the enthalpy change itself, i.e. the chord capacity (H(T₂) − H(T₁))/(T₂ − T₁) times the temperature
 * change, so heat is conserved however far a step jumps across the range; the apparent heat capacity
 * dH/dT is the tangent Newton's method needs (latent-step.ts). This is the enthalpy-consistent form
 * of the apparent-capacity method (e.g. Morgan, Lewis and Zienkiewicz, Int. J. Numer. Meth. Eng. 12
 * (1978) 1191–1195, from memory).
 */
import type { Layer, PhaseChange } from './problem.js';

/** The constants of one layer's enthalpy, worked out once per layer. */
export interface EnthalpyCurve {
  /** °C: the lower and upper ends of the range. */
  readonly solidus: number;
  readonly liquidus: number;
  readonly width: number;
  readonly meltingPoint: number;
  readonly latentHeat: number;
  /** J/(kg·K) below and above the range. */
  readonly solidSpecificHeat: number;
  readonly liquidSpecificHeat: number;
}

/** The enthalpy curve of a layer with a phase change; `specificHeat` holds above the range. */
export function enthalpyCurve(layer: Layer & { readonly phaseChange: PhaseChange }): EnthalpyCurve {
  const p = layer.phaseChange;
  const liquid = layer.specificHeat ?? 0;
  return {
    solidus: p.temperature - p.range / 2,
    liquidus: p.temperature + p.range / 2,
    width: p.range,
    meltingPoint: p.temperature,
    latentHeat: p.latentHeat,
    solidSpecificHeat: p.solidSpecificHeat ?? liquid,
    liquidSpecificHeat: liquid,
  };
}

const curves = new WeakMap<Layer, EnthalpyCurve>();

/** The layer's curve, worked out once: the assembly asks for it at every element of every iteration. */
export function curveOf(layer: Layer & { readonly phaseChange: PhaseChange }): EnthalpyCurve {
  let curve = curves.get(layer);
  if (!curve) {
    curve = enthalpyCurve(layer);
    curves.set(layer, curve);
  }
  return curve;
}

/** J/kg, relative to the solid at the phase-change temperature. */
export function specificEnthalpy(curve: EnthalpyCurve, temperature: number): number {
  const { solidus, liquidus, width, meltingPoint, latentHeat, solidSpecificHeat: cs, liquidSpecificHeat: cl } = curve;
  if (temperature <= solidus) return cs * (temperature - meltingPoint);
  if (temperature >= liquidus) return latentHeat + cl * (temperature - meltingPoint);
  const s = temperature - solidus;
  return -cs * (width / 2) + cs * s + ((cl - cs) * s * s) / (2 * width) + (latentHeat * s) / width;
}

/** dH/dT, J/(kg·K): the sensible part plus L/w inside the range. */
export function apparentSpecificHeat(curve: EnthalpyCurve, temperature: number): number {
  if (temperature < curve.solidus) return curve.solidSpecificHeat;
  if (temperature > curve.liquidus) return curve.liquidSpecificHeat;
  const phi = (temperature - curve.solidus) / curve.width;
  return curve.solidSpecificHeat + (curve.liquidSpecificHeat - curve.solidSpecificHeat) * phi + curve.latentHeat / curve.width;
}

/** Mass fraction still liquid, 0..1: linear across the range. */
export function liquidFraction(curve: EnthalpyCurve, temperature: number): number {
  return Math.min(1, Math.max(0, (temperature - curve.solidus) / curve.width));
}

/** True when the layer carries latent heat (any phase change, even with L = 0, takes this path). */
export function hasPhaseChange(layer: Layer): layer is Layer & { readonly phaseChange: PhaseChange } {
  return layer.phaseChange !== undefined;
}
