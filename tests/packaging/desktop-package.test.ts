/**
 * electron-builder.yml, checked offline: the real electron-builder packs the real build into a
 * Linux folder (`--linux dir`), with a stand-in Electron distribution because Electron's binary
 * cannot be downloaded here. The stand-in carries a fuse wire laid out the way @electron/fuses reads
 * one (its sentinel, a version byte, a length byte, then one '0'/'1' per fuse), so the fuses that
 * electron-builder flips are real bytes in a real file, read back with @electron/fuses itself.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, mkdirSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import asar from '@electron/asar';
import { FuseV1Options, FuseVersion, getCurrentFuseWire } from '@electron/fuses';
import { FuseState, SENTINEL } from '@electron/fuses/dist/constants.js';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureRendererBuilt } from '../../main/server/renderer-build.js';

const root = path.resolve(__dirname, '..', '..');
const electronVersion = (JSON.parse(readFileSync(path.join(root, 'node_modules', 'electron', 'package.json'), 'utf8')) as { version: string }).version;

/**
 * The fuse wire of an unmodified Electron binary: run-as-node, NODE_OPTIONS, --inspect and the
 * extra file:// privileges on; the rest off (Electron's fuses documentation, from memory). Starting
 * from these shows that every fuse the config changes was actually flipped.
 */
const ELECTRON_DEFAULT_WIRE: Record<FuseV1Options, FuseState> = {
  [FuseV1Options.RunAsNode]: FuseState.ENABLE,
  [FuseV1Options.EnableCookieEncryption]: FuseState.DISABLE,
  [FuseV1Options.EnableNodeOptionsEnvironmentVariable]: FuseState.ENABLE,
  [FuseV1Options.EnableNodeCliInspectArguments]: FuseState.ENABLE,
  [FuseV1Options.EnableEmbeddedAsarIntegrityValidation]: FuseState.DISABLE,
  [FuseV1Options.OnlyLoadAppFromAsar]: FuseState.DISABLE,
  [FuseV1Options.LoadBrowserProcessSpecificV8Snapshot]: FuseState.DISABLE,
  [FuseV1Options.GrantFileProtocolExtraPrivileges]: FuseState.ENABLE,
};

/** What the packaged Lamina must carry (the reasons are beside each fuse in electron-builder.yml). */
const LAMINA_WIRE: Record<FuseV1Options, FuseState> = {
  [FuseV1Options.RunAsNode]: FuseState.DISABLE,
  [FuseV1Options.EnableCookieEncryption]: FuseState.ENABLE,
  [FuseV1Options.EnableNodeOptionsEnvironmentVariable]: FuseState.DISABLE,
  [FuseV1Options.EnableNodeCliInspectArguments]: FuseState.DISABLE,
  [FuseV1Options.EnableEmbeddedAsarIntegrityValidation]: FuseState.ENABLE,
  [FuseV1Options.OnlyLoadAppFromAsar]: FuseState.ENABLE,
  // Not configured: left as Electron ships it.
  [FuseV1Options.LoadBrowserProcessSpecificV8Snapshot]: FuseState.DISABLE,
  // Kept on: the window loads its page from file:// (see electron-builder.yml).
  [FuseV1Options.GrantFileProtocolExtraPrivileges]: FuseState.ENABLE,
};

const FUSE_COUNT = Object.keys(ELECTRON_DEFAULT_WIRE).length;

/** A shell script standing in for Electron's binary, with the fuse wire in a comment line. */
function writeStandInElectron(folder: string): void {
  mkdirSync(path.join(folder, 'resources'), { recursive: true });
  const wire = Buffer.from(Array.from({ length: FUSE_COUNT }, (_, i) => ELECTRON_DEFAULT_WIRE[i as FuseV1Options]));
  const binary = Buffer.concat([
    Buffer.from('#!/bin/sh\n# Stand-in for Electron in offline packaging tests; never meant to run.\n# '),
    Buffer.from(SENTINEL),
    Buffer.from([Number(FuseVersion.V1), FUSE_COUNT]),
    wire,
    Buffer.from('\nexit 1\n'),
  ]);
  writeFileSync(path.join(folder, 'electron'), binary, { mode: 0o755 });
  writeFileSync(path.join(folder, 'version'), electronVersion);
}

function runNode(args: string[]): { status: number | null; output: string } {
  const result = spawnSync(process.execPath, args, {
    cwd: root,
    encoding: 'utf8',
    env: { ...process.env, ELECTRON_SKIP_BINARY_DOWNLOAD: '1' },
  });
  return { status: result.status, output: `${result.stdout}${result.stderr}` };
}

