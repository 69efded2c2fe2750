/**
 * The case editor's solver, off the page's main thread so typing never waits for a solve: it runs
 * `solveCase` on each case the page sends, with the library materials the case refers to, the
 * pipe-size tables, the shipped thickness series and installed-cost tables (for a sizing) and the project's units, and answers with the report model or the engine's one-sentence refusal
 * (kept as parts, so the page writes it in the units and words of the box beside it: refusal-text).
 */
import { InputError, solveCase, type PipeSize } from '../../../app/index.js';
import type { MaterialProperties } from '../../../app/materials/material-properties.js';
import { layerMeansOf } from './layer-means.js';
import { SHIPPED_INSTALLED_COST_TABLES } from './shipped-installed-costs.js';
import { SHIPPED_THICKNESS_SERIES } from './shipped-thickness-series.js';
import type { SolveAnswer, SolveRequest } from './solve-messages.js';

let pipeSizes: readonly PipeSize[] = [];

function answer(request: SolveRequest): SolveAnswer {
  const started = performance.now();
  const materials = new Map<number, MaterialProperties>(request.materials);
  try {
    const solved = solveCase(request.caseJson, {
      resolveMaterial: (id) => materials.get(id),
      pipeSizes,
      thicknessSeries: SHIPPED_THICKNESS_SERIES,
      installedCostTables: SHIPPED_INSTALLED_COST_TABLES,
      unitSystem: request.unitSystem,
    });
    return { id: request.id, ok: true, report: solved.report, layerMeans: layerMeansOf(solved.result), sizing: solved.sizing ?? null, solveMs: performance.now() - started };
  } catch (error) {
    const solveMs = performance.now() - started;
    if (error instanceof InputError) return { id: request.id, ok: false, field: error.field, message: error.message, sentence: error.sentence ?? error.message, solveMs };
    // A solver failure (no convergence, a singular problem) is said in its own sentence, never thrown at the page.
    return { id: request.id, ok: false, message: error instanceof Error ? error.message : String(error), solveMs };
  }
}

self.onmessage = (event: MessageEvent<SolveRequest>) => {
  if (event.data.pipeSizes) pipeSizes = event.data.pipeSizes;
  self.postMessage(answer(event.data));
};
