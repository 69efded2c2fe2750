/**
 * The schedule's conditions and services edited in real Chromium, on the browser-mode server with
 * a real SQLite library in a temporary folder: the shipped example schedule is imported and sized,
 * the 'heating flow' touch limit lowered to 45 °C and a condition set added in the page's form,
 * saved, and checked where it is stored (the settings the command line prints); the heating-flow
 * runs, and only they, then show as waiting to be sized again. A humidity of 150 % is refused
 * beside its box with the text kept, and a repeated name is refused by the Node side beside the
 * name's box. Screenshots at 1366×800 go to test-results/. The scenario of the example schedule is
 * invented; the touch limit of 45 °C is a choice of this test, not a requirement.
 */
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { startBrowserServer, type BrowserServer } from '../../main/server/browser-server.js';
import { projectRoot, resultsFolder, useBrowserSession } from './browser-session.js';

const session = useBrowserSession('lamina-schedule-settings-e2e-');
let server: BrowserServer;
let page: Page;
let projectId: number;
const problems: string[] = [];
const services = () => server.library.library();
const settings = () => services().schedules.settingsOf(projectId);
const shot = (name: string) => page.screenshot({ path: path.join(resultsFolder, name), fullPage: false });
const scrollTo = (selector: string) => page.locator(selector).evaluate((el) => el.scrollIntoView({ block: 'start' }));
const refusalBeside = (id: string) => page.locator(`#${id}-error`);
/** The references of the grid's rows marked as waiting to be sized. */
const staleRows = () => page.locator('tr.run-row.stale').evaluateAll((rows) => rows.map((r) => r.getAttribute('data-reference')).sort());
const heatingFlow = () => services().schedules.get(projectId).runs.filter((r) => r.service === 'heating flow').map((r) => r.reference).sort();

beforeAll(async () => {
  server = await startBrowserServer({ port: 0, databasePath: path.join(session.tempFolder(), 'lamina.sqlite'), dailyBackups: false });
  projectId = services().projects.create({ name: 'Orchard Vale clinic' }).id;
  const imported = services().schedules.importCsv(projectId, fs.readFileSync(path.join(projectRoot, 'data', 'schedules', 'example-schedule.csv'), 'utf8'));
  expect(imported.ok).toBe(true);
  page = await session.browser().newPage({ viewport: { width: 1366, height: 800 } });
  // A refused save is logged by the browser as a failed request (status 400); anything else is a problem.
  page.on('console', (m) => { if (m.type() === 'error' && !/status of 400/.test(m.text())) problems.push(m.text()); });
  page.on('pageerror', (e) => problems.push(e.message));
  await page.goto(server.url);
  await page.locator('[data-testid="project-row"]').getByRole('button', { name: 'Orchard Vale clinic', exact: true }).click();
  await page.click('#project-schedule');
  await page.locator('[data-testid="schedule-grid"]').waitFor();
});
afterAll(async () => {
  await page?.close();
  await server?.close();
});

describe('the schedule settings in US customary units', () => {
  it('shows the stored °C as °F and stores a touch limit typed as 113 °F as 45 °C', async () => {
    // (113 − 32) × 5/9 = 45 exactly: the Fahrenheit scale's definition. 25 °C = 77 °F likewise.
    const us = services().projects.create({ name: 'Orchard Vale clinic, US drawings', unitSystem: 'IP' }).id;
    const usPage = await session.browser().newPage({ viewport: { width: 1366, height: 800 } });
    try {
      await usPage.goto(server.url);
      await usPage.locator('[data-testid="project-row"]').getByRole('button', { name: 'Orchard Vale clinic, US drawings', exact: true }).click();
      await usPage.click('#project-schedule');
      await usPage.click('[data-testid="schedule-settings"] > summary');
      expect(await usPage.inputValue('#schedule-settings-conditionSets-0-airTemperature')).toBe('77');
      expect(await usPage.locator('label[for="schedule-settings-conditionSets-0-airTemperature"]').textContent()).toBe('Air temperature, °F');
      const index = services().schedules.settingsOf(us).services.findIndex((s) => s.service === 'heating flow');
      await usPage.fill(`#schedule-settings-services-${index}-criteria-maxSurfaceTemperature-limit`, '113');
      await usPage.click('#schedule-settings-save');
      await usPage.locator('[data-testid="schedule-settings-saved"]').waitFor();
      expect(services().schedules.settingsOf(us).services[index]!.criteria).toEqual({ maxSurfaceTemperature: { limit: 45 } });
      // Untouched boxes keep every stored digit: the rest is as shipped.
      expect(services().schedules.settingsOf(us).conditionSets).toEqual(services().schedules.settingsOf(services().projects.create({ name: 'Fresh' }).id).conditionSets);
    } finally {
      await usPage.close();
    }
  });
});

