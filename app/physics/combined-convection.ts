/**
 * Mixed (free + forced) convection: Nu^n = Nu_F^n ± Nu_N^n with n = 3 (Incropera & DeWitt,
 * Fundamentals of Heat and Mass Transfer). '+' for assisting or transverse flow (wind across a
 * pipe or along a wall, with buoyancy acting upwards), '−' for opposing flow.
 *
 * The parts are combined on the coefficients rather than on the Nusselt numbers, because the free
 * and forced parts of a wall may be based on different lengths (height versus length along the
 * wind); on a common length the two forms are identical.
 */
import { distinctSentences, type Sentence } from '../base/quantity-sentence.js';
import type { ConvectionResult } from './convection-result.js';

export type MixedFlowArrangement = 'assisting-or-transverse' | 'opposing';

export interface CombinedConvectionResult {
  /** h_c, W/(m²·K) */
  readonly coefficient: number;
  readonly forced: ConvectionResult;
  readonly natural: ConvectionResult;
  readonly warnings: readonly Sentence[];
}

export const MIXED_CONVECTION_EXPONENT = 3;

/** h = (h_F^n ± h_N^n)^(1/n); never below 0 for opposing flow. */
export function combinedConvection(
  forced: ConvectionResult,
  natural: ConvectionResult,
  arrangement: MixedFlowArrangement = 'assisting-or-transverse',
  exponent: number = MIXED_CONVECTION_EXPONENT,
): CombinedConvectionResult {
  const sign = arrangement === 'opposing' ? -1 : 1;
  const sum = forced.coefficient ** exponent + sign * natural.coefficient ** exponent;
  return {
    coefficient: Math.max(0, sum) ** (1 / exponent),
    forced,
    natural,
    warnings: distinctSentences([...natural.warnings, ...forced.warnings]),
  };
}
