/**
 * Readable summaries of pipe and flat-surface results (`lamina solve --format text`). Rounded here,
 * at the edge; the JSON output keeps full precision.
 */
import type { FlatSurfaceResult } from '../../../app/cases/flat/flat-surface-calculation.js';
import type { PipeResult } from '../../../app/cases/pipe/pipe-calculation.js';
import { checksText, fixed, lossOrGain, scientific } from './text-helpers.js';

type Stack = PipeResult | FlatSurfaceResult;

function layersText(r: Stack): string[] {
  return [
    'Layers, inside to outside                    θ inner   θ outer    θ mean   λ at mean',
    ...r.layers.map(
      (l) =>
        `  ${l.name.slice(0, 40).padEnd(40)} ${fixed(l.innerTemperature, 1).padStart(8)} ${fixed(l.outerTemperature, 1).padStart(9)} ${fixed(l.meanTemperature, 1).padStart(9)}   ${fixed(l.conductivityAtMeanTemperature, 4)} W/(m·K)`,
    ),
    '  (temperatures in °C)',
  ];
}

function surfaceText(r: Stack): string[] {
  const c = r.surfaceCoefficient;
  return [
    `Outer surface ${fixed(r.surfaceTemperature, 2)} °C; surface coefficient ${fixed(c.total, 2)} W/(m²·K) = convection ${fixed(c.convection, 2)} + radiation ${fixed(c.radiation, 2)}; dew point of the air ${fixed(r.dewPoint, 2)} °C.`,
    `Energy balance residual ${scientific(r.energyBalance.residual)} (relative ${scientific(r.energyBalance.relativeResidual)}), ${r.iterations} iterations.`,
  ];
}

function notesText(r: Stack): string[] {
  const notes = [...r.assumptions.map((a) => `Assumed: ${a}.`), ...r.warnings.map((w) => `Warning: ${w}`)];
  return notes.length ? ['', ...notes] : [];
}

/** What every pipe and flat-surface summary shows after its headline. */
function bodyText(r: Stack): string[] {
  return [
    ...surfaceText(r),
    '',
    ...layersText(r),
    '',
    ...checksText([r.checks.surfaceCondensation, r.checks.personnelProtection, r.checks.serviceTemperature]),
    ...notesText(r),
    '',
  ];
}

export function pipeText(title: string, r: PipeResult): string {
  return [
    title,
    `Pipe, outer diameter over insulation ${fixed(r.outerDiameter * 1000, 1)} mm`,
    '',
    `${lossOrGain(r.heatLossPerMetre, 2, 'W/m')}; ${fixed(Math.abs(r.heatLoss), 0)} W for the run; ${fixed(Math.abs(r.heatFlowDensityAtSurface), 2)} W/m² at the outer surface; ${fixed(Math.abs(r.annualEnergy), 0)} kWh per year.`,
    ...bodyText(r),
  ].join('\n');
}

export function flatText(title: string, r: FlatSurfaceResult): string {
  return [
    title,
    'Flat surface',
    '',
    `${lossOrGain(r.heatFlowDensity, 2, 'W/m²')}; ${fixed(Math.abs(r.heatLoss), 0)} W over the area; ${fixed(Math.abs(r.annualEnergy), 0)} kWh per year; layer resistance ${fixed(r.layerResistance, 3)} m²·K/W.`,
    ...bodyText(r),
  ].join('\n');
}
