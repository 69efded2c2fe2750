/**
 * One case as its row in the list reads it: the key figure (heat loss or U-value), the surface
 * temperature the report names first, and each check's verdict, from the report model of `solveCase`, or the sentence that says why it cannot be calculated. Solving is
 * cheap but not free, so each outcome is kept for the exact inputs and units it was solved from:
 * a rename or a move reuses it; new inputs, or the project switched to other units (the labels
 * read in them: "Heat loss per foot"), are solved again.
 */
import type { ProjectCase, UnitSystem } from '../../../app/api/contract.js';
import { solveCase, type CaseContext, type ReportFigure, type ReportVerdict } from '../../../app/index.js';
import { messageOf } from '../bridge/lamina-api.js';

export type CaseOutcome =
  | {
      readonly ok: true;
      readonly keyFigure: ReportFigure | undefined;
      readonly temperature: ReportFigure | undefined;
      readonly verdicts: readonly ReportVerdict[];
    }
  | { readonly ok: false; readonly message: string };

export function solveForList(inputs: unknown, context: CaseContext): CaseOutcome {
  try {
    const { report } = solveCase(inputs, context);
    const temperature = report.keyFigures.find((figure) => figure.quantity === 'temperature');
    return { ok: true, keyFigure: report.keyFigures[0], temperature, verdicts: report.verdicts };
  } catch (error) {
    return { ok: false, message: messageOf(error) };
  }
}

/** Kept outcomes at most: far more than a project holds, so only edits made long ago are dropped. */
const KEPT = 500;

/** Outcomes by the unit system and the JSON text of the inputs they were solved from. */
export class CaseOutcomes {
  private readonly solved = new Map<string, CaseOutcome>();

  constructor(private readonly context: CaseContext) {}

  of(projectCase: ProjectCase, unitSystem: UnitSystem): CaseOutcome {
    const key = `${unitSystem} ${JSON.stringify(projectCase.inputs)}`;
    let outcome = this.solved.get(key);
    if (!outcome) {
      outcome = solveForList(projectCase.inputs, { ...this.context, unitSystem });
      if (this.solved.size >= KEPT) this.solved.clear();
      this.solved.set(key, outcome);
    }
    return outcome;
  }
}
