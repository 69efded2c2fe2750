/**
 * The quantities a contractor prices and the totals a client asks for, from a sized schedule.
 * Per material, thickness and pipe size: the runs' insulated length, the outer surface area of the
 * insulation (for jacketing: π·D_outer·L per run), its volume (the annulus: π/4·(D_outer² − D_pipe²)·L
 * per run), and the fittings as counts and as equivalent lengths of insulated pipe. Per service and
 * for the job: heat flow and yearly energy with the chosen insulation and bare, and, with the
 * project's economics, their cost and CO₂. Runs that could not be sized are left out and listed.
 */
import { FITTING_KINDS, type FittingKind, type ScheduleEconomics, type ScheduleRun } from './schedule-model.js';
import type { SizedRun } from './size-run.js';

/** m of insulated pipe counted for one fitting of each kind (data/schedules/fitting-allowances.csv). */
export type FittingAllowances = Readonly<Record<FittingKind, number>>;

export interface QuantityLine {
  readonly material: string;
  /** m */
  readonly thickness: number;
  readonly pipeSeries: string;
  readonly pipeSize: string;
  /** m */
  readonly pipeOuterDiameter: number;
  readonly insulatedOuterDiameter: number;
  readonly runs: number;
  /** m */
  readonly length: number;
  /** m² */
  readonly outerArea: number;
  /** m³ */
  readonly volume: number;
  readonly fittings: Readonly<Record<FittingKind, number>>;
  /** m: the fittings as insulated pipe. */
  readonly fittingLength: number;
}

export interface EnergyTotals {
  readonly runs: number;
  /** m */
  readonly length: number;
  /** W, positive = lost (a chilled service gains heat: negative). */
  readonly heatLoss: number;
  readonly bareHeatLoss: number;
  /** kWh/a delivered heat (or cooling), signed as the heat flow. */
  readonly annualEnergy: number;
  readonly bareAnnualEnergy: number;
  /** Per year, of the fuel or electricity bought (null without economics). */
  readonly annualCost: number | null;
  readonly bareAnnualCost: number | null;
  /** kg/a (null without economics). */
  readonly annualEmissions: number | null;
  readonly bareAnnualEmissions: number | null;
}

export interface BillOfQuantities {
  readonly lines: readonly QuantityLine[];
  readonly services: readonly ({ readonly service: string } & EnergyTotals)[];
  /** The whole job: heat lost and gained add as magnitudes (energy bought either way). */
  readonly job: EnergyTotals;
  readonly currency: string | null;
  /** References of runs left out because they could not be sized. */
  readonly notSized: readonly string[];
}

