#!/usr/bin/env node
/**
 * The layer rule, made checkable (see the design notes, "Layers and what each may import"):
 *
 *   app/       imports only app/ and data/*.json: no package at all (so no node:*, electron,
 *              better-sqlite3, svelte, chart.js), and uses no DOM global (window, document, ...).
 *   renderer/  may import app/, data files (*.json, *.csv?raw, *.css) and packages, but not main/ and not Node (node:*, built-ins,
 *              electron, better-sqlite3).
 *   main/      may not import renderer/.
 *   data/      holds data files only, no code.
 *
 * Usage: node tests/layers/check-layers.mjs [projectRoot]. Exit code 1 when anything crosses a layer.
 * The scan is lexical (comments and strings are blanked first), which is enough for import
 * statements and bare global names; the type-checker's per-folder lib settings back it up.
 */
import { readdirSync, readFileSync, statSync, existsSync } from 'node:fs';
import { builtinModules } from 'node:module';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const CODE_EXTENSIONS = new Set(['.ts', '.mts', '.cts', '.js', '.mjs', '.cjs', '.svelte', '.tsx', '.jsx']);
const SKIPPED_FOLDERS = new Set(['node_modules', 'build', 'dist', '.git']);
const NODE_SIDE_PACKAGES = new Set(['electron', 'better-sqlite3']);
const DOM_GLOBALS = [
  'window',
  'document',
  'localStorage',
  'sessionStorage',
  'indexedDB',
  'navigator',
  'fetch',
  'XMLHttpRequest',
  'WebSocket',
  'HTMLElement',
  'HTMLCanvasElement',
  'HTMLInputElement',
  'Element',
  'Node',
  'DOMParser',
  'customElements',
  'requestAnimationFrame',
  'getComputedStyle',
  'alert',
];
const DOM_GLOBAL_PATTERN = new RegExp(`(?<![\\w$.])(${DOM_GLOBALS.join('|')})(?![\\w$])(?!\\s*\\??:)`, 'g');

/** @typedef {{ file: string, line: number, message: string }} Violation */

/**
 * @param {string} projectRoot
 * @returns {{ violations: Violation[], filesChecked: number }}
 */
export function checkLayers(projectRoot) {
  const root = path.resolve(projectRoot);
  /** @type {Violation[]} */
  const violations = [];
  let filesChecked = 0;
  for (const layer of ['app', 'renderer', 'main', 'data']) {
    for (const file of codeFiles(path.join(root, layer))) {
      filesChecked++;
      const relativeFile = path.relative(root, file).split(path.sep).join('/');
      if (layer === 'data') {
        violations.push({ file: relativeFile, line: 1, message: 'data/ holds data files only; move this code to app/ or main/.' });
        continue;
      }
      violations.push(...checkFile(root, layer, file, relativeFile));
    }
  }
  return { violations, filesChecked };
}

function* codeFiles(folder) {
  if (!existsSync(folder)) return;
  for (const entry of readdirSync(folder)) {
    if (SKIPPED_FOLDERS.has(entry)) continue;
    const full = path.join(folder, entry);
    const info = statSync(full);
    if (info.isDirectory()) yield* codeFiles(full);
    else if (CODE_EXTENSIONS.has(path.extname(entry)) && !entry.endsWith('.d.ts')) yield full;
  }
}

function checkFile(root, layer, file, relativeFile) {
  const source = readFileSync(file, 'utf8');
  const { withoutComments, bare } = blankCommentsAndStrings(source);
  const violations = [];
  const report = (index, message) => violations.push({ file: relativeFile, line: lineAt(source, index), message });

  for (const { specifier, index } of importSpecifiers(withoutComments)) {
    const isRelative = specifier.startsWith('./') || specifier.startsWith('../');
    const target = isRelative ? topFolder(root, path.resolve(path.dirname(file), specifier)) : undefined;
    const isNode = !isRelative && (specifier.startsWith('node:') || builtinModules.includes(specifier.split('/')[0]));
    if (layer === 'app') {
      if (!isRelative) {
        report(index, `app/ may not import packages or Node modules, but this file imports "${specifier}".`);
      } else if (target !== 'app' && !(target === 'data' && specifier.endsWith('.json'))) {
        report(index, `app/ may import only app/ and data/*.json, but this file imports "${specifier}".`);
      } else if (target === 'app') {
        const from = appLayerOf(root, file);
        const to = appLayerOf(root, path.resolve(path.dirname(file), specifier));
        if (!mayImport(from, to)) {
          report(index, `app/${from}/ may import only ${allowedBelow(from)}, but this file imports "${specifier}" (app/${to}/).`);
        }
      }
    } else if (layer === 'renderer') {
      if (isNode || NODE_SIDE_PACKAGES.has(specifier.split('/')[0])) {
        report(index, `renderer/ may not import Node-side modules, but this file imports "${specifier}".`);
      } else if (isRelative && target !== 'renderer' && target !== 'app' && !(target === 'data' && /\.(json|csv\?raw|css)$/.test(specifier))) {
        report(index, `renderer/ may import only renderer/, app/ and data files, but this file imports "${specifier}".`);
      }
    } else if (layer === 'main' && target === 'renderer') {
      report(index, `main/ may not import renderer/, but this file imports "${specifier}".`);
    }
  }

  if (layer === 'app') {
    for (const match of bare.matchAll(DOM_GLOBAL_PATTERN)) {
      report(match.index, `app/ may not use the browser global "${match[1]}"; the engine must run without a DOM.`);
    }
  }
  return violations;
}

