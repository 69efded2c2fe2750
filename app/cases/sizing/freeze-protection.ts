/**
 * Freeze protection of stagnant water in an insulated pipe: how long after the flow stops the water
 * at the centre reaches 0 °C, and how long until a given fraction of it has frozen.
 *
 * In still water the centre is the last place to cool: ice grows inwards from the pipe wall, and
 * the liquid inside it approaches 0 °C only as the ice front comes nearer. So the centre counts as
 * at 0 °C once within CENTRE_TOLERANCE (freeze-events.ts) of it, and the time ice first forms, at the
 * wall, is reported beside it, usually the earlier, conservative figure. (In the lumped limit,
 * high-conductivity contents, all the water cools together and the order reverses: the centre is
 * within the tolerance of the range a little before the wall reaches it; the first ice is then the
 * time to 0 °C of the lumped model, see the tests.)
 *
 * A transient axisymmetric finite-element model from the axis outwards: the water (a solid cylinder
 * whose latent heat is spread over a narrow range at 0 °C, conduction only), the pipe wall, the
 * insulation layers and the jacket, cooled through the same outer film as the steady pipe case
 * (app/physics outerSurfaceExchange: convection, wind and radiation), evaluated by the engine at
 * the surface temperature of every step. The run starts from the pipe in service, the water at its
 * initial temperature and the wall and insulation at their steady profile, and stops once both
 * times are known or at the longest time simulated.
 *
 * Time step: Crank–Nicolson (second order; the engine damps its start-up) at a fixed step of
 * 1/STEPS_PER_TIME_SCALE of the case's own time scale (see timeScale), so that the times carry the
 * same relative accuracy on a bare DN15 pipe as on a heavily insulated DN300 one: a first run up to
 * the centre's time and the first ice, at the step of their time scale, and then, for a fraction,
 * a second run from that state at the step of the fraction's (much longer) time scale. The tests
 * show the times at the default steps within 0.1 % of the step-converged ones.
 */
import { SI_TEXT, type QuantityText } from '../../base/quantity-text.js';
import { InputError } from '../../fe/errors.js';
import { exactLayerProfile } from '../../fe/exact-layer-profile.js';
import { defaultElementCount } from '../../fe/mesh.js';
import { enthalpyCurve } from '../../fe/phase-change.js';
import type { Geometry, Layer, TransientProblem, TransientState } from '../../fe/problem.js';
import type { SteadyResult, TransientEnergyBalance } from '../../fe/result.js';
import { solveSteady } from '../../fe/steady-solve.js';
import { solveTransient } from '../../fe/transient-solve.js';
import { outerSurfaceExchange, type OuterSurfaceShape } from '../../physics/outer-surface-exchange.js';
import { methodNeedsEmissivity, outerSurfaceEmissivity } from '../insulated/insulated-inputs.js';
import { insulatedStack, type StackLayer } from '../insulated/insulated-solve.js';
import { toEngineLayers } from '../insulated/layer-build.js';
import { DEFAULT_SURFACE_METHOD } from '../pipe/pipe-input.js';
import { contentsLayer, DEFAULT_FREEZING_RANGE, WATER, type FreezingContents } from './freeze-contents.js';
import { DEFAULT_MAX_TIME, validateFreezeInput, type FreezeInput } from './freeze-input.js';
import { lumpedFreezeTimes, type LumpedFreezeTimes } from './freeze-lumped.js';
import { eventWatcher } from './freeze-events.js';
import { freezeAssumptions, FREEZE_CAUTIONS } from './freeze-words.js';

export type { FreezeInput } from './freeze-input.js';
export { CENTRE_TOLERANCE } from './freeze-events.js';

