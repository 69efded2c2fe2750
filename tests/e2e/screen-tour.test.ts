/**
 * A tour of Lamina's screens and states in real Chromium, at 1280×720 and 1366×800, on the
 * browser-mode server with a real SQLite library that starts with the demo project: the projects
 * list, the demo project's cases, a bad value in the case editor (the sentence beside the box and
 * the results marked out of date), a project in US customary units with its case list and editors,
 * the materials library and its editor, and the question an import of a project already in the
 * library asks. Each screen is saved in test-results/tour-<screen>-<width>x<height>.png to be looked
 * at, and checked for sideways scrolling and for text no one should read (NaN, undefined). The
 * demo scenario (the Orrin Valley Creamery) is invented.
 */
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { startBrowserServer, type BrowserServer } from '../../main/server/browser-server.js';
import type { LaminaServices } from '../../main/services/lamina-services.js';
import { resultsFolder, useBrowserSession } from './browser-session.js';
import { clippedChoices, scrollsSideways } from './case-editor-page.js';

const session = useBrowserSession('lamina-screen-tour-');
let server: BrowserServer;
let services: LaminaServices;
let demoName = '';
const US_PROJECT = 'Orrin Valley Creamery, US customary units (demo)';
const WINDOWS = [{ width: 1280, height: 720 }, { width: 1366, height: 800 }] as const;

beforeAll(async () => {
  server = await startBrowserServer({ port: 0, databasePath: path.join(session.tempFolder(), 'lamina.sqlite'), demoProjectOnCreate: true, dailyBackups: false });
  services = server.library.library();
  const [demo] = services.projects.list();
  demoName = demo!.name;
  const us = services.projects.duplicate(demo!.id, US_PROJECT);
  services.projects.update(us.id, { unitSystem: 'IP' });
});
afterAll(async () => {
  await server?.close();
});

/** Saves the screen as it is and checks what every screen must be: no sideways scrolling, no broken words. */
async function look(page: Page, screen: string, fullPage = false): Promise<void> {
  const size = page.viewportSize()!;
  await page.screenshot({ path: path.join(resultsFolder, `tour-${screen}-${size.width}x${size.height}.png`), fullPage });
  expect(await scrollsSideways(page), `${screen} scrolls sideways`).toBe(false);
  expect(await page.textContent('body')).not.toMatch(/NaN|undefined|Infinity|\[object/);
}

async function openProject(page: Page, name: string): Promise<void> {
  await page.locator('[data-testid="project-row"]').getByRole('button', { name, exact: true }).click();
  await expect.poll(() => page.textContent('#project-details-heading')).toBe(name);
  await expect.poll(() => page.locator('[data-testid="case-row"] [data-testid="case-key-value"]').count(), { timeout: 20_000 }).toBe(6);
}

async function openCase(page: Page, index: number): Promise<void> {
  await page.locator('[data-testid="case-row"] [id^="case-open-"]').nth(index).click();
  await page.locator('.case-editor .key-figures').waitFor();
}

const caseIds = (projectName: string) => {
  const project = services.projects.list().find((p) => p.name === projectName)!;
  return services.projects.open(project.id).cases.map((c) => c.id);
};

describe('a tour of the screens', () => {
  for (const viewport of WINDOWS) {
    it(`shows every screen and state whole at ${viewport.width}×${viewport.height}`, async () => {
      const problems: string[] = [];
      const page = await session.browser().newPage({ viewport });
      page.on('console', (m) => { if (m.type() === 'error') problems.push(m.text()); });
      page.on('pageerror', (e) => problems.push(e.message));
      try {
        await page.goto(server.url);
        await expect.poll(() => page.locator('[data-testid="project-row"]').count()).toBe(2);
        await look(page, 'projects');

        // The demo project: its details folded away, its cases with their figures and verdicts.
        await openProject(page, demoName);
        await page.locator('[data-testid="case-row"]').first().scrollIntoViewIfNeeded();
        await look(page, 'demo-workspace');
        await look(page, 'demo-workspace-whole', true);

        // A bad value: its sentence beside the box, the last good results kept and marked out of date.
        await openCase(page, 0);
        const box = '#case-layers-0-thickness';
        await page.locator(box).scrollIntoViewIfNeeded();
        await page.fill(box, '5000');
        await expect.poll(() => page.locator(`${box}-error`).count()).toBe(1);
        await expect.poll(() => page.locator('.case-report .stale-label').count()).toBe(1);
        await look(page, 'bad-value');
        await page.keyboard.press('Control+z');
        await expect.poll(() => page.locator('.case-report.stale').count()).toBe(0);
        expect(await page.inputValue(box)).toBe('50');
        await page.click('#case-close');

        // The same cases in US customary units.
        await page.locator('[data-testid="project-row"]').first().scrollIntoViewIfNeeded();
        await openProject(page, US_PROJECT);
        await page.locator('[data-testid="case-row"]').first().scrollIntoViewIfNeeded();
        await look(page, 'us-workspace');
        expect(await page.textContent('[data-testid="case-row"]')).toMatch(/Btu\/\(h·ft\)/);
        for (const [index, screen] of [[0, 'us-pipe'], [4, 'us-wall']] as const) {
          await openCase(page, index);
          await expect.poll(() => page.textContent('.case-editor .key-figures')).toMatch(/°F|Btu/);
          expect(await clippedChoices(page, '.case-editor')).toEqual([]);
          await look(page, screen);
          await look(page, `${screen}-form`, true);
          await page.click('#case-close');
        }
        expect(caseIds(US_PROJECT)).toHaveLength(6);

        // The materials library and its editor on a copy of a built-in material (not saved).
        await page.click('#view-materials');
        await expect.poll(() => page.locator('[data-testid="material-row"]').count()).toBeGreaterThan(40);
        await look(page, 'materials');
        await page.locator('[data-testid="material-row"]').first().getByRole('button', { name: 'Duplicate to edit' }).click();
        await expect.poll(() => page.evaluate(() => document.activeElement?.id)).toBe('material-name');
        await look(page, 'material-editor');
        await page.click('#material-cancel');

        // Importing the demo project's own export asks whether to add a copy or replace it.
        await page.click('#view-projects');
        const demo = services.projects.list().find((p) => p.name === demoName)!;
        const file = JSON.stringify(services.projects.exportProject(demo.id));
        await page.setInputFiles('#project-import', { name: 'orrin-valley-demo.json', mimeType: 'application/json', buffer: Buffer.from(file) });
        await page.locator('[data-testid="import-question"]').waitFor();
        await look(page, 'import-question');
        await page.click('#import-cancel');
        await expect.poll(() => page.locator('[data-testid="import-question"]').count()).toBe(0);
        expect(services.projects.list()).toHaveLength(2);
        // The only console line is Chromium logging the HTTP 400 of the import that asked copy-or-replace.
        expect(problems).toEqual(['Failed to load resource: the server responded with a status of 400 (Bad Request)']);
      } finally {
        await page.close();
      }
    });
  }
});
