/**
 * Browser mode end to end: the built renderer served by startBrowserServer on 127.0.0.1, driven in
 * real Chromium. The wall form must show the heat flow of a layered wall as the series-resistance
 * formula gives it, refuse bad input in one sentence, and run under the strict CSP.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Browser, Page } from 'playwright-core';
import { startBrowserServer, type BrowserServer } from '../../main/server/browser-server.js';
import { ensureRendererBuilt } from '../../main/server/renderer-build.js';
import { CONTENT_SECURITY_POLICY } from '../../main/server/security-policy.js';
import { launchChromium } from './chromium.js';

const projectRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const resultsFolder = path.join(projectRoot, 'test-results');

let server: BrowserServer;
let browser: Browser;
let databaseFolder: string;

beforeAll(async () => {
  await ensureRendererBuilt(projectRoot);
  databaseFolder = mkdtempSync(path.join(tmpdir(), 'lamina-browser-mode-'));
  server = await startBrowserServer({ port: 0, databasePath: path.join(databaseFolder, 'lamina.sqlite'), dailyBackups: false });
  browser = await launchChromium();
  mkdirSync(resultsFolder, { recursive: true });
});

afterAll(async () => {
  await browser?.close();
  await server?.close();
  rmSync(databaseFolder, { recursive: true, force: true });
});

/** A fresh page that records console errors and failed requests (a CSP refusal shows up as both). */
async function openLamina(): Promise<{ page: Page; problems: string[] }> {
  const page = await browser.newPage({ viewport: { width: 1100, height: 820 } });
  const problems: string[] = [];
  page.on('console', (message) => {
    if (message.type() === 'error' || message.type() === 'warning') problems.push(`${message.type()}: ${message.text()}`);
  });
  page.on('pageerror', (error) => problems.push(`page error: ${error.message}`));
  page.on('requestfailed', (request) => problems.push(`request failed: ${request.url()}`));
  const response = await page.goto(server.url);
  expect(response?.status()).toBe(200);
  expect(response?.headers()['content-security-policy']).toBe(CONTENT_SECURITY_POLICY);
  return { page, problems };
}

async function setWall(page: Page, inside: string, outside: string, layers: readonly [string, string][]): Promise<void> {
  await page.fill('#inside', inside);
  await page.fill('#outside', outside);
  for (const [i, [thickness, conductivity]] of layers.entries()) {
    await page.fill(`#layer-${i + 1}-thickness`, thickness);
    await page.fill(`#layer-${i + 1}-conductivity`, conductivity);
  }
}

/** The number as the page writes it: "−12.5" with a true minus sign. */
function shownNumber(text: string): { value: number; halfStep: number } {
  const cleaned = text.trim().replace('−', '-');
  const decimals = cleaned.includes('.') ? cleaned.split('.')[1]!.length : 0;
  return { value: Number(cleaned), halfStep: 0.5 * 10 ** -decimals };
}

