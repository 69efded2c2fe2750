/**
 * The report of a raw conduction case (layers and face conditions written out directly), steady
 * or transient. Layers and faces are named by what they are: on a pipe (axisymmetric) the faces
 * are the inside and outside surfaces; in a plane build-up the file does not say which side is
 * inside (the cold-store example starts at the warm outside face), so the faces are the exposed
 * faces of the first and last layers, the first at x = 0. Unnamed layers are "layer 1", "layer 2".
 */
import { exactLayerProfile } from '../../fe/exact-layer-profile.js';
import { numberAsGiven } from '../../base/number-text.js';
import type { QuantityName } from '../../base/quantities.js';
import type { FaceCondition, SteadyProblem, TransientProblem } from '../../fe/problem.js';
import type { SteadyResult, TransientResult } from '../../fe/result.js';
import { SI_TEXT, type QuantityText } from '../../base/quantity-text.js';
import { asSentence } from '../../report/as-sentence.js';
import { GENERAL_CAUTION } from '../../report/general-caution.js';
import { areaUnitSymbol, lengthUnitWord } from '../../report/unit-words.js';
import type { CaseReport, ReportCell, ReportFigure, ReportSection, ReportTable } from '../../report/report-model.js';

interface Naming {
  readonly layers: readonly string[];
  readonly inner: string;
  readonly outer: string;
  readonly axisymmetric: boolean;
  /** Label of a position: "radius" or "x". */
  readonly position: string;
  readonly flow: QuantityName;
  readonly energy: QuantityName;
  readonly resistance: QuantityName;
}

function namingOf(problem: SteadyProblem): Naming {
  const layers = problem.layers.map((l, i) => l.name ?? `layer ${i + 1}`);
  const first = layers[0]!;
  const last = layers[layers.length - 1]!;
  const axisymmetric = problem.geometry.kind === 'axisymmetric';
  return {
    layers,
    inner: axisymmetric ? `inside surface of ${first}` : `exposed face of ${first} (x = 0)`,
    outer: axisymmetric ? `outside surface of ${last}` : `exposed face of ${last}`,
    axisymmetric,
    position: axisymmetric ? 'radius' : 'x',
    flow: axisymmetric ? 'heatFlowPerLength' : 'heatFlux',
    energy: axisymmetric ? 'energyPerLength' : 'energyPerArea',
    resistance: axisymmetric ? 'linearThermalResistance' : 'thermalResistance',
  };
}

export function conductionReport(
  title: string,
  problem: SteadyProblem | TransientProblem,
  analysis: 'steady' | 'transient',
  result: SteadyResult | TransientResult,
  warnings: readonly string[],
  text: QuantityText = SI_TEXT,
): CaseReport {
  const naming = namingOf(problem);
  return analysis === 'steady'
    ? steadyReport(title, problem, result as SteadyResult, warnings, naming, text)
    : transientReport(title, problem as TransientProblem, result as TransientResult, warnings, naming, text);
}

function subjectOf(problem: SteadyProblem, naming: Naming, analysis: string, text: QuantityText): string {
  const count = problem.layers.length === 1 ? 'one layer' : `${problem.layers.length} layers`;
  const geometry =
    problem.geometry.kind === 'axisymmetric'
      ? `cylindrical (a pipe or tube), per ${lengthUnitWord(text)}, inner radius ${text.figure(problem.geometry.innerRadius, 'position')}`
      : `plane, per ${areaUnitSymbol(text)}`;
  return `${analysis} conduction through ${count} (${naming.layers.join(', ')}); ${geometry}.`;
}

function describeFace(face: string, condition: FaceCondition, text: QuantityText): string {
  switch (condition.kind) {
    case 'temperature':
      return `The ${face} is held at ${text.figure(condition.temperature, 'temperature')}.`;
    case 'flux':
      return `A heat flux of ${text.figure(condition.flux, 'heatFlux')} enters through the ${face}.`;
    case 'film':
      return typeof condition.coefficient === 'number'
        ? `The ${face} exchanges heat through a film of ${text.figure(condition.coefficient, 'filmCoefficient')} with surroundings at ${text.figure(condition.ambient, 'temperature')}.`
        : `The ${face} exchanges heat with surroundings at ${text.figure(condition.ambient, 'temperature')} through a film whose coefficient depends on the surface temperature.`;
  }
}

