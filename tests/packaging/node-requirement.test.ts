/**
 * The Node versions the README states agree with what the installed packages declare, and a fresh
 * install prints no warning the README does not explain. Version ranges are read with npm's own
 * `semver` package, the implementation npm uses to print its EBADENGINE warnings.
 */
import { spawnSync } from 'node:child_process';
import { copyFileSync, existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';

const root = path.resolve(__dirname, '..', '..');

interface Semver {
  satisfies(version: string, range: string): boolean;
  minVersion(range: string): { version: string } | null;
}
const semver = createRequire(path.join(root, 'package.json'))('semver') as Semver;

interface Manifest {
  name: string;
  version: string;
  engines?: { node?: string };
  dependencies?: Record<string, string>;
  devDependencies?: Record<string, string>;
  optionalDependencies?: Record<string, string>;
  peerDependencies?: Record<string, string>;
}

function readManifest(folder: string): Manifest {
  return JSON.parse(readFileSync(path.join(folder, 'package.json'), 'utf8')) as Manifest;
}

/** The tools that only `npm start`'s first Electron download and `npm run package` use. */
const DESKTOP_TOOLS = ['electron', 'electron-builder'];

const project = readManifest(root);
const readme = readFileSync(path.join(root, 'README.md'), 'utf8');

/** "npm install      # Node 20.19 or later (22.12 to package); …" in Quick start. */
function readmeVersions(): { app: string; packaging: string } {
  const match = /^npm install\s+# Node (\d+\.\d+) or later \((\d+\.\d+) to package\)/m.exec(readme);
  expect(match, 'the Quick start npm install line states the Node versions').not.toBeNull();
  return { app: `${match![1]}.0`, packaging: `${match![2]}.0` };
}

/** The package names in backticks in the README's install-warnings section. */
function readmeWarningPackages(): Set<string> {
  const section = /^### Node versions and install warnings\n([\s\S]*?)(?=^#|^Other commands:)/m.exec(readme);
  expect(section, 'the README has a section on install warnings').not.toBeNull();
  const names = [...section![1]!.matchAll(/`((?:@[a-z0-9-]+\/)?[a-z0-9][a-z0-9.-]*)`/g)].map((m) => m[1]!);
  return new Set(names);
}

/** Every installed package, found through the lockfile's paths and read from node_modules. */
function installedPackages(): { folder: string; manifest: Manifest }[] {
  const lock = JSON.parse(readFileSync(path.join(root, 'package-lock.json'), 'utf8')) as { packages: Record<string, unknown> };
  return Object.keys(lock.packages)
    .filter((key) => key !== '' && existsSync(path.join(root, key, 'package.json')))
    .map((key) => ({ folder: path.join(root, key), manifest: readManifest(path.join(root, key)) }));
}

/** Node's lookup: the nearest node_modules/<name> from `from` up to the project root. */
function resolveFrom(from: string, name: string): string | undefined {
  for (let dir = from; dir.length >= root.length; dir = path.dirname(dir)) {
    const candidate = path.join(dir, 'node_modules', name);
    if (existsSync(path.join(candidate, 'package.json'))) return candidate;
  }
  return undefined;
}

/** The folders of every package installed for `names` and, transitively, for their dependencies. */
function reachableFrom(names: string[]): Set<string> {
  const seen = new Set<string>();
  const queue = names.map((name) => resolveFrom(root, name)).filter((folder): folder is string => folder !== undefined);
  while (queue.length > 0) {
    const folder = queue.pop()!;
    if (seen.has(folder)) continue;
    seen.add(folder);
    const manifest = readManifest(folder);
    for (const dependency of Object.keys({ ...manifest.dependencies, ...manifest.optionalDependencies, ...manifest.peerDependencies })) {
      const found = resolveFrom(folder, dependency);
      if (found) queue.push(found);
    }
  }
  return seen;
}

const NUMBER_WORDS = ['no', 'one', 'two', 'three', 'four', 'five', 'six', 'seven', 'eight', 'nine', 'ten'];

describe('Node requirement', () => {
  const stated = readmeVersions();
  const tooNew = installedPackages().filter(
    ({ manifest }) => manifest.engines?.node !== undefined && !semver.satisfies(stated.app, manifest.engines.node),
  );

  it('package.json engines and the README name the same oldest Node', () => {
    expect(semver.minVersion(project.engines!.node!)?.version).toBe(stated.app);
  });

  it('the packages that want a newer Node are exactly those the README names, all for the same version', () => {
    expect(new Set(tooNew.map(({ manifest }) => manifest.name))).toEqual(readmeWarningPackages());
    expect(new Set(tooNew.map(({ manifest }) => semver.minVersion(manifest.engines!.node!)?.version))).toEqual(new Set([stated.packaging]));
    expect(readme).toMatch(new RegExp(`\\b${NUMBER_WORDS[tooNew.length]} \`npm warn EBADENGINE\` warnings`));
  });

  it('those packages serve only the desktop tooling, never the app, command line or tests', () => {
    const everythingElse = reachableFrom(
      Object.keys({ ...project.dependencies, ...project.devDependencies }).filter((name) => !DESKTOP_TOOLS.includes(name)),
    );
    const desktopTooling = reachableFrom(DESKTOP_TOOLS);
    for (const { folder, manifest } of tooNew) {
      expect(everythingElse.has(folder), `${manifest.name}@${manifest.version} is needed outside the desktop tooling`).toBe(false);
      expect(desktopTooling.has(folder), `${manifest.name}@${manifest.version}`).toBe(true);
    }
  });
});

describe('a fresh install', () => {
  const work = mkdtempSync(path.join(tmpdir(), 'lamina-install-'));
  afterAll(() => rmSync(work, { recursive: true, force: true }));

  it('warns only about what the README explains', () => {
    copyFileSync(path.join(root, 'package.json'), path.join(work, 'package.json'));
    copyFileSync(path.join(root, 'package-lock.json'), path.join(work, 'package-lock.json'));
    // npm's own settings from a surrounding `npm test` must not leak into the install under test.
    const env = Object.fromEntries(Object.entries(process.env).filter(([key]) => !key.toLowerCase().startsWith('npm_')));
    const install = spawnSync('npm', ['ci', '--dry-run', '--offline', '--no-audit', '--no-fund'], {
      cwd: work,
      encoding: 'utf8',
      env: { ...env, ELECTRON_SKIP_BINARY_DOWNLOAD: '1' },
    });
    const output = `${install.stdout}${install.stderr}`;
    expect(install.status, output).toBe(0);
    const warnings = output.split('\n').filter((line) => line.startsWith('npm warn'));
    expect(warnings.filter((line) => !line.startsWith('npm warn EBADENGINE'))).toEqual([]);
    const engineWarned = new Set(
      warnings.flatMap((line) => /^npm warn EBADENGINE\s+package: '(.+)@[^@']+',?$/.exec(line)?.[1] ?? []),
    );
    const expected = semver.satisfies(process.versions.node, `>=${readmeVersions().packaging}`) ? new Set() : readmeWarningPackages();
    expect(engineWarned).toEqual(expected);
  });
});
