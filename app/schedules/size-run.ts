/**
 * One run of the schedule sized: its pipe case sized by solveCase over the insulation's series
 * (or checked at its fixed thickness), then solved once at the thickness chosen, for the checks,
 * the heat loss and the energy balance at that thickness, and once bare, for the bill's "without
 * insulation" figures. A run that cannot be sized says why in one sentence; a run whose criteria
 * no thickness meets is solved at the thickest option and flagged with the shortfall.
 */
import type { CaseContext } from '../cases/case-kind.js';
import type { PipeResult } from '../cases/pipe/pipe-calculation.js';
import { solveCase } from '../cases/solve-case.js';
import { thicknessesFor } from '../cases/sizing/thickness-series.js';
import type { SizingCriterionName } from '../cases/sizing/sizing-model.js';
import type { CheckVerdict } from '../checks/check-result.js';
import type { ScheduleRun, ScheduleSettings } from './schedule-model.js';
import { asRunProblem, bareRunCase, runCase, serviceRuleOf, type MaterialIdOf } from './schedule-run-case.js';

export interface RunVerdict {
  readonly check: string;
  readonly verdict: CheckVerdict;
}

export type SizedRun =
  | {
      readonly reference: string;
      readonly ok: true;
      /** m: the thickness chosen, the fixed one, or (none meeting) the thickest option. */
      readonly thickness: number;
      /** How the thickness came about. */
      readonly basis: 'chosen' | 'fixed' | 'none-meets';
      /** The criterion that decided a chosen thickness; null for a fixed one or when none meets. */
      readonly governing: SizingCriterionName | null;
      /** One sentence: why this thickness, or what fails and by how much. */
      readonly reason: string;
      /** Whether every criterion of the service is met at the thickness. */
      readonly criteriaMet: boolean;
      readonly material: string;
      /** m, pipe outside diameter, and over the insulation. */
      readonly pipeOuterDiameter: number;
      readonly insulatedOuterDiameter: number;
      /** W/m (positive = lost) and W for the run, at the thickness and bare. */
      readonly heatLossPerMetre: number;
      readonly heatLoss: number;
      readonly bareHeatLoss: number;
      /** kWh/a, at the thickness and bare. */
      readonly annualEnergy: number;
      readonly bareAnnualEnergy: number;
      /** °C */
      readonly surfaceTemperature: number;
      readonly verdicts: readonly RunVerdict[];
      /** Relative residual of the energy balance of the solve at the thickness. */
      readonly relativeResidual: number;
    }
  | { readonly reference: string; readonly ok: false; readonly column: string; readonly reason: string };

export function sizeRun(run: ScheduleRun, settings: ScheduleSettings, materialIdOf: MaterialIdOf, context: CaseContext): SizedRun {
  try {
    const rule = serviceRuleOf(run, settings);
    const materialName = run.material ?? rule.material;
    // The case's own row of the table is one of the series (its thinnest), so the series alone is tried.
    const start = run.thickness ?? thicknessesFor(context.thicknessSeries ?? new Map(), materialName)[0] ?? 0.02;
    const sizing = solveCase(runCase(run, settings, materialIdOf, { thickness: start }), context).sizing!;
    const choice = sizing.choice;
    const thickness = choice.kind === 'chosen' ? choice.thickness : sizing.rows[sizing.rows.length - 1]!.thickness;
    const at = solveCase(runCase(run, settings, materialIdOf, { thickness, withoutSizing: true }), context);
    const bare = solveCase(bareRunCase(run, settings, materialIdOf), context);
    const result = at.result as PipeResult;
    const bareResult = bare.result as PipeResult;
    return {
      reference: run.reference,
      ok: true,
      thickness,
      basis: run.thickness !== null ? 'fixed' : choice.kind === 'chosen' ? 'chosen' : 'none-meets',
      governing: run.thickness === null && choice.kind === 'chosen' ? choice.governing : null,
      reason: choice.reason,
      criteriaMet: choice.kind === 'chosen',
      material: sizing.material,
      pipeOuterDiameter: (at.input as { pipe: { outerDiameter: number } }).pipe.outerDiameter,
      insulatedOuterDiameter: result.outerDiameter,
      heatLossPerMetre: result.heatLossPerMetre,
      heatLoss: result.heatLoss,
      bareHeatLoss: bareResult.heatLoss,
      annualEnergy: result.annualEnergy,
      bareAnnualEnergy: bareResult.annualEnergy,
      surfaceTemperature: result.surfaceTemperature,
      verdicts: at.checks.map((c) => ({ check: c.title, verdict: c.verdict })),
      relativeResidual: result.energyBalance.relativeResidual,
    };
  } catch (error) {
    const problem = asRunProblem(error);
    if (problem === null) throw error;
    return { reference: run.reference, ok: false, column: problem.column, reason: problem.message };
  }
}
