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
 * solve starts, in one sentence naming the field and its allowed range. The function itself
 * accepts any finite surface temperature: the engine hands it every intermediate iterate of its
 * Newton solve, and those can lie far from where the surface can be (see evaluationTemperature).
 */
import { enteredPart, figurePart, type Sentence } from '../base/quantity-sentence.js';
import type { FilmExchange } from '../fe/problem.js';
import { combinedConvection } from './combined-convection.js';
import { forcedConvectionCylinder } from './cylinder-cross-flow.js';
import { AIR_EXTRAPOLATION_LIMITS } from './air-properties.js';
import { KELVIN_OFFSET } from './constants.js';
import { InputError } from './errors.js';
import { naturalConvectionHorizontalCylinder } from './horizontal-cylinder-natural.js';
import { naturalConvectionHorizontalPlate } from './horizontal-plate-natural.js';
import { requireCelsius, requireFinite, requireInRange, requireNonNegative, requireOneOf, requirePositive } from './input-checks.js';
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
  /**
   * °C, the coldest and hottest temperature the case names (the fluid or inner face, the air, the
   * surroundings). With no heat source in the build-up the surface lies between them, so an
   * iterate outside them is evaluated at the nearer one; see evaluationTemperature.
   */
  readonly boundingTemperatures?: { readonly lowest: number; readonly highest: number };
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
  /** Use outside a correlation's or the air properties' range; figures as SI values of their kind (app/base/quantity-sentence). */
  readonly warnings: readonly Sentence[];
}

export type OuterSurfaceExchangeFunction = (surfaceTemperature: number) => OuterSurfaceExchange;

type ConvectionModel = (surfaceTemperature: number) => { coefficient: number; warnings: readonly Sentence[] };

/**
 * °C: the coldest surface temperature the film is evaluated at, 0.15 K. Radiation's T⁴ law needs a
 * temperature above absolute zero; no solution lies anywhere near this floor, so its exact value
 * only has to keep an iterate's evaluation defined.
 */
const COLDEST_EVALUATED = 0.15 - KELVIN_OFFSET;

/** Where the film may be evaluated: the case's bounding temperatures and what the air properties allow. */
interface EvaluationRange {
  readonly lowest: number;
  readonly highest: number;
  /** The air-property limits on the surface temperature, for the warning at a converged state. */
  readonly air: { readonly lowest: number; readonly highest: number } | null;
}

function evaluationRange(airTemperature: number, bounds: OuterSurfaceSpec['boundingTemperatures'], usesAirProperties: boolean): EvaluationRange {
  // The correlations take air properties at the film temperature (θ_s + θ_a)/2, known only within
  // the extrapolation limits; that bounds θ_s to 2·limit − θ_a.
  const air = usesAirProperties
    ? { lowest: 2 * AIR_EXTRAPOLATION_LIMITS.minimum - airTemperature, highest: 2 * AIR_EXTRAPOLATION_LIMITS.maximum - airTemperature }
    : null;
  let lowest = Math.max(COLDEST_EVALUATED, air?.lowest ?? -Infinity);
  let highest = air?.highest ?? Infinity;
  if (bounds) {
    lowest = Math.max(lowest, bounds.lowest);
    highest = Math.min(highest, bounds.highest);
  }
  // Bounds beyond the air limits on both sides cannot happen for a case (air at most 200 °C, so the
  // air allows a surface up to 600 °C); keep the range ordered all the same.
  return { lowest: Math.min(lowest, highest), highest, air };
}

/**
 * The surface temperature the film is evaluated at for an iterate θ_s. Newton's intermediate
 * iterates can lie hundreds of kelvin beyond the hottest named temperature (a step through a
 * steep λ(T) table), or below absolute zero, where neither the air properties nor radiation are
 * defined; refusing them would stop a solve whose answer is perfectly ordinary. So an iterate is
 * taken to the nearest temperature of the range. The film is then continuous in θ_s and constant
 * beyond the range's ends (the heat flow h·(θ_sink − θ_s) still grows with the distance), which
 * Newton's method handles, and a solution inside the range is evaluated exactly where it lies.
 */
function evaluationTemperature(surfaceTemperature: number, range: EvaluationRange): number {
  return Math.min(range.highest, Math.max(range.lowest, surfaceTemperature));
}

/**
 * The warning for a surface whose film temperature lies beyond the air properties' limits, when
 * those limits (not the case's bounding temperatures) are what it was evaluated at.
 */
function airLimitWarning(surfaceTemperature: number, evaluated: number, range: EvaluationRange, airTemperature: number): Sentence[] {
  const air = range.air;
  const heldAtLimit = air !== null && ((surfaceTemperature > air.highest && evaluated === air.highest) || (surfaceTemperature < air.lowest && evaluated === air.lowest));
  if (!heldAtLimit) return [];
  const film = (surfaceTemperature + airTemperature) / 2;
  const { minimum, maximum } = AIR_EXTRAPOLATION_LIMITS;
  return [
    [
      'The film temperature ',
      figurePart(film, 'temperature', `${film.toFixed(1)} °C`),
      ' is beyond the ',
      enteredPart(minimum, 'temperature', String(minimum), true),
      ' to ',
      enteredPart(maximum, 'temperature', `${maximum} °C`),
      ' the air properties are known for; convection was evaluated as at a surface of ',
      figurePart(evaluated, 'temperature', `${evaluated.toFixed(1)} °C`),
      '.',
    ],
  ];
}

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

function validBounds(bounds: OuterSurfaceSpec['boundingTemperatures']): OuterSurfaceSpec['boundingTemperatures'] {
  if (bounds === undefined) return undefined;
  const lowest = requireCelsius('boundingTemperatures.lowest', bounds?.lowest);
  const highest = requireCelsius('boundingTemperatures.highest', bounds?.highest);
  if (!(lowest <= highest)) {
    throw new InputError('boundingTemperatures.highest', `boundingTemperatures.highest must be at least boundingTemperatures.lowest (${lowest} °C) (got ${highest}).`);
  }
  return { lowest, highest };
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
    // The same exchange at every surface temperature: any finite iterate will do.
    return (surfaceTemperature) => {
      requireFinite('surfaceTemperature', surfaceTemperature, '°C');
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

  const range = evaluationRange(airTemperature, validBounds(spec.boundingTemperatures), methodKind === 'correlations');
  return (surfaceTemperature) => {
    const θs = requireFinite('surfaceTemperature', surfaceTemperature, '°C');
    const θe = evaluationTemperature(θs, range);
    const hc = convection(θe);
    const hr = radiationCoefficient(emissivity, θe, surroundingsTemperature);
    const total = hc.coefficient + hr;
    // With no film at all (ε = 0 and no convection) the sink is the air, and the coefficient is 0.
    const ambient = total > 0 ? (hc.coefficient * airTemperature + hr * surroundingsTemperature) / total : airTemperature;
    const warnings = θe === θs ? hc.warnings : [...airLimitWarning(θs, θe, range, airTemperature), ...hc.warnings];
    return { coefficient: total, ambient, convection: hc.coefficient, radiation: hr, warnings };
  };
}
