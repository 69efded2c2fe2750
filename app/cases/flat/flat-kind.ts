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
import { flatSizedCase, prepareFlatSizing } from './flat-sizing.js';
import type { PreparedSizing } from '../sizing/prepared-sizing.js';
import { splitSizingBlock } from '../sizing/sizing-block.js';
import { withSizing, withSizingSection } from '../sizing/sized-solve.js';
import { withFields } from '../with-fields.js';

/** The validated flat-surface input with its sizing made ready (null without a "sizing" block). */
export type FlatCase = FlatSurfaceInput & { readonly sizing: PreparedSizing | null };

export const flatKind: CaseKind<FlatCase, FlatSurfaceResult> = {
  kind: 'flat',
  summary: 'an insulated flat surface (duct, tank or equipment wall)',
  parse(file, context) {
    const { json, sizing } = splitSizingBlock(file);
    const { json: complete, assumptions } = withOperationDefaults(json, { length: false }, quantityText(context.unitSystem));
    const input = parseFlatCaseFile(complete, context.resolveMaterial);
    requireInsulatedConductivities(complete as JsonObject, input, input.wall ? { entry: 'wall', material: input.wall.material } : null);
    if (methodNeedsEmissivity(input.surfaceMethod ?? { kind: 'correlations' })) outerSurfaceEmissivity(input.layers, input.jacket);
    const prepared = sizing === undefined ? null : prepareFlatSizing(sizing, input, context);
    return { title: input.title ?? 'Flat surface', input: withFields(input, { sizing: prepared }), assumptions };
  },
  solve({ input, assumptions }, text) {
    const result = calculateValidatedFlatSurface(input, text);
    return withSizing(insulatedSolvedParts(result, assumptions), input.sizing, (s) => flatSizedCase(input, result, s, text), text);
  },
  report(parsed, solved, text) {
    return withSizingSection(flatReport(parsed.input, solved.result, { title: parsed.title, assumptions: solved.assumptions, text }), solved, 'per-square-metre', text);
  },
};
