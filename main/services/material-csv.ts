import type { ConductivityModel } from '../../app/fe/conductivity.js';
import type { CsvProblem } from '../../app/api/material-types.js';
import { formatCsv, parseCsv, CsvSyntaxError } from '../storage/csv.js';
import type { Material, MaterialInput } from './material-types.js';
import { validateMaterialInput } from './material-validation.js';
import { shownValue } from '../../app/base/shown-value.js';
import { InputError } from '../../app/index.js';
import { MATERIAL_CSV_HEADER } from '../../app/api/material-csv-header.js';

/**
 * The materials CSV format (seed files in data/materials and user import/export).
 *
 * Header row, exactly these columns in this order (MATERIAL_CSV_HEADER, in app/api so the renderer
 * can show it); the unit of each column is part of its name and values are SI:
 *   name, category, conductivity [W/(m.K)], density [kg/m3], specific heat [J/(kg.K)], mu [-],
 *   sd [m], emissivity [-], min service temperature [C], max service temperature [C], source, notes
 * The conductivity cell is one of
 *   0.035                          constant
 *   poly 0.0337 1.1e-4 1.7e-7      polynomial a0 a1 a2 ... in θ (°C)
 *   table 10:0.035 50:0.040        points θ(°C):λ, straight lines between, constant beyond the ends
 * mu may be `inf` for a vapour-tight material. An empty cell means "not given". A point is the
 * decimal separator.
 */
export { MATERIAL_CSV_HEADER };

export type { CsvProblem };

export interface ParsedMaterialRow {
  readonly line: number;
  readonly input: MaterialInput;
}

/** A cell as a message repeats it: quoted, and cut to a readable length (a bad header can be megabytes). */
const quotedCell = (text: string): string => shownValue(text);

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

function parseNumberCell(cell: string, column: string): number | null {
  const text = cell.trim();
  if (text === '') return null;
  if (/^[+-]?\d+,\d+$/.test(text)) throw new InputError(column, `${column} ${quotedCell(text)} uses a comma; write decimals with a point.`);
  if (!NUMBER.test(text)) throw new InputError(column, `${column} ${quotedCell(text)} is not a number.`);
  return Number(text);
}

function parseConductivityCell(cell: string): ConductivityModel {
  const column = MATERIAL_CSV_HEADER[2];
  const text = cell.trim();
  if (text === '') throw new InputError('conductivity', `${column} is required.`);
  const [head, ...rest] = text.split(/\s+/);
  if (head === 'poly') {
    return { kind: 'polynomial', coefficients: rest.map((c) => parseNumberCell(c, `${column} coefficient`) ?? NaN) };
  }
  if (head === 'table') {
    return {
      kind: 'table',
      points: rest.map((pair) => {
        const parts = pair.split(':');
        if (parts.length !== 2) throw new InputError('conductivity', `${column} table point ${quotedCell(pair)} must be written temperature:conductivity.`);
        return [parseNumberCell(parts[0]!, `${column} temperature`) ?? NaN, parseNumberCell(parts[1]!, column) ?? NaN] as [number, number];
      }),
    };
  }
  if (rest.length > 0) throw new InputError('conductivity', `${column} ${quotedCell(text)} must be a number, "poly a0 a1 ..." or "table t:λ t:λ ...".`);
  return { kind: 'constant', value: parseNumberCell(text, column) ?? NaN };
}

function checkHeader(fields: readonly string[]): string | undefined {
  const normalise = (s: string) => s.trim().toLowerCase().replace(/°/g, '').replace(/\s+/g, ' ');
  for (let i = 0; i < MATERIAL_CSV_HEADER.length; i++) {
    const expected = MATERIAL_CSV_HEADER[i]!;
    const found = fields[i];
    if (found === undefined) return `the header is missing column ${i + 1}, "${expected}".`;
    if (normalise(found) !== normalise(expected)) {
      return `column ${i + 1} of the header must be "${expected}" (values in the unit named in brackets), found ${quotedCell(found.trim())}.`;
    }
  }
  if (fields.length > MATERIAL_CSV_HEADER.length) return `the header has ${fields.length} columns; expected ${MATERIAL_CSV_HEADER.length}.`;
  return undefined;
}

/**
 * Parses and validates every row. Returns all problems (never stops at the first) so that a user
 * can fix the whole file in one go; `rows` is meaningful only when `problems` is empty.
 */