function conditionsSection(problem: SteadyProblem, naming: Naming, text: QuantityText): ReportSection {
  return {
    id: 'conditions',
    heading: 'Face conditions',
    blocks: [{ kind: 'paragraphs', paragraphs: [describeFace(naming.inner, problem.inner, text), describeFace(naming.outer, problem.outer, text)] }],
  };
}

function sourcesOf(problem: SteadyProblem, result: SteadyResult | TransientResult, solves: string): string[] {
  const order = result.mesh.order === 2 ? 'quadratic' : 'linear';
  return [
    `Method: one-dimensional finite elements (${order}, ${result.mesh.nodeCount} nodes), ${solves}; face heat flows recovered from the rows of the fixed faces, and the energy balance closed from them.`,
    `Layers, conductivities${problem.layers.some((l) => l.density !== undefined) ? ', densities, specific heats' : ''} and face conditions as given in the case file.`,
  ];
}

const ASSUMPTIONS = [
  'One-dimensional conduction: no heat flows along the layers.',
  'Layers in perfect thermal contact except where the case gives a contact resistance.',
  'A conductivity that depends on temperature is evaluated at the local temperature.',
];

/** Points to draw: each layer's exact profile where no layer generates heat (exact-layer-profile.ts), else the nodal values. */
function steadyProfile(problem: SteadyProblem, r: SteadyResult): (readonly [number, number])[] {
  if (problem.layers.some((l) => (l.heatGeneration ?? 0) !== 0)) return r.positions.map((x, k) => [x, r.temperatures[k]!] as const);
  return r.layers.flatMap((l, i) => {
    const inside = exactLayerProfile(problem.geometry.kind, problem.layers[i]!.conductivity, l.innerPosition, l.outerPosition, l.innerTemperature, l.outerTemperature, 12);
    return i === 0 ? inside : inside.slice(1);
  });
}

function steadyReport(title: string, problem: SteadyProblem, r: SteadyResult, warnings: readonly string[], naming: Naming, text: QuantityText): CaseReport {
  const q = r.faces.inner.heatIn;
  const generated = r.balance.generated !== 0;
  const [from, to] = q >= 0 ? [naming.inner, naming.outer] : [naming.outer, naming.inner];
  const keyFigures: ReportFigure[] = [
    ...(generated
      ? [
          { label: `Heat entering through the ${naming.inner}`, value: r.faces.inner.heatIn, quantity: naming.flow },
          { label: `Heat entering through the ${naming.outer}`, value: r.faces.outer.heatIn, quantity: naming.flow },
          { label: 'Heat generated in the layers', value: r.balance.generated, quantity: naming.flow },
        ]
      : [{ label: 'Heat flow through the layers', value: Math.abs(q), quantity: naming.flow, note: `from the ${from} to the ${to}` }]),
    { label: `Temperature of the ${naming.inner}`, value: r.faces.inner.temperature, quantity: 'temperature' },
    { label: `Temperature of the ${naming.outer}`, value: r.faces.outer.temperature, quantity: 'temperature' },
  ];
  const temperatures = steadyTemperatureTable(r, naming);
  const layers: ReportTable = {
    title: 'Layers, in order from the ' + naming.inner,
    columns: [
      { label: 'Layer' },
      { label: 'Thickness', quantity: 'thickness' },
      { label: 'λ at mean temperature', quantity: 'conductivity' },
      { label: 'Mean temperature', quantity: 'temperature' },
      { label: 'Thermal resistance', quantity: naming.resistance },
    ],
    rows: r.layers.map((l, i) => [
      naming.layers[i]!,
      { value: problem.layers[i]!.thickness, quantity: 'thickness' },
      { value: l.conductivityAtMeanTemperature, quantity: 'conductivity' },
      { value: l.meanTemperature, quantity: 'temperature' },
      { value: l.thermalResistance ?? null, quantity: naming.resistance },
    ]),
  };
  return {
    kind: 'conduction',
    title,
    subject: asSentence(subjectOf(problem, naming, 'steady', text)),
    keyFigures,
    verdicts: [],
    sections: [
      conditionsSection(problem, naming, text),
      { id: 'layers', heading: 'Layers', blocks: [{ kind: 'table', table: layers }] },
      {
        id: 'temperatures',
        heading: 'Temperatures and heat flows',
        blocks: [
          { kind: 'table', table: temperatures },
          {
            kind: 'paragraphs',
            paragraphs: [`Heat flows are positive from the ${naming.inner} towards the ${naming.outer}.`],
          },
          {
            kind: 'chart',
            chart: {
              title: 'Temperature through the layers',
              x: { label: naming.position, quantity: 'position' },
              y: { label: 'temperature', quantity: 'temperature' },
              series: [{ name: 'temperature', points: steadyProfile(problem, r) }],
              markers: r.interfaces.map((f) => ({ x: f.position, label: `between ${naming.layers[f.index]} and ${naming.layers[f.index + 1]}` })),
              tabulatedIn: temperatures.title,
            },
          },
        ],
      },
    ],
    energyBalance: { residual: r.balance.residual, relativeResidual: r.balance.relativeResidual, quantity: naming.flow },
    assumptions: ASSUMPTIONS,
    warnings: warnings.map(asSentence),
    sources: sourcesOf(problem, r, r.iterations === 1 ? 'one linear solve' : `${r.iterations} iterations to convergence`),
    cautions: [GENERAL_CAUTION],
  };
}