describe('browser mode', () => {
  it('listens on 127.0.0.1 only', () => {
    expect(server.host).toBe('127.0.0.1');
    expect(server.url).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/\?k=[A-Za-z0-9_-]{43}$/);
  });

  it('shows the heat flow and interface temperatures of a three-layer wall as series resistance gives them', async () => {
    const { page, problems } = await openLamina();
    await expect.poll(() => page.textContent('[data-testid="app-identity"]')).toMatch(/^Lamina \d+\.\d+\.\d+ · browser mode$/);

    await setWall(page, '21', '-7', [
      ['190', '0.84'],
      ['120', '0.037'],
      ['15', '0.21'],
    ]);

    // Textbook series resistance of a plane composite wall with known surface temperatures
    // (Incropera, Fundamentals of Heat and Mass Transfer, ch. 3, the composite plane wall):
    // q = (T_in − T_out) / Σ(d_i / λ_i); the temperature drops by q·d_i/λ_i across each layer.
    const resistances = [0.19 / 0.84, 0.12 / 0.037, 0.015 / 0.21];
    const total = resistances.reduce((a, b) => a + b, 0);
    const q = (21 - -7) / total;
    const interfaces = [21 - q * resistances[0]!, 21 - q * (resistances[0]! + resistances[1]!)];

    const flux = page.locator('[data-testid="heat-flux"]');
    await expect.poll(async () => Number(await flux.getAttribute('data-value'))).toBeCloseTo(q, 9);
    const shown = shownNumber((await flux.textContent()) ?? '');
    expect(Math.abs(shown.value - q)).toBeLessThanOrEqual(shown.halfStep);
    expect(await page.textContent('.headline')).toContain('inside → outside');

    const interfaceCells = page.locator('[data-testid="interface-temperature"]');
    expect(await interfaceCells.count()).toBe(2);
    for (const [i, expected] of interfaces.entries()) {
      expect(Number(await interfaceCells.nth(i).getAttribute('data-value'))).toBeCloseTo(expected, 9);
      const text = shownNumber(((await interfaceCells.nth(i).textContent()) ?? '').replace('°C', ''));
      expect(Math.abs(text.value - expected)).toBeLessThanOrEqual(text.halfStep);
    }

    // The energy balance closes to round-off for a linear problem: far below 1e-9 of the flow.
    const residual = Number(await page.getAttribute('[data-testid="balance-residual"]', 'data-value'));
    expect(Math.abs(residual)).toBeLessThan(1e-9 * q);

    expect(await page.textContent('body')).not.toMatch(/NaN|undefined|Infinity/);
    await page.screenshot({ path: path.join(resultsFolder, 'browser-mode.png'), fullPage: true });
    expect(problems).toEqual([]);
    await page.close();
  });

  it('gives one sentence naming the field and its range for bad input, and no NaN', async () => {
    const { page, problems } = await openLamina();
    await page.fill('#layer-2-thickness', '12 cm');
    const errors = page.locator('[data-testid="field-error"]');
    await expect.poll(() => errors.count()).toBe(1);
    expect(await errors.first().textContent()).toBe('Layer 2 thickness must be a number from 0.1 to 1000 mm.');
    expect(await page.getAttribute('#layer-2-thickness', 'aria-invalid')).toBe('true');
    expect(await page.locator('[data-testid="heat-flux"]').count()).toBe(0);

    await page.fill('#layer-2-thickness', '100');
    await page.fill('#outside', '-300');
    await expect.poll(() => errors.first().textContent()).toBe(
      'Outside surface temperature must be a number from -273.15 to 1000 °C.',
    );
    expect(await page.textContent('body')).not.toMatch(/NaN|undefined|Infinity/);
    await page.screenshot({ path: path.join(resultsFolder, 'browser-mode-invalid.png'), fullPage: true });
    expect(problems).toEqual([]);
    await page.close();
  });

  it('solves a single layer after layers are removed, and reverses the flow when outside is warmer', async () => {
    const { page, problems } = await openLamina();
    await page.click('button[aria-label="Remove layer 3"]');
    await page.click('button[aria-label="Remove layer 2"]');
    expect(await page.locator('button[aria-label="Remove layer 1"]').isDisabled()).toBe(true);
    await setWall(page, '5', '35', [['240', '0.6']]);
    // One layer: q = λ·ΔT/d (Fourier's law for a plane wall, same source as above).
    const q = (0.6 * (5 - 35)) / 0.24;
    const flux = page.locator('[data-testid="heat-flux"]');
    await expect.poll(async () => Number(await flux.getAttribute('data-value'))).toBeCloseTo(q, 9);
    expect(await page.textContent('.headline')).toContain('outside → inside');
    expect(await page.locator('[data-testid="interface-temperature"]').count()).toBe(0);
    expect(problems).toEqual([]);
    await page.close();
  });
});
