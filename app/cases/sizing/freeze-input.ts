/**
 * The input of the freeze simulation of stagnant water in an insulated pipe, in SI (m, °C, m/s, s),
 * and its validation: one InputError naming the field and the allowed range, before anything runs.
 * The pipe, layers, jacket and surface method are those of the pipe case (app/cases/pipe), so a
 * sizing run builds this from a pipe case field by field. Every solid layer must give its density
 * and specific heat: the heat they store is part of what delays freezing, and no default is assumed.
 */
import { requireNumberIn, requirePositive, requireWholeNumber } from '../../base/field-checks.js';
import { QUANTITY_RANGES } from '../../base/quantity-ranges.js';
import { InputError } from '../../fe/errors.js';
import type { MaterialProperties } from '../../materials/material-properties.js';
import { requireInRange, requireOneOf } from '../../physics/input-checks.js';
import type { SurfaceMethod } from '../../physics/outer-surface-exchange.js';
import {
  INPUT_LIMITS,
  requireAboveAtMost,
  requireObjectField,
  requireTemperatureIn,
  validateInsulationLayers,
  validateJacket,
  validateMaterial,
  validateSurfaceMethod,
  type JacketInput,
} from '../insulated/insulated-inputs.js';
import type { MaterialLayer } from '../insulated/layer-build.js';
import { MAX_PIPE_DIAMETER } from '../pipe/pipe-input.js';
import { DEFAULT_FREEZING_RANGE, validateContents, WATER, type FreezingContents } from './freeze-contents.js';

export interface FreezeInput {
  readonly pipe: {
    /** m */
    readonly outerDiameter: number;
    /** m, less than the outer radius. */
    readonly wallThickness: number;
    readonly material: MaterialProperties;
  };
  /** Insulation layers, inside first (at least one). */
  readonly layers: readonly MaterialLayer[];
  readonly jacket?: JacketInput;
  /** Default 'horizontal'. */
  readonly orientation?: 'horizontal' | 'vertical';
  /** m, the height the air rises along a vertical pipe; required when vertical. */
  readonly height?: number;
  /** °C, of the water (and the pipe) when the flow stops; above the freezing range. */
  readonly initialTemperature: number;
  /** °C */
  readonly airTemperature: number;
  /** °C, radiant temperature of the surroundings (a clear night sky is colder than the air); default the air temperature. */
  readonly surroundingsTemperature?: number;
  /** m/s, 0 for still air. */
  readonly windSpeed: number;
  /** Default { kind: 'correlations' }, as the pipe case. */
  readonly surfaceMethod?: SurfaceMethod;
  /** Mass fraction of the water (0 < f ≤ 1) whose freezing time is reported; none: only the time to 0 °C. */
  readonly fraction?: number;
  /** s, the longest time simulated; default DEFAULT_MAX_TIME. */
  readonly maxTime?: number;
  /** Default WATER (data/physics/water-ice-properties.json). */
  readonly contents?: FreezingContents;
  /** For convergence studies; the defaults are what the tests show converged (see freeze-protection.ts). */
  readonly numerics?: {
    /** s; default from the time scale of the case. */
    readonly timeStep?: number;
    /** Whole factor on every layer's default element count; default 1. */
    readonly meshRefinement?: number;
    /** K; default DEFAULT_FREEZING_RANGE. */
    readonly freezingRange?: number;
  };
}

/** s: seven days, longer than any cold spell a freeze-protection design is usually asked to ride out (common practice, no source). */
export const DEFAULT_MAX_TIME = 7 * 24 * 3600;
/** s: one year, the longest simulation accepted. */
export const LONGEST_MAX_TIME = 366 * 24 * 3600;
/** °C: water warmer than this is no longer a freeze question. */
const WARMEST_INITIAL = 100;
const MAX_MESH_REFINEMENT = 64;
/** K: wider ranges would smear the freezing point beyond what the tests show harmless. */
const WIDEST_FREEZING_RANGE = 2;

