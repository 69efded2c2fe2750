/**
 * Every example case through its report builder: the key figures are the solved result's own
 * numbers, every check of the result appears as a verdict, no text carries "NaN", "undefined" or
 * "Infinity", verdicts speak without provenance (that lives in the sources), and the plain-text
 * rendering ends with each caution once.
 */
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { conductionReport } from '../../app/cases/conduction/conduction-report.js';
import { parseConductionCaseFile } from '../../app/cases/conduction/conduction-case-file.js';
import { conductionWarnings } from '../../app/cases/conduction/conduction-warnings.js';
import { flatReport } from '../../app/cases/flat/flat-report.js';
import { parseFlatCaseFile } from '../../app/cases/flat/flat-case-file.js';
import { calculateFlatSurface } from '../../app/cases/flat/flat-surface-calculation.js';
import { calculatePipe } from '../../app/cases/pipe/pipe-calculation.js';
import { parsePipeCaseFile } from '../../app/cases/pipe/pipe-case-file.js';
import { pipeReport } from '../../app/cases/pipe/pipe-report.js';
import { resolvePipeSizeInCase } from '../../app/cases/pipe/pipe-sizes.js';
import { analyseWall } from '../../app/cases/wall/wall-analysis.js';
import { parseWallCaseFile } from '../../app/cases/wall/wall-case-file.js';
import { wallReport } from '../../app/cases/wall/wall-report.js';
import type { CheckResult } from '../../app/checks/check-result.js';
import { solveSteady, solveTransient } from '../../app/fe/index.js';
import { renderReportText } from '../../app/report/render-text.js';
import { tableCellTexts } from '../../app/report/format-quantity.js';
import type { CaseReport } from '../../app/report/report-model.js';
import { pipeSizeCatalogue } from '../../main/pipe-sizes/pipe-size-catalogue.js';

const EXAMPLES = path.resolve(import.meta.dirname, '../../data/examples');
const read = (file: string): unknown => JSON.parse(readFileSync(path.join(EXAMPLES, file), 'utf8'));
const noLibrary = () => undefined;
const examples = (kind: string) => readdirSync(EXAMPLES).filter((f) => f.startsWith(`${kind}-`));

/** Every string in the report, wherever it sits. */
function strings(value: unknown): string[] {
  if (typeof value === 'string') return [value];
  if (Array.isArray(value)) return value.flatMap(strings);
  if (typeof value === 'object' && value !== null) return Object.values(value).flatMap(strings);
  return [];
}

function numbers(value: unknown): number[] {
  if (typeof value === 'number') return [value];
  if (Array.isArray(value)) return value.flatMap(numbers);
  if (typeof value === 'object' && value !== null) return Object.values(value).flatMap(numbers);
  return [];
}

