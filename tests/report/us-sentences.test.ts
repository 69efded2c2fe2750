/**
 * Every sentence of a solved case reads in the project's units. Each example in data/examples,
 * solved with unitSystem 'IP', has no SI unit of a converted kind in any sentence a person reads:
 * the subject, each verdict's reason and margin, figure labels and notes, paragraphs, assumptions,
 * warnings and cautions. Checked units: °C, K (a temperature difference), W/m, W/m², W, W/(m·K),
 * W/(m²·K), m²·K/W, mm, m, m², m/s, kWh, Pa, kg/m², kg/m³ and g/(m²·day). Material and layer names
 * are the user's words ("plywood sheathing, 500 kg/m³") and are taken out before looking. The
 * sources are left out: they quote standards and data files as those state them.
 *
 * With the SI default, or 'SI' given, the report is the same text as before, and the result's
 * numbers are the same in both systems: only sentences change.
 */
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { renderReportText, solveCase, type CaseReport } from '../../app/index.js';
import { caseContext } from '../../main/cases/case-context.js';

const root = path.resolve(__dirname, '..', '..');
const examples = readdirSync(path.join(root, 'data', 'examples')).filter((f) => f.endsWith('.json'));
const read = (file: string): unknown => JSON.parse(readFileSync(path.join(root, 'data', 'examples', file), 'utf8'));

