/**
 * The lumped-capacitance freeze times: contents and pipe wall at one uniform temperature, losing
 * heat through a linear resistance R' (W per metre per K) to a sink at θ_a below freezing (the
 * lumped-capacitance analysis of Incropera et al., Fundamentals of Heat and Mass Transfer, ch. 5,
 * with latent heat added at the freezing point; the same formulas as ISO 12241's freezing clause,
 * from memory):
 *   t₁ = R'·C'·ln((θ₀ − θ_a)/(θ_f − θ_a)),  C' = Σρc·A per metre (contents and pipe wall),
 *   t₂ = f·m'·L·R'/(θ_f − θ_a),              m' = ρ·π·r_i²,
 * the time to cool to θ_f and then to freeze a fraction f. Nothing resists heat inside the contents
 * and the insulation stores none, so for the same R' these are the shortest times the
 * conduction model can give. The finite-element simulation uses them to choose its time step and
 * reports them beside its own.
 */

export interface LumpedFreezeTimes {
  /** s, to cool to the freezing point; Infinity when the sink is not below it. */
  readonly timeToFreezing: number;
  /** s, from the start until the fraction has frozen (t₁ + t₂); null with no fraction; Infinity when the sink is not below freezing. */
  readonly timeToFraction: number | null;
}

export interface LumpedFreezeInput {
  /** m·K/W, per metre of pipe. */
  readonly resistance: number;
  /** J/(m·K): contents and pipe wall per metre. */
  readonly heatCapacity: number;
  /** kg/m, of the contents. */
  readonly contentsMass: number;
  /** J/kg */
  readonly latentHeat: number;
  /** °C */
  readonly initialTemperature: number;
  readonly freezingTemperature: number;
  readonly sinkTemperature: number;
  /** 0..1, or null. */
  readonly fraction: number | null;
}

export function lumpedFreezeTimes(p: LumpedFreezeInput): LumpedFreezeTimes {
  const below = p.freezingTemperature - p.sinkTemperature;
  if (!(below > 0)) return { timeToFreezing: Infinity, timeToFraction: p.fraction === null ? null : Infinity };
  const cooling = p.resistance * p.heatCapacity * Math.log((p.initialTemperature - p.sinkTemperature) / below);
  const freezing = p.fraction === null ? null : cooling + (p.fraction * p.contentsMass * p.latentHeat * p.resistance) / below;
  return { timeToFreezing: cooling, timeToFraction: freezing };
}
