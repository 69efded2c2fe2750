/**
 * Every case of the demo project (made on a first start, as a new user meets it) in the case
 * editor, in real Chromium on the browser-mode server with a real SQLite library:
 * - the time from a keystroke in an insulation layer's thickness box to the updated key figures,
 *   median over a dozen edits, printed and written to test-results/keystroke-to-figures.{txt,json}
 *   (reported, never asserted); each edit must move the figures, and the last figures must be the
 *   engine's for the case as stored; the sections below them (drawn after the figures) follow the
 *   first edit and, once the edits return to the stored case, read as they did on opening;
 * - at 1280×720 and 1366×800, every drop-down's chosen label fits its box and the page does not
 *   scroll sideways;
 * - screenshots of each case's editor (top, whole form, the results scrolled to the charts, and the
 *   whole results column) at both sizes, in test-results/demo-<case>-<width>x<height>[-form|-charts|-results].png.
 * The demo scenario (the Orrin Valley Creamery) is invented.
 */
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { startBrowserServer, type BrowserServer } from '../../main/server/browser-server.js';
import type { LaminaServices } from '../../main/services/lamina-services.js';
import type { ProjectCase } from '../../app/api/contract.js';
import { resultsFolder, useBrowserSession } from './browser-session.js';
import { clippedChoices, engineFigures, keystrokeToFigures, median, scrollsSideways, shownDetails, shownFigures, shownSolveTimes } from './case-editor-page.js';

const session = useBrowserSession('lamina-demo-cases-');
let server: BrowserServer;
let services: LaminaServices;

/** The demo's cases in its order, with the short name their screenshots carry. */
const DEMO_SHOTS = [
  ['pipe', 'pipe-hot'],
  ['pipe', 'pipe-chilled'],
  ['pipe', 'pipe-outdoor'],
  ['flat', 'flat-tank'],
  ['wall', 'wall'],
  ['wall', 'roof'],
] as const;
const WINDOWS = [{ width: 1280, height: 720 }, { width: 1366, height: 800 }] as const;

beforeAll(async () => {
  server = await startBrowserServer({ port: 0, databasePath: path.join(session.tempFolder(), 'lamina.sqlite'), demoProjectOnCreate: true, dailyBackups: false });
  services = server.library.library();
});
afterAll(async () => {
  await server?.close();
});

function demoCases(): readonly ProjectCase[] {
  const [demo] = services.projects.list();
  const cases = services.projects.open(demo!.id).cases;
  expect(cases.map((c) => c.inputs.kind)).toEqual(DEMO_SHOTS.map(([kind]) => kind));
  return cases;
}

/** The first insulation layer of a case: its place and its thickness in mm. */
function insulationLayer(projectCase: ProjectCase): { index: number; mm: number } {
  const layers = (projectCase.inputs as unknown as { layers: { material?: { category?: string }; materialId?: number; thickness: number }[] }).layers;
  const library = new Map(services.materials.list({ origin: 'all' }).map((m) => [m.id, m.category]));
  const index = layers.findIndex((l) => (l.material?.category ?? library.get(l.materialId ?? -1)) === 'insulation');
  expect(index, `${projectCase.name} has an insulation layer`).toBeGreaterThanOrEqual(0);
  return { index, mm: Math.round(layers[index]!.thickness * 1e4) / 10 };
}

async function newPage(viewport: { width: number; height: number }): Promise<{ page: Page; problems: string[] }> {
  const problems: string[] = [];
  const page = await session.browser().newPage({ viewport });
  page.on('console', (m) => { if (m.type() === 'error') problems.push(m.text()); });
  page.on('pageerror', (e) => problems.push(e.message));
  await page.goto(server.url);
  // A library made at this start opens on the demo project.
  await expect.poll(() => page.locator('[data-testid="case-row"]').count(), { timeout: 20_000 }).toBe(DEMO_SHOTS.length);
  return { page, problems };
}

async function openCase(page: Page, caseId: number): Promise<void> {
  await page.click(`#case-open-${caseId}`);
  await page.locator('.case-editor .key-figures').waitFor();
  await expect.poll(() => page.locator('.case-editor .report-chart canvas').count()).toBeGreaterThan(0);
}

async function closeCase(page: Page): Promise<void> {
  await page.click('#case-close');
  await page.locator('[data-testid="case-row"]').first().waitFor();
}

const saved = (page: Page) => expect.poll(async () => (await page.locator('[data-testid="case-save-status"]').textContent())?.trim(), { timeout: 10_000 }).toBe('Saved');