function electronBuilder(work: string, output: string, extra: string[] = []): { status: number | null; output: string } {
  return runNode([
    path.join(root, 'node_modules', 'electron-builder', 'cli.js'),
    '--linux',
    'dir',
    '--publish',
    'never',
    '--config',
    'electron-builder.yml',
    '-c.npmRebuild=false',
    `-c.electronDist=${path.join(work, 'electron-dist')}`,
    `-c.directories.output=${output}`,
    ...extra,
  ]);
}

let work: string;
let appFolder: string;
let archive: string;
let packedFiles: string[];

beforeAll(async () => {
  work = mkdtempSync(path.join(tmpdir(), 'lamina-package-'));
  // What `npm run build` makes: the renderer (Vite) and the main process (tsc) in build/.
  await ensureRendererBuilt();
  const tsc = runNode([path.join(root, 'node_modules', 'typescript', 'bin', 'tsc'), '-p', 'main/electron/tsconfig.json']);
  expect(tsc.status, tsc.output).toBe(0);
  writeStandInElectron(path.join(work, 'electron-dist'));
  const build = electronBuilder(work, path.join(work, 'out'));
  expect(build.status, build.output).toBe(0);
  appFolder = path.join(work, 'out', 'linux-unpacked');
  archive = path.join(appFolder, 'resources', 'app.asar');
  packedFiles = asar.listPackage(archive, { isPack: false });
}, 120_000);

afterAll(() => {
  if (work) rmSync(work, { recursive: true, force: true });
});

describe('the packaged desktop app', () => {
  it('holds the built main process, preload, page and seed data in app.asar', () => {
    for (const file of [
      '/package.json',
      '/build/main/electron/main.js',
      '/build/main/electron/navigation-policy.js',
      '/build/main/electron/preload.cjs',
      '/build/renderer/index.html',
    ]) {
      expect(packedFiles, file).toContain(file);
    }
    // main.ts reads the built-in materials from <app>/data/materials.
    const seeds = readdirSync(path.join(root, 'data', 'materials')).filter((name) => name.endsWith('.csv'));
    expect(seeds.length).toBeGreaterThan(0);
    for (const seed of seeds) expect(packedFiles).toContain(`/data/materials/${seed}`);
  });

  it('starts from the packed package.json entry, which is the current main process', () => {
    const manifest = JSON.parse(asar.extractFile(archive, 'package.json').toString('utf8')) as { main: string };
    expect(packedFiles).toContain(`/${manifest.main}`);
    expect(asar.extractFile(archive, manifest.main).toString('utf8')).toContain("'will-frame-navigate'");
  });

  it('leaves sources, tests, Lamina’s source maps and the build tools out', () => {
    const unwanted = packedFiles.filter(
      (file) =>
        (file.startsWith('/build/') && file.endsWith('.map')) ||
        /^\/(tests|renderer|main|app)\//.test(file) ||
        /^\/(electron-builder\.yml|package-lock\.json|tsconfig\.json)$/.test(file) ||
        /^\/node_modules\/(electron|electron-builder|vitest|vite|typescript)\//.test(file),
    );
    expect(unwanted).toEqual([]);
  });

  it('keeps better-sqlite3 outside the archive, where its native module can load', () => {
    expect(existsSync(path.join(appFolder, 'resources', 'app.asar.unpacked', 'node_modules', 'better-sqlite3', 'build', 'Release', 'better_sqlite3.node'))).toBe(true);
  });

  it('has its Electron fuses flipped as electron-builder.yml sets them', async () => {
    const wire = await getCurrentFuseWire(path.join(appFolder, 'lamina'));
    expect(wire.version).toBe('1');
    const read = Object.fromEntries(Array.from({ length: FUSE_COUNT }, (_, i) => [FuseV1Options[i], wire[i as FuseV1Options]]));
    const expected = Object.fromEntries(Array.from({ length: FUSE_COUNT }, (_, i) => [FuseV1Options[i], LAMINA_WIRE[i as FuseV1Options]]));
    expect(read).toEqual(expected);
  });
});

describe('electron-builder.yml fuse names', () => {
  it('are checked against electron-builder’s own schema: a misspelt one stops the build', () => {
    const refused = electronBuilder(work, path.join(work, 'refused'), ['-c.electronFuses.runAsNod=false']);
    expect(refused.status).toBe(1);
    expect(refused.output).toContain('configuration.electronFuses');
    expect(existsSync(path.join(work, 'refused', 'linux-unpacked'))).toBe(false);
  });
});
