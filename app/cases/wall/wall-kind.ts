/**
 * The wall kind: a wall or roof build-up. ISO 6946 U-value and temperatures at the design
 * condition; mould and inside-surface condensation (ISO 13788 temperature factor); interstitial
 * condensation at the design condition and, with a monthly climate, over a year. Each thermal
 * state is solved once and shared by the checks (wall-analysis.ts).
 */
import { isObject } from '../../base/field-checks.js';
import { requireConductivitiesOver, type CaseMaterialUse } from '../case-conductivity-span.js';
import type { CaseKind } from '../case-kind.js';
import { analyseValidatedWall, requireWallVapourData, type WallAnalysis } from './wall-analysis.js';
import { parseWallCaseFile } from './wall-case-file.js';
import { isAirLayer, type WallInput } from './wall-input.js';
import { wallReport } from './wall-report.js';

export const wallKind: CaseKind<WallInput, WallAnalysis> = {
  kind: 'wall',
  summary: 'a wall or roof build-up: U-value, temperatures, mould and condensation checks',
  parse(json, context) {
    const input = parseWallCaseFile(json, context.resolveMaterial);
    requireWallConductivities(json, input);
    // parseWallCaseFile validated every field; the vapour data the analysis needs is checked here.
    requireWallVapourData(input);
    return { title: input.name ?? 'Wall or roof', input, assumptions: [] };
  },
  solve({ input }, text) {
    const result = analyseValidatedWall(input, text);
    return { result, checks: result.checks, warnings: result.warnings, assumptions: [] };
  },
  report(parsed, solved, text) {
    return wallReport(parsed.input, solved.result, text);
  },
};

/** Every material layer over the span of the inside and outside temperatures, at design and in every climate month. */
function requireWallConductivities(json: unknown, input: WallInput): void {
  const raw = isObject(json) && Array.isArray(json['layers']) ? json['layers'] : [];
  const uses = input.layers.flatMap((layer, i): CaseMaterialUse[] => {
    if (isAirLayer(layer)) return [];
    const rawBridges = isObject(raw[i]) && Array.isArray(raw[i]['bridges']) ? (raw[i]['bridges'] as unknown[]) : [];
    return [
      { entry: `layers[${i}]`, raw: raw[i], material: layer.material },
      ...(layer.bridges ?? []).map((b, k) => ({ entry: `layers[${i}].bridges[${k}]`, raw: rawBridges[k], material: b.material })),
    ];
  });
  const months = input.moisture?.climate?.months ?? [];
  const temperatures = [input.inside, input.outside, ...months.flatMap((m) => [m.inside, m.outside])].map((c) => c.temperature);
  requireConductivitiesOver(uses, temperatures);
}
