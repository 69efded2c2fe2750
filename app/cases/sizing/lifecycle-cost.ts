/**
 * The money and CO₂ columns of one row of the sizing table, from the row's yearly delivered
 * energy and its installed cost.
 *
 * What the figures mean (the economics' fields are read this way everywhere in sizing):
 * - annualEnergy is the delivered heat lost (or, on a cold line, gained) per year, kWh/a, at the
 *   meter of the plant that makes it good; its sign only says which way heat flows, so its
 *   magnitude is used.
 * - generationEfficiency turns delivered heat into purchased energy: fuel for a boiler (0.9 means
 *   1 kWh of fuel gives 0.9 kWh of heat), electricity for a chiller or heat pump, where the
 *   "efficiency" is the COP (3 means 1 kWh of electricity removes 3 kWh of heat).
 * - energyPrice is per kWh of that purchased energy (the fuel or the electricity on the bill), at
 *   today's price; emissionFactor is kg CO₂ per kWh of the same purchased energy.
 * - The lifecycle cost is the installed cost plus the present value of the energy over the years,
 *   with the present-value factor of present-value-factors.ts (year-end payments, escalating).
 */
import type { SizingEconomics } from './sizing-model.js';
import { presentValueFactor } from './present-value-factors.js';

type EnergyEconomics = Pick<SizingEconomics, 'generationEfficiency' | 'energyPrice' | 'emissionFactor'>;

/** kWh/a of fuel or electricity bought to make good `annualEnergy` kWh/a of delivered heat (or cooling). */
export function annualPurchasedEnergy(annualEnergy: number, economics: Pick<SizingEconomics, 'generationEfficiency'>): number {
  return Math.abs(annualEnergy) / economics.generationEfficiency;
}

/** Cost of the first year's purchased energy at today's price, in the currency unit per year. */
export function annualEnergyCost(annualEnergy: number, economics: EnergyEconomics): number {
  return annualPurchasedEnergy(annualEnergy, economics) * economics.energyPrice;
}

/** kg CO₂ per year from the purchased energy. */
export function annualEmissions(annualEnergy: number, economics: EnergyEconomics): number {
  return annualPurchasedEnergy(annualEnergy, economics) * economics.emissionFactor;
}

/** Installed cost plus the present value of the energy: PV × the first year's energy cost. */
export function lifecycleCost(insulationCost: number, firstYearEnergyCost: number, presentValue: number): number {
  return insulationCost + presentValue * firstYearEnergyCost;
}

/** The money fields of a SizingRow (app/cases/sizing/sizing-model.ts). */
export interface RowEconomics {
  readonly annualEnergyCost: number;
  readonly annualEmissions: number;
  readonly insulationCost: number;
  readonly lifecycleCost: number;
}

/**
 * One row's cost, CO₂ and lifecycle cost. `presentValue` is passed in (economicFactors) so a sweep
 * computes it once for the whole series; without it, it is computed from the economics.
 */
export function rowEconomics(
  annualEnergy: number,
  insulationCost: number,
  economics: SizingEconomics,
  presentValue = presentValueFactor(economics.priceEscalation, economics.discountRate, economics.years),
): RowEconomics {
  const energyCost = annualEnergyCost(annualEnergy, economics);
  return {
    annualEnergyCost: energyCost,
    annualEmissions: annualEmissions(annualEnergy, economics),
    insulationCost,
    lifecycleCost: lifecycleCost(insulationCost, energyCost, presentValue),
  };
}
