/**
 * The client report in the browser: in real Chromium on the browser-mode server with a real SQLite
 * library that starts with the demo project, the project's checker and revision note are saved, a
 * letterhead is set on the Report letterhead screen (an SVG logo with a script is refused with one
 * sentence beside the logo, a clean one is kept), and the report preview of the demo project shows
 * the firm, the client, every case and the summary table. The page printed to PDF as the browser's
 * own print does (print media, the stylesheet's page size) holds the report and none of the app
 * around it, with "page N of M" in the footer (read with pdftotext). Screenshots of the settings
 * screen and the preview at 1366×800 and 1280×720, and the printed PDF, go to test-results/.
 * The firm, its address and the demo scenario are invented.
 */
import { execFileSync } from 'node:child_process';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { startBrowserServer, type BrowserServer } from '../../main/server/browser-server.js';
import type { LaminaServices } from '../../main/services/lamina-services.js';
import { resultsFolder, useBrowserSession } from './browser-session.js';
import { MAX_LOGO_BYTES } from '../../app/api/letterhead-limits.js';

const session = useBrowserSession('lamina-report-preview-e2e-');
let server: BrowserServer;
let services: LaminaServices;

beforeAll(async () => {
  server = await startBrowserServer({ port: 0, databasePath: path.join(session.tempFolder(), 'lamina.sqlite'), demoProjectOnCreate: true, dailyBackups: false });
  services = server.library.library();
});
afterAll(async () => {
  await server?.close();
});

const FIRM = 'Brackwater Thermal Engineering Ltd';
const ADDRESS = 'Unit 7, Slipway Yard\nBrackwater BW4 2QT';
const CLEAN_LOGO = '<svg xmlns="http://www.w3.org/2000/svg" width="120" height="40" viewBox="0 0 120 40"><rect x="2" y="2" width="36" height="36" fill="#2c5d6e"/><text x="46" y="27" font-size="18" font-family="sans-serif">BTE</text></svg>';
const SCRIPTED_LOGO = '<svg xmlns="http://www.w3.org/2000/svg" width="40" height="40"><script>alert(1)</script><rect width="40" height="40"/></svg>';
/** The app's own words around the report: none of them may reach the paper. */
const APP_CHROME = ['Materials library', 'Backups', 'Report letterhead', 'Print report', 'Close preview', 'Report preview', 'Lamina works out', 'Early version'];

const shot = (page: Page, name: string) => page.screenshot({ path: path.join(resultsFolder, name) });
const focusedId = (page: Page) => page.evaluate(() => document.activeElement?.id);

async function newPage(problems: string[]): Promise<Page> {
  const page = await session.browser().newPage({ viewport: { width: 1366, height: 800 } });
  page.on('console', (m) => { if (m.type() === 'error' || m.type() === 'warning') problems.push(`${m.type()}: ${m.text()}`); });
  page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
  await page.goto(server.url);
  // A library made at this start opens on the demo project.
  await expect.poll(() => page.locator('[data-testid="case-row"]').count(), { timeout: 20_000 }).toBeGreaterThan(0);
  return page;
}

