import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach } from 'vitest';

/** A fresh temporary folder per call, removed after the test. Real files, no mocks. */
const made: string[] = [];
afterEach(() => {
  for (const dir of made.splice(0)) {
    try {
      fs.chmodSync(dir, 0o755);
    } catch {}
    fs.rmSync(dir, { recursive: true, force: true });
  }
});

export function tempFolder(): string {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'lamina-storage-'));
  made.push(dir);
  return dir;
}

export function tempDatabasePath(): string {
  return path.join(tempFolder(), 'lamina.sqlite');
}
