/**
 * A check's margin in words, with its unit and what it is measured to: "18.6 K above the dew
 * point", "12.3 K below the touch limit", "0.271 above the required temperature factor"; in a US
 * project "33.5 °F above the dew point" (a temperature difference: no 32 °F offset). The sign of a
 * margin is "positive = safe"; the phrase turns it into the side of the reference the result
 * actually lies on, so a reader never has to know the sign convention.
 */
import type { CheckMargin } from '../checks/check-result.js';
import type { QuantityName } from '../base/quantities.js';
import { SI_TEXT, type QuantityText } from '../base/quantity-text.js';

export function marginPhrase(value: number, quantity: QuantityName, reference: string, safeSide: 'above' | 'below', text: QuantityText = SI_TEXT): string {
  if (/^[0.]+$/.test(text.number(Math.abs(value), quantity))) return `at ${reference}`;
  const unsafeSide = safeSide === 'above' ? 'below' : 'above';
  return `${text.figure(Math.abs(value), quantity)} ${value > 0 ? safeSide : unsafeSide} ${reference}`;
}

/** The phrase of a margin in K that names its reference; undefined when the check gives none. */
export function temperatureMarginPhrase(
  margin: CheckMargin | undefined,
  reference: string | undefined = margin?.reference,
  text: QuantityText = SI_TEXT,
): string | undefined {
  if (!margin || margin.unit !== 'K' || reference === undefined || margin.safeSide === undefined) return undefined;
  return marginPhrase(margin.value, 'temperatureDifference', reference, margin.safeSide, text);
}
