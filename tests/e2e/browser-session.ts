/**
 * What every browser test file needs: one Chromium for the file, a results folder for
 * screenshots, and temporary folders removed afterwards. Call `useBrowserSession` at the top of a
 * test file; it registers the beforeAll/afterAll hooks.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';
import { ensureRendererBuilt } from '../../main/server/renderer-build.js';
import { launchChromium } from './chromium.js';

export const projectRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
export const resultsFolder = path.join(projectRoot, 'test-results');

export interface BrowserSession {
  /** The file's Chromium (available inside tests). */
  readonly browser: () => Browser;
  /** A new temporary folder, removed after the file's tests. */
  readonly tempFolder: () => string;
}

export function useBrowserSession(prefix: string): BrowserSession {
  const folders: string[] = [];
  let browser: Browser | undefined;
  beforeAll(async () => {
    await ensureRendererBuilt(projectRoot);
    browser = await launchChromium();
    fs.mkdirSync(resultsFolder, { recursive: true });
  });
  afterAll(async () => {
    await browser?.close();
    for (const folder of folders) fs.rmSync(folder, { recursive: true, force: true });
  });
  return {
    browser: () => browser!,
    tempFolder: () => {
      const folder = fs.mkdtempSync(path.join(os.tmpdir(), prefix));
      folders.push(folder);
      return folder;
    },
  };
}
