/**
 * Build the renderer with Vite when build/renderer is missing or older than its sources, so that
 * `npm start` in browser mode and the end-to-end tests always serve the code in the checkout.
 */
import { spawn } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { PROJECT_ROOT } from './app-identity.js';

/** What the built page depends on: the UI, the engine it imports, the data files, the build config. */
const SOURCES = ['renderer', 'app', 'data', 'vite.config.ts', 'package.json'];

export function rendererBuildIsStale(projectRoot: string = PROJECT_ROOT): boolean {
  const builtPage = path.join(projectRoot, 'build', 'renderer', 'index.html');
  if (!existsSync(builtPage)) return true;
  const builtAt = statSync(builtPage).mtimeMs;
  return SOURCES.some((source) => newestChange(path.join(projectRoot, source)) > builtAt);
}

function newestChange(target: string): number {
  if (!existsSync(target)) return 0;
  const info = statSync(target);
  if (!info.isDirectory()) return info.mtimeMs;
  let newest = info.mtimeMs;
  for (const entry of readdirSync(target)) {
    if (entry === 'node_modules' || entry.startsWith('.')) continue;
    newest = Math.max(newest, newestChange(path.join(target, entry)));
  }
  return newest;
}

/**
 * Run `vite build` in a child process (Vite's own output is kept and shown only if the build
 * fails, so the caller decides what the person at the terminal sees).
 */
export function buildRenderer(projectRoot: string = PROJECT_ROOT): Promise<void> {
  const vite = path.join(projectRoot, 'node_modules', 'vite', 'bin', 'vite.js');
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [vite, 'build', '--logLevel', 'warn'], {
      cwd: projectRoot,
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let output = '';
    child.stdout.on('data', (chunk: Buffer) => (output += chunk.toString()));
    child.stderr.on('data', (chunk: Buffer) => (output += chunk.toString()));
    child.on('error', reject);
    child.on('close', (code) => {
      if (code === 0) resolve();
      else reject(new Error(`Building the renderer failed (vite build exited with ${code}):\n${output}`));
    });
  });
}

export async function ensureRendererBuilt(projectRoot: string = PROJECT_ROOT): Promise<boolean> {
  if (!rendererBuildIsStale(projectRoot)) return false;
  await buildRenderer(projectRoot);
  return true;
}
