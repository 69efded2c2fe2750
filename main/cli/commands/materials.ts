import path from 'node:path';
import type { CliCommand, CliIO } from '../command.js';
import { fileAccessSentence, readTextFile, writeTextFile } from '../file-access.js';
import { resolveDatabaseLocation } from '../../storage/database-path.js';
import { openLamina, type LaminaServices } from '../../services/lamina-services.js';
import { formatMaterialsCsv } from '../../services/material-csv.js';
import type { Material } from '../../services/material-types.js';
import { NotFoundError } from '../../services/service-errors.js';
import { EXIT_BAD_INPUT, exitCodeOf, isMissingFile } from '../exit-code.js';

/**
 * lamina materials list [--search TEXT] [--category CAT] [--origin all|built-in|user] [--json]
 * lamina materials show ID|NAME [--json]
 * lamina materials import FILE.csv
 * lamina materials export FILE.csv|- [--search TEXT] [--category CAT] [--origin ...]
 * Every form accepts --db PATH (else LAMINA_DB, else the per-system default).
 */
const USAGE = 'usage: lamina materials list|show ID|import FILE|export FILE [--db PATH] [--search TEXT] [--category CAT] [--origin all|built-in|user] [--json]';

export interface ParsedArgs {
  readonly positional: string[];
  readonly options: Map<string, string>;
  readonly flags: Set<string>;
}

/** Splits `--name value` options, `--flag` switches and positional words; unknown options are invalid input. */
export function parseArgs(args: readonly string[], valued: readonly string[], switches: readonly string[]): ParsedArgs | string {
  const positional: string[] = [];
  const options = new Map<string, string>();
  const flags = new Set<string>();
  for (let i = 0; i < args.length; i++) {
    const arg = args[i]!;
    if (arg.startsWith('--')) {
      const [name, inline] = arg.slice(2).split(/=(.*)/s, 2) as [string, string | undefined];
      if (valued.includes(name)) {
        const value = inline ?? args[++i];
        if (value === undefined) return `option --${name} needs a value.`;
        options.set(name, value);
      } else if (switches.includes(name) && inline === undefined) flags.add(name);
      else return `unknown option --${name}.`;
    } else positional.push(arg);
  }
  return { positional, options, flags };
}

/** Opens the services for one command and maps errors to the exit codes of the CLI contract. */
export async function withServices(io: CliIO, dbOption: string | undefined, work: (services: LaminaServices) => Promise<number> | number): Promise<number> {
  let services: LaminaServices | undefined;
  try {
    const location = resolveDatabaseLocation(dbOption, io.env, io.cwd);
    services = await openLamina(location.path, { createFolder: !location.chosenByUser });
    return await work(services);
  } catch (error) {
    return reportError(io, error);
  } finally {
    services?.close();
  }
}

/** Prints a failure in one sentence; its exit code comes from exitCodeOf, like every command's. */
export function reportError(io: CliIO, error: unknown): number {
  if (isMissingFile(error)) io.stderr(`${fileAccessSentence(error, error.path, 'read')}\n`);
  else io.stderr(`${error instanceof Error ? error.message : String(error)}\n`);
  return exitCodeOf(error);
}

function describe(m: Material): string {
  const k = m.conductivity;
  const lambda = k.kind === 'constant' ? `${k.value} W/(m.K)` : k.kind === 'polynomial' ? `poly ${k.coefficients.join(' ')}` : `table ${k.points.map(([t, v]) => `${t}:${v}`).join(' ')}`;
  return `${m.id}\t${m.builtIn ? 'built-in' : 'user'}\t${m.category}\t${m.name}\t${lambda}`;
}

function filterOf(parsed: ParsedArgs): Record<string, string> {
  const filter: Record<string, string> = {};
  for (const key of ['search', 'category', 'origin']) {
    const value = parsed.options.get(key);
    if (value !== undefined) filter[key] = value;
  }
  return filter;
}

export const materialsCommand: CliCommand = async (args, io) => {
  const [sub, ...rest] = args;
  if (sub === '--help' || sub === '-h' || sub === 'help') {
    io.stdout(`${USAGE}\n`);
    return 0;
  }
  const parsed = parseArgs(rest, ['db', 'search', 'category', 'origin'], ['json']);
  if (typeof parsed === 'string') {
    io.stderr(`${parsed} ${USAGE}\n`);
    return EXIT_BAD_INPUT;
  }
  const db = parsed.options.get('db');
  const json = parsed.flags.has('json');
  switch (sub) {
    case 'list':
      return withServices(io, db, ({ materials }) => {
        const list = materials.list(filterOf(parsed));
        if (json) io.stdout(JSON.stringify(list, (_k, v) => (v === Infinity ? 'inf' : v), 2) + '\n');
        else for (const m of list) io.stdout(describe(m) + '\n');
        return 0;
      });
    case 'show': {
      const key = parsed.positional[0];
      if (!key) {
        io.stderr(`materials show needs a material id or name. ${USAGE}\n`);
        return EXIT_BAD_INPUT;
      }
      return withServices(io, db, ({ materials }) => {
        const material = /^\d+$/.test(key) ? materials.get(Number(key)) : materials.findByName(key);
        if (!material) throw new NotFoundError(`There is no material named "${key}".`);
        if (json) io.stdout(JSON.stringify(material, (_k, v) => (v === Infinity ? 'inf' : v), 2) + '\n');
        else io.stdout(formatMaterialsCsv([material]));
        return 0;
      });
    }
    case 'import': {
      const file = parsed.positional[0];
      if (!file) {
        io.stderr(`materials import needs a CSV file. ${USAGE}\n`);
        return EXIT_BAD_INPUT;
      }
      return withServices(io, db, ({ materials }) => {
        const result = materials.importCsv(readTextFile(path.resolve(io.cwd, file)));
        if (!result.ok) {
          for (const p of result.problems) io.stderr(`${file} line ${p.line}: ${p.message}\n`);
          io.stderr(`Nothing was imported: ${result.problems.length} problem(s).\n`);
          return EXIT_BAD_INPUT;
        }
        io.stdout(`Imported ${result.created.length} material(s).\n`);
        return 0;
      });
    }
    case 'export': {
      const file = parsed.positional[0];
      if (!file) {
        io.stderr(`materials export needs a file name (or - for standard output). ${USAGE}\n`);
        return EXIT_BAD_INPUT;
      }
      return withServices(io, db, ({ materials }) => {
        const csv = materials.exportCsv(filterOf(parsed));
        if (file === '-') io.stdout(csv);
        else {
          writeTextFile(path.resolve(io.cwd, file), csv);
          io.stdout(`Exported ${csv.trimEnd().split('\n').length - 1} material(s) to ${file}.\n`);
        }
        return 0;
      });
    }
    default:
      io.stderr(`${sub === undefined ? 'materials needs a subcommand.' : `unknown subcommand "${sub}".`} ${USAGE}\n`);
      return EXIT_BAD_INPUT;
  }
};