export function parseMaterialsCsv(text: string): { rows: ParsedMaterialRow[]; problems: CsvProblem[] } {
  let records;
  try {
    records = parseCsv(text);
  } catch (error) {
    if (error instanceof CsvSyntaxError) return { rows: [], problems: [{ line: error.line, message: error.message.replace(/^line \d+: /, '') }] };
    throw error;
  }
  const [header, ...body] = records;
  if (!header) return { rows: [], problems: [{ line: 1, message: 'the file is empty; expected a header row.' }] };
  const headerProblem = checkHeader(header.fields);
  if (headerProblem) return { rows: [], problems: [{ line: header.line, message: headerProblem }] };
  if (body.length === 0) return { rows: [], problems: [{ line: header.line, message: 'the file has a header but no materials.' }] };

  const rows: ParsedMaterialRow[] = [];
  const problems: CsvProblem[] = [];
  const firstLineOfName = new Map<string, number>();
  for (const record of body) {
    if (record.fields.length !== MATERIAL_CSV_HEADER.length) {
      problems.push({ line: record.line, message: `expected ${MATERIAL_CSV_HEADER.length} columns, found ${record.fields.length}.` });
      continue;
    }
    try {
      const f = record.fields;
      const mu = f[5]!.trim().toLowerCase() === 'inf' ? Infinity : parseNumberCell(f[5]!, MATERIAL_CSV_HEADER[5]);
      const input = validateMaterialInput({
        name: f[0],
        category: f[1]!.trim(),
        conductivity: parseConductivityCell(f[2]!),
        density: parseNumberCell(f[3]!, MATERIAL_CSV_HEADER[3]),
        specificHeat: parseNumberCell(f[4]!, MATERIAL_CSV_HEADER[4]),
        vapourResistanceFactor: mu,
        equivalentAirLayerThickness: parseNumberCell(f[6]!, MATERIAL_CSV_HEADER[6]),
        emissivity: parseNumberCell(f[7]!, MATERIAL_CSV_HEADER[7]),
        minServiceTemperature: parseNumberCell(f[8]!, MATERIAL_CSV_HEADER[8]),
        maxServiceTemperature: parseNumberCell(f[9]!, MATERIAL_CSV_HEADER[9]),
        source: f[10],
        notes: f[11],
      });
      const key = input.name.toLowerCase();
      const earlier = firstLineOfName.get(key);
      if (earlier !== undefined) {
        problems.push({ line: record.line, message: `name ${quotedCell(input.name)} repeats the material on line ${earlier}.` });
        continue;
      }
      firstLineOfName.set(key, record.line);
      rows.push({ line: record.line, input });
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      problems.push({ line: record.line, message: inColumnTerms(error) });
    }
  }
  return { rows, problems };
}

/** The CSV column each material field is read from. */
const COLUMN_OF_FIELD: Record<string, string> = {
  name: MATERIAL_CSV_HEADER[0],
  category: MATERIAL_CSV_HEADER[1],
  conductivity: MATERIAL_CSV_HEADER[2],
  density: MATERIAL_CSV_HEADER[3],
  specificHeat: MATERIAL_CSV_HEADER[4],
  vapourResistanceFactor: MATERIAL_CSV_HEADER[5],
  equivalentAirLayerThickness: MATERIAL_CSV_HEADER[6],
  emissivity: MATERIAL_CSV_HEADER[7],
  minServiceTemperature: MATERIAL_CSV_HEADER[8],
  maxServiceTemperature: MATERIAL_CSV_HEADER[9],
  source: MATERIAL_CSV_HEADER[10],
  notes: MATERIAL_CSV_HEADER[11],
};

/**
 * A validation message names the material's field (e.g. "conductivity.value must be …"); a person
 * importing a file knows its columns, so the field at the start is replaced by the column's header.
 */
function inColumnTerms(error: InputError): string {
  const field = error.field ?? '';
  const root = field.split(/[.[]/, 1)[0]!;
  const column = COLUMN_OF_FIELD[root];
  if (!column || !error.message.startsWith(field) || field === column) return error.message;
  return `column "${column}"${error.message.slice(field.length)}`;
}

function formatNumber(value: number | null): string {
  if (value === null) return '';
  if (value === Infinity) return 'inf';
  return String(value);
}

function formatConductivity(model: ConductivityModel): string {
  switch (model.kind) {
    case 'constant':
      return String(model.value);
    case 'polynomial':
      return ['poly', ...model.coefficients.map(String)].join(' ');
    case 'table':
      return ['table', ...model.points.map(([t, k]) => `${t}:${k}`)].join(' ');
  }
}

export function formatMaterialsCsv(materials: readonly (Material | MaterialInput)[]): string {
  return formatCsv([
    [...MATERIAL_CSV_HEADER],
    ...materials.map((m) => [
      m.name, m.category, formatConductivity(m.conductivity), formatNumber(m.density), formatNumber(m.specificHeat),
      formatNumber(m.vapourResistanceFactor), formatNumber(m.equivalentAirLayerThickness), formatNumber(m.emissivity),
      formatNumber(m.minServiceTemperature), formatNumber(m.maxServiceTemperature), m.source, m.notes,
    ]),
  ]);
}
