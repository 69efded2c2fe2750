/**
 * The Projects view in real Chromium, on the browser-mode server with a real SQLite file in a
 * temporary folder: a new project whose fields are saved as they are typed (and are there after a
 * reload), an invalid date refused in one sentence and never saved, rename, duplicate, the
 * recycle bin (delete, restore, empty), the cases list (rename, remove), and a project exported to
 * a file and imported from it. Screenshots go to test-results/. The scenario is invented.
 */
import { describe, expect, it } from 'vitest';
import fs from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { startBrowserServer, type BrowserServer } from '../../main/server/browser-server.js';
import { resultsFolder, useBrowserSession } from './browser-session.js';
import { pipeInputs, wallInputs } from '../storage/case-fixtures.js';

const session = useBrowserSession('lamina-projects-e2e-');
const tempFolder = session.tempFolder;

async function openProjectsView(server: BrowserServer, problems: string[]): Promise<Page> {
  const page = await session.browser().newPage({ viewport: { width: 1100, height: 900 } });
  page.on('console', (message) => {
    if (message.type() === 'error' || message.type() === 'warning') problems.push(`${message.type()}: ${message.text()}`);
  });
  page.on('pageerror', (error) => problems.push(`page error: ${error.message}`));
  await page.goto(server.url);
  await page.click('#view-projects');
  return page;
}

