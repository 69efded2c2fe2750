/**
 * Warnings for results that solved but rest on inputs used where they are not backed: a
 * conductivity curve read outside the temperatures of its data or the material's service range, a
 * temperature no insulated construction meets, or an extreme geometry. They never stop a result;
 * they travel with it (JSON, text, screen and report), so nothing is silently extrapolated.
 */
import { numberText } from '../base/number-text.js';
import { SI_TEXT, type QuantityText } from '../base/quantity-text.js';
import type { ConductivityModel } from '../fe/conductivity.js';

/** Above this no insulation or refractory lining is in service; common practice, no source. */
export const IMPLAUSIBLE_TEMPERATURE = 3000;
/** Inner radii outside this range (0.1 mm to 10 m) are not pipes, tubes or vessels. */
export const PLAUSIBLE_INNER_RADIUS = { min: 1e-4, max: 10 } as const;

export interface LayerTemperatureSpan {
  /** How the layer reads to a person ("Mineral wool pipe section"). */
  readonly name: string;
  readonly conductivity: ConductivityModel;
  /** Lowest and highest temperature the layer reaches in the result, °C. */
  readonly lowest: number;
  readonly highest: number;
  readonly minServiceTemperature?: number | null;
  readonly maxServiceTemperature?: number | null;
}

/** One warning per layer whose λ(θ) is read where neither its data nor its service range reaches; `text` writes its figures. */
export function conductivityUseWarnings(spans: readonly LayerTemperatureSpan[], text: QuantityText = SI_TEXT): string[] {
  const celsius = (t: number) => text.keepingSi(`${numberText(t, { decimals: 1 })} °C`, t, 'temperature');
  const given = (t: number) => text.given(t, 'temperature');
  const span = (a: number, b: number) => `${text.givenNumber(a, 'temperature')} to ${text.given(b, 'temperature')}`;
  const warnings: string[] = [];
  for (const s of spans) {
    const m = s.conductivity;
    if (m.kind === 'constant') continue;
    if (m.kind === 'table' && m.points.length > 1) {
      const first = m.points[0]![0];
      const last = m.points[m.points.length - 1]![0];
      if (s.lowest < first || s.highest > last) {
        const reached = s.lowest < first ? celsius(s.lowest) : celsius(s.highest);
        warnings.push(
          `${s.name}: its conductivity table covers ${span(first, last)} but the layer reaches ${reached}; beyond the table the end value is used unchanged.`,
        );
        continue;
      }
    }
    const low = s.minServiceTemperature ?? null;
    const high = s.maxServiceTemperature ?? null;
    if ((low !== null && s.lowest < low) || (high !== null && s.highest > high)) {
      const range = `${low === null ? 'no lower limit' : given(low)} to ${high === null ? 'no upper limit' : given(high)}`;
      const reached = low !== null && s.lowest < low ? celsius(s.lowest) : celsius(s.highest);
      warnings.push(`${s.name}: its conductivity curve is used at ${reached}, outside the material's service range (${range}), where the curve is not backed by data.`);
    }
  }
  return warnings;
}

/** A warning when any temperature of the result is above IMPLAUSIBLE_TEMPERATURE. */
export function temperaturePlausibilityWarnings(highest: number, text: QuantityText = SI_TEXT): string[] {
  if (!(highest > IMPLAUSIBLE_TEMPERATURE)) return [];
  const reached = text.keepingSi(`${highest.toPrecision(4)} °C`, highest, 'temperature');
  return [`Temperatures reach ${reached}, above the ${text.given(IMPLAUSIBLE_TEMPERATURE, 'temperature')} of any insulated or lined construction in service; check the inputs' units.`];
}

/** A warning for an inner radius outside PLAUSIBLE_INNER_RADIUS. */
export function geometryPlausibilityWarnings(innerRadius: number | null, text: QuantityText = SI_TEXT): string[] {
  if (innerRadius === null) return [];
  if (innerRadius < PLAUSIBLE_INNER_RADIUS.min) {
    const radius = text.keepingSi(`${(innerRadius * 1000).toPrecision(3)} mm`, innerRadius, 'position');
    const smallest = text.keepingSi('0.1 mm', PLAUSIBLE_INNER_RADIUS.min, 'position');
    return [`The inner radius of ${radius} is below ${smallest}, smaller than any tube; check the inputs' units (metres).`];
  }
  if (innerRadius > PLAUSIBLE_INNER_RADIUS.max) {
    const radius = text.keepingSi(`${innerRadius.toPrecision(3)} m`, innerRadius, 'length');
    const largest = text.keepingSi('10 m', PLAUSIBLE_INNER_RADIUS.max, 'length');
    return [`The inner radius of ${radius} is above ${largest}; a vessel that large is better treated as a flat surface.`];
  }
  return [];
}

/**
 * The temperature span of each layer from a solved profile (one or more snapshots of the nodal
 * temperatures at `positions`), so that a layer with heat generation counts its interior peak.
 */
export function layerSpansOfProfile(
  positions: readonly number[],
  snapshots: readonly (readonly number[])[],
  layers: readonly { readonly innerPosition: number; readonly outerPosition: number }[],
): { lowest: number; highest: number }[] {
  return layers.map(({ innerPosition, outerPosition }) => {
    let lowest = Infinity;
    let highest = -Infinity;
    positions.forEach((x, i) => {
      if (x < innerPosition || x > outerPosition) return;
      for (const snapshot of snapshots) {
        const t = snapshot[i]!;
        if (t < lowest) lowest = t;
        if (t > highest) highest = t;
      }
    });
    return { lowest, highest };
  });
}
