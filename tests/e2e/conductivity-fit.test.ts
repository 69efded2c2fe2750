/**
 * The material editor's conductivity fit in real Chromium, on the browser-mode server with a real
 * SQLite file in a temporary folder: a built-in insulation duplicated, five data-sheet points pasted
 * in, a quadratic fitted and compared with the curve the points came from, the curve used and
 * saved, and fits the service refuses shown as its one sentence. Screenshots go to test-results/.
 */
import { describe, expect, it } from 'vitest';
import path from 'node:path';
import { Matrix, pseudoInverse } from 'ml-matrix';
import type { Page } from 'playwright-core';
import { startBrowserServer } from '../../main/server/browser-server.js';
import { resultsFolder, useBrowserSession } from './browser-session.js';

const session = useBrowserSession('lamina-fit-e2e-');

/**
 * Illustrative rock-wool pipe-section curve, common practice, no source (the shape data sheets
 * publish): λ = 0.0337 + 1.1e-4·θ + 1.7e-7·θ², θ in °C. The five points are derived from it and
 * rounded to 3 significant figures: 0.034817, 0.039625, 0.0464, 0.0625, 0.0820.
 */
const CURVE = [0.0337, 1.1e-4, 1.7e-7] as const;
const POINTS: readonly (readonly [number, number])[] = [[10, 0.0348], [50, 0.0396], [100, 0.0464], [200, 0.0625], [300, 0.082]];
/** Half a unit in the third significant figure: every value lies between 0.01 and 0.1, so 0.5e-4. */
const POINT_ROUNDING = 0.5e-4;

/**
 * How far the least-squares coefficients can move when each point is off by up to POINT_ROUNDING:
 * the fit is linear in the data, c = V⁺·λ, so |Δc_j| ≤ Σ_i |V⁺_ji|·POINT_ROUNDING, with V the
 * Vandermonde matrix of the five temperatures and V⁺ its pseudo-inverse (from ml-matrix, a
 * reference library). This is the worst case of the rounding, not a tuned tolerance.
 */
function roundingBounds(): number[] {
  const pinv = pseudoInverse(new Matrix(POINTS.map(([t]) => [1, t, t * t])));
  return [0, 1, 2].map((j) => POINTS.reduce((sum, _, i) => sum + Math.abs(pinv.get(j, i)), 0) * POINT_ROUNDING);
}

/** A number as the page writes it: "0.033676", "1.1021 × 10⁻⁴", "−4.8 × 10⁻⁶". */
function readShownNumber(text: string): number {
  const superscripts = '⁰¹²³⁴⁵⁶⁷⁸⁹';
  const plain = text
    .trim()
    .replace(/−/g, '-')
    .replace(/⁻/g, '-')
    .replace(/[⁰¹²³⁴⁵⁶⁷⁸⁹]/g, (d) => String(superscripts.indexOf(d)))
    .replace(/\s*×\s*10(-?\d+)$/, 'e$1');
  const value = Number(plain);
  if (!Number.isFinite(value)) throw new Error(`"${text}" is not a number as the page writes them`);
  return value;
}

/** Half a unit in the last digit the page shows for a coefficient (5 significant figures). */
const displayRounding = (value: number): number => 0.5 * 10 ** (Math.floor(Math.log10(Math.abs(value))) - 4);

async function paste(page: Page, selector: string, text: string): Promise<void> {
  await page.locator(selector).evaluate((input, pasted) => {
    const data = new DataTransfer();
    data.setData('text/plain', pasted);
    input.dispatchEvent(new ClipboardEvent('paste', { clipboardData: data, bubbles: true, cancelable: true }));
  }, text);
}

