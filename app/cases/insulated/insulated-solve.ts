/**
 * The solve both the pipe and the flat-surface calculations run once their geometry is known:
 * build the layer stack (wall, insulation, jacket), put the inner condition on the inner face and
 * the temperature-dependent outer film (app/physics outerSurfaceExchange) on the outer face, let the
 * engine iterate the film and any λ(T) to convergence, then read back temperatures, the film split
 * into convection and radiation at the converged surface temperature; then, as a separate step on
 * the solved result, the surface checks.
 */
import { writeSentence } from '../../base/quantity-sentence.js';
import type { QuantityText } from '../../base/quantity-text.js';
import type { FaceCondition, Geometry } from '../../fe/problem.js';
import type { SteadyResult } from '../../fe/result.js';
import { solveSteady, type SteadyStart } from '../../fe/steady-solve.js';
import type { MaterialProperties } from '../../materials/material-properties.js';
import { outerSurfaceExchange, type OuterSurfaceExchangeFunction, type OuterSurfaceShape, type SurfaceMethod } from '../../physics/outer-surface-exchange.js';
import { personnelProtectionCheck, type PersonnelProtectionResult } from '../../checks/personnel-protection.js';
import { serviceTemperatureCheck, type ServiceTemperatureResult } from '../../checks/service-temperature.js';
import { surfaceCondensationCheck, type SurfaceCondensationResult } from '../../checks/surface-condensation.js';
import { conductivityUseWarnings } from '../../checks/plausibility-warnings.js';
import { toEngineLayers, type MaterialLayer } from './layer-build.js';
import { withFields } from '../with-fields.js';
import type { AmbientConditions, InnerCondition } from './insulated-inputs.js';

export type LayerRole = 'pipe-wall' | 'wall' | 'insulation' | 'jacket';

/**
 * The stack of a pipe or flat surface, inside first: the carrier (pipe wall or plate, when there is
 * one), the insulation layers and the jacket, each named as reports print it.
 */
export function insulatedStack(
  carrier: { readonly role: 'pipe-wall' | 'wall'; readonly label: string; readonly layer: MaterialLayer } | null,
  layers: readonly MaterialLayer[],
  jacket: MaterialLayer | undefined,
): StackLayer[] {
  const named = (role: LayerRole, label: string, l: MaterialLayer): StackLayer => ({ role, name: `${label} (${l.material.name})`, material: l.material, thickness: l.thickness });
  return [
    ...(carrier ? [named(carrier.role, carrier.label, carrier.layer)] : []),
    ...layers.map((l, i) => named('insulation', `insulation layer ${i + 1}`, l)),
    ...(jacket ? [named('jacket', 'jacket', jacket)] : []),
  ];
}

export interface StackLayer {
  readonly role: LayerRole;
  /** Name people read, e.g. "insulation layer 1 (Rock wool)". */
  readonly name: string;
  readonly material: MaterialProperties;
  readonly thickness: number;
}

export interface LayerTemperatures {
  readonly name: string;
  readonly role: LayerRole;
  readonly material: string;
  /** m */
  readonly thickness: number;
  /** m: radius (pipe) or distance from the inner face (flat). */
  readonly innerPosition: number;
  readonly outerPosition: number;
  /** °C */
  readonly innerTemperature: number;
  readonly outerTemperature: number;
  /** Arithmetic mean of the face temperatures, °C. */
  readonly meanTemperature: number;
  /** λ at the mean temperature, W/(m·K). */
  readonly conductivityAtMeanTemperature: number;
  /** The integral-mean λ that carries the layer's heat flow, W/(m·K); absent with no temperature difference. */
  readonly effectiveConductivity?: number;
  /** m·K/W per metre of pipe, or m²·K/W for a flat surface; absent with no heat flow. */
  readonly thermalResistance?: number;
}

export interface InterfaceTemperature {
  /** The layers on each side, by name. */
  readonly innerLayer: string;
  readonly outerLayer: string;
  /** m: radius (pipe) or distance from the inner face (flat). */
  readonly position: number;
  /** °C */
  readonly temperature: number;
}

