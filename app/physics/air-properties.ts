/**
 * Properties of dry air at 1 atm versus temperature, for the convection correlations.
 *
 * Linear interpolation in a published table (data/physics/air-properties.json, with its source).
 * The correlations evaluate these at the film temperature (θ_s + θ_a)/2. Outside the table the end
 * segment is extended linearly and a warning says so: the properties vary smoothly and slowly
 * with temperature, so a modest extrapolation stays usable, but the user is told.
 * The expansion coefficient is the ideal-gas value β = 1/T.
 * Beyond −100…400 °C linear extrapolation is no longer trustworthy (ν would head towards zero on the
 * cold side), so such temperatures are refused rather than answered badly.
 */
import airTable from '../../data/physics/air-properties.json' with { type: 'json' };
import { enteredPart, figurePart, type Sentence } from '../base/quantity-sentence.js';
import { toKelvin } from './constants.js';
import { requireInRange } from './input-checks.js';

export interface AirProperties {
  /** °C, the temperature the properties belong to. */
  readonly temperature: number;
  /** W/(m·K) */
  readonly conductivity: number;
  /** m²/s */
  readonly kinematicViscosity: number;
  /** m²/s */
  readonly thermalDiffusivity: number;
  /** Prandtl number, 1 */
  readonly prandtl: number;
  /** Volumetric expansion coefficient 1/T, 1/K (ideal gas). */
  readonly expansionCoefficient: number;
  /** The extrapolation warning, its temperatures as SI values of their kind (app/base/quantity-sentence). */
  readonly warnings: readonly Sentence[];
}

interface AirRow {
  readonly temperature: number;
  readonly conductivity: number;
  readonly kinematicViscosity: number;
  readonly thermalDiffusivity: number;
  readonly prandtl: number;
}

const rows: readonly AirRow[] = airTable.rows;

/** The temperature range of the air property table, °C. */
export const AIR_TABLE_RANGE = {
  minimum: rows[0]!.temperature,
  maximum: rows[rows.length - 1]!.temperature,
} as const;

/** The temperatures (°C) outside which the table is not extrapolated at all. */
export const AIR_EXTRAPOLATION_LIMITS = { minimum: -100, maximum: 400 } as const;

/** The source named in the air property table. */
export const AIR_TABLE_SOURCE: string = airTable.source;

/**
 * The last answer: mixed convection evaluates the forced and the natural correlation at the same
 * film temperature one after the other, at every evaluation of the surface film. The answer is
 * frozen, so sharing it cannot let one caller change another's properties.
 */
let last: { readonly celsius: number; readonly properties: AirProperties } | null = null;

/** Air properties at 1 atm at temperature θ (°C), interpolated in the table. */
export function airPropertiesAt(celsius: number, field = 'filmTemperature'): AirProperties {
  if (last !== null && last.celsius === celsius) return last.properties;
  const theta = requireInRange(field, celsius, AIR_EXTRAPOLATION_LIMITS.minimum, AIR_EXTRAPOLATION_LIMITS.maximum, '°C');
  const properties = interpolatedAirProperties(theta);
  last = { celsius, properties };
  return properties;
}

function mix(x: number, y: number, t: number): number {
  return x + t * (y - x);
}

function interpolatedAirProperties(theta: number): AirProperties {
  // Pick the segment [i, i+1] containing θ; the end segments serve for extrapolation.
  let i = 0;
  while (i < rows.length - 2 && theta > rows[i + 1]!.temperature) i++;
  const a = rows[i]!;
  const b = rows[i + 1]!;
  const t = (theta - a.temperature) / (b.temperature - a.temperature);
  const warnings: Sentence[] = [];
  if (theta < AIR_TABLE_RANGE.minimum || theta > AIR_TABLE_RANGE.maximum) {
    const { minimum, maximum } = AIR_TABLE_RANGE;
    warnings.push([
      'Air properties at ',
      figurePart(theta, 'temperature', `${theta.toFixed(1)} °C`),
      ' are extrapolated beyond the table range ',
      enteredPart(minimum, 'temperature', String(minimum), true),
      ' to ',
      enteredPart(maximum, 'temperature', `${maximum} °C`),
      '.',
    ]);
  }
  return Object.freeze({
    temperature: theta,
    conductivity: mix(a.conductivity, b.conductivity, t),
    kinematicViscosity: mix(a.kinematicViscosity, b.kinematicViscosity, t),
    thermalDiffusivity: mix(a.thermalDiffusivity, b.thermalDiffusivity, t),
    prandtl: mix(a.prandtl, b.prandtl, t),
    expansionCoefficient: 1 / toKelvin(theta),
    warnings: Object.freeze(warnings),
  });
}
