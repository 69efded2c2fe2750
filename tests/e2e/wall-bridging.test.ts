/**
 * A wall's bridged layer and its target U-value in the case editor, in real Chromium on the
 * browser-mode server with a real SQLite library in a temporary folder. Timber studs are added to
 * the insulation layer as a person would add them (the layer's "bridged by…" opened, a section of
 * timber added, its share of the face typed); the U-value on screen changes and equals `solveCase`
 * (the engine `lamina solve` runs) on the inputs the app stored. A target U switched on shows the
 * U across the series and the thickness found, which "use this thickness" puts into the layer.
 * Screenshots go to test-results/. The scenario (Fernhollow Joinery workshop) is invented.
 */
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { WallAnalysis } from '../../app/cases/wall/wall-analysis.js';
import { solveCase } from '../../app/index.js';
import { caseContext } from '../../main/cases/case-context.js';
import { startBrowserServer, type BrowserServer } from '../../main/server/browser-server.js';
import { projectRoot, resultsFolder, useBrowserSession } from './browser-session.js';
import { caseSaved, clippedChoices, engineFigures, openCaseEditor, shownFigures } from './case-editor-page.js';

const session = useBrowserSession('lamina-wall-bridging-e2e-');
let server: BrowserServer;
const services = () => server.library.library();
const idOf = (name: string) => {
  const found = services().materials.list({ search: name }).find((m) => m.name === name);
  if (!found) throw new Error(`No seed material "${name}".`);
  return found.id;
};
const stored = (caseId: number) => services().projects.getCase(caseId).inputs as Record<string, any>;
const analysis = (caseId: number) => solveCase(stored(caseId), caseContext(services().materials)).result as WallAnalysis;

beforeAll(async () => {
  server = await startBrowserServer({ port: 0, databasePath: path.join(session.tempFolder(), 'lamina.sqlite'), dailyBackups: false });
});
afterAll(async () => {
  await server?.close();
});

/** A workshop's framed wall (invented): plasterboard, 140 mm mineral wool, OSB sheathing. */
function addWall(projectName: string): { projectName: string; caseId: number } {
  const project = services().projects.create({ name: projectName });
  const added = services().projects.addCase(project.id, {
    name: 'Workshop wall, north side',
    inputs: {
      schemaVersion: 1, kind: 'wall', heatFlowDirection: 'horizontal',
      inside: { temperature: 18, relativeHumidity: 0.5 },
      outside: { temperature: -5, relativeHumidity: 0.85 },
      layers: [
        { materialId: idOf('Gypsum plasterboard 700'), thickness: 0.0125 },
        { materialId: idOf('Mineral wool board'), thickness: 0.14 },
        { materialId: idOf('Oriented strand board (OSB) 650'), thickness: 0.012 },
      ],
    },
  });
  return { projectName: project.name, caseId: added.id };
}

const openCase = (projectName: string, caseId: number) => openCaseEditor(session.browser(), server.url, projectName, caseId);

const saved = caseSaved;
const layer = (page: Page, i: number) => page.locator(`[data-layer-index="${i}"]`);