export interface SurfaceCoefficient {
  /** h_se = h_c + h_r, W/(m²·K), at the converged surface temperature. */
  readonly total: number;
  readonly convection: number;
  readonly radiation: number;
  /** °C, the combined sink temperature (h_c θ_air + h_r θ_surroundings)/h_se. */
  readonly sinkTemperature: number;
}

export interface SolveChecks {
  readonly surfaceCondensation: SurfaceCondensationResult;
  readonly personnelProtection: PersonnelProtectionResult;
  readonly serviceTemperature: ServiceTemperatureResult;
}

export interface StackSolution {
  readonly engine: SteadyResult;
  /** Heat leaving the outer surface: W/m (pipe) or W/m² (flat); negative = heat gained. */
  readonly heatOut: number;
  readonly innerSurfaceTemperature: number;
  readonly surfaceTemperature: number;
  readonly layers: readonly LayerTemperatures[];
  readonly interfaces: readonly InterfaceTemperature[];
  readonly surfaceCoefficient: SurfaceCoefficient;
  /** Sentences from correlations used outside their validity range, at the converged state. */
  readonly warnings: readonly string[];
  readonly energyBalance: { readonly residual: number; readonly relativeResidual: number };
  readonly iterations: number;
  readonly dewPoint: number;
  readonly checks: SolveChecks;
}

/** The part of a stack solution a pipe or flat result reports (everything but the engine's own result and the signed flow). */
export type ReportedStackSolution = Omit<StackSolution, 'engine' | 'heatOut'>;

/**
 * Those fields, named one by one: an object rest (`{ engine, heatOut, ...rest }`) takes V8's slow
 * property-copying path and cost more than the pipe's whole surface-check step.
 */
export function reportedStackSolution(s: StackSolution): ReportedStackSolution {
  return {
    innerSurfaceTemperature: s.innerSurfaceTemperature,
    surfaceTemperature: s.surfaceTemperature,
    layers: s.layers,
    interfaces: s.interfaces,
    surfaceCoefficient: s.surfaceCoefficient,
    warnings: s.warnings,
    energyBalance: s.energyBalance,
    iterations: s.iterations,
    dewPoint: s.dewPoint,
    checks: s.checks,
  };
}

export interface StackProblem {
  readonly geometry: Geometry;
  readonly stack: readonly StackLayer[];
  readonly inner: InnerCondition;
  readonly exchange: OuterSurfaceExchangeFunction;
  readonly ambient: AmbientConditions;
  readonly touchLimit?: number;
  /** Face and interface temperatures of a neighbouring solve (a sizing sweep) to start the iteration from. */
  readonly start?: SteadyStart;
}

function innerFace(inner: InnerCondition): FaceCondition {
  return inner.kind === 'fluid'
    ? { kind: 'film', coefficient: inner.coefficient, ambient: inner.temperature }
    : { kind: 'temperature', temperature: inner.temperature };
}

/** `text` writes the figures of the checks' reasons and of the warnings in the project's units. */
export function solveStack(problem: StackProblem, text: QuantityText): StackSolution {
  const solution = solveStackOnly(problem, text);
  return withFields(solution, surfaceChecks(problem, solution, text));
}

