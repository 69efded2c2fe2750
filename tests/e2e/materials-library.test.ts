/**
 * The materials library and backups in real Chromium, on the browser-mode server with a real
 * SQLite file in a temporary folder: search, duplicate a built-in, edit it, a validation message,
 * a refused deletion, an all-or-nothing CSV import with a bad row, a backup made and restored, and
 * a damaged database reported at start with the offer to restore. Then the screens at the window
 * sizes the app supports (1366×800 and 1280×720): the table fits, a copy exists only once saved,
 * the editor and a refused save's first problem come into view with the focus, and the CSV
 * template downloads and imports. Screenshots go to test-results/.
 */
import { describe, expect, it } from 'vitest';
import fs from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { startBrowserServer, type BrowserServer } from '../../main/server/browser-server.js';
import { MATERIAL_CSV_HEADER } from '../../main/services/material-csv.js';
import { resultsFolder, useBrowserSession } from './browser-session.js';
import { pipeInputs, seedIds } from '../storage/case-fixtures.js';

const session = useBrowserSession('lamina-library-e2e-');
const tempDatabasePath = (): string => path.join(session.tempFolder(), 'lamina.sqlite');

async function openPage(server: BrowserServer, viewport = { width: 1100, height: 900 }): Promise<{ page: Page; problems: string[] }> {
  const page = await session.browser().newPage({ viewport });
  const problems: string[] = [];
  page.on('console', (message) => {
    if (message.type() === 'error' || message.type() === 'warning') problems.push(`${message.type()}: ${message.text()}`);
  });
  page.on('pageerror', (error) => problems.push(`page error: ${error.message}`));
  await page.goto(server.url);
  return { page, problems };
}

