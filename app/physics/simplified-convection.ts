/**
 * The simplified trade formulas for the convective coefficient of insulation surfaces in air
 * (ISO 12241:2008 / VDI 2055-1 style), as an alternative to the general correlations.
 *
 * The coefficients are data (data/physics/simplified-convection.json), each row labelled with
 * where it comes from, because several are recalled rather than read from the standard. Every
 * case is one power law h = c₀/L + c·ΔT^a·v^b·L^e with a laminar and a turbulent row, selected by
 * L³·ΔT (natural convection) or v·L (wind) against the case's threshold.
 */
import table from '../../data/physics/simplified-convection.json' with { type: 'json' };
import { QUANTITIES, type QuantityName } from '../base/quantities.js';
import { figurePart, type Sentence, type SentencePart } from '../base/quantity-sentence.js';
import { InputError } from './errors.js';
import { requireFinite, requireNonNegative, requirePositive } from './input-checks.js';

export type SimplifiedCase = 'horizontal-pipe-natural' | 'vertical-natural' | 'wall-wind' | 'pipe-wind';

export interface SimplifiedFormulaRow {
  readonly constantOverLength: number;
  readonly factor: number;
  readonly temperatureDifferenceExponent: number;
  readonly windSpeedExponent: number;
  readonly lengthExponent: number;
  readonly label: string;
  /** A caution the user sees whenever this row is used. */
  readonly caution?: string;
  /** The caution's figures, in the order they appear: their text there, SI value and quantity kind. */
  readonly cautionFigures?: readonly CautionFigure[];
}

export interface CautionFigure {
  readonly text: string;
  readonly value: number;
  readonly quantity: string;
  readonly bare?: boolean;
}

export interface SimplifiedCaseRow {
  readonly id: string;
  readonly description: string;
  readonly length: string;
  readonly regimeQuantity: string;
  readonly threshold: number;
  readonly thresholdLabel: string;
  readonly laminar: SimplifiedFormulaRow;
  readonly turbulent: SimplifiedFormulaRow;
}

/** The formula table as shipped; callers may pass an edited copy to `simplifiedConvection`. */
export const SIMPLIFIED_CONVECTION_TABLE: readonly SimplifiedCaseRow[] = table.cases;
export const SIMPLIFIED_CONVECTION_SOURCE: string = table.source;

export interface SimplifiedConvectionInput {
  readonly case: SimplifiedCase;
  /** |θ_s − θ_a|, K (the sign is ignored). */
  readonly temperatureDifference: number;
  /** m: outer diameter for pipes in wind and horizontal pipes, height for vertical surfaces and walls. */
  readonly length: number;
  /** m/s; needed for the wind cases. */
  readonly windSpeed?: number;
}

export interface SimplifiedConvectionResult {
  /** h_cv, W/(m²·K) */
  readonly coefficient: number;
  readonly regime: 'laminar' | 'turbulent';
  /** L³·ΔT or v·L, the quantity compared with the threshold. */
  readonly regimeValue: number;
  readonly label: string;
  readonly warnings: readonly Sentence[];
}

function isWindCase(id: SimplifiedCase): boolean {
  return id === 'pipe-wind' || id === 'wall-wind';
}

/** Evaluates one simplified case; `rows` defaults to the shipped table. */
export function simplifiedConvection(
  input: SimplifiedConvectionInput,
  rows: readonly SimplifiedCaseRow[] = SIMPLIFIED_CONVECTION_TABLE,
): SimplifiedConvectionResult {
  const row = rows.find((r) => r.id === input.case);
  if (!row) {
    throw new InputError('case', `case must be one of ${rows.map((r) => `'${r.id}'`).join(', ')} (got '${String(input.case)}').`);
  }
  const dT = Math.abs(requireFinite('temperatureDifference', input.temperatureDifference, 'K'));
  const L = requirePositive('length', input.length, 'm');
  const wind = isWindCase(input.case);
  const v = wind ? requireNonNegative('windSpeed', input.windSpeed, 'm/s') : 0;
  const regimeValue = wind ? v * L : L ** 3 * dT;
  const regime = regimeValue <= row.threshold ? 'laminar' : 'turbulent';
  const f = row[regime];
  const coefficient =
    f.constantOverLength / L +
    f.factor * dT ** f.temperatureDifferenceExponent * v ** f.windSpeedExponent * L ** f.lengthExponent;
  const warnings = f.caution ? [cautionSentence(f.caution, f.cautionFigures ?? [])] : [];
  return { coefficient, regime, regimeValue, label: f.label, warnings };
}

/**
 * A row's caution as a sentence whose figures read in the project's units: each listed figure is
 * found in the text in order and kept as its SI value and kind. A figure missing from the text, or
 * of no known kind, is an error of the table, not of the user's input.
 */
function cautionSentence(caution: string, figures: readonly CautionFigure[]): Sentence {
  if (figures.length === 0) return caution;
  const parts: SentencePart[] = [];
  let rest = caution;
  for (const f of figures) {
    const at = rest.indexOf(f.text);
    if (at < 0 || !(f.quantity in QUANTITIES)) throw new Error(`The simplified-convection table's caution does not hold the figure "${f.text}" of kind "${f.quantity}".`);
    parts.push(rest.slice(0, at), figurePart(f.value, f.quantity as QuantityName, f.text, f.bare ?? false));
    rest = rest.slice(at + f.text.length);
  }
  parts.push(rest);
  return parts;
}