export interface FreezeTimesResult {
  /** s, until the water at the centre reaches 0 °C; Infinity when not within maxTime. */
  readonly timeToZero: number;
  /** s, until the water at the pipe wall reaches 0 °C and ice starts to form; Infinity when not within maxTime. */
  readonly timeToFirstIce: number;
  /** s, until `fraction` of the water's mass has frozen; null with no fraction asked; Infinity when not within maxTime. */
  readonly timeToFraction: number | null;
  readonly fraction: number | null;
  /** Mass fraction frozen when the simulation stopped. */
  readonly frozenFractionAtEnd: number;
  /** s */
  readonly simulatedTime: number;
  readonly maxTime: number;
  readonly steps: number;
  /** s, of the run up to the centre's time and the first ice. */
  readonly timeStep: number;
  /** s, of the run from there on to the fraction (the numerics' timeStep when given); null when that stage was not needed. */
  readonly fractionTimeStep: number | null;
  /** Heat stored (sensible and latent, J/m; negative = given up) against the net heat in over the run. */
  readonly energyBalance: TransientEnergyBalance;
  /** The lumped-capacitance times for the same in-service resistance (freeze-lumped.ts), for comparison. */
  readonly lumped: LumpedFreezeTimes & {
    /** m·K/W per metre, in service. */
    readonly resistance: number;
    /** J/(m·K): water and pipe wall. */
    readonly heatCapacity: number;
    /** °C, the outer film's sink in service. */
    readonly sinkTemperature: number;
    /** °C, of the water. */
    readonly initialTemperature: number;
  };
  readonly assumptions: readonly string[];
  readonly cautions: readonly string[];
}

/** Steps per time scale of the case: the time-step convergence test shows the times within 0.1 % at this. */
export const STEPS_PER_TIME_SCALE = 200;
/** The engine's largest number of steps in one run (app/fe/validate.ts). */
const MAX_STEPS = 1_000_000;

