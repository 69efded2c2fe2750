/**
 * A schedule sized in one go against the criteria of its services, on a real library (SQLite in a
 * temporary folder): every chosen thickness meets its service's criteria and the next thinner of
 * the material's series (data/insulation-thickness-series.csv, read here) fails the one that
 * governs; a fixed thickness is kept; the bill of quantities adds up, computed here from the
 * schedule and the size tables (areas π·D_outer·L, volumes the annulus π/4·(D_outer² − D_pipe²)·L);
 * an edited run alone is sized again. The dew point is checked against psychrolib (ASHRAE).
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import psychrolib from 'psychrolib';
import { describe, expect, it } from 'vitest';
import { solveCase } from '../../app/index.js';
import type { PipeResult } from '../../app/cases/pipe/pipe-calculation.js';
import { runCase } from '../../app/schedules/schedule-run-case.js';
import type { ScheduleRun } from '../../app/schedules/schedule-model.js';
import type { KeyedSizedRun } from '../../app/schedules/size-schedule.js';
import { caseContext } from '../../main/cases/case-context.js';
import { projectReport } from '../../main/services/project-report-service.js';
import { projectFileFromJson, projectFileToJson } from '../../main/services/project-file.js';
import { renderReportBody } from '../../app/report/html/render-report.js';
import { SCHEDULE_CAUTION } from '../../app/schedules/schedule-report.js';
import { exampleCsv, root, tableOuterDiameter, useScheduleLibrary } from './schedule-fixture.js';

psychrolib.SetUnitSystem(psychrolib.SI);
const library = useScheduleLibrary();

/** Thicknesses (m) of a product family, from the shipped CSV. */
function series(family: string): number[] {
  return readFileSync(path.join(root, 'data', 'insulation-thickness-series.csv'), 'utf8').split('\n').slice(1)
    .filter((l) => l.startsWith(`${family},`)).map((l) => Number(l.split(',')[1]) / 1000).sort((a, b) => a - b);
}
const familyOf = (material: string) => (/rock wool/i.test(material) ? 'mineral wool pipe section' : /elastomeric/i.test(material) ? 'elastomeric foam tube' : '');

