/**
 * The schedule in the printed report, as the report model's sections: the runs with their sizing
 * (thickness, what governs it, heat loss, surface temperature), the runs that need a second look
 * (no thickness meets, a check fails, not sized), the bill of quantities and the heat, energy,
 * cost and CO₂ per service and for the job, insulated and bare. Figures carry their quantity, so
 * the report prints them in the project's units like every other table.
 */
import { numberText } from '../base/number-text.js';
import type { ReportBlock, ReportCell, ReportSection } from '../report/report-model.js';
import { CRITERION_NAMES } from '../cases/sizing/sizing-words.js';
import type { BillOfQuantities, EnergyTotals } from './bill-of-quantities.js';
import type { ScheduleRun } from './schedule-model.js';
import type { SizedRun } from './size-run.js';

export const SCHEDULE_CAUTION =
  'The schedule sizes each run as a straight insulated pipe against its service\'s criteria; fittings, supports and ' +
  'penetrations are counted, not modelled. Thicknesses chosen for people or property (hot surfaces, condensation, ' +
  'freezing) are to be confirmed against the project specification, local codes and licensed professional practice.';

const figure = (value: number | null, quantity: Extract<ReportCell, object>['quantity']): ReportCell => ({ value, quantity });

function governedBy(s: SizedRun): string {
  if (!s.ok) return 'not sized';
  if (s.basis === 'fixed') return 'fixed on the drawings';
  if (s.basis === 'none-meets') return 'no thickness meets';
  return s.governing === null ? '' : CRITERION_NAMES[s.governing];
}

