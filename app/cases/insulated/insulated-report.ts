/**
 * The report parts an insulated pipe and an insulated flat surface share: the build-up and
 * temperature tables, the cross-section picture, the outer surface's heat transfer, the temperature chart, the verdicts of
 * the three surface checks with their margins in words, the conditions, and the sources. Each is
 * a pure function of the case's input and its solved result; the pipe and flat reports add their
 * own headline figures and subject line.
 */
import type { ConductivityModel } from '../../fe/conductivity.js';
import { exactLayerProfile } from '../../fe/exact-layer-profile.js';
import saturationFormulas from '../../../data/physics/saturation-formulas.json' with { type: 'json' };
import type { QuantityText } from '../../base/quantity-text.js';
import { DEFAULT_TOUCH_LIMIT } from '../../checks/personnel-protection.js';
import { AIR_TABLE_SOURCE, SIMPLIFIED_CONVECTION_SOURCE } from '../../physics/index.js';
import type { MaterialProperties } from '../../materials/material-properties.js';
import { asSentence } from '../../report/as-sentence.js';
import { temperatureMarginPhrase } from '../../report/margin-phrase.js';
import type { ReportCrossSection, ReportFigure, ReportSection, ReportTable, ReportVerdict } from '../../report/report-model.js';
import { reportVerdict } from '../../report/report-verdicts.js';
import type { InsulatedSurfaceInput } from './insulated-inputs.js';
import type { LayerTemperatures, StackSolution } from './insulated-solve.js';
import type { ResolvedEmissivity } from './insulated-inputs.js';

/** What a pipe or flat result holds that these parts read. */
export type InsulatedResult = Omit<StackSolution, 'engine' | 'heatOut'> & { readonly emissivity: ResolvedEmissivity | null };

/** How the parts differ between a pipe (radius, per metre) and a flat surface (distance, per m²). */
export interface InsulatedGeometry {
  /** Chart and table label of a layer's position: "radius" or "distance from the inner surface". */
  readonly positionLabel: string;
  /** Distance shown for a stored position (a pipe shows the radius itself, a flat surface the distance from its inner face). */
  readonly shownPosition: (position: number) => number;
  /** How the temperature runs inside each layer (for the chart): the geometry and each layer's λ(θ). */
  readonly profile: { readonly kind: 'planar' | 'axisymmetric'; readonly conductivities: readonly ConductivityModel[] };
}

/** Points drawn inside each layer, so a cylinder's logarithmic profile and a λ(θ) layer's curve show as they are. */
const PROFILE_POINTS_PER_LAYER = 12;

const TEMPERATURES_TABLE = 'Temperatures through the build-up';

/** "pipe wall", "insulation layer 2", "jacket": a layer by its part in the build-up. */
export function layerLabel(layer: LayerTemperatures, all: readonly LayerTemperatures[]): string {
  if (layer.role === 'pipe-wall') return 'pipe wall';
  if (layer.role === 'wall') return 'wall';
  if (layer.role === 'jacket') return 'jacket';
  const insulation = all.filter((l) => l.role === 'insulation');
  return insulation.length === 1 ? 'insulation' : `insulation layer ${insulation.indexOf(layer) + 1}`;
}

/** The shape of the cross-section picture: a plane build-up, or rings round a pipe's bore (m). */
export type CrossSectionShape = { readonly geometry: 'plane' } | { readonly geometry: 'cylinder'; readonly innerRadius: number };

const BUILD_UP_TABLE = "Build-up, inside to outside; λ at each layer's mean temperature";

/** `materials` are the stack's materials in the order of `result.layers` (they give each layer its category). */
export function buildUpSection(result: InsulatedResult, materials: readonly MaterialProperties[], shape: CrossSectionShape): ReportSection {
  const layers = result.layers;
  const crossSection: ReportCrossSection = {
    title: 'Build-up to scale',
    ...shape,
    layers: layers.map((l, i) => ({ name: `${layerLabel(l, layers)}: ${l.material}`, category: materials[i]!.category, thickness: l.thickness })),
    temperatures: [layers[0]!.innerTemperature, ...layers.map((l) => l.outerTemperature)],
    tabulatedIn: BUILD_UP_TABLE,
  };
  const table: ReportTable = {
    title: BUILD_UP_TABLE,
    columns: [
      { label: 'Layer' },
      { label: 'Material' },
      { label: 'Thickness', quantity: 'thickness' },
      { label: 'λ', quantity: 'conductivity' },
      { label: 'Mean temperature', quantity: 'temperature' },
    ],
    rows: result.layers.map((l) => [
      layerLabel(l, result.layers),
      l.material,
      { value: l.thickness, quantity: 'thickness' },
      { value: l.conductivityAtMeanTemperature, quantity: 'conductivity' },
      { value: l.meanTemperature, quantity: 'temperature' },
    ]),
  };
  return {
    id: 'build-up',
    heading: 'Build-up',
    blocks: [
      { kind: 'table', table },
      { kind: 'cross-section', crossSection },
    ],
  };
}