function steadyTemperatureTable(r: SteadyResult, naming: Naming): ReportTable {
  const row = (where: string, position: number, temperature: number, flow: number): ReportCell[] => [
    where,
    { value: position, quantity: 'position' },
    { value: temperature, quantity: 'temperature' },
    { value: flow, quantity: naming.flow },
  ];
  return {
    title: 'Temperatures at the faces and between the layers',
    columns: [
      { label: 'Where' },
      { label: naming.axisymmetric ? 'Radius' : 'x', quantity: 'position' },
      { label: 'Temperature', quantity: 'temperature' },
      { label: 'Heat flow', quantity: naming.flow },
    ],
    rows: [
      row(naming.inner, r.faces.inner.position, r.faces.inner.temperature, r.faces.inner.heatIn),
      ...r.interfaces.flatMap((f) => {
        const between = `between ${naming.layers[f.index]} and ${naming.layers[f.index + 1]}`;
        return f.contactResistance > 0
          ? [
              row(`${between}, on the ${naming.layers[f.index]} side`, f.position, f.temperatureInnerSide, f.heatFlow),
              row(`${between}, on the ${naming.layers[f.index + 1]} side`, f.position, f.temperatureOuterSide, f.heatFlow),
            ]
          : [row(between, f.position, f.temperatureInnerSide, f.heatFlow)];
      }),
      row(naming.outer, r.faces.outer.position, r.faces.outer.temperature, -r.faces.outer.heatIn),
    ],
  };
}

/** The unit elapsed times read best in for a run of this length. */
function timeQuantity(duration: number): QuantityName {
  return duration >= 7200 ? 'timeHours' : duration >= 120 ? 'timeMinutes' : 'time';
}

