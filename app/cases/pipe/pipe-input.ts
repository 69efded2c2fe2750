/**
 * The inputs of the pipe calculation, in SI (m, °C, W/(m²·K), h/a), and their validation.
 * The field names match the pipe case file (app/cases/pipe-case-file.ts), so an error names the
 * same path in both. Radial layer order: pipe wall, insulation layers (inside first), jacket.
 */
import { SI_TEXT, type QuantityText } from '../../base/quantity-text.js';
import { requireNumberIn } from '../../base/field-checks.js';
import { QUANTITY_RANGES } from '../../base/quantity-ranges.js';
import { enteredPart } from '../../base/quantity-sentence.js';
import { InputError } from '../../fe/errors.js';
import type { MaterialProperties } from '../../materials/material-properties.js';
import { requireOneOf } from '../../physics/input-checks.js';
import type { SurfaceMethod } from '../../physics/outer-surface-exchange.js';
import {
  requireAboveAtMost,
  requireObjectField,
  validateAmbient,
  validateInnerCondition,
  validateInsulationLayers,
  validateJacket,
  validateMaterial,
  validateOperation,
  validateSurfaceMethod,
  type InsulatedSurfaceInput,
} from '../insulated/insulated-inputs.js';

export interface PipeInput extends InsulatedSurfaceInput {
  readonly pipe: {
    /** m, > 0 */
    readonly outerDiameter: number;
    /** m, > 0 and less than the outer radius. */
    readonly wallThickness: number;
    readonly material: MaterialProperties;
  };
  readonly orientation: 'horizontal' | 'vertical';
  /** m, vertical pipes only: the height the air rises along; default see verticalPipeHeight. */
  readonly height?: number;
  /** m, length of the run. */
  readonly length: number;
}

/** m; largest pipe outer diameter accepted. */
export const MAX_PIPE_DIAMETER = 5;
/** m; longest run accepted (a vertical pipe's height: QUANTITY_RANGES.pipeHeight). */
export const MAX_RUN_LENGTH = 1e6;

/**
 * Default height for natural convection on a vertical pipe: the run length, but at most 3 m.
 * Floors, supports, flanges and valves interrupt the rising boundary layer about once a storey,
 * so the air does not rise along a whole riser in one piece (common practice, no source). Above
 * a few metres the turbulent coefficient hardly depends on height anyway (h ∝ ΔT^(1/3)).
 */
export const VERTICAL_PIPE_DEFAULT_HEIGHT_CAP = 3;

export const DEFAULT_SURFACE_METHOD: SurfaceMethod = { kind: 'correlations' };

/** The height used for a vertical pipe, and how it was chosen. */
export function verticalPipeHeight(input: Pick<PipeInput, 'height' | 'length'>, text: QuantityText = SI_TEXT): { height: number; note: string } {
  if (input.height !== undefined) return { height: input.height, note: `height of the vertical pipe as given: ${text.keepingSi(`${input.height} m`, input.height, 'length')}` };
  // A run shorter than the smallest height a correlation takes is still a pipe of that height to the air.
  const height = Math.max(QUANTITY_RANGES.pipeHeight.min, Math.min(input.length, VERTICAL_PIPE_DEFAULT_HEIGHT_CAP));
  return {
    height,
    note: `height of the vertical pipe for convection taken as ${text.keepingSi(`${height} m`, height, 'length')}: the run length capped at ${text.given(VERTICAL_PIPE_DEFAULT_HEIGHT_CAP, 'length')} (one storey; common practice, no source)`,
  };
}

export function validatePipeInput(input: unknown): asserts input is PipeInput {
  requireObjectField('input', input, 'a pipe calculation input');
  const p = input as PipeInput;
  requireObjectField('pipe', p.pipe, 'the pipe: outerDiameter, wallThickness and material');
  const d = requireAboveAtMost('pipe.outerDiameter', p.pipe.outerDiameter, 0, MAX_PIPE_DIAMETER, 'm', 'diameter');
  const wall = requireNumberIn('pipe.wallThickness', p.pipe.wallThickness, QUANTITY_RANGES.pipeWallThickness);
  if (!(wall < d / 2)) {
    throw new InputError(
      'pipe.wallThickness',
      [
        'pipe.wallThickness must be at least ',
        enteredPart(QUANTITY_RANGES.pipeWallThickness.min, 'thickness', `${QUANTITY_RANGES.pipeWallThickness.min} m`),
        ' and less than half of pipe.outerDiameter (',
        enteredPart(d / 2, 'thickness', `${d / 2} m`),
        ') (got ',
        enteredPart(wall, 'thickness', String(wall)),
        ').',
      ],
    );
  }
  validateMaterial('pipe.material', p.pipe.material);
  validateInnerCondition('inner', p.inner);
  validateInsulationLayers('layers', p.layers);
  if (p.jacket !== undefined) validateJacket('jacket', p.jacket);
  const orientation = requireOneOf('orientation', p.orientation, ['horizontal', 'vertical'] as const);
  if (p.height !== undefined) {
    if (orientation !== 'vertical') throw new InputError('height', `height applies only to a vertical pipe; remove it or set orientation to 'vertical'.`);
    requireNumberIn('height', p.height, QUANTITY_RANGES.pipeHeight);
  }
  validateAmbient('ambient', p.ambient);
  if (p.surfaceMethod !== undefined) validateSurfaceMethod('surfaceMethod', p.surfaceMethod, false);
  requireAboveAtMost('length', p.length, 0, MAX_RUN_LENGTH, 'm', 'length');
  validateOperation(p.operatingHours, p.touchLimit);
}
