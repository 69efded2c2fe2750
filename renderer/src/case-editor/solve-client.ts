/**
 * The page's side of the solving worker. The latest request wins: while one solve runs, only the
 * newest case waits to be sent (older ones are dropped), and an answer for anything but the newest
 * request sent is passed on only if nothing newer is coming, so the figures never go backwards.
 */
import type { PipeSize } from '../../../app/index.js';
import type { UnitSystem } from '../../../app/base/unit-systems.js';
import type { MaterialProperties } from '../../../app/materials/material-properties.js';
import type { SolveAnswer, SolveRequest } from './solve-messages.js';

export interface TimedAnswer {
  readonly answer: SolveAnswer;
  /** From the request to the answer reaching the page, ms. */
  readonly roundTripMs: number;
}

export class SolveClient {
  private readonly worker: Worker;
  private nextId = 1;
  private inFlight: { id: number; sentAt: number } | null = null;
  private waiting: Omit<SolveRequest, 'id'> | null = null;
  private pipeSizesSent = false;

  constructor(
    private readonly pipeSizes: () => readonly PipeSize[],
    private readonly onAnswer: (timed: TimedAnswer) => void,
    private readonly onFailure: (message: string) => void,
  ) {
    this.worker = new Worker(new URL('./solve-worker.ts', import.meta.url), { type: 'module' });
    this.worker.onmessage = (event: MessageEvent<SolveAnswer>) => this.received(event.data);
    // A worker that cannot load or crashes says so once; the page keeps its last good results.
    this.worker.onerror = (event: ErrorEvent) => {
      this.inFlight = null;
      this.onFailure(event.message || 'the solver stopped unexpectedly');
    };
  }

  solve(caseJson: unknown, materials: readonly (readonly [number, MaterialProperties])[], unitSystem: UnitSystem): void {
    this.waiting = { caseJson, materials, unitSystem };
    if (!this.inFlight) this.sendWaiting();
  }

  dispose(): void {
    this.worker.terminate();
  }

  private sendWaiting(): void {
    if (!this.waiting) return;
    const id = this.nextId++;
    const request: SolveRequest = { id, ...this.waiting, ...(this.pipeSizesSent ? {} : { pipeSizes: this.pipeSizes() }) };
    this.pipeSizesSent = true;
    this.waiting = null;
    this.inFlight = { id, sentAt: performance.now() };
    this.worker.postMessage(request);
  }

  private received(answer: SolveAnswer): void {
    const sent = this.inFlight;
    if (!sent || answer.id !== sent.id) return;
    this.inFlight = null;
    if (this.waiting) {
      this.sendWaiting();
      return;
    }
    this.onAnswer({ answer, roundTripMs: performance.now() - sent.sentAt });
  }
}
