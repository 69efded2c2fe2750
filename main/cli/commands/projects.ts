import fs from 'node:fs';
import { readCaseJson } from '../read-case-file.js';
import { readTextFile } from '../file-access.js';
import path from 'node:path';
import type { CliCommand } from '../command.js';
import { projectFileFromJson, projectFileToJson } from '../../services/project-file.js';
import { parseArgs, withServices } from './materials.js';
import { solveProject } from './project-solve.js';
import { projectsReportCommand } from './project-report.js';
import { projectScheduleCommand } from './project-schedule.js';
import { addDemoProject } from '../../services/demo-project.js';
import { EXIT_BAD_INPUT, exitCodeOf, isInputProblem } from '../exit-code.js';

function caseTitle(inputs: unknown): string | undefined {
  const title = typeof inputs === 'object' && inputs !== null ? (inputs as Record<string, unknown>)['title'] : undefined;
  return typeof title === 'string' && title.trim() !== '' ? title.slice(0, 200) : undefined;
}

/**
 * lamina projects list [--deleted] [--json]
 * lamina projects export ID FILE.json|-
 * lamina projects import FILE.json [--on-existing copy|replace]   (when the same project is already there)
 * lamina projects create NAME [--client TEXT] [--site TEXT] [--reference TEXT] [--engineer TEXT]
 * lamina projects add-case ID CASE.json [--name NAME]   (a case file; materials inline or by library id)
 * lamina projects add-demo                              (the demo project of data/demo, as the app adds it)
 * lamina projects solve ID [--format json|text]          (recomputes every case from its stored inputs)
 * lamina projects report ID --out FILE.pdf|FILE.html [--paper A4|Letter]   (the printed report)
 * lamina projects schedule ID import FILE.csv | size [--format json|text] [--all] | export FILE.csv | template FILE.csv
 * Every form accepts --db PATH (else LAMINA_DB, else the per-system default).
 */
const USAGE =
  'usage: lamina projects list [--deleted] [--json] | create NAME [--client T] [--site T] [--reference T] [--engineer T] | export ID FILE | import FILE [--on-existing copy|replace] | add-case ID CASE.json [--name NAME] | add-demo | solve ID [--format json|text] | report ID --out FILE.pdf|FILE.html [--paper A4|Letter] | schedule ID import FILE.csv|size|export FILE.csv|template FILE.csv|bill FILE.csv|settings [FILE.json] [--db PATH]';

const CREATE_FIELDS = ['client', 'site', 'reference', 'engineer'] as const;

