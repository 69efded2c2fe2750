/**
 * The browser-mode server on its own, over raw HTTP (no URL normalisation by a client): it serves
 * only files inside its folder with the right types and the CSP, binds loopback only, answers only
 * to its own host name, trades the printed address's key for a cookie, refuses the API without the
 * key, and validates API input. Served from a temp folder, not the real build.
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
/** JSON with this launch's key, as a client that is not a browser sends it. */
const keyed = (): Record<string, string> => ({ ...json, 'X-Lamina-Key': server.key });

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
    const withKey = keyed();
    const ok = await raw('POST', '/api/app-info', { body: '{}', headers: withKey });
    expect(ok.status).toBe(200);
    expect(JSON.parse(ok.body)).toEqual({ name: 'Lamina', version: expect.stringMatching(/^\d+\.\d+\.\d+/) });

    const extra = await raw('POST', '/api/app-info', { body: '{"path":"/etc"}', headers: withKey });
    expect(extra.status).toBe(400);
    expect(JSON.parse(extra.body)).toEqual({ error: 'The app:info request takes no fields, but it was sent "path".', field: 'path' });

    const notJson = await raw('POST', '/api/app-info', { body: '{', headers: withKey });
    expect(JSON.parse(notJson.body)).toEqual({ error: 'The request body is not valid JSON.' });

    const array = await raw('POST', '/api/app-info', { body: '[]', headers: withKey });
    expect(JSON.parse(array.body)).toEqual({ error: 'The app:info request must be an empty JSON object.', field: 'request' });

    // A plain HTML form can post text/plain across origins; the API takes JSON only.
    expect((await raw('POST', '/api/app-info', { body: 'a=1', headers: { ...withKey, 'Content-Type': 'text/plain' } })).status).toBe(415);
    expect((await raw('POST', '/api/app-info', { body: '{}', headers: { ...withKey, Origin: 'http://evil.example' } })).status).toBe(403);
    expect((await raw('GET', '/api/app-info', { headers: withKey })).status).toBe(405);
    expect((await raw('POST', '/api/no-such-thing', { body: '{}', headers: withKey })).status).toBe(404);
  });

  it('prints an address with a 256-bit key and trades it for an HttpOnly, SameSite=Strict cookie on /', async () => {
    expect(server.url).toBe(`http://127.0.0.1:${server.port}/?k=${server.key}`);
    expect(server.key).toMatch(/^[A-Za-z0-9_-]{43}$/); // 32 random bytes in base64url
    for (const method of ['GET', 'HEAD']) {
      const traded = await raw(method, `/?k=${server.key}`);
      expect(traded.status, method).toBe(303);
      expect(traded.headers.location).toBe('/');
      expect(traded.headers['set-cookie']).toEqual([`lamina-key-${server.port}=${server.key}; Path=/; HttpOnly; SameSite=Strict`]);
      expect(traded.headers['cache-control']).toBe('no-store');
      expect(traded.headers['referrer-policy']).toBe('no-referrer');
    }
    const cookie = { Cookie: `other=1; lamina-key-${server.port}=${server.key}` };
    const withCookie = await raw('POST', '/api/app-info', { body: '{}', headers: { ...json, ...cookie } });
    expect(withCookie.status).toBe(200);
    expect(JSON.parse(withCookie.body)).toMatchObject({ name: 'Lamina' });
  });

  it('refuses a wrong or earlier address, and the API without a valid key, in one sentence', async () => {
    const wrongAddress = 'This address is from an earlier launch of Lamina or is wrong: open the address Lamina printed when it last started.';
    const sameLength = server.key.replace(/^./, (first) => (first === 'A' ? 'B' : 'A'));
    for (const wrong of [sameLength, server.key.slice(1), '']) {
      const answer = await raw('GET', `/?k=${wrong}`);
      expect({ wrong, status: answer.status, body: answer.body, cookie: answer.headers['set-cookie'] }).toEqual({ wrong, status: 401, body: wrongAddress, cookie: undefined });
    }
    const noKey = {
      error: 'This request carries no valid key for this launch of Lamina: open the address Lamina printed when it started (it ends in ?k=…), or send that key in the X-Lamina-Key header.',
    };
    const attempts: Record<string, string>[] = [
      json,
      { ...json, Cookie: `lamina-key-${server.port}=${sameLength}` },
      // The cookie of a Lamina server on another port is not this one's.
      { ...json, Cookie: `lamina-key-${server.port + 1}=${server.key}` },
      { ...json, 'X-Lamina-Key': sameLength },
      { ...json, Origin: `http://127.0.0.1:${server.port}` },
    ];
    for (const headers of attempts) {
      const answer = await raw('POST', '/api/projects-create', { body: '{"fields":{"name":"Depot annex"}}', headers });
      expect({ headers, status: answer.status, body: JSON.parse(answer.body) }).toEqual({ headers, status: 401, body: noKey });
    }
    // The page's files hold no data and load without the key; the data does not.
    expect((await raw('GET', '/')).status).toBe(200);
    const projects = await raw('POST', '/api/projects-list', { body: '{}', headers: keyed() });
    expect(JSON.parse(projects.body)).toEqual([]);
  });
});
