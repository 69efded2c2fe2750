/**
 * `lamina projects report` end to end: the demo project (with a letterhead saved in the library)
 * printed to PDF by the command line in Debian's Chromium, then read back with poppler's
 * pdftotext, pdfinfo and pdffonts. The expected figures are not read from the HTML: each case is
 * solved again with solveCase and its key figure written by the one QuantityText of the project's
 * units, so the paper is checked against the engine. Real SQLite libraries in temporary folders.
 */
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { solveCase } from '../../app/cases/solve-case.js';
import { quantityText } from '../../app/base/quantity-text.js';
import type { UnitSystem } from '../../app/base/unit-systems.js';
import { GENERAL_CAUTION } from '../../app/report/general-caution.js';
import { VERDICT_WORDS } from '../../app/report/report-words.js';
import { caseContext } from '../../main/cases/case-context.js';
import { openLamina, type LaminaServices } from '../../main/services/lamina-services.js';
import { addDemoProject } from '../../main/services/demo-project.js';
import { runLamina, temporaryFolder } from '../cases/in-process-cli.js';

const FIRM = 'Brackwater Thermal Engineering Ltd (invented firm)';
const PNG = fs.readFileSync(path.join(__dirname, '..', 'storage', 'fixtures', 'logo-24x16.png')).toString('base64');

let folder: string;
let db: string;
let services: LaminaServices;
let siId: number;
let usId: number;

beforeAll(async () => {
  folder = temporaryFolder('lamina-report-print-');
  db = path.join(folder, 'library.sqlite');
  services = await openLamina(db);
  services.letterhead.save({ firmName: FIRM, address: '12 Weir Street\nBrackwater BW1 4QA', telephone: '+44 1632 960 771', email: 'office@brackwater.example', logo: { mediaType: 'image/png', base64: PNG }, paper: 'A4' });
  const demo = addDemoProject(services.projects);
  siId = services.projects.update(demo.id, { checker: 'M. Ferreira (invented)' }).id;
  const us = addDemoProject(services.projects);
  usId = services.projects.update(us.id, { name: 'Orrin Valley Creamery, US units (demo)', reference: 'BTE-DEMO-002', unitSystem: 'IP' }).id;
  // The CLI opens the library itself: close ours so the two never write at once.
  services.close();
});

afterAll(() => fs.rmSync(folder, { recursive: true, force: true }));

const pdftotext = (pdf: string, layout: boolean) => execFileSync('pdftotext', [...(layout ? ['-layout'] : []), pdf, '-'], { encoding: 'utf8' });
const pageCount = (pdf: string) => Number(/^Pages:\s+(\d+)/m.exec(execFileSync('pdfinfo', [pdf], { encoding: 'utf8' }))![1]);

/** The text as a reader reads it: footers removed, white space (and no-break spaces) collapsed to one space. */
function readable(text: string, footer: string): string {
  return text
    .split('\n')
    .filter((line) => !/^\s*page \d+ of \d+\s*$/.test(line) && line.trim() !== footer)
    .join(' ')
    .replace(/[\s\u00a0\u202f]+/g, ' ');
}
const collapse = (text: string) => text.replace(/[\s\u00a0\u202f]+/g, ' ').trim();

/** Each case of the stored project solved again, with the key figure as the project's units write it. */
async function expectedCases(id: number, system: UnitSystem) {
  const lamina = await openLamina(db);
  try {
    const project = lamina.projects.open(id);
    const context = { ...caseContext(lamina.materials), unitSystem: system };
    const text = quantityText(system);
    return {
      project,
      cases: project.cases.map((c) => {
        const { report } = solveCase(c.inputs, context);
        const key = report.keyFigures[0]!;
        return { name: c.name, keyFigure: text.figure(key.value!, key.quantity), verdicts: report.verdicts, cautions: report.cautions };
      }),
    };
  } finally {
    lamina.close();
  }
}

