/**
 * The case editor's sizing panel ("Choose a thickness") in real Chromium, on the browser-mode
 * server with a real SQLite library in a temporary folder. A pipe case is sized as a person would
 * size it: sizing switched on, a series picked, the touch limit and a heat-loss limit switched on;
 * the table, its chosen row and a failing cell's explanation are checked against `solveCase` (the
 * engine `lamina solve` runs) on the inputs the app stored; "use this thickness" puts the chosen
 * value into the layer's box; the costs switched on bring the lifecycle-cost chart. Screenshots of
 * the panel go to test-results/. The scenario (Heronsgate Brewery) is invented.
 */
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { solveCase, type SolvedCase } from '../../app/index.js';
import { caseContext } from '../../main/cases/case-context.js';
import { startBrowserServer, type BrowserServer } from '../../main/server/browser-server.js';
import { resultsFolder, useBrowserSession } from './browser-session.js';
import { caseSaved, openCaseEditor } from './case-editor-page.js';

const session = useBrowserSession('lamina-sizing-panel-e2e-');
let server: BrowserServer;
const services = () => server.library.library();
const idOf = (name: string) => {
  const found = services().materials.list({ search: name }).find((m) => m.name === name);
  if (!found) throw new Error(`No seed material "${name}".`);
  return found.id;
};
/** The stored case solved by the engine, as the command line would solve it. */
const engineSolve = (caseId: number): SolvedCase => solveCase(services().projects.getCase(caseId).inputs, caseContext(services().materials));

beforeAll(async () => {
  server = await startBrowserServer({ port: 0, databasePath: path.join(session.tempFolder(), 'lamina.sqlite'), dailyBackups: false });
});
afterAll(async () => {
  await server?.close();
});

/** A hot-water flow in a plant room (invented): DN100 steel at 80 °C, 30 mm rock wool, indoors. */
function addHotPipe(projectName: string): { projectName: string; caseId: number } {
  const project = services().projects.create({ name: projectName });
  const added = services().projects.addCase(project.id, {
    name: 'Hot-water flow, plant room',
    inputs: {
      schemaVersion: 1, kind: 'pipe',
      pipe: { outerDiameter: 0.1143, wallThickness: 0.0036, materialId: idOf('Carbon steel pipe') },
      inner: { kind: 'fluid', temperature: 80, coefficient: 1500 },
      layers: [{ materialId: idOf('Rock wool pipe section, typical curve'), thickness: 0.03 }],
      orientation: 'horizontal',
      ambient: { airTemperature: 22, relativeHumidity: 0.5, exposure: { kind: 'indoor' } },
      length: 40, operatingHours: 8760,
    },
  });
  return { projectName: project.name, caseId: added.id };
}

const openCase = (projectName: string, caseId: number) => openCaseEditor(session.browser(), server.url, projectName, caseId);

const saved = caseSaved;
const panel = (page: Page) => page.locator('#case-section-sizing');
const shot = (page: Page, name: string) => panel(page).screenshot({ path: path.join(resultsFolder, name) });

/** The report section's tables, as the panel shows them; `caption` picks one (its title, or a part of it). */
const sizingTable = (page: Page, caption: string) => page.locator('[data-testid="sizing-table"]').filter({ has: page.locator('caption', { hasText: caption }) });
const FIGURES = 'Rock wool pipe section, typical curve across the thickness series';
const CRITERIA = 'Each criterion switched on, at each thickness';
const COSTS = 'Cost and CO₂ across the thickness series';

/** A sizing table on screen: each row's cells as text (the hidden explanations left out), and which row is marked chosen. */
function shownTable(page: Page, caption: string): Promise<{ headers: string[]; rows: { cells: string[]; chosen: boolean }[] }> {
  return sizingTable(page, caption).evaluate((table) => {
    const cellText = (cell: Element) => Array.from(cell.childNodes).filter((n) => !(n instanceof HTMLElement && n.classList.contains('visually-hidden'))).map((n) => n.textContent ?? '').join('').trim();
    return {
      headers: Array.from(table.querySelectorAll('thead th'), (th) => th.textContent!.trim()),
      rows: Array.from(table.querySelectorAll('tbody tr'), (tr) => ({ cells: Array.from(tr.children, cellText), chosen: tr.getAttribute('data-testid') === 'sizing-chosen-row' })),
    };
  });
}