describe('a wall’s bridged layer and target U-value', () => {
  it('adds timber studs to the insulation layer: the U-value rises and equals the engine’s on the stored case', async () => {
    const { projectName, caseId } = addWall('Fernhollow Joinery workshop');
    const { page, problems } = await openCase(projectName, caseId);
    const before = (await shownFigures(page))['U-value'];
    await expect.poll(() => shownFigures(page)).toEqual(engineFigures(services(), caseId, 'SI').figures);

    const insulation = layer(page, 1);
    await insulation.locator('[data-testid="layer-bridging"] summary').click();
    await insulation.getByRole('button', { name: 'Add a bridging section' }).click();
    // 38 mm studs at 600 mm centres take 38/600 = 0.0633 of the face (common practice, no source).
    await page.fill('#case-layers-1-bridges-0-fraction', '0.0633');
    await saved(page);

    expect(stored(caseId)['layers'][1]['bridges']).toEqual([{ materialId: idOf('Timber 450'), fraction: 0.0633 }]);
    const engine = engineFigures(services(), caseId, 'SI').figures;
    await expect.poll(() => shownFigures(page)).toEqual(engine);
    expect(engine['U-value']).not.toBe(before);
    // Timber conducts better than mineral wool: the bridged wall loses more heat.
    const wall = analysis(caseId).wall;
    expect(wall.combinedMethod).not.toBeNull();
    expect(Number.parseFloat(engine['U-value']!)).toBeGreaterThan(Number.parseFloat(before!));
    expect(await insulation.locator('[data-testid="layer-bridging"] summary').textContent()).toContain('1 section over 0.0633 of the face');
    expect(await clippedChoices(page, '[data-layer-index="1"]')).toEqual([]);
    await insulation.screenshot({ path: path.join(resultsFolder, 'wall-bridging-studs.png') });

    // A fraction of the whole face is refused beside its own box, in the form's words.
    await page.fill('#case-layers-1-bridges-0-fraction', '1');
    await expect.poll(() => insulation.locator('#case-layers-1-bridges-0-fraction-error').textContent()).toMatch(/^Area fraction of section 1 in layer 2 must be/);
    await insulation.screenshot({ path: path.join(resultsFolder, 'wall-bridging-refused.png') });
    expect(problems).toEqual([]);
    await page.close();
  });

  it('adds air gaps and steel fixings to the insulation layer; in US units every figure is still the engine’s', async () => {
    const { projectName, caseId } = addWall('Fernhollow Joinery office');
    const { page, problems } = await openCase(projectName, caseId);
    const insulation = layer(page, 1);
    await insulation.locator('[data-testid="layer-bridging"] summary').click();
    await page.selectOption('#case-layers-1-airGapLevel', '1');
    await insulation.getByRole('button', { name: 'Add fixings' }).click();
    await saved(page);
    const stored1 = stored(caseId)['layers'][1];
    expect(stored1['airGapLevel']).toBe(1);
    expect(stored1['fasteners']).toEqual({ conductivity: 50, perSquareMetre: 6, crossSectionArea: Math.PI * 0.0025 ** 2 });
    const si = engineFigures(services(), caseId, 'SI').figures;
    await expect.poll(() => shownFigures(page)).toEqual(si);
    expect(Object.keys(si).some((label) => label.startsWith('U-value with corrections'))).toBe(true);

    await page.selectOption('#project-unitSystem', 'IP');
    await expect.poll(() => shownFigures(page)).toEqual(engineFigures(services(), caseId, 'IP').figures);
    // The shank read back from its cross-section, in inches: 5 mm is 0.19685 in (1 in = 25.4 mm exactly, NIST SP 811).
    expect(await insulation.locator('[data-testid="shank"]').textContent()).toContain('0.19685 in');
    expect(await clippedChoices(page, '[data-layer-index="1"]')).toEqual([]);
    await insulation.screenshot({ path: path.join(resultsFolder, 'wall-bridging-gaps-fixings-us.png') });
    expect(problems).toEqual([]);
    await page.close();
  });

  it('finds the thickness for a target U-value and puts it into the layer', async () => {
    const { projectName, caseId } = addWall('Fernhollow Joinery store');
    const { page, problems } = await openCase(projectName, caseId);
    const panel = page.locator('#case-section-target-u');
    await page.check('#case-targetU-on');
    await page.fill('#case-targetU-value', '0.18');
    await saved(page);

    expect(stored(caseId)['targetU']).toEqual({ layer: 'Mineral wool board', thicknesses: { from: 0.02, to: 0.3, step: 0.02 }, value: 0.18 });
    const target = analysis(caseId).targetU!;
    expect(target.chosen).not.toBeNull();
    const chosen = target.chosen!.thickness;
    // One row per thickness tried, in mm to 0.1 mm as the report writes them.
    const table = panel.locator('table.report-table').first();
    expect(await table.locator('caption').textContent()).toBe('U-value across the thickness series');
    await expect.poll(() => table.locator('tbody tr').count()).toBe(target.rows.length);
    const firstColumn = await table.locator('tbody tr td:first-child, tbody tr th:first-child').allTextContents();
    expect(firstColumn.map((t) => Number(t.trim()) / 1000)).toEqual(target.rows.map((r) => r.thickness));
    expect(await panel.locator('[data-testid="target-u-choice"]').textContent()).toContain(`${(chosen * 1000).toFixed(1)} mm`);
    expect((await panel.locator('[data-testid="target-u-chosen-row"]').locator('th, td').first().textContent())?.trim()).toBe((chosen * 1000).toFixed(1));
    await panel.locator('figure.report-chart canvas').waitFor();
    expect(await clippedChoices(page, '#case-section-target-u')).toEqual([]);
    await panel.screenshot({ path: path.join(resultsFolder, 'wall-target-u.png') });

    await page.click('#case-targetU-use');
    await expect.poll(() => page.inputValue('#case-layers-1-thickness')).toBe(String(Math.round(chosen * 1e7) / 1e4));
    await saved(page);
    expect(stored(caseId)['layers'][1]['thickness']).toBe(chosen);
    expect(analysis(caseId).wall.correctedUValue).toBeLessThanOrEqual(0.18);
    await expect.poll(() => page.locator('#case-targetU-use').isDisabled()).toBe(true);
    await panel.screenshot({ path: path.join(resultsFolder, 'wall-target-u-used.png') });
    expect(problems).toEqual([]);
    await page.close();
  });

  it('opens the timber-frame example as written: its studs of a material in the file, its listed series and the thickness it finds', async () => {
    const example = JSON.parse(fs.readFileSync(path.join(projectRoot, 'data', 'examples', 'wall-timber-frame-vcl.json'), 'utf8')) as Record<string, unknown>;
    delete example['$schema'];
    const project = services().projects.create({ name: 'Orrin Valley staff housing' });
    const { id: caseId } = services().projects.addCase(project.id, { name: 'Staff housing wall', inputs: example as never });
    const { page, problems } = await openCase(project.name, caseId);
    await expect.poll(() => shownFigures(page)).toEqual(engineFigures(services(), caseId, 'SI').figures);
    const studs = layer(page, 2);
    expect(await studs.locator('[data-testid="layer-bridging"] summary').textContent()).toContain('1 section over 0.0633 of the face');
    await studs.locator('[data-testid="layer-bridging"] summary').click();
    expect(await page.inputValue('#case-layers-2-bridges-0-fraction')).toBe('0.0633');
    expect(await studs.locator('[data-testid="bridge"]').textContent()).toContain('softwood timber, 500 kg/m³ (in this case file)');

    const panel = page.locator('#case-section-target-u');
    expect(await page.isChecked('#case-targetU-on')).toBe(true);
    expect(await page.inputValue('#case-targetU-thicknesses')).toBe('list');
    expect(await page.inputValue('#case-targetU-layer')).toBe('2');
    const chosen = analysis(caseId).targetU!.chosen!.thickness;
    await expect.poll(() => panel.locator('#case-targetU-use').textContent()).toBe(`Use this thickness: ${chosen * 1000} mm`);
    await page.screenshot({ path: path.join(resultsFolder, 'wall-bridging-example.png'), fullPage: true });
    expect(problems).toEqual([]);
    await page.close();
  });
});
