/**
 * The flat kind: an insulated flat surface (duct side, tank wall or roof, equipment casing), per m²
 * and for the area, with the same surface checks as a pipe.
 */
import type { JsonObject } from '../../base/field-checks.js';
import { quantityText } from '../../base/quantity-text.js';
import type { CaseKind } from '../case-kind.js';
import { requireInsulatedConductivities } from '../insulated/insulated-conductivity-span.js';
import { methodNeedsEmissivity, outerSurfaceEmissivity } from '../insulated/insulated-inputs.js';
import { insulatedSolvedParts } from '../insulated/insulated-solved-parts.js';
import { withOperationDefaults } from '../insulated/operation-defaults.js';
import { calculateValidatedFlatSurface, type FlatSurfaceResult } from './flat-surface-calculation.js';
import { parseFlatCaseFile } from './flat-case-file.js';
import type { FlatSurfaceInput } from './flat-surface-input.js';
import { flatReport } from './flat-report.js';

export const flatKind: CaseKind<FlatSurfaceInput, FlatSurfaceResult> = {
  kind: 'flat',
  summary: 'an insulated flat surface (duct, tank or equipment wall)',
  parse(json, context) {
    const { json: complete, assumptions } = withOperationDefaults(json, { length: false }, quantityText(context.unitSystem));
    const input = parseFlatCaseFile(complete, context.resolveMaterial);
    requireInsulatedConductivities(complete as JsonObject, input, input.wall ? { entry: 'wall', material: input.wall.material } : null);
    if (methodNeedsEmissivity(input.surfaceMethod ?? { kind: 'correlations' })) outerSurfaceEmissivity(input.layers, input.jacket);
    return { title: input.title ?? 'Flat surface', input, assumptions };
  },
  solve({ input, assumptions }, text) {
    return insulatedSolvedParts(calculateValidatedFlatSurface(input, text), assumptions);
  },
  report(parsed, solved, text) {
    return flatReport(parsed.input, solved.result, { title: parsed.title, assumptions: solved.assumptions, text });
  },
};
