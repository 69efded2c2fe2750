/**
 * Service temperature: does any layer run hotter or colder than its material allows? Each layer
 * spans the temperatures between its inner and outer faces (the profile is monotone through a
 * layer without heat generation), and that span must lie within the material's minimum and
 * maximum service temperature. The margin is the smallest distance to a limit over all layers
 * that give one, in K, positive on the safe side.
 */
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

export interface ServiceTemperatureResult extends CheckResult {
  readonly check: 'service-temperature';
  readonly layersOutside: readonly LayerOutsideServiceRange[];
}

export const SERVICE_TEMPERATURE_CAUTION =
  'Service limits come from the material data; a product used outside its range can shrink, char, melt or lose its ' +
  'properties. Confirm the limits with the manufacturer and the design with local codes and licensed professional practice.';

export function serviceTemperatureCheck(layers: readonly LayerTemperatureSpan[]): ServiceTemperatureResult {
  const base = { check: 'service-temperature' as const, title: 'Service temperature', caution: SERVICE_TEMPERATURE_CAUTION };
  const limited = layers.filter((l) => l.minServiceTemperature !== null || l.maxServiceTemperature !== null);
  if (limited.length === 0) {
    return { ...base, verdict: 'not-applicable', reason: 'No layer material gives a service temperature range.', layersOutside: [] };
  }
  let margin = Infinity;
  const outside: LayerOutsideServiceRange[] = [];
  for (const layer of limited) {
    const lowest = Math.min(layer.innerTemperature, layer.outerTemperature);
    const highest = Math.max(layer.innerTemperature, layer.outerTemperature);
    const aboveMin = layer.minServiceTemperature === null ? Infinity : lowest - layer.minServiceTemperature;
    const belowMax = layer.maxServiceTemperature === null ? Infinity : layer.maxServiceTemperature - highest;
    margin = Math.min(margin, aboveMin, belowMax);
    if (aboveMin < 0 || belowMax < 0) {
      outside.push({
        name: layer.name,
        lowest,
        highest,
        minServiceTemperature: layer.minServiceTemperature,
        maxServiceTemperature: layer.maxServiceTemperature,
      });
    }
  }
  const unlimited = layers.length - limited.length;
  const unlimitedNote = unlimited > 0 ? ` ${unlimited} layer(s) give no range and were not checked.` : '';
  const reason =
    outside.length > 0
      ? `Outside the service range: ${outside.map(describe).join('; ')}.${unlimitedNote}`
      : `Every layer with a service range stays within it; the closest is ${margin.toFixed(2)} K from its limit.${unlimitedNote}`;
  return { ...base, verdict: outside.length > 0 ? 'fail' : 'pass', margin: { value: margin, unit: 'K' }, reason, layersOutside: outside };
}

function describe(layer: LayerOutsideServiceRange): string {
  const range = `${layer.minServiceTemperature ?? '−'} to ${layer.maxServiceTemperature ?? '−'} °C`;
  return `${layer.name} spans ${layer.lowest.toFixed(1)} to ${layer.highest.toFixed(1)} °C (allowed ${range})`;
}
