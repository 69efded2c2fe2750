/**
 * Electron main process: one locked-down window showing the built renderer, and one IPC handler
 * per API channel. Kept thin: the work is in the engine (app/) and the operations (main/server/).
 *
 * Compiled by `npm run build:main` to build/main/electron/main.js (package.json "main").
 */
import { app, BrowserWindow, dialog, ipcMain, session, type IpcMainInvokeEvent, type WebContents } from 'electron';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import type { IpcReply } from '../../app/api/contract.js';
import { API_CHANNELS, createOperations, describeFailure } from '../server/operations.js';
import { PRODUCT_NAME } from '../server/app-identity.js';
import { LibraryHost } from '../server/library-host.js';
import { DATABASE_FILE_NAME } from '../storage/database-path.js';
import { CONTENT_SECURITY_POLICY } from '../server/security-policy.js';
import { isAppPage, mayNavigate } from './navigation-policy.js';
import { renderReportDocument } from '../../app/report/html/render-report.js';
import type { ProjectReport } from '../../app/report/project-report.js';
import { reportAssets } from '../report/report-assets.js';

const here = path.dirname(fileURLToPath(import.meta.url));
/** build/main/electron/ -> build/renderer/index.html */
const RENDERER_PAGE = path.join(here, '..', '..', 'renderer', 'index.html');
const RENDERER_URL = pathToFileURL(RENDERER_PAGE).href;
const PRELOAD = path.join(here, 'preload.cjs');

// Every renderer runs sandboxed, whatever a window's own options say.
app.enableSandbox();

function lockDownSession(): void {
  const ses = session.defaultSession;
  // No remote content at all: the app is offline and loads only its own files.
  ses.webRequest.onBeforeRequest({ urls: ['http://*/*', 'https://*/*', 'ws://*/*', 'wss://*/*'] }, (_details, callback) =>
    callback({ cancel: true }),
  );
  ses.webRequest.onHeadersReceived((details, callback) =>
    callback({
      responseHeaders: { ...details.responseHeaders, 'Content-Security-Policy': [CONTENT_SECURITY_POLICY] },
    }),
  );
  ses.setPermissionRequestHandler((_contents, _permission, callback) => callback(false));
  ses.setPermissionCheckHandler(() => false);
}

/**
 * Applies to every web contents, including any a future feature creates. will-navigate covers the
 * main frame only; will-frame-navigate also covers frames inside the page (the rules are in
 * navigation-policy.ts).
 */
function refuseLeavingTheApp(contents: WebContents): void {
  contents.setWindowOpenHandler(() => ({ action: 'deny' }));
  contents.on('will-navigate', (event) => {
    if (!mayNavigate(event, RENDERER_URL)) event.preventDefault();
  });
  contents.on('will-frame-navigate', (event) => {
    if (!mayNavigate(event, RENDERER_URL)) event.preventDefault();
  });
  contents.on('will-redirect', (event) => event.preventDefault());
  contents.on('will-attach-webview', (event) => event.preventDefault());
}

function isTrustedSender(event: IpcMainInvokeEvent): boolean {
  return isAppPage(event.senderFrame?.url ?? '', RENDERER_URL);
}

/**
 * The library lives in Electron's userData folder. Opened once; a damaged file is reported to the
 * page (database:status) with the backups it can restore, and never overwritten. The built-in
 * materials are read from the app's own data folder (not relative to the compiled file).
 */
function openLibrary(): Promise<LibraryHost> {
  return LibraryHost.open(path.join(app.getPath('userData'), DATABASE_FILE_NAME), {
    seedFolder: path.join(app.getAppPath(), 'data', 'materials'),
    // A first start opens on a complete, solved example (data/demo).
    demoProjectOnCreate: true,
    dataFolder: path.join(app.getAppPath(), 'data'),
  });
}

