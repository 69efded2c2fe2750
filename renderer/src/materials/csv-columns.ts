/**
 * What to write in each column of a materials CSV file, in plain words with the unit and the
 * allowed range, shown beside the import button. Keyed by the import's own header
 * (app/api/material-csv-header.ts), so a column added there cannot go undescribed here.
 */
import { MATERIAL_CSV_HEADER, type MaterialCsvColumn } from '../../../app/api/material-csv-header.js';
import { MATERIAL_CATEGORIES } from '../../../app/api/material-types.js';
import { MATERIAL_LIMITS, describeRange } from '../../../app/api/material-limits.js';

const COLUMN_MEANINGS: Readonly<Record<MaterialCsvColumn, string>> = {
  name: `Required. The material's name, 1 to ${MATERIAL_LIMITS.name} characters, not already in the library.`,
  category: `Required. One of: ${MATERIAL_CATEGORIES.join(', ')}.`,
  'conductivity [W/(m.K)]':
    'Required. Thermal conductivity λ in W/(m·K): one number; or "poly a0 a1 a2" for λ = a0 + a1·θ + a2·θ² with θ the mean ' +
    'temperature in °C (then both service temperatures are needed); or "table 10:0.035 100:0.044" for points θ:λ.',
  'density [kg/m3]': `Density, ${describeRange(MATERIAL_LIMITS.density)}.`,
  'specific heat [J/(kg.K)]': `Specific heat capacity, ${describeRange(MATERIAL_LIMITS.specificHeat)}.`,
  'mu [-]':
    `Vapour resistance factor μ, no unit, from ${MATERIAL_LIMITS.vapourResistanceFactor.min} to ${MATERIAL_LIMITS.vapourResistanceFactor.max}; ` +
    '"inf" for a vapour-tight material.',
  'sd [m]': `Equivalent air layer thickness sd, for a membrane given by its sd, ${describeRange(MATERIAL_LIMITS.equivalentAirLayerThickness)}.`,
  'emissivity [-]': `Surface emissivity, no unit, ${describeRange(MATERIAL_LIMITS.emissivity)}.`,
  'min service temperature [C]': `Lowest temperature the material may be used at, ${describeRange(MATERIAL_LIMITS.temperature)}.`,
  'max service temperature [C]': `Highest temperature the material may be used at, above the lowest and ${describeRange(MATERIAL_LIMITS.temperature)}.`,
  source: `Where the values come from (data sheet, standard, measurement), up to ${MATERIAL_LIMITS.source} characters.`,
  notes: `Anything else worth keeping, up to ${MATERIAL_LIMITS.notes} characters.`,
};

export interface CsvColumnGuide {
  /** The header cell exactly as the file must have it (its unit is in brackets). */
  readonly header: MaterialCsvColumn;
  readonly meaning: string;
}

export const CSV_COLUMN_GUIDE: readonly CsvColumnGuide[] = MATERIAL_CSV_HEADER.map((header) => ({ header, meaning: COLUMN_MEANINGS[header] }));
