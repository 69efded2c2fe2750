/**
 * The operations behind the API contract (app/api/contract.ts): one handler per channel, each of
 * which checks its request (shape, types, ranges, lengths, ids) before calling the service layer.
 * The Electron IPC handlers and the browser-mode HTTP endpoints both call these, so the two
 * transports behave the same. A refusal is one sentence naming the field; describeFailure turns
 * any expected failure into the contract's ApiError.
 */
import { pipeSizeCatalogue } from '../pipe-sizes/pipe-size-catalogue.js';
import { addDemoProject } from '../services/demo-project.js';
import type { ApiChannel, ApiChannels, ApiError, ApiResponse } from '../../app/api/contract.js';
import { MATERIAL_LIMITS } from '../../app/api/material-limits.js';
import { MATERIAL_CATEGORIES, MATERIAL_ORIGINS, type MaterialFilter } from '../../app/api/material-types.js';
import { PROJECT_FIELDS } from '../../app/api/project-types.js';
import { fitConductivityCurve } from '../services/conductivity-fit.js';
import { validateMaterialInput } from '../services/material-validation.js';
import { projectFileFromJson, projectFileToJson } from '../services/project-file.js';
import { projectReport } from '../services/project-report-service.js';
import type { ProjectReport } from '../../app/report/project-report.js';
import { PROJECT_LIMITS } from '../services/project-validation.js';
import { NotFoundError, RefusedError } from '../services/service-errors.js';
import { InputError, SingularProblemError } from '../../app/index.js';
import { isPlainObject, optionalText, rejectUnknownKeys, requireId, requireOneOf, requireText } from '../services/validate.js';
import { StorageError } from '../storage/storage-error.js';
import { LibraryUnavailableError, type LibraryHost } from './library-host.js';

export type OperationHandlers = {
  readonly [C in ApiChannel]: (request: unknown) => Promise<ApiResponse<C>>;
};

/** Every channel, for loops that register handlers or routes (checked against the contract below). */
export const API_CHANNELS = [
  'app:info', 'database:status', 'pipe-sizes:list',
  'materials:list', 'materials:get', 'materials:create', 'materials:update', 'materials:duplicate', 'materials:remove',
  'materials:usage', 'materials:import-csv', 'materials:export-csv', 'materials:fit-conductivity',
  'projects:list', 'projects:list-recycle-bin', 'projects:open', 'projects:create', 'projects:update', 'projects:rename',
  'projects:duplicate', 'projects:remove', 'projects:restore', 'projects:empty-recycle-bin', 'projects:add-case',
  'projects:update-case', 'projects:remove-case', 'projects:move-case', 'projects:export-file', 'projects:import-file', 'projects:add-demo',
  'projects:report', 'projects:save-report-pdf',
  'schedules:open', 'schedules:import', 'schedules:update-run', 'schedules:remove-runs', 'schedules:store-sizing',
  'schedules:export', 'schedules:export-bill', 'schedules:template', 'schedules:set-settings',
  'settings:letterhead', 'settings:save-letterhead',
  'backups:list', 'backups:create', 'backups:restore',
] as const satisfies readonly ApiChannel[];
// A channel in the contract but missing from the list above fails to compile here.
const everyChannelListed: Exclude<ApiChannel, (typeof API_CHANNELS)[number]> extends never ? true : never = true;
void everyChannelListed;

/** The browser-mode path that mirrors a channel: 'materials:list' -> '/api/materials-list'. */
export function httpPathFor(channel: ApiChannel): string {
  return `/api/${channel.replace(/:/g, '-')}`;
}

export interface OperationContext {
  readonly name: string;
  readonly version: string;
  /** The library; absent only where no database is wanted (then data channels refuse politely). */
  readonly library?: LibraryHost;
  /**
   * Prints a report to a PDF file the user picks (the desktop app's save dialog and printToPDF);
   * resolves to the path, or null when the user cancels. Absent in browser mode, where the
   * browser's own print dialog saves the PDF.
   */
  readonly saveReportPdf?: (report: ProjectReport) => Promise<string | null>;
}

