/**
 * Vitest global setup: build the renderer once, before any test file runs, so that parallel
 * browser tests never start two Vite builds into the same folder.
 */
import { ensureRendererBuilt } from '../main/server/renderer-build.js';

export default async function setup(): Promise<void> {
  await ensureRendererBuilt();
}
