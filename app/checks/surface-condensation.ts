/**
 * Surface condensation: does water vapour in the surrounding air condense on the surface?
 * It does when the surface is at or below the dew point of the air (the frost point below 0 °C,
 * app/physics dewPoint with the ISO 13788 saturation formulas). The margin is θ_surface − θ_dew
 * in K, positive on the safe side.
 */
import { SI_TEXT, type QuantityText } from '../base/quantity-text.js';
import { dewPoint } from '../physics/humidity.js';
import type { CheckResult } from './check-result.js';

/**
 * Below this margin the verdict is a warning: air humidity and surface temperature vary in
 * service, so a surface less than 1 K above the dew point is not a reliable design
 * (common practice, no source).
 */
export const CONDENSATION_WARNING_MARGIN = 1;

export const SURFACE_CONDENSATION_CAUTION =
  'Condensation on cold surfaces can wet insulation, corrode pipework and drip onto people and property; this check is a ' +
  'steady-state estimate for the stated air conditions. Confirm the design conditions and the vapour barrier detailing ' +
  'against local codes and licensed professional practice.';

export interface SurfaceCondensationInput {
  /** °C */
  readonly surfaceTemperature: number;
  /** °C */
  readonly airTemperature: number;
  /** Fraction above 0 and at most 1. */
  readonly relativeHumidity: number;
}

export interface SurfaceCondensationResult extends CheckResult {
  readonly check: 'surface-condensation';
  /** Dew (frost) point of the air, °C. */
  readonly dewPoint: number;
}

/** `text` writes the reason's figures in the project's units. */
export function surfaceCondensationCheck(input: SurfaceCondensationInput, text: QuantityText = SI_TEXT): SurfaceCondensationResult {
  const dew = dewPoint(input.airTemperature, input.relativeHumidity);
  const margin = input.surfaceTemperature - dew;
  const celsius = (t: number) => text.figure(t, 'temperature');
  const surface = `the surface, at ${celsius(input.surfaceTemperature)},`;
  const dewText = `the dew point of the air, ${celsius(dew)} (air ${celsius(input.airTemperature)} at ${text.figure(input.relativeHumidity, 'relativeHumidity')} relative humidity)`;
  const distance = text.figure(Math.abs(margin), 'temperatureDifference');
  const verdict = margin <= 0 ? 'fail' : margin < CONDENSATION_WARNING_MARGIN ? 'warning' : 'pass';
  const reason =
    verdict === 'fail'
      ? `Water condenses: ${surface} is ${margin === 0 ? 'at' : `${distance} below`} ${dewText}.`
      : verdict === 'warning'
        ? `No condensation at the design conditions, but ${surface} is only ${distance} above ${dewText}; humidity and temperatures vary in service, so keep at least ${text.given(CONDENSATION_WARNING_MARGIN, 'temperatureDifference')}.`
        : `No condensation: ${surface} is ${distance} above ${dewText}.`;
  return {
    check: 'surface-condensation',
    title: 'Surface condensation',
    verdict,
    margin: { value: margin, unit: 'K', reference: 'the dew point of the air', safeSide: 'above' },
    reason,
    caution: SURFACE_CONDENSATION_CAUTION,
    dewPoint: dew,
  };
}