/** Most runs (or references) one schedule request may carry. */
const MAX_LIST_REQUEST = 100_000;

/** Largest CSV or project file text accepted in one request (the HTTP body limit is set to match). */
export const MAX_TEXT_REQUEST = 20_000_000;

export function createOperations(context: OperationContext): OperationHandlers {
  const host = (): LibraryHost => {
    if (!context.library) throw new LibraryUnavailableError('No library database is open in this program.');
    return context.library;
  };
  const lib = () => host().library();

  return {
    'app:info': async (request) => {
      requireNoFields('app:info', request);
      return { name: context.name, version: context.version };
    },
    'pipe-sizes:list': async (request) => {
      requireNoFields('pipe-sizes:list', request);
      return pipeSizeCatalogue();
    },
    'database:status': async (request) => {
      requireNoFields('database:status', request);
      return host().status();
    },

    'materials:list': async (request) => lib().materials.list(materialFilter('materials:list', request)),
    'materials:get': async (request) => {
      const r = fields('materials:get', request, ['id']);
      return lib().materials.get(requireId(r['id'], 'id'));
    },
    'materials:create': async (request) => {
      const r = fields('materials:create', request, ['material']);
      return lib().materials.create(validateMaterialInput(r['material']));
    },
    'materials:update': async (request) => {
      const r = fields('materials:update', request, ['id', 'material']);
      const id = requireId(r['id'], 'id');
      return lib().materials.update(id, validateMaterialInput(r['material']));
    },
    'materials:duplicate': async (request) => {
      const r = fields('materials:duplicate', request, ['id', 'name']);
      const id = requireId(r['id'], 'id');
      const name = r['name'] === undefined ? undefined : requireText(r['name'], 'name', { min: 1, max: MATERIAL_LIMITS.name });
      return lib().materials.duplicate(id, name);
    },
    'materials:remove': async (request) => {
      const r = fields('materials:remove', request, ['id', 'replaceWith']);
      const id = requireId(r['id'], 'id');
      const replaceWith = r['replaceWith'] === undefined ? undefined : requireId(r['replaceWith'], 'replaceWith');
      return lib().materials.remove(id, replaceWith === undefined ? {} : { replaceWith });
    },
    'materials:usage': async (request) => {
      const r = fields('materials:usage', request, ['id']);
      return lib().materials.usage(requireId(r['id'], 'id'));
    },
    'materials:import-csv': async (request) => {
      const r = fields('materials:import-csv', request, ['csv']);
      return lib().materials.importCsv(requireLongText(r['csv'], 'csv'));
    },
    'materials:export-csv': async (request) => ({ csv: lib().materials.exportCsv(materialFilter('materials:export-csv', request)) }),
    'materials:fit-conductivity': async (request) => {
      const r = fields('materials:fit-conductivity', request, ['points', 'degree', 'minServiceTemperature', 'maxServiceTemperature']);
      // fitConductivityCurve checks each point, the degree and the range before it computes anything.
      return fitConductivityCurve(r['points'], {
        degree: r['degree'] as number,
        minServiceTemperature: r['minServiceTemperature'] as number,
        maxServiceTemperature: r['maxServiceTemperature'] as number,
      });
    },

    'projects:list': async (request) => {
      requireNoFields('projects:list', request);
      return lib().projects.list();
    },
    'projects:list-recycle-bin': async (request) => {
      requireNoFields('projects:list-recycle-bin', request);
      return lib().projects.listRecycleBin();
    },
    'projects:open': async (request) => lib().projects.open(requireId(fields('projects:open', request, ['id'])['id'], 'id')),
    'projects:create': async (request) => {
      const r = fields('projects:create', request, ['fields']);
      return lib().projects.create(projectFields(r['fields'], 'fields'));
    },
    'projects:update': async (request) => {
      const r = fields('projects:update', request, ['id', 'changes']);
      const id = requireId(r['id'], 'id');
      return lib().projects.update(id, projectFields(r['changes'], 'changes'));
    },
    'projects:rename': async (request) => {
      const r = fields('projects:rename', request, ['id', 'name']);
      const id = requireId(r['id'], 'id');
      return lib().projects.rename(id, requireText(r['name'], 'name', { min: 1, max: PROJECT_LIMITS.name }));
    },
    'projects:duplicate': async (request) => {
      const r = fields('projects:duplicate', request, ['id', 'name']);
      const id = requireId(r['id'], 'id');
      const name = r['name'] === undefined ? undefined : requireText(r['name'], 'name', { min: 1, max: PROJECT_LIMITS.name });
      return lib().projects.duplicate(id, name);
    },
    'projects:remove': async (request) => {
      lib().projects.remove(requireId(fields('projects:remove', request, ['id'])['id'], 'id'));
      return null;
    },
    'projects:restore': async (request) => lib().projects.restore(requireId(fields('projects:restore', request, ['id'])['id'], 'id')),
    'projects:empty-recycle-bin': async (request) => {
      requireNoFields('projects:empty-recycle-bin', request);
      return { deleted: lib().projects.emptyRecycleBin() };
    },
    'projects:add-case': async (request) => {
      const r = fields('projects:add-case', request, ['projectId', 'draft']);
      const projectId = requireId(r['projectId'], 'projectId');
      if (!isPlainObject(r['draft'])) throw new InputError('draft', 'draft must be an object with a name and inputs.');
      return lib().projects.addCase(projectId, r['draft']);
    },
    'projects:update-case': async (request) => {
      const r = fields('projects:update-case', request, ['caseId', 'changes']);
      const caseId = requireId(r['caseId'], 'caseId');
      if (!isPlainObject(r['changes'])) throw new InputError('changes', 'changes must be an object with a name, inputs or both.');
      return lib().projects.updateCase(caseId, r['changes']);
    },
    'projects:remove-case': async (request) => {
      lib().projects.removeCase(requireId(fields('projects:remove-case', request, ['caseId'])['caseId'], 'caseId'));
      return null;
    },
    'projects:move-case': async (request) => {
      const r = fields('projects:move-case', request, ['caseId', 'position']);
      const caseId = requireId(r['caseId'], 'caseId');
      // The upper end depends on the project's cases: the service checks it.
      const position = requirePosition(r['position'], 'position');
      return lib().projects.moveCase(caseId, position);
    },
    'projects:export-file': async (request) => {
      const id = requireId(fields('projects:export-file', request, ['id'])['id'], 'id');
      const file = lib().projects.exportProject(id);
      return { fileName: projectFileName(file.project.name), text: projectFileToJson(file) };
    },
    'projects:import-file': async (request) => {
      const r = fields('projects:import-file', request, ['text', 'onExisting']);
      return lib().projects.importProject(projectFileFromJson(requireLongText(r['text'], 'text')), r['onExisting']);
    },
    'projects:add-demo': async (request) => {
      requireNoFields('projects:add-demo', request);
      return addDemoProject(lib().projects, host().dataFolder);
    },
    'projects:report': async (request) => {
      const id = requireId(fields('projects:report', request, ['id'])['id'], 'id');
      return projectReport(lib(), id, `${context.name} ${context.version}`);
    },
    'projects:save-report-pdf': async (request) => {
      const id = requireId(fields('projects:save-report-pdf', request, ['id'])['id'], 'id');
      if (!context.saveReportPdf) {
        throw new RefusedError("This window cannot save a PDF itself: open the project's report and use the browser's print (Print, then Save as PDF).");
      }
      const report = projectReport(lib(), id, `${context.name} ${context.version}`);
      return { saved: await context.saveReportPdf(report) };
    },

    // The schedule's channels check the request's shape here; the service checks every value
    // (each run as the pipe case it becomes, each stored sizing against the run's current case).
    'schedules:open': async (request) => {
      const projectId = requireId(fields('schedules:open', request, ['projectId'])['projectId'], 'projectId');
      const schedules = lib().schedules;
      return { ...schedules.get(projectId), materialIds: schedules.materialIds() };
    },
    'schedules:import': async (request) => {
      const r = fields('schedules:import', request, ['projectId', 'text']);
      return lib().schedules.importCsv(requireId(r['projectId'], 'projectId'), requireLongText(r['text'], 'text'));
    },
    'schedules:update-run': async (request) => {
      const r = fields('schedules:update-run', request, ['projectId', 'reference', 'run']);
      const projectId = requireId(r['projectId'], 'projectId');
      return lib().schedules.updateRun(projectId, requireText(r['reference'], 'reference', { min: 1, max: 200 }), r['run']);
    },
    'schedules:remove-runs': async (request) => {
      const r = fields('schedules:remove-runs', request, ['projectId', 'references']);
      const projectId = requireId(r['projectId'], 'projectId');
      const references = r['references'];
      if (!Array.isArray(references) || references.length > MAX_LIST_REQUEST) {
        throw new InputError('references', `references must be a list of at most ${MAX_LIST_REQUEST} line references.`);
      }
      return { removed: lib().schedules.removeRuns(projectId, references) };
    },
    'schedules:store-sizing': async (request) => {
      const r = fields('schedules:store-sizing', request, ['projectId', 'results']);
      const projectId = requireId(r['projectId'], 'projectId');
      const results = r['results'];
      if (!Array.isArray(results) || results.length > MAX_LIST_REQUEST) {
        throw new InputError('results', `results must be a list of at most ${MAX_LIST_REQUEST} sized runs.`);
      }
      return { stored: lib().schedules.storeSizing(projectId, results) };
    },
    'schedules:export': async (request) => {
      const projectId = requireId(fields('schedules:export', request, ['projectId'])['projectId'], 'projectId');
      const project = lib().projects.open(projectId);
      return { fileName: scheduleFileName(project.name, 'schedule'), text: lib().schedules.exportCsv(projectId) };
    },
    'schedules:export-bill': async (request) => {
      const projectId = requireId(fields('schedules:export-bill', request, ['projectId'])['projectId'], 'projectId');
      const project = lib().projects.open(projectId);
      return { fileName: scheduleFileName(project.name, 'bill-of-quantities'), text: lib().schedules.billCsv(projectId) };
    },
    'schedules:template': async (request) => {
      const projectId = requireId(fields('schedules:template', request, ['projectId'])['projectId'], 'projectId');
      const project = lib().projects.open(projectId);
      return { fileName: scheduleFileName(project.name, 'schedule-template'), text: lib().schedules.template(projectId) };
    },
    'schedules:set-settings': async (request) => {
      const r = fields('schedules:set-settings', request, ['projectId', 'settings']);
      return lib().schedules.setSettings(requireId(r['projectId'], 'projectId'), r['settings']);
    },

    'settings:letterhead': async (request) => {
      requireNoFields('settings:letterhead', request);
      return lib().letterhead.get();
    },
    'settings:save-letterhead': async (request) => {
      const r = fields('settings:save-letterhead', request, ['letterhead']);
      // The service checks every field (texts, paper, the logo's type, size and content).
      return lib().letterhead.save(r['letterhead']);
    },

    'backups:list': async (request) => {
      requireNoFields('backups:list', request);
      return host().backups();
    },
    'backups:create': async (request) => {
      requireNoFields('backups:create', request);
      return host().withLibrary((services) => services.backups.create());
    },
    'backups:restore': async (request) => {
      const r = fields('backups:restore', request, ['file']);
      return host().restore(requireText(r['file'], 'file', { min: 1, max: 4096 }));
    },
  };
}

