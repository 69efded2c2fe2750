/**
 * The report section of a sized pipe or flat case: the choice and the criterion that governs it (or
 * what fails at the thickest option, and by how much), the table across the thickness series, the
 * costs and CO₂ with the present-value and annuity factors, the verdict of every criterion switched
 * on at every thickness, charts of heat loss and lifecycle cost against thickness, the caution, and
 * the sizing's assumptions. Pure: the same result gives the same section.
 *
 * The series is split into up to three tables (heat and surface; cost and CO₂; criteria), each with
 * the thickness and the choice mark, so that no table outgrows a printed page's width.
 */
import type { QuantityText } from '../../base/quantity-text.js';
import { asSentence } from '../../report/as-sentence.js';
import type { ReportBlock, ReportCell, ReportColumn, ReportFigure, ReportSection, ReportTable } from '../../report/report-model.js';
import type { SizingResult, SizingRow } from './sizing-model.js';
import {
  CRITERION_NAMES,
  basisWords,
  choiceMark,
  criteriaOf,
  heatQuantity,
  marginQuantity,
  outcomeCell,
  type SizingBasis,
} from './sizing-words.js';

const THICKNESS_LABEL = 'Thickness';
const CHOICE_LABEL = 'Choice';

/** A time of a freeze simulation: Infinity means the water never got there within the simulated time. */
function timeCell(seconds: number | null): ReportCell {
  return seconds !== null && !Number.isFinite(seconds) ? 'not reached' : { value: seconds, quantity: 'timeHours' };
}

