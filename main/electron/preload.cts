/**
 * Preload for the sandboxed renderer (CommonJS: sandboxed preloads cannot be ES modules, and may
 * require only 'electron'). Exposes `window.lamina`, one function per IPC channel, and nothing of
 * Node or of ipcRenderer itself. The table is written out by hand because a sandboxed preload
 * cannot load a shared module; the LaminaApi type makes a missing or misspelt channel a compile error.
 */
import { contextBridge, ipcRenderer } from 'electron';
import type { ApiChannel, ApiRequest, ApiResponse, IpcReply, LaminaApi } from '../../app/api/contract.js';

/** An error that keeps the field the main process named, for forms that highlight it. */
class LaminaApiError extends Error {
  constructor(message: string, readonly field?: string) {
    super(message);
  }
}

async function invoke<C extends ApiChannel>(channel: C, request: ApiRequest<C> | undefined): Promise<ApiResponse<C>> {
  const reply = (await ipcRenderer.invoke(channel, request ?? {})) as IpcReply<ApiResponse<C>>;
  if (reply.ok) return reply.value;
  throw new LaminaApiError(reply.error, reply.field);
}

const api: LaminaApi = {
  appInfo: (request) => invoke('app:info', request),
  databaseStatus: (request) => invoke('database:status', request),
  pipeSizes: (request) => invoke('pipe-sizes:list', request),
  materials: {
    list: (request) => invoke('materials:list', request),
    get: (request) => invoke('materials:get', request),
    create: (request) => invoke('materials:create', request),
    update: (request) => invoke('materials:update', request),
    duplicate: (request) => invoke('materials:duplicate', request),
    remove: (request) => invoke('materials:remove', request),
    usage: (request) => invoke('materials:usage', request),
    importCsv: (request) => invoke('materials:import-csv', request),
    exportCsv: (request) => invoke('materials:export-csv', request),
    fitConductivity: (request) => invoke('materials:fit-conductivity', request),
  },
  projects: {
    list: (request) => invoke('projects:list', request),
    listRecycleBin: (request) => invoke('projects:list-recycle-bin', request),
    open: (request) => invoke('projects:open', request),
    create: (request) => invoke('projects:create', request),
    update: (request) => invoke('projects:update', request),
    rename: (request) => invoke('projects:rename', request),
    duplicate: (request) => invoke('projects:duplicate', request),
    remove: (request) => invoke('projects:remove', request),
    restore: (request) => invoke('projects:restore', request),
    emptyRecycleBin: (request) => invoke('projects:empty-recycle-bin', request),
    addCase: (request) => invoke('projects:add-case', request),
    updateCase: (request) => invoke('projects:update-case', request),
    removeCase: (request) => invoke('projects:remove-case', request),
    moveCase: (request) => invoke('projects:move-case', request),
    exportProject: (request) => invoke('projects:export-file', request),
    importProject: (request) => invoke('projects:import-file', request),
    addDemo: (request) => invoke('projects:add-demo', request),
    report: (request) => invoke('projects:report', request),
    saveReportPdf: (request) => invoke('projects:save-report-pdf', request),
  },
  schedules: {
    open: (request) => invoke('schedules:open', request),
    importCsv: (request) => invoke('schedules:import', request),
    updateRun: (request) => invoke('schedules:update-run', request),
    removeRuns: (request) => invoke('schedules:remove-runs', request),
    storeSizing: (request) => invoke('schedules:store-sizing', request),
    exportCsv: (request) => invoke('schedules:export', request),
    exportBill: (request) => invoke('schedules:export-bill', request),
    template: (request) => invoke('schedules:template', request),
    setSettings: (request) => invoke('schedules:set-settings', request),
  },
  settings: {
    letterhead: (request) => invoke('settings:letterhead', request),
    saveLetterhead: (request) => invoke('settings:save-letterhead', request),
  },
  backups: {
    list: (request) => invoke('backups:list', request),
    create: (request) => invoke('backups:create', request),
    restore: (request) => invoke('backups:restore', request),
  },
};

contextBridge.exposeInMainWorld('lamina', api);