/** HTTP status and ApiError for a failure the user can act on; undefined for a bug (logged, not shown). */
export function describeFailure(error: unknown): { status: number; body: ApiError } | undefined {
  // The one place bad input becomes HTTP 400 (and the IPC refusal): the engine's InputError, which
  // the services and the request checks above raise too, and a problem with no unique solution.
  if (error instanceof InputError) return { status: 400, body: { error: error.message, field: error.field } };
  if (error instanceof SingularProblemError) return { status: 400, body: { error: error.message } };
  if (error instanceof NotFoundError) return { status: 404, body: { error: error.message } };
  if (error instanceof RefusedError) return { status: 409, body: { error: error.message } };
  if (error instanceof LibraryUnavailableError) return { status: 409, body: { error: error.message } };
  if (error instanceof StorageError) return { status: 503, body: { error: error.message } };
  return undefined;
}

/** A request with no parameters may arrive as undefined, null or {}; anything else is refused. */
function requireNoFields(channel: ApiChannel, request: unknown): void {
  fields(channel, request, []);
}

/** The request as an object with only the named fields (undefined or null count as {}). */
function fields(channel: keyof ApiChannels, request: unknown, known: readonly string[]): Record<string, unknown> {
  if (request === undefined || request === null) return {};
  if (!isPlainObject(request)) {
    throw new InputError(
      'request',
      known.length ? `The ${channel} request must be a JSON object with ${known.join(', ')}.` : `The ${channel} request must be an empty JSON object.`,
    );
  }
  const keys = Object.keys(request);
  const unknown = keys.find((key) => !known.includes(key));
  if (unknown !== undefined) {
    throw new InputError(
      unknown,
      known.length === 0
        ? `The ${channel} request takes no fields, but it was sent "${unknown}".`
        : `The ${channel} request has no field "${unknown}" (allowed: ${known.join(', ')}).`,
    );
  }
  return request;
}

