/**
 * What the sizing panel adds to the tables of the report's sizing section (app/cases/sizing/
 * sizing-report), which it shows through the report's own table component: the chosen row marked,
 * and each cell of a criterion a thickness fails explained by the engine's sentence of what was
 * required and what the thickness gives (hover text and screen-reader text). The figures and
 * their words are the report's; nothing here writes a number.
 */
import type { ReportTable } from '../../../app/report/report-model.js';
import type { SizingCriterionName, SizingResult, SizingRow } from '../../../app/cases/sizing/sizing-model.js';
import { CRITERION_NAMES, criteriaOf, sameThickness } from '../../../app/cases/sizing/sizing-words.js';
import type { RowMarks, TableMarks } from '../report-view/table-marks.js';

export const SIZING_TABLE_ID = 'sizing-table';
export const CHOSEN_ROW_ID = 'sizing-chosen-row';
export const ROW_ID = 'sizing-row';

/** The marks of one table of the sizing section: its rows are the result's rows, each led by its thickness. */
export function sizingMarks(table: ReportTable, result: SizingResult): TableMarks {
  // A criterion's column is headed by its name, as the report heads it.
  const criterionOfColumn = table.columns.map((c): SizingCriterionName | undefined => criteriaOf(result).find((name) => capitalise(CRITERION_NAMES[name]) === c.label));
  const chosen = result.choice.kind === 'chosen' ? result.choice.thickness : null;
  return {
    testId: SIZING_TABLE_ID,
    rows: table.rows.map((cells): RowMarks => {
      const lead = cells[0];
      const thickness = lead !== undefined && typeof lead !== 'string' ? lead.value : null;
      const row: SizingRow | undefined = thickness === null ? undefined : result.rows.find((r) => sameThickness(r.thickness, thickness));
      const marked = row !== undefined && chosen !== null && sameThickness(row.thickness, chosen);
      return {
        marked,
        testId: marked ? CHOSEN_ROW_ID : ROW_ID,
        failures: criterionOfColumn.map((criterion) => {
          const outcome = criterion === undefined ? undefined : row?.outcomes.find((o) => o.criterion === criterion);
          return outcome !== undefined && !outcome.met ? outcome.reason : undefined;
        }),
      };
    }),
  };
}

function capitalise(words: string): string {
  return words.charAt(0).toUpperCase() + words.slice(1);
}
