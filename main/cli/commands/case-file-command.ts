/**
 * What `lamina solve` and `lamina size` share: one case file (or "-" for standard input) and
 * --format json|text, read and solved through solveCase with the library when the case refers to
 * it; each command only says what it refuses before solving and what it prints.
 */
import { solveCase, type CaseContext, type SolvedCase } from '../../../app/index.js';
import { caseContext, refersToLibrary } from '../../cases/case-context.js';
import type { CliCommand, CliIO } from '../command.js';
import { EXIT_BAD_INPUT, exitCodeOf, isInputProblem } from '../exit-code.js';
import { parseArgs, withServices } from './materials.js';
import { readCaseJson } from '../read-case-file.js';

export type CaseOutputFormat = 'json' | 'text';

export interface CaseFileCommand {
  /** "solve", "size": the word after lamina in every message. */
  readonly name: string;
  readonly help: string;
  /** A refusal of the file before any solve (one line, naming the field), or null. */
  readonly refuse?: (json: unknown) => string | null;
  /** Writes the solved case to standard output (or refuses it on standard error); the exit code. */
  readonly print: (solved: SolvedCase, format: CaseOutputFormat, io: CliIO) => number;
}

export function caseFileCommand(command: CaseFileCommand): CliCommand {
  const usage = (io: CliIO, message: string): number => {
    io.stderr(`lamina ${command.name}: ${message} (lamina ${command.name} --help)\n`);
    return EXIT_BAD_INPUT;
  };
  return async (args, io) => {
    const parsed = parseArgs(args, ['format', 'db'], ['help']);
    if (typeof parsed === 'string') return usage(io, parsed);
    if (parsed.flags.has('help')) {
      io.stdout(command.help);
      return 0;
    }
    const format = parsed.options.get('format') ?? 'json';
    if (format !== 'json' && format !== 'text') return usage(io, `--format must be json or text, not "${format}".`);
    if (parsed.positional.length !== 1) return usage(io, 'give exactly one case file (or - for standard input).');

    let json: unknown;
    try {
      json = readCaseJson(parsed.positional[0]!, io.cwd);
    } catch (error) {
      if (!isInputProblem(error)) throw error;
      io.stderr(`lamina ${command.name}: ${error.message}\n`);
      return exitCodeOf(error);
    }
    const refusal = command.refuse?.(json) ?? null;
    if (refusal !== null) {
      io.stderr(`lamina ${command.name}: ${refusal}\n`);
      return EXIT_BAD_INPUT;
    }

    const solveWith = (context: CaseContext): number => {
      let solved: SolvedCase;
      try {
        solved = solveCase(json, context);
      } catch (error) {
        // A bad field or a problem without a unique solution exits 2; a failure while solving exits 1.
        io.stderr(`lamina ${command.name}: ${(error as Error).message}\n`);
        return exitCodeOf(error);
      }
      return command.print(solved, format, io);
    };
    if (!refersToLibrary(json)) return solveWith(caseContext(null));
    return withServices(io, parsed.options.get('db'), (services) => solveWith(caseContext(services.materials)));
  };
}
