/**
 * Everything a wall or roof case asks for in one call: the ISO 6946 calculation, the mould and
 * surface-condensation check, and the interstitial-condensation check at the design condition and,
 * when the case carries a monthly climate, over the year. Used by the command line and the UI.
 */
import type { CheckResult } from '../../checks/check-result.js';
import {
  checkInterstitialAtDesignCondition,
  checkInterstitialMonthly,
  checkMouldAtDesignCondition,
  checkMouldMonthly,
  type InterstitialDesignResult,
  type InterstitialMonthlyResult,
  type MouldAssessment,
} from '../../checks/interstitial.js';
import { calculateWall } from './wall-calculation.js';
import type { WallInput } from './wall-input.js';
import type { WallResult } from './wall-result.js';

export interface WallAnalysis {
  readonly wall: WallResult;
  /** Monthly when a climate is given, else at the design condition. */
  readonly mould: MouldAssessment;
  readonly interstitialDesign: InterstitialDesignResult;
  readonly interstitialMonthly: InterstitialMonthlyResult | null;
  /** The verdicts above, in reading order. */
  readonly checks: readonly CheckResult[];
}

export function analyseWall(input: WallInput): WallAnalysis {
  const wall = calculateWall(input);
  const climate = input.moisture?.climate;
  const mould = climate ? checkMouldMonthly(input, climate) : checkMouldAtDesignCondition(input);
  const interstitialDesign = checkInterstitialAtDesignCondition(input);
  const interstitialMonthly = climate ? checkInterstitialMonthly(input, climate) : null;
  const checks = [mould.mould, mould.surfaceCondensation, interstitialDesign.check, ...(interstitialMonthly ? [interstitialMonthly.check] : [])];
  return { wall, mould, interstitialDesign, interstitialMonthly, checks };
}
