/**
 * The pipe kind: an insulated pipe run. Heat loss per metre and for the run, surface temperature,
 * and the surface checks (condensation, personnel protection, service temperature) on the solved
 * result.
 */
import type { JsonObject } from '../../base/field-checks.js';
import { quantityText } from '../../base/quantity-text.js';
import type { CaseKind } from '../case-kind.js';
import { withFields } from '../with-fields.js';
import { requireInsulatedConductivities } from '../insulated/insulated-conductivity-span.js';
import { methodNeedsEmissivity, outerSurfaceEmissivity } from '../insulated/insulated-inputs.js';
import { insulatedSolvedParts } from '../insulated/insulated-solved-parts.js';
import { withOperationDefaults } from '../insulated/operation-defaults.js';
import { calculateValidatedPipe, type PipeResult } from './pipe-calculation.js';
import { parsePipeCaseFile } from './pipe-case-file.js';
import { DEFAULT_SURFACE_METHOD, type PipeInput } from './pipe-input.js';
import { pipeReport } from './pipe-report.js';
import { resolvePipeSizeInCase, type PipeSize } from './pipe-sizes.js';
import { pipeSizedCase, preparePipeSizing } from './pipe-sizing.js';
import type { PreparedSizing } from '../sizing/prepared-sizing.js';
import { splitSizingBlock } from '../sizing/sizing-block.js';
import { withSizing, withSizingSection } from '../sizing/sized-solve.js';

/**
 * The validated pipe input, with the size it was named by (null when the diameter was given) and
 * its sizing made ready (null without a "sizing" block).
 */
export type PipeCase = PipeInput & { readonly pipeSize: PipeSize | null; readonly sizing: PreparedSizing | null };

export const pipeKind: CaseKind<PipeCase, PipeResult> = {
  kind: 'pipe',
  summary: 'an insulated pipe run: heat loss, surface temperature, condensation and touch checks',
  parse(file, context) {
    const { json, sizing } = splitSizingBlock(file);
    const sized = resolvePipeSizeInCase(json, context.pipeSizes);
    const { json: complete, assumptions } = withOperationDefaults(sized.json, { length: true }, quantityText(context.unitSystem));
    const input = parsePipeCaseFile(complete, context.resolveMaterial);
    requireInsulatedConductivities(complete as JsonObject, input, { entry: 'pipe', material: input.pipe.material });
    // Radiation needs the outer surface's emissivity: refuse a case without it now, not at the solve.
    if (methodNeedsEmissivity(input.surfaceMethod ?? DEFAULT_SURFACE_METHOD)) outerSurfaceEmissivity(input.layers, input.jacket);
    const prepared = sizing === undefined ? null : preparePipeSizing(sizing, input, context);
    return { title: input.title ?? 'Pipe', input: withFields(input, { pipeSize: sized.size, sizing: prepared }), assumptions };
  },
  solve({ input, assumptions }, text) {
    const result = calculateValidatedPipe(input, text);
    return withSizing(insulatedSolvedParts(result, assumptions), input.sizing, (s) => pipeSizedCase(input, result, s, text), text);
  },
  report(parsed, solved, text) {
    return withSizingSection(pipeReport(parsed.input, solved.result, { title: parsed.title, assumptions: solved.assumptions, text }), solved, 'per-metre', text);
  },
};
