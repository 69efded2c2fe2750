/**
 * The wall and roof calculation: ISO 6946 resistances, solved with the FE engine (which imposes
 * the conditions, solves, recovers the face heat flows and closes the energy balance), then read
 * back as U-value, resistances and temperatures.
 */
import { conductivityAt, isConstantConductivity } from '../../fe/conductivity.js';
import { solveSteady } from '../../fe/steady-solve.js';
import type { SteadyResult } from '../../fe/result.js';
import { roundToSignificantFigures, U_VALUE_SIGNIFICANT_FIGURES } from '../../base/significant-figures.js';
import { wallDynamicCharacteristics } from './wall-dynamic.js';
import { wallEngineProblem } from './wall-engine-problem.js';
import type { WallInput } from './wall-input.js';
import type { WallLayerResult, WallResult } from './wall-result.js';
import { buildThermalStack, type StackOptions, type ThermalStack } from './wall-thermal-stack.js';
import { validateWallInput } from './wall-validation.js';
import { isAirLayer } from './wall-input.js';
import { uCorrections, type CorrectedLayer, type UCorrections } from './wall-u-corrections.js';

export interface WallSolution {
  readonly stack: ThermalStack;
  readonly steady: SteadyResult;
}

/** Builds the stack and solves it for the given inside and outside air temperatures (input validated here). */
export function solveWall(
  input: WallInput,
  insideTemperature: number = input.inside.temperature,
  outsideTemperature: number = input.outside.temperature,
  options: StackOptions = {},
): WallSolution {
  validateWallInput(input);
  const stack = buildThermalStack(input, options);
  const steady = solveSteady(wallEngineProblem(stack, insideTemperature, outsideTemperature));
  return { stack, steady };
}

export function calculateWall(input: WallInput): WallResult {
  const { stack, steady } = solveWall(input);
  return wallResultOf(input, stack, steady);
}

/** The ISO 6946 figures of a wall from its stack and the engine's solution at the design condition. */
export function wallResultOf(input: WallInput, stack: ThermalStack, steady: SteadyResult): WallResult {
  const included = stack.layers.filter((l) => l.included);
  const layers: WallLayerResult[] = stack.layers.map((l) => {
    const k = included.indexOf(l);
    if (k < 0) {
      return {
        index: l.index,
        name: l.name,
        kind: l.kind,
        thickness: l.thickness,
        included: false,
        thermalResistance: null,
        nominalThermalResistance: l.nominalResistance,
        resistanceScale: l.resistanceScale,
        ...(l.airLayer ? { airLayer: l.airLayer } : {}),
        ...(l.bridged ? { bridged: l.bridged } : {}),
        effectiveConductivity: null,
        innerTemperature: null,
        outerTemperature: null,
      };
    }
    const r = steady.layers[k]!;
    // The conductivity that carries the engine's heat flow: exact for a constant λ; for λ(T) the
    // integral mean the engine recovered, or λ at the mean temperature where no heat flows.
    const lambda = isConstantConductivity(l.conductivity)
      ? conductivityAt(l.conductivity, 0)
      : (r.effectiveConductivity ?? r.conductivityAtMeanTemperature);
    return {
      index: l.index,
      name: l.name,
      kind: l.kind,
      thickness: l.thickness,
      included: true,
      thermalResistance: l.thickness / lambda,
      nominalThermalResistance: l.nominalResistance,
      resistanceScale: l.resistanceScale,
      ...(l.airLayer ? { airLayer: l.airLayer } : {}),
      ...(l.bridged ? { bridged: l.bridged } : {}),
      effectiveConductivity: lambda,
      innerTemperature: r.innerTemperature,
      outerTemperature: r.outerTemperature,
    };
  });

  const totalResistance =
    stack.insideSurfaceResistance +
    layers.reduce((s, l) => s + (l.thermalResistance ?? 0), 0) +
    stack.outsideSurfaceResistance;
  const uValue = 1 / totalResistance;
  const corrections = correctionsOf(input, stack);
  const correctedUValue = uValue + (corrections?.total ?? 0);
  const q = steady.faces.inner.heatFluxDensityIn;
  const dT = input.inside.temperature - input.outside.temperature;
  const area = input.area ?? 1;
  return {
    uValue,
    uValueRounded: roundToSignificantFigures(uValue, U_VALUE_SIGNIFICANT_FIGURES),
    correctedUValue,
    correctedUValueRounded: roundToSignificantFigures(correctedUValue, U_VALUE_SIGNIFICANT_FIGURES),
    corrections,
    combinedMethod: stack.combined,
    uValueFromHeatFlow: dT === 0 ? null : q / dT,
    totalResistance,
    insideSurfaceResistance: stack.insideSurfaceResistance,
    outsideSurfaceResistance: stack.outsideSurfaceResistance,
    layers,
    insideSurfaceTemperature: steady.faces.inner.temperature,
    outsideSurfaceTemperature: steady.faces.outer.temperature,
    interfaceTemperatures: steady.interfaces.map((i) => i.temperatureInnerSide),
    heatFlowDensity: q,
    heatFlow: q * area,
    area,
    energyBalance: { residual: steady.balance.residual, relativeResidual: steady.balance.relativeResidual },
    ventilation: stack.ventilation,
    profile: { positions: steady.positions, temperatures: steady.temperatures },
    dynamic: wallDynamicCharacteristics(input, layers, stack.insideSurfaceResistance, stack.outsideSurfaceResistance),
  };
}

/** The Annex F corrections of the counted material layers that carry air gaps or fasteners, or null when none does. */
export function correctionsOf(input: WallInput, stack: ThermalStack): UCorrections | null {
  const layers = stack.layers.flatMap((l): CorrectedLayer[] => {
    const given = input.layers[l.index]!;
    if (!l.included || isAirLayer(given) || (given.airGapLevel === undefined && given.fasteners === undefined)) return [];
    return [
      {
        index: l.index,
        name: l.name,
        thickness: l.thickness,
        resistance: l.resistanceIgnoringBridges,
        ...(given.airGapLevel !== undefined ? { airGapLevel: given.airGapLevel } : {}),
        ...(given.fasteners !== undefined ? { fasteners: given.fasteners } : {}),
      },
    ];
  });
  return layers.length === 0 ? null : uCorrections(layers, stack.resistanceIgnoringBridges);
}
