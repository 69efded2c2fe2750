/**
 * lamina solve CASE.json [--format json|text] [--db PATH]
 *
 * Reads a case file (or "-" for standard input), validates it, solves it and prints the result.
 * Materials in a case file are inline, or referenced by id from the library (--db).
 */
import { CASE_KINDS, renderReportText, solveCase, type CaseContext, type SolvedCase } from '../../../app/index.js';
import { caseContext, refersToLibrary } from '../../cases/case-context.js';
import type { CliCommand, CliIO } from '../command.js';
import { EXIT_BAD_INPUT, exitCodeOf, isInputProblem } from '../exit-code.js';
import { parseArgs, withServices } from './materials.js';
import { readCaseJson } from '../read-case-file.js';

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

export const solveCommand: CliCommand = async (args, io) => {
  const parsed = parseArgs(args, ['format', 'db'], ['help']);
  if (typeof parsed === 'string') return usage(io, parsed);
  if (parsed.flags.has('help')) {
    io.stdout(SOLVE_HELP);
    return 0;
  }
  const format = parsed.options.get('format') ?? 'json';
  if (format !== 'json' && format !== 'text') return usage(io, `--format must be json or text, not "${format}".`);
  if (parsed.positional.length !== 1) return usage(io, 'give exactly one case file (or - for standard input).');

  const file = parsed.positional[0]!;
  let json: unknown;
  try {
    json = readCaseJson(file, io.cwd);
  } catch (error) {
    if (!isInputProblem(error)) throw error;
    io.stderr(`lamina solve: ${error.message}\n`);
    return exitCodeOf(error);
  }

  const solveWith = (context: CaseContext): number => {
    let solved: SolvedCase;
    try {
      solved = solveCase(json, context);
    } catch (error) {
      // A bad field or a problem without a unique solution exits 2; a failure while solving exits 1.
      io.stderr(`lamina solve: ${(error as Error).message}\n`);
      return exitCodeOf(error);
    }
    io.stdout(format === 'json' ? `${JSON.stringify(solved, null, 2)}\n` : renderReportText(solved.report));
    return 0;
  };
  if (!refersToLibrary(json)) return solveWith(caseContext(null));
  return withServices(io, parsed.options.get('db'), (services) => solveWith(caseContext(services.materials)));
};

function usage(io: CliIO, message: string): number {
  io.stderr(`lamina solve: ${message} (lamina solve --help)\n`);
  return EXIT_BAD_INPUT;
}
