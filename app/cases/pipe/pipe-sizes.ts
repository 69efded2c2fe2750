/**
 * Pipe and tube sizes named in a pipe case ("pipe": { "size": { "series": "steel-iso", "nominal":
 * "DN100" } }) in place of the outside diameter and wall. The tables themselves are data
 * (data/pipe-sizes/*.csv, read at the edge by main/pipe-sizes); the case pipeline is handed the
 * catalogue and only ever sees metres.
 */
import { InputError } from '../../base/input-error.js';
import { shownValue } from '../../base/shown-value.js';
import { withFields } from '../with-fields.js';

export const PIPE_SIZE_SERIES = ['steel-iso', 'steel-asme', 'copper-en1057', 'copper-astm-b88', 'plastic-metric'] as const;
export type PipeSizeSeries = (typeof PIPE_SIZE_SERIES)[number];

export interface PipeSize {
  readonly series: PipeSizeSeries;
  /** As written in the case file: "DN100" / "100" for steel-iso, "4" or "1 1/4" for inch series, OD in mm for the metric tube series. */
  readonly nominal: string;
  /** m */
  readonly outerDiameter: number;
  /** m; null where the table gives no wall (copper and plastic tubes come in several walls). */
  readonly wallThickness: number | null;
  readonly source: string;
}

function normalise(series: PipeSizeSeries, nominal: string): string {
  const n = nominal.trim().replace(/\s+/g, ' ');
  if (series === 'steel-iso') return /^dn/i.test(n) ? `DN${n.slice(2).trim()}` : `DN${n}`;
  return n;
}

/** The size a case file names, or an InputError naming the field. */
export function findPipeSize(catalogue: readonly PipeSize[], series: unknown, nominal: unknown, field: string): PipeSize {
  if (typeof series !== 'string' || !(PIPE_SIZE_SERIES as readonly string[]).includes(series)) {
    throw new InputError(`${field}.series`, `${field}.series must be one of ${PIPE_SIZE_SERIES.join(', ')}; got ${shownValue(series)}.`);
  }
  if (typeof nominal !== 'string' && typeof nominal !== 'number') {
    throw new InputError(`${field}.nominal`, `${field}.nominal must be a size such as "DN100", "4", "1 1/4" or "108".`);
  }
  const s = series as PipeSizeSeries;
  const wanted = normalise(s, String(nominal));
  const found = catalogue.find((p) => p.series === s && p.nominal === wanted);
  if (!found) {
    const known = catalogue.filter((p) => p.series === s).map((p) => p.nominal);
    throw new InputError(`${field}.nominal`, `${field}.nominal ${shownValue(String(nominal))} is not in the ${s} table; sizes there run ${known[0]} to ${known[known.length - 1]}.`);
  }
  return found;
}

/**
 * Replaces `pipe.size` in a pipe case file by the outside diameter and wall from the table (a wall
 * given in the file wins). Returns the file unchanged when it names no size.
 */
export function resolvePipeSizeInCase(json: unknown, catalogue: readonly PipeSize[] | undefined): { json: unknown; size: PipeSize | null } {
  if (typeof json !== 'object' || json === null) return { json, size: null };
  const file = json as Record<string, unknown>;
  const pipe = file['pipe'];
  if (file['kind'] !== 'pipe' || typeof pipe !== 'object' || pipe === null || !('size' in pipe)) return { json, size: null };
  const { size: named, ...rest } = pipe as Record<string, unknown>;
  if ('outerDiameter' in rest) {
    throw new InputError('pipe.size', 'pipe.size and pipe.outerDiameter cannot both be given; name a size or give the diameter.');
  }
  const spec = (typeof named === 'object' && named !== null ? named : {}) as Record<string, unknown>;
  if (!catalogue) throw new InputError('pipe.size', 'pipe.size names a size, but no pipe-size tables were given to this calculation; give pipe.outerDiameter and pipe.wallThickness in m.');
  const size = findPipeSize(catalogue, spec['series'], spec['nominal'], 'pipe.size');
  const wallThickness = rest['wallThickness'] ?? size.wallThickness;
  if (wallThickness === null) {
    throw new InputError('pipe.wallThickness', `pipe.wallThickness is needed: the ${size.series} table gives no wall for ${size.nominal}; give it in m.`);
  }
  return { json: withFields(file, { pipe: withFields(rest, { outerDiameter: size.outerDiameter, wallThickness }) }), size };
}