/**
 * The layers inside app/, lowest first: a folder may import itself and the folders before it,
 * never one after it (so the engine cannot grow an import cycle between its parts). Files at the
 * top of app/ (the public index) may import every layer.
 */
export const APP_LAYERS = ['base', 'fe', 'physics', 'materials', 'checks', 'report', 'cases', 'schedules', 'api'];

function appLayerOf(root, file) {
  const parts = path.relative(path.join(root, 'app'), file).split(path.sep);
  return parts.length > 1 ? parts[0] : '';
}

function mayImport(from, to) {
  if (from === '' || from === to) return true;
  const i = APP_LAYERS.indexOf(from);
  const j = APP_LAYERS.indexOf(to);
  return i >= 0 && j >= 0 && j < i;
}

function allowedBelow(from) {
  const i = APP_LAYERS.indexOf(from);
  if (i < 0) return `a folder listed in APP_LAYERS (app/${from}/ is not)`;
  return [from, ...APP_LAYERS.slice(0, i)].map((l) => `app/${l}/`).join(', ');
}

/** The first folder of `target` below the project root ('app', 'data', ...), or '..' when outside it. */
function topFolder(root, target) {
  const relative = path.relative(root, target);
  return relative.split(path.sep)[0] ?? '';
}

function importSpecifiers(code) {
  // The keyword must start a statement or expression: not part of a name, a property key or a
  // string such as 'projects:import' (strings are kept in `code` so that specifiers can be read).
  const start = String.raw`(?<![\w$.:'"\-])`;
  const patterns = [
    new RegExp(String.raw`${start}import\s+(?:type\s+)?[\w$*{}\s,]*?\bfrom\s*(['"])([^'"]+)\1`, 'g'),
    new RegExp(String.raw`${start}export\s+(?:type\s+)?[\w$*{}\s,]*?\bfrom\s*(['"])([^'"]+)\1`, 'g'),
    new RegExp(String.raw`${start}import\s*(['"])([^'"]+)\1`, 'g'),
    new RegExp(String.raw`${start}import\s*\(\s*(['"])([^'"]+)\1\s*\)`, 'g'),
    new RegExp(String.raw`${start}require\s*\(\s*(['"])([^'"]+)\1\s*\)`, 'g'),
  ];
  const found = [];
  for (const pattern of patterns) {
    for (const match of code.matchAll(pattern)) found.push({ specifier: match[2], index: match.index });
  }
  return found;
}

function lineAt(source, index) {
  let line = 1;
  for (let i = 0; i < index; i++) if (source.charCodeAt(i) === 10) line++;
  return line;
}

/**
 * Two copies of the source with the same length and line breaks: one with comments blanked, one
 * with comments and the insides of string, template and regular-expression literals blanked.
 */
export function blankCommentsAndStrings(source) {
  let withoutComments = '';
  let bare = '';
  let i = 0;
  let lastSignificant = '';
  const keep = (text) => {
    withoutComments += text;
    bare += text;
  };
  const blank = (text, inStringsToo) => {
    const spaces = text.replace(/[^\n]/g, ' ');
    withoutComments += inStringsToo ? text : spaces;
    bare += spaces;
  };
  while (i < source.length) {
    const c = source[i];
    const next = source[i + 1];
    if (c === '/' && next === '/') {
      const end = source.indexOf('\n', i);
      const stop = end === -1 ? source.length : end;
      blank(source.slice(i, stop), false);
      i = stop;
    } else if (c === '/' && next === '*') {
      const end = source.indexOf('*/', i + 2);
      const stop = end === -1 ? source.length : end + 2;
      blank(source.slice(i, stop), false);
      i = stop;
    } else if (c === '"' || c === "'" || c === '`') {
      const stop = endOfQuoted(source, i, c);
      keep(c);
      blank(source.slice(i + 1, stop - 1), true);
      keep(source.slice(stop - 1, stop));
      i = stop;
      lastSignificant = c;
    } else if (c === '/' && (lastSignificant === '' || '(,=:[!&|?{};+-*%<>~^'.includes(lastSignificant))) {
      const stop = endOfRegex(source, i);
      keep('/');
      blank(source.slice(i + 1, stop), true);
      i = stop;
      lastSignificant = '/';
    } else {
      keep(c);
      if (!/\s/.test(c)) lastSignificant = /[\w$]/.test(c) ? 'a' : c;
      i++;
    }
  }
  return { withoutComments, bare };
}

function endOfQuoted(source, start, quote) {
  let i = start + 1;
  while (i < source.length) {
    if (source[i] === '\\') i += 2;
    else if (source[i] === quote) return i + 1;
    else if (source[i] === '\n' && quote !== '`') return i + 1;
    else i++;
  }
  return source.length;
}

function endOfRegex(source, start) {
  let i = start + 1;
  let inClass = false;
  while (i < source.length && source[i] !== '\n') {
    if (source[i] === '\\') i += 2;
    else if (source[i] === '[') (inClass = true), i++;
    else if (source[i] === ']') (inClass = false), i++;
    else if (source[i] === '/' && !inClass) return i;
    else i++;
  }
  return i;
}

// Command line.
if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const projectRoot = process.argv[2] ?? path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
  const { violations, filesChecked } = checkLayers(projectRoot);
  for (const v of violations) console.log(`${v.file}:${v.line}: ${v.message}`);
  console.log(
    violations.length === 0
      ? `Layers: ${filesChecked} files checked, no import crosses a layer.`
      : `Layers: ${violations.length} violation${violations.length === 1 ? '' : 's'} in ${filesChecked} files checked.`,
  );
  process.exitCode = violations.length === 0 ? 0 : 1;
}
