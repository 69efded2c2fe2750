/**
 * Readable summary of a wall or roof analysis (`lamina solve --format text`). Rounded here, at the
 * edge; the JSON output keeps full precision.
 */
import type { WallAnalysis } from '../../../app/cases/wall/wall-analysis.js';
import { checksText, fixed, scientific } from './text-helpers.js';

export function wallText(title: string, a: WallAnalysis): string {
  const w = a.wall;
  const layerLines = w.layers.map((l) => {
    const r = l.thermalResistance === null ? 'not counted' : `${fixed(l.thermalResistance, 3)} m²·K/W`;
    const temps = l.innerTemperature === null ? '' : `${fixed(l.innerTemperature, 1).padStart(7)} → ${fixed(l.outerTemperature!, 1).padStart(6)} °C`;
    return `  ${l.name.slice(0, 40).padEnd(40)} ${fixed(l.thickness * 1000, 1).padStart(7)} mm   ${r.padStart(15)}   ${temps}`;
  });
  const monthly = a.interstitialMonthly;
  const monthlyLines = monthly
    ? [
        '',
        `Interstitial condensation over the year (${monthly.climateLabel}):`,
        '  month        stored water kg/m²',
        ...monthly.months.map((m) => `  ${m.month.padEnd(12)} ${fixed(m.totalAccumulated, 4).padStart(10)}`),
        `  largest ${fixed(monthly.maxAccumulated, 4)} kg/m²; left at the end of the year ${fixed(monthly.remainingAtEnd, 4)} kg/m².`,
      ]
    : [];
  return [
    title,
    `Wall or roof, ${w.area} m²`,
    '',
    `U-value ${fixed(w.uValueRounded, 2)} W/(m²·K) (full precision ${w.uValue.toPrecision(6)}); R_T ${fixed(w.totalResistance, 3)} m²·K/W with R_si ${fixed(w.insideSurfaceResistance, 2)} and R_se ${fixed(w.outsideSurfaceResistance, 2)}.`,
    `Heat flow ${fixed(w.heatFlowDensity, 2)} W/m², ${fixed(w.heatFlow, 1)} W over the area; inside surface ${fixed(w.insideSurfaceTemperature, 2)} °C, outside surface ${fixed(w.outsideSurfaceTemperature, 2)} °C.`,
    `Energy balance residual ${scientific(w.energyBalance.residual)} W/m² (relative ${scientific(w.energyBalance.relativeResidual)}).`,
    '',
    'Layers, inside to outside                        thickness        resistance   temperatures',
    ...layerLines,
    ...monthlyLines,
    '',
    ...checksText(a.checks),
    '',
  ].join('\n');
}
