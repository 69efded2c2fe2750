/**
 * The `lamina` command run in-process through runCli (main/cli/lamina.ts), with its output
 * captured: the same code path as the real command without a child process per case, so a test
 * can try thousands of case files in seconds. A thrown error is not caught here: it fails the test,
 * as a crash of the real command would. The child-process tests (tests/cli) cover what only a real
 * process shows, such as a stack trace on standard error.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { runCli } from '../../main/cli/lamina.js';

export interface CliRun {
  readonly code: number;
  readonly stdout: string;
  readonly stderr: string;
}

let sharedLibrary: string | undefined;

/** Runs `lamina ARGS` with LAMINA_DB pointing at `db` (by default one library in a temporary folder per test file). */
export async function runLamina(args: readonly string[], options: { cwd?: string; db?: string } = {}): Promise<CliRun> {
  let stdout = '';
  let stderr = '';
  sharedLibrary ??= path.join(temporaryFolder('lamina-db-'), 'library.sqlite');
  const db = options.db ?? sharedLibrary;
  const code = await runCli(args, {
    stdout: (text) => {
      stdout += text;
    },
    stderr: (text) => {
      stderr += text;
    },
    env: { LAMINA_DB: db },
    cwd: options.cwd ?? process.cwd(),
  });
  return { code, stdout, stderr };
}

export function temporaryFolder(prefix: string): string {
  return mkdtempSync(path.join(tmpdir(), prefix));
}

/** Writes case files into `dir` (a new temporary folder by default), each under a new name; returns the path. */
export function caseFileWriter(dir = temporaryFolder('lamina-cases-')): (content: string | Uint8Array | object) => string {
  let count = 0;
  return (content) => {
    const file = path.join(dir, `case-${++count}.json`);
    writeFileSync(file, typeof content === 'string' || content instanceof Uint8Array ? content : JSON.stringify(content));
    return file;
  };
}
