/**
 * Inputs the pipe and the flat-surface calculations share (inner condition, surrounding air,
 * insulation layers, jacket, surface method) and their validation. Every check throws one
 * InputError whose sentence names the field path and the allowed range, before the engine runs.
 * All values SI, temperatures in °C, relative humidity a fraction 0..1.
 */
import { requireNumberIn } from '../../base/field-checks.js';
import type { NumberRange } from '../../base/number-range.js';
import type { QuantityName } from '../../base/quantities.js';
import { enteredPart, rangePart, type SentencePart } from '../../base/quantity-sentence.js';
import { QUANTITY_RANGES } from '../../base/quantity-ranges.js';
import { InputError } from '../../fe/errors.js';
import { validateConductivity } from '../../fe/validate.js';
import { MATERIAL_CATEGORIES, type MaterialProperties } from '../../materials/material-properties.js';
import { requireCelsius, requireFinite, requireInRange, requireOneOf } from '../../physics/input-checks.js';
import type { Exposure, SurfaceMethod } from '../../physics/outer-surface-exchange.js';
import type { MaterialLayer } from './layer-build.js';

/** What sits inside the pipe or behind the flat surface. */
export type InnerCondition =
  /** A fluid at `temperature` (°C) with an inside film coefficient (W/(m²·K) > 0) on the inner face. */
  | { readonly kind: 'fluid'; readonly temperature: number; readonly coefficient: number }
  /** The inner face itself held at `temperature` (°C). */
  | { readonly kind: 'surface'; readonly temperature: number };

export interface AmbientConditions {
  /** °C */
  readonly airTemperature: number;
  /** °C, radiant temperature of the surroundings; default the air temperature. */
  readonly surroundingsTemperature?: number;
  /** Fraction above 0 and at most 1 (0.6 = 60 %). */
  readonly relativeHumidity: number;
  /** Indoor (still air) or outdoor with a wind speed in m/s. */
  readonly exposure: Exposure;
}

/** A thin sheet over the insulation; `emissivity` (0..1) overrides the material's. */
export interface JacketInput extends MaterialLayer {
  readonly emissivity?: number;
}

/** What a pipe and a flat surface share: the insulation build-up, its conditions and its use. */
export interface InsulatedSurfaceInput {
  /** Free text for reports; not used by the calculation. */
  readonly title?: string;
  readonly inner: InnerCondition;
  /** Insulation layers, inside first (at least one). */
  readonly layers: readonly MaterialLayer[];
  readonly jacket?: JacketInput;
  readonly ambient: AmbientConditions;
  /** Default { kind: 'correlations' }. */
  readonly surfaceMethod?: SurfaceMethod;
  /** h per year. */
  readonly operatingHours: number;
  /** °C, default DEFAULT_TOUCH_LIMIT (app/checks/personnel-protection.ts). */
  readonly touchLimit?: number;
}

/**
 * Limits of the accepted inputs; beyond them the engine's physics is not meant to be used. Lengths
 * (layers, jacket, pipe wall, heights) take their ranges from QUANTITY_RANGES (app/base).
 */
export const INPUT_LIMITS = {
  /** °C, process side (cryogenic to high-temperature lines). */
  innerTemperature: [-270, 1000],
  /** °C, air and surroundings. */
  airTemperature: [-100, 200],
  /** W/(m²·K), inside film coefficient. */
  innerCoefficient: [0, 1e6],
  /** m/s */
  windSpeed: [0, 60],
  /** Number of insulation layers. */
  layerCount: [1, 20],
  /** h per year (366 days at most). */
  operatingHours: [0, 8784],
  /** °C */
  touchLimit: [0, 100],
} as const;

export const SURFACE_METHOD_KINDS = ['correlations', 'simplified', 'fixed-convection', 'fixed-coefficient', 'fixed-resistance'] as const;

export function requireTemperatureIn(field: string, value: unknown, [min, max]: readonly [number, number]): number {
  return requireInRange(field, requireCelsius(field, value), min, max, '°C', 'temperature');
}

/** A number in (min, max]: greater than min, at most max; `quantity` is the kind of `unit`, for a refusal in a project's units. */
export function requireAboveAtMost(field: string, value: unknown, min: number, max: number, unit: string, quantity?: QuantityName): number {
  const v = requireFinite(field, value, unit, quantity);
  if (!(v > min && v <= max)) {
    const figure = (x: number, si: string): SentencePart => (quantity === undefined ? si : enteredPart(x, quantity, si));
    throw new InputError(field, [`${field} must be greater than `, figure(min, `${min} ${unit}`), ' and at most ', figure(max, `${max} ${unit}`), ' (got ', figure(v, String(v)), ').']);
  }
  return v;
}

