/**
 * The typed API between the UI and the Node side, one channel per operation.
 *
 * Pure types: the renderer imports this with `import type`, the Electron preload and main process
 * use it to type their single channel per operation, and the browser-mode server mirrors each
 * channel as `POST /api/<name>` (the channel name with ':' replaced by '-', e.g. `materials:list`
 * -> `/api/materials-list`). Every request is one JSON object whose fields are named below, and
 * every response is plain data. Over HTTP a vapour-tight μ (Infinity) travels as "inf"
 * (app/api/wire-json.ts); Electron's IPC carries Infinity as it is.
 */
import type { BackupInfo, DatabaseStatus, RestoreResult } from './backup-types.js';
import type {
  ConductivityFit, CsvImportResult, Material, MaterialFilter, MaterialInput, MaterialUsage,
} from './material-types.js';
import type { PipeSize } from '../cases/pipe/pipe-sizes.js';
import type { CaseDraft, Project, ProjectCase, ProjectFields, ProjectSummary } from './project-types.js';
import type { Letterhead, ProjectReport } from '../report/project-report.js';
import type { KeyedSizedRun, OpenedSchedule, ScheduleImportOutcome, ScheduleRun, ScheduleSettings } from './schedule-types.js';

export type * from './backup-types.js';
export type * from './material-types.js';
export type * from './project-types.js';
export type * from './schedule-types.js';
export type { Letterhead, LetterheadLogo, PaperSize, ProjectReport } from '../report/project-report.js';

/** What the running program is, for the title bar and the report footer. */
export interface AppInfo {
  readonly name: string;
  readonly version: string;
}

type NoFields = Record<string, never>;
type Id = { readonly id: number };

/** Channel name -> request and response. Add one entry per operation. */
export interface ApiChannels {
  'app:info': { readonly request: NoFields; readonly response: AppInfo };
  'database:status': { readonly request: NoFields; readonly response: DatabaseStatus };
  /** The pipe and tube size tables (data/pipe-sizes), for the case editor and for solving named sizes in the page. */
  'pipe-sizes:list': { readonly request: NoFields; readonly response: readonly PipeSize[] };

  'materials:list': { readonly request: MaterialFilter; readonly response: readonly Material[] };
  'materials:get': { readonly request: Id; readonly response: Material };
  'materials:create': { readonly request: { readonly material: MaterialInput }; readonly response: Material };
  'materials:update': { readonly request: Id & { readonly material: MaterialInput }; readonly response: Material };
  /** A user copy of any material, named "<name> (copy)" unless a name is given. */
  'materials:duplicate': { readonly request: Id & { readonly name?: string }; readonly response: Material };
  /** Refused while a case uses the material, unless `replaceWith` names the material to use instead. */
  'materials:remove': {
    readonly request: Id & { readonly replaceWith?: number };
    readonly response: { readonly replacedInCases: number };
  };
  'materials:usage': { readonly request: Id; readonly response: readonly MaterialUsage[] };
  'materials:import-csv': { readonly request: { readonly csv: string }; readonly response: CsvImportResult };
  'materials:export-csv': { readonly request: MaterialFilter; readonly response: { readonly csv: string } };
  'materials:fit-conductivity': {
    readonly request: {
      /** [mean temperature °C, conductivity W/(m·K)] pairs from a data sheet. */
      readonly points: readonly (readonly [number, number])[];
      readonly degree: 1 | 2 | 3;
      readonly minServiceTemperature: number;
      readonly maxServiceTemperature: number;
    };
    readonly response: ConductivityFit;
  };

