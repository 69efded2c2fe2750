/**
 * The report model: what a person reads about one solved case, as plain JSON-serialisable data.
 * Text (`lamina solve --format text`), screen and paper are three renderings of it, so no meaning
 * is written twice. Values are SI; each carries the kind of quantity it is (app/base/quantities),
 * which fixes its unit and its printed precision in every rendering.
 */
import type { QuantityName } from '../base/quantities.js';
import type { CheckVerdict } from '../checks/check-result.js';
import type { MaterialCategory } from '../materials/material-properties.js';

/** One number a person reads, with what it is. `value` null prints as "—" (not applicable). */
export interface ReportFigure {
  readonly label: string;
  readonly value: number | null;
  readonly quantity: QuantityName;
  /** A few words after the figure ("to 2 significant figures (ISO 6946)"). */
  readonly note?: string;
}

export type ReportCell = string | { readonly value: number | null; readonly quantity: QuantityName };

export interface ReportColumn {
  readonly label: string;
  /** Unit shown in the header; taken from the quantity of the column's cells when they are numbers. */
  readonly quantity?: QuantityName;
}

export interface ReportTable {
  readonly title: string;
  readonly columns: readonly ReportColumn[];
  readonly rows: readonly (readonly ReportCell[])[];
}

export interface ReportSeries {
  readonly name: string;
  readonly points: readonly (readonly [number, number])[];
  /** Drawn dashed (a limit such as saturation or the dew point) rather than solid. */
  readonly reference?: boolean;
}

export interface ReportChart {
  readonly title: string;
  /** `categories`, where given, names the x values 0, 1, 2… (months of a year) in place of numbers. */
  readonly x: { readonly label: string; readonly quantity: QuantityName; readonly categories?: readonly string[] };
  readonly y: { readonly label: string; readonly quantity: QuantityName };
  readonly series: readonly ReportSeries[];
  /** Vertical lines at these x positions (layer interfaces), with labels. */
  readonly markers?: readonly { readonly x: number; readonly label: string }[];
  /**
   * Title of a table in the same report that lists the figures this chart draws; a text rendering
   * points to that table instead of printing the series again.
   */
  readonly tabulatedIn?: string;
}

/** One layer of a cross-section, inside to outside. */
export interface ReportCrossSectionLayer {
  readonly name: string;
  /** Decides the layer's fill in a drawing. */
  readonly category: MaterialCategory;
  /** m */
  readonly thickness: number;
}

/**
 * The build-up as a picture to scale: bands of a plane element, or concentric rings round a
 * pipe's bore. The renderings draw it from these numbers alone.
 */
export type ReportCrossSection = {
  readonly title: string;
  readonly layers: readonly ReportCrossSectionLayer[];
  /**
   * °C at the inner face, at each interface and at the outer face: one more than the layers.
   * Null where the calculation gives none (layers outside a well ventilated air layer).
   */
  readonly temperatures: readonly (number | null)[];
  /** Title of the table in the same report that lists these layers; a text rendering points to it. */
  readonly tabulatedIn: string;
} & ({ readonly geometry: 'plane' } | { readonly geometry: 'cylinder'; /** m, the radius of the bore inside the first layer */ readonly innerRadius: number });

export interface ReportVerdict {
  readonly check: string;
  readonly title: string;
  readonly verdict: CheckVerdict;
  /** "18.6 K above the dew point": the margin in words with its unit, already phrased. */
  readonly margin?: string;
  readonly reason: string;
  readonly caution?: string;
}

export type ReportBlock =
  | { readonly kind: 'figures'; readonly figures: readonly ReportFigure[] }
  | { readonly kind: 'table'; readonly table: ReportTable }
  | { readonly kind: 'chart'; readonly chart: ReportChart }
  | { readonly kind: 'cross-section'; readonly crossSection: ReportCrossSection }
  | { readonly kind: 'paragraphs'; readonly paragraphs: readonly string[] };

export interface ReportSection {
  /** Stable id ("build-up", "temperatures", "checks"). */
  readonly id: string;
  readonly heading: string;
  readonly blocks: readonly ReportBlock[];
}

export interface CaseReport {
  readonly kind: string;
  readonly title: string;
  /** One line saying what was calculated ("Insulated pipe, DN100 steel, 50 mm mineral wool, indoors"). */
  readonly subject: string;
  /** The figures a reader looks at first. */
  readonly keyFigures: readonly ReportFigure[];
  readonly verdicts: readonly ReportVerdict[];
  readonly sections: readonly ReportSection[];
  /** The energy balance that proves the solve: residual and relative residual, with its basis. */
  readonly energyBalance: { readonly residual: number; readonly relativeResidual: number; readonly quantity: QuantityName };
  readonly assumptions: readonly string[];
  readonly warnings: readonly string[];
  /** Methods, standards and data sources used, with their provenance ("from memory" lives here). */
  readonly sources: readonly string[];
  /** Each distinct caution once. */
  readonly cautions: readonly string[];
}