function transientReport(title: string, problem: TransientProblem, r: TransientResult, warnings: readonly string[], naming: Naming, text: QuantityText): CaseReport {
  const last = r.times.length - 1;
  const sampled = [...new Set([0, Math.round(last / 4), Math.round(last / 2), Math.round((3 * last) / 4), last])];
  const duration = r.times[last]!;
  const time = timeQuantity(duration);
  const at = (s: number) => `at ${text.figure(r.times[s]!, time)}`;
  const places = placesOf(problem, r, naming);
  const temperatures: ReportTable = {
    title: 'Temperatures at the sampled times',
    columns: [{ label: 'Where' }, ...sampled.map((s) => ({ label: at(s), quantity: 'temperature' as const }))],
    rows: places.map((p) => [p.name, ...sampled.map((s) => ({ value: r.temperatures[s]![p.node]!, quantity: 'temperature' as const }))]),
  };
  const heat: ReportTable = {
    title: 'Heat entering through the faces, averaged over the time step ending at each time',
    columns: [{ label: 'Face' }, ...sampled.map((s) => ({ label: at(s), quantity: naming.flow }))],
    rows: (['inner', 'outer'] as const).map((face) => [
      face === 'inner' ? naming.inner : naming.outer,
      ...sampled.map((s) => ({ value: s === 0 ? null : r.heatIn[face][s - 1]!, quantity: naming.flow })),
    ]),
  };
  const n = r.positions.length - 1;
  const scheme = problem.scheme ?? 'crank-nicolson';
  const keyFigures: ReportFigure[] = [
    { label: 'Duration of the run', value: duration, quantity: time },
    { label: `Temperature of the ${naming.inner} at the end`, value: r.temperatures[last]![0]!, quantity: 'temperature' },
    { label: `Temperature of the ${naming.outer} at the end`, value: r.temperatures[last]![n]!, quantity: 'temperature' },
    { label: `Heat ${r.balance.stored >= 0 ? 'taken up' : 'given up'} by the layers over the run`, value: Math.abs(r.balance.stored), quantity: naming.energy },
  ];
  return {
    kind: 'conduction',
    title,
    subject: asSentence(
      `${subjectOf(problem, naming, 'transient', text).replace(/\.$/, '')}; from a uniform ${text.figure(problem.initialTemperature as number, 'temperature')} over ${text.figure(duration, time)} in steps of ${numberAsGiven(problem.timeStep)} s`,
    ),
    keyFigures,
    verdicts: [],
    sections: [
      conditionsSection(problem, naming, text),
      {
        id: 'temperatures',
        heading: 'Temperatures over time',
        blocks: [
          { kind: 'table', table: temperatures },
          {
            kind: 'chart',
            chart: {
              title: 'Temperature through the layers at the sampled times',
              x: { label: naming.position, quantity: 'position' },
              y: { label: 'temperature', quantity: 'temperature' },
              series: sampled.map((s) => ({ name: at(s), points: r.positions.map((x, k) => [x, r.temperatures[s]![k]!] as const) })),
              markers: places.slice(1, -1).map((p) => ({ x: r.positions[p.node]!, label: p.name })),
              tabulatedIn: temperatures.title,
            },
          },
        ],
      },
      { id: 'heat-flows', heading: 'Heat flows over time', blocks: [{ kind: 'table', table: heat }] },
      {
        id: 'stored-heat',
        heading: 'Stored heat',
        blocks: [
          {
            kind: 'figures',
            figures: [
              { label: 'Heat stored in the layers (end minus start)', value: r.balance.stored, quantity: naming.energy },
              { label: 'Net heat in through the faces, over the run', value: r.balance.netIn, quantity: naming.energy },
              { label: 'Difference (the energy balance residual)', value: r.balance.residual, quantity: naming.energy },
            ],
          },
        ],
      },
    ],
    energyBalance: { residual: r.balance.residual, relativeResidual: r.balance.relativeResidual, quantity: naming.energy },
    assumptions: [...ASSUMPTIONS, `The whole build-up starts at a uniform ${text.figure(problem.initialTemperature as number, 'temperature')}.`],
    warnings: warnings.map(asSentence),
    sources: sourcesOf(
      problem,
      r,
      `${scheme === 'crank-nicolson' ? 'Crank–Nicolson time steps (the first one damped)' : 'backward Euler time steps'}, at most ${r.maxIterations === 1 ? 'one iteration' : `${r.maxIterations} iterations`} a step`,
    ),
    cautions: [GENERAL_CAUTION],
  };
}

/** The faces and interfaces, each with the mesh node that sits on it. */
function placesOf(problem: SteadyProblem, r: TransientResult, naming: Naming): { name: string; node: number }[] {
  const nearest = (x: number) => r.positions.reduce((best, p, k) => (Math.abs(p - x) < Math.abs(r.positions[best]! - x) ? k : best), 0);
  let position = r.positions[0]!;
  const interfaces = problem.layers.slice(0, -1).map((layer, i) => {
    position += layer.thickness;
    return { name: `between ${naming.layers[i]} and ${naming.layers[i + 1]}`, node: nearest(position) };
  });
  return [{ name: naming.inner, node: 0 }, ...interfaces, { name: naming.outer, node: r.positions.length - 1 }];
}
