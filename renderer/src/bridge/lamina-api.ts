/**
 * The renderer's way to the Node side. In the desktop app the preload exposes `window.lamina`
 * (one function per IPC channel); in browser mode the same operations are JSON endpoints on the
 * local server (POST /api/<channel name with '-' for ':'>). The UI sees only `LaminaApi`.
 */
import type { ApiChannel, ApiError, ApiRequest, ApiResponse, LaminaApi } from '../../../app/api/contract.js';
import { fromWireJson, toWireJson } from '../../../app/api/wire-json.js';

declare global {
  interface Window {
    lamina?: LaminaApi;
  }
}

export type Transport = 'desktop' | 'browser';

export function currentTransport(): Transport {
  return window.lamina ? 'desktop' : 'browser';
}

export function laminaApi(): LaminaApi {
  return window.lamina ?? httpApi;
}

/** A refused call: the sentence to show, and the request field it names when there is one. */
export class LaminaApiError extends Error {
  constructor(message: string, readonly field?: string) {
    super(message);
  }
}

/** The field a refusal names, whichever transport it came through. */
export function fieldOf(error: unknown): string | undefined {
  const field = (error as { field?: unknown } | null)?.field;
  return typeof field === 'string' ? field : undefined;
}

export function messageOf(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

function call<C extends ApiChannel>(channel: C) {
  return (request?: ApiRequest<C>): Promise<ApiResponse<C>> => post(channel, request ?? {});
}

const httpApi: LaminaApi = {
  appInfo: call('app:info'),
  databaseStatus: call('database:status'),
  pipeSizes: call('pipe-sizes:list'),
  materials: {
    list: call('materials:list'),
    get: call('materials:get'),
    create: call('materials:create'),
    update: call('materials:update'),
    duplicate: call('materials:duplicate'),
    remove: call('materials:remove'),
    usage: call('materials:usage'),
    importCsv: call('materials:import-csv'),
    exportCsv: call('materials:export-csv'),
    fitConductivity: call('materials:fit-conductivity'),
  },
  projects: {
    list: call('projects:list'),
    listRecycleBin: call('projects:list-recycle-bin'),
    open: call('projects:open'),
    create: call('projects:create'),
    update: call('projects:update'),
    rename: call('projects:rename'),
    duplicate: call('projects:duplicate'),
    remove: call('projects:remove'),
    restore: call('projects:restore'),
    emptyRecycleBin: call('projects:empty-recycle-bin'),
    addCase: call('projects:add-case'),
    updateCase: call('projects:update-case'),
    removeCase: call('projects:remove-case'),
    moveCase: call('projects:move-case'),
    exportProject: call('projects:export-file'),
    importProject: call('projects:import-file'),
    addDemo: call('projects:add-demo'),
    report: call('projects:report'),
    saveReportPdf: call('projects:save-report-pdf'),
  },
  schedules: {
    open: call('schedules:open'),
    importCsv: call('schedules:import'),
    updateRun: call('schedules:update-run'),
    removeRuns: call('schedules:remove-runs'),
    storeSizing: call('schedules:store-sizing'),
    exportCsv: call('schedules:export'),
    exportBill: call('schedules:export-bill'),
    template: call('schedules:template'),
    setSettings: call('schedules:set-settings'),
  },
  settings: {
    letterhead: call('settings:letterhead'),
    saveLetterhead: call('settings:save-letterhead'),
  },
  backups: {
    list: call('backups:list'),
    create: call('backups:create'),
    restore: call('backups:restore'),
  },
};

async function post<C extends ApiChannel>(channel: C, body: unknown): Promise<ApiResponse<C>> {
  const path = `api/${channel.replace(/:/g, '-')}`;
  const response = await fetch(new URL(path, document.baseURI), {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: toWireJson(body),
  });
  const text = await response.text();
  let payload: unknown;
  try {
    payload = fromWireJson(text);
  } catch {
    throw new LaminaApiError(`The ${channel} request failed (status ${response.status}).`);
  }
  if (!response.ok) {
    const failure = payload as Partial<ApiError> | null;
    throw new LaminaApiError(failure?.error ?? `The ${channel} request failed (status ${response.status}).`, failure?.field);
  }
  return payload as ApiResponse<C>;
}
