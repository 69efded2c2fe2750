/**
 * The schedule's sizer, off the page's main thread: sizeSchedule (the engine the command line's
 * `lamina projects schedule ID size` runs) over the runs the page sends, with the library materials,
 * the pipe-size tables and the shipped thickness series and installed-cost tables. The runs go in
 * chunks with a pause (setTimeout 0) between them, so a cancel message is read between chunks and
 * flips the flag sizeSchedule checks between runs; each chunk's results are posted as they come,
 * so a cancel keeps what was done.
 */
import { sizeSchedule } from '../../../app/schedules/size-schedule.js';
import type { CaseContext } from '../../../app/index.js';
import type { MaterialProperties } from '../../../app/materials/material-properties.js';
import { SHIPPED_INSTALLED_COST_TABLES } from '../case-editor/shipped-installed-costs.js';
import { SHIPPED_THICKNESS_SERIES } from '../case-editor/shipped-thickness-series.js';
import type { SizeAnswer, SizeRequest } from './size-messages.js';

/** Runs per chunk: small enough that a cancel is felt at once, large enough that the pauses cost nothing. */
const CHUNK = 4;
const cancelled = new Set<number>();

function post(answer: SizeAnswer): void {
  self.postMessage(answer);
}

function start(request: Extract<SizeRequest, { kind: 'size' }>): void {
  const { jobId, runs } = request;
  const materials = new Map<number, MaterialProperties>(request.materials);
  const byName = new Map(Object.entries(request.materialIds).map(([name, id]) => [name.toLowerCase(), id]));
  const materialIdOf = (name: string) => byName.get(name.toLowerCase());
  // One context for the whole job: sizeSchedule remembers each material it resolves.
  const context: CaseContext = {
    resolveMaterial: (id) => materials.get(id),
    pipeSizes: request.pipeSizes,
    thicknessSeries: SHIPPED_THICKNESS_SERIES,
    installedCostTables: SHIPPED_INSTALLED_COST_TABLES,
    unitSystem: request.unitSystem,
  };
  let done = 0;
  const next = (): void => {
    try {
      if (cancelled.has(jobId)) return finish(false);
      const chunk = runs.slice(done, done + CHUNK);
      const before = done;
      const { results } = sizeSchedule(chunk, request.settings, materialIdOf, context, {
        cancelled: () => cancelled.has(jobId),
        // The bar moves run by run; the chunk's results follow with its last run.
        onProgress: (p) => { if (p.done < p.total) post({ kind: 'progress', jobId, done: before + p.done, total: runs.length, results: [] }); },
      });
      done += results.size;
      post({ kind: 'progress', jobId, done, total: runs.length, results: [...results.values()] });
      if (done >= runs.length) return finish(true);
      setTimeout(next, 0);
    } catch (error) {
      cancelled.delete(jobId);
      post({ kind: 'failed', jobId, message: error instanceof Error ? error.message : String(error) });
    }
  };
  const finish = (complete: boolean): void => {
    cancelled.delete(jobId);
    post({ kind: 'finished', jobId, done, total: runs.length, complete });
  };
  next();
}

self.onmessage = (event: MessageEvent<SizeRequest>) => {
  const message = event.data;
  if (message.kind === 'cancel') cancelled.add(message.jobId);
  else start(message);
};