export function freezeTimes(input: FreezeInput, text: QuantityText = SI_TEXT): FreezeTimesResult {
  validateFreezeInput(input);
  const contents = input.contents ?? WATER;
  const range = input.numerics?.freezingRange ?? DEFAULT_FREEZING_RANGE;
  const refinement = input.numerics?.meshRefinement ?? 1;
  const fraction = input.fraction ?? null;
  const maxTime = input.maxTime ?? DEFAULT_MAX_TIME;
  const t0 = input.initialTemperature;
  const freezing = contents.freezingTemperature;
  const innerRadius = input.pipe.outerDiameter / 2 - input.pipe.wallThickness;

  const stack = insulatedStack(
    { role: 'pipe-wall', label: 'pipe wall', layer: { material: input.pipe.material, thickness: input.pipe.wallThickness } },
    input.layers,
    input.jacket,
  );
  const solids = toEngineLayers(stack).map((l, i): Layer => ({ ...l, name: stack[i]!.name }));
  const outerDiameter = 2 * stack.reduce((r, l) => r + l.thickness, innerRadius);
  const exchange = filmOf(input, outerDiameter);

  // The pipe in service, just before the flow stops: water at t0 against the pipe wall.
  const inService = solveSteady({
    geometry: { kind: 'axisymmetric', innerRadius },
    layers: solids,
    inner: { kind: 'temperature', temperature: t0 },
    outer: { kind: 'film', coefficient: exchange, ambient: input.airTemperature },
  });
  const lumped = lumpedEstimate(input, contents, inService, stack, innerRadius, fraction);
  const assumptions = freezeAssumptions({ contents, range, maxTime, fraction, lumped, text });
  const coldest = Math.min(input.airTemperature, input.surroundingsTemperature ?? input.airTemperature);
  const never = { timeToZero: Infinity, timeToFirstIce: Infinity, timeToFraction: fraction === null ? null : Infinity, fraction, frozenFractionAtEnd: 0, simulatedTime: 0, maxTime, steps: 0 };
  if (coldest >= freezing) {
    // With no heat source, every temperature stays at or above the coldest of the water, the air
    // and the surroundings (the maximum principle): the water cannot freeze, and no run is needed.
    return { ...never, timeStep: 0, fractionTimeStep: null, energyBalance: { stored: 0, netIn: 0, residual: 0, relativeResidual: 0 }, lumped, assumptions: [...assumptions, 'neither the air nor the surroundings are below the freezing point, so the water never freezes'], cautions: FREEZE_CAUTIONS };
  }

  // Two stages, each at 1/STEPS_PER_TIME_SCALE of its own time scale: up to the centre's time (and
  // the first ice), then on to the fraction. One step for both, from the later event, would leave
  // the centre's time with few steps where the fraction takes far longer (a large bore, f = 1).
  const given = input.numerics?.timeStep;
  const stepOf = (scale: number) => given ?? Math.max(Math.min(scale, maxTime) / STEPS_PER_TIME_SCALE, maxTime / MAX_STEPS);
  const timeStep = stepOf(timeScale(contents, innerRadius, lumped, null));
  if (maxTime / timeStep > MAX_STEPS) {
    throw new InputError('numerics.timeStep', `numerics.timeStep must give at most ${MAX_STEPS} steps over maxTime (${maxTime} s); ${timeStep} s gives too many.`);
  }

  const geometry: Geometry = { kind: 'axisymmetric', innerRadius: 0 };
  const water = contentsLayer(contents, innerRadius, range, refinement * defaultElementCount(geometry, contentsLayer(contents, innerRadius, range, 1), 0, 2, 'transient'));
  let position = innerRadius;
  const layers = [
    water,
    ...solids.map((l) => {
      const elements = refinement * defaultElementCount(geometry, l, position, 2, 'transient');
      position += l.thickness;
      return { ...l, elements };
    }),
  ];

  // Quadratic elements, no contact resistance: the water's last node is the pipe wall's inner face.
  const wallNode = 2 * water.elements!;
  const events = eventWatcher(enthalpyCurve(water), t0, fraction, wallNode);
  const stage = (start: number, initialTemperature: TransientProblem['initialTemperature'], step: number, stopWhen: (s: TransientState) => boolean) =>
    solveTransient({
      geometry,
      layers,
      // The axis: a line of symmetry, across which no heat flows.
      inner: { kind: 'flux', flux: 0 },
      outer: { kind: 'film', coefficient: exchange, ambient: input.airTemperature },
      initialTemperature,
      timeStep: step,
      duration: maxTime - start,
      scheme: 'crank-nicolson',
      stopWhen: (s) => stopWhen({ ...s, time: start + s.time }),
    });
  const first = stage(0, inServiceProfile(inService, stack, innerRadius, t0), timeStep, (s) => {
    events.update(s);
    return events.timeToZero() < Infinity && events.timeToFirstIce() < Infinity;
  });
  const firstEnd = first.times.at(-1)!;
  let fractionTimeStep: number | null = null;
  let run = { end: firstEnd, steps: first.times.length - 1, solid: first.solidFraction!.at(-1)![0]!, stored: first.balance.stored, netIn: first.balance.netIn };
  if (fraction !== null && events.timeToFraction() === Infinity && firstEnd < maxTime) {
    // The second stage starts from the first one's last state (the enthalpy is a function of the
    // temperature, so the nodal temperatures are the whole state).
    fractionTimeStep = stepOf(timeScale(contents, innerRadius, lumped, fraction));
    const state = first.temperatures.at(-1)!;
    const nodeAt = new Map(first.positions.map((r, i) => [r, i]));
    const second = stage(firstEnd, (r) => state[nodeAt.get(r)!]!, fractionTimeStep, (s) => {
      events.update(s);
      return events.timeToFraction() < Infinity;
    });
    run = {
      end: firstEnd + second.times.at(-1)!,
      steps: run.steps + second.times.length - 1,
      solid: second.solidFraction!.at(-1)![0]!,
      stored: run.stored + second.balance.stored,
      netIn: run.netIn + second.balance.netIn,
    };
  }
  const residual = run.stored - run.netIn;
  const scale = Math.max(Math.abs(run.stored), Math.abs(run.netIn));
  return {
    timeToZero: events.timeToZero(),
    timeToFirstIce: events.timeToFirstIce(),
    timeToFraction: fraction === null ? null : events.timeToFraction(),
    fraction,
    frozenFractionAtEnd: run.solid,
    simulatedTime: run.end,
    maxTime,
    steps: run.steps,
    timeStep,
    fractionTimeStep,
    energyBalance: { stored: run.stored, netIn: run.netIn, residual, relativeResidual: scale > 0 ? Math.abs(residual) / scale : 0 },
    lumped,
    assumptions,
    cautions: FREEZE_CAUTIONS,
  };
}

/** The outer film of the steady pipe case: the surface physics of app/physics, with the case's bounding temperatures. */
function filmOf(input: FreezeInput, outerDiameter: number) {
  const method = input.surfaceMethod ?? DEFAULT_SURFACE_METHOD;
  const shape: OuterSurfaceShape =
    input.orientation === 'vertical'
      ? { kind: 'pipe', orientation: 'vertical', outerDiameter, height: input.height! }
      : { kind: 'pipe', orientation: 'horizontal', outerDiameter };
  const emissivity = methodNeedsEmissivity(method) ? outerSurfaceEmissivity(input.layers, input.jacket) : null;
  const named = [input.initialTemperature, input.airTemperature, input.surroundingsTemperature ?? input.airTemperature];
  // The spec surfaceExchangeFor (insulated-solve.ts) builds for the steady pipe, without the humidity it does not use.
  return outerSurfaceExchange({
    shape,
    exposure: { kind: 'outdoor', windSpeed: input.windSpeed },
    method,
    airTemperature: input.airTemperature,
    ...(input.surroundingsTemperature !== undefined ? { surroundingsTemperature: input.surroundingsTemperature } : {}),
    ...(emissivity ? { emissivity: emissivity.value } : {}),
    boundingTemperatures: { lowest: Math.min(...named), highest: Math.max(...named) },
  });
}

