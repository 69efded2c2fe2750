/**
 * The ISO 6946 combined method for a building element of homogeneous and inhomogeneous (bridged)
 * layers (EN ISO 6946:2017 §6.7.2; the formulas as the reference notes §2 give them, from memory,
 * because the standard's text was not found in the search corpus):
 *
 * - upper limit R'_T: heat flows straight through the element along parallel paths, one per
 *   combination of sections m with area fraction f_m, each path a series of homogeneous layers
 *   with its own R_Tm = R_si + Σ_j d_j/λ_mj + R_se; then 1/R'_T = Σ_m f_m/R_Tm;
 * - lower limit R''_T: every plane parallel to the faces is isothermal, so a bridged layer j acts
 *   as one layer of equivalent conductivity λ''_j = Σ_m f_m·λ_mj, and R''_T = R_si + Σ_j d_j/λ''_j + R_se;
 * - R_T = (R'_T + R''_T)/2 and the largest relative error e = (R'_T − R''_T)/(2·R_T).
 *
 * The paths of several bridged layers are every combination of their sections, with the product
 * of their fractions: the sections of one layer lie independently of those of another (battens
 * across studs). That is exact for one bridged layer and our assumption for more (no source).
 */

/** One section of a bridged layer: its area fraction and its conductivity (W/(m·K), read at 10 °C). */
export interface CombinedSection {
  readonly name: string;
  readonly fraction: number;
  readonly conductivity: number;
}

/** A layer of the element as the combined method sees it. */
export type CombinedPart =
  | { readonly kind: 'homogeneous'; readonly resistance: number }
  | { readonly kind: 'bridged'; readonly thickness: number; readonly sections: readonly CombinedSection[] };

export interface CombinedPath {
  /** The section taken in each bridged layer, inside → outside. */
  readonly sections: readonly string[];
  /** f_m, product of the sections' fractions. */
  readonly fraction: number;
  /** R_Tm, surface to surface plus both surface resistances, m²·K/W. */
  readonly totalResistance: number;
}

export interface CombinedBridgedLayer {
  /** Position of the layer in the parts list. */
  readonly part: number;
  /** λ''_j = Σ f_m·λ_mj, W/(m·K). */
  readonly lowerLimitConductivity: number;
  /** d_j/λ''_j, m²·K/W. */
  readonly lowerLimitResistance: number;
  /**
   * The resistance the layer carries in the one-dimensional solve: its lower-limit resistance
   * scaled, with every bridged layer by the same factor, so that the series sum of the element is
   * R_T (our modelling choice; exact for one bridged layer).
   */
  readonly equivalentResistance: number;
}

export interface CombinedMethodResult {
  /** R'_T, m²·K/W. */
  readonly upperLimit: number;
  /** R''_T, m²·K/W. */
  readonly lowerLimit: number;
  /** R_T = (R'_T + R''_T)/2, m²·K/W. */
  readonly totalResistance: number;
  /** e = (R'_T − R''_T)/(2·R_T). */
  readonly relativeError: number;
  readonly paths: readonly CombinedPath[];
  readonly bridgedLayers: readonly CombinedBridgedLayer[];
}

/** Most parallel paths the upper limit enumerates (each bridged layer multiplies them by its sections). */
export const MAXIMUM_COMBINED_PATHS = 256;

/** The number of parallel paths the upper limit needs: the product of the bridged layers' section counts. */
export function combinedPathCount(sectionCounts: readonly number[]): number {
  return sectionCounts.reduce((n, k) => n * k, 1);
}

/**
 * R'_T, R''_T, R_T and e of an element; `parts` inside → outside, `insideSurfaceResistance` and
 * `outsideSurfaceResistance` in m²·K/W. With no bridged part the three resistances are equal.
 */
export function combinedMethod(parts: readonly CombinedPart[], insideSurfaceResistance: number, outsideSurfaceResistance: number): CombinedMethodResult {
  const surfaces = insideSurfaceResistance + outsideSurfaceResistance;
  const homogeneous = parts.reduce((s, p) => s + (p.kind === 'homogeneous' ? p.resistance : 0), 0);
  const bridged = parts.flatMap((p, part) => (p.kind === 'bridged' ? [{ part, layer: p }] : []));

  // Upper limit: every combination of one section per bridged layer is a path through the element.
  let paths: { sections: string[]; fraction: number; resistance: number }[] = [{ sections: [], fraction: 1, resistance: surfaces + homogeneous }];
  for (const { layer } of bridged) {
    paths = paths.flatMap((path) =>
      layer.sections.map((s) => ({
        sections: [...path.sections, s.name],
        fraction: path.fraction * s.fraction,
        resistance: path.resistance + layer.thickness / s.conductivity,
      })),
    );
  }
  const conductance = paths.reduce((g, p) => g + p.fraction / p.resistance, 0);
  const upperLimit = 1 / conductance;

  // Lower limit: each bridged layer as one layer of the area-weighted conductivity.
  const lower = bridged.map(({ part, layer }) => {
    const lambda = layer.sections.reduce((s, m) => s + m.fraction * m.conductivity, 0);
    return { part, lowerLimitConductivity: lambda, lowerLimitResistance: layer.thickness / lambda };
  });
  const bridgedLower = lower.reduce((s, l) => s + l.lowerLimitResistance, 0);
  const lowerLimit = surfaces + homogeneous + bridgedLower;

  const upper = upperLimit;
  const totalResistance = (upper + lowerLimit) / 2;
  const scale = bridgedLower > 0 ? (totalResistance - surfaces - homogeneous) / bridgedLower : 1;
  return {
    upperLimit: upper,
    lowerLimit,
    totalResistance,
    relativeError: (upper - lowerLimit) / (2 * totalResistance),
    paths: paths.map((p) => ({ sections: p.sections, fraction: p.fraction, totalResistance: p.resistance })),
    bridgedLayers: lower.map((l) => ({ ...l, equivalentResistance: l.lowerLimitResistance * scale })),
  };
}
