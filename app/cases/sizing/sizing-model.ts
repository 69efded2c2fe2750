/**
 * What sizing is, as plain data: the options a case file carries in its "sizing" block, and the
 * table and choice the sizing produces. A pipe or flat case with a "sizing" block is sized by
 * solveCase (SolvedCase.sizing), so the command line (`lamina size`), the case editor's sizing
 * panel and the report read one result. All values SI: m, °C, K, W/m (pipe) or W/m² (flat), s,
 * kg/s, J/(kg·K), kWh/a, kg/a; money in the project's currency unit (no conversion).
 */

/** The thicknesses to try, all in m. */
export type ThicknessSeriesChoice =
  /** The series of the product family the sized material's name names (data/insulation-thickness-series.csv). */
  | { readonly kind: 'material' }
  /** A product family of that file, by its name ("PIR pipe section"). */
  | { readonly kind: 'named'; readonly family: string }
  /** from, from + step, … up to and including `to` (within round-off). */
  | { readonly kind: 'range'; readonly from: number; readonly to: number; readonly step: number }
  /** Given thicknesses (sorted and de-duplicated by the parser). */
  | { readonly kind: 'list'; readonly thicknesses: readonly number[] };

/** The criteria a user can switch on; each one present is on. */
export interface SizingCriteria {
  /** Personnel protection: surface at most `limit` °C (default the case's touch limit). */
  readonly maxSurfaceTemperature?: { readonly limit?: number };
  /** No surface condensation: surface at least `margin` K above the dew point of the ambient air. */
  readonly noCondensation?: { readonly margin: number };
  /** Heat loss (or gain, by magnitude) at most `limit` W/m (pipe) or W/m² (flat). */
  readonly maxHeatLoss?: { readonly limit: number };
  /**
   * Pipe only: the fluid's temperature change over the run at `massFlow` kg/s and `specificHeat`
   * J/(kg·K), integrated along the run with the temperature-dependent solve, at most `limit` K.
   */
  readonly maxTemperatureDrop?: { readonly massFlow: number; readonly specificHeat: number; readonly limit: number };
  /**
   * Pipe only, stagnant water: at least `minTimeToZero` s before the centre reaches 0 °C, and (when
   * given) at least `minTimeToFraction` s before `fraction` (0..1) of the water has frozen; the water
   * starts at `initialTemperature` °C and the air is `airTemperature` °C with `windSpeed` m/s.
   */
  readonly freezeProtection?: {
    readonly initialTemperature: number;
    readonly airTemperature: number;
    readonly windSpeed: number;
    readonly minTimeToZero: number;
    readonly fraction?: number;
    readonly minTimeToFraction?: number;
  };
  /** Economic thickness: the least lifecycle cost of the series (needs `economics`). */
  readonly economic?: Record<string, never>;
}

/** The money side, for the cost, CO₂ and lifecycle columns and the economic criterion. */
export interface SizingEconomics {
  /** Today's price per kWh of purchased energy (the fuel or electricity the efficiency turns into delivered heat or cooling), in the currency unit. */
  readonly energyPrice: number;
  /** Yearly escalation of the energy price, a fraction (0.03 = 3 %/a). */
  readonly priceEscalation: number;
  /** Efficiency of heat generation (or COP of cooling) turning fuel energy into delivered heat, > 0. */
  readonly generationEfficiency: number;
  /** Discount rate, a fraction per year. */
  readonly discountRate: number;
  /** Years of service evaluated. */
  readonly years: number;
  /** kg CO₂ per kWh of fuel (or electricity) energy, with where the figure comes from. */
  readonly emissionFactor: number;
  readonly emissionSource: string;
  /** Name of an installed-cost table (data/sizing/installed-costs.csv), or the table itself. */
  readonly costTable: string | InstalledCostTable;
  /** Currency unit printed beside money ("EUR", "GBP", "USD"); default "currency units". */
  readonly currency?: string;
}

/** Installed cost of the insulation by thickness: per metre of pipe (by outer diameter) or per m². */
export interface InstalledCostTable {
  readonly name: string;
  readonly basis: 'per-metre' | 'per-square-metre';
  /** Rows of [pipe outer diameter m (0 for per-m²), thickness m, cost]; interpolated linearly. */
  readonly points: readonly (readonly [number, number, number])[];
  readonly source: string;
}

export interface SizingOptions {
  /** Index (0-based, as in layers[i]) of the insulation layer to size. */
  readonly layer: number;
  readonly series: ThicknessSeriesChoice;
  readonly criteria: SizingCriteria;
  readonly economics?: SizingEconomics;
}

export type SizingCriterionName = keyof SizingCriteria;

/**
 * One criterion at one thickness. `margin` ≥ 0 is met, in the criterion's own quantity (K, W/m, s,
 * …; for the economic criterion the least lifecycle cost less this row's, 0 at the least).
 */
export interface CriterionOutcome {
  readonly criterion: SizingCriterionName;
  readonly met: boolean;
  readonly margin: number;
  /** One sentence: what was required and what this thickness gives. */
  readonly reason: string;
}

export interface SizingRow {
  /** m, of the sized layer. */
  readonly thickness: number;
  /** W/m or W/m²; positive = heat lost. */
  readonly heatLoss: number;
  /** °C */
  readonly surfaceTemperature: number;
  /** K, surface temperature minus the dew point of the ambient air. */
  readonly dewPointMargin: number;
  /** K, inlet minus outlet temperature (null when the criterion is off). */
  readonly temperatureDrop: number | null;
  /** s (null when off, Infinity when never within the simulated time). */
  readonly timeToZero: number | null;
  readonly timeToFraction: number | null;
  /** s, until ice first forms, at the pipe wall: earlier than the centre reaches 0 °C (null when off). */
  readonly timeToFirstIce?: number | null;
  /** kWh/a of delivered heat lost (or gained). */
  readonly annualEnergy: number;
  /** Per year, at the first year's price (null without economics). */
  readonly annualEnergyCost: number | null;
  /** kg/a (null without economics). */
  readonly annualEmissions: number | null;
  /** Installed cost of the insulation (null without economics). */
  readonly insulationCost: number | null;
  /** Installed cost + present value of the energy over the years (null without economics). */
  readonly lifecycleCost: number | null;
  readonly outcomes: readonly CriterionOutcome[];
}

export type SizingChoice =
  | {
      readonly kind: 'chosen';
      readonly thickness: number;
      /** The criterion that decided it: the last one to be met as thickness grows, or 'economic'. */
      readonly governing: SizingCriterionName;
      readonly reason: string;
    }
  | {
      readonly kind: 'none';
      /** Each criterion the thickest option fails, with its shortfall. */
      readonly failures: readonly CriterionOutcome[];
      readonly reason: string;
    };

export interface SizingResult {
  readonly layer: number;
  readonly material: string;
  readonly rows: readonly SizingRow[];
  readonly choice: SizingChoice;
  /** Shown with the economics: present-value factor of the escalating energy cost, and the annuity factor. */
  readonly factors: { readonly presentValue: number; readonly annuity: number } | null;
  /** The thickness of least lifecycle cost (null without economics). */
  readonly economicThickness: number | null;
  /** The currency unit of the money columns (the economics'), absent without economics. */
  readonly currency?: string;
  /** m, the sized layer's thickness in the case as given: always one of the rows. */
  readonly caseThickness?: number;
  readonly assumptions: readonly string[];
}
