/**
 * The wall moisture checks as the tests ask for them, one at a time, each read from a full wall
 * analysis (app/cases/wall/wall-analysis.ts): the checks are functions of the states the wall case
 * solves, so the tests exercise exactly the path a case takes.
 */
import { InputError } from '../../app/base/input-error.js';
import { analyseWall } from '../../app/cases/wall/wall-analysis.js';
import type { MonthlyClimate, WallInput } from '../../app/cases/wall/wall.js';

const withClimate = (input: WallInput, climate?: MonthlyClimate): WallInput =>
  climate ? { ...input, moisture: { ...input.moisture, climate } } : input;

const withoutClimate = (input: WallInput): WallInput => {
  if (!input.moisture?.climate) return input;
  const { climate: _climate, ...moisture } = input.moisture;
  return { ...input, moisture };
};

export const checkMouldAtDesignCondition = (input: WallInput) => analyseWall(withoutClimate(input)).mould;

export const checkMouldMonthly = (input: WallInput, climate?: MonthlyClimate) => analyseWall(withClimate(input, climate)).mould;

export const checkInterstitialAtDesignCondition = (input: WallInput) => analyseWall(withoutClimate(input)).interstitialDesign;

/** The monthly procedure; refuses an input without a climate the way the case would (no result). */
export function checkInterstitialMonthly(input: WallInput, climate?: MonthlyClimate) {
  const monthly = analyseWall(withClimate(input, climate)).interstitialMonthly;
  if (!monthly) throw new InputError('moisture.climate', 'moisture.climate is needed for the monthly procedure: give 12 months of inside and outside conditions or the name of a shipped climate.');
  return monthly;
}
