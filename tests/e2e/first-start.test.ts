/**
 * A first start, as a new user meets it: the browser mode on a library it creates opens on the demo
 * project (the invented creamery), already solved; "Add the demo project" adds it again. Screenshots
 * go to test-results/.
 */
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startBrowserServer, type BrowserServer } from '../../main/server/browser-server.js';
import { resultsFolder, useBrowserSession } from './browser-session.js';

const session = useBrowserSession('lamina-first-start-');
let server: BrowserServer;

beforeAll(async () => {
  server = await startBrowserServer({ port: 0, databasePath: path.join(session.tempFolder(), 'lamina.sqlite'), demoProjectOnCreate: true, dailyBackups: false });
});
afterAll(async () => {
  await server?.close();
});

describe('a first start', () => {
  it('opens on the demo project with its six cases solved, and can add the demo again', async () => {
    const page = await session.browser().newPage({ viewport: { width: 1366, height: 800 } });
    try {
      await page.goto(server.url);
      const rows = page.locator('[data-testid="case-row"]');
      await expect.poll(() => rows.count(), { timeout: 20_000 }).toBe(6);
      expect(await page.textContent('main')).toContain('Orrin Valley Creamery (demo)');
      // Each row shows its key figure once solved: the first, a DN100 hot-water flow, loses heat.
      await expect.poll(() => rows.first().textContent()).toMatch(/Heat loss per metre[\s\S]*W\/m/);
      await page.screenshot({ path: path.join(resultsFolder, 'first-start-demo-1366.png'), fullPage: true });
      await page.click('#project-add-demo');
      await expect.poll(() => page.locator('[data-testid="project-row"]').count(), { timeout: 10_000 }).toBe(2);
      expect(await page.textContent('[data-testid="projects-notice"]')).toContain('Added the demo project "Orrin Valley Creamery (demo)": invented data');
    } finally {
      await page.close();
    }
  });
});
