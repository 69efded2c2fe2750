/**
 * What a view may add to a report table without changing how the report itself shows it: a row
 * marked (shaded and bold, as the case editor marks the chosen thickness) and a failing cell
 * explained (hover text and a screen-reader sentence after its text). A table given no marks
 * draws exactly as the report draws it.
 */
export interface RowMarks {
  /** The row the view stands on: shaded and bold. */
  readonly marked: boolean;
  /** The row's data-testid, for the end-to-end tests. */
  readonly testId?: string;
  /** Per column: why that cell fails, in the engine's words; undefined where it does not fail. */
  readonly failures: readonly (string | undefined)[];
}

export interface TableMarks {
  /** The table's data-testid, for the end-to-end tests. */
  readonly testId?: string;
  /** Per body row, in order; a row beyond the list is unmarked. */
  readonly rows: readonly RowMarks[];
}
