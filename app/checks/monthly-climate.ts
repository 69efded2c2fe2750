/**
 * A monthly climate for the moisture checks: the mean outside temperature and relative humidity of
 * each month, and the inside condition kept in that month. Climates are data (data/climate/*.json);
 * the shipped ones are invented demo climates, not for design.
 */
import type { AirCondition } from '../physics/air-condition.js';

export interface ClimateMonth {
  /** Month name, e.g. 'January'. */
  readonly month: string;
  /** Number of days, 28..31. */
  readonly days: number;
  readonly outside: AirCondition;
  readonly inside: AirCondition;
}

export interface MonthlyClimate {
  readonly name: string;
  /** e.g. 'DEMO: invented, not for design'. */
  readonly label: string;
  /** Exactly 12 months, in calendar order starting with any month. */
  readonly months: readonly ClimateMonth[];
}

/** Seconds in a month of the climate. */
export function monthDuration(month: ClimateMonth): number {
  return month.days * 86_400;
}
