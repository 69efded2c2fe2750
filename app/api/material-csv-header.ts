/**
 * The header row of the materials CSV format (seed files in data/materials, user import and
 * export), exactly these columns in this order. The unit of each column is part of its name and
 * values are SI. It lives in the API layer because both sides need it: main/services/material-csv.ts
 * reads and writes files with it, and the renderer shows it beside the import button and builds the
 * template file from it.
 */
export const MATERIAL_CSV_HEADER = [
  'name', 'category', 'conductivity [W/(m.K)]', 'density [kg/m3]', 'specific heat [J/(kg.K)]', 'mu [-]', 'sd [m]',
  'emissivity [-]', 'min service temperature [C]', 'max service temperature [C]', 'source', 'notes',
] as const;

export type MaterialCsvColumn = (typeof MATERIAL_CSV_HEADER)[number];
