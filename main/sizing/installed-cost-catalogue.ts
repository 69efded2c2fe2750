/**
 * The shipped installed-cost tables (data/sizing/installed-costs.csv), for a case whose economics
 * name a table instead of giving one. Read at the edge (command line, server); the engine parses
 * the text and only ever sees the tables. The shipped tables are invented demo rates.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseInstalledCostTables } from '../../app/cases/sizing/installed-cost-table.js';
import type { InstalledCostTable } from '../../app/cases/sizing/sizing-model.js';

export const INSTALLED_COSTS_FILE = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..', 'data', 'sizing', 'installed-costs.csv');

let catalogue: readonly InstalledCostTable[] | undefined;

/** Every shipped table, read once. A bad shipped file refuses in one sentence (line and column). */
export function installedCostCatalogue(): readonly InstalledCostTable[] {
  catalogue ??= parseInstalledCostTables(readFileSync(INSTALLED_COSTS_FILE, 'utf8'), 'data/sizing/installed-costs.csv');
  return catalogue;
}