  'projects:list': { readonly request: NoFields; readonly response: readonly ProjectSummary[] };
  'projects:list-recycle-bin': { readonly request: NoFields; readonly response: readonly ProjectSummary[] };
  'projects:open': { readonly request: Id; readonly response: Project };
  'projects:create': { readonly request: { readonly fields: Partial<ProjectFields> & { readonly name: string } }; readonly response: Project };
  'projects:update': { readonly request: Id & { readonly changes: Partial<ProjectFields> }; readonly response: Project };
  'projects:rename': { readonly request: Id & { readonly name: string }; readonly response: Project };
  'projects:duplicate': { readonly request: Id & { readonly name?: string }; readonly response: Project };
  /** Moves the project to the recycle bin. */
  'projects:remove': { readonly request: Id; readonly response: null };
  'projects:restore': { readonly request: Id; readonly response: Project };
  'projects:empty-recycle-bin': { readonly request: NoFields; readonly response: { readonly deleted: number } };
  'projects:add-case': { readonly request: { readonly projectId: number; readonly draft: CaseDraft }; readonly response: ProjectCase };
  'projects:update-case': {
    readonly request: { readonly caseId: number; readonly changes: { readonly name?: string; readonly inputs?: unknown } };
    readonly response: ProjectCase;
  };
  'projects:remove-case': { readonly request: { readonly caseId: number }; readonly response: null };
  /** Puts the case at `position` (0 = first) among its project's cases; the others keep their order. */
  'projects:move-case': { readonly request: { readonly caseId: number; readonly position: number }; readonly response: Project };
  /** The project as one self-contained file (JSON text) and a suggested file name. */
  'projects:export-file': { readonly request: Id; readonly response: { readonly fileName: string; readonly text: string } };
  /**
   * A project exchange file. When a project from the same file (same name, client and reference) is
   * already there, the request must say `onExisting`: 'copy' (add beside it) or 'replace' (add, and
   * move the existing one to the recycle bin); without it the refusal's field is 'onExisting'.
   */
  'projects:import-file': {
    readonly request: { readonly text: string; readonly onExisting?: 'copy' | 'replace' };
    readonly response: { readonly project: Project; readonly materialsReused: number; readonly materialsCreated: number; readonly replaced: number | null };
  };
  /** Adds the demo project of data/demo again (a new library starts with it). */
  'projects:add-demo': { readonly request: NoFields; readonly response: Project };

  /**
   * The printed report of a project: every case solved in the project's units, with the letterhead
   * the project carries (from an imported file) or else the library's own.
   */
  'projects:report': { readonly request: Id; readonly response: ProjectReport };
  /**
   * Desktop only: prints the project's report to a PDF file the user picks in a save dialog
   * (Electron's printToPDF). `saved` is null when the user cancels. Browser mode prints through the
   * browser's own print dialog instead and refuses this channel.
   */
  'projects:save-report-pdf': { readonly request: Id; readonly response: { readonly saved: string | null } };

  /** A project's schedule of pipe runs with its settings, last sizings, stale runs and the library's material ids by name. */
  'schedules:open': { readonly request: { readonly projectId: number }; readonly response: OpenedSchedule };
  /** A CSV schedule (units in the header): every row good and stored, or every problem listed and nothing stored. */
  'schedules:import': { readonly request: { readonly projectId: number; readonly text: string }; readonly response: ScheduleImportOutcome };
  /** One run edited in the grid, checked as the pipe case it becomes; refused with the column and one sentence. */
  'schedules:update-run': { readonly request: { readonly projectId: number; readonly reference: string; readonly run: ScheduleRun }; readonly response: ScheduleRun };
  'schedules:remove-runs': { readonly request: { readonly projectId: number; readonly references: readonly string[] }; readonly response: { readonly removed: number } };
  /** Sizings made in the page's worker; each is kept only when sized from the run's current case. */
  'schedules:store-sizing': { readonly request: { readonly projectId: number; readonly results: readonly KeyedSizedRun[] }; readonly response: { readonly stored: number } };
  /** The schedule with the results of its up-to-date sizings, as CSV in the project's units. */
  'schedules:export': { readonly request: { readonly projectId: number }; readonly response: { readonly fileName: string; readonly text: string } };
  /** The bill of quantities as CSV, in the project's units. */
  'schedules:export-bill': { readonly request: { readonly projectId: number }; readonly response: { readonly fileName: string; readonly text: string } };
  /** An empty schedule (header only) in the project's units. */
  'schedules:template': { readonly request: { readonly projectId: number }; readonly response: { readonly fileName: string; readonly text: string } };
  'schedules:set-settings': { readonly request: { readonly projectId: number; readonly settings: ScheduleSettings }; readonly response: ScheduleSettings };

  /** The firm's letterhead for printed reports (name, address, contact, logo, paper size). */
  'settings:letterhead': { readonly request: NoFields; readonly response: Letterhead };
  /** Stores the letterhead after checking it (texts' lengths, logo type and size, no script in an SVG). */
  'settings:save-letterhead': { readonly request: { readonly letterhead: Letterhead }; readonly response: Letterhead };