export function temperaturesSection(result: InsulatedResult, geometry: InsulatedGeometry): ReportSection {
  const layers = result.layers;
  const first = layers[0]!;
  const last = layers[layers.length - 1]!;
  const row = (where: string, position: number, temperature: number) => [
    where,
    { value: geometry.shownPosition(position), quantity: 'position' as const },
    { value: temperature, quantity: 'temperature' as const },
  ];
  const table: ReportTable = {
    title: TEMPERATURES_TABLE,
    columns: [{ label: 'Where' }, { label: capitalise(geometry.positionLabel), quantity: 'position' }, { label: 'Temperature', quantity: 'temperature' }],
    rows: [
      row(`inner surface of the ${layerLabel(first, layers)}`, first.innerPosition, first.innerTemperature),
      ...layers.slice(1).map((l, i) => row(`between ${layerLabel(layers[i]!, layers)} and ${layerLabel(l, layers)}`, l.innerPosition, l.innerTemperature)),
      row(`outer surface of the ${layerLabel(last, layers)}`, last.outerPosition, last.outerTemperature),
    ],
  };
  // Each layer's profile, its first point left out after the first layer (the interface is the
  // previous layer's last); a plain loop, as this runs for every chart point of every solve.
  const points: (readonly [number, number])[] = [];
  layers.forEach((l, i) => {
    const inside = exactLayerProfile(geometry.profile.kind, geometry.profile.conductivities[i]!, l.innerPosition, l.outerPosition, l.innerTemperature, l.outerTemperature, PROFILE_POINTS_PER_LAYER);
    for (let k = i === 0 ? 0 : 1; k < inside.length; k++) points.push([geometry.shownPosition(inside[k]![0]), inside[k]![1]]);
  });
  const ends = [points[0]![0], points[points.length - 1]![0]];
  return {
    id: 'temperatures',
    heading: 'Temperatures',
    blocks: [
      { kind: 'table', table },
      {
        kind: 'chart',
        chart: {
          title: 'Temperature through the build-up',
          x: { label: geometry.positionLabel, quantity: 'position' },
          y: { label: 'temperature', quantity: 'temperature' },
          series: [
            { name: 'temperature', points },
            { name: 'dew point of the air', points: ends.map((x) => [x, result.dewPoint] as const), reference: true },
          ],
          markers: layers.slice(1).map((l, i) => ({
            x: geometry.shownPosition(l.innerPosition),
            label: `between ${layerLabel(layers[i]!, layers)} and ${layerLabel(l, layers)}`,
          })),
          tabulatedIn: TEMPERATURES_TABLE,
        },
      },
    ],
  };
}

export function surfaceSection(result: InsulatedResult): ReportSection {
  const c = result.surfaceCoefficient;
  const figures: ReportFigure[] = [
    { label: 'Outer surface temperature', value: result.surfaceTemperature, quantity: 'temperature' },
    { label: 'Surface coefficient (convection + radiation)', value: c.total, quantity: 'filmCoefficient' },
    { label: 'of which convection', value: c.convection, quantity: 'filmCoefficient' },
    { label: 'of which radiation', value: c.radiation, quantity: 'filmCoefficient' },
    { label: 'Combined sink temperature', value: c.sinkTemperature, quantity: 'temperature', note: 'air and surroundings weighted by the two coefficients' },
    ...(result.emissivity ? [{ label: 'Emissivity of the outer surface', value: result.emissivity.value, quantity: 'emissivity' as const, note: result.emissivity.source }] : []),
    { label: 'Dew point of the air', value: result.dewPoint, quantity: 'temperature' },
  ];
  return { id: 'surface', heading: 'Outer surface heat transfer', blocks: [{ kind: 'figures', figures }] };
}

export function conditionsSection(input: InsulatedSurfaceInput, extra: readonly ReportFigure[]): ReportSection {
  const inner = input.inner;
  const a = input.ambient;
  const figures: ReportFigure[] = [
    ...(inner.kind === 'fluid'
      ? [
          { label: 'Fluid temperature', value: inner.temperature, quantity: 'temperature' as const },
          { label: 'Inside film coefficient', value: inner.coefficient, quantity: 'filmCoefficient' as const },
        ]
      : [{ label: 'Inner surface held at', value: inner.temperature, quantity: 'temperature' as const }]),
    { label: 'Air temperature', value: a.airTemperature, quantity: 'temperature' },
    {
      label: 'Radiant temperature of the surroundings',
      value: a.surroundingsTemperature ?? a.airTemperature,
      quantity: 'temperature',
      ...(a.surroundingsTemperature === undefined ? { note: 'taken equal to the air temperature' } : {}),
    },
    { label: 'Relative humidity of the air', value: a.relativeHumidity, quantity: 'relativeHumidity' },
    a.exposure.kind === 'outdoor'
      ? { label: 'Wind speed (outdoors)', value: a.exposure.windSpeed, quantity: 'windSpeed' }
      : { label: 'Wind speed (indoors, still air)', value: 0, quantity: 'windSpeed' },
    ...extra,
    { label: 'Operating hours per year', value: input.operatingHours, quantity: 'hours' },
    { label: 'Touch limit', value: input.touchLimit ?? DEFAULT_TOUCH_LIMIT, quantity: 'temperature' },
  ];
  return { id: 'conditions', heading: 'Design conditions', blocks: [{ kind: 'figures', figures }] };
}

