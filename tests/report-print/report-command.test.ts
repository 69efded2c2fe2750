/**
 * `lamina projects report`'s refusals: a bad id or a bad --out is exit 2 with one sentence naming
 * it, and nothing is written; with no Electron and no Chromium the HTML is written beside the
 * requested PDF with one line saying how to print it. In-process through runCli, against a real
 * library in a temporary folder (no browser is started here).
 */
import fs from 'node:fs';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { runCli } from '../../main/cli/lamina.js';
import { runLamina, temporaryFolder } from '../cases/in-process-cli.js';

let folder: string;
let db: string;

beforeAll(async () => {
  folder = temporaryFolder('lamina-report-command-');
  db = path.join(folder, 'library.sqlite');
  const made = await runLamina(['projects', 'create', 'Orrin Valley Creamery, yard mains (demo)', '--reference', 'BTE-DEMO-003'], { db });
  expect(made.stdout).toMatch(/^Created project 1 /);
});

const report = (...args: string[]) => runLamina(['projects', 'report', ...args], { db, cwd: folder });

describe('lamina projects report refuses', () => {
  const refusals: [string, string[], RegExp][] = [
    ['no id', ['--out', 'r.pdf'], /^projects report needs one project id, a whole number of 1 or more/],
    ['an id that is not a number', ['one', '--out', 'r.pdf'], /^projects report needs one project id/],
    ['id 0', ['0', '--out', 'r.pdf'], /^projects report needs one project id/],
    ['no --out', ['1'], /^--out must name the report file to write, ending in \.pdf or \.html\.$/],
    ['another extension', ['1', '--out', 'r.docx'], /^--out must name a \.pdf or \.html file \(got r\.docx\)\.$/],
    ['no extension', ['1', '--out', 'report'], /^--out must name a \.pdf or \.html file \(got report\)\.$/],
    ['a folder that does not exist', ['1', '--out', 'missing/r.pdf'], /^--out: .*missing\/r\.pdf cannot be written because its folder does not exist\.$/],
    ['a folder named .pdf', ['1', '--out', 'folder.pdf'], /^--out: .*folder\.pdf is a folder, not a file\.$/],
    ['a file in place of a folder', ['1', '--out', 'plain.txt/r.pdf'], /^--out: .*part of its folder path is a file, not a folder\.$/],
    ['a paper size it does not know', ['1', '--out', 'r.pdf', '--paper', 'A3'], /^--paper must be one of A4, Letter \(got A3\)\.$/],
  ];
  beforeAll(() => {
    fs.mkdirSync(path.join(folder, 'folder.pdf'));
    fs.writeFileSync(path.join(folder, 'plain.txt'), 'not a folder\n');
  });
  for (const [what, args, sentence] of refusals) {
    it(what, async () => {
      const run = await report(...args);
      expect(run.code).toBe(2);
      expect(run.stdout).toBe('');
      expect(run.stderr.trimEnd().split('\n')).toHaveLength(1);
      expect(run.stderr.trimEnd()).toMatch(sentence);
      expect(fs.existsSync(path.join(folder, 'r.pdf'))).toBe(false);
    });
  }

  it('a project that does not exist', async () => {
    const run = await report('99', '--out', 'r.pdf');
    expect(run).toEqual({ code: 2, stdout: '', stderr: 'There is no project with id 99.\n' });
    expect(fs.existsSync(path.join(folder, 'r.pdf'))).toBe(false);
  });
});

describe('with no Electron and no Chromium', () => {
  it('writes the HTML beside the requested PDF and says in one line how to print it', async () => {
    let stdout = '';
    let stderr = '';
    const code = await runCli(['projects', 'report', '1', '--out', 'yard.pdf', '--db', db], {
      stdout: (t) => (stdout += t),
      stderr: (t) => (stderr += t),
      env: { CHROMIUM_PATH: path.join(folder, 'no-such-chromium') },
      cwd: folder,
    });
    const html = path.join(folder, 'yard.html');
    expect({ code, stderr }).toEqual({ code: 0, stderr: '' });
    expect(stdout).toBe(`CHROMIUM_PATH (${path.join(folder, 'no-such-chromium')}) is not a program and Electron is not installed: wrote ${html} instead; open it in a browser and print it to PDF.\n`);
    expect(fs.existsSync(path.join(folder, 'yard.pdf'))).toBe(false);
    expect(fs.readFileSync(html, 'utf8')).toContain('BTE-DEMO-003');
  });
});

describe('lamina projects --help', () => {
  it('lists the report command', async () => {
    expect((await runLamina(['projects', '--help'])).stdout).toContain('report ID --out FILE.pdf|FILE.html [--paper A4|Letter]');
    expect((await runLamina(['--help'])).stdout).toContain('lamina projects report ID --out FILE.pdf|FILE.html');
  });
});
