/**
 * JSON for the browser-mode transport. JSON has no Infinity, and a vapour-tight material's μ is
 * Infinity, so that one field travels as the string "inf", the same spelling the project file and
 * the materials CSV use. Everything else is plain JSON.
 */
const VAPOUR_TIGHT_KEY = 'vapourResistanceFactor';
const VAPOUR_TIGHT_TEXT = 'inf';

export function toWireJson(value: unknown): string {
  const text = JSON.stringify(value, (key, item: unknown) => (key === VAPOUR_TIGHT_KEY && item === Infinity ? VAPOUR_TIGHT_TEXT : item));
  // JSON.stringify(undefined) is undefined: an operation with nothing to return answers null.
  return text ?? 'null';
}

export function fromWireJson(text: string): unknown {
  return JSON.parse(text, (key, item: unknown) => (key === VAPOUR_TIGHT_KEY && item === VAPOUR_TIGHT_TEXT ? Infinity : item));
}
