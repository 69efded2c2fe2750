/**
 * lamina projects report ID --out FILE.pdf|FILE.html [--paper A4|Letter] [--db PATH]
 *
 * The project's printed report (the same model and HTML as the desktop app's preview and PDF):
 * .html writes the standalone document; .pdf prints it with Electron or Chromium (main/report/
 * print-pdf.ts) and, when neither is installed, writes the HTML beside it and says how to print it.
 * A bad id, a bad --out (extension, folder, permission) or a bad --paper is exit 2 with one sentence.
 */
import fs from 'node:fs';
import path from 'node:path';
import { renderReportDocument } from '../../../app/report/html/render-report.js';
import { PAPER_SIZES, type PaperSize, type ProjectReport } from '../../../app/report/project-report.js';
import { reportAssets } from '../../report/report-assets.js';
import { printReportPdf, type ChromiumPrinter, type PrintOutcome } from '../../report/print-pdf.js';
import { readAppIdentity } from '../../server/app-identity.js';
import type { LaminaServices } from '../../services/lamina-services.js';
import { projectReport } from '../../services/project-report-service.js';
import type { CliIO } from '../command.js';
import { EXIT_BAD_INPUT, EXIT_DONE, EXIT_FAILED } from '../exit-code.js';
import { fileAccessSentence } from '../file-access.js';
import { shownPath } from '../../storage/shown-path.js';
import type { ParsedArgs } from './materials.js';
import { withServices } from './materials.js';

export interface ReportRequest {
  readonly id: number;
  /** Absolute path ending in .pdf or .html. */
  readonly out: string;
  readonly paper?: PaperSize;
}

/** The request from the command line, or the one sentence that says what is wrong with it. */
export function reportRequest(parsed: ParsedArgs, cwd: string): ReportRequest | string {
  const id = parsed.positional[0];
  if (!id || !/^\d+$/.test(id) || Number(id) < 1 || parsed.positional.length > 1) {
    return 'projects report needs one project id, a whole number of 1 or more (lamina projects report ID --out FILE.pdf|FILE.html).';
  }
  const out = parsed.options.get('out');
  if (out === undefined || out.trim() === '') return '--out must name the report file to write, ending in .pdf or .html.';
  if (!/\.(pdf|html)$/i.test(out)) return `--out must name a .pdf or .html file (got ${shownPath(out)}).`;
  const paper = parsed.options.get('paper');
  if (paper !== undefined && !(PAPER_SIZES as readonly string[]).includes(paper)) return `--paper must be one of ${PAPER_SIZES.join(', ')} (got ${paper.slice(0, 20)}).`;
  const absolute = path.resolve(cwd, out);
  const unwritable = whyNotWritable(absolute);
  if (unwritable) return `--out: ${unwritable}`;
  return { id: Number(id), out: absolute, ...(paper ? { paper: paper as PaperSize } : {}) };
}

/** Why `file` cannot be written, in one sentence, or undefined. Tried by opening it (and removing it again when it is new). */
function whyNotWritable(file: string): string | undefined {
  const existed = fs.existsSync(file);
  try {
    fs.closeSync(fs.openSync(file, 'a'));
    if (!existed) fs.rmSync(file, { force: true });
    return undefined;
  } catch (error) {
    return fileAccessSentence(error, file, 'write');
  }
}

export async function projectsReportCommand(parsed: ParsedArgs, io: CliIO): Promise<number> {
  const request = reportRequest(parsed, io.cwd);
  if (typeof request === 'string') {
    io.stderr(`${request}\n`);
    return EXIT_BAD_INPUT;
  }
  return withServices(io, parsed.options.get('db'), async (services) => {
    let outcome: PrintOutcome;
    try {
      outcome = await writeProjectReport(services, request, io.env);
    } catch (error) {
      if (!(error instanceof PrintFailure)) throw error;
      io.stderr(`${error.message}\n`);
      return EXIT_FAILED;
    }
    if (outcome.kind === 'html' && !request.out.toLowerCase().endsWith('.html')) io.stdout(`${outcome.hint}\n`);
    else io.stdout(`Wrote the report of project ${request.id} to ${outcome.path}${outcome.kind === 'pdf' && outcome.pages ? ` (${outcome.pages} page${outcome.pages === 1 ? '' : 's'})` : ''}.\n`);
    return EXIT_DONE;
  });
}

/** A PDF that could not be printed although a printer was found (the browser failed). */
export class PrintFailure extends Error {
  override name = 'PrintFailure';
}

/** The report model of the project, on the paper asked for. */
export function reportOf(services: LaminaServices, request: Pick<ReportRequest, 'id' | 'paper'>): ProjectReport {
  const identity = readAppIdentity();
  const report = projectReport(services, request.id, `${identity.name} ${identity.version}`);
  return request.paper ? { ...report, letterhead: { ...report.letterhead, paper: request.paper } } : report;
}

/**
 * What `lamina projects report` does once its arguments are checked: the standalone document,
 * written as it is (.html) or printed (.pdf). `printer` lets a caller printing many reports keep
 * one Chromium open (the benchmark, the tests); without it one is started for this report.
 */
export async function writeProjectReport(
  services: LaminaServices,
  request: ReportRequest,
  env: Readonly<Record<string, string | undefined>>,
  printer?: ChromiumPrinter,
): Promise<PrintOutcome> {
  const html = renderReportDocument(reportOf(services, request), reportAssets());
  if (request.out.toLowerCase().endsWith('.html')) {
    fs.writeFileSync(request.out, html);
    return { kind: 'html', path: request.out, hint: '' };
  }
  try {
    return printer ? await printer.print(html, request.out) : await printReportPdf(html, request.out, env);
  } catch (error) {
    throw new PrintFailure(`The report could not be printed to ${shownPath(request.out)}: ${(error as Error).message.split('\n')[0]}`);
  }
}
