/**
 * The insulation thickness for a target U-value: the wall is solved once for each thickness of
 * the series (the named layer alone changes; bridges in it keep their fractions and take the new
 * depth), each with the same ISO 6946 method as the case itself (the combined method when the
 * element is bridged, the Annex F corrections), and the thinnest thickness whose corrected U is at
 * or below the target is chosen. The unrounded U is compared, so a U that rounds to the target
 * but lies above it does not meet it (our choice: the safe side).
 */
import { solveSteady } from '../../fe/steady-solve.js';
import { wallResultOf } from './wall-calculation.js';
import { wallEngineProblem } from './wall-engine-problem.js';
import type { WallInput, WallTargetU } from './wall-input.js';
import { buildThermalStack } from './wall-thermal-stack.js';

export interface TargetURow {
  /** m */
  readonly thickness: number;
  /** U = 1/R_T, W/(m²·K) */
  readonly uValue: number;
  /** U with the Annex F corrections, W/(m²·K): the value compared with the target. */
  readonly correctedUValue: number;
  readonly meetsTarget: boolean;
}

export interface TargetUResult {
  readonly layerIndex: number;
  readonly layerName: string;
  /** W/(m²·K) */
  readonly target: number;
  /** The thickness the case itself gives the layer, m. */
  readonly givenThickness: number;
  /** Rising thickness. */
  readonly rows: readonly TargetURow[];
  /** The thinnest row that meets the target; null when none does. */
  readonly chosen: TargetURow | null;
  /** When no row meets the target: by how much the thickest row's corrected U exceeds it, W/(m²·K). */
  readonly shortfall: number | null;
  /** Engine solves the series took (one per thickness). */
  readonly solves: number;
}

/** U across the series and the thinnest thickness that reaches the target; `input` validated. */
export function targetUSeries(input: WallInput, target: WallTargetU): TargetUResult {
  const thicknesses = [...new Set(target.thicknesses)].sort((a, b) => a - b);
  const rows = thicknesses.map((thickness): TargetURow => {
    const varied: WallInput = { ...input, layers: input.layers.map((l, i) => (i === target.layer ? { ...l, thickness } : l)) };
    const stack = buildThermalStack(varied);
    const steady = solveSteady(wallEngineProblem(stack, varied.inside.temperature, varied.outside.temperature));
    const wall = wallResultOf(varied, stack, steady);
    return { thickness, uValue: wall.uValue, correctedUValue: wall.correctedUValue, meetsTarget: wall.correctedUValue <= target.value };
  });
  const chosen = rows.find((r) => r.meetsTarget) ?? null;
  const thickest = rows[rows.length - 1]!;
  const layer = buildThermalStack(input).layers[target.layer]!;
  return {
    layerIndex: target.layer,
    layerName: layer.name,
    target: target.value,
    givenThickness: input.layers[target.layer]!.thickness,
    rows,
    chosen,
    shortfall: chosen ? null : thickest.correctedUValue - target.value,
    solves: rows.length,
  };
}
