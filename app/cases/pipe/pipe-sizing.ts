/**
 * The pipe kind's side of sizing: a pipe case as the sweep (app/cases/sizing/size-insulated.ts)
 * sees it. Every thickness is solved by the pipe's own calculation (calculateValidatedPipe, warm
 * started from the thickness before); the fluid temperature along the run integrates that same
 * solve at the local fluid temperature (temperature-drop.ts); the freeze times come from the
 * transient model of the stagnant water in the same pipe, layers and jacket (freeze-protection.ts).
 */
import type { QuantityText } from '../../base/quantity-text.js';
import type { SteadyStart } from '../../fe/steady-solve.js';
import type { CaseContext } from '../case-kind.js';
import { stackStart } from '../insulated/stack-start.js';
import { freezeTimes, type FreezeTimesResult } from '../sizing/freeze-protection.js';
import { DEFAULT_MAX_TIME, LONGEST_MAX_TIME, validateFreezeInput, type FreezeInput } from '../sizing/freeze-input.js';
import { prepareSizing, type PreparedSizing } from '../sizing/prepared-sizing.js';
import type { SizedCase, SolvedThickness } from '../sizing/size-insulated.js';
import { diameterUnderLayer, withLayerThickness } from '../sizing/sized-layers.js';
import type { SizingCriteria } from '../sizing/sizing-model.js';
import { parseSizingOptions } from '../sizing/sizing-options.js';
import { runTemperatures } from '../sizing/temperature-drop.js';
import { calculateValidatedPipe, type PipeResult } from './pipe-calculation.js';
import { verticalPipeHeight, type PipeInput } from './pipe-input.js';

type FreezeCriterion = NonNullable<SizingCriteria['freezeProtection']>;
type DropCriterion = NonNullable<SizingCriteria['maxTemperatureDrop']>;

/** The "sizing" block of a pipe case, checked against the case; the freeze model's inputs are checked now too. */
export function preparePipeSizing(value: unknown, input: PipeInput, context: CaseContext): PreparedSizing {
  const options = parseSizingOptions(value, 'pipe', input.layers.length);
  const prepared = prepareSizing(options, input.layers, context, diameterUnderLayer(input.pipe.outerDiameter, input.layers, options.layer));
  const freeze = options.criteria.freezeProtection;
  // Refused with the case (a layer without density or specific heat, say), not half-way through the sweep.
  if (freeze) validateFreezeInput(freezeInputOf(input, freeze));
  return prepared;
}

/**
 * The freeze simulation of the pipe as it stands: its pipe, layers, jacket and surface method, the
 * water and air of the criterion. The simulated time covers twice the longest time required, so a
 * time that meets the requirement is still found (at least the default week).
 */
function freezeInputOf(input: PipeInput, c: FreezeCriterion): FreezeInput {
  const required = Math.max(c.minTimeToZero, c.minTimeToFraction ?? 0);
  return {
    pipe: input.pipe,
    layers: input.layers,
    ...(input.jacket !== undefined ? { jacket: input.jacket } : {}),
    orientation: input.orientation,
    ...(input.orientation === 'vertical' ? { height: verticalPipeHeight(input).height } : {}),
    initialTemperature: c.initialTemperature,
    airTemperature: c.airTemperature,
    windSpeed: c.windSpeed,
    ...(input.surfaceMethod !== undefined ? { surfaceMethod: input.surfaceMethod } : {}),
    ...(c.fraction !== undefined ? { fraction: c.fraction } : {}),
    maxTime: Math.min(LONGEST_MAX_TIME, Math.max(DEFAULT_MAX_TIME, 2 * required)),
  };
}

/** The fluid's change of temperature over the run, the pipe solved at the local fluid temperature along it. */
function runDrop(input: PipeInput, c: DropCriterion, text: QuantityText, start: SteadyStart): { drop: number; evaluations: number } {
  let last = start;
  const run = runTemperatures({
    inletTemperature: input.inner.temperature,
    sinkTemperature: input.ambient.airTemperature,
    length: input.length,
    massFlow: c.massFlow,
    specificHeat: c.specificHeat,
    heatLossAt: (fluidTemperature) => {
      const at = calculateValidatedPipe({ ...input, inner: { ...input.inner, temperature: fluidTemperature } }, text, last);
      last = stackStart(at.layers);
      return at.heatLossPerMetre;
    },
  });
  return { drop: run.drop, evaluations: run.evaluations };
}

export function pipeSizedCase(input: PipeInput, caseResult: PipeResult, sizing: PreparedSizing, text: QuantityText): SizedCase {
  const { maxTemperatureDrop: drop, freezeProtection: freeze } = sizing.criteria;
  let caseFreeze: FreezeTimesResult | null = null;

  const figuresOf = (variant: PipeInput, result: PipeResult): SolvedThickness => {
    const start = stackStart(result.layers);
    const frozen = freeze ? freezeTimes(freezeInputOf(variant, freeze), text) : null;
    caseFreeze ??= frozen;
    return {
      heatLoss: result.heatLossPerMetre,
      surfaceTemperature: result.surfaceTemperature,
      dewPoint: result.dewPoint,
      temperatureDrop: drop ? runDrop(variant, drop, text, start).drop : null,
      timeToZero: frozen ? frozen.timeToZero : null,
      timeToFraction: frozen ? frozen.timeToFraction : null,
      timeToFirstIce: frozen ? frozen.timeToFirstIce : null,
      start,
    };
  };
  const caseFigures = figuresOf(input, caseResult);

  const assumptions: string[] = [];
  if (drop) {
    assumptions.push(
      `fluid along the run: ${text.figure(drop.massFlow, 'massFlow')} with a specific heat of ${text.figure(drop.specificHeat, 'specificHeat')}; its heat balance is integrated along the ${text.figure(input.length, 'length')} run with the pipe solved at the local fluid temperature, towards the air at ${text.figure(input.ambient.airTemperature, 'temperature')}`,
    );
  }
  if (freeze && caseFreeze !== null) {
    const f: FreezeTimesResult = caseFreeze;
    assumptions.push(
      `freeze times: the flow stops with the water at ${text.figure(freeze.initialTemperature, 'temperature')}, in air at ${text.figure(freeze.airTemperature, 'temperature')} with a wind of ${text.figure(freeze.windSpeed, 'windSpeed')} (the surroundings at the air temperature)`,
      ...f.assumptions,
      ...f.cautions,
    );
  }

  return {
    basis: 'per-metre',
    material: input.layers[sizing.layer]!.material.name,
    caseThickness: input.layers[sizing.layer]!.thickness,
    caseFigures,
    operatingHours: input.operatingHours,
    touchLimit: input.touchLimit,
    runLength: input.length,
    costDiameter: diameterUnderLayer(input.pipe.outerDiameter, input.layers, sizing.layer),
    figuresAt(thickness, start) {
      const variant = { ...input, layers: withLayerThickness(input.layers, sizing.layer, thickness) };
      return figuresOf(variant, calculateValidatedPipe(variant, text, start));
    },
    assumptions,
  };
}
