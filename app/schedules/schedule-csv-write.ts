/**
 * A schedule written as CSV in a project's units: the schedule's own columns (schedule-columns.ts)
 * and, where the runs were sized, the result columns after them. Each number is written with the
 * fewest digits that read back to the very value stored, so an export re-imports as the same
 * schedule; fields holding a comma, quote or line break are quoted as spreadsheets expect.
 */
import { toDisplay, unitLabel, type UnitSystem } from '../base/unit-systems.js';
import type { BillOfQuantities, EnergyTotals } from './bill-of-quantities.js';
import { storedValue } from './schedule-csv-read.js';
import type { QuantityName } from '../base/quantities.js';
import { CRITERION_NAMES } from '../cases/sizing/sizing-words.js';
import { columnHeader, RESULT_COLUMNS, resultHeader, SCHEDULE_COLUMNS, type ColumnKey } from './schedule-columns.js';
import type { ScheduleRun } from './schedule-model.js';
import type { SizedRun } from './size-run.js';

/** A field as CSV writes it. */
export function csvField(value: string): string {
  return /[",\r\n]/.test(value) || value !== value.trim() ? `"${value.replace(/"/g, '""')}"` : value;
}

/** The shortest decimal of the shown value that the reader converts back to exactly `si`. */
export function exactShown(si: number, quantity: QuantityName, system: UnitSystem): string {
  const shown = toDisplay(si, quantity, system);
  for (let digits = 1; digits <= 17; digits++) {
    const text = String(Number(shown.toPrecision(digits)));
    if (storedValue(Number(text), quantity, system) === si) return text;
  }
  return String(shown);
}

/** A result in the file's units to 6 significant figures: results are read, not read back. */
function sixFigures(si: number, quantity: QuantityName, system: UnitSystem): string {
  return String(Number(toDisplay(si, quantity, system).toPrecision(6)));
}

function cellOf(run: ScheduleRun, key: ColumnKey, quantity: QuantityName | undefined, system: UnitSystem): string {
  const value = key === 'valves' || key === 'flanges' || key === 'bends' ? run.fittings[key] : run[key];
  if (value === null) return '';
  if (typeof value === 'number') return quantity === undefined ? String(value) : exactShown(value, quantity, system);
  return String(value);
}

function resultCells(sized: SizedRun | undefined, system: UnitSystem): string[] {
  if (sized === undefined) return RESULT_COLUMNS.map(() => '');
  if (!sized.ok) return RESULT_COLUMNS.map((c) => (c.name === 'reason' ? sized.reason : c.name === 'basis' ? 'not sized' : ''));
  const shown = (v: number, q: QuantityName) => sixFigures(v, q, system);
  return [
    shown(sized.thickness, 'thickness'),
    sized.basis === 'none-meets' ? 'none meets' : sized.basis,
    sized.governing === null ? '' : CRITERION_NAMES[sized.governing],
    shown(sized.heatLossPerMetre, 'heatFlowPerLength'),
    shown(sized.heatLoss, 'heatFlow'),
    shown(sized.surfaceTemperature, 'temperature'),
    sized.criteriaMet ? 'yes' : 'no',
    sized.verdicts.map((v) => `${v.check}: ${v.verdict}`).join('; '),
    sized.reason,
  ];
}

export function writeScheduleCsv(runs: readonly ScheduleRun[], system: UnitSystem, sized?: ReadonlyMap<string, SizedRun>): string {
  const header = [...SCHEDULE_COLUMNS.map((c) => columnHeader(c, system)), ...(sized ? RESULT_COLUMNS.map((c) => resultHeader(c, system)) : [])];
  const lines = [header.map(csvField).join(',')];
  for (const run of runs) {
    const cells = SCHEDULE_COLUMNS.map((c) => cellOf(run, c.key, c.quantity, system));
    if (sized) cells.push(...resultCells(sized.get(run.reference), system));
    lines.push(cells.map(csvField).join(','));
  }
  return `${lines.join('\r\n')}\r\n`;
}

/**
 * The bill of quantities as CSV in the project's units: one row per material, thickness and pipe
 * size, then a blank line and the heat and energy per service and for the job, insulated and bare
 * (with cost and CO₂ when the project gives its economics).
 */
export function writeBillCsv(bill: BillOfQuantities, system: UnitSystem): string {
  const shown = (v: number | null, q: QuantityName) => (v === null ? '' : sixFigures(v, q, system));
  const head = (name: string, q: QuantityName) => `${name} [${unitLabel(q, system)}]`;
  const lines: string[][] = [
    ['material', head('thickness', 'thickness'), 'pipe series', 'pipe size', head('pipe outside diameter', 'diameter'), 'runs', head('length', 'length'), head('outer surface', 'area'), 'volume [m³]', 'valves', 'flanges', 'bends', head('fittings as pipe', 'length')],
    ...bill.lines.map((l) => [l.material, shown(l.thickness, 'thickness'), l.pipeSeries, l.pipeSize, shown(l.pipeOuterDiameter, 'diameter'), String(l.runs), shown(l.length, 'length'), shown(l.outerArea, 'area'), String(Number(l.volume.toPrecision(6))), String(l.fittings.valves), String(l.fittings.flanges), String(l.fittings.bends), shown(l.fittingLength, 'length')]),
    [],
    ['service', 'runs', head('length', 'length'), head('heat flow', 'heatFlow'), head('heat flow bare', 'heatFlow'), head('energy', 'energyPerYear'), head('energy bare', 'energyPerYear'),
      ...(bill.currency === null ? [] : [`cost [${bill.currency}/a]`, `cost bare [${bill.currency}/a]`, head('CO2', 'emissionsPerYear'), head('CO2 bare', 'emissionsPerYear')])],
    ...[...bill.services.map((s) => ({ name: s.service, t: s as EnergyTotals })), { name: 'the job', t: bill.job }].map(({ name, t }) => [
      name, String(t.runs), shown(t.length, 'length'), shown(t.heatLoss, 'heatFlow'), shown(t.bareHeatLoss, 'heatFlow'), shown(t.annualEnergy, 'energyPerYear'), shown(t.bareAnnualEnergy, 'energyPerYear'),
      ...(bill.currency === null ? [] : [String(Number(t.annualCost!.toPrecision(6))), String(Number(t.bareAnnualCost!.toPrecision(6))), shown(t.annualEmissions, 'emissionsPerYear'), shown(t.bareAnnualEmissions, 'emissionsPerYear')]),
    ]),
  ];
  return `${lines.map((cells) => cells.map(csvField).join(',')).join('\r\n')}\r\n`;
}
