/**
 * Browser mode end to end: the built renderer served by startBrowserServer on 127.0.0.1, driven in
 * real Chromium: the page runs under the strict CSP and opens on the projects list.
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

describe('browser mode', () => {
  it('listens on 127.0.0.1 only', () => {
    expect(server.host).toBe('127.0.0.1');
    expect(server.url).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/\?k=[A-Za-z0-9_-]{43}$/);
  });

  it('opens on the projects list under the strict CSP, with no wall preview left', async () => {
    const { page, problems } = await openLamina();
    await expect.poll(() => page.textContent('[data-testid="app-identity"]')).toMatch(/^Lamina \d+\.\d+\.\d+ · browser mode$/);
    // A new library holds no project here (the server is started without the demo), so the list says so.
    await expect.poll(() => page.locator('[data-testid="projects-empty"]').count()).toBe(1);
    expect(await page.getAttribute('#view-projects', 'aria-current')).toBe('page');
    expect(await page.locator('nav.views button').allTextContents()).toEqual(['Projects', 'Materials library', 'Backups', 'Report letterhead']);
    expect(await page.textContent('body')).not.toMatch(/NaN|undefined|Infinity/);
    await page.screenshot({ path: path.join(resultsFolder, 'browser-mode.png'), fullPage: true });
    expect(problems).toEqual([]);
    await page.close();
  });
});
