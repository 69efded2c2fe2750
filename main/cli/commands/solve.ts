/**
 * lamina solve CASE.json [--format json|text] [--db PATH]
 *
 * Reads a case file (or "-" for standard input), validates it, solves it and prints the result.
 * Materials in a case file are inline, or referenced by id from the library (--db).
 */
import { CASE_KINDS, renderReportText } from '../../../app/index.js';
import { caseFileCommand } from './case-file-command.js';

const SOLVE_HELP = `lamina solve CASE.json [--format json|text] [--db PATH]

Solves one case file and prints the result: JSON by default (every figure at full precision,
SI units, temperatures in °C), or a readable summary with --format text. Use "-" to read the
case from standard input. Case kinds (the "kind" field):
${CASE_KINDS.map((k) => `  ${k.kind.padEnd(11)} ${k.summary}`).join('\n')}

A case file is JSON with "schemaVersion": 1 and "kind". JSON Schemas for every kind are in
data/schemas/ (case.schema.json covers them all); examples are in data/examples/.
Materials are given inline ("material": {...}) or by library id ("materialId": 12, read from
--db PATH, else $LAMINA_DB, else the default database).

Exit codes: 0 solved; 1 the solve failed (for example no convergence); 2 invalid input, reported
in one line that names the field and the allowed range.
`;

export const solveCommand = caseFileCommand({
  name: 'solve',
  help: SOLVE_HELP,
  print(solved, format, io) {
    io.stdout(format === 'json' ? `${JSON.stringify(solved, null, 2)}\n` : renderReportText(solved.report));
    return 0;
  },
});
