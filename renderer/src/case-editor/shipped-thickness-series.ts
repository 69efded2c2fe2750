/** The shipped thickness series, read as text by Vite's `?raw` (kept apart so pure code and its tests need no bundler). */
import seriesCsv from '../../../data/insulation-thickness-series.csv?raw';
import { parseThicknessSeries } from './thickness-series.js';

export const SHIPPED_THICKNESS_SERIES: ReadonlyMap<string, readonly number[]> = parseThicknessSeries(seriesCsv);
