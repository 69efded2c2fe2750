/**
 * Pipe and tube sizes from the tables in data/pipe-sizes/*.csv, for case files that name a size
 * instead of giving the outside diameter and wall. Read at the edge (command line, server); the
 * engine only ever sees metres. Values in the tables carry their source; most say "from memory".
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { InputError } from '../../app/fe/errors.js';
import { parseCsv } from '../storage/csv.js';

export const PIPE_SIZE_SERIES = ['steel-iso', 'steel-asme', 'copper-en1057', 'copper-astm-b88', 'plastic-metric'] as const;
export type PipeSizeSeries = (typeof PIPE_SIZE_SERIES)[number];

export interface PipeSize {
  readonly series: PipeSizeSeries;
  /** As written in the case file: "DN100" / "100" for steel-iso, "4" or "1 1/4" for inch series, OD in mm for the metric tube series. */
  readonly nominal: string;
  /** m */
  readonly outerDiameter: number;
  /** m; null where the table gives no wall (copper and plastic tubes come in several walls). */
  readonly wallThickness: number | null;
  readonly source: string;
}

const DATA = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..', 'data', 'pipe-sizes');

function table(file: string): Record<string, string>[] {
  const [header, ...rows] = parseCsv(readFileSync(path.join(DATA, file), 'utf8')).filter((r) => r.fields.some((f) => f.trim() !== ''));
  return rows.map((r) => Object.fromEntries(header!.fields.map((h, i) => [h, (r.fields[i] ?? '').trim()])));
}

const mm = (text: string | undefined): number | null => (text ? Number(text) / 1000 : null);

let catalogue: PipeSize[] | undefined;

/** Every size in every series, read once from data/pipe-sizes. */
export function pipeSizeCatalogue(): readonly PipeSize[] {
  if (catalogue) return catalogue;
  const sizes: PipeSize[] = [];
  for (const row of table('steel.csv')) {
    sizes.push({ series: 'steel-iso', nominal: `DN${row['DN']}`, outerDiameter: mm(row['OD ISO 4200 / EN 10220 [mm]'])!, wallThickness: mm(row['wall EN 10255 medium [mm]']), source: row['source']! });
    if (row['NPS [in]'] && row['OD ASME B36.10M [mm]']) {
      sizes.push({ series: 'steel-asme', nominal: row['NPS [in]'], outerDiameter: mm(row['OD ASME B36.10M [mm]'])!, wallThickness: mm(row['wall ASME Sch 40 [mm]']), source: row['source']! });
    }
  }
  for (const row of table('copper-en1057.csv')) sizes.push({ series: 'copper-en1057', nominal: row['OD [mm]']!, outerDiameter: mm(row['OD [mm]'])!, wallThickness: null, source: row['source']! });
  for (const row of table('copper-astm-b88.csv')) sizes.push({ series: 'copper-astm-b88', nominal: row['nominal size [in]']!, outerDiameter: mm(row['OD [mm]'])!, wallThickness: null, source: row['source']! });
  for (const row of table('plastic-metric.csv')) sizes.push({ series: 'plastic-metric', nominal: row['OD [mm]']!, outerDiameter: mm(row['OD [mm]'])!, wallThickness: null, source: row['source']! });
  catalogue = sizes;
  return sizes;
}

function normalise(series: PipeSizeSeries, nominal: string): string {
  const n = nominal.trim().replace(/\s+/g, ' ');
  if (series === 'steel-iso') return /^dn/i.test(n) ? `DN${n.slice(2).trim()}` : `DN${n}`;
  return n;
}

/** The size a case file names, or an InputError naming the field. */
export function findPipeSize(series: unknown, nominal: unknown, field: string): PipeSize {
  if (typeof series !== 'string' || !(PIPE_SIZE_SERIES as readonly string[]).includes(series)) {
    throw new InputError(`${field}.series`, `${field}.series must be one of ${PIPE_SIZE_SERIES.join(', ')}; got ${JSON.stringify(series)}.`);
  }
  if (typeof nominal !== 'string' && typeof nominal !== 'number') {
    throw new InputError(`${field}.nominal`, `${field}.nominal must be a size such as "DN100", "4", "1 1/4" or "108".`);
  }
  const s = series as PipeSizeSeries;
  const wanted = normalise(s, String(nominal));
  const found = pipeSizeCatalogue().find((p) => p.series === s && p.nominal === wanted);
  if (!found) {
    const known = pipeSizeCatalogue().filter((p) => p.series === s).map((p) => p.nominal);
    throw new InputError(`${field}.nominal`, `${field}.nominal "${nominal}" is not in the ${s} table; sizes there run ${known[0]} to ${known[known.length - 1]}.`);
  }
  return found;
}

/**
 * Replaces `pipe.size` in a pipe case file by the outside diameter and wall from the table (a wall
 * given in the file wins). Returns the file unchanged when it names no size.
 */
export function resolvePipeSizeInCase(json: unknown): { json: unknown; size: PipeSize | null } {
  if (typeof json !== 'object' || json === null) return { json, size: null };
  const file = json as Record<string, unknown>;
  const pipe = file['pipe'];
  if (file['kind'] !== 'pipe' || typeof pipe !== 'object' || pipe === null || !('size' in pipe)) return { json, size: null };
  const { size: named, ...rest } = pipe as Record<string, unknown>;
  if ('outerDiameter' in rest) {
    throw new InputError('pipe.size', 'pipe.size and pipe.outerDiameter cannot both be given; name a size or give the diameter.');
  }
  const spec = (typeof named === 'object' && named !== null ? named : {}) as Record<string, unknown>;
  const size = findPipeSize(spec['series'], spec['nominal'], 'pipe.size');
  const wallThickness = rest['wallThickness'] ?? size.wallThickness;
  if (wallThickness === null) {
    throw new InputError('pipe.wallThickness', `pipe.wallThickness is needed: the ${size.series} table gives no wall for ${size.nominal}; give it in m.`);
  }
  return { json: { ...file, pipe: { ...rest, outerDiameter: size.outerDiameter, wallThickness } }, size };
}
