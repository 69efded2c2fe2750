/**
 * lamina projects schedule ID import FILE.csv     (all rows good, or nothing imported)
 * lamina projects schedule ID size [--format json|text] [--all]
 * lamina projects schedule ID export FILE.csv|-   (the schedule with its results, in the project's units)
 * lamina projects schedule ID template FILE.csv|- (an empty schedule: the header in the project's units)
 * lamina projects schedule ID bill FILE.csv|-     (the bill of quantities and the totals per service and for the job)
 * lamina projects schedule ID settings [FILE.json] (prints the condition sets, services and economics; with a file, sets them)
 *
 * The same checks and sentences as the app: the work is SchedulesService's and the engine's.
 */
import fs from 'node:fs';
import path from 'node:path';
import { numberText } from '../../../app/base/number-text.js';
import type { UnitSystem } from '../../../app/base/unit-systems.js';
import { formatQuantityNumber, quantityUnit } from '../../../app/report/format-quantity.js';
import type { QuantityName } from '../../../app/base/quantities.js';
import { CRITERION_NAMES } from '../../../app/cases/sizing/sizing-words.js';
import type { BillOfQuantities, EnergyTotals } from '../../../app/schedules/bill-of-quantities.js';
import type { CliIO } from '../command.js';
import { readTextFile } from '../file-access.js';
import { EXIT_BAD_INPUT, EXIT_DONE, EXIT_FAILED } from '../exit-code.js';
import { withServices } from './materials.js';
import type { Schedule } from '../../services/schedules-service.js';

export const SCHEDULE_USAGE = 'usage: lamina projects schedule ID import FILE.csv | size [--format json|text] [--all] | export FILE.csv|- | template FILE.csv|- | bill FILE.csv|- | settings [FILE.json] [--db PATH]';

export async function projectScheduleCommand(positional: readonly string[], options: ReadonlyMap<string, string>, flags: ReadonlySet<string>, io: CliIO): Promise<number> {
  const [id, action, file] = positional;
  if (!id || !/^\d+$/.test(id) || !action) {
    io.stderr(`projects schedule needs a project id (a whole number) and an action. ${SCHEDULE_USAGE}\n`);
    return EXIT_BAD_INPUT;
  }
  const projectId = Number(id);
  const db = options.get('db');
  switch (action) {
    case 'import':
      if (!file) return needsFile(io, 'import');
      return withServices(io, db, ({ schedules }) => {
        const outcome = schedules.importCsv(projectId, readTextFile(path.resolve(io.cwd, file)));
        if (!outcome.ok) {
          for (const p of outcome.problems) io.stderr(`${file}: line ${p.line}${p.column === '' ? '' : `, ${p.column}`}: ${p.message}\n`);
          if (outcome.more > 0) io.stderr(`… and ${outcome.more} more problems.\n`);
          io.stderr(`Nothing was imported: correct the file and import it again.\n`);
          return EXIT_BAD_INPUT;
        }
        const s = outcome.summary;
        const changed = s.changed.length === 0 ? '' : ` (${s.changed.map((c) => `${c.reference}: ${c.columns.join(', ')}`).join('; ')})`;
        io.stdout(`Imported ${file} into the schedule of project ${projectId}: ${s.added.length} added, ${s.changed.length} changed${changed}, ${s.unchanged} unchanged, ${s.kept.length} kept that the file does not hold; ${outcome.runs} runs in all.\n`);
        return EXIT_DONE;
      });
    case 'export':
    case 'template':
    case 'bill':
      if (!file) return needsFile(io, action);
      return withServices(io, db, ({ schedules }) => {
        const text = action === 'export' ? schedules.exportCsv(projectId) : action === 'bill' ? schedules.billCsv(projectId) : schedules.template(projectId);
        if (file === '-') io.stdout(text);
        else {
          fs.writeFileSync(path.resolve(io.cwd, file), text);
          const what = action === 'export' ? 'the schedule' : action === 'bill' ? 'the bill of quantities' : 'the schedule template';
          io.stdout(`Wrote ${what} of project ${projectId} to ${file}.\n`);
        }
        return EXIT_DONE;
      });
    case 'size': {
      const format = options.get('format') ?? 'text';
      if (format !== 'json' && format !== 'text') {
        io.stderr(`--format is json or text (got ${format}). ${SCHEDULE_USAGE}\n`);
        return EXIT_BAD_INPUT;
      }
      return withServices(io, db, ({ schedules }) => {
        const { sized } = schedules.size(projectId, { all: flags.has('all') });
        const schedule = schedules.get(projectId);
        const bill = schedules.billOf(schedule);
        if (format === 'json') io.stdout(`${JSON.stringify({ projectId, sizedNow: sized, runs: schedule.runs.map((r) => ({ run: r, sizing: schedule.sizing[r.reference] ?? null })), bill }, null, 2)}\n`);
        else io.stdout(scheduleText(schedule, bill, sized));
        const failed = Object.values(schedule.sizing).filter((s) => !s.ok);
        for (const f of failed) io.stderr(`lamina projects schedule: run ${f.reference}: ${f.ok ? '' : f.reason}\n`);
        return failed.length === 0 ? EXIT_DONE : EXIT_FAILED;
      });
    }
    case 'settings':
      return withServices(io, db, ({ schedules }) => {
        if (file) {
          let json: unknown;
          try {
            json = JSON.parse(readTextFile(path.resolve(io.cwd, file)));
          } catch (error) {
            if (!(error instanceof SyntaxError)) throw error;
            io.stderr(`${file} is not JSON: ${error.message}\n`);
            return EXIT_BAD_INPUT;
          }
          schedules.setSettings(projectId, json);
          io.stdout(`Set the schedule settings of project ${projectId} from ${file}; runs whose case changed will be sized again.\n`);
        } else io.stdout(`${JSON.stringify(schedules.settingsOf(projectId), null, 2)}\n`);
        return EXIT_DONE;
      });
    default:
      io.stderr(`unknown schedule action "${action}". ${SCHEDULE_USAGE}\n`);
      return EXIT_BAD_INPUT;
  }
}

