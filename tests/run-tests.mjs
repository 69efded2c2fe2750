#!/usr/bin/env node
/**
 * `npm test`: run Vitest once, with its usual console output and a JSON report in
 * test-results/vitest.json, then print the closing line CI reads, `N passed, N failed`, alone on
 * the last line. A test file that fails to import or collect counts as one failure, and so does a
 * run that Vitest itself fails (unhandled errors, no report written). Extra arguments go to Vitest
 * (e.g. `npm test -- tests/layers`).
 */
import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const projectRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const reportFile = path.join(projectRoot, 'test-results', 'vitest.json');
const vitest = path.join(projectRoot, 'node_modules', 'vitest', 'vitest.mjs');

mkdirSync(path.dirname(reportFile), { recursive: true });
rmSync(reportFile, { force: true });

const args = [
  vitest,
  'run',
  '--reporter=default',
  '--reporter=json',
  `--outputFile.json=${reportFile}`,
  ...process.argv.slice(2),
];

const exitCode = await new Promise((resolve) => {
  const child = spawn(process.execPath, args, { cwd: projectRoot, stdio: 'inherit' });
  child.on('error', (error) => {
    console.error(`Could not start Vitest: ${error.message}`);
    resolve(1);
  });
  child.on('close', (code, signal) => resolve(code ?? (signal ? 1 : 0)));
});

const { passed, failed } = countResults(exitCode);
console.log(`${passed} passed, ${failed} failed`);
process.exitCode = failed > 0 ? 1 : 0;

function countResults(vitestExitCode) {
  if (!existsSync(reportFile)) {
    console.error('Vitest wrote no JSON report; counting the whole run as one failure.');
    return { passed: 0, failed: 1 };
  }
  const report = JSON.parse(readFileSync(reportFile, 'utf8'));
  let passed = 0;
  let failed = 0;
  for (const file of report.testResults ?? []) {
    const assertions = file.assertionResults ?? [];
    passed += assertions.filter((a) => a.status === 'passed').length;
    const failedHere = assertions.filter((a) => a.status === 'failed').length;
    failed += failedHere;
    // A file that failed without a failed test never ran: it did not import or collect.
    if (file.status === 'failed' && failedHere === 0) {
      const name = path.relative(projectRoot, file.name ?? '?');
      console.error(`${name} failed to load: ${(file.message ?? '').split('\n')[0]}`);
      failed += 1;
    }
  }
  if (vitestExitCode !== 0 && failed === 0) {
    console.error(`Vitest exited with code ${vitestExitCode} although no test failed (unhandled error or no tests found); counting one failure.`);
    failed = 1;
  }
  return { passed, failed };
}
