/**
 * Everything a wall or roof case asks for, in the order of the method: validate once, build the
 * thermal stacks (ISO 6946 surface resistances, and R_si = 0.25 m²·K/W for the mould criterion),
 * solve each state once (wall-states.ts), then hand the solved states to the checks: mould and
 * inside-surface condensation, interstitial condensation at the design condition and, when the
 * case carries a monthly climate, over the year.
 */
import { SI_TEXT, type QuantityText } from '../../base/quantity-text.js';
import type { CheckResult } from '../../checks/check-result.js';
import {
  assessMould,
  checkInterstitialAtDesignCondition,
  checkInterstitialMonthly,
  mouldDesignIndices,
  surfaceHumidityConditions,
  vapourStackAt,
  MOULD_CHECK_INSIDE_SURFACE_RESISTANCE,
  type InterstitialDesignResult,
  type InterstitialMonthlyResult,
  type MouldAssessment,
} from '../../checks/interstitial.js';
import { solveSteady } from '../../fe/steady-solve.js';
import { wallResultOf } from './wall-calculation.js';
import { wallEngineProblem } from './wall-engine-problem.js';
import { isAirLayer, type WallInput } from './wall-input.js';
import { conductivityUseWarnings } from '../../checks/plausibility-warnings.js';
import type { WallResult } from './wall-result.js';
import { wallStateSolver } from './wall-states.js';
import { buildThermalStack } from './wall-thermal-stack.js';
import { validateWallInput } from './wall-validation.js';
import { wallVapourLayers } from './wall-vapour-layers.js';
import { targetUSeries, type TargetUResult } from './wall-target-u.js';
import { bridgingWarnings } from './wall-bridging-warnings.js';

export interface WallAnalysis {
  readonly wall: WallResult;
  /** Monthly when a climate is given, else at the design condition. */
  readonly mould: MouldAssessment;
  readonly interstitialDesign: InterstitialDesignResult;
  readonly interstitialMonthly: InterstitialMonthlyResult | null;
  /** The verdicts above, in reading order. */
  readonly checks: readonly CheckResult[];
  /** Engine solves this analysis made (each state once; a linear wall needs one per stack). */
  readonly solves: number;
  /** Conductivity curves read beyond their data or service range at the design condition, and bridging the combined method handles poorly. */
  readonly warnings: readonly string[];
  /** The thickness series for the case's target U-value; null when the case names none. */
  readonly targetU: TargetUResult | null;
}

/**
 * What the analysis needs of the input beyond the fields validateWallInput checks (which
 * parseWallCaseFile runs): every layer's vapour data, found up front (a missing μ here, not halfway).
 */
export function requireWallVapourData(input: WallInput): void {
  wallVapourLayers(input, buildThermalStack(input));
}

/** Validates `input`, then analyses it; `text` writes the figures of the checks' reasons and of the warnings in the project's units (default SI). */
export function analyseWall(input: WallInput, text: QuantityText = SI_TEXT): WallAnalysis {
  validateWallInput(input);
  return analyseValidatedWall(input, text);
}

/**
 * The analysis of an input that has passed validateWallInput and requireWallVapourData already:
 * the wall kind's parse validates the whole case, so its solve does not check every field again.
 */
export function analyseValidatedWall(input: WallInput, text: QuantityText): WallAnalysis {
  const stack = buildThermalStack(input);
  const vapour = wallVapourLayers(input, stack);
  const humidity = input.moisture?.insideHumidity;
  const climate = input.moisture?.climate;

  // The design condition: the ISO 6946 result and the design interstitial check.
  const design = solveSteady(wallEngineProblem(stack, input.inside.temperature, input.outside.temperature));
  const states = wallStateSolver(stack, { inside: input.inside.temperature, outside: input.outside.temperature, steady: design });
  const stackAt = (inside: number, outside: number) => vapourStackAt(vapour.layers, vapour.pointNames, states.at(inside, outside));
  const interstitialDesign = checkInterstitialAtDesignCondition(stackAt(input.inside.temperature, input.outside.temperature), input.inside, input.outside, humidity, {}, text);
  const interstitialMonthly = climate
    ? checkInterstitialMonthly(
        climate,
        climate.months.map((m) => stackAt(m.inside.temperature, m.outside.temperature)),
        humidity,
        {},
        text,
      )
    : null;

  // Mould and inside-surface condensation: find each criterion's design condition, then solve only those.
  const conditions = surfaceHumidityConditions(
    climate ? climate.months.map((m) => ({ label: m.month, inside: m.inside, outside: m.outside })) : [{ label: 'design condition', inside: input.inside, outside: input.outside }],
    humidity,
  );
  const designIndices = mouldDesignIndices(conditions);
  const mouldStates = wallStateSolver(buildThermalStack(input, { insideSurfaceResistance: MOULD_CHECK_INSIDE_SURFACE_RESISTANCE }));
  const surfaceAt = (index: number | null) => {
    if (index === null) return null;
    const c = conditions[index]!;
    return mouldStates.at(c.inside.temperature, c.outside.temperature)[0]!;
  };
  const mould = assessMould(
    conditions,
    designIndices,
    { mould: surfaceAt(designIndices.mould), condensation: surfaceAt(designIndices.condensation) },
    MOULD_CHECK_INSIDE_SURFACE_RESISTANCE,
    humidity,
    text,
  );

  const checks = [mould.mould, mould.surfaceCondensation, interstitialDesign.check, ...(interstitialMonthly ? [interstitialMonthly.check] : [])];
  const wall = wallResultOf(input, stack, design);
  const targetU = input.targetU ? targetUSeries(input, input.targetU) : null;
  return {
    wall,
    mould,
    interstitialDesign,
    interstitialMonthly,
    checks,
    solves: 1 + states.solves() + mouldStates.solves() + (targetU?.solves ?? 0),
    warnings: [...wallConductivityWarnings(input, wall, text), ...bridgingWarnings(input, wall, text)],
    targetU,
  };
}

/** Each material layer's λ(θ) against its table's points and its service range, at the design condition. */
function wallConductivityWarnings(input: WallInput, wall: WallResult, text: QuantityText): string[] {
  return conductivityUseWarnings(
    wall.layers.flatMap((l) => {
      const layer = input.layers[l.index]!;
      if (isAirLayer(layer) || l.innerTemperature === null || l.outerTemperature === null) return [];
      return [
        {
          name: l.name,
          conductivity: layer.material.conductivity,
          lowest: Math.min(l.innerTemperature, l.outerTemperature),
          highest: Math.max(l.innerTemperature, l.outerTemperature),
          minServiceTemperature: layer.material.minServiceTemperature ?? null,
          maxServiceTemperature: layer.material.maxServiceTemperature ?? null,
        },
      ];
    }),
    text,
  );
}