describe('a schedule sized in one go', () => {
  let runs: readonly ScheduleRun[] = [];
  let sized: Record<string, KeyedSizedRun> = {};
  const services = () => library.lamina().schedules;
  /** The run's pipe case solved at a thickness, as the schedule builds it. */
  const solvedAt = (run: ScheduleRun, thickness: number) => {
    const settings = services().settingsOf(library.projectId());
    const ids = services().materialIds();
    return solveCase(runCase(run, settings, (n) => ids[n], { thickness, withoutSizing: true }), caseContext(library.lamina().materials)).result as PipeResult;
  };

  it('imports the example schedule and sizes every run', () => {
    const outcome = services().importCsv(library.projectId(), exampleCsv);
    expect(outcome.ok).toBe(true);
    expect(services().size(library.projectId())).toEqual({ sized: 14, complete: true });
    const schedule = services().get(library.projectId());
    runs = schedule.runs;
    sized = schedule.sizing;
    expect(schedule.stale).toEqual([]);
    expect(Object.values(sized).every((s) => s.ok)).toBe(true);
  });

  it('each chosen thickness meets its criteria and the next thinner of its series fails the governing one', () => {
    const settings = services().settingsOf(library.projectId());
    for (const run of runs.filter((r) => r.thickness === null)) {
      const s = sized[run.reference]!;
      if (!s.ok) throw new Error(s.reason);
      expect(s.basis).toBe('chosen');
      const criteria = settings.services.find((x) => x.service === run.service)!.criteria as Record<string, { limit?: number; margin?: number }>;
      const air = run.location === 'outdoor' ? { t: run.airTemperature!, rh: run.relativeHumidity! } : (() => { const c = settings.conditionSets.find((x) => x.name === run.location)!; return { t: c.airTemperature, rh: c.relativeHumidity }; })();
      const dew = psychrolib.GetTDewPointFromRelHum(air.t, air.rh);
      const meets = (r: PipeResult) => (criteria['maxSurfaceTemperature'] ? r.surfaceTemperature <= criteria['maxSurfaceTemperature'].limit! : true) && (criteria['noCondensation'] ? r.surfaceTemperature - dew >= criteria['noCondensation'].margin! - 0.05 : true);
      // The engine's dew point and psychrolib's differ by a few hundredths of a kelvin (two saturation formulas).
      expect(meets(solvedAt(run, s.thickness))).toBe(true);
      const thicknesses = series(familyOf(s.material));
      const i = thicknesses.indexOf(s.thickness);
      expect(i).toBeGreaterThanOrEqual(0);
      if (i > 0) {
        const thinner = solvedAt(run, thicknesses[i - 1]!);
        expect(s.governing === 'maxSurfaceTemperature' ? thinner.surfaceTemperature > criteria['maxSurfaceTemperature']!.limit! : thinner.surfaceTemperature - dew < criteria['noCondensation']!.margin! + 0.05).toBe(true);
      }
      // The row's figures are those of the case solved at its thickness.
      expect(s.heatLossPerMetre).toBeCloseTo(solvedAt(run, s.thickness).heatLossPerMetre, 9);
    }
  });

  it('a run with a thickness fixed on the drawings is checked at it, not sized', () => {
    const fixed = runs.find((r) => r.thickness !== null)!;
    const s = sized[fixed.reference]!;
    expect(s.ok && s.basis).toBe('fixed');
    expect(s.ok && s.thickness).toBe(fixed.thickness);
  });

  it('the bill of quantities adds up: lengths per size, π·D_outer·L areas, annulus volumes, fittings', () => {
    const bill = services().bill(library.projectId());
    const allowance = { valves: 1.2, flanges: 0.6, bends: 0.5 }; // data/schedules/fitting-allowances.csv
    const key = (material: string, t: number, series: string, size: string) => `${material}|${t}|${series}|${size}`;
    const expected = new Map<string, { length: number; area: number; volume: number; valves: number; fittingLength: number }>();
    for (const run of runs) {
      const s = sized[run.reference]!;
      if (!s.ok) continue;
      const d = tableOuterDiameter(run.pipeSeries, run.pipeSize);
      const outer = d + 2 * s.thickness;
      const k = key(s.material, s.thickness, run.pipeSeries, run.pipeSize);
      const e = expected.get(k) ?? { length: 0, area: 0, volume: 0, valves: 0, fittingLength: 0 };
      expected.set(k, {
        length: e.length + run.length,
        area: e.area + Math.PI * outer * run.length,
        volume: e.volume + (Math.PI / 4) * (outer ** 2 - d ** 2) * run.length,
        valves: e.valves + run.fittings.valves,
        fittingLength: e.fittingLength + run.fittings.valves * allowance.valves + run.fittings.flanges * allowance.flanges + run.fittings.bends * allowance.bends,
      });
    }
    expect(bill.lines).toHaveLength(expected.size);
    for (const line of bill.lines) {
      const e = expected.get(key(line.material, line.thickness, line.pipeSeries, line.pipeSize))!;
      expect(line.length).toBeCloseTo(e.length, 9);
      expect(line.outerArea).toBeCloseTo(e.area, 9);
      expect(line.volume).toBeCloseTo(e.volume, 12);
      expect(line.fittings.valves).toBe(e.valves);
      expect(line.fittingLength).toBeCloseTo(e.fittingLength, 9);
    }
    expect(bill.lines.reduce((t, l) => t + l.length, 0)).toBeCloseTo(runs.reduce((t, r) => t + r.length, 0), 9);
    // The job: magnitudes of every run's heat flow; insulation lowers every run's.
    const ok = Object.values(sized).filter((s): s is Extract<KeyedSizedRun, { ok: true }> => s.ok);
    expect(bill.job.heatLoss).toBeCloseTo(ok.reduce((t, s) => t + Math.abs(s.heatLoss), 0), 6);
    for (const s of ok) expect(Math.abs(s.heatLoss)).toBeLessThan(Math.abs(s.bareHeatLoss));
    const heating = bill.services.find((s) => s.service === 'heating flow')!;
    expect(heating.runs).toBe(runs.filter((r) => r.service === 'heating flow').length);
    expect(bill.notSized).toEqual([]);
  });

  it('the printed report carries the schedule and the bill after the cases, and the schedule caution', () => {
    const report = projectReport(library.lamina(), library.projectId(), 'Lamina test');
    expect(report.schedule!.map((s) => s.heading)).toEqual(['Schedule of pipe runs', 'Bill of quantities']);
    const runsTable = report.schedule![0]!.blocks.find((b) => b.kind === 'table');
    expect(runsTable?.kind === 'table' && runsTable.table.rows.map((r) => r[0])).toEqual(runs.map((r) => r.reference));
    expect(report.cautions).toContain(SCHEDULE_CAUTION);
    const html = renderReportBody(report);
    expect(html).toContain('Bill of quantities');
    expect(html).toContain('and the schedule of pipe runs with its bill of quantities, in SI units');
    expect(html).toContain('The job');
    expect(html).not.toMatch(/NaN|undefined|Infinity/);
  });

  it('an edited run alone is sized again', () => {
    const run = runs[2]!;
    services().updateRun(library.projectId(), run.reference, { ...run, fluidTemperature: 90 });
    expect(services().get(library.projectId()).stale).toEqual([run.reference]);
    expect(services().size(library.projectId())).toEqual({ sized: 1, complete: true });
    expect(services().get(library.projectId()).stale).toEqual([]);
  });

  it('an edit the engine refuses names the column and changes nothing', () => {
    const run = runs[0]!;
    expect(() => services().updateRun(library.projectId(), run.reference, { ...run, length: -3 })).toThrow('length [m] must be above 0 and at most 100000 (got -3).');
    expect(() => services().updateRun(library.projectId(), run.reference, { ...run, location: 'Roof' })).toThrow(/^location 'Roof' is neither indoor, outdoor nor a condition set of the project/);
    expect(services().get(library.projectId()).runs[0]).toEqual(run);
  });

  it('the schedule travels with the project: its file (runs and settings) and its duplicate', () => {
    const projects = library.lamina().projects;
    const text = projectFileToJson(projects.exportProject(library.projectId()));
    const file = JSON.parse(text);
    expect(file.schedule.runs).toEqual(services().get(library.projectId()).runs);
    const imported = projects.importProject(projectFileFromJson(text), 'copy').project;
    expect(services().get(imported.id).runs).toEqual(services().get(library.projectId()).runs);
    const copy = projects.duplicate(library.projectId());
    expect(services().get(copy.id).runs).toEqual(services().get(library.projectId()).runs);
    expect(services().get(copy.id).stale).toEqual(services().get(library.projectId()).stale);
    // A file with a bad run is refused whole, naming the run and the field.
    file.schedule.runs[1].length = 0;
    expect(() => projects.importProject(projectFileFromJson(JSON.stringify(file)), 'copy')).toThrow('length [m] must be above 0 and at most 100000 (got 0).');
  });

  it('stores a sizing made elsewhere (the app\'s worker) only when checked and made from the run\'s current case', () => {
    const schedule = services().get(library.projectId());
    const result = schedule.sizing[schedule.runs[0]!.reference]!;
    expect(services().storeSizing(library.projectId(), [result])).toBe(1);
    expect(services().storeSizing(library.projectId(), [{ ...result, caseKey: 'an older case' }])).toBe(0);
    expect(() => services().storeSizing(library.projectId(), [{ ...result, heatLoss: 'a lot' }])).toThrow('results[0] is not a sized run as the engine writes one: heatLoss is not a finite number.');
    expect(() => services().storeSizing(library.projectId(), [{ ...result, basis: 'guessed' }])).toThrow(/basis is not chosen, fixed or none-meets/);
    expect(services().get(library.projectId()).sizing[schedule.runs[0]!.reference]).toEqual(result);
  });

  it('a cancelled sizing keeps the runs done so far and leaves the rest to size', () => {
    let done = 0;
    const outcome = services().size(library.projectId(), { all: true, onProgress: (p) => { done = p.done; }, cancelled: () => done >= 3 });
    expect(outcome).toEqual({ sized: 3, complete: false });
  });
});
