/**
 * Pipe and tube sizes from the tables in data/pipe-sizes/*.csv, for case files that name a size
 * instead of giving the outside diameter and wall. Read at the edge (command line, server); the
 * engine only ever sees metres. Values in the tables carry their source; most say "from memory".
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseCsv } from '../storage/csv.js';

import type { PipeSize } from '../../app/cases/pipe/pipe-sizes.js';

export { PIPE_SIZE_SERIES, type PipeSize, type PipeSizeSeries } from '../../app/cases/pipe/pipe-sizes.js';

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
