/**
 * A project's schedule of pipe runs: the lines an engineer takes off the drawings, each with its
 * service, size, length, fluid temperature and location, sized in one go against the criteria of
 * its service. A run is not a case file: it names a condition set and a service of the project
 * instead of repeating their values, and becomes a pipe case (schedule-run-case.ts) only to be
 * solved. All values SI: m, °C, fractions; thicknesses in m.
 */
import type { PipeSizeSeries } from '../cases/pipe/pipe-sizes.js';

export const RUN_ORIENTATIONS = ['horizontal', 'vertical'] as const;
export type RunOrientation = (typeof RUN_ORIENTATIONS)[number];

/** Where a run is when its row gives the air itself instead of naming a condition set. */
export const PLAIN_LOCATIONS = ['indoor', 'outdoor'] as const;

export const FITTING_KINDS = ['valves', 'flanges', 'bends'] as const;
export type FittingKind = (typeof FITTING_KINDS)[number];

export interface ScheduleRun {
  /** The line reference of the drawings ("HTG-F-012"); unique in the schedule, the key of a re-import. */
  readonly reference: string;
  /** Names a service of the project's settings ("heating flow"), which gives the criteria and the usual material. */
  readonly service: string;
  readonly pipeSeries: PipeSizeSeries;
  /** As the size tables write it: "DN100", "4", "1 1/4", "110". */
  readonly pipeSize: string;
  /** m; null where the size table gives the wall. */
  readonly wallThickness: number | null;
  /** m */
  readonly length: number;
  /** °C */
  readonly fluidTemperature: number;
  /** A condition set of the project, or 'indoor' / 'outdoor' with the air given on the row. */
  readonly location: string;
  /** °C, %/100, m/s: the row's own air; override a condition set's where given. */
  readonly airTemperature: number | null;
  readonly relativeHumidity: number | null;
  readonly windSpeed: number | null;
  readonly orientation: RunOrientation;
  /** A library material by name; null: the service's usual material. */
  readonly material: string | null;
  /** m, a thickness fixed on the drawings: the run is checked at it, not sized. */
  readonly thickness: number | null;
  readonly fittings: Readonly<Record<FittingKind, number>>;
}

/** Named surroundings a run may point to ("Plant room", "Outdoors in wind"). */
export interface ConditionSet {
  readonly name: string;
  /** °C */
  readonly airTemperature: number;
  /** 0..1 */
  readonly relativeHumidity: number;
  readonly exposure: 'indoor' | 'outdoor';
  /** m/s (outdoor only; 0 indoors). */
  readonly windSpeed: number;
}

/** What every run of a service is sized against, unless the row says otherwise. */
export interface ServiceRule {
  readonly service: string;
  /** The library material runs of this service are insulated with by default. */
  readonly material: string;
  /** The "criteria" of a case's sizing block (app/cases/sizing/sizing-options.ts), as JSON. */
  readonly criteria: Readonly<Record<string, unknown>>;
}

/** Energy price and CO₂ for the bill's cost and emission totals (all or none). */
export interface ScheduleEconomics {
  /** Per kWh of fuel or electricity bought, in `currency`. */
  readonly energyPrice: number;
  /** Heat delivered per unit of fuel (or the COP of cooling). */
  readonly generationEfficiency: number;
  /** kg CO₂ per kWh of fuel or electricity. */
  readonly emissionFactor: number;
  readonly currency: string;
}

export interface ScheduleSettings {
  readonly conditionSets: readonly ConditionSet[];
  readonly services: readonly ServiceRule[];
  /** h per year the lines are in service. */
  readonly operatingHours: number;
  readonly economics: ScheduleEconomics | null;
}
