/**
 * Service temperature: does any layer run hotter or colder than its material allows? Each layer
 * spans the temperatures between its inner and outer faces (the profile is monotone through a
 * layer without heat generation), and that span must lie within the material's minimum and
 * maximum service temperature: a layer past either limit fails.
 *
 * The margin of a layer within its range is measured to the limit its temperatures are driven
 * towards. The inner face is the process side (the pipe or vessel), so a layer hotter at its
 * inner face runs in hot service and is judged from its hottest face against its upper limit; a
 * layer colder at its inner face is judged from its coldest face against its lower limit. The
 * other face sits near the ambient temperature, which the design does not set (a 150 °C pipe
 * layer with limits 0 to 300 °C is judged against 300 °C, not against 0 °C). A layer with no
 * temperature difference is judged against the nearer limit; a layer whose material gives only
 * one limit against that one. The check's margin is the smallest over the layers, in K, positive
 * on the safe side.
 */
import { SI_TEXT, type QuantityText } from '../base/quantity-text.js';
import type { CheckResult } from './check-result.js';

export interface LayerTemperatureSpan {
  /** Name people read, e.g. "insulation layer 1 (Rock wool)". */
  readonly name: string;
  /** °C */
  readonly innerTemperature: number;
  /** °C */
  readonly outerTemperature: number;
  /** °C, null when the material gives none. */
  readonly minServiceTemperature: number | null;
  readonly maxServiceTemperature: number | null;
}

export interface LayerOutsideServiceRange {
  readonly name: string;
  /** °C, the lowest and highest temperature in the layer. */
  readonly lowest: number;
  readonly highest: number;
  readonly minServiceTemperature: number | null;
  readonly maxServiceTemperature: number | null;
}

/** The limit a layer was judged against, and the layer's temperature measured to it. */
export interface ServiceLimitJudged {
  readonly layer: string;
  readonly side: 'lower' | 'upper';
  /** °C, the limit. */
  readonly limit: number;
  /** °C: the layer's coldest face for the lower limit, its hottest for the upper. */
  readonly temperature: number;
  /** K, positive within the limit. */
  readonly margin: number;
}

export interface ServiceTemperatureResult extends CheckResult {
  readonly check: 'service-temperature';
  readonly layersOutside: readonly LayerOutsideServiceRange[];
  /** The limit that sets the check's margin; null when no layer gives a range. */
  readonly governingLimit: ServiceLimitJudged | null;
}

export const SERVICE_TEMPERATURE_CAUTION =
  'Service limits come from the material data; a product used outside its range can shrink, char, melt or lose its ' +
  'properties. Confirm the limits with the manufacturer and the design with local codes and licensed professional practice.';

/** `text` writes the reason's figures in the project's units. */
export function serviceTemperatureCheck(layers: readonly LayerTemperatureSpan[], text: QuantityText = SI_TEXT): ServiceTemperatureResult {
  // The common fields written out in each result, not spread from one object: in Node 20 a
  // spread followed by more fields is a slow path (app/cases/with-fields.ts).
  const check = 'service-temperature' as const;
  const title = 'Service temperature';
  const caution = SERVICE_TEMPERATURE_CAUTION;
  const limited = layers.filter((l) => l.minServiceTemperature !== null || l.maxServiceTemperature !== null);
  if (limited.length === 0) {
    return { check, title, caution, verdict: 'not-applicable', reason: 'No layer material gives a service temperature range.', layersOutside: [], governingLimit: null };
  }
  const judged = limited.map(judgeLayer);
  const governing = judged.reduce((a, b) => (b.margin < a.margin ? b : a));
  const failing = limited.flatMap((layer, i) => (judged[i]!.margin < 0 ? [{ layer, judged: judged[i]! }] : []));
  const outside: LayerOutsideServiceRange[] = failing.map(({ layer }) => ({
    name: layer.name,
    lowest: Math.min(layer.innerTemperature, layer.outerTemperature),
    highest: Math.max(layer.innerTemperature, layer.outerTemperature),
    minServiceTemperature: layer.minServiceTemperature,
    maxServiceTemperature: layer.maxServiceTemperature,
  }));
  const unlimited = layers.filter((l) => !limited.includes(l)).map((l) => l.name);
  const unlimitedNote =
    unlimited.length === 0
      ? ''
      : ` ${unlimited.length === 1 ? 'One layer gives' : `${unlimited.length} layers give`} no service range and ${unlimited.length === 1 ? 'was' : 'were'} not checked: ${unlimited.join(', ')}.`;
  const reason =
    outside.length > 0
      ? `Outside the service range: ${failing.map((f) => describeOutside(f.judged, f.layer, text)).join('; ')}.${unlimitedNote}`
      : `Every layer with a service range stays within it. Nearest to its limit: ${describeWithin(governing, limited[judged.indexOf(governing)]!, text)}.${unlimitedNote}`;
  return {
    check,
    title,
    caution,
    verdict: outside.length > 0 ? 'fail' : 'pass',
    margin: {
      value: governing.margin,
      unit: 'K',
      reference: `the ${governing.side} service limit of ${governing.layer}`,
      safeSide: governing.side === 'upper' ? 'below' : 'above',
    },
    reason,
    layersOutside: outside,
    governingLimit: governing,
  };
}