export function sizingSection(result: SizingResult, text: QuantityText, basis: SizingBasis): ReportSection {
  const per = basisWords(basis, text);
  const rows = result.rows;
  // A chilled or cold line gains heat: the columns say so and show magnitudes.
  const gained = rows.length > 0 && rows[0]!.heatLoss < 0;
  const heat = heatQuantity(basis);
  const economics = rows.some((r) => r.lifecycleCost !== null);
  const lead = (r: SizingRow): ReportCell => ({ value: r.thickness, quantity: 'thickness' });
  const withLead = (columns: readonly ReportColumn[]): ReportColumn[] => [{ label: THICKNESS_LABEL, quantity: 'thickness' }, ...columns, { label: CHOICE_LABEL }];

  const heatColumns: { column: ReportColumn; cell: (r: SizingRow) => ReportCell }[] = [
    { column: { label: gained ? 'Heat gain' : 'Heat loss', quantity: heat }, cell: (r) => ({ value: Math.abs(r.heatLoss), quantity: heat }) },
    { column: { label: 'Surface temperature', quantity: 'temperature' }, cell: (r) => ({ value: r.surfaceTemperature, quantity: 'temperature' }) },
    { column: { label: 'Above the dew point', quantity: 'temperatureDifference' }, cell: (r) => ({ value: r.dewPointMargin, quantity: 'temperatureDifference' }) },
    {
      column: { label: gained ? 'Energy gained per year' : 'Energy lost per year', quantity: 'energyPerYear' },
      cell: (r) => ({ value: Math.abs(r.annualEnergy), quantity: 'energyPerYear' }),
    },
  ];
  // Along the run and after the flow stops: a table of its own, so that neither outgrows a page.
  const runColumns: { column: ReportColumn; cell: (r: SizingRow) => ReportCell }[] = [
    ...(rows.some((r) => r.temperatureDrop !== null)
      ? [
          {
            column: { label: gained ? 'Fluid temperature rise over the run' : 'Fluid temperature drop over the run', quantity: 'fluidTemperatureChange' as const },
            cell: (r: SizingRow): ReportCell => ({ value: r.temperatureDrop === null ? null : Math.abs(r.temperatureDrop), quantity: 'fluidTemperatureChange' }),
          },
        ]
      : []),
    ...(rows.some((r) => r.timeToZero !== null)
      ? [{ column: { label: `Time until the water reaches ${text.given(0, 'temperature')}`, quantity: 'timeHours' as const }, cell: (r: SizingRow) => timeCell(r.timeToZero) }]
      : []),
    ...(rows.some((r) => r.timeToFirstIce !== undefined && r.timeToFirstIce !== null)
      ? [{ column: { label: 'Time until ice first forms at the pipe wall', quantity: 'timeHours' as const }, cell: (r: SizingRow) => timeCell(r.timeToFirstIce ?? null) }]
      : []),
    ...(rows.some((r) => r.timeToFraction !== null)
      ? [{ column: { label: 'Time until the given fraction has frozen', quantity: 'timeHours' as const }, cell: (r: SizingRow) => timeCell(r.timeToFraction) }]
      : []),
  ];
  const runTable: ReportTable = {
    title: runTitle(rows.some((r) => r.temperatureDrop !== null), rows.some((r) => r.timeToZero !== null)),
    columns: withLead(runColumns.map((c) => c.column)),
    rows: rows.map((r) => [lead(r), ...runColumns.map((c) => c.cell(r)), choiceMark(r, result)]),
  };
  const heatTitle = `${result.material} across the thickness series, ${per}`;
  const heatTable: ReportTable = {
    title: heatTitle,
    columns: withLead(heatColumns.map((c) => c.column)),
    rows: rows.map((r) => [lead(r), ...heatColumns.map((c) => c.cell(r)), choiceMark(r, result)]),
  };

  // Money is never converted: its unit is the economics' currency, written into the labels.
  const currency = result.currency ?? 'currency units';
  const costTitle = `Cost and CO₂ across the thickness series, ${per}`;
  const costTable: ReportTable = {
    title: costTitle,
    columns: withLead([
      { label: `Energy cost per year (${currency}/a)`, quantity: 'moneyPerYear' },
      { label: 'CO₂ per year', quantity: 'emissionsPerYear' },
      { label: `Installed cost of the insulation (${currency})`, quantity: 'money' },
      { label: `Energy cost over the years, present value (${currency})`, quantity: 'money' },
      { label: `Lifecycle cost (${currency})`, quantity: 'money' },
    ]),
    rows: rows.map((r) => [
      lead(r),
      { value: r.annualEnergyCost, quantity: 'moneyPerYear' },
      { value: r.annualEmissions, quantity: 'emissionsPerYear' },
      { value: r.insulationCost, quantity: 'money' },
      { value: presentEnergyCost(r), quantity: 'money' },
      { value: r.lifecycleCost, quantity: 'money' },
      choiceMark(r, result),
    ]),
  };

  const criteria = criteriaOf(result);
  const criteriaTable: ReportTable = {
    title: 'Each criterion switched on, at each thickness',
    columns: withLead(criteria.map((c) => ({ label: capitalise(CRITERION_NAMES[c]) }))),
    rows: rows.map((r) => [
      lead(r),
      ...criteria.map((c) =>
        outcomeCell(
          r.outcomes.find((o) => o.criterion === c),
          r,
          result,
          text,
          basis,
        ),
      ),
      choiceMark(r, result),
    ]),
  };

  const x = { label: 'thickness of the insulation', quantity: 'thickness' as const };
  const blocks: ReportBlock[] = [
    { kind: 'paragraphs', paragraphs: choiceParagraphs(result, text, basis) },
    { kind: 'table', table: heatTable },
    ...(runColumns.length > 0 ? [{ kind: 'table' as const, table: runTable }] : []),
    ...(criteria.length > 0 ? [{ kind: 'table' as const, table: criteriaTable }] : []),
    {
      kind: 'chart',
      chart: {
        title: `${gained ? 'Heat gain' : 'Heat loss'} against thickness`,
        x,
        y: { label: `${gained ? 'heat gain' : 'heat loss'} ${per}`, quantity: heat },
        series: [{ name: gained ? 'heat gain' : 'heat loss', points: rows.map((r) => [r.thickness, Math.abs(r.heatLoss)] as const) }],
        tabulatedIn: heatTitle,
      },
    },
    ...(economics
      ? [
          { kind: 'table' as const, table: costTable },
          ...(result.factors ? [{ kind: 'figures' as const, figures: factorFigures(result) }] : []),
          {
            kind: 'chart' as const,
            chart: {
              title: 'Lifecycle cost against thickness',
              x,
              y: { label: `cost ${per} (${currency})`, quantity: 'money' as const },
              series: [
                { name: 'installed cost of the insulation', points: points(rows, (r) => r.insulationCost) },
                { name: 'energy cost over the years, present value', points: points(rows, presentEnergyCost) },
                { name: 'lifecycle cost', points: points(rows, (r) => r.lifecycleCost) },
              ],
              tabulatedIn: costTitle,
            },
          },
        ]
      : []),
    { kind: 'paragraphs', paragraphs: [SIZING_CAUTION, ...result.assumptions.map(asSentence)] },
  ];
  return { id: 'sizing', heading: 'Choice of insulation thickness', blocks };
}

