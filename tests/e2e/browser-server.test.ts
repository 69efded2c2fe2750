/**
 * The browser-mode server on its own, over raw HTTP (no URL normalisation by a client): it serves
 * only files inside its folder with the right types and the CSP, binds loopback only, answers only
 * to its own host name, and validates API input. Served from a temp folder, not the real build.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import http from 'node:http';
import { mkdtempSync, mkdirSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { startBrowserServer, type BrowserServer } from '../../main/server/browser-server.js';
import { CONTENT_SECURITY_POLICY } from '../../main/server/security-policy.js';

let folder: string;
let server: BrowserServer;

interface RawResponse {
  status: number;
  headers: http.IncomingHttpHeaders;
  body: string;
}

/** One request with the path sent exactly as written. */
function raw(method: string, requestPath: string, options: { body?: string; headers?: Record<string, string> } = {}): Promise<RawResponse> {
  return new Promise((resolve, reject) => {
    const request = http.request(
      { host: '127.0.0.1', port: server.port, method, path: requestPath, headers: options.headers },
      (response) => {
        let body = '';
        response.setEncoding('utf8');
        response.on('data', (chunk: string) => (body += chunk));
        response.on('end', () => resolve({ status: response.statusCode ?? 0, headers: response.headers, body }));
      },
    );
    request.on('error', reject);
    request.end(options.body);
  });
}

const json = { 'Content-Type': 'application/json' };

beforeAll(async () => {
  folder = mkdtempSync(path.join(tmpdir(), 'lamina-server-'));
  const site = path.join(folder, 'site');
  mkdirSync(path.join(site, 'assets'), { recursive: true });
  writeFileSync(path.join(site, 'index.html'), '<!doctype html><title>t</title>');
  writeFileSync(path.join(site, 'assets', 'app.js'), 'export {};');
  writeFileSync(path.join(site, 'assets', 'app.css'), 'body{}');
  writeFileSync(path.join(site, 'assets', 'notes.xyz'), 'unknown type');
  writeFileSync(path.join(folder, 'secret.txt'), 'outside the served folder');
  symlinkSync(path.join(folder, 'secret.txt'), path.join(site, 'link.txt'));
  server = await startBrowserServer({ port: 0, root: site, databasePath: path.join(folder, 'db', 'lamina.sqlite'), dailyBackups: false });
});

afterAll(async () => {
  await server?.close();
  rmSync(folder, { recursive: true, force: true });
});

describe('browser-mode server', () => {
  it('binds 127.0.0.1 and refuses to listen on a network address', async () => {
    expect(server.host).toBe('127.0.0.1');
    await expect(startBrowserServer({ port: 0, host: '0.0.0.0', root: folder, databasePath: path.join(folder, 'unused.sqlite') })).rejects.toThrow(
      'The host must be a loopback address (127.0.0.1 or ::1), not "0.0.0.0"; Lamina never listens on a network.',
    );
  });

  it('serves the page and assets with their MIME types and the CSP', async () => {
    const page = await raw('GET', '/');
    expect(page.status).toBe(200);
    expect(page.headers['content-type']).toBe('text/html; charset=utf-8');
    expect(page.headers['content-security-policy']).toBe(CONTENT_SECURITY_POLICY);
    expect(page.headers['x-content-type-options']).toBe('nosniff');
    expect((await raw('GET', '/assets/app.js')).headers['content-type']).toBe('text/javascript; charset=utf-8');
    expect((await raw('GET', '/assets/app.css')).headers['content-type']).toBe('text/css; charset=utf-8');
    expect((await raw('GET', '/assets/notes.xyz')).status).toBe(404);
  });

  it('refuses path traversal, encoded or not, and links that lead outside', async () => {
    for (const attempt of ['/../secret.txt', '/%2e%2e/secret.txt', '/..%2fsecret.txt', '/assets/..%2f..%2fsecret.txt', '/%00index.html', '/link.txt']) {
      const response = await raw('GET', attempt);
      expect(response.status, attempt).toBe(404);
      expect(response.body).not.toContain('outside the served folder');
    }
  });

  it('answers only to its own host name (no DNS rebinding)', async () => {
    const response = await raw('GET', '/', { headers: { Host: 'lamina.example.com' } });
    expect(response.status).toBe(403);
  });

  it('answers POST /api/app-info with the name and version, and validates the input', async () => {
    const ok = await raw('POST', '/api/app-info', { body: '{}', headers: json });
    expect(ok.status).toBe(200);
    expect(JSON.parse(ok.body)).toEqual({ name: 'Lamina', version: expect.stringMatching(/^\d+\.\d+\.\d+/) });

    const extra = await raw('POST', '/api/app-info', { body: '{"path":"/etc"}', headers: json });
    expect(extra.status).toBe(400);
    expect(JSON.parse(extra.body)).toEqual({ error: 'The app:info request takes no fields, but it was sent "path".' });

    const notJson = await raw('POST', '/api/app-info', { body: '{', headers: json });
    expect(JSON.parse(notJson.body)).toEqual({ error: 'The request body is not valid JSON.' });

    const array = await raw('POST', '/api/app-info', { body: '[]', headers: json });
    expect(JSON.parse(array.body)).toEqual({ error: 'The app:info request must be an empty JSON object.' });

    // A plain HTML form can post text/plain across origins; the API takes JSON only.
    expect((await raw('POST', '/api/app-info', { body: 'a=1', headers: { 'Content-Type': 'text/plain' } })).status).toBe(415);
    expect((await raw('POST', '/api/app-info', { body: '{}', headers: { ...json, Origin: 'http://evil.example' } })).status).toBe(403);
    expect((await raw('GET', '/api/app-info')).status).toBe(405);
    expect((await raw('POST', '/api/no-such-thing', { body: '{}', headers: json })).status).toBe(404);
  });
});
