/**
 * Stage 3 of the steady solve and the post-processing that follows it: reactions at the fixed
 * faces read from the rows set aside in stage 1, heat at natural faces, conservative heat flows at
 * every interface, per-layer figures and the energy balance.
 */
import { assembleSystem, layerResidualsAtEnds } from './assembly.js';
import type { BandedMatrix } from './banded-matrix.js';
import { conductivityAt } from './conductivity.js';
import { conductionRowProduct } from './conduction-residual.js';
import { summariseMesh, type Discretisation } from './discretisation.js';
import { applyFaceConditions, naturalHeatIn, type Face } from './face-conditions.js';
import { flowBasisFor } from './measure.js';
import type { FilmExchange } from './problem.js';
import type { EnergyBalance, FaceResult, InterfaceResult, LayerResult, SteadyResult } from './result.js';

/** Heat entering through each face: the reaction (row residual K·T − F) at a fixed face, the natural condition otherwise. */
export function faceResults(
  d: Discretisation,
  conductance: BandedMatrix,
  rhs: Float64Array,
  excess: ArrayLike<number>,
  films: readonly (FilmExchange | undefined)[],
): [FaceResult, FaceResult] {
  const results = d.faces.map((face: Face, i): FaceResult => {
    const t = d.reference + excess[face.node]!;
    const base = { face: face.name, position: d.mesh.positions[face.node]!, temperature: t, condition: face.condition.kind };
    if (face.condition.kind === 'temperature') {
      const reaction = rowResidual(conductance, rhs, excess, face.node);
      return { ...base, temperature: face.condition.temperature, heatIn: reaction, heatFluxDensityIn: reaction / face.measure, reaction };
    }
    const heatIn = naturalHeatIn(face, films[i], excess[face.node]!, d.reference);
    const film = films[i];
    return { ...base, heatIn, heatFluxDensityIn: heatIn / face.measure, ...(film ? { film } : {}) };
  });
  return [results[0]!, results[1]!];
}

/** (K·T − F) at a fixed-temperature row, conduction part in difference form (no film acts there). */
function rowResidual(matrix: BandedMatrix, rhs: Float64Array, x: ArrayLike<number>, row: number): number {
  return conductionRowProduct(matrix, x, row) - rhs[row]!;
}

export function energyBalance(heatInInner: number, heatInOuter: number, generated: number): EnergyBalance {
  const residual = heatInInner + heatInOuter + generated;
  const scale = Math.max(Math.abs(heatInInner), Math.abs(heatInOuter), Math.abs(generated));
  return { heatInInner, heatInOuter, generated, residual, relativeResidual: scale > 0 ? Math.abs(residual) / scale : 0 };
}

export function recoverSteadyResult(d: Discretisation, excess: Float64Array, iterations: number, lastChange: number): SteadyResult {
  assertFinite(excess);
  const { mesh, measure, layers } = d;
  const system = assembleSystem(mesh, layers, measure, excess, d.reference);
  const rhs = Float64Array.from(system.load);
  const { films } = applyFaceConditions(system.conductance, rhs, d.faces, excess, d.reference);
  const [inner, outer] = faceResults(d, system.conductance, rhs, excess, films);
  const temperatures = absoluteTemperatures(d, excess);

  const ends = layerResidualsAtEnds(mesh, layers, measure, excess, excess, d.reference);
  const generatedPerLayer = layers.map(() => 0);
  // Heat generated in each layer, q̇·∫dμ over the layer (the assembled load integrates it exactly).
  for (let l = 0; l < layers.length; l++) {
    const q = layers[l]!.heatGeneration ?? 0;
    if (q === 0) continue;
    const [first, last] = mesh.layerNodes[l]!;
    generatedPerLayer[l] = q * volumeBetween(d, mesh.positions[first]!, mesh.positions[last]!);
  }

  const layerResults: LayerResult[] = layers.map((layer, l) => {
    const [first, last] = mesh.layerNodes[l]!;
    const innerT = temperatures[first]!;
    const outerT = temperatures[last]!;
    const r1 = mesh.positions[first]!;
    const r2 = mesh.positions[last]!;
    const heatFlowInner = ends[l]!.innerEnd;
    const heatFlowOuter = -ends[l]!.outerEnd;
    const mean = (innerT + outerT) / 2;
    const deltaT = innerT - outerT;
    const defined = generatedPerLayer[l] === 0 && Math.abs(deltaT) > 1e-12 * Math.max(1, Math.abs(mean));
    const shapeFactor = d.mesh.geometry.kind === 'planar' ? r2 - r1 : Math.log(r2 / r1) / (2 * Math.PI);
    return {
      index: l,
      ...(layer.name !== undefined ? { name: layer.name } : {}),
      innerPosition: r1,
      outerPosition: r2,
      innerTemperature: innerT,
      outerTemperature: outerT,
      meanTemperature: mean,
      heatFlowInner,
      heatFlowOuter,
      generated: generatedPerLayer[l]!,
      conductivityAtMeanTemperature: conductivityAt(layer.conductivity, mean),
      ...(defined
        ? { effectiveConductivity: (heatFlowOuter * shapeFactor) / deltaT, thermalResistance: deltaT / heatFlowOuter }
        : {}),
    };
  });

  const interfaces: InterfaceResult[] = [];
  for (let l = 0; l + 1 < layers.length; l++) {
    const innerSide = mesh.layerNodes[l]![1];
    const outerSide = mesh.layerNodes[l + 1]![0];
    const position = mesh.positions[innerSide]!;
    // Both sides give the same flow up to round-off; read it from the side with the smaller
    // conductances (the insulation rather than the steel), where round-off is smallest.
    const heatFlow = ends[l]!.outerScale <= ends[l + 1]!.innerScale ? layerResults[l]!.heatFlowOuter : layerResults[l + 1]!.heatFlowInner;
    interfaces.push({
      index: l,
      position,
      temperatureInnerSide: temperatures[innerSide]!,
      temperatureOuterSide: temperatures[outerSide]!,
      contactResistance: layers[l]!.contactResistanceToNext ?? 0,
      heatFlow,
      heatFluxDensity: heatFlow / measure(position),
    });
  }

  const generated = generatedPerLayer.reduce((a, b) => a + b, 0);
  return {
    basis: flowBasisFor(mesh.geometry),
    positions: Array.from(mesh.positions),
    temperatures: Array.from(temperatures),
    faces: { inner, outer },
    interfaces,
    layers: layerResults,
    balance: energyBalance(inner.heatIn, outer.heatIn, generated),
    iterations,
    lastChange,
    mesh: summariseMesh(mesh),
  };
}

/** ∫dμ between two positions: a length (planar) or π(r2² − r1²) (axisymmetric). */
export function volumeBetween(d: Discretisation, a: number, b: number): number {
  return d.mesh.geometry.kind === 'planar' ? b - a : Math.PI * (b * b - a * a);
}

/** T = reference + θ, with fixed faces reported at exactly their prescribed temperature. */
export function absoluteTemperatures(d: Discretisation, excess: ArrayLike<number>): Float64Array {
  const t = new Float64Array(excess.length);
  for (let i = 0; i < t.length; i++) t[i] = d.reference + excess[i]!;
  for (const face of d.faces) if (face.condition.kind === 'temperature') t[face.node] = face.condition.temperature;
  return t;
}

export function assertFinite(values: ArrayLike<number>): void {
  for (let i = 0; i < values.length; i++) {
    if (!Number.isFinite(values[i]!)) throw new Error(`internal error: the solve produced a non-finite temperature at node ${i}`);
  }
}
