/**
 * The verdict of one engineering check, as plain data: what was checked, the outcome, the margin
 * with its unit, the reason in words, and the caution a person must read where the check protects
 * people or property. Checks never decide on their own that something is safe: the caution text
 * defers to local codes and licensed professional practice.
 */
export type CheckVerdict = 'pass' | 'fail' | 'warning' | 'not-applicable';

export interface CheckMargin {
  /** Positive = on the safe side. */
  readonly value: number;
  readonly unit: string;
  /** What the margin is measured to, in words: "the dew point of the air", "the touch limit". */
  readonly reference?: string;
  /** The side of the reference that is safe: a positive value lies this side of it ("above the dew point"). */
  readonly safeSide?: 'above' | 'below';
}

export interface CheckResult {
  /** Stable identifier, e.g. 'surface-condensation', 'personnel-protection'. */
  readonly check: string;
  /** Short title for people, e.g. "Surface condensation". */
  readonly title: string;
  readonly verdict: CheckVerdict;
  readonly margin?: CheckMargin;
  /** One or two sentences saying why, with the figures compared. */
  readonly reason: string;
  /** The usual caution for checks that protect people or property. */
  readonly caution?: string;
}