/** Nothing computed or missing may leak onto the screen as a raw JavaScript value. */
async function expectCleanText(page: Page): Promise<void> {
  expect(await page.textContent('body')).not.toMatch(/NaN|undefined|Infinity|\[object/);
}

const rows = (page: Page) => page.locator('[data-testid="material-row"]');
const notice = (page: Page) => page.locator('[data-testid="materials-notice"]');

/** The window sizes the app must work at without horizontal scrolling (issue 9, Quality). */
const WINDOWS = [{ width: 1366, height: 800 }, { width: 1280, height: 720 }] as const;

/** An invented user material, so the table has a row with the Edit, Duplicate and Delete buttons. */
const HARROWGATE_RENDER = {
  name: 'Harrowgate render', category: 'building', conductivity: { kind: 'constant', value: 0.8 }, density: 1700, specificHeat: 1000,
  vapourResistanceFactor: 20, equivalentAirLayerThickness: null, emissivity: 0.9, minServiceTemperature: null,
  maxServiceTemperature: null, source: 'demo', notes: '',
} as const;

/** The focused element's id, and whether it lies wholly inside the window. */
const focusedInView = (page: Page) =>
  page.evaluate(() => {
    const element = document.activeElement as HTMLElement | null;
    const box = element?.getBoundingClientRect();
    return {
      id: element?.id ?? '',
      inView: box !== undefined && box.top >= 0 && box.left >= 0 && box.bottom <= innerHeight && box.right <= innerWidth,
    };
  });

/** Whether the element lies wholly inside the window. */
const inView = (page: Page, selector: string) =>
  page.locator(selector).evaluate((element) => {
    const box = element.getBoundingClientRect();
    return box.top >= 0 && box.left >= 0 && box.bottom <= innerHeight && box.right <= innerWidth;
  });

/**
 * No horizontal scrolling of the page or of the table's box, and every row button's label fully
 * shown: not cut inside the button, nor cut off by the table's box. Returns the labels that are not.
 */
const widthProblems = (page: Page) =>
  page.evaluate(() => {
    const problems: string[] = [];
    if (document.documentElement.scrollWidth > innerWidth) problems.push(`page ${document.documentElement.scrollWidth} px wide in ${innerWidth}`);
    const box = document.querySelector('.table-scroll')!;
    if (box.scrollWidth > box.clientWidth) problems.push(`table ${box.scrollWidth} px wide in ${box.clientWidth}`);
    const edge = box.getBoundingClientRect().right;
    for (const button of Array.from(document.querySelectorAll<HTMLElement>('[data-testid="material-row"] button'))) {
      const cut = button.scrollWidth > button.clientWidth || button.getBoundingClientRect().right > edge + 0.5;
      if (cut) problems.push(`"${button.textContent?.trim()}" in ${button.closest('tr')?.getAttribute('data-name')}`);
    }
    return problems;
  });

describe('materials library in the browser', () => {
  it('searches, duplicates a built-in, edits it, refuses bad input and a deletion in use, imports CSV all or nothing, and makes a backup', async () => {
    const databasePath = tempDatabasePath();
    const server = await startBrowserServer({ port: 0, databasePath, dailyBackups: false });
    try {
      const { page, problems } = await openPage(server);
      await page.click('#view-materials');
      await expect.poll(() => rows(page).count()).toBeGreaterThan(40);

      // Search and filter.
      await page.fill('#material-search', 'rock wool');
      await expect.poll(async () => (await rows(page).evaluateAll((r) => r.map((e) => e.getAttribute('data-name')))).join('|')).toMatch(/^Rock wool/);
      const found = await rows(page).evaluateAll((r) => r.map((e) => e.getAttribute('data-name') ?? ''));
      expect(found.length).toBeGreaterThan(0);
      expect(found.every((name) => /rock wool/i.test(name))).toBe(true);
      await page.fill('#material-search', 'steel');
      await page.selectOption('#material-category-filter', 'pipe');
      await expect.poll(() => rows(page).evaluateAll((r) => r.map((e) => e.getAttribute('data-name')))).toEqual([
        'Carbon steel pipe', 'Stainless steel pipe, austenitic',
      ]);
      const steelRow = page.locator('[data-testid="material-row"][data-name="Carbon steel pipe"]');
      expect(await steelRow.textContent()).toContain('built-in, read-only');
      expect(await steelRow.textContent()).toContain('vapour-tight');
      await expectCleanText(page);
      await page.screenshot({ path: path.join(resultsFolder, 'materials-search.png'), fullPage: true });

      // Duplicate the built-in to edit it: a draft of the copy, saved only on Save.
      await steelRow.getByRole('button', { name: 'Duplicate to edit' }).click();
      await expect.poll(() => page.inputValue('#material-name')).toBe('Carbon steel pipe (copy)');
      expect(await page.textContent('#material-editor-heading')).toBe('New material, a copy of “Carbon steel pipe”');
      expect(await page.isChecked('#material-vapour-tight')).toBe(true);

      // A bad value: one sentence naming the field and its range; nothing is saved.
      await page.fill('#material-name', 'Harrowgate header steel');
      await page.fill('#material-emissivity', '1.4');
      await page.click('#material-save');
      const emissivityError = page.locator('#material-emissivity-error');
      await expect.poll(() => emissivityError.textContent()).toBe('Surface emissivity must be empty or a number more than 0 and at most 1.');
      expect(await page.getAttribute('#material-emissivity', 'aria-invalid')).toBe('true');
      await page.fill('#material-density', 'heavy');
      await page.click('#material-save');
      await expect.poll(() => page.locator('#material-density-error').textContent()).toBe(
        'Density must be empty or a number more than 0 and at most 25000 kg/m³.',
      );
      await expectCleanText(page);
      await page.screenshot({ path: path.join(resultsFolder, 'materials-validation.png'), fullPage: true });
      const services = server.library.library();
      expect(services.materials.findByName('Harrowgate header steel')).toBeUndefined();

      await page.fill('#material-density', '7850');
      await page.fill('#material-emissivity', '0.35');
      await page.click('#material-save');
      await expect.poll(() => notice(page).textContent()).toContain('Saved "Harrowgate header steel".');
      const saved = services.materials.findByName('Harrowgate header steel');
      expect(saved).toMatchObject({ builtIn: false, density: 7850, emissivity: 0.35, vapourResistanceFactor: Infinity });

      // Deleting a material a project uses is refused with the reason.
      const project = services.projects.create({ name: 'Harrowgate depot boiler house' });
      const seed = seedIds((name) => services.materials.findByName(name));
      services.projects.addCase(project.id, {
        name: 'Header run',
        inputs: pipeInputs({ pipe: saved!.id, insulation: [seed.pipeInsulation], jacket: seed.cladding }, { length: 18 }),
      });
      await page.fill('#material-search', 'Harrowgate');
      await page.selectOption('#material-category-filter', '');
      const ownRow = page.locator('[data-testid="material-row"][data-name="Harrowgate header steel"]');
      await expect.poll(() => ownRow.count()).toBe(1);
      expect(await ownRow.textContent()).toContain('yours');
      await ownRow.getByRole('button', { name: 'Delete' }).click();
      await ownRow.getByRole('button', { name: 'Delete for good' }).click();
      await expect.poll(() => notice(page).textContent()).toContain(
        '"Harrowgate header steel" is used by 1 case(s) in project "Harrowgate depot boiler house"; choose a replacement material or remove it from those cases first.',
      );
      expect(services.materials.findByName('Harrowgate header steel')).toBeDefined();
      await page.screenshot({ path: path.join(resultsFolder, 'materials-delete-refused.png'), fullPage: true });

      // CSV import with one bad row: nothing is written, the line number and reason are shown.
      const csv = [
        MATERIAL_CSV_HEADER.join(','),
        'Harrowgate lime plaster,building,0.7,1600,1000,10,,0.9,,,demo values for an invented site,',
        'Harrowgate wood fibre board,insulation,0,160,2100,5,,0.9,,,demo values for an invented site,',
        'Harrowgate cork board,insulation,0.042,120,1800,10,,0.9,,,demo values for an invented site,',
      ].join('\n');
      const userCountBefore = services.materials.list({ origin: 'user' }).length;
      await page.setInputFiles('#material-import', { name: 'harrowgate-materials.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
      await expect.poll(() => notice(page).textContent()).toContain('Nothing was imported from harrowgate-materials.csv: 1 row needs fixing first.');
      const problemRows = page.locator('[data-testid="csv-problem"]');
      expect(await problemRows.count()).toBe(1);
      expect(await problemRows.first().locator('th').textContent()).toBe('3');
      expect(await problemRows.first().locator('td').textContent()).toMatch(/conductivity/i);
      expect(services.materials.list({ origin: 'user' }).length).toBe(userCountBefore);
      await expectCleanText(page);
      await page.screenshot({ path: path.join(resultsFolder, 'materials-csv-refused.png'), fullPage: true });

      // A backup, made from the Backups view.
      await page.click('#view-backups');
      await page.click('#backup-create');
      await expect.poll(() => page.locator('[data-testid="backups-notice"]').textContent()).toMatch(/^\s*Backup made: lamina-\d{8}T\d{9}Z-manual\.sqlite\.\s*$/);
      // The notice comes before the list is read again: wait for the row.
      await expect.poll(() => page.locator('[data-testid="backup-row"]').count()).toBe(1);
      expect(services.backups.list()).toHaveLength(1);
      expect(await page.locator('[data-testid="backup-row"]').first().textContent()).toContain('made by hand');
      await expectCleanText(page);
      await page.screenshot({ path: path.join(resultsFolder, 'backups-made.png'), fullPage: true });
      // The only console line is Chromium logging the refused deletion's HTTP 409, which the page showed above.
      expect(problems).toEqual(['error: Failed to load resource: the server responded with a status of 409 (Conflict)']);
      await page.close();
    } finally {
      await server.close();
    }
  });

  it('reports a damaged database at start, offers the backups, and restores one after confirmation', async () => {
    const databasePath = tempDatabasePath();
    const first = await startBrowserServer({ port: 0, databasePath, dailyBackups: false });
    const made = first.library.library().materials.create({
      name: 'Harrowgate render', category: 'building', conductivity: { kind: 'constant', value: 0.8 }, density: 1700, specificHeat: 1000,
      vapourResistanceFactor: 20, equivalentAirLayerThickness: null, emissivity: 0.9, minServiceTemperature: null,
      maxServiceTemperature: null, source: 'demo', notes: '',
    });
    await first.library.library().backups.create();
    await first.close();
    const garbage = Buffer.from('not a database: a text file saved over it by mistake\n');
    fs.writeFileSync(databasePath, garbage);

    const server = await startBrowserServer({ port: 0, databasePath, dailyBackups: false });
    try {
      const { page, problems } = await openPage(server);
      const banner = page.locator('[data-testid="library-problem"]');
      await expect.poll(() => banner.textContent()).toContain('is not a Lamina database (it is not an SQLite file)');
      await page.screenshot({ path: path.join(resultsFolder, 'library-damaged.png'), fullPage: true });
      expect(fs.readFileSync(databasePath)).toEqual(garbage);

      await banner.getByRole('button', { name: 'Choose a backup to restore' }).click();
      await page.locator('[data-testid="backup-row"]').first().getByRole('button', { name: 'Restore…' }).click();
      expect(await page.textContent('#restore-question')).toContain('Replace the current library and projects with the backup of');
      expect(fs.readFileSync(databasePath)).toEqual(garbage); // nothing happens before the confirmation
      await page.screenshot({ path: path.join(resultsFolder, 'backups-restore-confirm.png'), fullPage: true });
      await page.click('#restore-confirm');
      await expect.poll(() => page.locator('[data-testid="backups-notice"]').textContent()).toMatch(/Restored the backup of .+ The file it replaced was kept as lamina\.sqlite\.before-restore-/);
      await expect.poll(() => banner.count()).toBe(0);

      await page.click('#view-materials');
      await page.selectOption('#material-origin-filter', 'user');
      await expect.poll(() => rows(page).evaluateAll((r) => r.map((e) => e.getAttribute('data-name')))).toEqual([made.name]);
      const keptAside = fs.readdirSync(path.dirname(databasePath)).filter((f) => f.startsWith('lamina.sqlite.before-restore-'));
      expect(keptAside).toHaveLength(1);
      expect(fs.readFileSync(path.join(path.dirname(databasePath), keptAside[0]!))).toEqual(garbage);
      await expectCleanText(page);
      await page.screenshot({ path: path.join(resultsFolder, 'backups-restored.png'), fullPage: true });
      expect(problems).toEqual([]);
      await page.close();
    } finally {
      await server.close();
    }
  });
});

describe('materials screens at 1366×800 and 1280×720', () => {
  it('fits the table, its buttons and the CSV columns in the window, with a user material present', async () => {
    const server = await startBrowserServer({ port: 0, databasePath: tempDatabasePath(), dailyBackups: false });
    try {
      server.library.library().materials.create(HARROWGATE_RENDER);
      for (const viewport of WINDOWS) {
        const { page, problems } = await openPage(server, viewport);
        await page.click('#view-materials');
        await expect.poll(() => rows(page).count()).toBeGreaterThan(40);
        const ownRow = page.locator('[data-testid="material-row"][data-name="Harrowgate render"]');
        expect(await ownRow.getByRole('button').allTextContents()).toEqual(['Edit', 'Duplicate', 'Delete']);
        const builtInButton = rows(page).first().getByRole('button', { name: 'Duplicate to edit' });
        expect(await builtInButton.evaluate((b) => b.scrollWidth <= b.clientWidth)).toBe(true);
        expect(await widthProblems(page)).toEqual([]);
        await page.screenshot({ path: path.join(resultsFolder, `materials-${viewport.width}x${viewport.height}.png`) });

        // The user material's row with the deletion question open, and the list of columns unfolded.
        await ownRow.scrollIntoViewIfNeeded();
        await ownRow.getByRole('button', { name: 'Delete' }).click();
        expect(await ownRow.getByRole('button').allTextContents()).toEqual(['Edit', 'Duplicate', 'Delete for good', 'Keep']);
        await page.click('.csv-column-details > summary');
        expect(await widthProblems(page)).toEqual([]);
        await ownRow.screenshot({ path: path.join(resultsFolder, `materials-own-row-${viewport.width}x${viewport.height}.png`) });
        await page.locator('.csv-import').screenshot({ path: path.join(resultsFolder, `materials-csv-columns-${viewport.width}x${viewport.height}.png`) });

        // The editor open on the user material.
        await ownRow.getByRole('button', { name: 'Keep' }).click();
        await ownRow.getByRole('button', { name: 'Edit' }).click();
        await expect.poll(() => focusedInView(page)).toEqual({ id: 'material-name', inView: true });
        expect(await widthProblems(page)).toEqual([]);
        await expectCleanText(page);
        await page.screenshot({ path: path.join(resultsFolder, `materials-editor-${viewport.width}x${viewport.height}.png`) });
        expect(problems).toEqual([]);
        await page.close();
      }
    } finally {
      await server.close();
    }
  });

  it('opens a copy of a built-in as an unsaved draft in view, with the focus in its name; Cancel leaves the library unchanged', async () => {
    const server = await startBrowserServer({ port: 0, databasePath: tempDatabasePath(), dailyBackups: false });
    try {
      const services = server.library.library();
      const { page, problems } = await openPage(server, WINDOWS[0]);
      await page.click('#view-materials');
      await expect.poll(() => rows(page).count()).toBeGreaterThan(40);
      const rowCount = await rows(page).count();
      const libraryCount = services.materials.list().length;

      // A row far down the table, well below the editor's place above it.
      const farRow = rows(page).nth(rowCount - 3);
      const name = (await farRow.getAttribute('data-name'))!;
      const duplicateButton = farRow.getByRole('button', { name: 'Duplicate to edit' });
      for (const attempt of [1, 2]) {
        await duplicateButton.click();
        await expect.poll(() => page.inputValue('#material-name')).toBe(`${name} (copy)`);
        expect(await focusedInView(page)).toEqual({ id: 'material-name', inView: true });
        expect(await inView(page, '#material-editor-heading')).toBe(true);
        expect(await page.textContent('#material-editor-heading')).toBe(`New material, a copy of “${name}”`);
        expect(services.materials.list().length).toBe(libraryCount);
        if (attempt === 1) await page.screenshot({ path: path.join(resultsFolder, 'materials-copy-draft.png') });
        await page.click('#material-cancel');
        await expect.poll(() => page.locator('#material-name').count()).toBe(0);
        // Nothing was saved: neither "(copy)" nor, the second time, "(copy) 2".
        expect(services.materials.list().length).toBe(libraryCount);
        expect(await rows(page).count()).toBe(rowCount);
        expect(services.materials.list({ search: '(copy)' })).toEqual([]);
        // The focus is back on the button that opened the draft.
        expect(await duplicateButton.evaluate((button) => button === document.activeElement)).toBe(true);
      }

      // Saved, the copy exists once; the next copy is offered under the next free name. By keyboard.
      await duplicateButton.focus();
      await page.keyboard.press('Enter');
      await expect.poll(() => focusedInView(page)).toEqual({ id: 'material-name', inView: true });
      await page.keyboard.press('Enter'); // Enter in the name box submits the form
      await expect.poll(() => notice(page).textContent()).toContain(`Saved "${name} (copy)".`);
      expect(services.materials.list({ origin: 'user' }).map((m) => m.name)).toEqual([`${name} (copy)`]);
      await expect.poll(() => rows(page).count()).toBe(rowCount + 1);
      await duplicateButton.click();
      await expect.poll(() => page.inputValue('#material-name')).toBe(`${name} (copy) 2`);
      await page.click('#material-cancel');
      expect(services.materials.list({ origin: 'user' }).map((m) => m.name)).toEqual([`${name} (copy)`]);
      await expectCleanText(page);
      expect(problems).toEqual([]);
      await page.close();
    } finally {
      await server.close();
    }
  });

  it('brings the first problem of a refused save into view and puts the focus on it', async () => {
    const server = await startBrowserServer({ port: 0, databasePath: tempDatabasePath(), dailyBackups: false });
    try {
      const services = server.library.library();
      const { page, problems } = await openPage(server, WINDOWS[0]);
      await page.click('#view-materials');
      await page.click('#material-new');
      await expect.poll(() => focusedInView(page)).toEqual({ id: 'material-name', inView: true });
      await page.fill('#material-name', 'Harrowgate pipe wool');
      await page.fill('#material-minServiceTemperature', '0');
      await page.fill('#material-maxServiceTemperature', '300');

      // A curve fitted to data-sheet points but never applied with "Use this curve".
      await page.click('#fit-panel > summary');
      // Invented data-sheet points for an invented product, common practice, no source (the shape of a mineral wool curve).
      for (const [index, [temperature, conductivity]] of [[10, '0.035'], [100, '0.045'], [200, '0.058']].entries()) {
        await page.fill(`#fit-temperature-${index}`, String(temperature));
        await page.fill(`#fit-conductivity-${index}`, String(conductivity));
      }
      await page.click('#fit-run');
      await expect.poll(() => page.locator('#fit-equation').count()).toBe(1);
      await page.click('#material-save');
      await expect.poll(() => page.textContent('#material-conductivity-error')).toBe(
        'Thermal conductivity must be a number more than 0 and at most 1000 W/(m·K).',
      );
      await expect.poll(() => focusedInView(page)).toEqual({ id: 'material-conductivity', inView: true });
      expect(await inView(page, '#material-conductivity-error')).toBe(true);
      expect(await page.getAttribute('#material-conductivity', 'aria-describedby')).toBe('material-conductivity-error');
      await page.screenshot({ path: path.join(resultsFolder, 'materials-save-refused-field.png') });
      expect(services.materials.findByName('Harrowgate pipe wool')).toBeUndefined();

      // A refusal that names no field (the name is taken) is shown in the notice, which gets the focus.
      await page.fill('#material-conductivity', '0.04');
      await page.fill('#material-name', 'Still air');
      await page.locator('#material-save').scrollIntoViewIfNeeded();
      await page.click('#material-save');
      await expect.poll(() => notice(page).textContent()).toContain('A material named "Still air" already exists; choose another name.');
      await expect.poll(() => focusedInView(page)).toEqual({ id: 'materials-notice', inView: true });
      await page.screenshot({ path: path.join(resultsFolder, 'materials-save-refused-notice.png') });
      expect(services.materials.list({ origin: 'user' })).toEqual([]);
      await expectCleanText(page);
      // The only console line is Chromium logging the refused save's HTTP 409, which the page showed above.
      expect(problems).toEqual(['error: Failed to load resource: the server responded with a status of 409 (Conflict)']);
      await page.close();
    } finally {
      await server.close();
    }
  });

  it('shows the CSV columns beside the import, offers a template with the import\'s header, and the template imports as it is', async () => {
    const server = await startBrowserServer({ port: 0, databasePath: tempDatabasePath(), dailyBackups: false });
    try {
      const services = server.library.library();
      const { page, problems } = await openPage(server, WINDOWS[1]);
      await page.click('#view-materials');
      const columns = page.locator('#csv-column-list');
      expect(await columns.locator('code').allTextContents()).toEqual([...MATERIAL_CSV_HEADER]);
      expect(await page.getAttribute('#material-import', 'aria-describedby')).toBe('csv-column-list');
      expect(await inView(page, '#csv-column-list')).toBe(true);

      // Downloaded by keyboard: Tab from the import button reaches it and shows its focus, Enter starts the download.
      await page.focus('#material-import');
      await page.keyboard.press('Tab');
      expect(await page.evaluate(() => document.activeElement?.id)).toBe('material-template');
      expect(await page.locator('#material-template').evaluate((b) => getComputedStyle(b).outlineStyle)).not.toBe('none');
      const [download] = await Promise.all([page.waitForEvent('download'), page.keyboard.press('Enter')]);
      expect(download.suggestedFilename()).toBe('lamina-materials-template.csv');
      const template = fs.readFileSync(await download.path());
      const lines = template.toString('utf8').split('\n');
      expect(lines[0]).toBe(MATERIAL_CSV_HEADER.join(','));
      expect(lines.slice(1)).toEqual([expect.stringMatching(/^Example: /), '']); // one example row, then the final line break

      // The template, imported as it is, is accepted whole.
      await page.setInputFiles('#material-import', { name: download.suggestedFilename(), mimeType: 'text/csv', buffer: template });
      await expect.poll(() => notice(page).textContent()).toContain('Imported 1 material from lamina-materials-template.csv.');
      const imported = services.materials.list({ origin: 'user' });
      expect(imported.map((m) => m.name)).toEqual(['Example: Tarnbrook mineral wool slab']);
      expect(imported[0]).toMatchObject({ category: 'insulation', conductivity: { kind: 'table', points: [[10, 0.034], [100, 0.043], [200, 0.056]] } });
      await page.click('.csv-column-details > summary');
      expect(await page.locator('.csv-column-details tbody tr').count()).toBe(MATERIAL_CSV_HEADER.length);
      await expectCleanText(page);
      await page.screenshot({ path: path.join(resultsFolder, 'materials-csv-template-imported.png') });
      expect(problems).toEqual([]);
      await page.close();
    } finally {
      await server.close();
    }
  });
});
