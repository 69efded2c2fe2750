/**
 * `npm start` on a machine without Electron's binary (these machines): one line says so and gives
 * the address with this launch's key; the same UI is served in browser mode on 127.0.0.1, its API
 * only with the key; Ctrl-C stops it cleanly.
 */
import { spawn } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const root = path.resolve(__dirname, '..', '..');

describe('npm start without the Electron binary', () => {
  it('says so in one line with the keyed address, serves the page on 127.0.0.1 and stops on SIGINT', async () => {
    const db = path.join(mkdtempSync(path.join(tmpdir(), 'lamina-start-')), 'db.sqlite');
    const child = spawn(process.execPath, [path.join(root, 'main', 'start.mjs'), '--port', '0', '--db', db], { cwd: root, env: { ...process.env } });
    let output = '';
    child.stdout.on('data', (chunk: Buffer) => (output += chunk.toString()));
    const url = await new Promise<string>((resolve, reject) => {
      const timer = setTimeout(() => reject(new Error(`no notice within 60 s; output so far: ${output}`)), 60_000);
      child.stdout.on('data', () => {
        const match = /^Electron's binary is not installed here; serving Lamina in your browser at (http:\/\/127\.0\.0\.1:\d+\/\?k=[A-Za-z0-9_-]{43}) instead\.$/m.exec(output);
        if (match) {
          clearTimeout(timer);
          resolve(match[1]!);
        }
      });
      child.on('exit', (code) => reject(new Error(`npm start exited early (${code}): ${output}`)));
    });
    // The notice is the first line printed, after the one that says a download is being tried
    // (shown only when the attempt lasts longer than a moment, so it may or may not be there).
    const lines = output.split('\n').filter((line) => line !== "Downloading Electron's binary for the first start...");
    expect(lines[0]).toMatch(/^Electron's binary is not installed here/);
    const traded = await fetch(url, { redirect: 'manual' });
    expect(traded.status).toBe(303);
    expect(traded.headers.get('location')).toBe('/');
    const response = await fetch(url);
    expect(response.status).toBe(200);
    expect(response.url).toBe(`${new URL(url).origin}/`);
    expect(response.headers.get('content-security-policy')).toMatch(/default-src 'self'/);
    expect(await response.text()).toMatch(/<title>Lamina<\/title>/);
    const appInfo = new URL('/api/app-info', url);
    const key = new URL(url).searchParams.get('k')!;
    expect((await fetch(appInfo, { method: 'POST' })).status).toBe(401);
    const answer = await fetch(appInfo, { method: 'POST', headers: { 'X-Lamina-Key': key } });
    expect(answer.status).toBe(200);
    expect(await answer.json()).toMatchObject({ name: 'Lamina' });
    const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
    child.kill('SIGINT');
    expect(await exited).toBe(0);
  });
});