describe('the sizing panel', () => {
  it('sizes a hot pipe to the touch limit and a heat-loss limit, explains a failing cell, and puts the chosen thickness into the layer', async () => {
    const { projectName, caseId } = addHotPipe('Heronsgate Brewery plant room');
    const { page, problems } = await openCase(projectName, caseId);
    await expect.poll(() => panel(page).locator('input[type="checkbox"]').count()).toBe(1);
    await shot(page, 'sizing-panel-off.png');

    await page.check('#case-sizing-on');
    await page.selectOption('#case-sizing-series', 'named:mineral wool pipe section');
    // A hot line starts with the touch limit on; it stays on, and the heat-loss limit joins it.
    expect(await page.isChecked('#case-sizing-maxSurfaceTemperature')).toBe(true);
    await page.check('#case-sizing-maxHeatLoss');
    await page.fill('#case-sizing-criteria-maxHeatLoss-limit', '20');
    await saved(page);

    const stored = services().projects.getCase(caseId).inputs as Record<string, any>;
    expect(stored['sizing']).toEqual({
      layer: 0,
      series: { kind: 'named', family: 'mineral wool pipe section' },
      criteria: { maxSurfaceTemperature: {}, maxHeatLoss: { limit: 20 } },
    });
    const engine = engineSolve(caseId).sizing!;
    expect(engine.choice.kind).toBe('chosen');
    const chosen = engine.choice.kind === 'chosen' ? engine.choice.thickness : NaN;

    // One row per thickness the engine tried, the chosen one marked, its thickness in mm to 0.1 mm (as the report shows it).
    // Every table of the section marks the same row.
    for (const caption of [FIGURES, CRITERIA]) {
      await expect.poll(async () => (await shownTable(page, caption)).rows.filter((r) => r.chosen).map((r) => r.cells[0])).toEqual([(chosen * 1000).toFixed(1)]);
      const table = await shownTable(page, caption);
      expect(table.rows.map((r) => Number(r.cells[0]) / 1000)).toEqual(engine.rows.map((r) => r.thickness));
      expect(table.rows.flatMap((r) => r.cells).join(' ')).not.toMatch(/NaN|undefined|Infinity/);
      expect(table.headers.at(-1)).toBe('Choice');
    }
    expect(await page.locator('#case-section-sizing [data-testid="sizing-chosen-row"]').count()).toBe(2);

    // The thinnest fails the heat-loss limit: its cell says so on hover and to a screen reader, in the engine's words.
    const thinnestLoss = engine.rows[0]!.outcomes.find((o) => o.criterion === 'maxHeatLoss')!;
    expect(thinnestLoss.met).toBe(false);
    const failing = sizingTable(page, CRITERIA).locator('tbody tr').first().locator('td.fails').last();
    expect(await failing.getAttribute('title')).toBe(thinnestLoss.reason);
    expect(await failing.locator('.visually-hidden').textContent()).toBe(`: ${thinnestLoss.reason}`);
    await shot(page, 'sizing-panel-sized.png');

    // "Use this thickness": the layer's box shows the chosen thickness, and the case stores it.
    await page.click('#case-sizing-use');
    await expect.poll(() => page.inputValue('#case-layers-0-thickness')).toBe(String(chosen * 1000));
    await saved(page);
    expect((services().projects.getCase(caseId).inputs as Record<string, any>)['layers'][0]['thickness']).toBe(chosen);
    await expect.poll(() => page.locator('#case-sizing-use').isDisabled()).toBe(true);
    expect(problems).toEqual([]);
    await page.close();
  });

  it('with the costs switched on, shows the lifecycle cost in the table and its chart', async () => {
    const { projectName, caseId } = addHotPipe('Heronsgate Brewery cellar');
    const { page, problems } = await openCase(projectName, caseId);
    await page.check('#case-sizing-on');
    await page.check('#case-sizing-economics');
    await page.fill('#case-sizing-economics-currency', 'EUR');
    await page.check('#case-sizing-economic');
    await saved(page);

    const engine = engineSolve(caseId).sizing!;
    expect(engine.economicThickness).not.toBeNull();
    const figure = page.locator('#case-section-sizing figure.report-chart').filter({ hasText: 'Lifecycle cost against thickness' });
    await figure.locator('canvas').waitFor();
    expect((await shownTable(page, COSTS)).headers).toContain('Lifecycle cost (EUR)');
    // The chart's table (its text alternative) has one row per thickness.
    await figure.getByRole('button', { name: 'Show as table' }).click();
    await expect.poll(() => figure.locator('tbody tr').count()).toBe(engine.rows.length);
    await shot(page, 'sizing-panel-economics.png');
    expect(problems).toEqual([]);
    await page.close();
  });

  it('keeps every table inside the panel at a narrow window: the Choice column fits or its box scrolls, never the page', async () => {
    const { projectName, caseId } = addHotPipe('Heronsgate Brewery boiler house');
    const { page, problems } = await openCase(projectName, caseId);
    await page.check('#case-sizing-on');
    await page.check('#case-sizing-maxHeatLoss');
    await page.check('#case-sizing-economics');
    await saved(page);
    await sizingTable(page, CRITERIA).waitFor();
    for (const [width, height] of [[1280, 720], [1024, 700]] as const) {
      await page.setViewportSize({ width, height });
      await sizingTable(page, CRITERIA).scrollIntoViewIfNeeded();
      await shot(page, `sizing-panel-${width}x${height}.png`);
      const fit = await panel(page).evaluate((section) => {
        const edge = section.getBoundingClientRect().right;
        return {
          page: { scroll: document.documentElement.scrollWidth, width: document.documentElement.clientWidth },
          tables: Array.from(section.querySelectorAll('[data-testid="sizing-table"]'), (table) => {
            const box = table.parentElement!;
            return {
              caption: table.querySelector('caption')!.textContent,
              boxInside: box.getBoundingClientRect().right <= edge + 0.5,
              // The whole table shows, or the rest is a sideways scroll of its own box away.
              reachable: table.getBoundingClientRect().right <= box.getBoundingClientRect().right + 0.5 || (getComputedStyle(box).overflowX === 'auto' && box.scrollWidth > box.clientWidth),
            };
          }),
        };
      });
      expect(fit.page.scroll, `${width}×${height}: the page scrolls sideways`).toBeLessThanOrEqual(fit.page.width);
      expect(fit.tables.length).toBe(3);
      for (const t of fit.tables) expect(t, `${width}×${height}: ${t.caption}`).toMatchObject({ boxInside: true, reachable: true });
    }
    expect(problems).toEqual([]);
    await page.close();
  });
});
