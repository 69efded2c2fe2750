/**
 * The template offered beside the CSV import: the import's own header row and one example row of
 * an invented material, which imports as it is. Every cell is free of commas, quotes and line
 * breaks, so the row needs no CSV quoting.
 */
import { MATERIAL_CSV_HEADER, type MaterialCsvColumn } from '../../../app/api/material-csv-header.js';

export const CSV_TEMPLATE_FILE_NAME = 'lamina-materials-template.csv';

/** Invented values for an invented product, shaped like a mineral wool data sheet; not for design. */
const EXAMPLE_ROW: Readonly<Record<MaterialCsvColumn, string>> = {
  name: 'Example: Tarnbrook mineral wool slab',
  category: 'insulation',
  'conductivity [W/(m.K)]': 'table 10:0.034 100:0.043 200:0.056',
  'density [kg/m3]': '60',
  'specific heat [J/(kg.K)]': '1030',
  'mu [-]': '1',
  'sd [m]': '',
  'emissivity [-]': '0.9',
  'min service temperature [C]': '-20',
  'max service temperature [C]': '250',
  source: 'invented example values - replace with your data sheet',
  notes: 'one row per material; leave a cell empty when the value is not known',
};

export const MATERIALS_CSV_TEMPLATE = [MATERIAL_CSV_HEADER, MATERIAL_CSV_HEADER.map((column) => EXAMPLE_ROW[column])]
  .map((cells) => cells.join(','))
  .join('\n') + '\n';