async function expectCleanText(page: Page): Promise<void> {
  expect(await page.textContent('body')).not.toMatch(/NaN|undefined|Infinity|\[object/);
}

const cellValues = (page: Page) =>
  page.locator('[data-testid="fit-point-row"]').evaluateAll((rows) =>
    rows.map((row) => Array.from(row.querySelectorAll('input')).map((input) => input.value)),
  );

describe('conductivity fit in the material editor', () => {
  it('fits a quadratic to five data-sheet points, uses and saves it, and shows a refused fit as one sentence', async () => {
    const server = await startBrowserServer({ port: 0, databasePath: path.join(session.tempFolder(), 'lamina.sqlite'), dailyBackups: false });
    try {
      const page = await session.browser().newPage({ viewport: { width: 1100, height: 900 } });
      const problems: string[] = [];
      page.on('console', (message) => {
        if (message.type() === 'error' || message.type() === 'warning') problems.push(`${message.type()}: ${message.text()}`);
      });
      page.on('pageerror', (error) => problems.push(`page error: ${error.message}`));
      await page.goto(server.url);
      await page.click('#view-materials');

      // Duplicate a built-in insulation: its copy opens in the editor, with the fit panel.
      await page.fill('#material-search', 'Rock wool pipe section, typical');
      const builtIn = page.locator('[data-testid="material-row"][data-name="Rock wool pipe section, typical curve"]');
      await expect.poll(() => builtIn.count()).toBe(1);
      await builtIn.getByRole('button', { name: 'Duplicate to edit' }).click();
      await expect.poll(() => page.inputValue('#material-name')).toBe('Rock wool pipe section, typical curve (copy)');
      await page.fill('#material-name', 'Harrowgate rock wool, site data sheet');
      await page.click('#fit-panel > summary');
      // The rows start from the material's own table of points (the built-in's 0.035 … 0.082).
      expect(await cellValues(page)).toEqual([['10', '0.035'], ['50', '0.04'], ['100', '0.046'], ['200', '0.062'], ['300', '0.082']]);
      expect(await page.innerText('#fit-range')).toContain('Service range 0 to 300 °C, taken from the lowest and highest service temperature');

      // Five lines pasted as a spreadsheet copies them (tab between the columns) fill the table.
      await paste(page, '#fit-temperature-0', POINTS.map(([t, k]) => `${t}\t${k.toFixed(4)}`).join('\n') + '\n');
      expect(await cellValues(page)).toEqual(POINTS.map(([t, k]) => [String(t), k.toFixed(4)]));
      await page.selectOption('#fit-degree', '2');
      await page.click('#fit-run');
      await expect.poll(() => page.locator('#fit-equation').count()).toBe(1);

      // The coefficients shown are the generating curve's, within the worst case of the rounding of the
      // points (see roundingBounds) plus half a unit in the last digit shown.
      const terms = page.locator('[data-testid="fit-term"]');
      expect(await terms.count()).toBe(3);
      const bounds = roundingBounds();
      const shown: number[] = [];
      for (let j = 0; j < 3; j++) {
        const sign = (await terms.nth(j).locator('.sign').textContent())!.trim();
        const magnitude = readShownNumber((await terms.nth(j).locator('.coefficient').textContent())!);
        shown.push(sign === '−' ? -magnitude : magnitude);
        expect(Math.abs(shown[j]! - CURVE[j]!)).toBeLessThanOrEqual(bounds[j]! + displayRounding(shown[j]!));
      }
      expect((await page.innerText('#fit-equation')).trim()).toMatch(/^λ = \S+ \+ .+·θ \+ .+·θ²$/);
      // A least-squares fit is no worse than the curve the points came from, whose misfit is the rounding alone.
      expect(readShownNumber((await page.textContent('#fit-rms'))!.replace(' W/(m·K)', ''))).toBeLessThan(POINT_ROUNDING);
      expect(readShownNumber((await page.textContent('#fit-max'))!.replace(' W/(m·K)', ''))).toBeLessThan(POINT_ROUNDING);
      expect(await page.locator('[data-testid="fit-residual-row"]').count()).toBe(5);
      expect(await page.locator('.points-curve-chart canvas').count()).toBe(1);
      await expectCleanText(page);
      await page.locator('#fit-panel').screenshot({ path: path.join(resultsFolder, 'conductivity-fit-quadratic.png') });
      await page.screenshot({ path: path.join(resultsFolder, 'conductivity-fit-editor.png'), fullPage: true });

      // Use the curve: it becomes the material's conductivity, and is saved the usual way.
      await page.click('#fit-use');
      expect(await page.inputValue('#material-conductivity-kind')).toBe('polynomial');
      expect((await page.inputValue('#material-coefficients')).split(' ').map(Number)).toEqual(shown);
      expect(await page.innerText('#fit-used')).toContain('Save the material to keep it.');
      await page.click('#material-save');
      await expect.poll(() => page.textContent('[data-testid="materials-notice"]')).toContain('Saved "Harrowgate rock wool, site data sheet".');
      const saved = server.library.library().materials.findByName('Harrowgate rock wool, site data sheet');
      expect(saved?.conductivity).toEqual({ kind: 'polynomial', coefficients: shown });
      expect(saved?.builtIn).toBe(false);
      await page.fill('#material-search', 'Harrowgate rock wool');
      const ownRow = page.locator('[data-testid="material-row"][data-name="Harrowgate rock wool, site data sheet"]');
      await expect.poll(() => ownRow.count()).toBe(1);
      const listed = /curve, (0\.\d+) at 0 °C/.exec((await ownRow.textContent()) ?? '');
      expect(listed).not.toBeNull();
      // The list writes 4 significant figures: half a unit of those on top of the rounding bound.
      expect(Math.abs(Number(listed![1]) - CURVE[0])).toBeLessThanOrEqual(bounds[0]! + 0.5e-5);
      await expectCleanText(page);
      await page.screenshot({ path: path.join(resultsFolder, 'conductivity-fit-saved.png'), fullPage: true });

      // Refused fits show the one sentence and no curve. First a bad number, caught in the page.
      await ownRow.getByRole('button', { name: 'Edit' }).click();
      await page.click('#fit-panel > summary');
      expect(await cellValues(page)).toEqual([['', ''], ['', ''], ['', '']]);
      await paste(page, '#fit-temperature-0', '10; 0,0348\n100; 0,0464\n200; abc');
      expect(await cellValues(page)).toEqual([['10', '0,0348'], ['100', '0,0464'], ['200', 'abc']]);
      await page.click('#fit-run');
      await expect.poll(() => page.innerText('#fit-refusal')).toBe('Point 3 conductivity must be a number more than 0 and at most 1000 W/(m·K).');
      expect(await page.getAttribute('#fit-conductivity-2', 'aria-invalid')).toBe('true');
      await page.locator('#fit-panel').screenshot({ path: path.join(resultsFolder, 'conductivity-fit-bad-number.png') });

      // Three points cannot fix a cubic: the service's sentence (the page capitalises its first letter).
      await page.fill('#fit-conductivity-2', '0,0625');
      await page.selectOption('#fit-degree', '3');
      await page.click('#fit-run');
      await expect.poll(() => page.innerText('#fit-refusal')).toBe('Points must include at least 4 different temperatures for a degree-3 fit (got 3).');
      expect(await page.locator('#fit-equation').count()).toBe(0);
      expect(await page.locator('#fit-use').count()).toBe(0);

      // A straight line through falling points goes below zero inside the service range (0 to 300 °C).
      await paste(page, '#fit-temperature-0', '10\t0.05\n100\t0.03\n200\t0.01');
      await page.selectOption('#fit-degree', '1');
      await page.click('#fit-run');
      await expect.poll(() => page.innerText('#fit-refusal')).toBe(
        'Conductivity must stay above 0 W/(m·K) from 0 to 300 °C, but the polynomial reaches -0.0114 W/(m·K) at 300.0 °C.',
      );
      expect(await page.locator('#fit-equation').count()).toBe(0);
      await expectCleanText(page);
      await page.locator('#fit-panel').screenshot({ path: path.join(resultsFolder, 'conductivity-fit-refused.png') });

      // Nothing refused reached the saved material.
      expect(server.library.library().materials.findByName('Harrowgate rock wool, site data sheet')?.conductivity).toEqual(saved?.conductivity);
      // The only console lines are Chromium logging the two refused fits' HTTP 400, which the page showed.
      expect(problems).toEqual(Array(2).fill('error: Failed to load resource: the server responded with a status of 400 (Bad Request)'));
      await page.close();
    } finally {
      await server.close();
    }
  });
});
