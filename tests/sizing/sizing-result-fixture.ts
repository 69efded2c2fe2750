/**
 * Two sizing results built by hand, for the tests of what shows a sizing (the report section, the
 * case editor's table): a hot pipe sized to a surface limit with economics, and a water line that
 * no thickness of its series protects from freezing. The numbers are invented for the tests; only
 * how they are worded and marked is checked with them.
 */
import type { CriterionOutcome, SizingResult, SizingRow } from '../../app/cases/sizing/sizing-model.js';

const surface = (margin: number): CriterionOutcome => ({
  criterion: 'maxSurfaceTemperature',
  met: margin > 0,
  margin,
  reason: `The surface must be at most 55 °C; it is ${55 - margin} °C.`,
});
const economic = (met: boolean): CriterionOutcome => ({ criterion: 'economic', met, margin: met ? 1 : -1, reason: 'Least lifecycle cost of the series.' });

function row(thickness: number, heatLoss: number, surfaceTemperature: number, insulationCost: number, lifecycleCost: number, outcomes: CriterionOutcome[]): SizingRow {
  return {
    thickness,
    heatLoss,
    surfaceTemperature,
    dewPointMargin: surfaceTemperature - 10,
    temperatureDrop: null,
    timeToZero: null,
    timeToFraction: null,
    annualEnergy: (heatLoss * 8760) / 1000,
    annualEnergyCost: ((heatLoss * 8760) / 1000) * 0.08,
    annualEmissions: ((heatLoss * 8760) / 1000) * 0.2,
    insulationCost,
    lifecycleCost,
    outcomes,
  };
}

/** A hot pipe: the surface limit is met from 40 mm, the least lifecycle cost is at 30 mm; 40 mm is chosen. */
export const HOT: SizingResult = {
  layer: 0,
  material: 'Rock wool',
  rows: [
    row(0.02, 60, 62.5, 20, 900, [surface(-7.5), economic(false)]),
    row(0.03, 45, 57.1, 25, 700, [surface(-2.1), economic(true)]),
    row(0.04, 38, 52.4, 31, 720, [surface(2.6), economic(false)]),
    row(0.05, 33, 49.0, 38, 760, [surface(6), economic(false)]),
  ],
  choice: { kind: 'chosen', thickness: 0.04, governing: 'maxSurfaceTemperature', reason: 'The surface temperature limit is the last criterion met as the thickness grows.' },
  factors: { presentValue: 15.62, annuity: 0.06403 },
  economicThickness: 0.03,
  currency: 'EUR',
  assumptions: ['energy price 0.08 per kWh, escalating 3 % a year'],
};

const freeze = (margin: number): CriterionOutcome => ({ criterion: 'freezeProtection', met: margin > 0, margin, reason: `The water must take at least 12 h to reach 0 °C; it takes ${12 + margin / 3600} h.` });

/** An outdoor water line no thickness of the series protects; the thickest's water never freezes the given fraction in the simulated time. */
export const FROZEN: SizingResult = {
  layer: 0,
  material: 'PIR',
  rows: [0.02, 0.03].map((thickness, i) => ({
    ...row(thickness, 20 - 5 * i, 4.5, 0, 0, [freeze(-4 * 3600 + i * 1800)]),
    annualEnergyCost: null,
    annualEmissions: null,
    insulationCost: null,
    lifecycleCost: null,
    timeToZero: 8 * 3600 + i * 1800,
    timeToFraction: i === 1 ? Infinity : 20 * 3600,
  })),
  choice: { kind: 'none', failures: [freeze(-3.5 * 3600)], reason: 'The thickest option still lets the water reach 0 °C too soon.' },
  factors: null,
  economicThickness: null,
  assumptions: [],
};
