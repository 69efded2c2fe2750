/**
 * What a case kind is: the unit of the case pipeline. Each kind (one folder under app/cases) says
 * how its file is parsed and validated completely, how it is solved (each state once), which
 * checks read the solved result, and how the result reads as a report. `solveCase` runs the four
 * in that order; nothing outside app/ decides what a case means.
 */
import type { QuantityText } from '../base/quantity-text.js';
import type { UnitSystem } from '../base/unit-systems.js';
import type { CheckResult } from '../checks/check-result.js';
import type { CaseReport } from '../report/report-model.js';
import type { MaterialResolver } from './case-material.js';
import type { PipeSize } from './pipe/pipe-sizes.js';
import type { InstalledCostTable, SizingResult } from './sizing/sizing-model.js';

/** What a case needs from outside the engine: library materials, the pipe-size tables and the sizing data. */
export interface CaseContext {
  readonly resolveMaterial: MaterialResolver;
  /** The pipe and tube size tables (data/pipe-sizes), for pipe cases that name a size. */
  readonly pipeSizes?: readonly PipeSize[];
  /**
   * Product family -> thicknesses (m, rising) of data/insulation-thickness-series.csv, for a sizing
   * series of the sized material's family or of a named one (app/cases/sizing/thickness-series.ts).
   */
  readonly thicknessSeries?: ReadonlyMap<string, readonly number[]>;
  /** The installed-cost tables a sizing's economics may name (data/sizing/installed-costs.csv and the user's own). */
  readonly installedCostTables?: readonly InstalledCostTable[];
  /**
   * The project's units, in which every sentence of the report reads (reasons, margins, subject,
   * notes, assumptions, warnings); default 'SI'. Inputs and result figures stay SI either way.
   */
  readonly unitSystem?: UnitSystem;
}

/** A case file after parsing: its validated input, its title, and the defaults the parser chose. */
export interface ParsedCase<Input> {
  readonly title: string;
  readonly input: Input;
  readonly assumptions: readonly string[];
}

export interface SolvedParts<Result> {
  readonly result: Result;
  readonly checks: readonly CheckResult[];
  readonly warnings: readonly string[];
  readonly assumptions: readonly string[];
  /** The table across the thickness series and the choice, for a pipe or flat case with a "sizing" block. */
  readonly sizing?: SizingResult;
}

export interface CaseKind<Input = unknown, Result = unknown> {
  /** The file's "kind". */
  readonly kind: string;
  /** One line for --help and menus. */
  readonly summary: string;
  // Method syntax: the registry holds kinds of different Input and Result in one list.
  /** Validates everything the solve will need; throws InputError naming the field. */
  parse(json: unknown, context: CaseContext): ParsedCase<Input>;
  /** Solves, then runs the checks on the solved result; `text` writes the figures in its sentences. */
  solve(parsed: ParsedCase<Input>, text: QuantityText): SolvedParts<Result>;
  report(parsed: ParsedCase<Input>, solved: SolvedParts<Result>, text: QuantityText): CaseReport;
}
