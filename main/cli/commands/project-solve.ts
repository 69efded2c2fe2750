/**
 * Recomputes every case of a stored project from its inputs (nothing computed is ever stored):
 * each case's inputs are a case file whose materials are library ids, solved by the same case
 * kinds as `lamina solve`. A case that no longer solves is reported by name, and the others still run.
 */
import type { Project } from '../../../app/api/project-types.js';
import { InputError, SingularProblemError } from '../../../app/fe/errors.js';
import type { MaterialsService } from '../../services/materials-service.js';
import { caseKindOf, libraryMaterialResolver } from '../case-kinds.js';
import type { CliIO } from '../command.js';

interface CaseOutcome {
  readonly id: number;
  readonly name: string;
  readonly kind: string;
  readonly result?: unknown;
  readonly text?: string;
  readonly error?: string;
}

export function solveProject(io: CliIO, project: Project, materials: MaterialsService, format: 'json' | 'text'): number {
  const resolve = libraryMaterialResolver(materials);
  const outcomes: CaseOutcome[] = project.cases.map((c) => {
    const kind = caseKindOf(c.inputs);
    if (typeof kind === 'string') return { id: c.id, name: c.name, kind: String(c.inputs.kind), error: kind };
    try {
      const solved = kind.solve(c.inputs, resolve);
      return { id: c.id, name: c.name, kind: kind.kind, result: solved.json, text: solved.text() };
    } catch (error) {
      const known = error instanceof InputError || error instanceof SingularProblemError;
      return { id: c.id, name: c.name, kind: kind.kind, error: known ? (error as Error).message : `the solve failed: ${(error as Error).message}` };
    }
  });

  if (format === 'json') {
    const cases = outcomes.map(({ text: _text, ...rest }) => rest);
    io.stdout(`${JSON.stringify({ project: { id: project.id, name: project.name, client: project.client, site: project.site }, cases }, null, 2)}\n`);
  } else {
    io.stdout(`${project.name} — ${project.client}, ${project.site} (revision ${project.revision || '–'})\n`);
    if (outcomes.length === 0) io.stdout('The project has no cases yet.\n');
    for (const o of outcomes) {
      io.stdout(`\n=== Case ${o.id}: ${o.name} (${o.kind})\n`);
      io.stdout(o.error ? `Not solved: ${o.error}\n` : o.text!);
    }
  }
  const failed = outcomes.filter((o) => o.error);
  for (const f of failed) io.stderr(`lamina projects solve: case ${f.id} "${f.name}": ${f.error}\n`);
  return failed.length === 0 ? 0 : 1;
}