/** Where a choice protects people or property, the engineer and the local codes decide (preamble rule 4). */
export const SIZING_CAUTION =
  'The choice follows from the criteria and design conditions as given. Where a thickness protects people (hot surfaces) or ' +
  'property (condensation, freezing), confirm it against local codes and licensed professional practice, and allow for ' +
  'workmanship, ageing and damage of the insulation.';

/** The lifecycle cost less the installed cost: what the energy costs over the years, at present value. */
function presentEnergyCost(r: SizingRow): number | null {
  return r.lifecycleCost === null || r.insulationCost === null ? null : r.lifecycleCost - r.insulationCost;
}

function points(rows: readonly SizingRow[], value: (r: SizingRow) => number | null): (readonly [number, number])[] {
  return rows.flatMap((r) => {
    const y = value(r);
    return y === null ? [] : [[r.thickness, y] as const];
  });
}

function factorFigures(result: SizingResult): ReportFigure[] {
  const f = result.factors!;
  return [
    {
      label: 'Present-value factor of the energy cost',
      value: f.presentValue,
      quantity: 'factor',
      note: 'the first year’s energy cost times this factor is the cost over the years, with the price escalating and the years discounted',
    },
    { label: 'Annuity factor', value: f.annuity, quantity: 'factor', note: 'spreads a present cost into equal yearly payments over the years' },
    ...(result.economicThickness !== null ? [{ label: 'Thickness of least lifecycle cost', value: result.economicThickness, quantity: 'thickness' as const }] : []),
  ];
}

/** The choice in sentences: what was chosen and why, or what fails at the thickest option and by how much. */
function choiceParagraphs(result: SizingResult, text: QuantityText, basis: SizingBasis): string[] {
  const choice = result.choice;
  const of = (thickness: number) => `${text.figure(thickness, 'thickness')} of ${result.material}`;
  if (choice.kind === 'chosen') {
    const headline =
      choice.governing === 'economic'
        ? `Chosen: ${of(choice.thickness)}, the thickness of least lifecycle cost that meets every criterion switched on.`
        : `Chosen: ${of(choice.thickness)}, the thinnest of the series that meets every criterion switched on; the ${CRITERION_NAMES[choice.governing]} governs.`;
    return [headline, asSentence(choice.reason)];
  }
  const thickest = result.rows[result.rows.length - 1];
  const failures = choice.failures.map((f) => {
    const quantity = marginQuantity(f.criterion, basis);
    return quantity === null ? `the ${CRITERION_NAMES[f.criterion]} is not met` : `the ${CRITERION_NAMES[f.criterion]} fails by ${text.figure(Math.abs(f.margin), quantity)}`;
  });
  const at = thickest ? ` At the thickest, ${of(thickest.thickness)}, ${failures.join('; ')}.` : '';
  return [`No thickness of the series meets every criterion switched on.${at}`, ...choice.failures.map((f) => asSentence(f.reason)), asSentence(choice.reason)];
}

function runTitle(drop: boolean, freeze: boolean): string {
  const what = [drop ? 'the fluid along the run' : null, freeze ? 'the water standing still after the flow stops' : null].filter((w) => w !== null).join(', and ');
  return `${capitalise(what)}, across the thickness series`;
}

function capitalise(words: string): string {
  return words.charAt(0).toUpperCase() + words.slice(1);
}
