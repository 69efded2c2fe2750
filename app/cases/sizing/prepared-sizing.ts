/**
 * A case's sizing made ready when the case is parsed: the options of its "sizing" block with the
 * thicknesses to try (the series resolved against the thickness-series data) and the installed-cost
 * table (found by name among the context's tables, of the basis the kind needs), every thickness
 * checked to be priced by it. So a series that names nothing, or a table that does not cover the
 * series, is refused with the rest of the case, before any solve.
 */
import type { MaterialLayer } from '../insulated/layer-build.js';
import type { CaseContext } from '../case-kind.js';
import { findCostTable, installedCost, requireCostBasis } from './installed-cost-lookup.js';
import type { InstalledCostTable, SizingOptions } from './sizing-model.js';
import { seriesThicknesses } from './sizing-series.js';

export interface PreparedSizing extends SizingOptions {
  /** m, rising: the series' thicknesses (the case's own thickness is added by the sweep). */
  readonly thicknesses: readonly number[];
  /** The table the economics name, resolved; null without economics. */
  readonly costTable: InstalledCostTable | null;
}

const COST_FIELD = 'sizing.economics.costTable';

/**
 * `costDiameter` is the diameter the sized layer goes on (pipe; m), null for a flat surface priced
 * per m².
 */
export function prepareSizing(
  options: SizingOptions,
  layers: readonly MaterialLayer[],
  context: Pick<CaseContext, 'thicknessSeries' | 'installedCostTables'>,
  costDiameter: number | null,
): PreparedSizing {
  const sized = layers[options.layer]!;
  const thicknesses = seriesThicknesses(options.series, sized.material.name, `layers[${options.layer}]`, context.thicknessSeries);
  let costTable: InstalledCostTable | null = null;
  if (options.economics !== undefined) {
    const named = options.economics.costTable;
    const table = typeof named === 'string' ? findCostTable(context.installedCostTables ?? [], named, COST_FIELD) : named;
    costTable = requireCostBasis(table, costDiameter === null ? 'per-square-metre' : 'per-metre', COST_FIELD);
    for (const thickness of [...thicknesses, sized.thickness]) installedCost(costTable, costDiameter, thickness, COST_FIELD);
  }
  return { ...options, thicknesses, costTable };
}