/** A material of a layer that stores heat must give density and specific heat. */
function requireHeatCapacity(field: string, material: MaterialProperties): void {
  for (const [key, unit] of [['density', 'kg/m³'], ['specificHeat', 'J/(kg·K)']] as const) {
    const value = material[key];
    if (value === null || value === undefined) {
      throw new InputError(`${field}.${key}`, `${field}.${key} is needed for the freeze simulation (the heat the layer stores): give it in ${unit}.`);
    }
    requirePositive(`${field}.${key}`, value, unit);
  }
}

export function validateFreezeInput(input: unknown): asserts input is FreezeInput {
  requireObjectField('input', input, 'a freeze simulation input');
  const p = input as FreezeInput;
  requireObjectField('pipe', p.pipe, 'the pipe: outerDiameter, wallThickness and material');
  const d = requireAboveAtMost('pipe.outerDiameter', p.pipe.outerDiameter, 0, MAX_PIPE_DIAMETER, 'm', 'diameter');
  const wall = requireNumberIn('pipe.wallThickness', p.pipe.wallThickness, QUANTITY_RANGES.pipeWallThickness);
  if (!(wall < d / 2)) throw new InputError('pipe.wallThickness', `pipe.wallThickness must be less than half of pipe.outerDiameter (${d / 2} m) (got ${wall}).`);
  validateMaterial('pipe.material', p.pipe.material);
  requireHeatCapacity('pipe.material', p.pipe.material);
  validateInsulationLayers('layers', p.layers);
  p.layers.forEach((l, i) => requireHeatCapacity(`layers[${i}].material`, l.material));
  if (p.jacket !== undefined) {
    validateJacket('jacket', p.jacket);
    requireHeatCapacity('jacket.material', p.jacket.material);
  }
  const orientation = p.orientation === undefined ? 'horizontal' : requireOneOf('orientation', p.orientation, ['horizontal', 'vertical'] as const);
  if (orientation === 'vertical') requireNumberIn('height', p.height, QUANTITY_RANGES.pipeHeight);
  else if (p.height !== undefined) throw new InputError('height', `height applies only to a vertical pipe; remove it or set orientation to 'vertical'.`);

  if (p.contents !== undefined) validateContents('contents', p.contents);
  const contents = p.contents ?? WATER;
  const n = p.numerics;
  if (n !== undefined) {
    requireObjectField('numerics', n, 'the numerical settings: timeStep, meshRefinement, freezingRange');
    if (n.timeStep !== undefined) requireNumberIn('numerics.timeStep', n.timeStep, QUANTITY_RANGES.timeStep);
    if (n.meshRefinement !== undefined) requireWholeNumber('numerics.meshRefinement', n.meshRefinement, 1, MAX_MESH_REFINEMENT);
    if (n.freezingRange !== undefined) requireAboveAtMost('numerics.freezingRange', n.freezingRange, 0, WIDEST_FREEZING_RANGE, 'K');
  }
  const range = n?.freezingRange ?? DEFAULT_FREEZING_RANGE;
  // Water that starts inside the freezing range would start partly frozen in the model.
  const lowestStart = contents.freezingTemperature + range / 2;
  const t0 = requireTemperatureIn('initialTemperature', p.initialTemperature, [INPUT_LIMITS.innerTemperature[0], WARMEST_INITIAL]);
  if (!(t0 > lowestStart)) {
    throw new InputError('initialTemperature', `initialTemperature must be above ${lowestStart} °C, the top of the freezing range, and at most ${WARMEST_INITIAL} °C (got ${t0}).`);
  }
  requireTemperatureIn('airTemperature', p.airTemperature, INPUT_LIMITS.airTemperature);
  if (p.surroundingsTemperature !== undefined) requireTemperatureIn('surroundingsTemperature', p.surroundingsTemperature, INPUT_LIMITS.airTemperature);
  const [vMin, vMax] = INPUT_LIMITS.windSpeed;
  requireInRange('windSpeed', p.windSpeed, vMin, vMax, 'm/s', 'windSpeed');
  if (p.surfaceMethod !== undefined) validateSurfaceMethod('surfaceMethod', p.surfaceMethod, false);
  if (p.fraction !== undefined) requireAboveAtMost('fraction', p.fraction, 0, 1, '', 'fraction');
  if (p.maxTime !== undefined) requireAboveAtMost('maxTime', p.maxTime, 0, LONGEST_MAX_TIME, 's', 'time');
}
