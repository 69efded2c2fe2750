/**
 * The shipped emission factors (data/sizing/emission-factors.json), each with its source, for a
 * form or a command to offer as a start: the economics of a case carry their own figure and source
 * (SizingEconomics.emissionFactor, emissionSource), so a user's edit never depends on this list.
 */
import shipped from '../../../data/sizing/emission-factors.json' with { type: 'json' };

export interface EmissionFactorEntry {
  readonly id: string;
  readonly name: string;
  /** kg CO₂ per kWh of purchased energy (fuel at `basis`, or electricity at the meter). */
  readonly factor: number;
  readonly basis: string;
  readonly source: string;
}

export const EMISSION_FACTORS: readonly EmissionFactorEntry[] = shipped.factors;
