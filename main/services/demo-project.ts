/**
 * The demo project a new library opens with (data/demo/demo-project.json): its project fields and
 * a list of the example case files in data/examples whose inputs become its cases. It is added as
 * an ordinary imported project, so it can be edited and deleted like any other, and added again.
 */
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Project } from '../../app/api/project-types.js';
import { PROJECT_FILE_FORMAT, PROJECT_FILE_VERSION } from './project-file.js';
import type { ProjectsService } from './projects-service.js';

export const DEFAULT_DATA_FOLDER = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..', 'data');

interface DemoDescription {
  readonly project: Record<string, unknown>;
  readonly cases: readonly { readonly name: string; readonly example: string }[];
}

/** The demo as a project exchange file, built from the files in `dataFolder`. */
export function demoProjectFile(dataFolder = DEFAULT_DATA_FOLDER): unknown {
  const demo = JSON.parse(fs.readFileSync(path.join(dataFolder, 'demo', 'demo-project.json'), 'utf8')) as DemoDescription;
  return {
    format: PROJECT_FILE_FORMAT,
    formatVersion: PROJECT_FILE_VERSION,
    project: demo.project,
    materials: [],
    cases: demo.cases.map((c) => {
      const { $schema: _schema, ...inputs } = JSON.parse(fs.readFileSync(path.join(dataFolder, 'examples', c.example), 'utf8')) as Record<string, unknown>;
      return { name: c.name, inputs };
    }),
  };
}

export function addDemoProject(projects: ProjectsService, dataFolder = DEFAULT_DATA_FOLDER): Project {
  // Asked for again, it is added beside any demo already there.
  return projects.importProject(demoProjectFile(dataFolder), 'copy').project;
}
