/**
 * Recomputes every case of a stored project from its inputs (nothing computed is ever stored):
 * each case's inputs are a case file (materials inline or by library id), solved by solveCase as
 * `lamina solve` solves it. A case that no longer solves is reported by name, and the others still run.
 */
import type { Project } from '../../../app/api/project-types.js';
import { renderReportText, solveCase } from '../../../app/index.js';
import { caseContext } from '../../cases/case-context.js';
import type { MaterialsService } from '../../services/materials-service.js';
import type { CliIO } from '../command.js';
import { EXIT_DONE, EXIT_FAILED, isInputProblem } from '../exit-code.js';

interface CaseOutcome {
  readonly id: number;
  readonly name: string;
  readonly kind: string;
  readonly result?: unknown;
  readonly text?: string;
  readonly error?: string;
}

export function solveProject(io: CliIO, project: Project, materials: MaterialsService, format: 'json' | 'text'): number {
  const context = caseContext(materials);
  const outcomes: CaseOutcome[] = project.cases.map((c) => {
    try {
      const solved = solveCase(c.inputs, context);
      return { id: c.id, name: c.name, kind: solved.kind, result: solved, text: renderReportText(solved.report) };
    } catch (error) {
      const message = isInputProblem(error) ? error.message : `the solve failed: ${(error as Error).message}`;
      return { id: c.id, name: c.name, kind: String(c.inputs.kind), error: message };
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
  return failed.length === 0 ? EXIT_DONE : EXIT_FAILED;
}
