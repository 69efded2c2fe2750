#!/usr/bin/env node
// The `lamina` command. The CLI is written in TypeScript; tsx loads it without a build step.
import { tsImport } from 'tsx/esm/api';

// Output piped into a command that stops reading early (`lamina materials list | head`) is not
// an error of ours: stop quietly instead of dying on EPIPE.
for (const stream of [process.stdout, process.stderr]) {
  stream.on('error', (error) => {
    if (error.code === 'EPIPE') process.exit(process.exitCode ?? 0);
    throw error;
  });
}

const { runCli } = await tsImport('./lamina.ts', import.meta.url);
const code = await runCli(process.argv.slice(2), {
  stdout: (text) => process.stdout.write(text),
  stderr: (text) => process.stderr.write(text),
  env: process.env,
  cwd: process.cwd(),
});
process.exitCode = code;
