/**
 * Personnel protection: is the outer surface cool enough to touch? The surface temperature is
 * compared with a touch limit; the margin is limit − θ_surface in K, positive on the safe side.
 * Only the hot side is checked here; very cold surfaces are also a contact hazard.
 */
import { SI_TEXT, type QuantityText } from '../base/quantity-text.js';
import type { CheckResult } from './check-result.js';

/**
 * Default touch limit, °C: about 60 °C for brief (≈5 s) contact with a metal surface is the
 * industrial practice that cites ASTM C1055 (common practice, no source). Many specifications
 * use 50–55 °C, and 43 °C where vulnerable people may touch the surface; set the limit per project.
 */
export const DEFAULT_TOUCH_LIMIT = 60;

export const PERSONNEL_PROTECTION_CAUTION =
  'Hot surfaces can burn; how badly depends on the surface material, the contact time and the person. This estimate ' +
  'does not replace guards, warning signs or the limits set by local codes; confirm the design with licensed ' +
  'professional practice.';

export interface PersonnelProtectionInput {
  /** °C */
  readonly surfaceTemperature: number;
  /** °C; default DEFAULT_TOUCH_LIMIT. */
  readonly touchLimit?: number;
}

export interface PersonnelProtectionResult extends CheckResult {
  readonly check: 'personnel-protection';
  /** °C, the limit applied. */
  readonly touchLimit: number;
}

/** `text` writes the reason's figures in the project's units. */
export function personnelProtectionCheck(input: PersonnelProtectionInput, text: QuantityText = SI_TEXT): PersonnelProtectionResult {
  const limit = input.touchLimit ?? DEFAULT_TOUCH_LIMIT;
  const margin = limit - input.surfaceTemperature;
  const surface = text.figure(input.surfaceTemperature, 'temperature');
  const distance = text.figure(Math.abs(margin), 'temperatureDifference');
  const limitText = text.given(limit, 'temperature');
  return {
    check: 'personnel-protection',
    title: 'Personnel protection',
    verdict: margin >= 0 ? 'pass' : 'fail',
    margin: { value: margin, unit: 'K', reference: 'the touch limit', safeSide: 'below' },
    reason:
      margin >= 0
        ? `The outer surface, at ${surface}, is ${distance} below the touch limit of ${limitText}.`
        : `Too hot to touch safely: the outer surface, at ${surface}, is ${distance} above the touch limit of ${limitText}.`,
    caution: PERSONNEL_PROTECTION_CAUTION,
    touchLimit: limit,
  };
}
