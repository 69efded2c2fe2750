/**
 * The columns of a schedule in CSV: what each holds, whether a row must give it, and, for a
 * number, its kind of quantity, whose unit the header names in brackets ("length [m]" or
 * "length [ft]"). One file is in SI or in US units throughout; the header says which. Columns may
 * come in any order; a column the format does not know is refused, so a typing slip in a header
 * cannot drop a whole column of data silently.
 */
import type { QuantityName } from '../base/quantities.js';
import { unitLabel, type UnitSystem } from '../base/unit-systems.js';

export type ColumnKey =
  | 'reference' | 'service' | 'pipeSeries' | 'pipeSize' | 'wallThickness' | 'length' | 'fluidTemperature' | 'location'
  | 'airTemperature' | 'relativeHumidity' | 'windSpeed' | 'orientation' | 'material' | 'thickness' | 'valves' | 'flanges' | 'bends';

export interface ScheduleColumn {
  readonly key: ColumnKey;
  /** The header's name, before the unit. */
  readonly name: string;
  readonly required: boolean;
  /** For a number: its kind (the unit follows from the file's system). Text otherwise. */
  readonly quantity?: QuantityName;
  /** A whole number (fittings). */
  readonly count?: boolean;
  /** What the column holds, for the template and the import guide. */
  readonly meaning: string;
}

export const SCHEDULE_COLUMNS: readonly ScheduleColumn[] = [
  { key: 'reference', name: 'reference', required: true, meaning: 'the line reference of the drawings; unique in the schedule, it matches rows on a re-import' },
  { key: 'service', name: 'service', required: true, meaning: "a service of the project (heating flow, chilled water, steam, ...), which gives the criteria and the usual material" },
  { key: 'pipeSeries', name: 'pipe series', required: true, meaning: 'steel-iso, steel-asme, copper-en1057, copper-astm-b88 or plastic-metric' },
  { key: 'pipeSize', name: 'pipe size', required: true, meaning: 'as the series writes it: DN100, 4, 1 1/4, 110' },
  { key: 'wallThickness', name: 'wall thickness', required: false, quantity: 'thickness', meaning: 'where the size table gives no wall (copper and plastic)' },
  { key: 'length', name: 'length', required: true, quantity: 'length', meaning: 'insulated length of the run' },
  { key: 'fluidTemperature', name: 'fluid temperature', required: true, quantity: 'temperature', meaning: 'temperature of the fluid in service' },
  { key: 'location', name: 'location', required: true, meaning: 'a condition set of the project, or indoor or outdoor with the air given on the row' },
  { key: 'airTemperature', name: 'air temperature', required: false, quantity: 'temperature', meaning: "the air around the run (over the condition set's)" },
  { key: 'relativeHumidity', name: 'relative humidity', required: false, quantity: 'relativeHumidity', meaning: "of that air (over the condition set's)" },
  { key: 'windSpeed', name: 'wind speed', required: false, quantity: 'windSpeed', meaning: "outdoors (over the condition set's)" },
  { key: 'orientation', name: 'orientation', required: false, meaning: 'horizontal (when empty) or vertical' },
  { key: 'material', name: 'insulation material', required: false, meaning: "a material of the library; empty: the service's usual material" },
  { key: 'thickness', name: 'insulation thickness', required: false, quantity: 'thickness', meaning: 'a thickness fixed on the drawings: the run is checked at it instead of sized' },
  { key: 'valves', name: 'valves', required: false, count: true, meaning: 'number of valves to insulate' },
  { key: 'flanges', name: 'flanges', required: false, count: true, meaning: 'number of flange pairs to insulate' },
  { key: 'bends', name: 'bends', required: false, count: true, meaning: 'number of bends and elbows' },
];

/** "length [m]", "fluid temperature [°F]", "reference": a column's header in a system. */
export function columnHeader(column: ScheduleColumn, system: UnitSystem): string {
  return column.quantity === undefined ? column.name : `${column.name} [${unitLabel(column.quantity, system)}]`;
}

/** The header row of a schedule in `system`, every column in the format's order. */
export function scheduleHeader(system: UnitSystem): string[] {
  return SCHEDULE_COLUMNS.map((c) => columnHeader(c, system));
}

/**
 * The columns an export adds after the schedule's own: the results of the last sizing. A re-import
 * of an exported file skips them (they are results, not inputs), so the export reads back as the
 * same schedule.
 */
export const RESULT_COLUMNS: readonly { readonly name: string; readonly quantity?: QuantityName; readonly meaning: string }[] = [
  { name: 'chosen thickness', quantity: 'thickness', meaning: 'the thickness chosen (or fixed, or the thickest option when none meets)' },
  { name: 'basis', meaning: 'chosen, fixed, or none meets' },
  { name: 'governing criterion', meaning: 'the criterion that decided a chosen thickness' },
  { name: 'heat loss per length', quantity: 'heatFlowPerLength', meaning: 'positive: lost; negative: gained' },
  { name: 'heat loss of the run', quantity: 'heatFlow', meaning: 'per length times the length' },
  { name: 'surface temperature', quantity: 'temperature', meaning: 'of the outer surface' },
  { name: 'criteria met', meaning: 'yes or no' },
  { name: 'checks', meaning: 'each check of the case with its verdict' },
  { name: 'reason', meaning: 'why this thickness, or why the run could not be sized' },
];

/** A result column's header in a system. */
export function resultHeader(column: (typeof RESULT_COLUMNS)[number], system: UnitSystem): string {
  return column.quantity === undefined ? column.name : `${column.name} [${unitLabel(column.quantity, system)}]`;
}
