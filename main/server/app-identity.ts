/** Lamina's name and version as the Node side reports them, read from the project's package.json. */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import path from 'node:path';
import type { AppInfo } from '../../app/api/contract.js';

/** The product name shown to people; the npm package name stays lower-case. */
export const PRODUCT_NAME = 'Lamina';

/** The checkout (or unpacked app) root: this file lives in main/server/. */
export const PROJECT_ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');

export function readAppIdentity(projectRoot: string = PROJECT_ROOT): AppInfo {
  const manifest = JSON.parse(readFileSync(path.join(projectRoot, 'package.json'), 'utf8')) as { version?: unknown };
  const version = typeof manifest.version === 'string' ? manifest.version : '0.0.0';
  return { name: PRODUCT_NAME, version };
}
