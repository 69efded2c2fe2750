import fs from 'node:fs';
import path from 'node:path';
import type { CliCommand } from '../command.js';
import { projectFileFromJson, projectFileToJson } from '../../services/project-file.js';
import { parseArgs, withServices } from './materials.js';

/**
 * lamina projects list [--deleted] [--json]
 * lamina projects export ID FILE.json|-
 * lamina projects import FILE.json
 * Every form accepts --db PATH (else LAMINA_DB, else the per-system default).
 */
const USAGE = 'usage: lamina projects list [--deleted] [--json] | export ID FILE | import FILE [--db PATH]';

export const projectsCommand: CliCommand = async (args, io) => {
  const [sub, ...rest] = args;
  if (sub === '--help' || sub === '-h' || sub === 'help') {
    io.stdout(`${USAGE}\n`);
    return 0;
  }
  const parsed = parseArgs(rest, ['db'], ['json', 'deleted']);
  if (typeof parsed === 'string') {
    io.stderr(`${parsed} ${USAGE}\n`);
    return 2;
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
        return 2;
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
        return 2;
      }
      return withServices(io, db, ({ projects }) => {
        const result = projects.importProject(projectFileFromJson(fs.readFileSync(path.resolve(io.cwd, file), 'utf8')));
        io.stdout(`Imported project ${result.project.id} "${result.project.name}" with ${result.project.cases.length} case(s); materials reused ${result.materialsReused}, added ${result.materialsCreated}.\n`);
        return 0;
      });
    }
    default:
      io.stderr(`${sub === undefined ? 'projects needs a subcommand.' : `unknown subcommand "${sub}".`} ${USAGE}\n`);
      return 2;
  }
};