describe('the demo cases in the case editor', () => {
  it('moves the key figures after every keystroke in a thickness, for every demo case, and reports the median time', async () => {
    const { page, problems } = await newPage(WINDOWS[1]);
    const table: { case: string; kind: string; field: string; edits: number; medianMs: number; solveMedianMs: number; workerRoundTripMedianMs: number; timesMs: number[] }[] = [];
    for (const projectCase of demoCases()) {
      const { index, mm } = insulationLayer(projectCase);
      const box = `#case-layers-${index}-thickness`;
      await openCase(page, projectCase.id);
      expect(await page.inputValue(box)).toBe(String(mm));
      const opened = await shownDetails(page);
      const times: number[] = [];
      const solves: number[] = [];
      const roundTrips: number[] = [];
      // Up in 10 mm steps and back to where it started: each value differs from the one before.
      for (const step of [10, 20, 30, 40, 50, 60, 50, 40, 30, 20, 10, 0]) {
        times.push(await keystrokeToFigures(page, box, String(mm + step)));
        const shown = await shownSolveTimes(page);
        if (shown !== null) solves.push(shown.solveMs);
        if (shown?.roundTripMs != null) roundTrips.push(shown.roundTripMs);
        if (times.length === 1) await expect.poll(() => shownDetails(page)).not.toBe(opened);
      }
      await saved(page);
      await expect.poll(() => shownDetails(page)).toBe(opened);
      expect(services.projects.getCase(projectCase.id).inputs).toEqual(projectCase.inputs);
      await expect.poll(() => shownFigures(page)).toEqual(engineFigures(services, projectCase.id, 'SI').figures);
      expect(solves.length).toBe(times.length);
      table.push({ case: projectCase.name, kind: projectCase.inputs.kind as string, field: box, edits: times.length, medianMs: median(times), solveMedianMs: median(solves), workerRoundTripMedianMs: median(roundTrips), timesMs: times });
      await closeCase(page);
    }
    const lines = table.map((row) => `keystroke-to-figures ${row.case}: median ${row.medianMs.toFixed(1)} ms over ${row.edits} edits (solve ${row.solveMedianMs.toFixed(1)} ms)`);
    for (const line of lines) console.log(line);
    const roundTrips = table.map((row) => `worker round trip ${row.case}: median ${row.workerRoundTripMedianMs.toFixed(1)} ms (the case sent, its answer on the page)`);
    fs.writeFileSync(path.join(resultsFolder, 'keystroke-to-figures.txt'), `${[...lines, '', ...roundTrips].join('\n')}\n`);
    fs.writeFileSync(path.join(resultsFolder, 'keystroke-to-figures.json'), `${JSON.stringify({ measured: new Date().toISOString(), viewport: WINDOWS[1], cases: table }, null, 2)}\n`);
    expect(problems).toEqual([]);
    await page.close();
  });

  for (const viewport of WINDOWS) {
    it(`shows every drop-down's chosen label whole and no sideways scrolling at ${viewport.width}×${viewport.height}, for every demo case`, async () => {
      const { page, problems } = await newPage(viewport);
      const size = `${viewport.width}x${viewport.height}`;
      const cases = demoCases();
      for (const [i, projectCase] of cases.entries()) {
        const shot = DEMO_SHOTS[i]![1];
        await openCase(page, projectCase.id);
        // The pictures first, so a failed check below leaves them to look at.
        await page.screenshot({ path: path.join(resultsFolder, `demo-${shot}-${size}.png`) });
        await page.screenshot({ path: path.join(resultsFolder, `demo-${shot}-${size}-form.png`), fullPage: true });
        expect(await clippedChoices(page, '.case-editor'), projectCase.name).toEqual([]);
        expect(await scrollsSideways(page)).toBe(false);
        // The results column scrolls on its own: bring its first chart into view.
        await page.locator('.case-editor .report-chart').first().scrollIntoViewIfNeeded();
        await page.screenshot({ path: path.join(resultsFolder, `demo-${shot}-${size}-charts.png`) });
        // And the whole results column at once, unrolled, to read it end to end.
        const results = page.locator('.case-editor .results');
        await results.evaluate((column: HTMLElement) => Object.assign(column.style, { maxHeight: 'none', position: 'static' }));
        await results.screenshot({ path: path.join(resultsFolder, `demo-${shot}-${size}-results.png`) });
        await closeCase(page);
      }
      expect(problems).toEqual([]);
      await page.close();
    });
  }
});
