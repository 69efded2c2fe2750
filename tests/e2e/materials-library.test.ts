/**
 * The materials library and backups in real Chromium, on the browser-mode server with a real
 * SQLite file in a temporary folder: search, duplicate a built-in, edit it, a validation message,
 * a refused deletion, an all-or-nothing CSV import with a bad row, a backup made and restored, and
 * a damaged database reported at start with the offer to restore. Screenshots go to test-results/.
 */
import { describe, expect, it } from 'vitest';
import fs from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { startBrowserServer, type BrowserServer } from '../../main/server/browser-server.js';
import { MATERIAL_CSV_HEADER } from '../../main/services/material-csv.js';
import { resultsFolder, useBrowserSession } from './browser-session.js';
import { pipeCase, seedIds } from '../storage/case-fixtures.js';

const session = useBrowserSession('lamina-library-e2e-');
const tempDatabasePath = (): string => path.join(session.tempFolder(), 'lamina.sqlite');

async function openPage(server: BrowserServer): Promise<{ page: Page; problems: string[] }> {
  const page = await session.browser().newPage({ viewport: { width: 1100, height: 900 } });
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

      // Duplicate the built-in to edit it.
      await steelRow.getByRole('button', { name: 'Duplicate to edit' }).click();
      await expect.poll(() => notice(page).textContent()).toContain('Made "Carbon steel pipe (copy)", a copy you can edit.');
      expect(await page.inputValue('#material-name')).toBe('Carbon steel pipe (copy)');
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
        inputs: pipeCase({ pipe: saved!.id, insulation: [seed.pipeInsulation], jacket: seed.cladding }, { length: 18 }),
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
