/**
 * The report of a wall or roof: the ISO 6946 U-value (to the standard's two significant figures,
 * with the unrounded value beside it), resistances and temperatures layer by layer, which inside
 * surface resistance each part used, and the moisture checks (wall-moisture-report.ts). A pure
 * function of the wall input and its analysis.
 */
import humidityClasses from '../../../data/physics/humidity-classes.json' with { type: 'json' };
import moistureParameters from '../../../data/physics/iso13788-moisture-parameters.json' with { type: 'json' };
import airLayers from '../../../data/physics/iso6946-air-layers.json' with { type: 'json' };
import surfaceResistances from '../../../data/physics/iso6946-surface-resistances.json' with { type: 'json' };
import saturationFormulas from '../../../data/physics/saturation-formulas.json' with { type: 'json' };
import { SI_TEXT, type QuantityText } from '../../base/quantity-text.js';
import { asSentence } from '../../report/as-sentence.js';
import type { CaseReport, ReportBlock, ReportCell, ReportCrossSection, ReportFigure, ReportSection, ReportTable } from '../../report/report-model.js';
import { distinctCautions } from '../../report/report-verdicts.js';
import type { WallAnalysis } from './wall-analysis.js';
import { dynamicAssumptions, dynamicSections, dynamicSources } from './wall-dynamic-report.js';
import { isAirLayer, type WallInput } from './wall-input.js';
import { ventOpeningQuantity } from './vent-opening.js';
import { conditionPhrase, insideHumidityWords, interstitialSection, monthlySection, mouldSection, wallVerdicts } from './wall-moisture-report.js';
import { withFields } from '../with-fields.js';
import { bridgingAssumptions, bridgingSources, combinedMethodSections, correctionSections, targetUSections } from './wall-bridging-report.js';

const LAYER_TABLE = 'Layers, inside to outside, with the surface resistances';

/** `text` writes the figures in sentences and notes in the project's units (default SI). */
export function wallReport(input: WallInput, analysis: WallAnalysis, text: QuantityText = SI_TEXT): CaseReport {
  const w = analysis.wall;
  const verdicts = wallVerdicts(analysis, text);
  const monthly = monthlySection(input, analysis);
  return {
    kind: 'wall',
    title: input.name ?? 'Wall or roof',
    subject: subjectOf(input, text),
    keyFigures: [
      { label: 'U-value', value: w.uValue, quantity: 'uValue', note: `unrounded ${text.figure(w.uValue, 'uValueUnrounded')}` },
      ...(w.corrections !== null
        ? [{ label: 'U-value with corrections U_c (ISO 6946 Annex F)', value: w.correctedUValue, quantity: 'uValue' as const, note: `unrounded ${text.figure(w.correctedUValue, 'uValueUnrounded')}; air gaps and fasteners added` }]
        : []),
      ...(w.combinedMethod !== null
        ? [{ label: 'Largest relative error e of the combined method', value: w.combinedMethod.relativeError, quantity: 'fraction' as const, note: 'bridged layers, ISO 6946' }]
        : []),
      { label: 'Total thermal resistance R_T', value: w.totalResistance, quantity: 'thermalResistance', note: 'surface to surface plus R_si and R_se' },
      { label: 'Inside surface temperature', value: w.insideSurfaceTemperature, quantity: 'temperature', note: `at the design condition, with R_si = ${text.figure(w.insideSurfaceResistance, 'thermalResistance')}` },
      { label: 'Heat flow density', value: w.heatFlowDensity, quantity: 'heatFlux', note: 'from the inside to the outside' },
      { label: 'Heat flow through the whole area', value: w.heatFlow, quantity: 'heatFlow' },
    ],
    verdicts,
    sections: [
      conditionsSection(input, analysis),
      layersSection(input, analysis),
      ...combinedMethodSections(w, text),
      ...correctionSections(w, text),
      ...targetUSections(analysis, text),
      surfaceResistanceSection(input, analysis, text),
      mouldSection(analysis, text),
      interstitialSection(analysis),
      ...(monthly ? [monthly] : []),
      ...dynamicSections(w, text),
    ],
    energyBalance: withFields(w.energyBalance, { quantity: 'heatFlux' as const }),
    assumptions: assumptionsOf(input, analysis, text),
    warnings: analysis.warnings.map(asSentence),
    sources: sourcesOf(input, analysis, text),
    cautions: distinctCautions(verdicts),
  };
}