function judgeLayer(layer: LayerTemperatureSpan): ServiceLimitJudged {
  const lowest = Math.min(layer.innerTemperature, layer.outerTemperature);
  const highest = Math.max(layer.innerTemperature, layer.outerTemperature);
  const min = layer.minServiceTemperature;
  const max = layer.maxServiceTemperature;
  const lower = min === null ? null : { layer: layer.name, side: 'lower' as const, limit: min, temperature: lowest, margin: lowest - min };
  const upper = max === null ? null : { layer: layer.name, side: 'upper' as const, limit: max, temperature: highest, margin: max - highest };
  const candidates = [lower, upper].filter((j): j is ServiceLimitJudged => j !== null);
  const crossed = candidates.filter((j) => j.margin < 0).sort((a, b) => a.margin - b.margin)[0];
  if (crossed) return crossed;
  if (candidates.length === 1) return candidates[0]!;
  if (layer.innerTemperature > layer.outerTemperature) return upper!;
  if (layer.innerTemperature < layer.outerTemperature) return lower!;
  return lower!.margin < upper!.margin ? lower! : upper!;
}

/** "from 0 °C; no upper limit given", "up to 300 °C; no lower limit given", "−50 to 105 °C". */
function rangeText(layer: LayerTemperatureSpan, text: QuantityText): string {
  const min = layer.minServiceTemperature;
  const max = layer.maxServiceTemperature;
  if (min !== null && max !== null) return `${text.givenNumber(min, 'temperature')} to ${limitText(text, max)}`;
  return min !== null ? `from ${limitText(text, min)}; no upper limit given` : `up to ${limitText(text, max!)}; no lower limit given`;
}

function describeOutside(j: ServiceLimitJudged, layer: LayerTemperatureSpan, text: QuantityText): string {
  const reaches = j.side === 'upper' ? `reaches ${celsius(text, j.temperature)}, ${kelvin(text, -j.margin)} above` : `falls to ${celsius(text, j.temperature)}, ${kelvin(text, -j.margin)} below`;
  return `${j.layer} ${reaches} its ${j.side} limit of ${limitText(text, j.limit)} (service range ${rangeText(layer, text)})`;
}

function describeWithin(j: ServiceLimitJudged, layer: LayerTemperatureSpan, text: QuantityText): string {
  const face = j.side === 'upper' ? 'hottest' : 'coldest';
  const side = j.side === 'upper' ? 'below' : 'above';
  return `${j.layer}, whose ${face} face at ${celsius(text, j.temperature)} is ${kelvin(text, j.margin)} ${side} its ${j.side} limit of ${limitText(text, j.limit)} (service range ${rangeText(layer, text)})`;
}

/** A face temperature. */
function celsius(text: QuantityText, t: number): string {
  return text.figure(t, 'temperature');
}

/** A distance to a limit (a temperature difference). */
function kelvin(text: QuantityText, dt: number): string {
  return text.figure(dt, 'temperatureDifference');
}

/** A limit as given. */
function limitText(text: QuantityText, t: number): string {
  return text.given(t, 'temperature');
}
