/**
 * How a sizing result reads in words, wherever it is shown (the report section, `lamina size`,
 * the case editor's sizing panel): each criterion's name, the quantity its margin is measured in,
 * the verdict cell of one thickness, and the "chosen" mark of the table. One place, so the command
 * line, the screen and the paper say the same thing.
 */
import type { QuantityName } from '../../base/quantities.js';
import type { QuantityText } from '../../base/quantity-text.js';
import type { CriterionOutcome, SizingCriterionName, SizingResult, SizingRow } from './sizing-model.js';

/** Per metre of pipe or per m² of surface: the basis of every per-length or per-area figure of the sizing. */
export type SizingBasis = 'per-metre' | 'per-square-metre';

/** The criteria in the order the table shows them. */
export const CRITERION_ORDER: readonly SizingCriterionName[] = [
  'maxSurfaceTemperature',
  'noCondensation',
  'maxHeatLoss',
  'maxTemperatureDrop',
  'freezeProtection',
  'economic',
];

/** A criterion's name as a heading and in a sentence ("the surface temperature limit governs"). */
export const CRITERION_NAMES: Readonly<Record<SizingCriterionName, string>> = {
  maxSurfaceTemperature: 'surface temperature limit',
  noCondensation: 'condensation margin',
  maxHeatLoss: 'heat loss limit',
  maxTemperatureDrop: 'temperature change limit',
  freezeProtection: 'freeze protection',
  economic: 'least lifecycle cost',
};

/** The quantity of heat lost per metre of pipe or per m² of surface. */
export function heatQuantity(basis: SizingBasis): QuantityName {
  return basis === 'per-metre' ? 'heatFlowPerLength' : 'heatFlux';
}

/** The quantity a criterion's margin is measured in; null for the economic one (its margin is in money). */
export function marginQuantity(criterion: SizingCriterionName, basis: SizingBasis): QuantityName | null {
  switch (criterion) {
    case 'maxSurfaceTemperature':
    case 'noCondensation':
      return 'temperatureDifference';
    case 'maxTemperatureDrop':
      return 'fluidTemperatureChange';
    case 'maxHeatLoss':
      return heatQuantity(basis);
    case 'freezeProtection':
      return 'timeHours';
    case 'economic':
      return null;
  }
}

/** "per metre of pipe", "per ft² of surface": the basis in the project's units. */
export function basisWords(basis: SizingBasis, text: QuantityText): string {
  return basis === 'per-metre' ? `per ${text.system === 'SI' ? 'metre' : 'foot'} of pipe` : `per ${text.unit('area')} of surface`;
}

/** The criteria the result was sized to, in table order. */
export function criteriaOf(result: SizingResult): SizingCriterionName[] {
  const on = new Set(result.rows.flatMap((r) => r.outcomes.map((o) => o.criterion)));
  return CRITERION_ORDER.filter((c) => on.has(c));
}

/** Two thicknesses are the same option when they differ by less than a micrometre (round-off of a range). */
export function sameThickness(a: number, b: number): boolean {
  return Math.abs(a - b) < 1e-6;
}

/** The least lifecycle cost of the series, or null without economics. */
export function leastLifecycleCost(result: SizingResult): number | null {
  const costs = result.rows.flatMap((r) => (r.lifecycleCost === null ? [] : [r.lifecycleCost]));
  return costs.length === 0 ? null : Math.min(...costs);
}

/**
 * The verdict of one criterion at one thickness, short enough for a table cell: "met", "fails by
 * 3.2 K"; for the economic criterion "least cost" or how much more this thickness costs over its life.
 */
export function outcomeCell(outcome: CriterionOutcome | undefined, row: SizingRow, result: SizingResult, text: QuantityText, basis: SizingBasis): string {
  if (outcome === undefined) return '—';
  if (outcome.criterion === 'economic') {
    const least = leastLifecycleCost(result);
    if (outcome.met) return 'least cost';
    return least === null || row.lifecycleCost === null ? 'not the least cost' : `costs ${text.number(row.lifecycleCost - least, 'money')} ${result.currency ?? 'currency units'} more`;
  }
  if (outcome.met) return 'met';
  const quantity = marginQuantity(outcome.criterion, basis)!;
  const shortfall = text.figure(Math.abs(outcome.margin), quantity);
  // A shortfall that rounds to nothing still fails: say so rather than "fails by 0.0 K".
  return /^0([.,]0*)?(\s|$)/.test(shortfall) ? 'fails, narrowly' : `fails by ${shortfall}`;
}

/** The mark of a row in the table: "chosen", "least lifecycle cost", "as given" (the case's own thickness), joined, or nothing. */
export function choiceMark(row: SizingRow, result: SizingResult): string {
  const marks: string[] = [];
  if (result.choice.kind === 'chosen' && sameThickness(row.thickness, result.choice.thickness)) marks.push('chosen');
  if (result.economicThickness !== null && sameThickness(row.thickness, result.economicThickness)) marks.push('least lifecycle cost');
  if (result.caseThickness !== undefined && sameThickness(row.thickness, result.caseThickness)) marks.push('as given');
  return marks.join(', ');
}