/** The lumped times with the in-service resistance: the layers at their effective conductivity, and the film. */
function lumpedEstimate(input: FreezeInput, contents: FreezingContents, inService: SteadyResult, stack: readonly StackLayer[], innerRadius: number, fraction: number | null): FreezeTimesResult['lumped'] {
  const film = inService.faces.outer.film!;
  let resistance = 1 / (film.coefficient * 2 * Math.PI * inService.faces.outer.position);
  for (const l of inService.layers) resistance += Math.log(l.outerPosition / l.innerPosition) / (2 * Math.PI * (l.effectiveConductivity ?? l.conductivityAtMeanTemperature));
  const wall = stack[0]!.material;
  const outer = inService.layers[0]!.outerPosition;
  const contentsMass = contents.density * Math.PI * innerRadius * innerRadius;
  const heatCapacity = contentsMass * contents.liquidSpecificHeat + wall.density! * wall.specificHeat! * Math.PI * (outer * outer - innerRadius * innerRadius);
  const times = lumpedFreezeTimes({
    resistance,
    heatCapacity,
    contentsMass,
    latentHeat: contents.latentHeat,
    initialTemperature: input.initialTemperature,
    freezingTemperature: contents.freezingTemperature,
    sinkTemperature: film.ambient,
    fraction,
  });
  return { ...times, resistance, heatCapacity, sinkTemperature: film.ambient, initialTemperature: input.initialTemperature };
}

/**
 * s: the case's own time scale, the lumped time to the later event plus the water's own conduction
 * times, which the lumped model leaves out: r²/(4α) for its sensible heat and, for the fraction,
 * f·ρLr²/(4λ_ice·(θ_f − θ_sink)), the time a cylinder of water takes to freeze inwards from a wall
 * held at the sink (the quasi-steady solution; Carslaw & Jaeger, Conduction of Heat in Solids,
 * §11.2, from memory). The sum is of the order of the simulated time in every regime, so a fixed
 * share of it resolves each case.
 */
function timeScale(contents: FreezingContents, radius: number, lumped: FreezeTimesResult['lumped'], fraction: number | null): number {
  const target = fraction === null ? lumped.timeToFreezing : lumped.timeToFraction!;
  const below = contents.freezingTemperature - lumped.sinkTemperature;
  if (!Number.isFinite(target) || !(below > 0)) return Infinity;
  const r2 = radius * radius;
  const sensible = (contents.density * contents.liquidSpecificHeat * r2) / (4 * contents.liquidConductivity);
  const latent = ((fraction ?? 0) * contents.density * contents.latentHeat * r2) / (4 * contents.solidConductivity * below);
  return target + sensible + latent;
}

/** Position (m) → initial temperature (°C): the water at t0, the solid layers at their in-service profile. */
function inServiceProfile(inService: SteadyResult, stack: readonly StackLayer[], innerRadius: number, t0: number): (position: number) => number {
  // Exact inside each layer (exact-layer-profile.ts): samples joined linearly in ln r, in which the
  // Kirchhoff potential is linear.
  const profiles = inService.layers.map((l, i) =>
    exactLayerProfile('axisymmetric', stack[i]!.material.conductivity, l.innerPosition, l.outerPosition, l.innerTemperature, l.outerTemperature, 32),
  );
  return (r) => {
    if (r <= innerRadius) return t0;
    const points = profiles.find((p) => r <= p.at(-1)![0]) ?? profiles.at(-1)!;
    let k = 1;
    while (k < points.length - 1 && points[k]![0] < r) k++;
    const [r1, θ1] = points[k - 1]!;
    const [r2, θ2] = points[k]!;
    return θ1 + ((θ2 - θ1) * Math.log(r / r1)) / Math.log(r2 / r1);
  };
}
