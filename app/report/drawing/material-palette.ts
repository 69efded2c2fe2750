/**
 * Lamina's fills for the material categories in a cross-section: far enough apart in lightness to
 * tell apart in greyscale and on a monochrome printer (relative luminance from 0.87 for an air
 * layer down to 0.03 for a membrane), with a pattern on top for the categories that sit beside
 * each other most often (masonry hatched, air dotted, the bore of a pipe lined).
 */
import type { MaterialCategory } from '../../materials/material-properties.js';

export type FillPattern = 'none' | 'hatch' | 'dots' | 'lines';

export interface CategoryFill {
  readonly label: string;
  readonly colour: string;
  readonly pattern: FillPattern;
}

export const CATEGORY_FILLS: Readonly<Record<MaterialCategory, CategoryFill>> = {
  'air-layer': { label: 'Air layer', colour: '#eaf1f5', pattern: 'dots' },
  insulation: { label: 'Insulation', colour: '#f0d88a', pattern: 'none' },
  cladding: { label: 'Cladding or jacket', colour: '#a9b4bc', pattern: 'none' },
  other: { label: 'Other', colour: '#8aa27e', pattern: 'none' },
  building: { label: 'Building material', colour: '#b06f4c', pattern: 'hatch' },
  pipe: { label: 'Pipe or vessel metal', colour: '#4f5a63', pattern: 'none' },
  membrane: { label: 'Membrane', colour: '#2e2748', pattern: 'none' },
};

/** The fluid space inside a pipe. */
export const BORE_FILL: CategoryFill = { label: 'Bore', colour: '#d7e7f0', pattern: 'lines' };

/** The categories a drawing uses, once each, in the palette's order (for its legend). */
export function categoriesUsed(categories: readonly MaterialCategory[]): MaterialCategory[] {
  const used = new Set(categories);
  return (Object.keys(CATEGORY_FILLS) as MaterialCategory[]).filter((c) => used.has(c));
}
