/**
 * The assumptions and cautions of the freeze simulation, in words, with figures in the project's
 * units. They say which way each simplification errs, because the times protect property.
 */
import type { QuantityText } from '../../base/quantity-text.js';
import { WATER, WATER_SOURCE, type FreezingContents } from './freeze-contents.js';
import type { LumpedFreezeTimes } from './freeze-lumped.js';
import { CENTRE_TOLERANCE } from './freeze-events.js';

export interface FreezeWordsInput {
  readonly contents: FreezingContents;
  readonly range: number;
  readonly maxTime: number;
  readonly fraction: number | null;
  readonly lumped: LumpedFreezeTimes & { readonly resistance: number };
  readonly text: QuantityText;
}

export const FREEZE_CAUTIONS: readonly string[] = [
  'Insulation only delays freezing; it cannot prevent it once the water has stood still long enough. Fittings, valves, supports, dead legs and short exposed sections freeze before the insulated straight run modelled here.',
  'Where these times are short against the longest stoppage to be expected, provide circulation, heat tracing or draining, and follow local codes and licensed professional practice.',
];

export function freezeAssumptions({ contents, range, maxTime, fraction, lumped, text }: FreezeWordsInput): string[] {
  const t = (v: number) => text.figure(v, 'temperature');
  const freezing = contents.freezingTemperature;
  const hours = (s: number) => (Number.isFinite(s) ? text.figure(s, 'timeHours') : 'never');
  const water = contents === WATER;
  return [
    'the water stands still and carries heat by conduction only: natural convection inside the pipe is neglected. Convection stirs the water and carries its heat to the wall faster than conduction does, so the computed times are somewhat long (on the unsafe side); the difference is small where the insulation carries most of the resistance and grows for bare or thinly insulated pipes of large bore',
    `in still water the centre is the last place to cool: ice grows inwards from the pipe wall, and the water inside it approaches the freezing point only as the ice comes nearer, so the centre counts as at ${t(freezing)} once within ${text.figure(CENTRE_TOLERANCE, 'temperatureDifference')} of it (of the top of the freezing range); ice first forms at the wall, the earlier time given beside it`,
    'no supercooling: ice forms as soon as the water reaches its freezing point (water often supercools by a few kelvin first, which delays freezing, so this errs on the safe side)',
    `the latent heat (${(contents.latentHeat / 1000).toPrecision(4)} kJ/kg) is released evenly over ${text.figure(range, 'temperatureDifference')} about ${t(freezing)}; ice counts as forming at the wall once the water there reaches the top of that range, ${t(freezing + range / 2)}, where the model starts to release latent heat (a little early, on the safe side)`,
    'the water keeps its mass as it freezes; its expansion, which is what bursts pipes, is not modelled',
    'the flow stops at time 0 with the water at its initial temperature and the pipe wall, insulation and jacket at their steady temperatures in service',
    'air and surroundings temperatures and the wind stay constant; the outer surface coefficient (convection and radiation) is that of the steady pipe, evaluated at the surface temperature of every time step',
    'heat flows radially only: none along the pipe, through supports or to the ground',
    water ? `properties of water and ice: ${WATER_SOURCE}` : 'properties of the contents as given',
    `simulated for at most ${hours(maxTime)}; a time not reached by then is reported as not reached`,
    `lumped-capacitance estimate for comparison (no resistance inside the water, no heat stored in the insulation, resistance in service ${text.figure(lumped.resistance, 'linearThermalResistance')}): ${t(freezing)} after ${hours(lumped.timeToFreezing)}` +
      (fraction === null || lumped.timeToFraction === null ? '' : `, ${text.figure(fraction, 'fraction')} frozen after ${hours(lumped.timeToFraction)}`),
  ];
}