/** What every report must hold, whatever its kind. */
function expectSoundReport(report: CaseReport, checks: readonly CheckResult[]): string {
  expect(report.verdicts.map((v) => [v.check, v.verdict, v.title])).toEqual(checks.map((c) => [c.check, c.verdict, c.title]));
  for (const s of strings(report)) expect(s).not.toMatch(/NaN|undefined|Infinity/);
  // Each table column in one notation: its non-zero numbers all plain or all "× 10ⁿ".
  for (const table of report.sections.flatMap((sec) => sec.blocks.flatMap((b) => (b.kind === 'table' ? [b.table] : [])))) {
    const cells = tableCellTexts(table);
    table.columns.forEach((_, j) => {
      const forms = new Set(cells.filter((r, i) => typeof table.rows[i]![j] !== 'string' && !['0', '—'].includes(r[j]!)).map((r) => r[j]!.includes('× 10')));
      expect(forms.size, `${table.title}, column ${j}`).toBeLessThanOrEqual(1);
    });
  }
  // A report speaks in words, never in case-file paths ("from jacket.material.emissivity").
  for (const s of strings(report)) expect(s).not.toMatch(/\b(?:jacket|pipe|wall|ambient|inner|inside|outside|moisture|surfaceMethod|layers\[\d+\])\.[a-zA-Z]/);
  for (const n of numbers(report)) expect(Number.isFinite(n)).toBe(true);
  // JSON-serialisable plain data: a round trip changes nothing.
  expect(JSON.parse(JSON.stringify(report))).toEqual(report);
  for (const v of report.verdicts) expect(`${v.margin ?? ''} ${v.reason}`).not.toMatch(/from memory|confidence|no source/i);
  const cautions = [...new Set(checks.flatMap((c) => (c.caution ? [c.caution] : [])))];
  if (checks.length > 0) expect(report.cautions).toEqual(cautions);
  expect(new Set(report.cautions).size).toBe(report.cautions.length);

  const text = renderReportText(report);
  expect(text).not.toMatch(/NaN|undefined|Infinity/);
  // Negative numbers carry the true minus sign, never a hyphen.
  expect(text).not.toMatch(/(^|[\s(])-\d/m);
  const at = text.lastIndexOf('\nCautions\n');
  expect(at).toBeGreaterThan(text.lastIndexOf('\nSources\n'));
  const tail = text.slice(at + '\nCautions\n'.length).replace(/\s+/g, ' ').trim();
  expect(tail).toBe(report.cautions.map((c) => `• ${c}`).join(' '));
  for (const c of report.cautions) expect(text.split(c.slice(0, 40)).length - 1).toBe(1);
  return text;
}

/**
 * The build-up section's cross-section: the same layers, thicknesses and face temperatures as the
 * solved result, and a pointer to a table of the same report that lists them.
 */
function expectCrossSection(report: CaseReport, sectionId: string, layers: readonly { thickness: number }[], temperatures: readonly (number | null)[]) {
  const section = report.sections.find((s) => s.id === sectionId)!;
  const blocks = section.blocks.filter((b) => b.kind === 'cross-section');
  expect(blocks).toHaveLength(1);
  const drawing = blocks[0]!.kind === 'cross-section' ? blocks[0]!.crossSection : undefined;
  expect(drawing!.layers.map((l) => l.thickness)).toEqual(layers.map((l) => l.thickness));
  expect(drawing!.temperatures).toEqual(temperatures);
  const tables = report.sections.flatMap((s) => s.blocks.flatMap((b) => (b.kind === 'table' ? [b.table.title] : [])));
  expect(tables).toContain(drawing!.tabulatedIn);
  return drawing!;
}

const faceTemperatures = (layers: readonly { innerTemperature: number; outerTemperature: number }[]) => [layers[0]!.innerTemperature, ...layers.map((l) => l.outerTemperature)];

const figure = (report: CaseReport, label: string | RegExp) => {
  const found = report.keyFigures.find((f) => (typeof label === 'string' ? f.label === label : label.test(f.label)));
  expect(found, `key figure ${String(label)}`).toBeDefined();
  return found!.value;
};

describe('pipe reports', () => {
  it.each(examples('pipe'))('%s', (file) => {
    const sized = resolvePipeSizeInCase(read(file), pipeSizeCatalogue());
    const input = parsePipeCaseFile(sized.json, noLibrary);
    const result = calculatePipe(input);
    const report = pipeReport({ ...input, pipeSize: sized.size }, result);
    expect(figure(report, /^Heat (loss|gain) per metre$/)).toBe(Math.abs(result.heatLossPerMetre));
    expect(figure(report, /^Heat (loss|gain) over the whole run$/)).toBe(Math.abs(result.heatLoss));
    expect(figure(report, 'Outer surface temperature')).toBe(result.surfaceTemperature);
    expect(figure(report, /^Heat flow density (from|into) the outer surface$/)).toBe(Math.abs(result.heatFlowDensityAtSurface));
    expect(figure(report, /^Energy (lost|gained) per year$/)).toBe(Math.abs(result.annualEnergy));
    const checks = [result.checks.surfaceCondensation, result.checks.personnelProtection, result.checks.serviceTemperature];
    const text = expectSoundReport(report, checks);
    // Margins in words with their unit and reference.
    const dew = result.checks.surfaceCondensation.margin!.value;
    expect(report.verdicts[0]!.margin).toBe(`${Math.abs(dew).toFixed(1)} K ${dew > 0 ? 'above' : 'below'} the dew point`);
    expect(report.verdicts[1]!.margin).toMatch(/^\d+\.\d K (below|above) the touch limit$/);
    expect(report.verdicts[2]!.margin).toMatch(/^\d+\.\d K (below the upper|above the lower) service limit of /);
    expect(report.energyBalance.relativeResidual).toBe(result.energyBalance.relativeResidual);
    expect(text).not.toMatch(/allowed −|− to/);
    // Where the outer surface's emissivity came from, in words.
    expect(text).toMatch(/Emissivity of the outer surface +0\.\d\d +\((the value of the jacket's material|as given for the jacket surface|the value of the material of layer \d+, with no jacket over it)\)\n/);
    // Rings round the bore: the pipe wall's inner radius, then the pipe wall, insulation and jacket by material category.
    const drawing = expectCrossSection(report, 'build-up', result.layers, faceTemperatures(result.layers));
    expect(drawing.geometry === 'cylinder' && drawing.innerRadius).toBe(input.pipe.outerDiameter / 2 - input.pipe.wallThickness);
    expect(drawing.layers.map((l) => l.category)).toEqual([input.pipe.material, ...input.layers.map((l) => l.material), ...(input.jacket ? [input.jacket.material] : [])].map((m) => m.category));
  });

  it('the steam main is judged against the upper service limit of its rock wool', () => {
    const sized = resolvePipeSizeInCase(read('pipe-steam-outdoor.json'), pipeSizeCatalogue());
    const input = parsePipeCaseFile(sized.json, noLibrary);
    const result = calculatePipe(input);
    const report = pipeReport({ ...input, pipeSize: sized.size }, result);
    // 300 °C limit (the example's material data) − the 180 °C hot face of the first layer.
    const hottest = result.layers[1]!.innerTemperature;
    expect(report.verdicts[2]!.margin).toBe(`${(300 - hottest).toFixed(1)} K below the upper service limit of insulation layer 1 (Rock wool pipe section (demo))`);
    expect(report.subject).toMatch(/^Horizontal pipe, 168\.3 × 7\.1 mm of Carbon steel \(demo\) \(NPS 6\)/);
    expect(report.sources.some((s) => s.startsWith('Pipe size NPS 6 from the steel-asme table'))).toBe(true);
  });
});

describe('flat-surface reports', () => {
  it.each(examples('flat'))('%s', (file) => {
    const input = parseFlatCaseFile(read(file), noLibrary);
    const result = calculateFlatSurface(input);
    const report = flatReport(input, result);
    expect(figure(report, /^Heat (loss|gain) per m² of surface$/)).toBe(Math.abs(result.heatFlowDensity));
    expect(figure(report, /^Heat (loss|gain) over the whole area$/)).toBe(Math.abs(result.heatLoss));
    expect(figure(report, 'Outer surface temperature')).toBe(result.surfaceTemperature);
    expect(figure(report, /^Energy (lost|gained) per year$/)).toBe(Math.abs(result.annualEnergy));
    expect(figure(report, 'Thermal resistance of the layers')).toBe(result.layerResistance);
    expectSoundReport(report, [result.checks.surfaceCondensation, result.checks.personnelProtection, result.checks.serviceTemperature]);
    const drawing = expectCrossSection(report, 'build-up', result.layers, faceTemperatures(result.layers));
    expect(drawing.geometry).toBe('plane');
    expect(drawing.layers.map((l) => l.category)).toEqual([...(input.wall ? [input.wall.material] : []), ...input.layers.map((l) => l.material), ...(input.jacket ? [input.jacket.material] : [])].map((m) => m.category));
  });
});

describe('conduction reports', () => {
  it.each(examples('conduction'))('%s', (file) => {
    const parsed = parseConductionCaseFile(read(file));
    if (parsed.analysis === 'steady') {
      const result = solveSteady(parsed.problem);
      const report = conductionReport(parsed.title, parsed.problem, 'steady', result, conductionWarnings(parsed.problem, result.positions, [result.temperatures]));
      expect(figure(report, 'Heat flow through the layers')).toBe(Math.abs(result.faces.inner.heatIn));
      expect(report.keyFigures.map((f) => f.value)).toContain(result.faces.outer.temperature);
      expect(report.energyBalance.residual).toBe(result.balance.residual);
      expectSoundReport(report, []);
    } else {
      const result = solveTransient(parsed.problem);
      const report = conductionReport(parsed.title, parsed.problem, 'transient', result, conductionWarnings(parsed.problem, result.positions, result.temperatures));
      expect(figure(report, /^Heat (taken up|given up) by the layers over the run$/)).toBe(Math.abs(result.balance.stored));
      expect(figure(report, 'Duration of the run')).toBe(result.times[result.times.length - 1]);
      expect(report.energyBalance.residual).toBe(result.balance.residual);
      expectSoundReport(report, []);
    }
  });

  it('names the faces by what they are: a pipe has inside and outside surfaces, a plane build-up exposed faces', () => {
    const pipe = parseConductionCaseFile(read('conduction-creamery-steam-main.json'));
    const pipeText = renderReportText(conductionReport(pipe.title, pipe.problem, 'steady', solveSteady(pipe.problem), []));
    expect(pipeText).toContain('inside surface of Steel pipe wall');
    expect(pipeText).toContain('outside surface of Aluminium jacket');
    expect(pipeText).toContain('between Steel pipe wall and Mineral wool pipe section (indicative)');
    // The cold store's x = 0 face is the warm side outside the store: never called the inside.
    const store = parseConductionCaseFile(read('conduction-cold-store-wall.json'));
    const storeText = renderReportText(conductionReport(store.title, store.problem, 'steady', solveSteady(store.problem), []));
    expect(storeText).toContain('exposed face of Steel skin, outer (x = 0)');
    expect(storeText).toContain('exposed face of Steel skin, inner');
    expect(storeText).not.toMatch(/inside|outside|Inner face|Interface \d/i);
    const unnamed = { ...store.problem, layers: store.problem.layers.map(({ name: _name, ...layer }) => layer) };
    expect(renderReportText(conductionReport('t', unnamed, 'steady', solveSteady(unnamed), []))).toContain('between layer 1 and layer 2');
  });
});

describe('wall reports', () => {
  it.each(examples('wall'))('%s', (file) => {
    const input = parseWallCaseFile(read(file), noLibrary);
    const analysis = analyseWall(input);
    const report = wallReport(input, analysis);
    const w = analysis.wall;
    expect(figure(report, 'U-value')).toBe(w.uValue);
    expect(report.keyFigures[0]!.note).toBe(`unrounded ${w.uValue.toPrecision(4)} W/(m²·K)`);
    expect(figure(report, 'Total thermal resistance R_T')).toBe(w.totalResistance);
    expect(figure(report, 'Inside surface temperature')).toBe(w.insideSurfaceTemperature);
    expect(figure(report, 'Heat flow density')).toBe(w.heatFlowDensity);
    const text = expectSoundReport(report, analysis.checks);
    // Both inside surface resistances appear, each said to be used by its part.
    expect(text).toContain(`R_si = ${w.insideSurfaceResistance.toFixed(3)} m²·K/W`);
    expect(text).toContain('The mould and inside-surface condensation checks use R_si = 0.250 m²·K/W');
    expect(report.verdicts[0]!.margin).toMatch(/^\d\.\d{3} (above|below) the required temperature factor$/);
    if (analysis.interstitialMonthly) expect(report.sections.map((s) => s.id)).toContain('monthly');
    // Every layer in the picture, counted or not; a face without a counted layer on either side has no temperature.
    const faces = [...w.layers.map((l, i) => l.innerTemperature ?? w.layers[i - 1]?.outerTemperature ?? null), w.layers[w.layers.length - 1]!.outerTemperature];
    const drawing = expectCrossSection(report, 'layers', w.layers, faces);
    expect(drawing.geometry).toBe('plane');
    expect(drawing.temperatures[0]).toBe(w.insideSurfaceTemperature);
    expect(drawing.layers.map((l) => l.category)).toEqual(input.layers.map((l) => ('material' in l ? l.material.category : 'air-layer')));
  });

  it('the humidity class provenance moves from the verdicts to the sources', () => {
    const input = parseWallCaseFile(read('wall-masonry-cavity.json'), noLibrary);
    const analysis = analyseWall(input);
    expect(analysis.mould.mould.reason).toMatch(/from memory, medium confidence/);
    const report = wallReport(input, analysis);
    expect(report.verdicts[0]!.reason).toMatch(/internal humidity class 3 with the 1\.1 safety factor\)/);
    expect(report.sources.some((s) => s.startsWith('Internal humidity classes:') && s.includes('from memory, medium confidence'))).toBe(true);
  });

  it('a wall that stays wet says how much is left after a year', () => {
    const input = parseWallCaseFile(read('wall-winter-condensation.json'), noLibrary);
    const analysis = analyseWall(input);
    const monthly = wallReport(input, analysis).verdicts[3]!;
    expect(monthly.verdict).toBe('fail');
    expect(monthly.margin).toBe(`${analysis.interstitialMonthly!.remainingAtEnd.toPrecision(3)} kg/m² still stored after twelve months`);
  });
});
