/**
 * Stage 3 of the steady solve and the post-processing that follows it: reactions at the fixed
 * faces read from the rows set aside in stage 1, heat at natural faces, conservative heat flows at
 * every interface, per-layer figures and the energy balance.
 */
import { layerResidualsAtEnds, type LayerEndResiduals } from './assembly.js';
import { conductivityAt } from './conductivity.js';
import { summariseMesh, type Discretisation } from './discretisation.js';
import { filmExchangeAt, naturalHeatIn, type Face } from './face-conditions.js';
import { flowBasisFor } from './measure.js';
import type { EnergyBalance, FaceResult, InterfaceResult, LayerResult, SteadyResult } from './result.js';

/**
 * Heat entering through each face: at a fixed face the reaction, read from the row set aside in
 * stage 1 (K·T − F there, which only the end layer's elements touch: its end residual); at a
 * natural face the flux, or the film at the converged surface temperature.
 */
export function faceResults(d: Discretisation, ends: readonly LayerEndResiduals[], excess: ArrayLike<number>): [FaceResult, FaceResult] {
  return [faceResult(d, d.faces[0], ends[0]!.innerEnd, excess), faceResult(d, d.faces[1], ends[ends.length - 1]!.outerEnd, excess)];
}

/** One face's result; `row` is K·T − F in the face node's row. */
function faceResult(d: Discretisation, face: Face, row: number, excess: ArrayLike<number>): FaceResult {
  const position = d.mesh.positions[face.node]!;
  const c = face.condition;
  if (c.kind === 'temperature') {
    return { face: face.name, position, temperature: c.temperature, condition: c.kind, heatIn: row, heatFluxDensityIn: row / face.measure, reaction: row };
  }
  const temperature = d.reference + excess[face.node]!;
  const film = c.kind === 'film' ? filmExchangeAt(c, temperature) : undefined;
  const heatIn = naturalHeatIn(face, film, excess[face.node]!, d.reference);
  const result: Writable<FaceResult> = { face: face.name, position, temperature, condition: c.kind, heatIn, heatFluxDensityIn: heatIn / face.measure };
  if (film) result.film = film;
  return result;
}

type Writable<T> = { -readonly [K in keyof T]: T[K] };

export function energyBalance(heatInInner: number, heatInOuter: number, generated: number): EnergyBalance {
  const residual = heatInInner + heatInOuter + generated;
  const scale = Math.max(Math.abs(heatInInner), Math.abs(heatInOuter), Math.abs(generated));
  return { heatInInner, heatInOuter, generated, residual, relativeResidual: scale > 0 ? Math.abs(residual) / scale : 0 };
}

export function recoverSteadyResult(d: Discretisation, excess: Float64Array, iterations: number, lastChange: number): SteadyResult {
  assertFinite(excess);
  const { mesh, measure, layers } = d;
  const ends = layerResidualsAtEnds(mesh, layers, measure, excess, excess, d.reference);
  const [inner, outer] = faceResults(d, ends, excess);
  const temperatures = absoluteTemperatures(d, excess);
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
    // Field by field, in the order they print: spreading objects would cost more than the solve.
    const result = { index: l } as Writable<LayerResult>;
    if (layer.name !== undefined) result.name = layer.name;
    result.innerPosition = r1;
    result.outerPosition = r2;
    result.innerTemperature = innerT;
    result.outerTemperature = outerT;
    result.meanTemperature = mean;
    result.heatFlowInner = heatFlowInner;
    result.heatFlowOuter = heatFlowOuter;
    result.generated = generatedPerLayer[l]!;
    result.conductivityAtMeanTemperature = conductivityAt(layer.conductivity, mean);
    if (defined) {
      result.effectiveConductivity = (heatFlowOuter * shapeFactor) / deltaT;
      result.thermalResistance = deltaT / heatFlowOuter;
    }
    return result;
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
