/**
 * A standalone report document (renderReportDocument) to a PDF file, for the command line and the
 * benchmark. Chromium lays the pages out (the @page rules, the footer margin boxes, the repeated
 * table headers), so the PDF is the one the desktop app's printToPDF makes:
 *   1. Electron, where its binary is installed: a small print script (electron-print.cjs);
 *   2. else a Chromium at CHROMIUM_PATH, /usr/bin/chromium or `chromium` on PATH, driven through
 *      playwright-core;
 *   3. else no PDF: the HTML is written beside the requested path, with one line saying how to
 *      print it.
 */
import { spawn } from 'node:child_process';
import fs from 'node:fs';
import { createRequire } from 'node:module';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export type PrintOutcome =
  | { readonly kind: 'pdf'; readonly path: string; readonly pages: number | null; readonly by: 'electron' | 'chromium' }
  | { readonly kind: 'html'; readonly path: string; readonly hint: string };

type Env = Readonly<Record<string, string | undefined>>;

/** Electron's binary, found as `require('electron')` would give it but without its download-on-require. */
export function installedElectron(): string | undefined {
  try {
    const folder = path.dirname(createRequire(import.meta.url).resolve('electron/package.json'));
    const relative = fs.readFileSync(path.join(folder, 'path.txt'), 'utf8').trim();
    const binary = path.join(folder, 'dist', relative);
    return relative && fs.existsSync(binary) ? binary : undefined;
  } catch {
    return undefined;
  }
}

/** CHROMIUM_PATH if it names a file, else /usr/bin/chromium, else `chromium` (or chromium-browser) on PATH. */
export function findChromium(env: Env): string | undefined {
  const named = env['CHROMIUM_PATH']?.trim();
  if (named) return isExecutable(named) ? named : undefined;
  if (isExecutable('/usr/bin/chromium')) return '/usr/bin/chromium';
  for (const folder of (env['PATH'] ?? '').split(path.delimiter).filter(Boolean)) {
    for (const name of ['chromium', 'chromium-browser']) {
      const candidate = path.join(folder, name);
      if (isExecutable(candidate)) return candidate;
    }
  }
  return undefined;
}

function isExecutable(file: string): boolean {
  try {
    fs.accessSync(file, fs.constants.X_OK);
    return fs.statSync(file).isFile();
  } catch {
    return false;
  }
}

/** The page count of a PDF Chromium or Electron wrote: its page objects (neither writes them in object streams). */
export function countPdfPages(bytes: Uint8Array): number | null {
  const count = Buffer.from(bytes).toString('latin1').match(/\/Type\s*\/Page(?![a-zA-Z])/g)?.length ?? 0;
  return count > 0 ? count : null;
}

/**
 * A Chromium kept open for several documents (the benchmark, a test file); `close` ends it. One
 * page per document, closed after printing.
 */
export class ChromiumPrinter {
  private constructor(private readonly browser: import('playwright-core').Browser) {}

  static async open(executablePath: string): Promise<ChromiumPrinter> {
    const { chromium } = await import('playwright-core');
    // Chromium refuses to start its sandbox as root (containers, CI): then only without it.
    const asRoot = typeof process.getuid === 'function' && process.getuid() === 0;
    const browser = await chromium.launch({ executablePath, args: asRoot ? ['--no-sandbox'] : [] });
    return new ChromiumPrinter(browser);
  }

  async print(html: string, pdfPath: string): Promise<PrintOutcome> {
    const page = await this.browser.newPage();
    try {
      await page.setContent(html, { waitUntil: 'load' });
      // The fonts are data: URLs, loaded with the document; wait until they are in use.
      await page.evaluate(() => document.fonts.ready.then(() => undefined));
      await page.pdf({ path: pdfPath, preferCSSPageSize: true, printBackground: true });
    } finally {
      await page.close();
    }
    return { kind: 'pdf', path: pdfPath, pages: countPdfPages(fs.readFileSync(pdfPath)), by: 'chromium' };
  }

  close(): Promise<void> {
    return this.browser.close();
  }
}

/** Prints `html` to `pdfPath` with the first printer found (see the file comment). */
export async function printReportPdf(html: string, pdfPath: string, env: Env): Promise<PrintOutcome> {
  const electron = installedElectron();
  if (electron) return printWithElectron(electron, html, pdfPath);
  const chromium = findChromium(env);
  if (chromium && (await playwrightAvailable())) {
    const printer = await ChromiumPrinter.open(chromium);
    try {
      return await printer.print(html, pdfPath);
    } finally {
      await printer.close();
    }
  }
  const htmlPath = pdfPath.replace(/\.pdf$/i, '') + '.html';
  fs.writeFileSync(htmlPath, html);
  return {
    kind: 'html',
    path: htmlPath,
    hint: `${noPrinterReason(env)}: wrote ${htmlPath} instead; open it in a browser and print it to PDF.`,
  };
}

function noPrinterReason(env: Env): string {
  const named = env['CHROMIUM_PATH']?.trim();
  return named ? `CHROMIUM_PATH (${named.slice(0, 80)}) is not a program and Electron is not installed` : 'Neither Electron nor Chromium (CHROMIUM_PATH, /usr/bin/chromium, chromium on PATH) is installed to print a PDF';
}

async function playwrightAvailable(): Promise<boolean> {
  try {
    await import('playwright-core');
    return true;
  } catch {
    return false;
  }
}

/**
 * Runs Electron on electron-print.cjs with the document in a temporary file. Not exercised by the
 * tests: Electron's binary is not installed on the build machines (Chromium is).
 */
async function printWithElectron(electron: string, html: string, pdfPath: string): Promise<PrintOutcome> {
  const folder = fs.mkdtempSync(path.join(os.tmpdir(), 'lamina-print-'));
  const htmlPath = path.join(folder, 'report.html');
  fs.writeFileSync(htmlPath, html);
  const script = path.join(path.dirname(fileURLToPath(import.meta.url)), 'electron-print.cjs');
  try {
    const asRoot = typeof process.getuid === 'function' && process.getuid() === 0;
    const args = [...(asRoot ? ['--no-sandbox'] : []), script, htmlPath, pdfPath];
    const { code, stderr } = await new Promise<{ code: number | null; stderr: string }>((resolve, reject) => {
      const child = spawn(electron, args, { stdio: ['ignore', 'ignore', 'pipe'], env: { ...process.env, ELECTRON_RUN_AS_NODE: undefined } });
      let errors = '';
      child.stderr.on('data', (chunk: Buffer) => (errors += chunk.toString('utf8')));
      child.on('error', reject);
      child.on('close', (exit) => resolve({ code: exit, stderr: errors }));
    });
    if (code !== 0) throw new Error(`Electron could not print the report (exit ${code}): ${stderr.trim().split('\n').pop() ?? ''}`);
    return { kind: 'pdf', path: pdfPath, pages: countPdfPages(fs.readFileSync(pdfPath)), by: 'electron' };
  } finally {
    fs.rmSync(folder, { recursive: true, force: true });
  }
}