describe('the client report in browser mode', () => {
  it('saves the checker and a letterhead, refuses a scripted logo, previews the demo project and prints only the report', async () => {
    const problems: string[] = [];
    const [demo] = services.projects.list();
    const cases = services.projects.open(demo!.id).cases;
    const page = await newPage(problems);

    // Project details: the checker and the revision note are saved like the other fields.
    if (!(await page.locator('#project-checker').isVisible())) await page.click('#project-details-toggle');
    await page.fill('#project-checker', 'M. Ferreira-Lund');
    await page.fill('#project-revisionNote', 'Issued for comment');
    await expect.poll(async () => (await page.locator('[data-testid="save-status"]').textContent())?.trim()).toBe('Saved');
    expect(services.projects.open(demo!.id)).toMatchObject({ checker: 'M. Ferreira-Lund', revisionNote: 'Issued for comment' });

    // The letterhead: a logo with a script is refused beside the logo, with the focus there.
    await page.click('#view-settings');
    await page.fill('#letterhead-firmName', FIRM);
    await page.fill('#letterhead-address', ADDRESS);
    await page.fill('#letterhead-telephone', '+44 1632 960418');
    await page.fill('#letterhead-email', 'reports@brackwater-thermal.example');
    await page.setInputFiles('#letterhead-logo', { name: 'scripted.svg', mimeType: 'image/svg+xml', buffer: Buffer.from(SCRIPTED_LOGO) });
    await page.click('#letterhead-save');
    await expect.poll(() => page.locator('#letterhead-logo-error').textContent()).toBe('Logo SVG must not contain a <script> element.');
    expect(await focusedId(page)).toBe('letterhead-logo');
    expect(services.letterhead.get().firmName).toBe('');
    await shot(page, 'report-settings-refused-1366x800.png');

    // A file over 1 MB is refused in the page, before it is read or sent (the service's own limit).
    const large = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.alloc(MAX_LOGO_BYTES)]);
    await page.setInputFiles('#letterhead-logo', { name: 'large.png', mimeType: 'image/png', buffer: large });
    await expect.poll(() => page.locator('#letterhead-logo-error').textContent()).toBe(`Logo must be at most 1 MB (${MAX_LOGO_BYTES} bytes); large.png is ${MAX_LOGO_BYTES + 8} bytes.`);
    expect(await page.locator('#letterhead-firmName').getAttribute('maxlength')).toBe('200');

    await page.setInputFiles('#letterhead-logo', { name: 'brackwater.svg', mimeType: 'image/svg+xml', buffer: Buffer.from(CLEAN_LOGO) });
    await expect.poll(() => page.locator('#letterhead-logo-error').count()).toBe(0);
    await page.selectOption('#letterhead-paper', 'A4');
    await page.click('#letterhead-save');
    await expect.poll(() => page.locator('[data-testid="settings-notice"]').textContent()).toContain('Letterhead saved');
    expect(services.letterhead.get()).toMatchObject({ firmName: FIRM, address: ADDRESS, paper: 'A4', logo: { mediaType: 'image/svg+xml', base64: Buffer.from(CLEAN_LOGO).toString('base64') } });
    expect(await page.locator('[data-testid="logo-preview"] img').evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth > 0)).toBe(true);
    await page.evaluate(() => window.scrollTo(0, 0));
    await shot(page, 'report-settings-1366x800.png');
    await page.setViewportSize({ width: 1280, height: 720 });
    await shot(page, 'report-settings-1280x720.png');
    await page.setViewportSize({ width: 1366, height: 800 });

    // The preview: the firm, the client, every case and the summary table, as the model has them.
    await page.click('#view-projects');
    await page.locator('[data-testid="project-row"]').getByRole('button', { name: demo!.name, exact: true }).click();
    await page.click('#project-report');
    const report = page.locator('[data-testid="report-preview"] .lamina-report');
    await report.waitFor();
    expect(await focusedId(page)).toBe('report-preview-heading');
    const shown = (await report.innerText()).replace(/\s+/g, ' ');
    expect(shown).toContain(FIRM);
    expect(shown).toContain(demo!.client);
    expect(shown).toContain('Checker M. Ferreira-Lund');
    expect(shown).toContain('Issued for comment');
    for (const c of cases) expect(shown).toContain(c.name);
    const summaryRows = await report.locator('table.summary-table tbody tr td.case-name').allInnerTexts();
    expect(summaryRows).toEqual(cases.map((c) => c.name));
    expect(await page.evaluate(() => document.documentElement.style.getPropertyValue('--lamina-footer'))).toBe(`"${demo!.reference} revision ${demo!.revision}"`);
    await shot(page, 'report-preview-1366x800.png');
    await page.locator('.lamina-report .summary-table').scrollIntoViewIfNeeded();
    await shot(page, 'report-preview-summary-1366x800.png');
    await page.setViewportSize({ width: 1280, height: 720 });
    await page.locator('.lamina-report .case').first().scrollIntoViewIfNeeded();
    await shot(page, 'report-preview-case-1280x720.png');
    await page.evaluate(() => document.getElementById('project-details')?.scrollIntoView({ block: 'start' }));
    await shot(page, 'report-preview-1280x720.png');

    // Printed as the browser prints it: the report only, with its page footer.
    const pdfPath = path.join(resultsFolder, 'report-preview-print.pdf');
    await page.pdf({ path: pdfPath, preferCSSPageSize: true });
    const printed = execFileSync('pdftotext', ['-layout', pdfPath, '-'], { encoding: 'utf8' });
    const printedFlat = printed.replace(/\s+/g, ' ');
    for (const words of APP_CHROME) expect(printedFlat, `"${words}" is app chrome`).not.toContain(words);
    expect(printedFlat).toContain(FIRM);
    expect(printedFlat).toContain(demo!.client);
    for (const c of cases) expect(printedFlat).toContain(c.name.slice(0, 30));
    const info = execFileSync('pdfinfo', [pdfPath], { encoding: 'utf8' });
    expect(info).toMatch(/Page size:.*\(A4\)/);
    const pages = Number(/Pages:\s+(\d+)/.exec(info)![1]);
    expect(pages).toBeGreaterThan(cases.length);
    expect(printedFlat).toContain(`page 1 of ${pages}`);
    expect(printedFlat).toContain(`page ${pages} of ${pages}`);
    expect(printedFlat).toContain(`${demo!.reference} revision ${demo!.revision}`);

    // Letter paper: the preview and the print follow the letterhead's paper size.
    await page.keyboard.press('Escape');
    await page.click('#view-settings');
    await page.selectOption('#letterhead-paper', 'Letter');
    await page.click('#letterhead-save');
    await expect.poll(() => services.letterhead.get().paper).toBe('Letter');
    await page.click('#view-projects');
    await page.locator('[data-testid="project-row"]').getByRole('button', { name: demo!.name, exact: true }).click();
    await page.click('#project-report');
    await page.locator('[data-testid="report-preview"] .lamina-report.paper-letter').waitFor();
    const letterPath = path.join(resultsFolder, 'report-preview-print-letter.pdf');
    await page.pdf({ path: letterPath, preferCSSPageSize: true });
    // Letter is 8.5 × 11 in, 612 × 792 points (ANSI/ASME Y14.1).
    expect(execFileSync('pdfinfo', [letterPath], { encoding: 'utf8' })).toMatch(/Page size:\s+612(\.\d+)? x 792(\.\d+)? pts \(letter\)/);

    // Escape returns to the workspace, the focus on the button that opened the preview, the footer gone.
    await page.keyboard.press('Escape');
    await expect.poll(() => page.locator('[data-testid="report-preview"]').count()).toBe(0);
    expect(await focusedId(page)).toBe('project-report');
    expect(await page.evaluate(() => document.documentElement.style.getPropertyValue('--lamina-footer'))).toBe('');
    // The one refused save answers 400, which the browser logs; nothing else may complain.
    expect(problems).toEqual(['error: Failed to load resource: the server responded with a status of 400 (Bad Request)']);
    await page.close();
  }, 120_000);
});
