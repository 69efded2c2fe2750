/**
 * The page's side of the schedule's sizing worker: one job at a time, its progress and each
 * chunk's results passed on as they come, and Cancel (the worker stops between runs and keeps
 * what it posted).
 */
import type { KeyedSizedRun } from '../../../app/api/contract.js';
import type { SizeAnswer, SizeRequest } from './size-messages.js';

export interface SizeJobHandlers {
  readonly onProgress: (done: number, total: number, results: readonly KeyedSizedRun[]) => void;
  readonly onFinished: (complete: boolean) => void;
  readonly onFailure: (message: string) => void;
}

export class ScheduleSizeClient {
  private worker: Worker | undefined;
  private nextJob = 1;
  private job: { id: number; handlers: SizeJobHandlers } | undefined;

  get running(): boolean {
    return this.job !== undefined;
  }

  size(request: Omit<Extract<SizeRequest, { kind: 'size' }>, 'kind' | 'jobId'>, handlers: SizeJobHandlers): void {
    const worker = this.ensureWorker();
    const id = this.nextJob++;
    this.job = { id, handlers };
    worker.postMessage({ kind: 'size', jobId: id, ...request } satisfies SizeRequest);
  }

  cancel(): void {
    if (this.job) this.worker?.postMessage({ kind: 'cancel', jobId: this.job.id } satisfies SizeRequest);
  }

  dispose(): void {
    this.worker?.terminate();
    this.worker = undefined;
    this.job = undefined;
  }

  private ensureWorker(): Worker {
    if (this.worker) return this.worker;
    const worker = new Worker(new URL('./size-worker.ts', import.meta.url), { type: 'module' });
    worker.onmessage = (event: MessageEvent<SizeAnswer>) => this.received(event.data);
    // A worker that cannot load or crashes says so once; the stored results stay as they were.
    worker.onerror = (event: ErrorEvent) => {
      const job = this.job;
      this.job = undefined;
      job?.handlers.onFailure(event.message || 'the sizer stopped unexpectedly');
    };
    this.worker = worker;
    return worker;
  }

  private received(answer: SizeAnswer): void {
    const job = this.job;
    if (!job || answer.jobId !== job.id) return;
    if (answer.kind === 'progress') job.handlers.onProgress(answer.done, answer.total, answer.results);
    else {
      this.job = undefined;
      if (answer.kind === 'finished') job.handlers.onFinished(answer.complete);
      else job.handlers.onFailure(answer.message);
    }
  }
}
