/**
 * What the engine's case pipeline needs from the Node side: library materials by id (a missing id
 * gives undefined, so that the case parser names the field; any other storage failure is not
 * hidden), the pipe-size tables read from data/pipe-sizes, and for a sizing the thickness series
 * and the shipped installed-cost tables (data/insulation-thickness-series.csv, data/sizing).
 */
import type { CaseContext } from '../../app/index.js';
import type { MaterialsService } from '../services/materials-service.js';
import { NotFoundError } from '../services/service-errors.js';
import { pipeSizeCatalogue } from '../pipe-sizes/pipe-size-catalogue.js';
import { installedCostCatalogue } from '../sizing/installed-cost-catalogue.js';
import { thicknessSeriesCatalogue } from '../sizing/thickness-series-catalogue.js';

export function caseContext(materials: MaterialsService | null): CaseContext {
  return {
    resolveMaterial: (id) => {
      if (!materials) return undefined;
      try {
        return materials.get(id);
      } catch (error) {
        if (error instanceof NotFoundError) return undefined;
        throw error;
      }
    },
    pipeSizes: pipeSizeCatalogue(),
    thicknessSeries: thicknessSeriesCatalogue(),
    installedCostTables: installedCostCatalogue(),
  };
}

/** True when a case refers to the library (so the command line must open the database). */
export function refersToLibrary(json: unknown): boolean {
  return JSON.stringify(json).includes('"materialId"');
}
