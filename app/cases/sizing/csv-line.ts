/**
 * The fields of one line of a data table in CSV, as a spreadsheet saves it: fields may be quoted
 * with double quotes (so a source may hold commas) and a quote inside a quoted field is doubled.
 * A record is one line: the engine's own tables never break a field across lines, so a quote left
 * open at the end of a line is a mistake to report, not a field to continue. Pure, for the engine
 * (main/storage/csv.ts reads whole files for the Node side and may not be imported here).
 */

/** The fields, or the problem and the 1-based column where it starts. */
export type CsvLineFields = { readonly fields: readonly string[] } | { readonly problem: string; readonly column: number };

export function csvLineFields(line: string): CsvLineFields {
  const fields: string[] = [];
  let field = '';
  let quoted = false;
  let wasQuoted = false;
  for (let i = 0; i < line.length; i++) {
    const c = line[i]!;
    if (quoted) {
      if (c !== '"') field += c;
      else if (line[i + 1] === '"') {
        field += '"';
        i++;
      } else quoted = false;
      continue;
    }
    if (c === ',') {
      fields.push(field);
      field = '';
      wasQuoted = false;
    } else if (c === '"') {
      if (field.trim() !== '' || wasQuoted) return { problem: 'has a quote inside an unquoted field', column: fields.length + 1 };
      field = '';
      quoted = true;
      wasQuoted = true;
    } else if (wasQuoted) {
      if (c.trim() !== '') return { problem: 'has text after a closing quote', column: fields.length + 1 };
    } else field += c;
  }
  if (quoted) return { problem: 'has a quoted field that is not closed on its line', column: fields.length + 1 };
  fields.push(field);
  return { fields };
}
