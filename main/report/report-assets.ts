/**
 * What a standalone report document needs inline (renderReportDocument's `css`): the print
 * stylesheet (data/report/report-print.css) and @font-face rules for Source Sans 3 (OFL-1.1, the
 * npm package @fontsource/source-sans-3) with every woff2 file as a data: URL, so the document
 * fetches nothing and prints the same on every machine (Electron's printToPDF, the command line's
 * Chromium). Read once per process: the fonts do not change while it runs.
 */
import fs from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

/** The checkout root (this file lives in main/report/); the packaged app passes its own. */
const DEFAULT_ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const FONT_PACKAGE = '@fontsource/source-sans-3';
const FONT_FAMILY = 'Source Sans 3';
/** Latin and Central European letters, and Greek for μ, λ, Δ in the engineering text. */
export const FONT_SUBSETS = ['latin', 'latin-ext', 'greek'] as const;
/** Body text, semibold headings and bold figures. */
export const FONT_WEIGHTS = [400, 600, 700] as const;

export interface ReportAssetsCss {
  readonly css: string;
}

const cache = new Map<string, ReportAssetsCss>();

/** `root` holds data/report/report-print.css (the checkout, or the app's own folder). */
export function reportAssets(root: string = DEFAULT_ROOT): ReportAssetsCss {
  const cached = cache.get(root);
  if (cached) return cached;
  const printCss = fs.readFileSync(path.join(root, 'data', 'report', 'report-print.css'), 'utf8');
  const assets = { css: `${fontFaceCss()}\n${printCss}` };
  cache.set(root, assets);
  return assets;
}

/** One @font-face per subset and weight, each limited to its subset's unicode-range as the package's own CSS is. */
export function fontFaceCss(): string {
  const require = createRequire(import.meta.url);
  const ranges = JSON.parse(fs.readFileSync(require.resolve(`${FONT_PACKAGE}/unicode.json`), 'utf8')) as Record<string, string>;
  const rules: string[] = [];
  for (const weight of FONT_WEIGHTS) {
    for (const subset of FONT_SUBSETS) {
      const file = require.resolve(`${FONT_PACKAGE}/files/source-sans-3-${subset}-${weight}-normal.woff2`);
      const range = ranges[subset];
      if (!range) throw new Error(`${FONT_PACKAGE} has no unicode-range for the ${subset} subset.`);
      rules.push(
        `@font-face { font-family: '${FONT_FAMILY}'; font-style: normal; font-weight: ${weight}; font-display: block; ` +
          `src: url(data:font/woff2;base64,${fs.readFileSync(file).toString('base64')}) format('woff2'); unicode-range: ${range}; }`,
      );
    }
  }
  return rules.join('\n');
}
