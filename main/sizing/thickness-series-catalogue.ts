/**
 * The thickness series insulation is sold in, from data/insulation-thickness-series.csv, for the
 * sizing of a case (CaseContext.thicknessSeries). Read once, at the edge; the engine sees metres.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseThicknessSeries } from '../../app/cases/sizing/thickness-series.js';

const FILE = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..', 'data', 'insulation-thickness-series.csv');

let catalogue: ReadonlyMap<string, readonly number[]> | undefined;

/** Product family -> thicknesses in m, rising. */
export function thicknessSeriesCatalogue(): ReadonlyMap<string, readonly number[]> {
  catalogue ??= parseThicknessSeries(readFileSync(FILE, 'utf8'));
  return catalogue;
}
