/**
 * Corrections to the U-value of ISO 6946 Annex F (EN ISO 6946:2017; Annex D in the 2007 edition),
 * from memory: the standard's text was not found in the search corpus. U_c = U + ΔU with
 *
 * - air gaps in an insulation layer: ΔU_g = ΔU''·(R_1/R_T,h)², ΔU'' = 0 (level 0: no gaps that
 *   matter), 0.01 (level 1: gaps from the warm to the cold side of the insulation, no air
 *   circulation) or 0.04 W/(m²·K) (level 2: such gaps with free air circulation);
 * - mechanical fasteners crossing an insulation layer: ΔU_f = α·λ_f·n_f·A_f/d_0·(R_1/R_T,h)²,
 *   α = 0.8 for a fastener through the whole layer, 0.8·d_1/d_0 for a recessed one; no correction
 *   when λ_f < 1 W/(m·K);
 *
 * where R_1 is the thermal resistance of the layer with the gaps or fasteners and R_T,h the total
 * resistance of the element ignoring thermal bridging: a bridged layer counts as its own material
 * (the infill) in both. The standard lets a total correction below 3 % of U be left out (a
 * secondary source says the same); Lamina applies every correction, which can only raise U.
 */
import type { AirGapLevel, WallFasteners } from './wall-input.js';

/** ΔU'' of each air-gap level, W/(m²·K) (ISO 6946 Annex F table, from memory). */
export const AIR_GAP_DELTA_U: Readonly<Record<AirGapLevel, number>> = { 0: 0, 1: 0.01, 2: 0.04 };
/** α of a fastener that crosses the whole layer (ISO 6946 Annex F, from memory). */
export const FASTENER_ALPHA = 0.8;
/** Fasteners below this conductivity need no correction, W/(m·K) (ISO 6946 Annex F, from memory). */
export const FASTENER_CONDUCTIVITY_THRESHOLD = 1;

/** The layer a correction belongs to, with the resistances the formula reads. */
export interface CorrectedLayer {
  readonly index: number;
  readonly name: string;
  /** d_0, m */
  readonly thickness: number;
  /** R_1, m²·K/W */
  readonly resistance: number;
  readonly airGapLevel?: AirGapLevel;
  readonly fasteners?: WallFasteners;
}

export interface AirGapCorrection {
  readonly index: number;
  readonly name: string;
  readonly level: AirGapLevel;
  /** ΔU'', W/(m²·K) */
  readonly levelValue: number;
  readonly layerResistance: number;
  /** ΔU_g, W/(m²·K) */
  readonly deltaU: number;
}

export interface FastenerCorrection {
  readonly index: number;
  readonly name: string;
  /** α: 0.8, or 0.8·d_1/d_0 for a recessed fastener */
  readonly alpha: number;
  /** d_1 used, m (the whole layer when the fastener crosses it, or when it is longer than the layer) */
  readonly lengthInLayer: number;
  readonly layerResistance: number;
  /** False when λ_f < 1 W/(m·K): no correction. */
  readonly applies: boolean;
  /** ΔU_f, W/(m²·K) */
  readonly deltaU: number;
}

export interface UCorrections {
  /** R_T,h, m²·K/W */
  readonly resistanceIgnoringBridges: number;
  readonly airGaps: readonly AirGapCorrection[];
  readonly fasteners: readonly FastenerCorrection[];
  /** ΔU = Σ ΔU_g + Σ ΔU_f, W/(m²·K) */
  readonly total: number;
}

/** The Annex F corrections of the layers that carry air gaps or fasteners; `resistanceIgnoringBridges` is R_T,h. */
export function uCorrections(layers: readonly CorrectedLayer[], resistanceIgnoringBridges: number): UCorrections {
  const ratioSquared = (r1: number) => (r1 / resistanceIgnoringBridges) ** 2;
  const airGaps = layers.flatMap((l): AirGapCorrection[] => {
    if (l.airGapLevel === undefined) return [];
    const levelValue = AIR_GAP_DELTA_U[l.airGapLevel];
    return [{ index: l.index, name: l.name, level: l.airGapLevel, levelValue, layerResistance: l.resistance, deltaU: levelValue * ratioSquared(l.resistance) }];
  });
  const fasteners = layers.flatMap((l): FastenerCorrection[] => {
    const f = l.fasteners;
    if (f === undefined) return [];
    // A recessed fastener longer than the layer (a thinner layer of a thickness series) crosses all of it.
    const d1 = Math.min(f.lengthInLayer ?? l.thickness, l.thickness);
    const alpha = FASTENER_ALPHA * (d1 / l.thickness);
    const applies = f.conductivity >= FASTENER_CONDUCTIVITY_THRESHOLD;
    const deltaU = applies ? ((alpha * f.conductivity * f.perSquareMetre * f.crossSectionArea) / l.thickness) * ratioSquared(l.resistance) : 0;
    return [{ index: l.index, name: l.name, alpha, lengthInLayer: d1, layerResistance: l.resistance, applies, deltaU }];
  });
  const total = [...airGaps, ...fasteners].reduce((s, c) => s + c.deltaU, 0);
  return { resistanceIgnoringBridges, airGaps, fasteners, total };
}
