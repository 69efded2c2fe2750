/** How the library table writes a material's figures: short, SI, never NaN (an absent value is "–"). */
import type { ConductivityModel, MaterialCategory } from '../../../app/api/contract.js';
import { formatValue } from '../shared/number-format.js';

export const CATEGORY_LABELS: Readonly<Record<MaterialCategory, string>> = {
  building: 'Building material',
  insulation: 'Insulation',
  pipe: 'Pipe material',
  cladding: 'Cladding or jacket',
  membrane: 'Membrane',
  'air-layer': 'Air layer',
  other: 'Other',
};

export function conductivitySummary(model: ConductivityModel): string {
  if (model.kind === 'constant') return formatValue(model.value);
  if (model.kind === 'polynomial') return `curve, ${formatValue(model.coefficients[0] ?? Number.NaN)} at 0 °C`;
  const values = model.points.map((p) => p[1]);
  return `table, ${formatValue(Math.min(...values))} to ${formatValue(Math.max(...values))}`;
}

export function optionalFigure(value: number | null): string {
  if (value === null) return '–';
  if (value === Infinity) return 'vapour-tight';
  return formatValue(value);
}
