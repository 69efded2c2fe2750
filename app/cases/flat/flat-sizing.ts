/**
 * The flat kind's side of sizing: a flat surface as the sweep (app/cases/sizing/size-insulated.ts)
 * sees it, per m² of surface. Every thickness is solved by the flat surface's own calculation,
 * warm started from the thickness before. The fluid and freeze criteria need a run of pipe, and
 * the flat kind's sizing block refuses them by name (sizing-options.ts).
 */
import type { QuantityText } from '../../base/quantity-text.js';
import type { CaseContext } from '../case-kind.js';
import { stackStart } from '../insulated/stack-start.js';
import { prepareSizing, type PreparedSizing } from '../sizing/prepared-sizing.js';
import type { SizedCase, SolvedThickness } from '../sizing/size-insulated.js';
import { withLayerThickness } from '../sizing/sized-layers.js';
import { parseSizingOptions } from '../sizing/sizing-options.js';
import { calculateValidatedFlatSurface, type FlatSurfaceResult } from './flat-surface-calculation.js';
import type { FlatSurfaceInput } from './flat-surface-input.js';

export function prepareFlatSizing(value: unknown, input: FlatSurfaceInput, context: CaseContext): PreparedSizing {
  return prepareSizing(parseSizingOptions(value, 'flat', input.layers.length), input.layers, context, null);
}

function figuresOf(result: FlatSurfaceResult): SolvedThickness {
  return {
    heatLoss: result.heatFlowDensity,
    surfaceTemperature: result.surfaceTemperature,
    dewPoint: result.dewPoint,
    temperatureDrop: null,
    timeToZero: null,
    timeToFraction: null,
    start: stackStart(result.layers),
  };
}

export function flatSizedCase(input: FlatSurfaceInput, caseResult: FlatSurfaceResult, sizing: PreparedSizing, text: QuantityText): SizedCase {
  return {
    basis: 'per-square-metre',
    material: input.layers[sizing.layer]!.material.name,
    caseThickness: input.layers[sizing.layer]!.thickness,
    caseFigures: figuresOf(caseResult),
    operatingHours: input.operatingHours,
    touchLimit: input.touchLimit,
    runLength: null,
    costDiameter: null,
    figuresAt(thickness, start) {
      return figuresOf(calculateValidatedFlatSurface({ ...input, layers: withLayerThickness(input.layers, sizing.layer, thickness) }, text, start));
    },
    assumptions: [],
  };
}
