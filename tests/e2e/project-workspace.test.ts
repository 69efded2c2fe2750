/**
 * The project workspace in real Chromium, on the browser-mode server with a real SQLite file in a
 * temporary folder: each kind added from blank shows its key figure and its checks' verdicts as the
 * engine gives them for the stored case, rename, duplicate, reorder by keyboard, remove and undo,
 * the list in US customary units, and a case opened in the editor. One browser and one server for
 * the file; each test makes its own project. Screenshots go to test-results/. The scenario (the
 * Harrow Mill dyehouse and its client) is invented.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import fs from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import type { CaseKind, ProjectCase } from '../../app/api/contract.js';
import { solveCase } from '../../app/index.js';
import { toDisplay } from '../../app/base/unit-systems.js';
import { formatQuantity } from '../../app/report/format-quantity.js';
import { caseContext } from '../../main/cases/case-context.js';
import { startBrowserServer, type BrowserServer } from '../../main/server/browser-server.js';
import type { LaminaServices } from '../../main/services/lamina-services.js';
import { blankCaseInputs } from '../../renderer/src/workspace/blank-cases.js';
import { VERDICT_WORDS } from '../../app/report/report-words.js';
import { projectRoot, resultsFolder, useBrowserSession } from './browser-session.js';

const session = useBrowserSession('lamina-workspace-e2e-');
let server: BrowserServer;
let services: LaminaServices;

beforeAll(async () => {
  server = await startBrowserServer({ port: 0, databasePath: path.join(session.tempFolder(), 'lamina.sqlite'), dailyBackups: false });
  services = server.library.library();
});
afterAll(async () => {
  await server?.close();
});

/** A project stored directly, with blank cases of the given kinds under the given names. */
function seedProject(name: string, cases: readonly [string, CaseKind][] = []): number {
  const project = services.projects.create({ name, client: 'Harrow Mill Dyeworks Ltd', site: 'Harrow Mill, Lower Brantwick' });
  const materials = services.materials.list({ origin: 'all' });
  for (const [caseName, kind] of cases) services.projects.addCase(project.id, { name: caseName, inputs: blankCaseInputs(kind, materials) });
  return project.id;
}

const storedNames = (projectId: number) => services.projects.open(projectId).cases.map((c) => c.name);

async function openProject(name: string, problems: string[], viewport = { width: 1366, height: 800 }): Promise<Page> {
  const page = await session.browser().newPage({ viewport });
  page.on('console', (message) => {
    if (message.type() === 'error' || message.type() === 'warning') problems.push(`${message.type()}: ${message.text()}`);
  });
  page.on('pageerror', (error) => problems.push(`page error: ${error.message}`));
  await page.goto(server.url);
  await page.locator('[data-testid="project-row"]').getByRole('button', { name, exact: true }).click();
  await expect.poll(() => page.textContent('#project-details-heading')).toBe(name);
  return page;
}

const rows = (page: Page) => page.locator('[data-testid="case-row"]');
const rowNames = (page: Page) => rows(page).evaluateAll((list) => list.map((row) => row.getAttribute('data-name')));
const row = (page: Page, name: string) => page.locator(`[data-testid="case-row"][data-name="${name}"]`);
const focusedId = (page: Page) => page.evaluate(() => document.activeElement?.id);
const shot = (page: Page, name: string) => page.screenshot({ path: path.join(resultsFolder, name), fullPage: true });

/** What the engine says about a stored case, solved on the Node side with the library's materials. */
function solvedReport(projectCase: ProjectCase) {
  return solveCase(projectCase.inputs, caseContext(services.materials)).report;
}

/** The number as the page writes it ("−12.5", "1,234" never occurs) and half a step of its last digit. */
function shownNumber(text: string): { value: number; halfStep: number } {
  const number = text.trim().split(' ')[0]!.replace('−', '-');
  const decimals = number.includes('.') ? number.split('.')[1]!.length : 0;
  return { value: Number(number), halfStep: 0.5 * 10 ** -decimals };
}

async function expectNoHorizontalScroll(page: Page): Promise<void> {
  const { scroll, client } = await page.evaluate(() => ({ scroll: document.documentElement.scrollWidth, client: document.documentElement.clientWidth }));
  expect(scroll).toBeLessThanOrEqual(client);
}

