/**
 * The inputs of the flat-surface calculation (duct walls, tank walls, equipment casings), in SI,
 * and their validation. Same conditions as the pipe, in planar geometry: an optional wall sheet
 * (the tank or duct plate), insulation layers (inside first), an optional jacket, and the
 * orientation of the outer surface. Field names match the flat case file.
 */
import { requireNumberIn } from '../../base/field-checks.js';
import { QUANTITY_RANGES } from '../../base/quantity-ranges.js';
import { requireOneOf } from '../../physics/input-checks.js';
import type { MaterialLayer } from '../insulated/layer-build.js';
import {
  requireAboveAtMost,
  requireObjectField,
  validateAmbient,
  validateInnerCondition,
  validateInsulationLayers,
  validateJacket,
  validateMaterialLayer,
  validateOperation,
  validateSurfaceMethod,
  type InsulatedSurfaceInput,
} from '../insulated/insulated-inputs.js';

/** The outer surface's orientation and the length the air moves along. */
export type FlatSurfaceOrientation =
  /** A vertical surface of the given height (m). */
  | { readonly kind: 'vertical'; readonly height: number }
  /**
   * A horizontal surface whose outer face looks up (a tank roof) or down (the underside of a
   * duct); characteristic length = area / perimeter of the face (m).
   */
  | { readonly kind: 'horizontal'; readonly facing: 'up' | 'down'; readonly characteristicLength: number };

export interface FlatSurfaceInput extends InsulatedSurfaceInput {
  /** The vessel or duct plate, when it is modelled. */
  readonly wall?: MaterialLayer;
  readonly surface: FlatSurfaceOrientation;
  /** m² of surface. */
  readonly area: number;
}

/** m², largest area accepted. */
export const MAX_FLAT_AREA = 1e6;

export function validateFlatSurfaceInput(input: unknown): asserts input is FlatSurfaceInput {
  requireObjectField('input', input, 'a flat-surface calculation input');
  const f = input as FlatSurfaceInput;
  if (f.wall !== undefined) validateMaterialLayer('wall', f.wall, QUANTITY_RANGES.insulationThickness);
  validateInnerCondition('inner', f.inner);
  validateInsulationLayers('layers', f.layers);
  if (f.jacket !== undefined) validateJacket('jacket', f.jacket);
  requireObjectField('surface', f.surface, "the surface orientation: { kind: 'vertical', height } or { kind: 'horizontal', facing, characteristicLength }");
  const kind = requireOneOf('surface.kind', f.surface.kind, ['vertical', 'horizontal'] as const);
  if (kind === 'vertical') {
    requireNumberIn('surface.height', (f.surface as { height: unknown }).height, QUANTITY_RANGES.surfaceLength);
  } else {
    const s = f.surface as { facing: unknown; characteristicLength: unknown };
    requireOneOf('surface.facing', s.facing, ['up', 'down'] as const);
    requireNumberIn('surface.characteristicLength', s.characteristicLength, QUANTITY_RANGES.surfaceLength);
  }
  validateAmbient('ambient', f.ambient);
  if (f.surfaceMethod !== undefined) validateSurfaceMethod('surfaceMethod', f.surfaceMethod, kind === 'horizontal');
  requireAboveAtMost('area', f.area, 0, MAX_FLAT_AREA, 'm²', 'area');
  validateOperation(f.operatingHours, f.touchLimit);
}
