/**
 * Turns a wall input into the stack the engine solves: the surface resistances in force, each
 * layer's conductivity model (an air layer as an equivalent conductivity), and the ISO 6946 rules
 * for ventilated air layers applied.
 *
 * ISO 6946 rules (reference notes §2, from memory):
 * - unventilated layer: thermal resistance R_g from the standard's table (both faces ε ≥ 0.8) or its
 *   annex formula (a low-emissivity face), entered as a layer of conductivity d/R_g;
 * - well ventilated layer: the layer and everything outside it are ignored and the outside surface
 *   resistance becomes the inside surface resistance of the same direction;
 * - slightly ventilated layer: R_T = (1500 − A_v)/1000·R_T,u + (A_v − 500)/1000·R_T,v.
 *   The standard gives only R_T. To keep a temperature profile through every layer, the part of the
 *   element from the air layer outwards (R_g, outer layers, R_se) is scaled by one factor so that the
 *   total equals that R_T (our modelling choice, no source); the inner layers keep their resistance.
 *
 * A bridged layer (a material with bridges side by side, wall-combined-method.ts) enters the
 * engine as one layer of constant conductivity d/R_eq, where R_eq is its share of the combined
 * method's R_T for the counted element (our modelling choice): the series sum of the stack is then
 * R_T, so the solved heat flow gives the combined-method U and the temperatures lie on that one
 * profile. The combined method reads every conductivity at 10 °C (declared values). With a slightly
 * ventilated air layer the combined method is taken for the element with that layer unventilated,
 * and the ventilation weighting then applies to the equivalent resistances.
 */
import type { ConductivityModel } from '../../fe/conductivity.js';
import { conductivityAt } from '../../fe/conductivity.js';
import { InputError } from '../../fe/errors.js';
import {
  airLayerResistance,
  airLayerResistanceFromTable,
  slightlyVentilatedTotalResistance,
  standardSurfaceResistances,
  wellVentilatedOutsideResistance,
} from '../../physics/index.js';
import { combinedMethod, type CombinedMethodResult, type CombinedPart, type CombinedSection } from './wall-combined-method.js';
import { isAirLayer, type WallInput, type WallLayer, type WallMaterialLayer } from './wall-input.js';

/** Faces with emissivity at or above this use the ISO 6946 table (high-emissivity faces), from memory. */
const TABLE_EMISSIVITY_MINIMUM = 0.8;
/** Temperature at which a λ(T) model is read for the slightly-ventilated weighting, °C (declared values refer to 10 °C). */
const DECLARED_TEMPERATURE = 10;

export type VentilationRule = 'none' | 'slightly-ventilated' | 'well-ventilated';

export interface StackLayer {
  /** Index in the input's layer list. */
  readonly index: number;
  readonly name: string;
  readonly kind: 'material' | 'air-layer';
  readonly thickness: number;
  /** False for layers outside a well ventilated air layer (and that layer itself). */
  readonly included: boolean;
  /** Conductivity model given to the engine (for an air layer: the equivalent d/R_g, scaled where the slightly-ventilated rule applies). */
  readonly conductivity: ConductivityModel;
  /** Thermal resistance before any slightly-ventilated scaling: d/λ(10 °C) or R_g, m²·K/W. */
  readonly nominalResistance: number;
  /** Factor the layer's resistance is multiplied by (1 except outside a slightly ventilated layer). */
  readonly resistanceScale: number;
  /** For an air layer: R_g and where it came from. */
  readonly airLayer?: { readonly resistance: number; readonly method: 'table' | 'formula' };
  /** For a bridged layer: its sections and the combined method's figures for it. */
  readonly bridged?: StackBridgedLayer;
  /** d/λ(10 °C) of the layer's own material (the infill of a bridged layer), or R_g: the layer ignoring thermal bridging, m²·K/W. */
  readonly resistanceIgnoringBridges: number;
}

/** A bridged layer as the combined method treats it. */
export interface StackBridgedLayer {
  /** The layer's own material first (the rest of the area), then each bridge; λ at 10 °C. */
  readonly sections: readonly CombinedSection[];
  /** λ''_j = Σ f_m·λ_mj, W/(m·K). */
  readonly lowerLimitConductivity: number;
  /** d/λ''_j, m²·K/W. */
  readonly lowerLimitResistance: number;
  /** The resistance the layer carries in the engine (its share of R_T), m²·K/W; the lower-limit value when the layer is not counted. */
  readonly equivalentResistance: number;
}

export interface ThermalStack {
  readonly insideSurfaceResistance: number;
  /** R_se used in the engine (after the ventilation rules). */
  readonly outsideSurfaceResistance: number;
  readonly layers: readonly StackLayer[];
  readonly ventilation: VentilationApplied;
  /** ISO 6946 combined method of the counted element; null when no counted layer is bridged. */
  readonly combined: CombinedMethodResult | null;
  /** R_T,h: R_si + the counted layers ignoring thermal bridging + R_se, m²·K/W (after the ventilation rules). */
  readonly resistanceIgnoringBridges: number;
}