function needsFile(io: CliIO, action: string): number {
  io.stderr(`projects schedule ${action} needs a file name${action === 'import' ? '' : ' (or - for standard output)'}. ${SCHEDULE_USAGE}\n`);
  return EXIT_BAD_INPUT;
}

const figure = (value: number, quantity: QuantityName, system: UnitSystem) => formatQuantityNumber(value, quantity, system);
const unit = (quantity: QuantityName, system: UnitSystem) => quantityUnit(quantity, system);

/** Columns padded to their widest cell, figures to the right. */
function table(header: readonly string[], rows: readonly (readonly string[])[], numeric: readonly boolean[]): string {
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const line = (cells: readonly string[]) => `  ${cells.map((c, i) => (numeric[i] ? c.padStart(widths[i]!) : c.padEnd(widths[i]!))).join('  ').trimEnd()}\n`;
  return line(header) + rows.map(line).join('');
}

function scheduleText(schedule: Schedule, bill: BillOfQuantities, sizedNow: number): string {
  const u = schedule.unitSystem;
  let out = `Schedule of project ${schedule.projectId}: ${schedule.runs.length} runs, ${sizedNow} sized now.\n\n`;
  const rows = schedule.runs.map((r) => {
    const s = schedule.sizing[r.reference];
    if (s === undefined) return [r.reference, r.service, `${r.pipeSeries} ${r.pipeSize}`, figure(r.length, 'length', u), '', 'not sized', '', '', ''];
    if (!s.ok) return [r.reference, r.service, `${r.pipeSeries} ${r.pipeSize}`, figure(r.length, 'length', u), '', `not sized: ${s.reason}`, '', '', ''];
    const why = s.basis === 'fixed' ? 'fixed' : s.basis === 'none-meets' ? 'NONE MEETS: thickest shown' : (CRITERION_NAMES[s.governing!] ?? '');
    const fails = s.verdicts.filter((v) => v.verdict === 'fail').map((v) => v.check);
    return [r.reference, r.service, `${r.pipeSeries} ${r.pipeSize}`, figure(r.length, 'length', u), figure(s.thickness, 'thickness', u), why, figure(s.heatLossPerMetre, 'heatFlowPerLength', u), figure(s.surfaceTemperature, 'temperature', u), fails.length === 0 ? 'all pass' : `fails: ${fails.join(', ')}`];
  });
  out += table(
    ['Reference', 'Service', 'Pipe', `Length (${unit('length', u)})`, `Thickness (${unit('thickness', u)})`, 'Governed by', `Heat loss (${unit('heatFlowPerLength', u)})`, `Surface (${unit('temperature', u)})`, 'Checks'],
    rows,
    [false, false, false, true, true, false, true, true, false],
  );
  out += `\nBill of quantities\n`;
  out += table(
    ['Material', `Thickness (${unit('thickness', u)})`, 'Pipe', 'Runs', `Length (${unit('length', u)})`, `Outer area (${unit('area', u)})`, 'Volume (m³)', 'Valves', 'Flanges', 'Bends', `Fittings as length (${unit('length', u)})`],
    bill.lines.map((l) => [l.material, figure(l.thickness, 'thickness', u), `${l.pipeSeries} ${l.pipeSize}`, String(l.runs), figure(l.length, 'length', u), figure(l.outerArea, 'area', u), numberText(l.volume, { significant: 3 }), String(l.fittings.valves), String(l.fittings.flanges), String(l.fittings.bends), figure(l.fittingLength, 'length', u)]),
    [false, true, false, true, true, true, true, true, true, true, true],
  );
  const totalsRow = (name: string, t: EnergyTotals) => [
    name, String(t.runs), figure(t.heatLoss, 'heatFlow', u), figure(t.bareHeatLoss, 'heatFlow', u), figure(t.annualEnergy, 'energyPerYear', u), figure(t.bareAnnualEnergy, 'energyPerYear', u),
    ...(bill.currency === null ? [] : [numberText(t.annualCost!, { significant: 4 }), numberText(t.bareAnnualCost!, { significant: 4 }), figure(t.annualEmissions!, 'emissionsPerYear', u), figure(t.bareAnnualEmissions!, 'emissionsPerYear', u)]),
  ];
  out += `\nHeat and energy, insulated and bare (heat gained by cold services counts negative per service; the job adds magnitudes)\n`;
  out += table(
    ['Service', 'Runs', `Heat flow (${unit('heatFlow', u)})`, `Bare (${unit('heatFlow', u)})`, `Energy (${unit('energyPerYear', u)})`, `Bare (${unit('energyPerYear', u)})`,
      ...(bill.currency === null ? [] : [`Cost (${bill.currency}/a)`, `Bare (${bill.currency}/a)`, `CO₂ (${unit('emissionsPerYear', u)})`, `Bare (${unit('emissionsPerYear', u)})`])],
    [...bill.services.map((s) => totalsRow(s.service, s)), totalsRow('the job', bill.job)],
    [false, true, true, true, true, true, true, true, true, true],
  );
  if (bill.notSized.length > 0) out += `\nLeft out of the bill (not sized): ${bill.notSized.join(', ')}.\n`;
  out += `\nFittings count as insulated pipe by the allowances of data/schedules/fitting-allowances.csv (rule of thumb: common practice, no source). Thicknesses chosen for people or property (hot surfaces, condensation, freezing) are to be confirmed against local codes and licensed professional practice.\n`;
  return out;
}