function subjectOf(input: WallInput, text: QuantityText): string {
  const direction = { upward: 'heat flowing upwards (a roof or ceiling)', downward: 'heat flowing downwards (a floor)', horizontal: 'heat flowing horizontally (a wall)' }[input.heatFlowDirection];
  const total = input.layers.reduce((s, l) => s + l.thickness, 0);
  return `Building element of ${input.layers.length} layers, ${text.figure(total, 'thickness')} in all, ${direction}; design condition ${text.figure(input.inside.temperature, 'temperature')} inside, ${text.figure(input.outside.temperature, 'temperature')} outside.`;
}

function conditionsSection(input: WallInput, a: WallAnalysis): ReportSection {
  const climate = input.moisture?.climate;
  return {
    id: 'conditions',
    heading: 'Design conditions',
    blocks: [
      {
        kind: 'figures',
        figures: [
          { label: 'Inside air temperature', value: input.inside.temperature, quantity: 'temperature' },
          { label: 'Inside relative humidity', value: input.inside.relativeHumidity, quantity: 'relativeHumidity' },
          { label: 'Outside air temperature', value: input.outside.temperature, quantity: 'temperature' },
          { label: 'Outside relative humidity', value: input.outside.relativeHumidity, quantity: 'relativeHumidity' },
          { label: 'Area of the element', value: a.wall.area, quantity: 'area' },
        ],
      },
      {
        kind: 'paragraphs',
        paragraphs: [
          `The moisture checks take the inside vapour pressure from ${insideHumidityWords(input.moisture?.insideHumidity)}.`,
          ...(climate ? [`Monthly checks use the ${climate.name} climate (${climate.label}).`] : ['No monthly climate is given: the mould check uses the design condition and the year is not followed.']),
        ],
      },
    ],
  };
}

function layersSection(input: WallInput, a: WallAnalysis): ReportSection {
  const w = a.wall;
  const r = (value: number | null): ReportCell => ({ value, quantity: 'thermalResistance' });
  const blank = (quantity: 'thickness' | 'conductivity' | 'temperature'): ReportCell => ({ value: null, quantity });
  const table: ReportTable = {
    title: LAYER_TABLE,
    columns: [
      { label: 'Layer' },
      { label: 'Thickness', quantity: 'thickness' },
      { label: 'λ', quantity: 'conductivity' },
      { label: 'R', quantity: 'thermalResistance' },
      { label: 'θ inside face', quantity: 'temperature' },
      { label: 'θ outside face', quantity: 'temperature' },
    ],
    rows: [
      ['inside surface resistance R_si', blank('thickness'), blank('conductivity'), r(w.insideSurfaceResistance), blank('temperature'), blank('temperature')],
      ...w.layers.map((l): ReportCell[] => [
        l.included
          ? l.kind === 'air-layer'
            ? `${l.name} (air layer)`
            : l.bridged
              ? `${l.name} (bridged: equivalent λ of the combined method)`
              : l.name
          : `${l.name} (not counted: outside a well ventilated air layer)`,
        { value: l.thickness, quantity: 'thickness' },
        { value: l.kind === 'air-layer' ? null : l.effectiveConductivity, quantity: 'conductivity' },
        r(l.thermalResistance),
        { value: l.innerTemperature, quantity: 'temperature' },
        { value: l.outerTemperature, quantity: 'temperature' },
      ]),
      ['outside surface resistance R_se', blank('thickness'), blank('conductivity'), r(w.outsideSurfaceResistance), blank('temperature'), blank('temperature')],
      ['total R_T', blank('thickness'), blank('conductivity'), r(w.totalResistance), blank('temperature'), blank('temperature')],
    ],
  };
  const included = w.layers.filter((l) => l.included);
  const markers: { x: number; label: string }[] = [];
  let x = 0;
  included.slice(0, -1).forEach((l, i) => {
    x += l.thickness;
    markers.push({ x, label: `between ${l.name} and ${included[i + 1]!.name}` });
  });
  return {
    id: 'layers',
    heading: 'Layers and temperatures at the design condition',
    blocks: [
      { kind: 'table', table },
      { kind: 'cross-section', crossSection: crossSectionOf(input, w.layers) },
      ...(w.layers.some((l) => l.kind === 'air-layer')
        ? [{ kind: 'paragraphs' as const, paragraphs: ['An air layer shows no λ: its R is the ISO 6946 thermal resistance of the air layer.'] }]
        : []),
      ...ventOpeningBlocks(input, w.layers),
      {
        kind: 'chart',
        chart: {
          title: 'Temperature through the layers',
          x: { label: 'distance from the inside surface', quantity: 'position' },
          y: { label: 'temperature', quantity: 'temperature' },
          series: [{ name: 'temperature', points: w.profile.positions.map((p, k) => [p, w.profile.temperatures[k]!] as const) }],
          markers,
          tabulatedIn: LAYER_TABLE,
        },
      },
    ],
  };
}