export function scheduleReportSections(runs: readonly ScheduleRun[], sized: ReadonlyMap<string, SizedRun>, bill: BillOfQuantities): ReportSection[] {
  const ok = (r: ScheduleRun) => sized.get(r.reference);
  const runRows: ReportCell[][] = runs.map((r) => {
    const s = ok(r);
    const good = s !== undefined && s.ok ? s : null;
    return [
      r.reference, r.service, `${r.pipeSeries} ${r.pipeSize}`, figure(r.length, 'length'), figure(r.fluidTemperature, 'temperature'), r.location,
      figure(good?.thickness ?? null, 'thickness'), s === undefined ? 'not sized yet' : governedBy(s), figure(good?.heatLossPerMetre ?? null, 'heatFlowPerLength'), figure(good?.surfaceTemperature ?? null, 'temperature'),
    ];
  });
  const attention: string[] = [];
  for (const r of runs) {
    const s = ok(r);
    if (s === undefined) attention.push(`${r.reference}: not sized yet.`);
    else if (!s.ok) attention.push(`${r.reference}: not sized: ${s.reason}`);
    else {
      if (s.basis === 'none-meets') attention.push(`${r.reference}: ${s.reason}`);
      const fails = s.verdicts.filter((v) => v.verdict === 'fail').map((v) => v.check);
      if (fails.length > 0) attention.push(`${r.reference}: at ${numberText(s.thickness * 1000, { decimals: 1 })} mm the check${fails.length > 1 ? 's' : ''} ${fails.join(', ')} fail${fails.length > 1 ? '' : 's'}.`);
    }
  }
  const runsBlocks: ReportBlock[] = [
    {
      kind: 'table',
      table: {
        title: 'Runs and their insulation',
        columns: [
          { label: 'Reference' }, { label: 'Service' }, { label: 'Pipe' }, { label: 'Length', quantity: 'length' }, { label: 'Fluid', quantity: 'temperature' }, { label: 'Location' },
          { label: 'Thickness', quantity: 'thickness' }, { label: 'Governed by' }, { label: 'Heat loss', quantity: 'heatFlowPerLength' }, { label: 'Surface', quantity: 'temperature' },
        ],
        rows: runRows,
      },
    },
    {
      kind: 'paragraphs',
      paragraphs: [
        `${runs.length} runs, each sized over its insulation's thickness series against the criteria of its service (the thinnest that meets them all), or checked at a thickness fixed on the drawings. The fluid temperature is taken at the pipe's inner face (no inside film), which errs towards more heat loss and a hotter or colder surface.`,
        ...(attention.length === 0 ? ['Every run meets the criteria of its service and passes its checks.'] : ['Runs that need a second look:', ...attention]),
      ],
    },
  ];

  const billBlocks: ReportBlock[] = [
    {
      kind: 'table',
      table: {
        title: 'Insulation by material, thickness and pipe size',
        columns: [
          { label: 'Material' }, { label: 'Thickness', quantity: 'thickness' }, { label: 'Pipe' }, { label: 'Runs', quantity: 'count' }, { label: 'Length', quantity: 'length' }, { label: 'Outer surface', quantity: 'area' },
          { label: 'Volume (m³)' }, { label: 'Valves', quantity: 'count' }, { label: 'Flanges', quantity: 'count' }, { label: 'Bends', quantity: 'count' }, { label: 'Fittings as pipe', quantity: 'length' },
        ],
        rows: bill.lines.map((l) => [
          l.material, figure(l.thickness, 'thickness'), `${l.pipeSeries} ${l.pipeSize}`, figure(l.runs, 'count'), figure(l.length, 'length'), figure(l.outerArea, 'area'),
          numberText(l.volume, { significant: 3 }), figure(l.fittings.valves, 'count'), figure(l.fittings.flanges, 'count'), figure(l.fittings.bends, 'count'), figure(l.fittingLength, 'length'),
        ]),
      },
    },
    {
      kind: 'table',
      table: {
        title: 'Heat and energy per service and for the job, with the chosen insulation and bare',
        columns: [
          { label: 'Service' }, { label: 'Runs', quantity: 'count' }, { label: 'Heat flow', quantity: 'heatFlow' }, { label: 'Bare', quantity: 'heatFlow' }, { label: 'Energy', quantity: 'energyPerYear' }, { label: 'Bare', quantity: 'energyPerYear' },
          ...(bill.currency === null ? [] : [{ label: `Cost (${bill.currency})`, quantity: 'moneyPerYear' as const }, { label: `Bare (${bill.currency})`, quantity: 'moneyPerYear' as const }, { label: 'CO₂', quantity: 'emissionsPerYear' as const }, { label: 'Bare', quantity: 'emissionsPerYear' as const }]),
        ],
        rows: [...bill.services.map((s) => totalsRow(s.service, s, bill)), totalsRow('The job', bill.job, bill)],
      },
    },
    {
      kind: 'paragraphs',
      paragraphs: [
        'Outer surface: π × outer diameter of the insulation × length, for jacketing; volume: the annulus of insulation over the length. Fittings are counted and also given as lengths of insulated pipe by rule-of-thumb allowances (common practice, no source; data/schedules/fitting-allowances.csv).',
        'Heat flow is positive where heat is lost and negative where a cold service gains it; the job adds both as magnitudes (energy bought either way).',
        ...(bill.notSized.length > 0 ? [`Left out of these quantities (not sized): ${bill.notSized.join(', ')}.`] : []),
        SCHEDULE_CAUTION,
      ],
    },
  ];
  return [
    { id: 'schedule-runs', heading: 'Schedule of pipe runs', blocks: runsBlocks },
    { id: 'schedule-bill', heading: 'Bill of quantities', blocks: billBlocks },
  ];
}

function totalsRow(name: string, t: EnergyTotals, bill: BillOfQuantities): ReportCell[] {
  return [
    name, figure(t.runs, 'count'), figure(t.heatLoss, 'heatFlow'), figure(t.bareHeatLoss, 'heatFlow'), figure(t.annualEnergy, 'energyPerYear'), figure(t.bareAnnualEnergy, 'energyPerYear'),
    ...(bill.currency === null ? [] : [figure(t.annualCost, 'moneyPerYear'), figure(t.bareAnnualCost, 'moneyPerYear'), figure(t.annualEmissions, 'emissionsPerYear'), figure(t.bareAnnualEmissions, 'emissionsPerYear')]),
  ];
}
