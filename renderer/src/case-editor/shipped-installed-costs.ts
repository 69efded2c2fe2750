/** The shipped installed-cost tables, read as text by Vite's `?raw` (kept apart so pure code and its tests need no bundler). */
import costsCsv from '../../../data/sizing/installed-costs.csv?raw';
import { parseInstalledCostTables } from '../../../app/cases/sizing/installed-cost-table.js';
import type { InstalledCostTable } from '../../../app/cases/sizing/sizing-model.js';

export const SHIPPED_INSTALLED_COST_TABLES: readonly InstalledCostTable[] = parseInstalledCostTables(costsCsv, 'data/sizing/installed-costs.csv');
