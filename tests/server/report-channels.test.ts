/**
 * The report and letterhead channels over the browser-mode transport, against the real services
 * on a real SQLite file: the letterhead saved and read back (a logo with a script refused, naming
 * the logo), the report model of the demo project, and the PDF channel refused in browser mode
 * (the browser's own print saves the PDF there).
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { EMPTY_LETTERHEAD } from '../../app/report/project-report.js';
import { startBrowserServer, type BrowserServer } from '../../main/server/browser-server.js';
import { call, ok } from './api-client.js';

const running: BrowserServer[] = [];
const folders: string[] = [];

afterEach(async () => {
  for (const server of running.splice(0)) await server.close();
  for (const folder of folders.splice(0)) fs.rmSync(folder, { recursive: true, force: true });
});

async function serve(): Promise<BrowserServer> {
  const folder = fs.mkdtempSync(path.join(os.tmpdir(), 'lamina-api-report-'));
  folders.push(folder);
  fs.mkdirSync(path.join(folder, 'site'));
  fs.writeFileSync(path.join(folder, 'site', 'index.html'), '<!doctype html><title>t</title>');
  const server = await startBrowserServer({ port: 0, root: path.join(folder, 'site'), databasePath: path.join(folder, 'data', 'lamina.sqlite'), dailyBackups: false });
  running.push(server);
  return server;
}

const FIRM = { firmName: 'Brackwater Thermal Engineering Ltd (invented firm)', address: '12 Weir Street\nBrackwater', telephone: '', email: '', logo: null, paper: 'Letter' } as const;

describe('letterhead and report channels', () => {
  it('stores the letterhead, refuses a logo with a script, and reports a project with it', async () => {
    const { url } = await serve();
    expect(await ok(url, 'settings:letterhead', {})).toEqual(EMPTY_LETTERHEAD);
    expect(await ok(url, 'settings:save-letterhead', { letterhead: FIRM })).toEqual(FIRM);
    const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>').toString('base64');
    const refused = await call(url, 'settings:save-letterhead', { letterhead: { ...FIRM, logo: { mediaType: 'image/svg+xml', base64: svg } } });
    expect(refused.status).toBe(400);
    expect(refused.body).toEqual({ error: 'logo SVG must not contain a <script> element.', field: 'logo' });
    expect((await call(url, 'settings:save-letterhead', { letterhead: FIRM, extra: 1 })).status).toBe(400);
    expect(await ok(url, 'settings:letterhead', {})).toEqual(FIRM);

    const demo = await ok(url, 'projects:add-demo', {});
    await ok(url, 'projects:update', { id: demo.id, changes: { checker: 'M. Ferreira (invented)', revisionNote: 'Issued for comment' } });
    const report = await ok(url, 'projects:report', { id: demo.id });
    expect(report.letterhead).toEqual(FIRM);
    expect(report.project).toMatchObject({ reference: 'BTE-DEMO-001', checker: 'M. Ferreira (invented)', revisionNote: 'Issued for comment', unitSystem: 'SI' });
    expect(report.summary.map((s) => s.title)).toEqual(demo.cases.map((c) => c.name));
    expect(report.cases.every((c) => 'report' in c)).toBe(true);
    expect(report.footer).toBe('BTE-DEMO-001 revision A');
    expect(report.producedBy).toMatch(/^Lamina \d+\.\d+\.\d+/);

    const missing = await call(url, 'projects:report', { id: 9999 });
    expect(missing).toMatchObject({ status: 404, body: { error: 'There is no project with id 9999.' } });
    const pdf = await call(url, 'projects:save-report-pdf', { id: demo.id });
    expect(pdf.status).toBe(409);
    expect(pdf.body).toEqual({ error: "This window cannot save a PDF itself: open the project's report and use the browser's print (Print, then Save as PDF)." });
  });
});
