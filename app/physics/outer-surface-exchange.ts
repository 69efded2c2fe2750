/**
 * The film condition of an outer surface (insulation jacket, wall face) as a function of its
 * temperature, for the FE engine's `FilmCoefficient`.
 *
 * Heat leaves by convection to the air at θ_a and by radiation to surroundings at θ_r:
 *   q = h_c (θ_s − θ_a) + h_r (θ_s − θ_r) = (h_c + h_r)(θ_s − θ_ambient),
 *   θ_ambient = (h_c θ_a + h_r θ_r)/(h_c + h_r),
 * so one coefficient and one effective sink temperature carry both paths. Both coefficients
 * depend on θ_s, which is why the builder returns a function; the engine iterates on it.
 *
 * The spec is validated once, when the function is built, so a bad field is reported before the
 * solve starts, in one sentence naming the field and its allowed range.
 */
import type { FilmExchange } from '../fe/problem.js';
import { combinedConvection } from './combined-convection.js';
import { forcedConvectionCylinder } from './cylinder-cross-flow.js';
import { InputError } from './errors.js';
import { naturalConvectionHorizontalCylinder } from './horizontal-cylinder-natural.js';
import { naturalConvectionHorizontalPlate } from './horizontal-plate-natural.js';
import { requireCelsius, requireInRange, requireNonNegative, requireOneOf, requirePositive } from './input-checks.js';
import { forcedConvectionPlate } from './plate-parallel-flow.js';
import { radiationCoefficient } from './radiation.js';
import { simplifiedConvection, type SimplifiedCase, type SimplifiedCaseRow } from './simplified-convection.js';
import type { ConvectionResult } from './convection-result.js';
import { naturalConvectionVerticalSurface } from './vertical-surface-natural.js';

export type OuterSurfaceShape =
  /** A pipe's outer surface; `height` (m) is needed for a vertical pipe. Wind is taken across the pipe. */
  | {
      readonly kind: 'pipe';
      readonly orientation: 'horizontal' | 'vertical';
      /** m, > 0 */
      readonly outerDiameter: number;
      readonly height?: number;
    }
  /** A vertical flat surface of the given height; wind along it over `windFlowLength` (default the height). */
  | { readonly kind: 'vertical-wall'; readonly height: number; readonly windFlowLength?: number }
  /** A horizontal flat surface facing up or down; characteristic length = area/perimeter. */
  | {
      readonly kind: 'horizontal-surface';
      readonly facing: 'up' | 'down';
      readonly characteristicLength: number;
      readonly windFlowLength?: number;
    };

export type Exposure =
  /** Still air. */
  | { readonly kind: 'indoor' }
  /** Wind, m/s ≥ 0; 0 means still air. */
  | { readonly kind: 'outdoor'; readonly windSpeed: number };

export type SurfaceMethod =
  /** General correlations (Churchill–Chu, Churchill–Bernstein, flat plate; mixed n = 3) plus radiation. */
  | { readonly kind: 'correlations' }
  /** Simplified trade formulas plus radiation; an edited formula table may be supplied. */
  | { readonly kind: 'simplified'; readonly table?: readonly SimplifiedCaseRow[] }
  /** User-fixed convective coefficient h_c, W/(m²·K) ≥ 0, plus radiation. */
  | { readonly kind: 'fixed-convection'; readonly coefficient: number }
  /** User-fixed total surface coefficient h_se, W/(m²·K) > 0, to the air; no separate radiation. */
  | { readonly kind: 'fixed-coefficient'; readonly coefficient: number }
  /** User-fixed surface resistance R_se per m² of the surface, m²·K/W > 0, to the air. */
  | { readonly kind: 'fixed-resistance'; readonly resistance: number };

export interface OuterSurfaceSpec {
  readonly shape: OuterSurfaceShape;
  readonly exposure: Exposure;
  readonly method: SurfaceMethod;
  /** °C */
  readonly airTemperature: number;
  /** °C, radiant temperature of the surroundings; default the air temperature. */
  readonly surroundingsTemperature?: number;
  /** Total hemispherical emissivity 0..1; required by every method that adds radiation. */
  readonly emissivity?: number;
}

export interface OuterSurfaceExchange extends FilmExchange {
  /** h_c + h_r, W/(m²·K) */
  readonly coefficient: number;
  /** °C, the sink temperature of the combined film. */
  readonly ambient: number;
  /** h_c, W/(m²·K) */
  readonly convection: number;
  /** h_r, W/(m²·K) */
  readonly radiation: number;
  readonly warnings: readonly string[];
}

