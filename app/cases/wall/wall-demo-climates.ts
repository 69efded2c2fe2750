/**
 * The monthly climates shipped with Lamina: invented demo climates only (labelled DEMO in the data),
 * for trying the monthly procedures; never for design.
 */
import coldInland from '../../../data/climate/demo-cold-inland.json' with { type: 'json' };
import mildCoastal from '../../../data/climate/demo-mild-coastal.json' with { type: 'json' };
import type { MonthlyClimate } from '../../checks/monthly-climate.js';

export const DEMO_CLIMATES: readonly MonthlyClimate[] = [coldInland, mildCoastal];

/** The shipped climate with this name, or undefined. */
export function demoClimateByName(name: string): MonthlyClimate | undefined {
  return DEMO_CLIMATES.find((c) => c.name === name);
}
