/**
 * The sweep across the thickness series of a pipe or flat case: at each thickness the sized layer
 * takes that thickness and the case is solved exactly as its kind solves it (the kind's adapter,
 * pipe-sizing.ts or flat-sizing.ts, calls the kind's own calculation); then each criterion is
 * judged, the money and CO₂ columns are filled, and the thickness is chosen (sizing-choice.ts).
 *
 * The case's own thickness is a row of the table too, from the case's own solve, so the table shows
 * where the case as given stands. The thicknesses are solved in rising order, each starting the
 * engine's iteration from the temperatures of the one before (the fields of neighbouring
 * thicknesses differ little), and no report is built per row.
 */
import type { QuantityText } from '../../base/quantity-text.js';
import type { SteadyStart } from '../../fe/steady-solve.js';
import { leastLifecycleCostRow } from './economic-thickness.js';
import { installedCost } from './installed-cost-lookup.js';
import { rowEconomics } from './lifecycle-cost.js';
import type { PreparedSizing } from './prepared-sizing.js';
import { economicFactors } from './present-value-factors.js';
import { chooseThickness } from './sizing-choice.js';
import { economicOutcome, physicalOutcomes, type ThicknessFigures } from './sizing-criteria.js';
import type { SizingResult, SizingRow } from './sizing-model.js';
import { basisWords, sameThickness, type SizingBasis } from './sizing-words.js';

/** What one solve at one thickness gives the sweep, and where the next solve may start from. */
export interface SolvedThickness extends ThicknessFigures {
  readonly start: SteadyStart;
}

/** A pipe or flat case as the sweep sees it. */
export interface SizedCase {
  readonly basis: SizingBasis;
  /** The sized layer's material, by name. */
  readonly material: string;
  /** m, the sized layer's thickness in the case as given. */
  readonly caseThickness: number;
  /** The figures of the case as given (its own solve). */
  readonly caseFigures: SolvedThickness;
  /** h/a */
  readonly operatingHours: number;
  readonly touchLimit: number | undefined;
  /** m, the run of a pipe; null for a flat surface. */
  readonly runLength: number | null;
  /** m, the diameter the sized layer goes on (pipe, for the price per metre); null for a flat surface. */
  readonly costDiameter: number | null;
  /** Solves the case with the sized layer at `thickness`, starting from `start` when given. */
  figuresAt(thickness: number, start: SteadyStart | undefined): SolvedThickness;
  /** What the kind's side of the sweep assumed (the fluid along the run, the freeze model). */
  readonly assumptions: readonly string[];
}

export function sizeInsulated(sized: SizedCase, sizing: PreparedSizing, text: QuantityText): SizingResult {
  const thicknesses = [...sizing.thicknesses];
  if (!thicknesses.some((t) => sameThickness(t, sized.caseThickness))) thicknesses.push(sized.caseThickness);
  thicknesses.sort((a, b) => a - b);

  const context = { basis: sized.basis, touchLimit: sized.touchLimit, runLength: sized.runLength, text };
  const economics = sizing.economics ?? null;
  const factors = economics ? economicFactors(economics) : null;
  let start: SteadyStart | undefined;
  const rows: SizingRow[] = thicknesses.map((thickness) => {
    const own = sameThickness(thickness, sized.caseThickness);
    const figures = own ? sized.caseFigures : sized.figuresAt(thickness, start);
    start = figures.start;
    // Per metre of pipe or per m² of surface, as the cost table prices the insulation.
    const annualEnergy = (figures.heatLoss * sized.operatingHours) / 1000;
    const money = economics && sizing.costTable && factors
      ? rowEconomics(annualEnergy, installedCost(sizing.costTable, sized.costDiameter, thickness), economics, factors.presentValue)
      : null;
    return {
      thickness: own ? sized.caseThickness : thickness,
      heatLoss: figures.heatLoss,
      surfaceTemperature: figures.surfaceTemperature,
      dewPointMargin: figures.surfaceTemperature - figures.dewPoint,
      temperatureDrop: figures.temperatureDrop,
      timeToZero: figures.timeToZero,
      timeToFraction: figures.timeToFraction,
      timeToFirstIce: figures.timeToFirstIce ?? null,
      annualEnergy,
      annualEnergyCost: money?.annualEnergyCost ?? null,
      annualEmissions: money?.annualEmissions ?? null,
      insulationCost: money?.insulationCost ?? null,
      lifecycleCost: money?.lifecycleCost ?? null,
      outcomes: physicalOutcomes(sizing.criteria, figures, context),
    };
  });

  const least = economics ? leastLifecycleCostRow(rows) : null;
  const economicOn = sizing.criteria.economic !== undefined;
  const judged =
    economicOn && least !== null
      ? rows.map((r) => ({ ...r, outcomes: [...r.outcomes, economicOutcome(r.lifecycleCost!, { cost: least.lifecycleCost!, thickness: least.thickness }, text, economics!.currency ?? 'currency units')] }))
      : rows;
  const economicRow = least === null ? null : rows.indexOf(least);
  return {
    layer: sizing.layer,
    material: sized.material,
    rows: judged,
    choice: chooseThickness(judged, economicRow, economicOn, text),
    factors,
    economicThickness: least?.thickness ?? null,
    ...(economics ? { currency: economics.currency ?? 'currency units' } : {}),
    caseThickness: sized.caseThickness,
    assumptions: sweepAssumptions(sized, sizing, text),
  };
}

function sweepAssumptions(sized: SizedCase, sizing: PreparedSizing, text: QuantityText): string[] {
  const per = basisWords(sized.basis, text);
  const out = [
    `each thickness is solved as the case is, with only layer ${sizing.layer + 1} (${sized.material}) changed; the case's own ${text.figure(sized.caseThickness, 'thickness')} is a row of the table`,
    `${sizing.economics ? 'heat flows, yearly energy, costs and CO₂' : 'heat flows and yearly energy'} are ${per}, the energy over the case's ${text.figure(sized.operatingHours, 'hours')} of operation a year`,
    ...sized.assumptions,
  ];
  if (sizing.economics && sizing.costTable) {
    const e = sizing.economics;
    out.push(
      `installed cost of layer ${sizing.layer + 1} only, from the table '${sizing.costTable.name}' (${sizing.costTable.source}); the other layers cost the same at every thickness and do not move the choice`,
      `money in ${e.currency ?? 'the currency of the economics'}, as given (not converted); CO₂ at ${text.figure(e.emissionFactor, 'emissionFactor')} of purchased energy (${e.emissionSource})`,
    );
  }
  return out;
}