/** The vent opening area of each air layer that gives one, by its kind (per m of a vertical layer, per m² of a horizontal one). */
function ventOpeningBlocks(input: WallInput, layers: WallAnalysis['wall']['layers']): ReportBlock[] {
  const quantity = ventOpeningQuantity(input.heatFlowDirection);
  const figures: ReportFigure[] = layers.flatMap((l) => {
    const given = input.layers[l.index]!;
    return isAirLayer(given) && given.openingArea !== undefined ? [{ label: `Vent opening area of ${l.name}`, value: given.openingArea, quantity }] : [];
  });
  return figures.length > 0 ? [{ kind: 'figures', figures }] : [];
}

/**
 * Every layer in the picture, counted or not (cladding outside a well ventilated air layer is
 * still there); a face gets the temperature of the counted layer it bounds, none where neither is.
 */
function crossSectionOf(input: WallInput, layers: WallAnalysis['wall']['layers']): ReportCrossSection {
  const last = layers[layers.length - 1]!;
  return {
    title: 'Layers to scale',
    geometry: 'plane',
    layers: layers.map((l) => {
      const given = input.layers[l.index]!;
      return { name: l.name, category: isAirLayer(given) ? 'air-layer' : given.material.category, thickness: l.thickness };
    }),
    temperatures: [...layers.map((l, i) => l.innerTemperature ?? layers[i - 1]?.outerTemperature ?? null), last.outerTemperature],
    tabulatedIn: LAYER_TABLE,
  };
}

function surfaceResistanceSection(input: WallInput, a: WallAnalysis, text: QuantityText): ReportSection {
  const given = input.surfaceResistances !== undefined && input.surfaceResistances !== 'standard';
  const uBasis = given
    ? `R_si = ${text.figure(a.wall.insideSurfaceResistance, 'thermalResistance')} as given in the case`
    : `the ISO 6946 inside surface resistance for ${input.heatFlowDirection} heat flow, R_si = ${text.figure(a.wall.insideSurfaceResistance, 'thermalResistance')}`;
  const mouldSurface = a.mould.insideSurfaceTemperature;
  const design = a.mould.designIndexMould === null ? null : a.mould.conditions[a.mould.designIndexMould]!;
  return {
    id: 'inside-surface-resistance',
    heading: 'Inside surface resistance used by each part',
    blocks: [
      {
        kind: 'paragraphs',
        paragraphs: [
          `The U-value, the layer temperatures and the interstitial condensation check use ${uBasis}.`,
          `The mould and inside-surface condensation checks use R_si = ${text.figure(a.mould.insideSurfaceResistance, 'thermalResistance')}, the larger resistance ISO 13788 sets for opaque elements, which allows for furniture and corners and gives a colder inside surface${mouldSurface !== null && design ? `: ${text.figure(mouldSurface, 'temperature')} ${conditionPhrase(design.label)}` : ''}.`,
        ],
      },
    ],
  };
}

