/**
 * The `lamina` command line: a thin dispatcher over subcommands that all share the CliCommand
 * shape. Engineers script batches with it, so its output formats and exit codes are part of the
 * product: 0 success, 1 failure while working, 2 invalid input or usage (one line naming the field).
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { CliCommand, CliIO } from './command.js';
import { EXIT_BAD_INPUT, EXIT_DONE } from './exit-code.js';
import { materialsCommand } from './commands/materials.js';
import { projectsCommand } from './commands/projects.js';
import { sizeCommand } from './commands/size.js';
import { solveCommand } from './commands/solve.js';

const COMMANDS: Record<string, CliCommand> = {
  solve: solveCommand,
  size: sizeCommand,
  materials: materialsCommand,
  projects: projectsCommand,
};

const HELP = `lamina — heat loss, surface temperatures and condensation checks for insulated pipes, equipment and walls

usage:
  lamina solve CASE.json [--format json|text] [--db PATH]   solve a case file and print the result
  lamina size CASE.json [--format json|text] [--db PATH]    choose the insulation thickness of a case with a "sizing" block
  lamina materials list|show|import|export ...              the materials library (see lamina materials --help)
  lamina projects list|export|import|add-demo ...           projects (see lamina projects --help)
  lamina projects report ID --out FILE.pdf|FILE.html        print a project's report (PDF through Electron or Chromium)
  lamina --version

Run "lamina solve --help" for the case-file format. Exit codes: 0 done, 1 failed while working,
2 invalid input (one line naming the field).
`;

function version(): string {
  const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
  return (JSON.parse(readFileSync(path.join(root, 'package.json'), 'utf8')) as { version: string }).version;
}

export async function runCli(args: readonly string[], io: CliIO): Promise<number> {
  const [name, ...rest] = args;
  if (name === undefined || name === '--help' || name === '-h' || name === 'help') {
    io.stdout(HELP);
    return name === undefined ? EXIT_BAD_INPUT : EXIT_DONE;
  }
  if (name === '--version') {
    io.stdout(`${version()}\n`);
    return 0;
  }
  const command = COMMANDS[name];
  if (!command) {
    io.stderr(`lamina: unknown command "${name}"; use solve, size, materials or projects (lamina --help).\n`);
    return EXIT_BAD_INPUT;
  }
  return command(rest, io);
}