/** Nothing computed or missing may leak onto the screen as a raw JavaScript value. */
async function expectCleanText(page: Page): Promise<void> {
  expect(await page.textContent('body')).not.toMatch(/NaN|undefined|Infinity|Invalid Date|\[object/);
}

const rowNames = (page: Page, testId: string) =>
  page.locator(`[data-testid="${testId}"]`).evaluateAll((rows) => rows.map((row) => row.getAttribute('data-name')));
const notice = (page: Page) => page.locator('[data-testid="projects-notice"]');
const saveStatus = (page: Page) => page.locator('[data-testid="save-status"]');
const shot = (page: Page, name: string) => page.screenshot({ path: path.join(resultsFolder, name), fullPage: true });

/** Waits until the open project says every change is saved. */
async function expectSaved(page: Page): Promise<void> {
  await expect.poll(async () => (await saveStatus(page).textContent())?.trim()).toBe('Saved');
}

describe('projects in the browser', () => {
  it('creates a project, saves every change, refuses a bad date, renames, duplicates, recycles, restores, exports and imports', async () => {
    const databasePath = path.join(tempFolder(), 'lamina.sqlite');
    const server = await startBrowserServer({ port: 0, databasePath, dailyBackups: false });
    const services = server.library.library();
    const problems: string[] = [];
    try {
      let page = await openProjectsView(server, problems);
      await expect.poll(() => page.locator('[data-testid="projects-empty"]').textContent()).toBe('No projects yet: make a new one or import a project file.');
      await shot(page, 'projects-empty.png');

      // New project: it exists at once, under a placeholder name, and opens.
      await page.click('#project-new');
      await expect.poll(() => page.inputValue('#project-name')).toBe('Untitled project');
      const created = services.projects.list();
      expect(created.map((p) => p.name)).toEqual(['Untitled project']);
      const id = created[0]!.id;

      // The state reads "Saving…" during the pause after a key press: typed and read inside the page,
      // well within the 400 ms wait.
      const statusWhileTyping = await page.evaluate(async () => {
        const box = document.querySelector<HTMLInputElement>('#project-client')!;
        box.value = 'Brackenridge Dairies Ltd';
        box.dispatchEvent(new Event('input', { bubbles: true }));
        await new Promise(requestAnimationFrame);
        return document.querySelector('[data-testid="save-status"]')?.textContent?.trim();
      });
      expect(statusWhileTyping).toBe('Saving…');

      await page.fill('#project-name', 'Tallow Quay cold store');
      await page.fill('#project-site', 'Unit 4, Tallow Quay, Port Aldous');
      await page.fill('#project-reference', 'TQ-2025-017');
      await page.fill('#project-engineer', 'R. Okonedo');
      await page.fill('#project-revision', 'B');
      await page.fill('#project-date', '2025-04-09');
      await page.selectOption('#project-unitSystem', 'IP');
      await page.fill('#project-notes', 'Chilled water mains in the plant room; loading bay wall.');
      await expectSaved(page);
      expect(services.projects.open(id)).toMatchObject({
        name: 'Tallow Quay cold store', client: 'Brackenridge Dairies Ltd', site: 'Unit 4, Tallow Quay, Port Aldous',
        reference: 'TQ-2025-017', engineer: 'R. Okonedo', revision: 'B', date: '2025-04-09', unitSystem: 'IP',
        notes: 'Chilled water mains in the plant room; loading bay wall.',
      });
      await expect.poll(() => rowNames(page, 'project-row')).toEqual(['Tallow Quay cold store']);
      expect(await page.textContent('#project-details-heading')).toBe('Tallow Quay cold store');
      await expectCleanText(page);
      await shot(page, 'projects-saved.png');

      // After a reload the stored values are what the form shows.
      await page.close();
      page = await openProjectsView(server, problems);
      const row = page.locator('[data-testid="project-row"][data-name="Tallow Quay cold store"]');
      await expect.poll(() => row.textContent()).toContain('Brackenridge Dairies Ltd');
      expect(await row.textContent()).toContain('TQ-2025-017');
      await row.getByRole('button', { name: 'Tallow Quay cold store' }).click();
      await expect.poll(() => page.inputValue('#project-client')).toBe('Brackenridge Dairies Ltd');
      // A project that has its details shows them folded away; they unfold to be edited.
      expect(await page.locator('#project-date').isVisible()).toBe(false);
      await page.click('#project-details-toggle');
      expect(await page.inputValue('#project-date')).toBe('2025-04-09');
      expect(await page.inputValue('#project-unitSystem')).toBe('IP');
      expect(await page.inputValue('#project-notes')).toBe('Chilled water mains in the plant room; loading bay wall.');

      // A date that is not on the calendar: one sentence naming the field, the text stays, nothing of it is saved,
      // while a change typed in another box at the same time is saved.
      await page.fill('#project-date', '2025-02-30');
      await page.fill('#project-revision', 'C');
      await expect.poll(() => page.locator('#project-date-error').textContent()).toBe(
        'Date must be a calendar date written YYYY-MM-DD (for example 2025-04-09), or left empty.',
      );
      expect(await page.getAttribute('#project-date', 'aria-invalid')).toBe('true');
      await expect.poll(async () => (await saveStatus(page).textContent())?.trim()).toBe('Saved, except Date, which needs correcting.');
      expect(services.projects.open(id)).toMatchObject({ date: '2025-04-09', revision: 'C' });
      expect(await page.inputValue('#project-date')).toBe('2025-02-30');
      await expectCleanText(page);
      await shot(page, 'projects-invalid-date.png');
      await page.fill('#project-date', '2025-04-10');
      await expectSaved(page);
      expect(services.projects.open(id).date).toBe('2025-04-10');
      expect(await page.locator('#project-date-error').count()).toBe(0);

      // Rename: the name box is the project's name; an empty name is refused and not saved, and the list and the
      // heading follow a good one once saved.
      await page.fill('#project-name', '');
      await expect.poll(() => page.locator('#project-name-error').textContent()).toBe('Project name must be 1 to 200 characters long.');
      await expect.poll(async () => (await saveStatus(page).textContent())?.trim()).toBe('Saved, except Project name, which needs correcting.');
      expect(services.projects.open(id).name).toBe('Tallow Quay cold store');
      await page.fill('#project-name', 'Tallow Quay cold store, phase 2');
      await expectSaved(page);
      await expect.poll(() => rowNames(page, 'project-row')).toEqual(['Tallow Quay cold store, phase 2']);
      expect(services.projects.open(id).name).toBe('Tallow Quay cold store, phase 2');
      expect(await page.textContent('#project-details-heading')).toBe('Tallow Quay cold store, phase 2');

      // Two cases stored directly, then renamed and removed here.
      const board = services.materials.create({
        name: 'Tallow Quay PIR board', category: 'insulation', conductivity: { kind: 'constant', value: 0.024 }, density: 32,
        specificHeat: 1400, vapourResistanceFactor: 60, equivalentAirLayerThickness: null, emissivity: 0.9,
        minServiceTemperature: -30, maxServiceTemperature: 90, source: 'demo values for an invented site', notes: '',
      });
      const steel = services.materials.findByName('Carbon steel pipe')!;
      services.projects.addCase(id, { name: 'Loading bay wall', inputs: wallInputs([board.id], { area: 42 }) });
      const chilled = { inner: { kind: 'surface', temperature: 6 }, length: 36 };
      services.projects.addCase(id, { name: 'Chilled water main', inputs: pipeInputs({ pipe: steel.id, insulation: [board.id] }, chilled) });
      await page.click('#project-close');
      await page.reload();
      await page.click('#view-projects');
      await page.locator('[data-testid="project-row"]').getByRole('button', { name: 'Tallow Quay cold store, phase 2' }).click();
      await expect.poll(() => rowNames(page, 'case-row')).toEqual(['Loading bay wall', 'Chilled water main']);
      expect(await page.locator('[data-testid="case-row"]').first().textContent()).toContain('Wall or roof');
      const pipeCase = page.locator('[data-testid="case-row"][data-name="Chilled water main"]');
      await pipeCase.getByRole('button', { name: 'Rename' }).click();
      await page.fill('#case-rename', '   ');
      await page.click('text=Save name');
      await expect.poll(() => page.locator('#case-rename-error').textContent()).toBe('Case name must be 1 to 200 characters long.');
      await page.fill('#case-rename', 'Chilled water main, plant room');
      await page.click('text=Save name');
      await expect.poll(() => rowNames(page, 'case-row')).toEqual(['Loading bay wall', 'Chilled water main, plant room']);
      expect(services.projects.open(id).cases.map((c) => c.name)).toEqual(['Loading bay wall', 'Chilled water main, plant room']);
      // Removal is at once, with an undo bar (tests/e2e/project-workspace.test.ts takes Undo).
      const wallCase = page.locator('[data-testid="case-row"][data-name="Loading bay wall"]');
      await wallCase.getByRole('button', { name: 'Remove', exact: true }).click();
      await expect.poll(() => rowNames(page, 'case-row')).toEqual(['Chilled water main, plant room']);
      expect(services.projects.open(id).cases.map((c) => c.name)).toEqual(['Chilled water main, plant room']);
      expect(await page.locator('[data-testid="undo-bar"]').textContent()).toContain('Case removed.');
      await expectCleanText(page);
      await shot(page, 'projects-case-removed.png');

      // Duplicate: a copy with the case, opened.
      await page.click('#project-duplicate');
      await expect.poll(() => notice(page).textContent()).toContain('Made "Tallow Quay cold store, phase 2 (copy)", a copy with its 1 case; it is now open.');
      await expect.poll(() => page.inputValue('#project-name')).toBe('Tallow Quay cold store, phase 2 (copy)');
      await expect.poll(async () => (await rowNames(page, 'project-row')).sort()).toEqual(['Tallow Quay cold store, phase 2', 'Tallow Quay cold store, phase 2 (copy)']);
      const copy = services.projects.list().find((p) => p.name.endsWith('(copy)'))!;
      expect(copy).toMatchObject({ client: 'Brackenridge Dairies Ltd', caseCount: 1, date: '2025-04-10' });

      // Delete to the recycle bin, see it there, restore it.
      await page.click('#project-remove');
      await expect.poll(() => notice(page).textContent()).toContain('Moved "Tallow Quay cold store, phase 2 (copy)" to the recycle bin.');
      await expect.poll(() => rowNames(page, 'project-row')).toEqual(['Tallow Quay cold store, phase 2']);
      expect(services.projects.listRecycleBin().map((p) => p.id)).toEqual([copy.id]);
      await page.click('#recycle-bin-toggle');
      await expect.poll(() => rowNames(page, 'recycle-bin-row')).toEqual(['Tallow Quay cold store, phase 2 (copy)']);
      expect(await page.textContent('#recycle-bin-toggle')).toContain('Recycle bin (1)');
      await expectCleanText(page);
      await shot(page, 'projects-recycle-bin.png');
      await page.locator('[data-testid="recycle-bin-row"]').getByRole('button', { name: 'Restore' }).click();
      await expect.poll(() => notice(page).textContent()).toContain('Restored "Tallow Quay cold store, phase 2 (copy)" from the recycle bin; it is now open.');
      await expect.poll(async () => (await rowNames(page, 'project-row')).length).toBe(2);
      expect(await page.locator('[data-testid="recycle-bin-empty"]').textContent()).toBe('The recycle bin is empty.');
      expect(services.projects.listRecycleBin()).toEqual([]);

      // Emptying the bin asks first, then deletes for good.
      await page.click('#project-remove');
      await expect.poll(() => rowNames(page, 'recycle-bin-row')).toEqual(['Tallow Quay cold store, phase 2 (copy)']);
      await page.click('#recycle-bin-empty');
      expect(await page.textContent('#empty-bin-question')).toContain('Delete 1 project and its cases for good?');
      expect(services.projects.listRecycleBin()).toHaveLength(1); // nothing happens before the confirmation
      await shot(page, 'projects-empty-bin-confirm.png');
      await page.click('#recycle-bin-empty-confirm');
      await expect.poll(() => notice(page).textContent()).toContain('Emptied the recycle bin: 1 project deleted for good.');
      expect(services.projects.listRecycleBin()).toEqual([]);
      expect(() => services.projects.open(copy.id)).toThrow(`There is no project with id ${copy.id}.`);

      // Export the project to a file, then import that file: a second project, the material reused.
      await page.locator('[data-testid="project-row"]').getByRole('button', { name: 'Tallow Quay cold store, phase 2' }).click();
      await expect.poll(() => page.inputValue('#project-name')).toBe('Tallow Quay cold store, phase 2');
      const [download] = await Promise.all([page.waitForEvent('download'), page.click('#project-export')]);
      const exportedPath = path.join(tempFolder(), download.suggestedFilename());
      await download.saveAs(exportedPath);
      expect(download.suggestedFilename()).toMatch(/^Tallow-Quay-cold-store-phase-2.*\.json$/);
      const exported = JSON.parse(fs.readFileSync(exportedPath, 'utf8')) as { format: string; project: { name: string }; materials: { name: string }[]; cases: unknown[] };
      expect(exported).toMatchObject({ format: 'lamina-project', project: { name: 'Tallow Quay cold store, phase 2' } });
      expect(exported.materials.map((m) => m.name).sort()).toEqual(['Carbon steel pipe', 'Tallow Quay PIR board']); // the pipe wall's and the insulation's
      expect(exported.cases).toHaveLength(1);
      await expect.poll(() => notice(page).textContent()).toContain(`Exported "Tallow Quay cold store, phase 2" as ${download.suggestedFilename()}`);

      await page.setInputFiles('#project-import', exportedPath);
      // The project is already in the library: Lamina asks whether to add a copy or replace it.
      await expect.poll(() => page.textContent('[data-testid="import-question"]')).toContain(
        'A project "Tallow Quay cold store, phase 2" from the same file is already in the library: choose whether to add this one as a copy or to replace it.',
      );
      expect(services.projects.list()).toHaveLength(1);
      await shot(page, 'projects-import-question.png');
      await page.click('#import-as-copy');
      await expect.poll(() => notice(page).textContent()).toContain(
        `Imported "Tallow Quay cold store, phase 2" from ${download.suggestedFilename()} with 1 case. Its materials: 2 already in your library (reused), 0 added to the library.`,
      );
      await expect.poll(() => rowNames(page, 'project-row')).toEqual(['Tallow Quay cold store, phase 2', 'Tallow Quay cold store, phase 2']);
      const imported = services.projects.list()[0]!;
      expect(imported.id).not.toBe(id);
      expect(services.projects.open(imported.id).cases[0]!.inputs.layers[0]!.materialId).toBe(board.id);
      expect(await page.getAttribute('#project-details', 'data-project-id')).toBe(String(imported.id));
      await expectCleanText(page);
      await shot(page, 'projects-imported.png');

      // A file that is not a project file is refused in one sentence and adds nothing.
      await page.setInputFiles('#project-import', { name: 'tallow-quay-notes.json', mimeType: 'application/json', buffer: Buffer.from('{"notes": "site visit"}') });
      await expect.poll(() => notice(page).textContent()).toContain(
        'Nothing was imported from tallow-quay-notes.json: format must be "lamina-project"; this is not a Lamina project file.',
      );
      expect(services.projects.list()).toHaveLength(2);
      await expectCleanText(page);
      await shot(page, 'projects-import-refused.png');

      // Undo straight after moving a project to the recycle bin brings it back.
      await page.click('#project-remove');
      await expect.poll(() => rowNames(page, 'recycle-bin-row')).toEqual(['Tallow Quay cold store, phase 2']);
      await page.click('#project-undo-remove');
      await expect.poll(() => notice(page).textContent()).toContain('Restored "Tallow Quay cold store, phase 2" from the recycle bin; it is now open.');
      expect(services.projects.listRecycleBin()).toEqual([]);
      expect(services.projects.list()).toHaveLength(2);

      // The search narrows the list.
      await page.fill('#project-search', 'brackenridge quay');
      await expect.poll(() => page.textContent('[data-testid="project-count"]')).toContain('2 projects');
      await page.fill('#project-search', 'fishmarket');
      await expect.poll(() => page.textContent('[data-testid="project-count"]')).toContain('0 of 2 projects shown');
      expect(await page.locator('[data-testid="projects-empty"]').textContent()).toBe('No project matches this search.');

      // The only console lines are Chromium logging the two HTTP 400s the page turned into words above:
      // the import that asked copy-or-replace, and the file that is not a project file.
      expect(problems).toEqual(Array(2).fill('error: Failed to load resource: the server responded with a status of 400 (Bad Request)'));
      await page.close();
    } finally {
      await server.close();
    }
  });
});