/** The three surface checks, with the service-temperature margin measured to the material that governs. */
export function insulatedVerdicts(result: InsulatedResult, text: QuantityText): ReportVerdict[] {
  const { surfaceCondensation, personnelProtection, serviceTemperature } = result.checks;
  const governing = serviceTemperature.governingLimit;
  const layer = governing ? result.layers.find((l) => l.name === governing.layer) : undefined;
  const serviceReference = governing && layer ? `the ${governing.side} service limit of ${materialOrLayer(layer, result.layers)}` : undefined;
  return [
    reportVerdict(surfaceCondensation, temperatureMarginPhrase(surfaceCondensation.margin, 'the dew point', text)),
    reportVerdict(personnelProtection, temperatureMarginPhrase(personnelProtection.margin, undefined, text)),
    reportVerdict(serviceTemperature, temperatureMarginPhrase(serviceTemperature.margin, serviceReference, text)),
  ];
}

/** The material's name where only one layer uses it, else the layer's own name. */
function materialOrLayer(layer: LayerTemperatures, all: readonly LayerTemperatures[]): string {
  return all.filter((l) => l.material === layer.material).length === 1 ? layer.material : layer.name;
}

export function insulatedAssumptions(assumptions: readonly string[]): string[] {
  return assumptions.map(asSentence);
}

/** Methods and data behind the figures, with their provenance as the data states it. */
export function insulatedSources(
  input: InsulatedSurfaceInput,
  materials: readonly MaterialProperties[],
  convection: string,
  text: QuantityText,
): string[] {
  const method = input.surfaceMethod ?? { kind: 'correlations' as const };
  const radiation =
    method.kind === 'fixed-coefficient' || method.kind === 'fixed-resistance'
      ? []
      : ['Radiation from the outer surface: grey surface in large surroundings, h_r = εσ(T_s² + T_r²)(T_s + T_r).'];
  const surface =
    method.kind === 'correlations'
      ? [`Convection at the outer surface: ${convection}; use outside a correlation's validity range is listed among the warnings.`, `Air properties: ${AIR_TABLE_SOURCE}.`]
      : method.kind === 'simplified'
        ? [`Convection at the outer surface: simplified trade formulas (${SIMPLIFIED_CONVECTION_SOURCE}).`]
        : method.kind === 'fixed-convection'
          ? [`Convection coefficient fixed in the case at ${text.figure(method.coefficient, 'filmCoefficient')}.`]
          : method.kind === 'fixed-coefficient'
            ? [`Surface coefficient fixed in the case at ${text.figure(method.coefficient, 'filmCoefficient')}.`]
            : [`Surface resistance fixed in the case at ${text.figure(method.resistance, 'thermalResistance')}.`];
  const iso = saturationFormulas.formulas.find((f) => f.id === 'iso13788')!;
  const limit = (t: number) => text.given(t, 'temperature');
  const touch =
    input.touchLimit === undefined
      ? `Touch limit ${limit(DEFAULT_TOUCH_LIMIT)}: about the limit for brief contact with a metal surface in industrial practice that cites ASTM C1055 (common practice, no source); many specifications use ${text.givenNumber(50, 'temperature')} to ${limit(55)}, or ${limit(43)} where vulnerable people may touch the surface.`
      : `Touch limit ${limit(input.touchLimit)} as given in the case.`;
  const seen = new Set<string>();
  const materialLines = materials.flatMap((m) => {
    const line = asSentence(`${m.name}: ${m.source && m.source.trim() !== '' ? m.source : 'no source given with the material'}`);
    if (seen.has(line)) return [];
    seen.add(line);
    return [line];
  });
  return [
    'Conduction through the layers: one-dimensional steady finite-element solution, with each conductivity evaluated at the local temperature and the outer surface coefficient iterated to the converged surface temperature.',
    ...surface,
    ...radiation,
    `Dew point: from the saturation pressure over water or ice by the formulas of the ${iso.source}, ${iso.label}.`,
    touch,
    ...materialLines,
  ];
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
