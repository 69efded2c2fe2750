/**
 * The desktop window's navigation rules (main/electron/navigation-policy.ts), checked without
 * Electron: the app's own page, with any fragment, is allowed in the main frame; every other
 * address, and every frame inside the page, is refused. URL parsing follows the WHATWG URL
 * standard as Node implements it.
 */
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';
import { isAppPage, mayNavigate } from '../../main/electron/navigation-policy.js';

// A path with a space and a non-ASCII letter, as an installed app's folder may have.
const appPage = pathToFileURL(path.resolve('/opt/Lamina Présent/resources/app.asar/build/renderer/index.html')).href;
const rendererFolder = appPage.slice(0, appPage.lastIndexOf('/') + 1);

describe('isAppPage', () => {
  it('accepts the page itself, with or without a fragment', () => {
    expect(isAppPage(appPage, appPage)).toBe(true);
    expect(isAppPage(`${appPage}#projects`, appPage)).toBe(true);
    expect(isAppPage(`${appPage}#`, appPage)).toBe(true);
  });

  it('accepts the same page written with dot segments, which the URL standard resolves', () => {
    expect(isAppPage(`${rendererFolder}assets/../index.html`, appPage)).toBe(true);
  });

  it('refuses other files, folders, query strings and other schemes', () => {
    const foreign = [
      `${rendererFolder}assets/index.js`,
      `${rendererFolder}index.html.bak`,
      rendererFolder,
      `${appPage}?k=1`,
      'file:///etc/passwd',
      'https://example.org/',
      'http://127.0.0.1:5178/',
      appPage.replace('file:', 'http:'),
      'javascript:alert(1)',
      'data:text/html,<p>hi</p>',
      'about:blank',
      '',
      'not a url',
    ];
    for (const url of foreign) expect(isAppPage(url, appPage), url).toBe(false);
  });
});

describe('mayNavigate', () => {
  it('lets the main frame (re)load the app page and nothing else', () => {
    expect(mayNavigate({ url: appPage, isMainFrame: true }, appPage)).toBe(true);
    expect(mayNavigate({ url: 'https://example.org/', isMainFrame: true }, appPage)).toBe(false);
    expect(mayNavigate({ url: `${rendererFolder}other.html`, isMainFrame: true }, appPage)).toBe(false);
  });

  it('refuses every frame inside the page, even one aimed at the app page', () => {
    expect(mayNavigate({ url: 'https://example.org/', isMainFrame: false }, appPage)).toBe(false);
    expect(mayNavigate({ url: appPage, isMainFrame: false }, appPage)).toBe(false);
  });
});