describe('the demo project printed by `lamina projects report` in Chromium', () => {
  let pdf: string;
  let layoutText: string;
  let text: string;
  let stdout: string;

  beforeAll(async () => {
    pdf = path.join(folder, 'demo report.pdf');
    const result = await runLamina(['projects', 'report', String(siId), '--out', pdf], { db, cwd: folder });
    expect(result.stderr).toBe('');
    expect(result.code).toBe(0);
    stdout = result.stdout;
    layoutText = pdftotext(pdf, true);
    text = readable(pdftotext(pdf, false), 'BTE-DEMO-001 revision A');
  });

  it('says where it wrote the PDF and how many pages it has, as pdfinfo counts them', () => {
    const pages = pageCount(pdf);
    expect(stdout).toBe(`Wrote the report of project ${siId} to ${pdf} (${pages} pages).\n`);
    expect(pages).toBeGreaterThan(6); // a cover and summary, then at least a page per case
  });

  it('numbers every page "page N of M" with M the page count, beside the reference and revision', () => {
    const pages = layoutText.split('\f').filter((page) => page.trim() !== '');
    const count = pageCount(pdf);
    expect(pages).toHaveLength(count);
    pages.forEach((page, i) => {
      expect(page, `page ${i + 1}`).toMatch(new RegExp(`BTE-DEMO-001 revision A\\s+page ${i + 1} of ${count}\\s*$`));
    });
  });

  it('names the firm, the client, the checker, every case, each key figure as solveCase gives it, every verdict and the cautions', async () => {
    const { project, cases } = await expectedCases(siId, 'SI');
    expect(text).toContain(FIRM);
    expect(text).toContain('12 Weir Street');
    expect(text).toContain(project.client);
    expect(text).toContain('M. Ferreira (invented)');
    expect(cases).toHaveLength(6);
    for (const c of cases) {
      expect(text, c.name).toContain(collapse(c.name));
      expect(text, `${c.name}: key figure`).toContain(collapse(c.keyFigure));
      for (const v of c.verdicts) expect(text, `${c.name}: ${v.title}`).toContain(`${VERDICT_WORDS[v.verdict]} ${collapse(v.title)}`);
    }
    // Every verdict word the demo's checks give is on the paper (the demo has passes and at least one other).
    const words = new Set(cases.flatMap((c) => c.verdicts.map((v) => VERDICT_WORDS[v.verdict])));
    expect(words.size).toBeGreaterThanOrEqual(2);
    for (const caution of new Set([...cases.flatMap((c) => c.cautions), GENERAL_CAUTION])) expect(text).toContain(collapse(caution));
  });

  it('embeds every font, and every font is Source Sans 3 (the logo is a PNG: no other font has a reason to appear)', () => {
    expectOnlySourceSans(pdf);
  });
});

/**
 * pdffonts' rows: name and whether embedded. Columns: name, type (1–2 words), encoding, emb, sub,
 * uni, object, generation. Every character the report prints is in the shipped subsets (latin,
 * latin-ext, greek of @fontsource/source-sans-3): superscripts the font lacks are raised digits
 * (app/report/html/escape-html.ts), so no system font (DejaVu, Liberation) stands in.
 */
function expectOnlySourceSans(pdf: string): void {
  const fonts = execFileSync('pdffonts', [pdf], { encoding: 'utf8' }).split('\n').slice(2).filter(Boolean);
  const rows = fonts.map((line) => {
    const name = line.split(/\s+/)[0]!;
    const [emb] = line.trim().split(/\s+/).slice(-5);
    return { name, embedded: emb === 'yes' };
  });
  expect(rows.length).toBeGreaterThan(0);
  expect(rows.filter((r) => !r.embedded)).toEqual([]);
  expect(rows.map((r) => r.name).filter((name) => !/^[A-Z]{6}\+SourceSans3/.test(name))).toEqual([]);
}

describe('a project in US units, and the HTML output', () => {
  it('prints its key figures in US units (°F, Btu) as solveCase gives them', async () => {
    const pdf = path.join(folder, 'us.pdf');
    const result = await runLamina(['projects', 'report', String(usId), '--out', pdf, '--paper', 'Letter'], { db, cwd: folder });
    expect(result.code).toBe(0);
    const text = readable(pdftotext(pdf, false), 'BTE-DEMO-002 revision A');
    const { cases } = await expectedCases(usId, 'IP');
    for (const c of cases) expect(text, `${c.name}: key figure`).toContain(collapse(c.keyFigure));
    expect(text).toContain('°F');
    expect(text).toMatch(/Btu/);
    // Letter paper: 612 × 792 points.
    expect(execFileSync('pdfinfo', [pdf], { encoding: 'utf8' })).toMatch(/Page size:\s+612 x 792 pts \(letter\)/);
    expectOnlySourceSans(pdf);
  });

  it('writes a standalone .html with no script and nothing fetched', async () => {
    const html = path.join(folder, 'report.HTML');
    const result = await runLamina(['projects', 'report', String(siId), '--out', 'report.HTML'], { db, cwd: folder });
    expect(result).toEqual({ code: 0, stdout: `Wrote the report of project ${siId} to ${html}.\n`, stderr: '' });
    const document = fs.readFileSync(html, 'utf8');
    expect(document).toMatch(/^<!doctype html>/);
    expect(document).not.toMatch(/<script/i);
    expect(document).not.toMatch(/(src|href)="(https?:|\/\/|file:)/i);
    expect(document).toContain('@font-face');
    expect(document).toContain(FIRM);
  });
});
