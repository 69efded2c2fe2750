/**
 * What every convection correlation returns, so the callers can treat them alike. A warning is a
 * sentence whose figures (a temperature, a length) stay SI values tagged with their kind
 * (app/base/quantity-sentence), worded in the project's units by the case that reports it;
 * dimensionless groups (Ra, Re, Pr) are plain text.
 */
import type { Sentence } from '../base/quantity-sentence.js';

/** A Nusselt number from a correlation, with the sentences that flag use outside its validity range. */
export interface NusseltEstimate {
  readonly nusselt: number;
  readonly warnings: readonly Sentence[];
}

export interface ConvectionResult {
  /** Mean convective coefficient h_c, W/(m²·K). */
  readonly coefficient: number;
  readonly nusselt: number;
  /** Rayleigh number on the characteristic length (natural convection). */
  readonly rayleigh?: number;
  /** Reynolds number on the characteristic length (forced convection). */
  readonly reynolds?: number;
  readonly prandtl: number;
  /** m: the diameter, height or plate length the numbers are based on. */
  readonly characteristicLength: number;
  /** °C: where the air properties were taken. */
  readonly filmTemperature: number;
  /** Which correlation produced the result, for reports. */
  readonly correlation: string;
  /** One sentence per condition outside the correlation's validity range; empty inside it. */
  readonly warnings: readonly Sentence[];
}

/** Formats a dimensionless group for a warning sentence. */
export function formatGroup(value: number): string {
  return value.toExponential(2);
}