export function requireObjectField(field: string, value: unknown, what: string): void {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new InputError(field, `${field} must be ${what}.`);
  }
}

export function validateRelativeHumidity(field: string, value: unknown): number {
  const rh = requireFinite(field, value, 'fraction');
  if (!(rh > 0 && rh <= 1)) {
    // Parts, so a form showing humidity in per cent says "more than 0 and at most 100 % (got 150 %)".
    const allowed = rangePart({ min: 0, minExclusive: true, max: 1, unit: '' }, 'relativeHumidity', 'a fraction above 0 and at most 1 (above 0 up to 100 %)');
    throw new InputError(field, [`${field} must be `, allowed, ' (got ', enteredPart(rh, 'relativeHumidity', String(rh)), ').']);
  }
  return rh;
}

export function validateMaterial(field: string, material: unknown): void {
  requireObjectField(field, material, 'a material with a name and a conductivity');
  const m = material as MaterialProperties;
  if (typeof m.name !== 'string' || m.name.trim() === '' || m.name.length > 200) {
    throw new InputError(`${field}.name`, `${field}.name must be text of 1 to 200 characters.`);
  }
  requireOneOf(`${field}.category`, m.category, MATERIAL_CATEGORIES);
  validateConductivity(m.conductivity, `${field}.conductivity`);
  if (m.emissivity !== null && m.emissivity !== undefined) requireInRange(`${field}.emissivity`, m.emissivity, 0, 1);
  const min = m.minServiceTemperature;
  const max = m.maxServiceTemperature;
  if (min !== null && min !== undefined) requireCelsius(`${field}.minServiceTemperature`, min);
  if (max !== null && max !== undefined) requireCelsius(`${field}.maxServiceTemperature`, max);
  if (typeof min === 'number' && typeof max === 'number' && !(min < max)) {
    throw new InputError(
      `${field}.maxServiceTemperature`,
      [`${field}.maxServiceTemperature must be above ${field}.minServiceTemperature (`, enteredPart(min, 'temperature', `${min} °C`), ') (got ', enteredPart(max, 'temperature', String(max)), ').'],
    );
  }
}

export function validateInnerCondition(field: string, inner: unknown): void {
  requireObjectField(field, inner, "an inner condition: { kind: 'fluid', temperature, coefficient } or { kind: 'surface', temperature }");
  const c = inner as InnerCondition;
  const kind = requireOneOf(`${field}.kind`, c.kind, ['fluid', 'surface'] as const);
  requireTemperatureIn(`${field}.temperature`, c.temperature, INPUT_LIMITS.innerTemperature);
  if (kind === 'fluid') {
    const [min, max] = INPUT_LIMITS.innerCoefficient;
    requireAboveAtMost(`${field}.coefficient`, (c as { coefficient: unknown }).coefficient, min, max, 'W/(m²·K)', 'filmCoefficient');
  }
}

export function validateAmbient(field: string, ambient: unknown): void {
  requireObjectField(field, ambient, 'the surrounding air: airTemperature, relativeHumidity and exposure');
  const a = ambient as AmbientConditions;
  requireTemperatureIn(`${field}.airTemperature`, a.airTemperature, INPUT_LIMITS.airTemperature);
  if (a.surroundingsTemperature !== undefined) {
    requireTemperatureIn(`${field}.surroundingsTemperature`, a.surroundingsTemperature, INPUT_LIMITS.airTemperature);
  }
  validateRelativeHumidity(`${field}.relativeHumidity`, a.relativeHumidity);
  requireObjectField(`${field}.exposure`, a.exposure, "{ kind: 'indoor' } or { kind: 'outdoor', windSpeed }");
  const kind = requireOneOf(`${field}.exposure.kind`, a.exposure.kind, ['indoor', 'outdoor'] as const);
  if (kind === 'outdoor') {
    const [min, max] = INPUT_LIMITS.windSpeed;
    requireInRange(`${field}.exposure.windSpeed`, (a.exposure as { windSpeed: unknown }).windSpeed, min, max, 'm/s', 'windSpeed');
  }
}

