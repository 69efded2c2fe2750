/**
 * Comma-separated values as RFC 4180 writes them: fields may be quoted with double quotes, a quote
 * inside a quoted field is doubled, and quoted fields may hold commas and line breaks. Each record
 * keeps the line number it starts on so that import errors can point at it.
 */
export interface CsvRecord {
  readonly line: number;
  readonly fields: readonly string[];
}

export class CsvSyntaxError extends Error {
  readonly line: number;
  constructor(line: number, message: string) {
    super(`line ${line}: ${message}`);
    this.name = 'CsvSyntaxError';
    this.line = line;
  }
}

export function parseCsv(text: string): CsvRecord[] {
  const source = text.startsWith('\uFEFF') ? text.slice(1) : text;
  const records: CsvRecord[] = [];
  let fields: string[] = [];
  let field = '';
  let line = 1;
  let recordLine = 1;
  let quoted = false;
  let fieldStarted = false;
  const endRecord = () => {
    fields.push(field);
    if (!(fields.length === 1 && fields[0] === '' && !fieldStarted)) records.push({ line: recordLine, fields });
    fields = [];
    field = '';
    fieldStarted = false;
  };
  for (let i = 0; i < source.length; i++) {
    const c = source[i]!;
    if (quoted) {
      if (c === '"') {
        if (source[i + 1] === '"') {
          field += '"';
          i++;
        } else quoted = false;
      } else {
        if (c === '\n') line++;
        field += c;
      }
      continue;
    }
    if (c === '"') {
      if (field !== '') throw new CsvSyntaxError(line, 'a quote may only open a field');
      quoted = true;
      fieldStarted = true;
    } else if (c === ',') {
      fields.push(field);
      field = '';
      fieldStarted = true;
    } else if (c === '\r' && source[i + 1] === '\n') {
      continue;
    } else if (c === '\n' || c === '\r') {
      endRecord();
      line++;
      recordLine = line;
    } else {
      field += c;
      fieldStarted = true;
    }
  }
  if (quoted) throw new CsvSyntaxError(recordLine, 'a quoted field is not closed');
  if (field !== '' || fields.length > 0 || fieldStarted) endRecord();
  return records;
}

function quoteField(value: string): string {
  return /[",\r\n]/.test(value) || /^\s|\s$/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

export function formatCsv(rows: readonly (readonly string[])[]): string {
  return rows.map((row) => row.map(quoteField).join(',')).join('\n') + '\n';
}
