#!/usr/bin/env node
// The `lamina` command. The CLI is written in TypeScript; tsx loads it without a build step.
import { tsImport } from 'tsx/esm/api';

const { runCli } = await tsImport('./lamina.ts', import.meta.url);
const code = await runCli(process.argv.slice(2), {
  stdout: (text) => process.stdout.write(text),
  stderr: (text) => process.stderr.write(text),
  env: process.env,
  cwd: process.cwd(),
});
process.exitCode = code;
