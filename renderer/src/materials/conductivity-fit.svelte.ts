/**
 * State of the "fit λ(θ) from data-sheet points" panel in the material editor: the rows of points,
 * the degree, and the last answer from the `materials:fit-conductivity` channel (a fitted curve or
 * the one sentence that refused it). The least-squares fit and its refusals live in the service;
 * this only reads the boxes, calls it, and remembers which inputs an answer belongs to, so an
 * answer is never shown beside points it was not fitted to.
 */
import type { ConductivityFit } from '../../../app/api/contract.js';
import { laminaApi, messageOf } from '../bridge/lamina-api.js';
import { roundCoefficients } from './fit-display.js';
import type { MaterialDraft } from './material-draft.js';
import { MAX_FIT_ROWS, cellsFromPaste, readFitRows, readServiceRange, rowsFromTableText, type FitColumn, type FitProblem, type FitRow } from './fit-points.js';

export type FitDegree = 1 | 2 | 3;

export type FitOutcome =
  | {
      readonly kind: 'fitted';
      /** The inputs this answer belongs to (see `inputsKey`). */
      readonly key: string;
      readonly points: readonly [number, number][];
      readonly low: number;
      readonly high: number;
      readonly fit: ConductivityFit;
      /** The coefficients as shown and as copied into the form (see fit-display.ts). */
      readonly coefficients: readonly number[];
    }
  | { readonly kind: 'refused'; readonly key: string; readonly problem: FitProblem };

const blankRow = (): FitRow => ({ temperature: '', conductivity: '' });

export class ConductivityFitPanel {
  rows = $state<FitRow[]>([]);
  degree = $state<FitDegree>(2);
  outcome = $state<FitOutcome | undefined>(undefined);
  busy = $state(false);
  /** Set when a paste was longer than the table may be. */
  pasteNote = $state<string | undefined>(undefined);
  /** The inputs whose curve was last copied into the form. */
  private usedKey = $state<string | undefined>(undefined);
  private readonly draft: MaterialDraft;

  readonly range = $derived.by(() => readServiceRange(this.draft.minServiceTemperature, this.draft.maxServiceTemperature));
  /** Everything a fit depends on: the rows as typed, the degree and the service range. */
  readonly inputsKey = $derived.by(() =>
    JSON.stringify([this.rows, this.degree, this.draft.minServiceTemperature, this.draft.maxServiceTemperature]),
  );
  /** The last answer, only while the inputs are still the ones it answered. */
  readonly current = $derived(this.outcome?.key === this.inputsKey ? this.outcome : undefined);
  readonly stale = $derived(this.outcome !== undefined && this.current === undefined);
  readonly used = $derived(this.usedKey === this.inputsKey && this.current?.kind === 'fitted');

  /** Starts from the material's own table of points when it has one (a data sheet already typed in). */
  constructor(draft: MaterialDraft) {
    this.draft = draft;
    const fromTable = draft.conductivityKind === 'table' ? rowsFromTableText(draft.points) : [];
    this.rows = fromTable.length > 0 ? fromTable : [blankRow(), blankRow(), blankRow()];
  }

  /** The cell a refusal names, for aria-invalid. */
  isInvalid(row: number, column: FitColumn): boolean {
    const current = this.current;
    return current?.kind === 'refused' && current.problem.row === row && current.problem.column === column;
  }

  addRow(): void {
    if (this.rows.length < MAX_FIT_ROWS) this.rows.push(blankRow());
  }

  /** The last row is cleared rather than removed, so the table never vanishes. */
  removeRow(index: number): void {
    if (this.rows.length > 1) this.rows.splice(index, 1);
    else this.rows[0] = blankRow();
  }

  /**
   * Lines pasted into a cell fill the table downward from that row, adding rows as needed: two
   * values on a line fill both columns, one value fills the column pasted into. Returns false for
   * a single value, which the cell takes as typed.
   */
  paste(rowIndex: number, column: FitColumn, text: string): boolean {
    const lines = cellsFromPaste(text);
    if (!lines) return false;
    const room = MAX_FIT_ROWS - rowIndex;
    const kept = lines.slice(0, room);
    this.pasteNote = kept.length < lines.length
      ? `Only the first ${kept.length} pasted lines were kept: a fit takes at most ${MAX_FIT_ROWS} points.`
      : undefined;
    kept.forEach((cells, k) => {
      const index = rowIndex + k;
      while (this.rows.length <= index) this.rows.push(blankRow());
      const row = this.rows[index]!;
      if (cells.length >= 2) {
        row.temperature = cells[0]!;
        row.conductivity = cells[1]!;
      } else {
        row[column] = cells[0]!;
      }
    });
    return true;
  }

  async fit(): Promise<void> {
    const key = this.inputsKey;
    const refuse = (problem: FitProblem) => {
      this.outcome = { kind: 'refused', key, problem };
    };
    const reading = readFitRows(this.rows);
    if (!reading.ok) return refuse(reading);
    const range = this.range;
    if (!range.ok) return refuse({ message: range.message });
    this.busy = true;
    try {
      const fit = await laminaApi().materials.fitConductivity({
        points: reading.points, degree: this.degree, minServiceTemperature: range.low, maxServiceTemperature: range.high,
      });
      this.outcome = {
        kind: 'fitted', key, points: reading.points, low: range.low, high: range.high, fit,
        coefficients: roundCoefficients(fit.model.coefficients),
      };
    } catch (error) {
      refuse({ message: messageOf(error) });
    } finally {
      this.busy = false;
    }
  }

  /** The fitted coefficients as the form's coefficient box writes them ("a0 a1 a2"); marks them used. */
  takeCurve(): string | undefined {
    const current = this.current;
    if (current?.kind !== 'fitted') return undefined;
    this.usedKey = this.inputsKey;
    return current.coefficients.map(String).join(' ');
  }
}
