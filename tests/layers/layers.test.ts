/**
 * The layer rule holds for the project, and the checker really catches each kind of crossing
 * (planted in a throw-away project in a temp folder, never in the real app/).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { checkLayers } from './check-layers.mjs';

const projectRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');

describe('the project', () => {
  it('has no import that crosses a layer and no DOM global in app/', () => {
    const { violations, filesChecked } = checkLayers(projectRoot);
    expect(filesChecked).toBeGreaterThan(0);
    expect(violations).toEqual([]);
  });
});

describe('the checker on a planted project', () => {
  let root: string;
  const plant = (relative: string, text: string) => {
    const file = path.join(root, relative);
    mkdirSync(path.dirname(file), { recursive: true });
    writeFileSync(file, text);
  };
  const messagesFor = (file: string) =>
    checkLayers(root)
      .violations.filter((v) => v.file === file)
      .map((v) => v.message);

  beforeAll(() => {
    root = mkdtempSync(path.join(tmpdir(), 'lamina-layers-'));
    // Allowed patterns: none of these may be flagged.
    plant(
      'app/fe/clean.ts',
      [
        "import { other } from './other.js';",
        "import type { Thing } from '../base/thing.js';",
        "import seed from '../../data/materials.json';",
        '// A comment may mention window, document or fetch, and "node:fs".',
        "const label = 'the window of the document';",
        'const options = { document: 1, navigator: 2 };',
        'export const width = options.document + other.window;',
        'const pattern = /window/;',
        'export { pattern, label, seed };',
        'export type { Thing };',
        "export interface Channels { 'projects:import': { request: 'x' }; 'files:export': { from: 'y' } }",
        "const json = await import('../../data/materials.json');",
      ].join('\n'),
    );
    plant('renderer/src/ok.ts', "import { mount } from 'svelte';\nimport { solve } from '../../app/fe/index.js';\nimport type { X } from '../../app/api/contract.js';\nimport series from '../../data/series.csv?raw';\n");
    plant('main/server/ok.ts', "import { readFileSync } from 'node:fs';\nimport type { X } from '../../app/api/contract.js';\n");
    // Violations, one kind per file.
    plant('app/bad-node.ts', "import { readFileSync } from 'node:fs';\n");
    plant('app/bad-package.ts', "\nimport { Chart } from 'chart.js';\n");
    plant('app/bad-svelte.ts', "export { mount } from 'svelte';\n");
    plant('app/bad-dynamic.ts', "const db = await import('better-sqlite3');\n");
    plant('app/bad-require.cts', "const electron = require('electron');\n");
    plant('app/bad-outside.ts', "import { x } from '../main/server/thing.js';\n");
    plant('app/bad-data-code.ts', "import { x } from '../data/script.js';\n");
    plant('app/bad-dom.ts', 'export const w = () => window.innerWidth;\nexport const f = () => fetch("/x");\n');
    plant('renderer/bad-main.ts', "import { startBrowserServer } from '../main/server/browser-server.js';\n");
    plant('renderer/bad-node.svelte', "<script lang=\"ts\">\n  import fs from 'node:fs';\n</script>\n");
    plant('renderer/bad-builtin.ts', "import path from 'path';\n");
    plant('main/bad-renderer.ts', "import App from '../renderer/src/App.svelte';\n");
    plant('data/bad-code.js', 'export const x = 1;\n');
  });

  afterAll(() => rmSync(root, { recursive: true, force: true }));

  it('passes the allowed patterns', () => {
    expect(messagesFor('app/fe/clean.ts')).toEqual([]);
    expect(messagesFor('renderer/src/ok.ts')).toEqual([]);
    expect(messagesFor('main/server/ok.ts')).toEqual([]);
  });

  it('catches node:*, packages, svelte, better-sqlite3 and electron in app/', () => {
    expect(messagesFor('app/bad-node.ts')).toEqual(['app/ may not import packages or Node modules, but this file imports "node:fs".']);
    expect(messagesFor('app/bad-package.ts')).toEqual(['app/ may not import packages or Node modules, but this file imports "chart.js".']);
    expect(messagesFor('app/bad-svelte.ts')).toEqual(['app/ may not import packages or Node modules, but this file imports "svelte".']);
    expect(messagesFor('app/bad-dynamic.ts')).toEqual(['app/ may not import packages or Node modules, but this file imports "better-sqlite3".']);
    expect(messagesFor('app/bad-require.cts')).toEqual(['app/ may not import packages or Node modules, but this file imports "electron".']);
  });

  it('reports the line of the offending import', () => {
    expect(checkLayers(root).violations.find((v) => v.file === 'app/bad-package.ts')?.line).toBe(2);
  });

  it('catches relative imports that leave app/ (except data/*.json)', () => {
    expect(messagesFor('app/bad-outside.ts')).toEqual(['app/ may import only app/ and data/*.json, but this file imports "../main/server/thing.js".']);
    expect(messagesFor('app/bad-data-code.ts')).toEqual(['app/ may import only app/ and data/*.json, but this file imports "../data/script.js".']);
  });

  it('catches DOM globals in app/', () => {
    expect(messagesFor('app/bad-dom.ts')).toEqual([
      'app/ may not use the browser global "window"; the engine must run without a DOM.',
      'app/ may not use the browser global "fetch"; the engine must run without a DOM.',
    ]);
  });

  it('catches renderer/ importing main/ or Node, and main/ importing renderer/', () => {
    expect(messagesFor('renderer/bad-main.ts')).toEqual(['renderer/ may import only renderer/, app/ and data files, but this file imports "../main/server/browser-server.js".']);
    expect(messagesFor('renderer/bad-node.svelte')).toEqual(['renderer/ may not import Node-side modules, but this file imports "node:fs".']);
    expect(messagesFor('renderer/bad-builtin.ts')).toEqual(['renderer/ may not import Node-side modules, but this file imports "path".']);
    expect(messagesFor('main/bad-renderer.ts')).toEqual(['main/ may not import renderer/, but this file imports "../renderer/src/App.svelte".']);
  });

  it('fails from the command line (npm run lint:layers) with one line per violation', () => {
    const run = spawnSync(process.execPath, [path.join(projectRoot, 'tests', 'layers', 'check-layers.mjs'), root], { encoding: 'utf8' });
    expect(run.status).toBe(1);
    expect(run.stdout).toContain('app/bad-node.ts:1: app/ may not import packages or Node modules, but this file imports "node:fs".');
    expect(run.stdout.trim().split('\n').at(-1)).toBe("Layers: 14 violations in 16 files checked.");
  });

  it('catches code in data/', () => {
    expect(messagesFor('data/bad-code.js')).toEqual(['data/ holds data files only; move this code to app/ or main/.']);
  });
});

describe('the layers inside app/ on a planted project', () => {
  it('lets a layer import the layers below it, and refuses an import upwards (checks ← cases)', () => {
    const root = mkdtempSync(path.join(tmpdir(), 'lamina-app-layers-'));
    try {
      const plant = (relative: string, text: string) => {
        mkdirSync(path.dirname(path.join(root, relative)), { recursive: true });
        writeFileSync(path.join(root, relative), text);
      };
      plant('app/cases/uses-checks.ts', "import { a } from '../checks/verdict.js';\nimport { b } from '../base/field.js';\n");
      plant('app/checks/uses-cases.ts', "import { solveWall } from '../cases/wall/wall-calculation.js';\n");
      plant('app/fe/uses-physics.ts', "import type { X } from '../physics/film.js';\n");
      plant('app/index.ts', "export { solveCase } from './cases/solve-case.js';\n");
      const { violations } = checkLayers(root);
      expect(violations.map((v) => `${v.file}: ${v.message}`)).toEqual([
        'app/checks/uses-cases.ts: app/checks/ may import only app/checks/, app/base/, app/fe/, app/physics/, app/materials/, but this file imports "../cases/wall/wall-calculation.js" (app/cases/).',
        'app/fe/uses-physics.ts: app/fe/ may import only app/fe/, app/base/, but this file imports "../physics/film.js" (app/physics/).',
      ]);
    } finally {
      rmSync(root, { recursive: true, force: true });
    }
  });
});
