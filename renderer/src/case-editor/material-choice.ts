/**
 * What the material search shows for each library material: λ where the layer works (its mean
 * temperature in the last result, 10 °C before there is one), the service range and μ, in the
 * project's units. Pure, so the words are tested without a page.
 */
import { conductivityAt } from '../../../app/fe/conductivity.js';
import type { MaterialProperties } from '../../../app/materials/material-properties.js';
import { displayPrecision, toDisplay, unitLabel, type UnitSystem } from '../../../app/base/unit-systems.js';
import type { QuantityName } from '../../../app/base/quantities.js';

/** Where λ is read before a layer has a result: the usual declared-value temperature (common practice, no source). */
export const REFERENCE_TEMPERATURE = 10;

function shown(value: number, quantity: QuantityName, system: UnitSystem): string {
  const precision = displayPrecision(quantity, system);
  const display = toDisplay(value, quantity, system);
  const text = 'decimals' in precision ? display.toFixed(precision.decimals) : String(Number(display.toPrecision(precision.significant)));
  return `${text.replace(/^-/, '−')}${unitLabel(quantity, system) ? ` ${unitLabel(quantity, system)}` : ''}`;
}

export function materialFacts(material: MaterialProperties, meanTemperature: number | undefined, system: UnitSystem): string[] {
  const at = meanTemperature ?? REFERENCE_TEMPERATURE;
  const facts = [`λ ${shown(conductivityAt(material.conductivity, at), 'conductivity', system)} at ${shown(at, 'temperature', system)}`];
  const low = material.minServiceTemperature;
  const high = material.maxServiceTemperature;
  if (low !== null || high !== null) {
    facts.push(`service ${low === null ? 'up' : shown(low, 'temperature', system)} to ${high === null ? 'no stated limit' : shown(high, 'temperature', system)}`);
  }
  const mu = material.vapourResistanceFactor;
  if (mu !== null) facts.push(mu === Number.POSITIVE_INFINITY ? 'vapour-tight' : `μ ${String(Number(mu.toPrecision(3)))}`);
  else if (material.equivalentAirLayerThickness !== null) facts.push(`s_d ${shown(material.equivalentAirLayerThickness, 'equivalentAirLayerThickness', system)}`);
  return facts;
}

/** Library materials whose name has every typed word, the slot's usual category first. */
export function searchMaterials<M extends MaterialProperties & { readonly id: number }>(materials: Iterable<M>, query: string, preferred: string | null): M[] {
  const words = query.toLowerCase().split(/\s+/).filter(Boolean);
  const found = [...materials].filter((m) => words.every((w) => m.name.toLowerCase().includes(w)));
  return found.sort((a, b) => Number(b.category === preferred) - Number(a.category === preferred) || a.name.localeCompare(b.name));
}