export type OuterSurfaceExchangeFunction = (surfaceTemperature: number) => OuterSurfaceExchange;

type ConvectionModel = (surfaceTemperature: number) => { coefficient: number; warnings: readonly string[] };

function validateShape(shape: OuterSurfaceShape): void {
  if (typeof shape !== 'object' || shape === null) {
    throw new InputError('shape', `shape must be a pipe, a vertical wall or a horizontal surface.`);
  }
  const kind = requireOneOf('shape.kind', shape.kind, ['pipe', 'vertical-wall', 'horizontal-surface'] as const);
  if (kind === 'pipe' && shape.kind === 'pipe') {
    requireOneOf('shape.orientation', shape.orientation, ['horizontal', 'vertical'] as const);
    requirePositive('shape.outerDiameter', shape.outerDiameter, 'm');
    if (shape.orientation === 'vertical') requirePositive('shape.height', shape.height, 'm');
  } else if (shape.kind === 'vertical-wall') {
    requirePositive('shape.height', shape.height, 'm');
    if (shape.windFlowLength !== undefined) requirePositive('shape.windFlowLength', shape.windFlowLength, 'm');
  } else if (shape.kind === 'horizontal-surface') {
    requireOneOf('shape.facing', shape.facing, ['up', 'down'] as const);
    requirePositive('shape.characteristicLength', shape.characteristicLength, 'm');
    if (shape.windFlowLength !== undefined) requirePositive('shape.windFlowLength', shape.windFlowLength, 'm');
  }
}

/** Wind speed in m/s; 0 for still air. */
function windSpeedOf(exposure: Exposure): number {
  if (typeof exposure !== 'object' || exposure === null) {
    throw new InputError('exposure', `exposure must be 'indoor' (still air) or 'outdoor' with a wind speed.`);
  }
  const kind = requireOneOf('exposure.kind', exposure.kind, ['indoor', 'outdoor'] as const);
  return kind === 'outdoor' && exposure.kind === 'outdoor'
    ? requireNonNegative('exposure.windSpeed', exposure.windSpeed, 'm/s')
    : 0;
}

/** Still-air convection from the general correlations. */
function naturalCorrelation(shape: OuterSurfaceShape, airTemperature: number): (θs: number) => ConvectionResult {
  switch (shape.kind) {
    case 'pipe':
      return shape.orientation === 'horizontal'
        ? (θs) => naturalConvectionHorizontalCylinder({ surfaceTemperature: θs, airTemperature, diameter: shape.outerDiameter })
        : (θs) =>
            naturalConvectionVerticalSurface({
              surfaceTemperature: θs,
              airTemperature,
              height: shape.height!,
              diameter: shape.outerDiameter,
            });
    case 'vertical-wall':
      return (θs) => naturalConvectionVerticalSurface({ surfaceTemperature: θs, airTemperature, height: shape.height });
    case 'horizontal-surface':
      return (θs) =>
        naturalConvectionHorizontalPlate({
          surfaceTemperature: θs,
          airTemperature,
          characteristicLength: shape.characteristicLength,
          facing: shape.facing,
        });
  }
}

/** Wind convection from the general correlations. */
function forcedCorrelation(shape: OuterSurfaceShape, airTemperature: number, windSpeed: number): (θs: number) => ConvectionResult {
  switch (shape.kind) {
    case 'pipe':
      return (θs) => forcedConvectionCylinder({ surfaceTemperature: θs, airTemperature, diameter: shape.outerDiameter, windSpeed });
    case 'vertical-wall':
      return (θs) =>
        forcedConvectionPlate({ surfaceTemperature: θs, airTemperature, length: shape.windFlowLength ?? shape.height, windSpeed });
    case 'horizontal-surface':
      return (θs) =>
        forcedConvectionPlate({
          surfaceTemperature: θs,
          airTemperature,
          length: shape.windFlowLength ?? shape.characteristicLength,
          windSpeed,
        });
  }
}

function correlationModel(shape: OuterSurfaceShape, airTemperature: number, windSpeed: number): ConvectionModel {
  const natural = naturalCorrelation(shape, airTemperature);
  if (windSpeed === 0) return natural;
  const forced = forcedCorrelation(shape, airTemperature, windSpeed);
  // Wind is horizontal and buoyancy vertical: transverse flow, so the parts add (n = 3).
  return (θs) => combinedConvection(forced(θs), natural(θs), 'assisting-or-transverse');
}