/** SI units of kinds that have a US unit (app/base/unit-systems); each pattern names the unit it finds. */
const SI_UNITS: readonly (readonly [string, RegExp])[] = [
  ['°C', /°C/],
  ['K', /\d K\b/],
  ['W/m, W/m²', / W\/m/],
  ['W', /\d W\b/],
  ['W/(m·K), W/(m²·K)', /W\/\(m/],
  ['m²·K/W', /m²·K\/W/],
  ['mm', /\d mm\b/],
  ['m', /\d m\b/],
  ['m²', /\bm²/],
  ['m/s', /m\/s/],
  ['kWh', /kWh/],
  ['Pa', /\d Pa\b/],
  ['kg/m², kg/m³', /kg\/m/],
  ['g/(m²·day)', /g\/\(m²/],
];

/** Every sentence and label of a report a person reads, with where it is. */
function sentencesOf(report: CaseReport): [string, string][] {
  const out: [string, string][] = [['subject', report.subject]];
  const figures = (where: string, list: CaseReport['keyFigures']) =>
    list.forEach((f) => {
      out.push([`${where} label`, f.label]);
      if (f.note) out.push([`${where} note`, f.note]);
    });
  figures('key figure', report.keyFigures);
  for (const v of report.verdicts) {
    out.push([`${v.check} reason`, v.reason]);
    if (v.margin) out.push([`${v.check} margin`, v.margin]);
    if (v.caution) out.push([`${v.check} caution`, v.caution]);
  }
  for (const section of report.sections) {
    for (const block of section.blocks) {
      if (block.kind === 'paragraphs') block.paragraphs.forEach((p) => out.push([`${section.id} paragraph`, p]));
      if (block.kind === 'figures') figures(section.id, block.figures);
      if (block.kind === 'table') out.push([`${section.id} table title`, block.table.title], ...block.table.columns.map((c): [string, string] => [`${section.id} column`, c.label]));
      if (block.kind === 'chart') out.push([`${section.id} chart`, `${block.chart.title}; ${block.chart.x.label}; ${block.chart.y.label}`]);
    }
  }
  report.assumptions.forEach((a) => out.push(['assumption', a]));
  report.warnings.forEach((w) => out.push(['warning', w]));
  report.cautions.forEach((c) => out.push(['caution', c]));
  return out;
}

/** Every "name" string in the solved input: material and layer names as the user wrote them. */
function namesIn(value: unknown, out: Set<string> = new Set()): Set<string> {
  if (Array.isArray(value)) value.forEach((v) => namesIn(v, out));
  else if (value !== null && typeof value === 'object') {
    for (const [key, v] of Object.entries(value)) {
      if (key === 'name' && typeof v === 'string') out.add(v.toLowerCase());
      else namesIn(v, out);
    }
  }
  return out;
}

/** The sentence, its case kept (°C, Pa), with each name taken out whatever its case ("plywood" in "Plywood sheathing"). */
function withoutNames(sentence: string, names: Set<string>): string {
  let text = sentence;
  // Longest first, so a name that contains another is taken out whole.
  for (const name of [...names].sort((a, b) => b.length - a.length)) {
    text = text.replace(new RegExp(name.replace(/[.*+?^${}()|[\]\\]/g, '\\$&'), 'gi'), '');
  }
  return text;
}

describe('a US project reads every sentence in US units', () => {
  for (const file of examples) {
    it(`${file}: no SI unit of a converted kind in any sentence`, () => {
      const solved = solveCase(read(file), { ...caseContext(null), unitSystem: 'IP' });
      const names = namesIn(solved.input);
      const found = sentencesOf(solved.report).flatMap(([where, sentence]) => {
        const text = withoutNames(sentence, names);
        return SI_UNITS.filter(([, pattern]) => pattern.test(text)).map(([unit]) => `${where}: ${unit} in "${sentence}"`);
      });
      expect(found).toEqual([]);
    });
  }

  it('the hot-water pipe: the condensation margin is the SI margin in °F, without the 32 °F offset', () => {
    const json = read('pipe-hot-water-plant-room.json');
    const si = solveCase(json, caseContext(null));
    const us = solveCase(json, { ...caseContext(null), unitSystem: 'IP' });
    const check = si.checks.find((c) => c.check === 'surface-condensation')!;
    const siVerdict = si.report.verdicts.find((v) => v.check === 'surface-condensation')!;
    const usVerdict = us.report.verdicts.find((v) => v.check === 'surface-condensation')!;
    expect(siVerdict.margin).toBe('18.6 K above the dew point');
    // A temperature difference of 1 K is exactly 9/5 °F (NIST SP 811, Appendix B: ΔT 1 °F = 5/9 K).
    const expected = `${(check.margin!.value * 1.8).toFixed(1)} °F above the dew point`;
    expect(expected).toBe('33.5 °F above the dew point');
    expect(usVerdict.margin).toBe(expected);
    // A temperature, by contrast, carries the offset: θ_F = 1.8·θ_C + 32 (NIST SP 811, Appendix B).
    const surface = (si.result as { surfaceTemperature: number }).surfaceTemperature;
    expect(usVerdict.reason).toContain(`the surface, at ${(surface * 1.8 + 32).toFixed(1)} °F, is ${expected.replace(' the dew point', '')}`);
  });

  it('the chilled-water pipe: the touch limit of 60 °C reads 140.0 °F and the key figure is per foot', () => {
    const us = solveCase(read('pipe-chilled-water.json'), { ...caseContext(null), unitSystem: 'IP' });
    // 60 °C = 60 × 1.8 + 32 = 140 °F (NIST SP 811, Appendix B).
    expect(us.report.verdicts.find((v) => v.check === 'personnel-protection')!.reason).toContain('the touch limit of 140.0 °F');
    // Its figure is in Btu/(h·ft), so its label names the foot (app/base/unit-systems).
    expect(us.report.keyFigures[0]!.label).toBe('Heat gain per foot');
  });
});

/** The value with every string replaced by one marker: the numbers and the shape, not the sentences. */
function withoutText(value: unknown): unknown {
  if (typeof value === 'string') return '(text)';
  if (Array.isArray(value)) return value.map(withoutText);
  if (value !== null && typeof value === 'object') return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, withoutText(v)]));
  return value;
}

describe('an SI project reads as before', () => {
  for (const file of examples) {
    it(`${file}: 'SI' gives the default's report and both systems give the same result`, () => {
      const json = read(file);
      const byDefault = solveCase(json, caseContext(null));
      const si = solveCase(json, { ...caseContext(null), unitSystem: 'SI' });
      const us = solveCase(json, { ...caseContext(null), unitSystem: 'IP' });
      expect(renderReportText(si.report)).toBe(renderReportText(byDefault.report));
      expect(si).toEqual(byDefault);
      expect(withoutText(us.result)).toEqual(withoutText(si.result));
      expect(us.checks.map((c) => c.margin)).toEqual(si.checks.map((c) => c.margin));
      expect(us.report.keyFigures.map((f) => f.value)).toEqual(si.report.keyFigures.map((f) => f.value));
    });
  }
});
