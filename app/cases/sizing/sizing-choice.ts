/**
 * The choice from the table across the series: the thinnest thickness that meets every criterion
 * switched on; with the economic criterion on, the economic thickness when it is thicker (the least
 * lifecycle cost is then worth the extra insulation, and every other criterion still holds). The
 * criterion that decided it is the one met last as thickness grows: the one that fails at the next
 * thinner option. When no thickness meets every criterion, each one the thickest option fails is
 * named with its shortfall there.
 */
import type { QuantityText } from '../../base/quantity-text.js';
import type { CriterionOutcome, SizingChoice, SizingCriterionName, SizingRow } from './sizing-model.js';
import { CRITERION_NAMES, CRITERION_ORDER } from './sizing-words.js';

const physical = (o: CriterionOutcome) => o.criterion !== 'economic';
const meetsAll = (row: SizingRow) => row.outcomes.filter(physical).every((o) => o.met);
const outcomeOf = (row: SizingRow, criterion: SizingCriterionName) => row.outcomes.find((o) => o.criterion === criterion)!;

/** `rows` by thickness rising; `economicRow` the index of least lifecycle cost, or null without economics. */
export function chooseThickness(rows: readonly SizingRow[], economicRow: number | null, economicOn: boolean, text: QuantityText): SizingChoice {
  const criteria = CRITERION_ORDER.filter((c) => c !== 'economic' && rows[0]!.outcomes.some((o) => o.criterion === c));
  const of = (row: SizingRow) => text.figure(row.thickness, 'thickness');
  const thinnest = criteria.length === 0 ? 0 : rows.findIndex(meetsAll);
  if (thinnest < 0) {
    const thickest = rows[rows.length - 1]!;
    const failures = thickest.outcomes.filter((o) => physical(o) && !o.met);
    return {
      kind: 'none',
      failures,
      reason: `Even the thickest option, ${of(thickest)}, fails the ${failures.map((f) => CRITERION_NAMES[f.criterion]).join(' and the ')}; a series that goes thicker or a material that insulates better may meet ${failures.length > 1 ? 'them' : 'it'}, or the design conditions may need a second look.`,
    };
  }
  if (economicOn && economicRow !== null && (criteria.length === 0 || economicRow > thinnest)) {
    // From the economic thickness up, the first that meets the rest (the economic one itself, but for an odd series).
    const chosen = criteria.length === 0 ? economicRow : rows.findIndex((r, i) => i >= economicRow && meetsAll(r));
    if (chosen >= 0) {
      const economic = rows[economicRow]!;
      const beyond = criteria.length === 0 ? '' : ` The other criteria need only ${of(rows[thinnest]!)}.`;
      const above = chosen === economicRow ? '' : ` The next option that also meets every other criterion is ${of(rows[chosen]!)}.`;
      // A least cost at the end of the series is not a minimum found: the curve may fall further.
      const atEnd = rows.length < 2 ? '' : economicRow === rows.length - 1
        ? ' It is the thickest option: a thicker one may cost less still, so extend the series to find the least cost.'
        : economicRow === 0 ? ' It is the thinnest option: a thinner one may cost less still.' : '';
      return {
        kind: 'chosen',
        thickness: rows[chosen]!.thickness,
        governing: 'economic',
        reason: `The least lifecycle cost of the series is at ${of(economic)}.${atEnd}${above}${beyond}`,
      };
    }
  }
  const chosen = rows[thinnest]!;
  const governing = governingCriterion(rows, thinnest, criteria);
  if (thinnest === 0) {
    return { kind: 'chosen', thickness: chosen.thickness, governing, reason: `Every criterion is met already at the thinnest option of the series, ${of(chosen)}. ${outcomeOf(chosen, governing).reason}` };
  }
  const thinner = rows[thinnest - 1]!;
  return {
    kind: 'chosen',
    thickness: chosen.thickness,
    governing,
    reason: `At ${of(chosen)}: ${lowerFirst(outcomeOf(chosen, governing).reason)} At the next thinner option, ${of(thinner)}: ${lowerFirst(outcomeOf(thinner, governing).reason)}`,
  };
}

/**
 * The criterion met last as thickness grows up to the chosen row: for each, the first row from which
 * it holds at every thickness up to the chosen one; the latest of those governs. Ties (two criteria
 * first met at the same row) go to the first in the table's order.
 */
function governingCriterion(rows: readonly SizingRow[], chosen: number, criteria: readonly SizingCriterionName[]): SizingCriterionName {
  let governing = criteria[0]!;
  let latest = -1;
  for (const criterion of criteria) {
    let first = chosen;
    while (first > 0 && outcomeOf(rows[first - 1]!, criterion).met) first--;
    if (first > latest) {
      latest = first;
      governing = criterion;
    }
  }
  return governing;
}

function lowerFirst(sentence: string): string {
  return sentence.charAt(0).toLowerCase() + sentence.slice(1);
}