/** The engine solve of the stack and what is read back from it, before any check. */
function solveStackOnly(problem: StackProblem, text: QuantityText): Omit<StackSolution, 'dewPoint' | 'checks'> {
  const { stack, exchange, ambient } = problem;
  const engine = solveSteady(
    {
      geometry: problem.geometry,
      layers: toEngineLayers(stack).map((layer, i) => withFields(layer, { name: stack[i]!.name })),
      inner: innerFace(problem.inner),
      outer: { kind: 'film', coefficient: exchange, ambient: ambient.airTemperature },
    },
    problem.start,
  );

  const surfaceTemperature = engine.faces.outer.temperature;
  const converged = exchange(surfaceTemperature);
  const layers = engine.layers.map((l, i): LayerTemperatures => ({
    name: stack[i]!.name,
    role: stack[i]!.role,
    material: stack[i]!.material.name,
    thickness: stack[i]!.thickness,
    innerPosition: l.innerPosition,
    outerPosition: l.outerPosition,
    innerTemperature: l.innerTemperature,
    outerTemperature: l.outerTemperature,
    meanTemperature: l.meanTemperature,
    conductivityAtMeanTemperature: l.conductivityAtMeanTemperature,
    ...(l.effectiveConductivity !== undefined ? { effectiveConductivity: l.effectiveConductivity } : {}),
    ...(l.thermalResistance !== undefined ? { thermalResistance: l.thermalResistance } : {}),
  }));
  const interfaces = engine.interfaces.map(
    (f): InterfaceTemperature => ({
      innerLayer: stack[f.index]!.name,
      outerLayer: stack[f.index + 1]!.name,
      position: f.position,
      // No contact resistance between these layers, so both sides share one temperature.
      temperature: f.temperatureInnerSide,
    }),
  );

  return {
    engine,
    heatOut: -engine.faces.outer.heatIn,
    innerSurfaceTemperature: engine.faces.inner.temperature,
    surfaceTemperature,
    layers,
    interfaces,
    surfaceCoefficient: {
      total: converged.coefficient,
      convection: converged.convection,
      radiation: converged.radiation,
      sinkTemperature: converged.ambient,
    },
    warnings: [
      // The surface physics states its figures as SI values of their kind; they read in the project's units here.
      ...converged.warnings.map((w) => writeSentence(w, text)),
      ...conductivityUseWarnings(
        layers.map((l, i) => ({
          name: l.name,
          conductivity: stack[i]!.material.conductivity,
          lowest: Math.min(l.innerTemperature, l.outerTemperature),
          highest: Math.max(l.innerTemperature, l.outerTemperature),
          minServiceTemperature: stack[i]!.material.minServiceTemperature ?? null,
          maxServiceTemperature: stack[i]!.material.maxServiceTemperature ?? null,
        })),
        text,
      ),
    ],
    energyBalance: { residual: engine.balance.residual, relativeResidual: engine.balance.relativeResidual },
    iterations: engine.iterations,
  };
}

/**
 * The surface checks, as functions of the solved stack: condensation on the outer surface in its
 * ambient air, personnel protection at the touch limit, and each layer against its service range.
 */
export function surfaceChecks(problem: StackProblem, solution: Omit<StackSolution, 'dewPoint' | 'checks'>, text: QuantityText): { dewPoint: number; checks: SolveChecks } {
  const { stack, ambient } = problem;
  const { surfaceTemperature, layers } = solution;
  const surfaceCondensation = surfaceCondensationCheck({
    surfaceTemperature,
    airTemperature: ambient.airTemperature,
    relativeHumidity: ambient.relativeHumidity,
  }, text);
  const checks: SolveChecks = {
    surfaceCondensation,
    personnelProtection: personnelProtectionCheck({
      surfaceTemperature,
      ...(problem.touchLimit !== undefined ? { touchLimit: problem.touchLimit } : {}),
    }, text),
    serviceTemperature: serviceTemperatureCheck(
      layers.map((l, i) => ({
        name: l.name,
        innerTemperature: l.innerTemperature,
        outerTemperature: l.outerTemperature,
        minServiceTemperature: stack[i]!.material.minServiceTemperature ?? null,
        maxServiceTemperature: stack[i]!.material.maxServiceTemperature ?? null,
      })),
      text,
    ),
  };

  return { dewPoint: surfaceCondensation.dewPoint, checks };
}

/**
 * The outer film of a pipe or flat surface in its ambient conditions (convection + radiation).
 * The build-up generates no heat, so its surface lies between the coldest and hottest of the inner,
 * air and surroundings temperatures; the film is told so, to evaluate the solve's intermediate
 * iterates within them.
 */
export function surfaceExchangeFor(
  shape: OuterSurfaceShape,
  inner: InnerCondition,
  ambient: AmbientConditions,
  method: SurfaceMethod,
  emissivity: { readonly value: number } | null,
): OuterSurfaceExchangeFunction {
  const named = [inner.temperature, ambient.airTemperature, ambient.surroundingsTemperature ?? ambient.airTemperature];
  return outerSurfaceExchange({
    shape,
    exposure: ambient.exposure,
    method,
    airTemperature: ambient.airTemperature,
    ...(ambient.surroundingsTemperature !== undefined ? { surroundingsTemperature: ambient.surroundingsTemperature } : {}),
    ...(emissivity ? { emissivity: emissivity.value } : {}),
    boundingTemperatures: { lowest: Math.min(...named), highest: Math.max(...named) },
  });
}
