/**
 * The sizing panel's table across the thickness series, as text in the project's units: the
 * figures that decide (heat loss, surface temperature, its margin over the dew point, the fluid's
 * temperature change and the freeze times where asked for, the lifecycle cost with economics),
 * the verdict of each criterion switched on and the choice mark. A failing cell carries the
 * engine's sentence of what was required and what the thickness gives, for its hover text and its
 * screen-reader text. The printed report words the same result in app/cases/sizing/sizing-report.
 */
import type { QuantityName } from '../../../app/base/quantities.js';
import { quantityText } from '../../../app/base/quantity-text.js';
import type { UnitSystem } from '../../../app/base/unit-systems.js';
import type { SizingResult, SizingRow } from '../../../app/cases/sizing/sizing-model.js';
import { CRITERION_NAMES, choiceMark, criteriaOf, heatQuantity, outcomeCell, sameThickness, type SizingBasis } from '../../../app/cases/sizing/sizing-words.js';

export interface SizingCell {
  readonly text: string;
  /** The engine's sentence where this cell is a criterion the thickness fails. */
  readonly reason?: string;
  readonly numeric: boolean;
}

export interface SizingTableRow {
  readonly thickness: number;
  readonly chosen: boolean;
  readonly cells: readonly SizingCell[];
}

export interface SizingTableModel {
  readonly headers: readonly string[];
  readonly rows: readonly SizingTableRow[];
}

const NONE = '—';

export function sizingTable(result: SizingResult, system: UnitSystem, basis: SizingBasis): SizingTableModel {
  const text = quantityText(system);
  const header = (label: string, quantity: QuantityName) => (text.unit(quantity) === '' ? label : `${label} (${text.unit(quantity)})`);
  const value = (v: number | null, quantity: QuantityName): SizingCell => ({
    text: v === null ? NONE : Number.isFinite(v) ? text.number(v, quantity) : 'not reached',
    numeric: true,
  });
  const rows = result.rows;
  const gained = rows.length > 0 && rows[0]!.heatLoss < 0;
  const heat = heatQuantity(basis);
  const columns: { header: string; cell: (r: SizingRow) => SizingCell }[] = [
    { header: header('Thickness', 'thickness'), cell: (r) => value(r.thickness, 'thickness') },
    { header: header(gained ? 'Heat gain' : 'Heat loss', heat), cell: (r) => value(Math.abs(r.heatLoss), heat) },
    { header: header('Surface', 'temperature'), cell: (r) => value(r.surfaceTemperature, 'temperature') },
    { header: header('Above dew point', 'temperatureDifference'), cell: (r) => value(r.dewPointMargin, 'temperatureDifference') },
  ];
  if (rows.some((r) => r.temperatureDrop !== null)) {
    columns.push({ header: header('Fluid change along the run', 'fluidTemperatureChange'), cell: (r) => value(r.temperatureDrop === null ? null : Math.abs(r.temperatureDrop), 'fluidTemperatureChange') });
  }
  if (rows.some((r) => r.timeToZero !== null)) columns.push({ header: header(`Time to ${text.given(0, 'temperature')}`, 'timeHours'), cell: (r) => value(r.timeToZero, 'timeHours') });
  if (rows.some((r) => r.timeToFraction !== null)) columns.push({ header: header('Time to the frozen part', 'timeHours'), cell: (r) => value(r.timeToFraction, 'timeHours') });
  if (rows.some((r) => r.lifecycleCost !== null)) columns.push({ header: 'Lifecycle cost', cell: (r) => value(r.lifecycleCost, 'money') });
  for (const criterion of criteriaOf(result)) {
    columns.push({
      header: capitalise(CRITERION_NAMES[criterion]),
      cell: (r) => {
        const outcome = r.outcomes.find((o) => o.criterion === criterion);
        const cell = outcomeCell(outcome, r, result, text, basis);
        return outcome && !outcome.met ? { text: cell, reason: outcome.reason, numeric: false } : { text: cell, numeric: false };
      },
    });
  }
  columns.push({ header: 'Choice', cell: (r) => ({ text: choiceMark(r, result), numeric: false }) });
  return {
    headers: columns.map((c) => c.header),
    rows: rows.map((r) => ({
      thickness: r.thickness,
      chosen: result.choice.kind === 'chosen' && sameThickness(r.thickness, result.choice.thickness),
      cells: columns.map((c) => c.cell(r)),
    })),
  };
}

function capitalise(words: string): string {
  return words.charAt(0).toUpperCase() + words.slice(1);
}