/** Which ISO 6946 ventilation rule was applied, to which air layer, with its totals. */
export interface VentilationApplied {
  readonly rule: VentilationRule;
  /** Input index of the ventilated air layer the rule applies to. */
  readonly layerIndex?: number;
  /** For the slightly-ventilated rule: R_T,u, R_T,v and the resulting R_T. */
  readonly unventilatedTotal?: number;
  readonly wellVentilatedTotal?: number;
  readonly weightedTotal?: number;
}

export interface StackOptions {
  /** Replace R_si (e.g. 0.25 m²·K/W for the mould check). */
  readonly insideSurfaceResistance?: number;
}

function scaleConductivity(model: ConductivityModel, resistanceScale: number): ConductivityModel {
  if (resistanceScale === 1) return model;
  const k = 1 / resistanceScale;
  switch (model.kind) {
    case 'constant':
      return { kind: 'constant', value: model.value * k };
    case 'polynomial':
      return { kind: 'polynomial', coefficients: model.coefficients.map((c) => c * k) };
    case 'table':
      return { kind: 'table', points: model.points.map(([t, v]) => [t, v * k] as const) };
  }
}

function airLayerValue(layer: WallLayer & { kind: 'air-layer' }, input: WallInput): { resistance: number; method: 'table' | 'formula' } {
  const emissivities = layer.emissivities ?? [0.9, 0.9];
  if (emissivities[0] >= TABLE_EMISSIVITY_MINIMUM && emissivities[1] >= TABLE_EMISSIVITY_MINIMUM) {
    return { resistance: airLayerResistanceFromTable(layer.thickness, input.heatFlowDirection), method: 'table' };
  }
  return {
    resistance: airLayerResistance({ thickness: layer.thickness, direction: input.heatFlowDirection, emissivities }),
    method: 'formula',
  };
}

function layerName(layer: WallLayer, index: number): string {
  if (layer.name) return layer.name;
  return isAirLayer(layer) ? `air layer ${index + 1}` : layer.material.name || `layer ${index + 1}`;
}