describe('the schedule settings in the app', () => {
  it('sizes the imported example schedule, so that no run waits', async () => {
    await page.click('#schedule-size');
    await expect.poll(() => page.locator('[data-testid="schedule-notice"]').textContent(), { timeout: 120_000 }).toMatch(/^Sized \d+ runs?\.$/);
    expect(services().schedules.get(projectId).stale).toEqual([]);
    expect(await staleRows()).toEqual([]);
  });

  it('lowers the heating-flow touch limit to 45 °C and adds a condition set; the heating-flow runs then wait to be sized again', async () => {
    await page.click('[data-testid="schedule-settings"] > summary');
    const index = settings().services.findIndex((s) => s.service === 'heating flow');
    expect(index).toBeGreaterThanOrEqual(0);
    await scrollTo('[data-testid="schedule-settings"]');
    await shot('schedule-settings-open-1366x800.png');
    await scrollTo('#schedule-settings-services-0-service');
    await shot('schedule-settings-services-1366x800.png');
    await page.check(`#schedule-settings-services-${index}-criteria-freezeProtection`);
    await scrollTo(`#schedule-settings-services-${index}-criteria-freezeProtection`);
    await shot('schedule-settings-freezing-1366x800.png');
    await page.uncheck(`#schedule-settings-services-${index}-criteria-freezeProtection`);
    await page.check('#schedule-settings-economics');
    await page.locator('#schedule-settings-economics').evaluate((el) => el.scrollIntoView({ block: 'center' }));
    await shot('schedule-settings-economics-1366x800.png');
    await page.uncheck('#schedule-settings-economics');

    await page.fill(`#schedule-settings-services-${index}-criteria-maxSurfaceTemperature-limit`, '45');
    await page.click('#schedule-settings-add-set');
    const added = settings().conditionSets.length; // the new set's place in the list
    await page.fill(`#schedule-settings-conditionSets-${added}-name`, 'Loading bay');
    await page.selectOption(`#schedule-settings-conditionSets-${added}-exposure`, 'outdoor');
    await page.fill(`#schedule-settings-conditionSets-${added}-airTemperature`, '2');
    await page.fill(`#schedule-settings-conditionSets-${added}-relativeHumidity`, '90');
    await page.fill(`#schedule-settings-conditionSets-${added}-windSpeed`, '4');
    await page.click('#schedule-settings-save');
    await page.locator('[data-testid="schedule-settings-saved"]').waitFor();
    // The sizing's earlier notice ("Sized 14 runs.") no longer stands beside runs that now wait.
    expect(await page.locator('[data-testid="schedule-notice"]').count()).toBe(0);

    const stored = settings();
    expect(stored.services[index]!.criteria).toEqual({ maxSurfaceTemperature: { limit: 45 } });
    expect(stored.conditionSets.at(-1)).toEqual({ name: 'Loading bay', airTemperature: 2, relativeHumidity: 0.9, exposure: 'outdoor', windSpeed: 4 });
    // Only the heating-flow runs' criteria changed, so they alone wait; the grid shows them so.
    expect([...services().schedules.get(projectId).stale].sort()).toEqual(heatingFlow());
    await expect.poll(staleRows).toEqual(heatingFlow());
    const waiting = heatingFlow().length;
    expect(await page.locator('[data-testid="schedule-settings-saved"]').textContent()).toContain(`${waiting} runs wait to be sized again`);
    expect(await page.locator('#schedule-size').textContent()).toContain(`Size ${waiting} unsized runs`);
    await page.locator('#schedule-settings-add-service').evaluate((el) => el.scrollIntoView({ block: 'center' }));
    await shot('schedule-settings-saved-1366x800.png');
  });

  it('refuses a humidity of 150 % beside its box and keeps what was typed; nothing is stored', async () => {
    const before = settings();
    await page.fill('#schedule-settings-conditionSets-0-relativeHumidity', '150');
    await page.click('#schedule-settings-save');
    await expect.poll(() => refusalBeside('schedule-settings-conditionSets-0-relativeHumidity').textContent()).toBe('Relative humidity may not be 150 %: allowed above 0 to 100 %.');
    expect(await page.inputValue('#schedule-settings-conditionSets-0-relativeHumidity')).toBe('150');
    expect(await page.locator('[data-testid="schedule-settings-refusal"]').textContent()).toBe('Nothing was saved: correct the box marked above.');
    expect(settings()).toEqual(before);
    await page.locator('#schedule-settings-conditionSets-0-relativeHumidity').evaluate((el) => el.scrollIntoView({ block: 'center' }));
    await shot('schedule-settings-refused-humidity-1366x800.png');
    // Typing in the box again takes its message away; the others (none here) would stay until the next Save.
    await page.fill('#schedule-settings-conditionSets-0-relativeHumidity', '50');
    expect(await refusalBeside('schedule-settings-conditionSets-0-relativeHumidity').count()).toBe(0);
    expect(await page.locator('[data-testid="schedule-settings-refusal"]').count()).toBe(0);
  });

  it('warns, before a save, of the runs a renamed condition set leaves behind, and Discard brings the stored settings back', async () => {
    await page.fill('#schedule-settings-conditionSets-0-name', 'Boiler house');
    const warning = page.locator('[data-testid="schedule-settings-left-behind"]');
    const plantRoom = services().schedules.get(projectId).runs.filter((r) => r.location === 'Plant room').length;
    await expect.poll(() => warning.locator('p').first().textContent()).toBe(`${plantRoom} runs name the condition set 'Plant room', which this list no longer has.`);
    await warning.evaluate((el) => el.scrollIntoView({ block: 'center' }));
    await shot('schedule-settings-left-behind-1366x800.png');
    await page.click('#schedule-settings-discard');
    expect(await page.inputValue('#schedule-settings-conditionSets-0-name')).toBe('Plant room');
    expect(await warning.count()).toBe(0);
  });

  it('shows the Node side\'s refusal of a repeated name beside the name box', async () => {
    const before = settings();
    const last = before.conditionSets.length - 1;
    await page.fill(`#schedule-settings-conditionSets-${last}-name`, 'plant room');
    await page.click('#schedule-settings-save');
    // The sentence of parseScheduleSettings, in the form's words (app/schedules/schedule-settings.ts).
    await expect.poll(() => refusalBeside(`schedule-settings-conditionSets-${last}-name`).textContent()).toBe(`Condition set ${last + 1} repeats the name 'plant room'; each needs its own.`);
    expect(await page.inputValue(`#schedule-settings-conditionSets-${last}-name`)).toBe('plant room');
    expect(settings()).toEqual(before);
    await page.locator(`#schedule-settings-conditionSets-${last}-name`).evaluate((el) => el.scrollIntoView({ block: 'center' }));
    await shot('schedule-settings-refused-name-1366x800.png');
    expect(problems).toEqual([]);
  });
});