export function validateMaterialLayer(field: string, layer: unknown, thickness: NumberRange): void {
  requireObjectField(field, layer, 'a layer with a material and a thickness');
  const l = layer as MaterialLayer;
  validateMaterial(`${field}.material`, l.material);
  requireNumberIn(`${field}.thickness`, l.thickness, thickness);
}

export function validateInsulationLayers(field: string, layers: unknown): void {
  const [min, max] = INPUT_LIMITS.layerCount;
  if (!Array.isArray(layers) || layers.length < min || layers.length > max) {
    throw new InputError(field, `${field} must list ${min} to ${max} insulation layers, inside first.`);
  }
  layers.forEach((layer, i) => validateMaterialLayer(`${field}[${i}]`, layer, QUANTITY_RANGES.insulationThickness));
}

export function validateJacket(field: string, jacket: unknown): void {
  validateMaterialLayer(field, jacket, QUANTITY_RANGES.jacketThickness);
  const e = (jacket as JacketInput).emissivity;
  if (e !== undefined) requireInRange(`${field}.emissivity`, e, 0, 1);
}

export function validateSurfaceMethod(field: string, method: unknown, horizontalSurface: boolean): void {
  requireObjectField(field, method, `a surface method: one of ${SURFACE_METHOD_KINDS.join(', ')}`);
  const m = method as SurfaceMethod;
  const kind = requireOneOf(`${field}.kind`, m.kind, SURFACE_METHOD_KINDS);
  if (kind === 'simplified' && horizontalSurface) {
    throw new InputError(`${field}.kind`, `${field}.kind 'simplified' has no formula for a horizontal surface; choose 'correlations' or a fixed coefficient.`);
  }
  if (kind === 'fixed-convection') requireInRange(`${field}.coefficient`, (m as { coefficient: unknown }).coefficient, 0, 1e4, 'W/(m²·K)', 'filmCoefficient');
  if (kind === 'fixed-coefficient') requireAboveAtMost(`${field}.coefficient`, (m as { coefficient: unknown }).coefficient, 0, 1e4, 'W/(m²·K)', 'filmCoefficient');
  if (kind === 'fixed-resistance') requireAboveAtMost(`${field}.resistance`, (m as { resistance: unknown }).resistance, 0, 100, 'm²·K/W', 'thermalResistance');
}

export function validateOperation(operatingHours: unknown, touchLimit: unknown): void {
  const [hMin, hMax] = INPUT_LIMITS.operatingHours;
  requireInRange('operatingHours', operatingHours, hMin, hMax, 'h/a');
  if (touchLimit !== undefined) requireTemperatureIn('touchLimit', touchLimit, INPUT_LIMITS.touchLimit);
}

/** Methods that add radiation need the outer surface's emissivity. */
export function methodNeedsEmissivity(method: SurfaceMethod): boolean {
  return method.kind !== 'fixed-coefficient' && method.kind !== 'fixed-resistance';
}

export interface ResolvedEmissivity {
  readonly value: number;
  /** The input field the value came from (a case-file path, for the result's reader). */
  readonly from: string;
  /** Where it came from in words, for the report ("the value of the jacket's material"). */
  readonly source: string;
}

/**
 * The emissivity of the outer surface: the jacket's own value, else the jacket material's, else
 * (no jacket) the outermost insulation material's. Missing → InputError naming where to give it.
 */
export function outerSurfaceEmissivity(layers: readonly MaterialLayer[], jacket: JacketInput | undefined): ResolvedEmissivity {
  if (jacket) {
    if (jacket.emissivity !== undefined) return { value: jacket.emissivity, from: 'jacket.emissivity', source: 'as given for the jacket surface' };
    if (jacket.material.emissivity !== null && jacket.material.emissivity !== undefined) {
      return { value: jacket.material.emissivity, from: 'jacket.material.emissivity', source: "the value of the jacket's material" };
    }
    throw new InputError(
      'jacket.emissivity',
      'jacket.emissivity is needed for the radiation from the jacket: give a value from 0 to 1 there or on the jacket material.',
    );
  }
  const last = layers.length - 1;
  const field = `layers[${last}].material.emissivity`;
  const e = layers[last]!.material.emissivity;
  if (e === null || e === undefined) {
    throw new InputError(
      field,
      `${field} is needed for the radiation from the bare insulation surface: give a value from 0 to 1, or add a jacket with an emissivity.`,
    );
  }
  return { value: e, from: field, source: `the value of the material of layer ${last + 1}, with no jacket over it` };
}