  'backups:list': { readonly request: NoFields; readonly response: readonly BackupInfo[] };
  'backups:create': { readonly request: NoFields; readonly response: BackupInfo };
  /** Closes the library, replaces it by the backup (moving the current file aside) and reopens it. */
  'backups:restore': { readonly request: { readonly file: string }; readonly response: RestoreResult };
}

export type ApiChannel = keyof ApiChannels;
export type ApiRequest<C extends ApiChannel> = ApiChannels[C]['request'];
export type ApiResponse<C extends ApiChannel> = ApiChannels[C]['response'];

/** A failed call, as both transports report it: one sentence naming what was wrong. */
export interface ApiError {
  readonly error: string;
  /** The request field at fault, when one is. */
  readonly field?: string;
}

/** One function of the API: channels without fields may be called with no argument. */
export type ApiCall<C extends ApiChannel> = NoFields extends ApiRequest<C>
  ? (request?: ApiRequest<C>) => Promise<ApiResponse<C>>
  : (request: ApiRequest<C>) => Promise<ApiResponse<C>>;

/**
 * The functions the preload exposes as `window.lamina` in the desktop app, one per channel. The
 * renderer's transport in browser mode implements the same interface over HTTP.
 */
export interface LaminaApi {
  appInfo: ApiCall<'app:info'>;
  databaseStatus: ApiCall<'database:status'>;
  pipeSizes: ApiCall<'pipe-sizes:list'>;
  materials: {
    list: ApiCall<'materials:list'>;
    get: ApiCall<'materials:get'>;
    create: ApiCall<'materials:create'>;
    update: ApiCall<'materials:update'>;
    duplicate: ApiCall<'materials:duplicate'>;
    remove: ApiCall<'materials:remove'>;
    usage: ApiCall<'materials:usage'>;
    importCsv: ApiCall<'materials:import-csv'>;
    exportCsv: ApiCall<'materials:export-csv'>;
    fitConductivity: ApiCall<'materials:fit-conductivity'>;
  };
  projects: {
    list: ApiCall<'projects:list'>;
    listRecycleBin: ApiCall<'projects:list-recycle-bin'>;
    open: ApiCall<'projects:open'>;
    create: ApiCall<'projects:create'>;
    update: ApiCall<'projects:update'>;
    rename: ApiCall<'projects:rename'>;
    duplicate: ApiCall<'projects:duplicate'>;
    remove: ApiCall<'projects:remove'>;
    restore: ApiCall<'projects:restore'>;
    emptyRecycleBin: ApiCall<'projects:empty-recycle-bin'>;
    addCase: ApiCall<'projects:add-case'>;
    updateCase: ApiCall<'projects:update-case'>;
    removeCase: ApiCall<'projects:remove-case'>;
    moveCase: ApiCall<'projects:move-case'>;
    exportProject: ApiCall<'projects:export-file'>;
    importProject: ApiCall<'projects:import-file'>;
    addDemo: ApiCall<'projects:add-demo'>;
    report: ApiCall<'projects:report'>;
    saveReportPdf: ApiCall<'projects:save-report-pdf'>;
  };
  schedules: {
    open: ApiCall<'schedules:open'>;
    importCsv: ApiCall<'schedules:import'>;
    updateRun: ApiCall<'schedules:update-run'>;
    removeRuns: ApiCall<'schedules:remove-runs'>;
    storeSizing: ApiCall<'schedules:store-sizing'>;
    exportCsv: ApiCall<'schedules:export'>;
    exportBill: ApiCall<'schedules:export-bill'>;
    template: ApiCall<'schedules:template'>;
    setSettings: ApiCall<'schedules:set-settings'>;
  };
  settings: {
    letterhead: ApiCall<'settings:letterhead'>;
    saveLetterhead: ApiCall<'settings:save-letterhead'>;
  };
  backups: {
    list: ApiCall<'backups:list'>;
    create: ApiCall<'backups:create'>;
    restore: ApiCall<'backups:restore'>;
  };
}

/**
 * What an IPC handler returns: the response, or the one-sentence refusal. Handlers return this
 * envelope instead of throwing, because Electron rewrites thrown errors' messages in transit.
 */
export type IpcReply<T> =
  | { readonly ok: true; readonly value: T }
  | { readonly ok: false; readonly error: string; readonly field?: string };
