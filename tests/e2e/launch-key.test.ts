/**
 * The per-launch key in real Chromium, on the browser-mode server with the real build: the printed
 * address stores the key in a cookie the page's scripts cannot read and leaves no `k=` in the
 * address bar; opening it again in a new tab works; without the key the page's files load but its
 * data does not; an address from an earlier launch on the same port is refused in one sentence.
 */
import { describe, expect, it } from 'vitest';
import path from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { startBrowserServer, type BrowserServer } from '../../main/server/browser-server.js';
import { useBrowserSession } from './browser-session.js';

const session = useBrowserSession('lamina-launch-key-e2e-');

const NO_KEY =
  'This request carries no valid key for this launch of Lamina: open the address Lamina printed when it started (it ends in ?k=…), or send that key in the X-Lamina-Key header.';
const WRONG_ADDRESS = 'This address is from an earlier launch of Lamina or is wrong: open the address Lamina printed when it last started.';

function serve(databasePath: string, port = 0): Promise<BrowserServer> {
  return startBrowserServer({ port, databasePath, dailyBackups: false });
}

/** What the page itself gets from one API call, with the credentials a same-origin fetch carries. */
function callFromPage(page: Page, route: string): Promise<{ status: number; body: unknown }> {
  return page.evaluate(async (target) => {
    const response = await fetch(target, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: '{}' });
    return { status: response.status, body: (await response.json()) as unknown };
  }, route);
}

const identity = (page: Page) => page.textContent('[data-testid="app-identity"]');

async function withContext(run: (context: BrowserContext) => Promise<void>): Promise<void> {
  const context = await session.browser().newContext();
  try {
    await run(context);
  } finally {
    await context.close();
  }
}

describe('the launch key in the browser', () => {
  it('trades the printed address for an HttpOnly cookie, drops k= from the address bar, and opens again in a new tab', async () => {
    const server = await serve(path.join(session.tempFolder(), 'lamina.sqlite'));
    try {
      await withContext(async (context) => {
        const first = await context.newPage();
        const response = await first.goto(server.url);
        expect(response?.status()).toBe(200);
        expect(first.url()).toBe(`${server.origin}/`);
        expect(await first.evaluate(() => window.location.search)).toBe('');
        await expect.poll(() => identity(first)).toMatch(/^Lamina \d+\.\d+\.\d+ · browser mode$/);

        const cookies = await context.cookies(server.origin);
        expect(cookies.map(({ name, value, path: cookiePath, httpOnly, sameSite, secure }) => ({ name, value, cookiePath, httpOnly, sameSite, secure }))).toEqual([
          { name: `lamina-key-${server.port}`, value: server.key, cookiePath: '/', httpOnly: true, sameSite: 'Strict', secure: false },
        ]);
        expect(await first.evaluate(() => document.cookie)).toBe('');
        expect(await callFromPage(first, '/api/projects-list')).toEqual({ status: 200, body: [] });

        const second = await context.newPage();
        await second.goto(server.url);
        expect(second.url()).toBe(`${server.origin}/`);
        await expect.poll(() => identity(second)).toMatch(/^Lamina \d+\.\d+\.\d+ · browser mode$/);
        expect((await callFromPage(second, '/api/app-info')).status).toBe(200);
      });
    } finally {
      await server.close();
    }
  });

  it('loads the page without the key but none of its data', async () => {
    const server = await serve(path.join(session.tempFolder(), 'lamina.sqlite'));
    try {
      await withContext(async (context) => {
        const page = await context.newPage();
        expect((await page.goto(`${server.origin}/`))?.status()).toBe(200);
        expect(await callFromPage(page, '/api/materials-list')).toEqual({ status: 401, body: { error: NO_KEY } });
        expect(await callFromPage(page, '/api/projects-create')).toEqual({ status: 401, body: { error: NO_KEY } });
        // The page falls back to its name alone: it learned nothing from the server.
        await expect.poll(() => identity(page)).toBe('Lamina · browser mode');
        expect(await context.cookies(server.origin)).toEqual([]);
      });
    } finally {
      await server.close();
    }
  });

  it('refuses the address and the cookie of an earlier launch on the same port, and takes the new address', async () => {
    const databasePath = path.join(session.tempFolder(), 'lamina.sqlite');
    await withContext(async (context) => {
      const page = await context.newPage();
      const earlier = await serve(databasePath);
      const earlierAddress = earlier.url;
      try {
        await page.goto(earlierAddress);
        expect((await callFromPage(page, '/api/app-info')).status).toBe(200);
      } finally {
        await earlier.close();
      }
      const server = await serve(databasePath, earlier.port);
      try {
        expect(server.url).not.toBe(earlierAddress);
        // The open tab still holds the earlier launch's cookie: it no longer opens anything.
        expect(await callFromPage(page, '/api/app-info')).toEqual({ status: 401, body: { error: NO_KEY } });
        const response = await page.goto(earlierAddress);
        expect(response?.status()).toBe(401);
        expect((await page.textContent('body'))?.trim()).toBe(WRONG_ADDRESS);
        expect(page.url()).toBe(earlierAddress);

        await page.goto(server.url);
        expect(page.url()).toBe(`${server.origin}/`);
        expect((await context.cookies(server.origin)).map((cookie) => cookie.value)).toEqual([server.key]);
        expect((await callFromPage(page, '/api/app-info')).status).toBe(200);
      } finally {
        await server.close();
      }
    });
  });
});