/** A file name from the project's reference or name: letters, digits, dashes and dots only. */
function reportFileName(report: ProjectReport): string {
  const stem = (report.project.reference || report.project.name).normalize('NFKD').replace(/[^\w.-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 80);
  return `${stem || 'project'}-report.pdf`;
}

/**
 * Prints a report to a PDF the user picks: the standalone document (fonts and stylesheet inline)
 * in a hidden window with JavaScript off, printed with its CSS page size, then written.
 */
async function saveReportPdf(report: ProjectReport): Promise<string | null> {
  const parent = BrowserWindow.getFocusedWindow();
  const options = { defaultPath: reportFileName(report), filters: [{ name: 'PDF', extensions: ['pdf'] }] };
  const choice = parent ? await dialog.showSaveDialog(parent, options) : await dialog.showSaveDialog(options);
  if (choice.canceled || !choice.filePath) return null;
  const html = renderReportDocument(report, reportAssets(app.getAppPath()));
  // A file, not a data: URL: a logo of up to 1 MB would pass Chromium's 2 MB limit on URLs.
  const folder = await mkdtemp(path.join(app.getPath('temp'), 'lamina-report-'));
  const printer = new BrowserWindow({
    show: false,
    webPreferences: { sandbox: true, contextIsolation: true, javascript: false, nodeIntegration: false, webSecurity: true },
  });
  try {
    const page = path.join(folder, 'report.html');
    await writeFile(page, html);
    await printer.loadFile(page);
    const pdf = await printer.webContents.printToPDF({ preferCSSPageSize: true, printBackground: true });
    await writeFile(choice.filePath, pdf);
    return choice.filePath;
  } finally {
    printer.destroy();
    await rm(folder, { recursive: true, force: true });
  }
}

/** One ipcMain.handle per channel; the handler's own checks are in operations.ts. */
function registerIpcHandlers(library: LibraryHost): void {
  const operations = createOperations({ name: PRODUCT_NAME, version: app.getVersion(), library, saveReportPdf });
  for (const channel of API_CHANNELS) {
    ipcMain.handle(channel, async (event, request: unknown): Promise<IpcReply<unknown>> => {
      if (!isTrustedSender(event)) return { ok: false, error: 'Requests from pages other than Lamina are refused.' };
      try {
        return { ok: true, value: await operations[channel](request) };
      } catch (error) {
        const failure = describeFailure(error);
        if (failure) return { ok: false, ...failure.body };
        console.error(`Lamina: ${channel} failed:`, error);
        return { ok: false, error: `The ${channel} operation failed; see the terminal for details.` };
      }
    });
  }
}

/** Close the database before the process ends, once pending writes and backups are done. */
function closeLibraryOnQuit(library: LibraryHost): void {
  let closed = false;
  app.on('will-quit', (event) => {
    if (closed) return;
    event.preventDefault();
    library.close().then(
      () => undefined,
      (error: unknown) => console.error('Lamina: closing the library failed:', error),
    ).finally(() => {
      closed = true;
      app.quit();
    });
  });
}

function createMainWindow(): BrowserWindow {
  const window = new BrowserWindow({
    width: 1120,
    height: 800,
    minWidth: 640,
    minHeight: 480,
    title: 'Lamina',
    show: false,
    backgroundColor: '#f7f6f2',
    webPreferences: {
      preload: PRELOAD,
      contextIsolation: true,
      sandbox: true,
      nodeIntegration: false,
      nodeIntegrationInWorker: false,
      webSecurity: true,
      allowRunningInsecureContent: false,
      webviewTag: false,
      navigateOnDragDrop: false,
      spellcheck: false,
    },
  });
  window.once('ready-to-show', () => window.show());
  void window.loadFile(RENDERER_PAGE);
  return window;
}

app.on('web-contents-created', (_event, contents) => refuseLeavingTheApp(contents));
app.on('window-all-closed', () => app.quit());

app
  .whenReady()
  .then(async () => {
    lockDownSession();
    const library = await openLibrary(); // also starts the daily backup timer
    closeLibraryOnQuit(library);
    registerIpcHandlers(library);
    createMainWindow();
    // macOS: re-create the window when the dock icon is clicked and none is open.
    app.on('activate', () => {
      if (BrowserWindow.getAllWindows().length === 0) createMainWindow();
    });
  })
  .catch((error: unknown) => {
    console.error('Lamina could not start:', error);
    app.exit(1);
  });
