/**
 * The thicknesses a sizing tries, from the series its block chose: the product family of the sized
 * material (its name names the family, thickness-series.ts), a family by name, a range or a list.
 * Resolved when the case is parsed, so a series that names nothing is refused before any solve.
 */
import { InputError } from '../../base/input-error.js';
import { isInRange } from '../../base/number-range.js';
import { enteredPart } from '../../base/quantity-sentence.js';
import { shownValue } from '../../base/shown-value.js';
import type { ThicknessSeriesChoice } from './sizing-model.js';
import { rangeThicknesses } from './sizing-options.js';
import { MAX_SERIES_THICKNESSES, SIZING_RANGES } from './sizing-ranges.js';
import { familyOf } from './thickness-series.js';

const FIELD = 'sizing.series';

/** Thicknesses in m, rising, without repeats. `materialName` is the sized layer's; `layerField` its path ("layers[0]"). */
export function seriesThicknesses(
  series: ThicknessSeriesChoice,
  materialName: string,
  layerField: string,
  catalogue: ReadonlyMap<string, readonly number[]> | undefined,
): readonly number[] {
  switch (series.kind) {
    case 'range':
      return rangeThicknesses(series.from, series.to, series.step);
    case 'list':
      return series.thicknesses;
    case 'material': {
      const families = requireCatalogue(catalogue, series.kind);
      const family = familyOf(materialName, families.keys());
      if (family === null) {
        throw new InputError(
          FIELD,
          `${FIELD} of kind 'material' finds no product family in the name of ${layerField}.material (${shownValue(materialName)}); name a family (${familyList(families)}) or give a range or a list.`,
        );
      }
      return familyThicknesses(families, family);
    }
    case 'named': {
      const families = requireCatalogue(catalogue, series.kind);
      if (!families.has(series.family)) {
        throw new InputError(`${FIELD}.family`, `${FIELD}.family must be one of ${familyList(families)} (got ${shownValue(series.family)}).`);
      }
      return familyThicknesses(families, series.family);
    }
  }
}

function requireCatalogue(catalogue: ReadonlyMap<string, readonly number[]> | undefined, kind: string): ReadonlyMap<string, readonly number[]> {
  if (catalogue === undefined || catalogue.size === 0) {
    throw new InputError(FIELD, `${FIELD} of kind '${kind}' needs the thickness series data, which is not available here; give a range or a list instead.`);
  }
  return catalogue;
}

const familyList = (families: ReadonlyMap<string, readonly number[]>) => [...families.keys()].map((f) => `'${f}'`).join(', ');

/** A family's thicknesses, held to the ranges of a case's own: the data file is edited by people. */
function familyThicknesses(families: ReadonlyMap<string, readonly number[]>, family: string): readonly number[] {
  const thicknesses = [...new Set(families.get(family) ?? [])].sort((a, b) => a - b);
  if (thicknesses.length === 0 || thicknesses.length > MAX_SERIES_THICKNESSES) {
    throw new InputError(FIELD, `${FIELD}: the family '${family}' lists ${thicknesses.length} thicknesses; a sizing tries 1 to ${MAX_SERIES_THICKNESSES}.`);
  }
  const outside = thicknesses.find((t) => !isInRange(t, SIZING_RANGES.thickness));
  if (outside !== undefined) {
    throw new InputError(FIELD, [`${FIELD}: the family '${family}' lists `, enteredPart(outside, 'thickness', `${outside} m`), ', outside the thicknesses an insulation layer may have.']);
  }
  return thicknesses;
}