export const projectsCommand: CliCommand = async (args, io) => {
  const [sub, ...rest] = args;
  if (sub === '--help' || sub === '-h' || sub === 'help') {
    io.stdout(`${USAGE}\n`);
    return 0;
  }
  const parsed = parseArgs(rest, ['db', 'name', 'format', 'on-existing', 'out', 'paper', ...CREATE_FIELDS], ['json', 'deleted', 'all']);
  if (typeof parsed === 'string') {
    io.stderr(`${parsed} ${USAGE}\n`);
    return EXIT_BAD_INPUT;
  }
  const db = parsed.options.get('db');
  switch (sub) {
    case 'list':
      return withServices(io, db, ({ projects }) => {
        const list = parsed.flags.has('deleted') ? projects.listRecycleBin() : projects.list();
        if (parsed.flags.has('json')) io.stdout(JSON.stringify(list, null, 2) + '\n');
        else if (list.length === 0) io.stdout(parsed.flags.has('deleted') ? 'The recycle bin is empty.\n' : 'No projects yet.\n');
        else for (const p of list) io.stdout(`${p.id}\t${p.name}\t${p.client}\t${p.caseCount} case(s)\t${p.updatedAt}\n`);
        return 0;
      });
    case 'export': {
      const [id, file] = parsed.positional;
      if (!id || !/^\d+$/.test(id) || !file) {
        io.stderr(`projects export needs a project id (a whole number) and a file name (or -). ${USAGE}\n`);
        return EXIT_BAD_INPUT;
      }
      return withServices(io, db, ({ projects }) => {
        const text = projectFileToJson(projects.exportProject(Number(id)));
        if (file === '-') io.stdout(text);
        else {
          fs.writeFileSync(path.resolve(io.cwd, file), text);
          io.stdout(`Exported project ${id} to ${file}.\n`);
        }
        return 0;
      });
    }
    case 'import': {
      const file = parsed.positional[0];
      if (!file) {
        io.stderr(`projects import needs a project file. ${USAGE}\n`);
        return EXIT_BAD_INPUT;
      }
      return withServices(io, db, ({ projects }) => {
        const result = projects.importProject(projectFileFromJson(readTextFile(path.resolve(io.cwd, file))), parsed.options.get('on-existing'));
        const replaced = result.replaced === null ? '' : ` Project ${result.replaced} it replaces is in the recycle bin.`;
        io.stdout(`Imported project ${result.project.id} "${result.project.name}" with ${result.project.cases.length} case(s); materials reused ${result.materialsReused}, added ${result.materialsCreated}.${replaced}\n`);
        return 0;
      });
    }
    case 'create': {
      const name = parsed.positional[0];
      if (!name) {
        io.stderr(`projects create needs a project name. ${USAGE}\n`);
        return EXIT_BAD_INPUT;
      }
      const fields: Record<string, string> = { name };
      for (const key of CREATE_FIELDS) if (parsed.options.has(key)) fields[key] = parsed.options.get(key)!;
      return withServices(io, db, ({ projects }) => {
        const project = projects.create(fields);
        io.stdout(`Created project ${project.id} "${project.name}".\n`);
        return 0;
      });
    }
    case 'add-case': {
      const [id, file] = parsed.positional;
      if (!id || !/^\d+$/.test(id) || !file) {
        io.stderr(`projects add-case needs a project id (a whole number) and a case file. ${USAGE}\n`);
        return EXIT_BAD_INPUT;
      }
      let inputs: unknown;
      try {
        inputs = readCaseJson(file, io.cwd);
      } catch (error) {
        if (!isInputProblem(error)) throw error;
        io.stderr(`projects add-case: ${error.message}\n`);
        return exitCodeOf(error);
      }
      const name = parsed.options.get('name') ?? caseTitle(inputs) ?? path.basename(file, '.json');
      return withServices(io, db, ({ projects }) => {
        try {
          const added = projects.addCase(Number(id), { name, inputs });
          io.stdout(`Added case ${added.id} "${added.name}" to project ${id}.\n`);
          return 0;
        } catch (error) {
          // A case the service refuses (an unknown kind, a bad field) reads like a file the command refused.
          if (!isInputProblem(error)) throw error;
          io.stderr(`projects add-case: ${error.message}\n`);
          return exitCodeOf(error);
        }
      });
    }
    case 'add-demo':
      if (parsed.positional.length > 0) {
        io.stderr(`projects add-demo takes no arguments. ${USAGE}\n`);
        return EXIT_BAD_INPUT;
      }
      return withServices(io, db, ({ projects }) => {
        const demo = addDemoProject(projects);
        io.stdout(`Added the demo project ${demo.id} "${demo.name}" with ${demo.cases.length} case(s).\n`);
        return 0;
      });
    case 'solve': {
      const id = parsed.positional[0];
      const format = parsed.options.get('format') ?? 'json';
      if (!id || !/^\d+$/.test(id) || (format !== 'json' && format !== 'text')) {
        io.stderr(`projects solve needs a project id (a whole number); --format is json or text. ${USAGE}\n`);
        return EXIT_BAD_INPUT;
      }
      return withServices(io, db, ({ projects, materials }) => solveProject(io, projects.open(Number(id)), materials, format));
    }
    case 'report':
      return projectsReportCommand(parsed, io);
    case 'schedule':
      return projectScheduleCommand(parsed.positional, parsed.options, parsed.flags, io);
    default:
      io.stderr(`${sub === undefined ? 'projects needs a subcommand.' : `unknown subcommand "${sub}".`} ${USAGE}\n`);
      return EXIT_BAD_INPUT;
  }
};
