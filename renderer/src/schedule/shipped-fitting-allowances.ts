/** The shipped fitting allowances, read as text by Vite's `?raw` (kept apart so pure code and its tests need no bundler). */
import allowancesCsv from '../../../data/schedules/fitting-allowances.csv?raw';
import { parseFittingAllowances, type FittingAllowances } from '../../../app/schedules/bill-of-quantities.js';

export const SHIPPED_FITTING_ALLOWANCES: FittingAllowances = parseFittingAllowances(allowancesCsv);