function simplifiedModel(
  shape: OuterSurfaceShape,
  airTemperature: number,
  windSpeed: number,
  table: readonly SimplifiedCaseRow[] | undefined,
): ConvectionModel {
  if (shape.kind === 'horizontal-surface') {
    throw new InputError(
      'method',
      `method 'simplified' has no formula for a horizontal surface; choose 'correlations' or a fixed coefficient.`,
    );
  }
  const [naturalCase, naturalLength]: [SimplifiedCase, number] =
    shape.kind === 'pipe'
      ? shape.orientation === 'horizontal'
        ? ['horizontal-pipe-natural', shape.outerDiameter]
        : ['vertical-natural', shape.height!]
      : ['vertical-natural', shape.height];
  const [windCase, windLength]: [SimplifiedCase, number] =
    shape.kind === 'pipe' ? ['pipe-wind', shape.outerDiameter] : ['wall-wind', shape.windFlowLength ?? shape.height];
  return (θs) => {
    const temperatureDifference = θs - airTemperature;
    const natural = simplifiedConvection({ case: naturalCase, temperatureDifference, length: naturalLength }, table);
    if (windSpeed === 0) return natural;
    const wind = simplifiedConvection({ case: windCase, temperatureDifference, length: windLength, windSpeed }, table);
    // The standard's wind formulas alone would fall below still air as v → 0; taking the larger
    // of the two keeps the still-air floor (common practice, no source).
    return wind.coefficient >= natural.coefficient ? wind : natural;
  };
}

/** Builds h(θ_s) for the FE film condition; throws InputError for a bad spec. */
export function outerSurfaceExchange(spec: OuterSurfaceSpec): OuterSurfaceExchangeFunction {
  if (typeof spec !== 'object' || spec === null) {
    throw new InputError('spec', 'spec must be an object describing the outer surface.');
  }
  validateShape(spec.shape);
  const windSpeed = windSpeedOf(spec.exposure);
  const airTemperature = requireCelsius('airTemperature', spec.airTemperature);
  const method = spec.method;
  const methodKind = requireOneOf('method.kind', method?.kind, [
    'correlations',
    'simplified',
    'fixed-convection',
    'fixed-coefficient',
    'fixed-resistance',
  ] as const);

  if (method.kind === 'fixed-coefficient' || method.kind === 'fixed-resistance') {
    const coefficient =
      method.kind === 'fixed-coefficient'
        ? requirePositive('method.coefficient', method.coefficient, 'W/(m²·K)')
        : 1 / requirePositive('method.resistance', method.resistance, 'm²·K/W');
    const exchange: OuterSurfaceExchange = {
      coefficient,
      ambient: airTemperature,
      convection: coefficient,
      radiation: 0,
      warnings: [],
    };
    return (surfaceTemperature) => {
      requireCelsius('surfaceTemperature', surfaceTemperature);
      return exchange;
    };
  }

  const surroundingsTemperature =
    spec.surroundingsTemperature === undefined
      ? airTemperature
      : requireCelsius('surroundingsTemperature', spec.surroundingsTemperature);
  const emissivity = requireInRange('emissivity', spec.emissivity, 0, 1);

  let convection: ConvectionModel;
  switch (methodKind) {
    case 'fixed-convection': {
      const h = requireNonNegative('method.coefficient', (method as { coefficient: number }).coefficient, 'W/(m²·K)');
      convection = () => ({ coefficient: h, warnings: [] });
      break;
    }
    case 'simplified':
      convection = simplifiedModel(spec.shape, airTemperature, windSpeed, (method as { table?: readonly SimplifiedCaseRow[] }).table);
      break;
    default:
      convection = correlationModel(spec.shape, airTemperature, windSpeed);
  }

  return (surfaceTemperature) => {
    const θs = requireCelsius('surfaceTemperature', surfaceTemperature);
    const hc = convection(θs);
    const hr = radiationCoefficient(emissivity, θs, surroundingsTemperature);
    const total = hc.coefficient + hr;
    // With no film at all (ε = 0 and no convection) the sink is the air, and the coefficient is 0.
    const ambient = total > 0 ? (hc.coefficient * airTemperature + hr * surroundingsTemperature) / total : airTemperature;
    return { coefficient: total, ambient, convection: hc.coefficient, radiation: hr, warnings: hc.warnings };
  };
}
