/**
 * The thicknesses insulation is sold in (data/insulation-thickness-series.csv; the page reads it
 * through renderer/src/case-editor/shipped-thickness-series.ts, the Node side through
 * CaseContext.thicknessSeries), so a layer's thickness can be picked from what exists as well as
 * typed, and a sizing sweep can try them. A material gets the series of the product family its
 * name names; rock wool and glass wool are mineral wools.
 */

/** Family -> thicknesses in m, rising. */
export function parseThicknessSeries(csv: string): Map<string, number[]> {
  const families = new Map<string, number[]>();
  for (const line of csv.split(/\r?\n/).slice(1)) {
    const [family, millimetres] = line.split(',');
    const thickness = Number(millimetres);
    if (!family || !Number.isFinite(thickness) || thickness <= 0) continue;
    families.set(family, [...(families.get(family) ?? []), thickness / 1000].sort((a, b) => a - b));
  }
  return families;
}

/** Words in a material name that mean the family's words (common practice, no source). */
const SAME_AS: readonly [RegExp, string][] = [
  [/\b(rock|stone|glass|slag) wool\b/g, 'mineral wool'],
  [/\bpolyisocyanurate\b/g, 'pir'],
];

/** The family whose every word the material's name contains, or null. */
export function familyOf(materialName: string, families: Iterable<string>): string | null {
  let name = materialName.toLowerCase();
  for (const [pattern, meaning] of SAME_AS) name = name.replace(pattern, meaning);
  for (const family of families) {
    if (family.toLowerCase().split(/\s+/).every((word) => name.includes(word))) return family;
  }
  return null;
}

/** The thicknesses (m) the material is sold in, or an empty list when its family is not in the series. */
export function thicknessesFor(series: ReadonlyMap<string, readonly number[]>, materialName: string): readonly number[] {
  const family = familyOf(materialName, series.keys());
  return family === null ? [] : (series.get(family) ?? []);
}
