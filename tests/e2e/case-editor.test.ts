/**
 * The case editor in real Chromium, on the browser-mode server with a real SQLite library in a
 * temporary folder. Cases are made through the services, opened in the project workspace, edited
 * as a person would, and every figure on screen is checked against `solveCase` (the engine the
 * command line's `lamina solve` runs) on the inputs the app stored, read back through the
 * services. The median time from a keystroke to updated figures is printed, not asserted.
 * Screenshots at 1366×800 and 1280×720 go to test-results/. The scenario is invented.
 */
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { UnitSystem } from '../../app/base/unit-systems.js';
import { startBrowserServer, type BrowserServer } from '../../main/server/browser-server.js';
import { resultsFolder, useBrowserSession } from './browser-session.js';
import { caseSaved, engineFigures as storedCaseFigures, keystrokeToFigures, median, openCaseEditor, shownFigures } from './case-editor-page.js';

const session = useBrowserSession('lamina-case-editor-e2e-');
let server: BrowserServer;
const services = () => server.library.library();
const engineFigures = (caseId: number, system: UnitSystem) => storedCaseFigures(services(), caseId, system);
const idOf = (name: string) => {
  const found = services().materials.list({ search: name }).find((m) => m.name === name);
  if (!found) throw new Error(`No seed material "${name}".`);
  return found.id;
};

beforeAll(async () => {
  server = await startBrowserServer({ port: 0, databasePath: path.join(session.tempFolder(), 'lamina.sqlite'), dailyBackups: false });
});
afterAll(async () => {
  await server?.close();
});

const openCase = (projectName: string, caseId: number, viewport?: { width: number; height: number }) => openCaseEditor(session.browser(), server.url, projectName, caseId, viewport);

const saved = caseSaved;
const shot = (page: Page, name: string) => page.screenshot({ path: path.join(resultsFolder, name), fullPage: false });

async function typeInto(page: Page, selector: string, text: string): Promise<void> {
  await page.fill(selector, text);
}

