/**
 * Benchmark section: a 40-case project's report to PDF, as `lamina projects report` makes it,
 * split into the report model (every case solved), the standalone HTML document (fonts inlined)
 * and Chromium's PDF (layout and printing). Target under 5 s for the three (the goal),
 * reported, not asserted. Chromium's start is timed on its own: a person printing from the desktop
 * app has it running already. Run alone with `npx tsx tests/bench/report-bench.ts`.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { renderReportDocument } from '../../app/report/html/render-report.js';
import { reportAssets } from '../../main/report/report-assets.js';
import { ChromiumPrinter, findChromium } from '../../main/report/print-pdf.js';
import { demoProjectFile } from '../../main/services/demo-project.js';
import { openLamina } from '../../main/services/lamina-services.js';
import { projectReport } from '../../main/services/project-report-service.js';

const CASES = 40;

export async function reportBench(): Promise<void> {
  console.log(`4. A ${CASES}-case project's report to PDF (target under 5 s for model + HTML + PDF; reported, not asserted)`);
  const chromium = findChromium(process.env);
  if (!chromium) {
    console.log('   skipped: no Chromium (CHROMIUM_PATH, /usr/bin/chromium or chromium on PATH)\n');
    return;
  }
  const folder = fs.mkdtempSync(path.join(os.tmpdir(), 'lamina-report-bench-'));
  const lamina = await openLamina(path.join(folder, 'library.sqlite'));
  try {
    // The demo's six cases, repeated to 40 (each repeat a case of its own).
    const demo = demoProjectFile() as { cases: { name: string; inputs: unknown }[] } & Record<string, unknown>;
    const cases = Array.from({ length: CASES }, (_, i) => ({ ...demo.cases[i % demo.cases.length]!, name: `${demo.cases[i % demo.cases.length]!.name} (${i + 1})` }));
    const project = lamina.projects.importProject({ ...demo, cases }).project;
    const assets = reportAssets();
    const t0 = performance.now();
    const report = projectReport(lamina, project.id, 'Lamina bench');
    const t1 = performance.now();
    const html = renderReportDocument(report, assets);
    const t2 = performance.now();
    const printer = await ChromiumPrinter.open(chromium);
    const t3 = performance.now();
    try {
      const outcome = await printer.print(html, path.join(folder, 'report.pdf'));
      const t4 = performance.now();
      const pages = outcome.kind === 'pdf' ? outcome.pages : null;
      const s = (ms: number) => `${(ms / 1000).toFixed(2)} s`;
      console.log(`   report model (${CASES} cases solved)   ${s(t1 - t0).padStart(8)}`);
      console.log(`   HTML document (${(html.length / 1e6).toFixed(1)} MB)        ${s(t2 - t1).padStart(8)}`);
      console.log(`   Chromium PDF (${pages ?? '?'} pages)         ${s(t4 - t3).padStart(8)}`);
      console.log(`   model + HTML + PDF              ${s(t1 - t0 + (t2 - t1) + (t4 - t3)).padStart(8)}   (target < 5 s)`);
      console.log(`   Chromium start (not counted)    ${s(t3 - t2).padStart(8)}\n`);
    } finally {
      await printer.close();
    }
  } finally {
    lamina.close();
    fs.rmSync(folder, { recursive: true, force: true });
  }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) await reportBench();
