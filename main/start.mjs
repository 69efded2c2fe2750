#!/usr/bin/env node
/**
 * `npm start`: open Lamina in Electron when its binary is installed; otherwise serve the same
 * renderer on 127.0.0.1 and say so in one line. Options for browser mode: --port <n> (or
 * LAMINA_PORT; 0 picks a free port); --db <file> (or LAMINA_DB; default: see
 * main/storage/database-path.ts) names the library database; --browser serves in the browser even
 * when Electron is there. The address printed in browser mode carries a key made for this launch
 * (http://127.0.0.1:PORT/?k=…): knowing the port is not enough to reach the library
 * (main/server/launch-key.ts).
 *
 * The Electron binary is detected without `require('electron')`, which throws (or starts a
 * download) when the binary is missing: its package records the binary's path in path.txt.
 */
import { existsSync, readFileSync } from 'node:fs';
import { spawn } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const projectRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const DEFAULT_PORT = 5178;

function electronBinary() {
  const pathFile = path.join(projectRoot, 'node_modules', 'electron', 'path.txt');
  if (!existsSync(pathFile)) return undefined;
  const relative = readFileSync(pathFile, 'utf8').trim();
  if (!relative) return undefined;
  const binary = path.join(projectRoot, 'node_modules', 'electron', 'dist', relative);
  return existsSync(binary) ? binary : undefined;
}

function requestedPort(argv, env) {
  let text = env.LAMINA_PORT;
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    if (arg === '--port') text = argv[++i];
    else if (arg.startsWith('--port=')) text = arg.slice('--port='.length);
  }
  if (text === undefined || text === '') return DEFAULT_PORT;
  const port = Number(text);
  if (!/^\d+$/.test(text.trim()) || port > 65535) {
    fail(`The port (--port or LAMINA_PORT) must be a whole number from 0 to 65535 (0 picks a free port), not "${text}".`, 2);
  }
  return port;
}

function requestedDatabase(argv) {
  let chosen;
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    if (arg === '--db') chosen = argv[++i];
    else if (arg.startsWith('--db=')) chosen = arg.slice('--db='.length);
  }
  if (chosen === '') fail('The --db option needs a file path.', 2);
  return chosen;
}

function fail(message, code = 1) {
  console.error(message);
  process.exit(code);
}

/** Run a Node script from node_modules to completion, showing its output (used for the desktop build). */
function runNode(args) {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, args, { cwd: projectRoot, stdio: 'inherit' });
    child.on('error', reject);
    child.on('close', (code) => (code === 0 ? resolve() : reject(new Error(`${args.join(' ')} exited with ${code}.`))));
  });
}

async function startDesktop(binary) {
  await runNode([path.join(projectRoot, 'node_modules', 'vite', 'bin', 'vite.js'), 'build', '--logLevel', 'warn']);
  await runNode([path.join(projectRoot, 'node_modules', 'typescript', 'bin', 'tsc'), '-p', 'main/electron/tsconfig.json']);
  const child = spawn(binary, [projectRoot], { cwd: projectRoot, stdio: 'inherit' });
  for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => child.kill(signal));
  child.on('close', (code, signal) => process.exit(code ?? (signal ? 0 : 1)));
}

async function startBrowserMode(port, databaseOption, why) {
  const { tsImport } = await import('tsx/esm/api');
  const { resolveDatabasePath } = await tsImport('./storage/database-path.ts', import.meta.url);
  const databasePath = resolveDatabasePath(databaseOption, process.env, process.cwd());
  const { ensureRendererBuilt } = await tsImport('./server/renderer-build.ts', import.meta.url);
  const { startBrowserServer } = await tsImport('./server/browser-server.ts', import.meta.url);
  await ensureRendererBuilt();
  let server;
  try {
    server = await startBrowserServer({ port, host: '127.0.0.1', databasePath, demoProjectOnCreate: true });
  } catch (error) {
    if (error && error.code === 'EADDRINUSE') {
      fail(`Port ${port} is already in use; pass --port <number> or set LAMINA_PORT (0 picks a free port).`);
    }
    throw error;
  }
  console.log(
    why === 'no-electron'
      ? `Electron's binary is not installed here; serving Lamina in your browser at ${server.url} instead.`
      : `Serving Lamina in your browser at ${server.url} (Ctrl-C stops it).`,
  );
  const status = server.library.status();
  console.log(
    status.state === 'open'
      ? `Library database: ${status.databasePath}`
      : `The library database could not be opened: ${status.message} The page offers the backups to restore.`,
  );
  let stopping = false;
  const stop = () => {
    if (stopping) return;
    stopping = true;
    server.close().then(
      () => process.exit(0),
      () => process.exit(1),
    );
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

/**
 * Electron 42 and later download their binary on first use rather than at install. Try that once,
 * quietly: on a machine with internet the desktop app then opens; where the download cannot be had
 * (offline, or ELECTRON_SKIP_BINARY_DOWNLOAD=1) the fallback below says so in one line.
 */
async function fetchElectronBinary() {
  const installer = path.join(projectRoot, 'node_modules', 'electron', 'install.js');
  if (process.env.ELECTRON_SKIP_BINARY_DOWNLOAD === '1' || !existsSync(installer)) return undefined;
  const notice = setTimeout(() => console.log("Downloading Electron's binary for the first start..."), 2000);
  const fetched = await new Promise((resolve) => {
    const child = spawn(process.execPath, [installer], { cwd: projectRoot, stdio: 'ignore' });
    const limit = setTimeout(() => child.kill(), 10 * 60 * 1000);
    child.on('error', () => resolve(false));
    child.on('close', (code) => {
      clearTimeout(limit);
      resolve(code === 0);
    });
  });
  clearTimeout(notice);
  return fetched ? electronBinary() : undefined;
}

const argv = process.argv.slice(2);
const binary = argv.includes('--browser') ? undefined : (electronBinary() ?? (await fetchElectronBinary()));
try {
  if (binary) await startDesktop(binary);
  else await startBrowserMode(requestedPort(argv, process.env), requestedDatabase(argv), argv.includes('--browser') ? 'asked' : 'no-electron');
} catch (error) {
  fail(error instanceof Error ? error.message : String(error));
}
