/**
 * The wall form's edge: turn what a person typed (text, millimetres) into an engine problem (SI),
 * and the engine's result into the few numbers the page shows. Every refusal is one sentence that
 * names the field and the allowed range; every number shown is checked finite first.
 */
import type { SteadyProblem, SteadyResult } from '../../../app/fe/index.js';

export const MAX_LAYERS = 3;

/** Allowed ranges. Wide enough for any wall or lining; narrow enough to catch a unit slip. */
export const LIMITS = {
  thicknessMillimetres: { min: 0.1, max: 1000 },
  conductivity: { min: 0.001, max: 500 },
  temperature: { min: -273.15, max: 1000 },
} as const;

export interface LayerDraft {
  thickness: string;
  conductivity: string;
}

export interface WallDraft {
  readonly insideTemperature: string;
  readonly outsideTemperature: string;
  readonly layers: readonly LayerDraft[];
}

/** A field id as used in the page (`inside`, `layer-1-thickness`, ...) and its one-sentence error. */
export interface FieldError {
  readonly field: string;
  readonly message: string;
}

export type WallReading =
  | { readonly ok: true; readonly problem: SteadyProblem; readonly resistance: number }
  | { readonly ok: false; readonly errors: readonly FieldError[] };

export function thicknessField(index: number): string {
  return `layer-${index + 1}-thickness`;
}

export function conductivityField(index: number): string {
  return `layer-${index + 1}-conductivity`;
}

export function readWall(draft: WallDraft): WallReading {
  const errors: FieldError[] = [];
  const read = (field: string, label: string, text: string, range: { min: number; max: number }, unit: string) => {
    const value = parseDecimal(text);
    if (value === undefined || value < range.min || value > range.max) {
      errors.push({ field, message: `${label} must be a number from ${range.min} to ${range.max} ${unit}.` });
      return Number.NaN;
    }
    return value;
  };

  const inside = read('inside', 'Inside surface temperature', draft.insideTemperature, LIMITS.temperature, '°C');
  const outside = read('outside', 'Outside surface temperature', draft.outsideTemperature, LIMITS.temperature, '°C');
  const layers = draft.layers.map((layer, i) => ({
    thickness:
      read(thicknessField(i), `Layer ${i + 1} thickness`, layer.thickness, LIMITS.thicknessMillimetres, 'mm') / 1000,
    conductivity: read(conductivityField(i), `Layer ${i + 1} conductivity`, layer.conductivity, LIMITS.conductivity, 'W/(m·K)'),
  }));
  if (errors.length > 0) return { ok: false, errors };

  return {
    ok: true,
    // Sum of d/λ: the series resistance of the layers, surface to surface.
    resistance: layers.reduce((sum, layer) => sum + layer.thickness / layer.conductivity, 0),
    problem: {
      geometry: { kind: 'planar' },
      layers: layers.map((layer) => ({
        thickness: layer.thickness,
        conductivity: { kind: 'constant', value: layer.conductivity },
      })),
      inner: { kind: 'temperature', temperature: inside },
      outer: { kind: 'temperature', temperature: outside },
    },
  };
}

/** Accepts "12", "-3.5", "0,035" (a decimal comma) and "1e-3"; anything else is not a number. */
export function parseDecimal(text: string): number | undefined {
  const cleaned = text.trim().replace('−', '-').replace(/^([-+]?\d*),(\d+)$/, '$1.$2');
  if (!/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(cleaned)) return undefined;
  const value = Number(cleaned);
  return Number.isFinite(value) ? value : undefined;
}

/** The numbers the page shows, all finite. */
export interface WallSummary {
  /** W/m², positive from the inside face to the outside face. */
  readonly heatFluxDensity: number;
  readonly insideTemperature: number;
  readonly outsideTemperature: number;
  /** °C at each interface, inside outwards. */
  readonly interfaceTemperatures: readonly number[];
  /** Heat in + heat out + generated, W/m²; zero for an exact steady state. */
  readonly balanceResidual: number;
  readonly balanceRelativeResidual: number;
  /** Layer boundaries (m from the inside face) and nodal temperature profile, for the drawing. */
  readonly layerBounds: readonly number[];
  readonly profile: readonly { readonly position: number; readonly temperature: number }[];
}

export function summarise(result: SteadyResult): WallSummary {
  const summary: WallSummary = {
    heatFluxDensity: result.faces.inner.heatFluxDensityIn,
    insideTemperature: result.faces.inner.temperature,
    outsideTemperature: result.faces.outer.temperature,
    interfaceTemperatures: result.interfaces.map((i) => i.temperatureInnerSide),
    balanceResidual: result.balance.residual,
    balanceRelativeResidual: result.balance.relativeResidual,
    layerBounds: [result.layers[0]?.innerPosition ?? 0, ...result.layers.map((l) => l.outerPosition)],
    profile: result.positions.map((position, i) => ({ position, temperature: result.temperatures[i] ?? Number.NaN })),
  };
  const numbers = [
    summary.heatFluxDensity,
    summary.insideTemperature,
    summary.outsideTemperature,
    summary.balanceResidual,
    summary.balanceRelativeResidual,
    ...summary.interfaceTemperatures,
    ...summary.layerBounds,
    ...summary.profile.flatMap((p) => [p.position, p.temperature]),
  ];
  if (!numbers.every(Number.isFinite)) {
    throw new Error('The engine returned a value that is not a finite number for this wall; please report the inputs.');
  }
  return summary;
}