function materialFilter(channel: ApiChannel, request: unknown): MaterialFilter {
  const r = fields(channel, request, ['search', 'category', 'origin']);
  const search = optionalText(r['search'], 'search', 200);
  return {
    ...(search ? { search } : {}),
    ...(r['category'] === undefined || r['category'] === '' ? {} : { category: requireOneOf(r['category'], 'category', MATERIAL_CATEGORIES) }),
    ...(r['origin'] === undefined ? {} : { origin: requireOneOf(r['origin'], 'origin', MATERIAL_ORIGINS) }),
  };
}

/** Project fields are checked in full by the service; here only that they are an object of known fields. */
function projectFields(value: unknown, field: string): Record<string, unknown> {
  if (!isPlainObject(value)) throw new InputError(field, `${field} must be an object of project fields.`);
  rejectUnknownKeys(value, PROJECT_FIELDS, field);
  return value;
}

/** A place in a list: a whole number from 0 (the service knows the list's length). */
function requirePosition(value: unknown, field: string): number {
  if (typeof value !== 'number' || !Number.isSafeInteger(value) || value < 0) {
    throw new InputError(field, `${field} must be a whole number from 0 (the first place).`);
  }
  return value;
}

function requireLongText(value: unknown, field: string): string {
  if (typeof value !== 'string') throw new InputError(field, `${field} must be text.`);
  if (value.length > MAX_TEXT_REQUEST) throw new InputError(field, `${field} must be at most ${MAX_TEXT_REQUEST / 1_000_000} MB.`);
  return value;
}

/** A file name from the project name: letters, digits, dashes and dots only. */
function projectFileName(projectName: string): string {
  const stem = projectName.normalize('NFKD').replace(/[^\w.-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 80) || 'project';
  return `${stem}.lamina.json`;
}

/** A schedule's CSV file name from the project name: "<project>-schedule.csv". */
function scheduleFileName(projectName: string, what: string): string {
  const stem = projectName.normalize('NFKD').replace(/[^\w.-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 80) || 'project';
  return `${stem}-${what}.csv`;
}
