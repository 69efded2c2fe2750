/**
 * Inside vapour pressure for the moisture checks: from the inside condition as given (measured or
 * specified), or from an internal humidity class (ISO 13788 annex, data/physics/humidity-classes.json,
 * from memory, medium confidence): p_i = p_e + Δp, where the class excess Δp is full for outside
 * monthly means at or below 0 °C, falls linearly to 0 at 20 °C, and may carry the 1.1 safety factor.
 */
import classTable from '../../data/physics/humidity-classes.json' with { type: 'json' };
import type { AirCondition } from '../physics/air-condition.js';
import { InputError } from '../fe/errors.js';
import { saturationPressure } from '../physics/index.js';

export const HUMIDITY_CLASS_SOURCE = `${classTable.source} (${classTable.label})`;
export const HUMIDITY_CLASSES = classTable.classes;
export const HUMIDITY_CLASS_SAFETY_FACTOR: number = classTable.safetyFactor.value;

/** Vapour pressure excess Δp of a class at the outside temperature θ_e, Pa (without the safety factor). */
/**
 * Where the inside humidity of the moisture checks comes from: the inside condition as given
 * (measured or specified), or an internal humidity class (ISO 13788 annex, data/physics/humidity-classes.json),
 * optionally with the 1.1 safety factor on the vapour pressure excess.
 */
export type InsideHumiditySource =
  | { readonly kind: 'measured' }
  | { readonly kind: 'class'; readonly humidityClass: number; readonly safetyFactor?: boolean };

export function classVapourPressureExcess(humidityClass: number, outsideTemperature: number): number {
  const row = classTable.classes.find((c) => c.humidityClass === humidityClass);
  if (!row) {
    const ids = classTable.classes.map((c) => c.humidityClass);
    throw new InputError(
      'moisture.insideHumidity.humidityClass',
      `moisture.insideHumidity.humidityClass must be a whole number from ${Math.min(...ids)} to ${Math.max(...ids)} (got ${String(humidityClass)}).`,
    );
  }
  const full = classTable.excessFullBelow;
  const zero = classTable.excessZeroAbove;
  const share = outsideTemperature <= full ? 1 : outsideTemperature >= zero ? 0 : (zero - outsideTemperature) / (zero - full);
  return row.vapourPressureExcess * share;
}

/** p_i, Pa, for the chosen source, given the inside and outside air. */
export function insideVapourPressure(source: InsideHumiditySource | undefined, inside: AirCondition, outside: AirCondition): number {
  if (!source || source.kind === 'measured') return inside.relativeHumidity * saturationPressure(inside.temperature);
  const pe = outside.relativeHumidity * saturationPressure(outside.temperature);
  const factor = source.safetyFactor ? HUMIDITY_CLASS_SAFETY_FACTOR : 1;
  return pe + factor * classVapourPressureExcess(source.humidityClass, outside.temperature);
}

/** Words for reports: where p_i came from. */
export function describeInsideHumidity(source: InsideHumiditySource | undefined): string {
  if (!source || source.kind === 'measured') return 'the inside relative humidity as given';
  return `internal humidity class ${source.humidityClass}${source.safetyFactor ? ' with the 1.1 safety factor' : ''} (${classTable.label})`;
}