function assumptionsOf(input: WallInput, a: WallAnalysis, text: QuantityText): string[] {
  const v = a.wall.ventilation;
  const ventilated =
    v.rule === 'well-ventilated'
      ? ['The well ventilated air layer and every layer outside it are not counted; the outside surface resistance becomes the inside value for the same direction (ISO 6946 rule).']
      : v.rule === 'slightly-ventilated'
        ? ['The slightly ventilated air layer weights the totals with and without it (ISO 6946 rule); to keep a temperature profile, the part from that layer outwards is scaled by one factor (our modelling choice, no source).']
        : [];
  return [
    'Steady state at each condition: no heat or moisture storage in the layers.',
    a.wall.combinedMethod !== null || a.wall.corrections !== null
      ? 'One-dimensional apart from the bridged layers and corrections stated: no other thermal bridges, fixings or joints.'
      : 'One-dimensional: no thermal bridges, fixings or joints.',
    'Vapour moves by diffusion only: no air leakage, rain or built-in moisture.',
    ...ventilated,
    ...(input.moisture?.insideHumidity?.kind === 'class' ? [] : ['The inside relative humidity as given holds in every month.']),
    ...bridgingAssumptions(input, a.wall, text),
    ...dynamicAssumptions(input, a.wall),
  ].map(asSentence);
}

function sourcesOf(input: WallInput, a: WallAnalysis, text: QuantityText): string[] {
  const iso = saturationFormulas.formulas.find((f) => f.id === 'iso13788')!;
  const humidity = input.moisture?.insideHumidity;
  const hasAirLayer = input.layers.some(isAirLayer);
  const materials = new Set<string>();
  for (const l of input.layers) {
    if (isAirLayer(l)) continue;
    for (const m of [l.material, ...(l.bridges ?? []).map((b) => b.material)]) {
      materials.add(asSentence(`${m.name}: ${m.source && m.source.trim() !== '' ? m.source : 'no source given with the material'}`));
    }
  }
  return [
    `U-value and temperatures: ISO 6946 method, solved as a one-dimensional finite-element problem (${a.solves === 1 ? 'one engine solve' : `${a.solves} engine solves`} for the whole analysis); the U-value rounded to ${moistureParameters.uValueSignificantFigures.value} significant figures as the standard presents it (${moistureParameters.uValueSignificantFigures.label}).`,
    `Surface resistances: ${surfaceResistances.source} (${surfaceResistances.resistances.label}).`,
    ...(hasAirLayer ? [`Air layers: ${airLayers.source} (${airLayers.label}), or its annex formula where a face has a low emissivity.`] : []),
    `Mould and condensation criteria: ${moistureParameters.source}; surface humidity limits, R_si = ${text.given(moistureParameters.mouldCheckInsideSurfaceResistance.value, 'thermalResistance')} and the vapour permeability of still air (${moistureParameters.label}).`,
    `Saturation pressure: ${iso.source} formulas (${iso.label}).`,
    ...(humidity?.kind === 'class' ? [`Internal humidity classes: ${humidityClasses.source} (${humidityClasses.label}).`] : []),
    ...(input.moisture?.climate ? [`Climate ${input.moisture.climate.name}: ${input.moisture.climate.label}.`] : []),
    ...bridgingSources(a.wall, a),
    ...dynamicSources(a.wall),
    ...materials,
  ];
}