/** Builds the stack; the input must already be validated. */
export function buildThermalStack(input: WallInput, options: StackOptions = {}): ThermalStack {
  const direction = input.heatFlowDirection;
  const standard = standardSurfaceResistances(direction);
  const given = input.surfaceResistances && input.surfaceResistances !== 'standard' ? input.surfaceResistances : standard;
  const rsi = options.insideSurfaceResistance ?? given.inside;
  const rse = given.outside;

  const base = input.layers.map((layer, index) => {
    if (isAirLayer(layer)) {
      const air = airLayerValue(layer, input);
      return { index, name: layerName(layer, index), kind: 'air-layer' as const, thickness: layer.thickness, nominalResistance: air.resistance, air };
    }
    const lambda = conductivityAt(layer.material.conductivity, DECLARED_TEMPERATURE);
    const sections = bridgedSections(layer, lambda);
    return {
      index,
      name: layerName(layer, index),
      kind: 'material' as const,
      thickness: layer.thickness,
      nominalResistance: layer.thickness / lambda,
      model: layer.material.conductivity,
      ...(sections ? { sections } : {}),
    };
  });

  const ventilatedIndex = input.layers.findIndex((l) => isAirLayer(l) && l.ventilation !== 'unventilated');
  const ventilated = ventilatedIndex >= 0 ? input.layers[ventilatedIndex]! : undefined;
  const rule: VentilationRule = ventilated && isAirLayer(ventilated) ? ventilated.ventilation as VentilationRule : 'none';

  if (rule === 'slightly-ventilated') {
    const further = input.layers.findIndex((l, i) => i > ventilatedIndex && isAirLayer(l) && l.ventilation !== 'unventilated');
    if (further >= 0) {
      throw new InputError(
        `layers[${further}].ventilation`,
        `layers[${further}].ventilation must be 'unventilated' because layers[${ventilatedIndex}] is slightly ventilated; one ventilated air layer per element is supported.`,
      );
    }
  }

  if (rule === 'well-ventilated' && ventilatedIndex === 0) {
    throw new InputError('layers[0].ventilation', `layers[0].ventilation must not be 'well-ventilated': a well ventilated air layer needs at least one layer inside it.`);
  }

  // The combined method on the counted element, before the slightly-ventilated weighting.
  const countedOutsideResistance = rule === 'well-ventilated' ? wellVentilatedOutsideResistance(standard.inside) : rse;
  const counted = base.filter((l) => !(rule === 'well-ventilated' && l.index >= ventilatedIndex));
  const combined = counted.some((l) => 'sections' in l)
    ? combinedMethod(
        counted.map((l): CombinedPart => ('sections' in l && l.sections ? { kind: 'bridged', thickness: l.thickness, sections: l.sections } : { kind: 'homogeneous', resistance: l.nominalResistance })),
        rsi,
        countedOutsideResistance,
      )
    : null;
  const bridgedOf = new Map<number, StackBridgedLayer>();
  for (const l of base) {
    if (!('sections' in l) || !l.sections) continue;
    const k = counted.indexOf(l);
    const figures = combined?.bridgedLayers.find((b) => b.part === k);
    const lambda = l.sections.reduce((s, m) => s + m.fraction * m.conductivity, 0);
    const lowerLimitResistance = l.thickness / lambda;
    bridgedOf.set(l.index, {
      sections: l.sections,
      lowerLimitConductivity: lambda,
      lowerLimitResistance,
      equivalentResistance: figures ? figures.equivalentResistance : lowerLimitResistance,
    });
    // The layer's resistance from here on (ventilation weighting, engine) is its share of R_T.
    l.nominalResistance = bridgedOf.get(l.index)!.equivalentResistance;
  }

  let scale = 1;
  let outsideResistance = rse;
  let ventilation: ThermalStack['ventilation'] = { rule };
  if (rule === 'well-ventilated') {
    outsideResistance = wellVentilatedOutsideResistance(standard.inside);
    ventilation = { rule, layerIndex: ventilatedIndex };
  } else if (rule === 'slightly-ventilated' && ventilated && isAirLayer(ventilated)) {
    const inner = rsi + base.slice(0, ventilatedIndex).reduce((s, l) => s + l.nominalResistance, 0);
    const outer = base.slice(ventilatedIndex).reduce((s, l) => s + l.nominalResistance, 0) + rse;
    const unventilatedTotal = inner + outer;
    const wellVentilatedTotal = inner + wellVentilatedOutsideResistance(standard.inside);
    const weightedTotal = slightlyVentilatedTotalResistance(ventilated.openingArea!, unventilatedTotal, wellVentilatedTotal);
    scale = (weightedTotal - inner) / outer;
    outsideResistance = rse * scale;
    ventilation = { rule, layerIndex: ventilatedIndex, unventilatedTotal, wellVentilatedTotal, weightedTotal };
  }

  const layers: StackLayer[] = base.map((l) => {
    const included = !(rule === 'well-ventilated' && l.index >= ventilatedIndex);
    const resistanceScale = rule === 'slightly-ventilated' && l.index >= ventilatedIndex ? scale : 1;
    // An air layer enters the engine as a layer of equivalent conductivity λ_eq = d/R_g, which
    // gives it exactly the resistance R_g in the series sum.
    // A bridged layer likewise enters as λ_eq = d/R_eq, its share of the combined method's R_T.
    const bridged = bridgedOf.get(l.index);
    const model: ConductivityModel =
      'air' in l || bridged ? { kind: 'constant', value: l.thickness / l.nominalResistance } : (l.model as ConductivityModel);
    return {
      index: l.index,
      name: l.name,
      kind: l.kind,
      thickness: l.thickness,
      included,
      conductivity: scaleConductivity(model, resistanceScale),
      nominalResistance: l.nominalResistance,
      resistanceScale,
      ...('air' in l ? { airLayer: l.air } : {}),
      ...(bridged ? { bridged } : {}),
      resistanceIgnoringBridges: bridged ? l.thickness / bridged.sections[0]!.conductivity : l.nominalResistance,
    };
  });

  const resistanceIgnoringBridges =
    rsi + layers.filter((l) => l.included).reduce((s, l) => s + l.resistanceIgnoringBridges * l.resistanceScale, 0) + outsideResistance;
  return { insideSurfaceResistance: rsi, outsideSurfaceResistance: outsideResistance, layers, ventilation, combined, resistanceIgnoringBridges };
}

/**
 * The sections of a bridged layer, its own material first with the rest of the area, each λ at
 * 10 °C; undefined for a homogeneous layer (no bridges, or an empty list).
 */
function bridgedSections(layer: WallMaterialLayer, lambda: number): CombinedSection[] | undefined {
  const bridges = layer.bridges ?? [];
  if (bridges.length === 0) return undefined;
  const bridged = bridges.reduce((s, b) => s + b.fraction, 0);
  return [
    { name: layer.material.name, fraction: 1 - bridged, conductivity: lambda },
    ...bridges.map((b, k) => ({ name: b.name ?? b.material.name ?? `bridge ${k + 1}`, fraction: b.fraction, conductivity: conductivityAt(b.material.conductivity, DECLARED_TEMPERATURE) })),
  ];
}
