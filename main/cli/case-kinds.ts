/**
 * The case kinds `lamina solve` understands: each parses its file format, solves it, and renders
 * the result as JSON and as a readable text summary. Adding a case kind means adding one entry here.
 */
import { isObject } from '../../app/cases/case-fields.js';
import { shownValue } from '../../app/base/shown-value.js';
import { parseConductionCaseFile } from '../../app/cases/conduction/conduction-case-file.js';
import { solveSteady, solveTransient } from '../../app/fe/index.js';
import { conductionWarnings } from '../../app/cases/conduction/conduction-warnings.js';
import type { MaterialProperties } from '../../app/materials/material-properties.js';
import type { MaterialsService } from '../services/materials-service.js';
import { NotFoundError } from '../services/service-errors.js';
import { conductionSteadyText, conductionTransientText } from './format/conduction-text.js';
import { flatText, pipeText } from './format/pipe-and-flat-text.js';
import { parsePipeCaseFile } from '../../app/cases/pipe/pipe-case-file.js';
import { parseFlatCaseFile } from '../../app/cases/flat/flat-case-file.js';
import { calculatePipe } from '../../app/cases/pipe/pipe-calculation.js';
import { calculateFlatSurface } from '../../app/cases/flat/flat-surface-calculation.js';
import { analyseWall } from '../../app/cases/wall/wall-analysis.js';
import { parseWallCaseFile } from '../../app/cases/wall/wall-case-file.js';
import { wallText } from './format/wall-text.js';
import { resolvePipeSizeInCase } from '../pipe-sizes/pipe-size-catalogue.js';

export interface SolvedCase {
  readonly json: unknown;
  readonly text: () => string;
}

export interface CaseKind {
  readonly kind: string;
  readonly summary: string;
  readonly solve: (json: unknown, resolveMaterial: (id: number) => MaterialProperties | undefined) => SolvedCase;
}

const conduction: CaseKind = {
  kind: 'conduction',
  summary: 'layers and face conditions given directly (steady or transient)',
  solve(json) {
    const parsed = parseConductionCaseFile(json);
    if (parsed.analysis === 'steady') {
      const result = solveSteady(parsed.problem);
      const warnings = conductionWarnings(parsed.problem, result.positions, [result.temperatures]);
      return {
        json: { kind: 'conduction', title: parsed.title, analysis: 'steady', result, warnings },
        text: () => conductionSteadyText(parsed.title, result) + warningLines(warnings),
      };
    }
    const result = solveTransient(parsed.problem);
    const warnings = conductionWarnings(parsed.problem, result.positions, result.temperatures);
    return {
      json: { kind: 'conduction', title: parsed.title, analysis: 'transient', result, warnings },
      text: () => conductionTransientText(parsed.title, result) + warningLines(warnings),
    };
  },
};

const pipe: CaseKind = {
  kind: 'pipe',
  summary: 'an insulated pipe run: heat loss, surface temperature, condensation and touch checks',
  solve(json, resolveMaterial) {
    const { json: resolved, size } = resolvePipeSizeInCase(json);
    const input = parsePipeCaseFile(resolved, resolveMaterial);
    const result = calculatePipe(input);
    const title = input.title ?? 'Pipe';
    return { json: { kind: 'pipe', title, pipeSize: size, result }, text: () => pipeText(title, result) };
  },
};

const flat: CaseKind = {
  kind: 'flat',
  summary: 'an insulated flat surface (duct, tank or equipment wall)',
  solve(json, resolveMaterial) {
    const input = parseFlatCaseFile(json, resolveMaterial);
    const result = calculateFlatSurface(input);
    const title = input.title ?? 'Flat surface';
    return { json: { kind: 'flat', title, result }, text: () => flatText(title, result) };
  },
};

const wall: CaseKind = {
  kind: 'wall',
  summary: 'a wall or roof build-up: U-value, temperatures, mould and condensation checks',
  solve(json, resolveMaterial) {
    const input = parseWallCaseFile(json, resolveMaterial);
    const result = analyseWall(input);
    const title = input.name ?? 'Wall or roof';
    return { json: { kind: 'wall', title, result }, text: () => wallText(title, result) };
  },
};

const warningLines = (warnings: readonly string[]) => warnings.map((w) => `Warning: ${w}\n`).join('');

export const CASE_KINDS: readonly CaseKind[] = [conduction, pipe, flat, wall];

/**
 * Resolves a case file's "materialId" from the library. A missing id gives undefined, so that the
 * case parser reports it naming the field; any other storage failure is not hidden.
 */
export function libraryMaterialResolver(materials: MaterialsService): (id: number) => MaterialProperties | undefined {
  return (id) => {
    try {
      return materials.get(id);
    } catch (error) {
      if (error instanceof NotFoundError) return undefined;
      throw error;
    }
  };
}

/** The case kind a parsed file declares, or a one-sentence reason it has none we know. */
export function caseKindOf(json: unknown): CaseKind | string {
  if (!isObject(json)) return 'the case file must hold a JSON object.';
  const kind = CASE_KINDS.find((k) => k.kind === json['kind']);
  return kind ?? `kind must be one of ${CASE_KINDS.map((k) => `"${k.kind}"`).join(', ')}; got ${shownValue(json['kind'])}.`;
}