describe('the project workspace', () => {
  it('adds a pipe run, a flat surface and a wall from blank, each with its key figure and verdicts', async () => {
    const problems: string[] = [];
    const projectId = seedProject('Harrow Mill dyehouse');
    const page = await openProject('Harrow Mill dyehouse', problems);
    expect(await page.locator('[data-testid="no-cases"]').count()).toBe(1);
    // The details are folded away for a project that has them; the units are not.
    expect(await page.locator('#project-client').isVisible()).toBe(false);
    expect(await page.locator('#project-unitSystem').isVisible()).toBe(true);

    for (const [kind, name] of [['pipe', 'New pipe run'], ['flat', 'New flat surface'], ['wall', 'New wall or roof']] as const) {
      await page.click(`#case-add-${kind}`);
      await expect.poll(() => row(page, name).count()).toBe(1);
      const stored = services.projects.open(projectId).cases.find((c) => c.name === name)!;
      expect(stored.inputs.kind).toBe(kind);
      // Focus moves to the new case, so Enter opens it.
      await expect.poll(() => focusedId(page)).toBe(`case-open-${stored.id}`);

      const report = solvedReport(stored);
      const key = report.keyFigures[0]!;
      await expect.poll(() => row(page, name).locator('[data-testid="case-key-value"]').textContent()).toBe(formatQuantity(key.value, key.quantity, 'SI'));
      const temperature = report.keyFigures.find((f) => f.quantity === 'temperature')!;
      expect(await row(page, name).locator('[data-testid="case-temperature"]').textContent()).toBe(formatQuantity(temperature.value, 'temperature', 'SI'));
      const marks = await row(page, name).locator('[data-testid="case-verdict"]').evaluateAll((list) =>
        list.map((mark) => [mark.getAttribute('data-check'), mark.querySelector('.word')?.textContent]),
      );
      expect(marks).toEqual(report.verdicts.map((v) => [v.check, VERDICT_WORDS[v.verdict]]));
      // The verdict reads without colour: its title and word are text.
      expect(await row(page, name).locator('[data-testid="case-verdict"]').first().textContent()).toContain(`${report.verdicts[0]!.title}:`);
    }
    expect(await rowNames(page)).toEqual(['New pipe run', 'New flat surface', 'New wall or roof']);
    expect(await rows(page).nth(0).textContent()).toContain('Heat loss per metre');
    expect(await rows(page).nth(2).textContent()).toContain('U-value');
    expect(await page.textContent('body')).not.toMatch(/NaN|undefined|Infinity|\[object/);

    await expectNoHorizontalScroll(page);
    await shot(page, 'workspace-1366.png');
    await page.setViewportSize({ width: 1280, height: 720 });
    await expectNoHorizontalScroll(page);
    await shot(page, 'workspace-1280.png');
    expect(problems).toEqual([]);
    await page.close();
  });

  it('adds a case from a case file read in the page, and refuses a file the service cannot store in its one sentence', async () => {
    const problems: string[] = [];
    const projectId = seedProject('Harrow Mill plant room');
    const page = await openProject('Harrow Mill plant room', problems);
    const example = path.join(projectRoot, 'data', 'examples', 'pipe-hot-water-plant-room.json');
    const title = (JSON.parse(fs.readFileSync(example, 'utf8')) as { title: string }).title;

    await page.setInputFiles('#case-add-file', example);
    await expect.poll(() => rowNames(page)).toEqual([title]);
    const stored = services.projects.open(projectId).cases[0]!;
    const key = solvedReport(stored).keyFigures[0]!;
    expect(await row(page, title).locator('[data-testid="case-key-value"]').textContent()).toBe(formatQuantity(key.value, key.quantity, 'SI'));

    // A pipe run with no insulation layers: the service's refusal, prefixed with what was not done.
    const bare = { schemaVersion: 1, kind: 'pipe', ...JSON.parse(fs.readFileSync(example, 'utf8')), layers: [] };
    await page.setInputFiles('#case-add-file', { name: 'bare-pipe.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(bare)) });
    const refusal = (() => {
      try {
        services.projects.addCase(projectId, { name: 'bare', inputs: bare });
      } catch (error) {
        return (error as Error).message;
      }
      throw new Error('The service stored a pipe run without insulation.');
    })();
    await expect.poll(() => page.locator('[data-testid="cases-notice"]').textContent()).toBe(`Nothing was added from bare-pipe.json: ${refusal}`);
    await page.setInputFiles('#case-add-file', { name: 'notes.json', mimeType: 'application/json', buffer: Buffer.from('{ site visit') });
    await expect.poll(() => page.locator('[data-testid="cases-notice"]').textContent()).toMatch(/^Nothing was added from notes\.json: it is not JSON \(.+\)\.$/);
    expect(storedNames(projectId)).toEqual([title]);
    await shot(page, 'workspace-file-refused.png');
    // The only console line is Chromium logging the refused add's HTTP 400, which the page showed above.
    expect(problems).toEqual(['error: Failed to load resource: the server responded with a status of 400 (Bad Request)']);
    await page.close();
  });

  it('renames a case (refusing an empty name) and duplicates it just below itself', async () => {
    const problems: string[] = [];
    const projectId = seedProject('Harrow Mill boiler house', [['Heating flow', 'pipe'], ['Calorifier shell', 'flat']]);
    const page = await openProject('Harrow Mill boiler house', problems);

    await row(page, 'Heating flow').getByRole('button', { name: 'Rename' }).click();
    await page.fill('#case-rename', '  ');
    await page.press('#case-rename', 'Enter');
    await expect.poll(() => page.locator('#case-rename-error').textContent()).toBe('Case name must be 1 to 200 characters long.');
    await shot(page, 'workspace-rename-refused.png');
    await page.fill('#case-rename', 'DN50 heating flow, boiler house');
    await page.press('#case-rename', 'Enter');
    await expect.poll(() => rowNames(page)).toEqual(['DN50 heating flow, boiler house', 'Calorifier shell']);
    expect(storedNames(projectId)).toEqual(['DN50 heating flow, boiler house', 'Calorifier shell']);

    await row(page, 'DN50 heating flow, boiler house').getByRole('button', { name: 'Duplicate' }).click();
    await expect.poll(() => rowNames(page)).toEqual(['DN50 heating flow, boiler house', 'DN50 heating flow, boiler house (copy)', 'Calorifier shell']);
    const cases = services.projects.open(projectId).cases;
    expect(cases.map((c) => c.name)).toEqual(['DN50 heating flow, boiler house', 'DN50 heating flow, boiler house (copy)', 'Calorifier shell']);
    expect(cases[1]!.inputs).toEqual(cases[0]!.inputs);
    expect(problems).toEqual([]);
    await page.close();
  });

  it('moves the focused case with Alt+ArrowUp and Alt+ArrowDown, keeping the focus on it', async () => {
    const problems: string[] = [];
    const projectId = seedProject('Harrow Mill stores', [['Stores north wall', 'wall'], ['Stores roof', 'wall'], ['Condensate return', 'pipe']]);
    const page = await openProject('Harrow Mill stores', problems);
    const moving = services.projects.open(projectId).cases[2]!;

    await page.focus(`#case-open-${moving.id}`);
    await page.keyboard.press('Alt+ArrowUp');
    await expect.poll(() => rowNames(page)).toEqual(['Stores north wall', 'Condensate return', 'Stores roof']);
    await expect.poll(() => focusedId(page)).toBe(`case-open-${moving.id}`);
    await page.keyboard.press('Alt+ArrowUp');
    await expect.poll(() => rowNames(page)).toEqual(['Condensate return', 'Stores north wall', 'Stores roof']);
    await page.keyboard.press('Alt+ArrowUp'); // already first: nothing moves
    await page.keyboard.press('Alt+ArrowDown');
    await expect.poll(() => rowNames(page)).toEqual(['Stores north wall', 'Condensate return', 'Stores roof']);
    await expect.poll(() => storedNames(projectId)).toEqual(['Stores north wall', 'Condensate return', 'Stores roof']);
    expect(await focusedId(page)).toBe(`case-open-${moving.id}`);
    await shot(page, 'workspace-reordered.png');

    // The buttons do the same.
    await row(page, 'Stores roof').getByRole('button', { name: 'Move Stores roof up' }).click();
    await expect.poll(() => storedNames(projectId)).toEqual(['Stores north wall', 'Stores roof', 'Condensate return']);
    expect(problems).toEqual([]);
    await page.close();
  });

  it('removes a case with an undo bar, and Undo puts it back in its place', async () => {
    const problems: string[] = [];
    const projectId = seedProject('Harrow Mill yard', [['Yard steam main', 'pipe'], ['Tank roof', 'flat'], ['Gatehouse wall', 'wall']]);
    const page = await openProject('Harrow Mill yard', problems);
    const removed = services.projects.open(projectId).cases[1]!;

    await row(page, 'Tank roof').getByRole('button', { name: 'Remove' }).click();
    await expect.poll(() => rowNames(page)).toEqual(['Yard steam main', 'Gatehouse wall']);
    expect(storedNames(projectId)).toEqual(['Yard steam main', 'Gatehouse wall']);
    expect((await page.textContent('[data-testid="undo-bar"]'))?.replace(/\s+/g, ' ').trim()).toBe('Case removed. Undo');
    expect(await focusedId(page)).toBe('case-undo-remove');
    await shot(page, 'workspace-removed.png');

    await page.keyboard.press('Enter');
    await expect.poll(() => rowNames(page)).toEqual(['Yard steam main', 'Tank roof', 'Gatehouse wall']);
    const back = services.projects.open(projectId).cases;
    expect(back.map((c) => c.name)).toEqual(['Yard steam main', 'Tank roof', 'Gatehouse wall']);
    expect(back[1]!.inputs).toEqual(removed.inputs);
    expect(await page.locator('[data-testid="undo-bar"]').count()).toBe(0);
    expect(problems).toEqual([]);
    await page.close();
  });

  it('shows the list in US customary units, equal to the SI figures converted, once the project is switched', async () => {
    const problems: string[] = [];
    const projectId = seedProject('Harrow Mill finishing shed', [['Finishing shed hot-water flow', 'pipe']]);
    const page = await openProject('Harrow Mill finishing shed', problems);
    const report = solvedReport(services.projects.open(projectId).cases[0]!);
    const heatLoss = report.keyFigures[0]!;
    const surface = report.keyFigures.find((f) => f.quantity === 'temperature')!;
    expect(heatLoss.quantity).toBe('heatFlowPerLength');
    const value = row(page, 'Finishing shed hot-water flow').locator('[data-testid="case-key-value"]');
    await expect.poll(() => value.textContent()).toMatch(/ W\/m$/);

    await page.selectOption('#project-unitSystem', 'IP');
    await expect.poll(() => value.textContent()).toMatch(/ Btu\/\(h·ft\)$/);
    const shownLoss = shownNumber((await value.textContent())!);
    expect(Math.abs(shownLoss.value - toDisplay(heatLoss.value!, 'heatFlowPerLength', 'IP'))).toBeLessThanOrEqual(shownLoss.halfStep);
    const temperatureText = (await row(page, 'Finishing shed hot-water flow').locator('[data-testid="case-temperature"]').textContent())!;
    expect(temperatureText).toMatch(/ °F$/);
    const shownSurface = shownNumber(temperatureText);
    expect(Math.abs(shownSurface.value - toDisplay(surface.value!, 'temperature', 'IP'))).toBeLessThanOrEqual(shownSurface.halfStep);
    await expect.poll(() => services.projects.open(projectId).unitSystem).toBe('IP');
    await shot(page, 'workspace-us-units.png');
    expect(problems).toEqual([]);
    await page.close();
  });

  it('opens a case in the editor with Enter, in the list\'s place, and comes back to it on closing', async () => {
    const problems: string[] = [];
    const projectId = seedProject('Harrow Mill dye store', [['Dye store wall', 'wall']]);
    const page = await openProject('Harrow Mill dye store', problems);
    const stored = services.projects.open(projectId).cases[0]!;

    await page.focus(`#case-open-${stored.id}`);
    await page.keyboard.press('Enter');
    await expect.poll(() => page.locator('.case-editor').count()).toBe(1);
    expect(await page.locator('[data-testid="case-row"]').count()).toBe(0);
    expect(await page.locator('#project-search').count()).toBe(0); // the projects list steps aside
    await shot(page, 'workspace-case-open.png');
    await page.locator('.case-editor').getByRole('button', { name: /^close/i }).first().click();
    await expect.poll(() => rowNames(page)).toEqual(['Dye store wall']);
    await expect.poll(() => focusedId(page)).toBe(`case-open-${stored.id}`);
    expect(problems).toEqual([]);
    await page.close();
  });
});
