/**
 * State of the wall form: the text in each field, and the reading and solve derived from it.
 * The engine runs in the page (it is plain TypeScript), through solveCase; nothing is sent anywhere.
 */
import { solveCase } from '../../../app/index.js';
import type { SteadyResult } from '../../../app/fe/index.js';
import { MAX_LAYERS, readWall, summarise, type FieldError, type LayerDraft, type WallSummary } from './wall-input.js';

export type WallOutcome =
  | { readonly kind: 'invalid'; readonly errors: readonly FieldError[] }
  | { readonly kind: 'failed'; readonly message: string }
  | { readonly kind: 'solved'; readonly summary: WallSummary; readonly resistance: number };

export class WallForm {
  insideTemperature = $state('20');
  outsideTemperature = $state('-5');
  layers = $state<LayerDraft[]>([
    { thickness: '175', conductivity: '0.9' },
    { thickness: '100', conductivity: '0.035' },
    { thickness: '12.5', conductivity: '0.25' },
  ]);

  readonly outcome: WallOutcome = $derived.by(() => solveWall(this));

  get canAddLayer(): boolean {
    return this.layers.length < MAX_LAYERS;
  }

  get canRemoveLayer(): boolean {
    return this.layers.length > 1;
  }

  addLayer(): void {
    if (this.canAddLayer) this.layers.push({ thickness: '50', conductivity: '0.04' });
  }

  removeLayer(index: number): void {
    if (this.canRemoveLayer) this.layers.splice(index, 1);
  }

  errorFor(field: string): string | undefined {
    return this.outcome.kind === 'invalid' ? this.outcome.errors.find((e) => e.field === field)?.message : undefined;
  }
}

function solveWall(form: WallForm): WallOutcome {
  const reading = readWall(form);
  if (!reading.ok) return { kind: 'invalid', errors: reading.errors };
  try {
    // The preview is a conduction case, solved by the same pipeline as every other case.
    const { geometry, layers, inner, outer } = reading.problem;
    const solved = solveCase({ schemaVersion: 1, kind: 'conduction', title: 'Wall preview', geometry, layers, inner, outer }, { resolveMaterial: () => undefined });
    return { kind: 'solved', summary: summarise(solved.result as SteadyResult), resistance: reading.resistance };
  } catch (error) {
    return { kind: 'failed', message: error instanceof Error ? error.message : String(error) };
  }
}