export function billOfQuantities(
  runs: readonly ScheduleRun[],
  sized: ReadonlyMap<string, SizedRun>,
  allowances: FittingAllowances,
  economics: ScheduleEconomics | null,
): BillOfQuantities {
  const lines = new Map<string, QuantityLine>();
  const services = new Map<string, { service: string; parts: EnergyPart[] }>();
  const notSized: string[] = [];
  const jobParts: EnergyPart[] = [];
  for (const run of runs) {
    const s = sized.get(run.reference);
    if (s === undefined || !s.ok) {
      notSized.push(run.reference);
      continue;
    }
    const key = [s.material, s.thickness, run.pipeSeries, run.pipeSize.toLowerCase()].join('\u0000');
    const area = Math.PI * s.insulatedOuterDiameter * run.length;
    const volume = (Math.PI / 4) * (s.insulatedOuterDiameter ** 2 - s.pipeOuterDiameter ** 2) * run.length;
    const fittingLength = FITTING_KINDS.reduce((sum, k) => sum + run.fittings[k] * allowances[k], 0);
    const before = lines.get(key);
    lines.set(key, {
      material: s.material,
      thickness: s.thickness,
      pipeSeries: run.pipeSeries,
      pipeSize: run.pipeSize,
      pipeOuterDiameter: s.pipeOuterDiameter,
      insulatedOuterDiameter: s.insulatedOuterDiameter,
      runs: (before?.runs ?? 0) + 1,
      length: (before?.length ?? 0) + run.length,
      outerArea: (before?.outerArea ?? 0) + area,
      volume: (before?.volume ?? 0) + volume,
      fittings: Object.fromEntries(FITTING_KINDS.map((k) => [k, (before?.fittings[k] ?? 0) + run.fittings[k]])) as Record<FittingKind, number>,
      fittingLength: (before?.fittingLength ?? 0) + fittingLength,
    });
    const part: EnergyPart = { length: run.length, heatLoss: s.heatLoss, bareHeatLoss: s.bareHeatLoss, annualEnergy: s.annualEnergy, bareAnnualEnergy: s.bareAnnualEnergy };
    const serviceKey = run.service.toLowerCase();
    const entry = services.get(serviceKey) ?? { service: run.service, parts: [] };
    entry.parts.push(part);
    services.set(serviceKey, entry);
    jobParts.push(part);
  }
  const sortedLines = [...lines.values()].sort((a, b) => a.material.localeCompare(b.material) || a.pipeOuterDiameter - b.pipeOuterDiameter || a.thickness - b.thickness);
  return {
    lines: sortedLines,
    services: [...services.values()].map((s) => ({ service: s.service, ...totals(s.parts, economics, false) })),
    job: totals(jobParts, economics, true),
    currency: economics?.currency ?? null,
    notSized,
  };
}

interface EnergyPart {
  readonly length: number;
  readonly heatLoss: number;
  readonly bareHeatLoss: number;
  readonly annualEnergy: number;
  readonly bareAnnualEnergy: number;
}

function totals(parts: readonly EnergyPart[], economics: ScheduleEconomics | null, asMagnitudes: boolean): EnergyTotals {
  const sum = (f: (p: EnergyPart) => number) => parts.reduce((total, p) => total + (asMagnitudes ? Math.abs(f(p)) : f(p)), 0);
  const annualEnergy = sum((p) => p.annualEnergy);
  const bareAnnualEnergy = sum((p) => p.bareAnnualEnergy);
  // Fuel or electricity bought: the heat (or cooling) delivered over the efficiency (or COP), whichever its sign.
  const bought = (energy: number) => Math.abs(energy) / (economics?.generationEfficiency ?? 1);
  const boughtEnergy = parts.reduce((t, p) => t + bought(p.annualEnergy), 0);
  const bareBoughtEnergy = parts.reduce((t, p) => t + bought(p.bareAnnualEnergy), 0);
  return {
    runs: parts.length,
    length: parts.reduce((t, p) => t + p.length, 0),
    heatLoss: sum((p) => p.heatLoss),
    bareHeatLoss: sum((p) => p.bareHeatLoss),
    annualEnergy,
    bareAnnualEnergy,
    annualCost: economics ? boughtEnergy * economics.energyPrice : null,
    bareAnnualCost: economics ? bareBoughtEnergy * economics.energyPrice : null,
    annualEmissions: economics ? boughtEnergy * economics.emissionFactor : null,
    bareAnnualEmissions: economics ? bareBoughtEnergy * economics.emissionFactor : null,
  };
}

/** The allowances from data/schedules/fitting-allowances.csv's text. */
export function parseFittingAllowances(csv: string): FittingAllowances {
  const found: Partial<Record<FittingKind, number>> = {};
  for (const line of csv.split(/\r?\n/).slice(1)) {
    const [kind, metres] = line.split(',');
    if ((FITTING_KINDS as readonly string[]).includes(kind ?? '') && Number(metres) >= 0) found[kind as FittingKind] = Number(metres);
  }
  for (const kind of FITTING_KINDS) if (found[kind] === undefined) throw new Error(`The fitting allowances give no length for ${kind}.`);
  return found as FittingAllowances;
}