describe('the case editor', () => {
  it('enters a DN100 steel pipe at 150 °C with 50 mm mineral wool indoors, edits it, refuses a bad value, undoes, and shows US units', async () => {
    const steel = idOf('Carbon steel pipe');
    const wool = idOf('Rock wool pipe section, typical curve');
    const project = services().projects.create({ name: 'Heronsgate Brewery boiler house' });
    // A pipe as a new case might start: a small outdoor pipe the user changes into the run they mean.
    const added = services().projects.addCase(project.id, {
      name: 'Steam condensate return',
      inputs: {
        schemaVersion: 1, kind: 'pipe',
        pipe: { outerDiameter: 0.0603, wallThickness: 0.0029, materialId: steel },
        inner: { kind: 'fluid', temperature: 80, coefficient: 1000 },
        layers: [{ materialId: idOf('Glass wool pipe section, typical curve'), thickness: 0.03 }],
        orientation: 'horizontal',
        ambient: { airTemperature: 20, relativeHumidity: 0.6, exposure: { kind: 'outdoor', windSpeed: 3 } },
        length: 25, operatingHours: 8760,
      },
    });
    const { page, problems } = await openCase(project.name, added.id);

    await page.selectOption('#case-pipe-size', 'table');
    await page.selectOption('#case-pipe-size-series', 'steel-iso');
    await page.selectOption('#case-pipe-size-nominal', 'DN100');
    await typeInto(page, '#case-inner-temperature', '150');
    await page.click('#case-layers-0-material');
    await page.fill('#case-layers-0-material-search', 'rock wool typical');
    await page.locator('[data-testid="material-match"][data-name="Rock wool pipe section, typical curve"]').click();
    await typeInto(page, '#case-layers-0-thickness', '50');
    await page.selectOption('#case-ambient-exposure-kind', 'indoor');
    await saved(page);

    const stored = services().projects.getCase(added.id).inputs as Record<string, any>;
    expect(stored['pipe']).toEqual({ materialId: steel, size: { series: 'steel-iso', nominal: 'DN100' } });
    expect(stored['inner']).toEqual({ kind: 'fluid', temperature: 150, coefficient: 1000 });
    expect(stored['layers']).toEqual([{ materialId: wool, thickness: 0.05 }]);
    expect(stored['ambient']['exposure']).toEqual({ kind: 'indoor' });
    const si = engineFigures(added.id, 'SI');
    await expect.poll(() => shownFigures(page)).toEqual(si.figures);
    expect(Object.keys(si.figures)).toContain('Heat loss per metre');
    expect(Object.keys(si.figures)).toContain('Outer surface temperature');
    await page.locator('.case-editor .cross-section, .case-editor svg').first().waitFor();
    await shot(page, 'case-editor-pipe-1366.png');

    // A thickness from the series moves the figures; the times from keystroke to figures are measured.
    await page.selectOption('#case-layers-0-series', String(0.08));
    await saved(page);
    const thicker = engineFigures(added.id, 'SI').figures;
    expect(thicker['Heat loss per metre']).not.toBe(si.figures['Heat loss per metre']);
    await expect.poll(() => shownFigures(page)).toEqual(thicker);
    const times: number[] = [];
    for (const mm of ['60', '70', '80', '90', '100', '110', '120', '100', '80', '60', '50']) times.push(await keystrokeToFigures(page, '#case-layers-0-thickness', mm));
    console.log(`case editor, pipe: median keystroke-to-figures ${median(times).toFixed(1)} ms over ${times.length} edits`);
    await saved(page);
    // Leaving the box ends its undo step (so does a pause of a second).
    await page.locator('#case-layers-0-thickness').blur();
    const good = await shownFigures(page);

    // A bad value: the engine's sentence beside the box, the results marked out of date, the last good ones kept, nothing saved.
    const before = services().projects.getCase(added.id).inputs;
    await typeInto(page, '#case-layers-0-thickness', '5000');
    const sentence = page.locator('#case-layers-0-thickness-error');
    // In the box's unit (mm, as its hint "Allowed 0.001 to 2000 mm") and by the box's name, not the case-file path.
    await expect.poll(() => sentence.textContent()).toBe('Thickness of layer 1 must be at least 0.001 and at most 2000 mm (got 5000 mm).');
    await expect.poll(() => page.locator('.case-report .stale-label').textContent()).toBe('Out of date');
    expect(await shownFigures(page)).toEqual(good);
    await page.waitForTimeout(600);
    expect(services().projects.getCase(added.id).inputs).toEqual(before);
    await shot(page, 'case-editor-pipe-bad-value-1366.png');

    // Undo puts the last good value back and the results are current again.
    await page.keyboard.press('Control+z');
    await expect.poll(() => page.inputValue('#case-layers-0-thickness')).toBe('50');
    await expect.poll(() => page.locator('.case-report.stale').count()).toBe(0);
    await expect.poll(() => page.locator('#case-layers-0-thickness-error').count()).toBe(0);
    await page.click('#case-redo');
    await expect.poll(() => page.inputValue('#case-layers-0-thickness')).toBe('5000');
    await page.click('#case-undo');
    await expect.poll(() => page.locator('.case-report.stale').count()).toBe(0);

    // US units: every figure is the engine's SI value converted.
    await page.selectOption('#project-unitSystem', 'IP');
    const ip = engineFigures(added.id, 'IP').figures;
    await expect.poll(() => shownFigures(page)).toEqual(ip);
    expect(ip['Heat loss per foot']).toMatch(/Btu\/\(h·ft\)$/);
    // The sentences are solved again in the project's units: the condensation margin is a difference in °F, not in K.
    await expect.poll(async () => (await page.textContent('.case-report')) ?? '').toMatch(/°F above the dew point/);
    expect(await page.textContent('.case-report')).not.toMatch(/\d K (above|below) the dew point/);
    expect(ip['Outer surface temperature']).toMatch(/°F$/);
    expect(await page.textContent('label[for="case-inner-temperature"]')).toContain('°F');
    expect(await page.inputValue('#case-inner-temperature')).toBe('302');
    await shot(page, 'case-editor-pipe-us-1366.png');
    await page.setViewportSize({ width: 1280, height: 720 });
    await shot(page, 'case-editor-pipe-us-1280.png');
    expect(await page.evaluate(() => document.documentElement.scrollWidth <= document.documentElement.clientWidth)).toBe(true);
    expect(await page.textContent('body')).not.toMatch(/NaN|undefined|\[object/);
    expect(problems).toEqual([]);
    await page.close();
  });

  it('builds a wall of five library layers, shows the engine U-value and verdicts, and reorders layers by keyboard', async () => {
    const names = ['Gypsum plasterboard 900', 'Vapour control layer, polyethylene film', 'Mineral wool board', 'Oriented strand board (OSB) 650', 'Clay brick masonry 1700'];
    const project = services().projects.create({ name: 'Heronsgate Brewery offices' });
    const added = services().projects.addCase(project.id, {
      name: 'Office wall',
      inputs: {
        schemaVersion: 1, kind: 'wall', heatFlowDirection: 'horizontal',
        inside: { temperature: 20, relativeHumidity: 0.5 }, outside: { temperature: -5, relativeHumidity: 0.85 },
        area: 30, layers: [{ materialId: idOf(names[0]!), thickness: 0.0125 }],
        moisture: { insideHumidity: { kind: 'class', humidityClass: 3 } },
      },
    });
    const { page, problems } = await openCase(project.name, added.id, { width: 1280, height: 720 });
    const thicknesses = ['12.5', '0.2', '140', '12', '102.5'];
    for (let i = 1; i < names.length; i++) {
      await page.getByRole('button', { name: 'Add a layer' }).click();
      await page.click(`#case-layers-${i}-material`);
      await page.fill(`#case-layers-${i}-material-search`, names[i]!);
      await page.locator(`[data-testid="material-match"][data-name="${names[i]}"]`).click();
      await typeInto(page, `#case-layers-${i}-thickness`, thicknesses[i]!);
    }
    await page.selectOption('#case-moisture-climate', 'demo-cold-inland');
    await saved(page);
    const stored = services().projects.getCase(added.id).inputs as Record<string, any>;
    expect(stored['layers'].map((l: { materialId: number }) => l.materialId)).toEqual(names.map(idOf));
    expect(stored['moisture']['climate']).toBe('demo-cold-inland');

    const engine = engineFigures(added.id, 'SI');
    await expect.poll(() => shownFigures(page)).toEqual(engine.figures);
    expect(Object.keys(engine.figures)).toContain('U-value');
    const verdicts = await page.locator('.case-editor .case-report').getAttribute('data-kind');
    expect(verdicts).toBe('wall');
    const shownChecks = await page.locator('.case-editor li[data-check]').evaluateAll((els) => els.map((e) => [e.getAttribute('data-check'), Array.from(e.classList as unknown as ArrayLike<string>).find((c) => c !== 'verdict')]));
    expect(shownChecks).toEqual(engine.report.verdicts.map((v) => [v.check, v.verdict]));
    expect(engine.report.verdicts.map((v) => v.check)).toEqual(expect.arrayContaining([expect.stringMatching(/mould/), expect.stringMatching(/monthly|interstitial|condensation/)]));
    await shot(page, 'case-editor-wall-1280.png');

    // Alt+ArrowUp on the fourth layer moves it to third place, focus following it.
    await page.focus('[data-layer-index="3"] .handle');
    await page.keyboard.press('Alt+ArrowUp');
    await expect.poll(() => page.evaluate(() => document.activeElement?.closest('[data-layer-index]')?.getAttribute('data-layer-index'))).toBe('2');
    await page.keyboard.press('Alt+ArrowDown');
    await page.keyboard.press('Alt+ArrowDown');
    await saved(page);
    const order = (services().projects.getCase(added.id).inputs as Record<string, any>)['layers'].map((l: { materialId: number }) => l.materialId);
    expect(order).toEqual([names[0], names[1], names[2], names[4], names[3]].map((n) => idOf(n!)));
    await expect.poll(() => shownFigures(page)).toEqual(engineFigures(added.id, 'SI').figures);
    await page.setViewportSize({ width: 1366, height: 800 });
    await shot(page, 'case-editor-wall-1366.png');
    expect(await page.evaluate(() => document.documentElement.scrollWidth <= document.documentElement.clientWidth)).toBe(true);
    expect(problems).toEqual([]);
    await page.close();
  });
});
