/**
 * What the case editor asks, kind by kind, in the order a practitioner works through a job: what
 * it is and how big, what runs inside it, what surrounds it, the build-up (drawn by BuildUpEditor
 * from BUILD_UP_SLOTS), and the checks that matter. Each field names the case-file path it edits
 * (the same path the engine names when it refuses a value), its quantity kind (which decides the
 * unit shown), its allowed range in SI (shown converted in its hint) and the default it starts
 * from. Ranges are the engine's (app/base/quantity-ranges and the schemas in data/schemas).
 * Defaults are common practice, no source.
 */
import type { QuantityName } from '../../../app/base/quantities.js';
import type { NumberRange } from '../../../app/base/number-range.js';
import { QUANTITY_RANGES as R } from '../../../app/base/quantity-ranges.js';
import { PIPE_SIZE_SERIES, type PipeSize } from '../../../app/index.js';
import { DEMO_CLIMATES } from '../../../app/cases/wall/wall-demo-climates.js';
import type { UnitSystem } from '../../../app/base/unit-systems.js';
import { getAt, setAt, type Json } from './case-paths.js';
import { hintValue } from './field-text.js';

export type CaseKindName = 'pipe' | 'flat' | 'wall';

export interface FormContext {
  readonly pipeSizes: readonly PipeSize[];
  /** The project's units, for the values a field's text names (SI when not given). */
  readonly unitSystem?: UnitSystem;
}

export interface NumberField {
  readonly type: 'number';
  readonly path: string;
  readonly label: string;
  readonly quantity: QuantityName;
  readonly range: NumberRange;
  /** SI value a new case or a newly shown field starts from. */
  readonly initial: number;
  /** When set, the field may be left empty; the text says what the engine then takes. */
  readonly whenEmpty?: (doc: Json, context: FormContext) => string;
  readonly shown?: (doc: Json) => boolean;
}

export interface ChoiceField {
  readonly type: 'choice';
  /** The case path the choice writes (the engine names it when it refuses the choice). */
  readonly path: string;
  readonly label: string;
  readonly options: (doc: Json, context: FormContext) => readonly { readonly value: string; readonly label: string }[];
  readonly read: (doc: Json) => string;
  readonly write: (doc: Json, value: string, context: FormContext) => Json;
  readonly shown?: (doc: Json) => boolean;
}

export interface TextField {
  readonly type: 'text';
  readonly path: string;
  readonly label: string;
  readonly maxLength: number;
}

export type FormField = NumberField | ChoiceField | TextField;

export interface FormSection {
  readonly id: string;
  readonly heading: string;
  readonly fields: readonly FormField[];
  /** The build-up editor goes here. */
  readonly buildUp?: boolean;
}

const is = (path: string, value: string) => (doc: Json) => getAt(doc, path) === value;
const text = (value: Json | undefined, fallback: string) => (typeof value === 'string' ? value : fallback);
const optionsOf = (pairs: readonly (readonly [string, string])[]) => () => pairs.map(([value, label]) => ({ value, label }));

/** A choice between whole objects at `path` (a kind and its own fields); switching keeps what the two share. */
function kindChoice(path: string, label: string, pairs: readonly (readonly [string, string])[], make: (kind: string, old: Json | undefined) => Json | undefined, fallback: string): ChoiceField {
  return {
    type: 'choice',
    path: `${path}.kind`,
    label,
    options: optionsOf(pairs),
    read: (doc) => text(getAt(doc, `${path}.kind`), fallback),
    write: (doc, value) => setAt(doc, path, make(value, getAt(doc, path))),
  };
}

/** The case after a choice: unchanged when the choice is what the case already says (its own values are kept). */
export function applyChoice(field: ChoiceField, doc: Json, value: string, context: FormContext): Json {
  return field.read(doc) === value ? doc : field.write(doc, value, context);
}

const TITLE: TextField = { type: 'text', path: 'title', label: 'Title', maxLength: 200 };

const temperatureRange = (min: number, max: number): NumberRange => ({ min, max, unit: '°C' });
const HUMIDITY_OPEN_LOW: NumberRange = { min: 0, minExclusive: true, max: 1, unit: '' };
const HUMIDITY: NumberRange = { min: 0, max: 1, unit: '' };

// ---- pipe and flat: what runs inside, what surrounds the surface, the touch limit ----

function innerFields(surfaceWords: string): FormField[] {
  return [
    kindChoice('inner', 'Inside is given as', [['fluid', 'Fluid temperature and inside film'], ['surface', `Temperature of ${surfaceWords}`]], (kind, old) => {
      const temperature = (old as { temperature?: Json } | undefined)?.temperature ?? 80;
      const coefficient = (old as { coefficient?: Json } | undefined)?.coefficient ?? 1000;
      return kind === 'fluid' ? ({ kind, temperature, coefficient } as Json) : ({ kind, temperature } as Json);
    }, 'fluid'),
    { type: 'number', path: 'inner.temperature', label: 'Fluid or inner-face temperature', quantity: 'temperature', range: temperatureRange(-270, 1000), initial: 80 },
    { type: 'number', path: 'inner.coefficient', label: 'Inside film coefficient', quantity: 'filmCoefficient', range: { min: 0, minExclusive: true, max: 1e6, unit: '' }, initial: 1000, shown: is('inner.kind', 'fluid') },
    { type: 'number', path: 'operatingHours', label: 'Operating hours per year', quantity: 'hours', range: { min: 0, max: 8784, unit: 'h' }, initial: 8760 },
  ];
}

const SURFACE_METHODS = [
  ['correlations', 'Convection correlations and radiation'],
  ['simplified', 'Simplified trade formulas and radiation'],
  ['fixed-convection', 'Given convective coefficient, plus radiation'],
  ['fixed-coefficient', 'Given total surface coefficient'],
  ['fixed-resistance', 'Given surface resistance'],
] as const;

const SURROUNDINGS: readonly FormField[] = [
  kindChoice('ambient.exposure', 'Where it is', [['indoor', 'Indoors, still air'], ['outdoor', 'Outdoors, in wind']], (kind): Json => (kind === 'outdoor' ? { kind, windSpeed: 4 } : { kind }), 'indoor'),
  { type: 'number', path: 'ambient.exposure.windSpeed', label: 'Wind speed', quantity: 'windSpeed', range: { min: 0, max: 60, unit: 'm/s' }, initial: 4, shown: is('ambient.exposure.kind', 'outdoor') },
  { type: 'number', path: 'ambient.airTemperature', label: 'Air temperature', quantity: 'temperature', range: temperatureRange(-100, 200), initial: 20 },
  {
    type: 'number', path: 'ambient.surroundingsTemperature', label: 'Radiant temperature of the surroundings', quantity: 'temperature', range: temperatureRange(-100, 200), initial: 20,
    whenEmpty: () => 'the air temperature',
  },
  { type: 'number', path: 'ambient.relativeHumidity', label: 'Relative humidity of the air', quantity: 'relativeHumidity', range: HUMIDITY_OPEN_LOW, initial: 0.6 },
  {
    type: 'choice', path: 'surfaceMethod.kind', label: 'Outer surface coefficient from', options: optionsOf(SURFACE_METHODS),
    read: (doc) => text(getAt(doc, 'surfaceMethod.kind'), 'correlations'),
    write: (doc, kind) => {
      if (kind === 'correlations') return setAt(doc, 'surfaceMethod', undefined);
      if (kind === 'simplified') return setAt(doc, 'surfaceMethod', { kind });
      if (kind === 'fixed-resistance') return setAt(doc, 'surfaceMethod', { kind, resistance: 0.1 });
      return setAt(doc, 'surfaceMethod', { kind, coefficient: kind === 'fixed-convection' ? 3 : 10 });
    },
  },
  { type: 'number', path: 'surfaceMethod.coefficient', label: 'Convective coefficient', quantity: 'filmCoefficient', range: { min: 0, max: 1e4, unit: '' }, initial: 3, shown: is('surfaceMethod.kind', 'fixed-convection') },
  { type: 'number', path: 'surfaceMethod.coefficient', label: 'Total surface coefficient', quantity: 'filmCoefficient', range: { min: 0, minExclusive: true, max: 1e4, unit: '' }, initial: 10, shown: is('surfaceMethod.kind', 'fixed-coefficient') },
  { type: 'number', path: 'surfaceMethod.resistance', label: 'Surface resistance', quantity: 'thermalResistance', range: { min: 0, minExclusive: true, max: 100, unit: '' }, initial: 0.1, shown: is('surfaceMethod.kind', 'fixed-resistance') },
];

/** The touch limit's default: 60 °C (the engine's own, common practice, no source). */
const TOUCH_LIMIT: NumberField = {
  type: 'number', path: 'touchLimit', label: 'Highest surface temperature safe to touch', quantity: 'temperature', range: temperatureRange(0, 100), initial: 60,
  whenEmpty: (_doc, context) => hintValue(60, 'temperature', context.unitSystem ?? 'SI'),
};

// ---- pipe size ----

const SERIES_LABELS: Record<(typeof PIPE_SIZE_SERIES)[number], string> = {
  'steel-iso': 'Steel, DN sizes (ISO 4200 / EN 10220)',
  'steel-asme': 'Steel, NPS sizes (ASME B36.10M, Schedule 40)',
  'copper-en1057': 'Copper tube, metric (EN 1057)',
  'copper-astm-b88': 'Copper tube, inch (ASTM B88)',
  'plastic-metric': 'Plastic pipe, metric outside diameter',
};

/** A size as the trade names it: "DN100", "NPS 6", "15 mm" copper or plastic by outside diameter, "1/2 in" copper tube. */
function nominalWords(size: PipeSize): string {
  if (size.series === 'steel-iso') return /^\d/.test(size.nominal) ? `DN${size.nominal}` : size.nominal;
  if (size.series === 'steel-asme') return `NPS ${size.nominal}`;
  if (size.series === 'copper-astm-b88') return `${size.nominal} in`;
  return `${size.nominal} mm`;
}

export function sizeInTable(doc: Json, context: FormContext): PipeSize | undefined {
  const series = getAt(doc, 'pipe.size.series');
  const nominal = String(getAt(doc, 'pipe.size.nominal') ?? '');
  return context.pipeSizes.find((s) => s.series === series && (s.nominal === nominal || s.nominal === `DN${nominal}`));
}

const inTable = (doc: Json) => getAt(doc, 'pipe.size') !== undefined;

const PIPE_SIZE: readonly FormField[] = [
  {
    type: 'choice', path: 'pipe.size', label: 'Pipe size', options: optionsOf([['table', 'From the size tables'], ['custom', 'Custom outside diameter and wall']]),
    read: (doc) => (inTable(doc) ? 'table' : 'custom'),
    write: (doc, mode, context) => {
      if (mode === 'custom') {
        const size = sizeInTable(doc, context);
        let next = setAt(doc, 'pipe.size', undefined);
        next = setAt(next, 'pipe.outerDiameter', size?.outerDiameter ?? 0.1143);
        return getAt(next, 'pipe.wallThickness') === undefined ? setAt(next, 'pipe.wallThickness', size?.wallThickness ?? 0.0036) : next;
      }
      let next = setAt(doc, 'pipe.outerDiameter', undefined);
      next = setAt(next, 'pipe.wallThickness', undefined);
      return setAt(next, 'pipe.size', { series: 'steel-iso', nominal: 'DN100' });
    },
  },
  {
    type: 'choice', path: 'pipe.size.series', label: 'Size table', shown: inTable,
    options: () => PIPE_SIZE_SERIES.map((value) => ({ value, label: SERIES_LABELS[value] })),
    read: (doc) => text(getAt(doc, 'pipe.size.series'), 'steel-iso'),
    write: (doc, series, context) => {
      const first = context.pipeSizes.find((s) => s.series === series);
      const next = setAt(doc, 'pipe.size', { series, nominal: first?.nominal ?? '' });
      // Tube tables give no wall: keep the one typed, or start from 1 mm (common practice, no source).
      return first && first.wallThickness === null && getAt(next, 'pipe.wallThickness') === undefined ? setAt(next, 'pipe.wallThickness', 0.001) : next;
    },
  },
  {
    type: 'choice', path: 'pipe.size.nominal', label: 'Nominal size', shown: inTable,
    options: (doc, context) => {
      const series = getAt(doc, 'pipe.size.series');
      return context.pipeSizes.filter((s) => s.series === series).map((s) => ({ value: s.nominal, label: nominalWords(s) }));
    },
    read: (doc) => {
      const nominal = String(getAt(doc, 'pipe.size.nominal') ?? '');
      return getAt(doc, 'pipe.size.series') === 'steel-iso' && /^\d/.test(nominal) ? `DN${nominal}` : nominal;
    },
    write: (doc, nominal) => setAt(doc, 'pipe.size.nominal', nominal),
  },
  { type: 'number', path: 'pipe.outerDiameter', label: 'Outside diameter of the pipe', quantity: 'diameter', range: { min: 0, minExclusive: true, max: 5, unit: 'm' }, initial: 0.1143, shown: (doc) => !inTable(doc) },
  {
    type: 'number', path: 'pipe.wallThickness', label: 'Pipe wall thickness', quantity: 'thickness', range: R.pipeWallThickness, initial: 0.0036,
    whenEmpty: (doc, context) => {
      const wall = sizeInTable(doc, context)?.wallThickness;
      return inTable(doc) && wall != null ? 'the wall in the table' : 'a wall (the tube tables give none)';
    },
  },
  { type: 'number', path: 'length', label: 'Length of the run', quantity: 'length', range: { min: 0, minExclusive: true, max: 1e6, unit: 'm' }, initial: 10 },
  {
    type: 'choice', path: 'orientation', label: 'The pipe runs', options: optionsOf([['horizontal', 'Horizontally'], ['vertical', 'Vertically']]),
    read: (doc) => text(getAt(doc, 'orientation'), 'horizontal'),
    write: (doc, value) => setAt(value === 'horizontal' ? setAt(doc, 'height', undefined) : doc, 'orientation', value),
  },
  { type: 'number', path: 'height', label: 'Height the air rises along', quantity: 'length', range: R.pipeHeight, initial: 3, shown: is('orientation', 'vertical'), whenEmpty: (_doc, context) => `the run length, at most ${hintValue(3, 'length', context.unitSystem ?? 'SI')}` },
];

// ---- flat surface ----

const FLAT_SIZE: readonly FormField[] = [
  { type: 'number', path: 'area', label: 'Surface area', quantity: 'area', range: R.area, initial: 10 },
  kindChoice('surface', 'The outer face is', [['vertical', 'Vertical'], ['horizontal', 'Horizontal']], (kind): Json => (kind === 'vertical' ? { kind, height: 2 } : { kind, facing: 'up', characteristicLength: 1 }), 'vertical'),
  { type: 'number', path: 'surface.height', label: 'Height of the face', quantity: 'length', range: R.surfaceLength, initial: 2, shown: is('surface.kind', 'vertical') },
  {
    type: 'choice', path: 'surface.facing', label: 'The face looks', shown: is('surface.kind', 'horizontal'), options: optionsOf([['up', 'Up'], ['down', 'Down']]),
    read: (doc) => text(getAt(doc, 'surface.facing'), 'up'),
    write: (doc, value) => setAt(doc, 'surface.facing', value),
  },
  { type: 'number', path: 'surface.characteristicLength', label: 'Area over perimeter of the face', quantity: 'length', range: R.surfaceLength, initial: 1, shown: is('surface.kind', 'horizontal') },
];

// ---- wall or roof ----

const WALL_SIZE: readonly FormField[] = [
  {
    type: 'choice', path: 'heatFlowDirection', label: 'This element is',
    options: optionsOf([['horizontal', 'A wall (heat flows sideways)'], ['upward', 'A roof or ceiling (heat flows up)'], ['downward', 'A floor (heat flows down)']]),
    read: (doc) => text(getAt(doc, 'heatFlowDirection'), 'horizontal'),
    write: (doc, value) => setAt(doc, 'heatFlowDirection', value),
  },
  { type: 'number', path: 'area', label: 'Area of the element', quantity: 'area', range: R.area, initial: 1, whenEmpty: (_doc, context) => hintValue(1, 'area', context.unitSystem ?? 'SI') },
];

const humidityKind = (doc: Json) => text(getAt(doc, 'moisture.insideHumidity.kind'), 'measured');

const WALL_INSIDE: readonly FormField[] = [
  { type: 'number', path: 'inside.temperature', label: 'Inside air temperature', quantity: 'temperature', range: temperatureRange(-100, 100), initial: 20 },
  { type: 'number', path: 'inside.relativeHumidity', label: 'Inside relative humidity', quantity: 'relativeHumidity', range: HUMIDITY, initial: 0.5 },
  {
    type: 'choice', path: 'moisture.insideHumidity.kind', label: 'Inside humidity over the year', options: optionsOf([['measured', 'As measured (the humidity above)'], ['class', 'From a humidity class of the building']]),
    read: humidityKind,
    write: (doc, kind) => setAt(doc, 'moisture.insideHumidity', kind === 'class' ? { kind, humidityClass: 3 } : { kind }),
  },
  {
    type: 'choice', path: 'moisture.insideHumidity.humidityClass', label: 'Humidity class', shown: (doc) => humidityKind(doc) === 'class',
    options: optionsOf([['1', '1: storage, little moisture'], ['2', '2: offices, shops'], ['3', '3: dwellings with low occupancy'], ['4', '4: dwellings with high occupancy, kitchens'], ['5', '5: special buildings (laundries, pools)']]),
    read: (doc) => String(getAt(doc, 'moisture.insideHumidity.humidityClass') ?? 3),
    write: (doc, value) => setAt(doc, 'moisture.insideHumidity.humidityClass', Number(value)),
  },
  {
    type: 'choice', path: 'moisture.insideHumidity.safetyFactor', label: 'Margin on the moisture excess', shown: (doc) => humidityKind(doc) === 'class',
    options: optionsOf([['no', 'None'], ['yes', 'Add 10 % to the vapour pressure excess']]),
    read: (doc) => (getAt(doc, 'moisture.insideHumidity.safetyFactor') === true ? 'yes' : 'no'),
    write: (doc, value) => setAt(doc, 'moisture.insideHumidity.safetyFactor', value === 'yes' ? true : undefined),
  },
];

const givenResistances = (doc: Json) => typeof getAt(doc, 'surfaceResistances') === 'object';

const WALL_OUTSIDE: readonly FormField[] = [
  { type: 'number', path: 'outside.temperature', label: 'Outside air temperature', quantity: 'temperature', range: temperatureRange(-100, 100), initial: -5 },
  { type: 'number', path: 'outside.relativeHumidity', label: 'Outside relative humidity', quantity: 'relativeHumidity', range: HUMIDITY, initial: 0.85 },
  {
    type: 'choice', path: 'surfaceResistances', label: 'Surface resistances', options: optionsOf([['standard', 'Standard values for the heat-flow direction'], ['given', 'Given values']]),
    read: (doc) => (givenResistances(doc) ? 'given' : 'standard'),
    write: (doc, value) => setAt(doc, 'surfaceResistances', value === 'given' ? { inside: 0.13, outside: 0.04 } : undefined),
  },
  { type: 'number', path: 'surfaceResistances.inside', label: 'Inside surface resistance', quantity: 'thermalResistance', range: R.surfaceResistance, initial: 0.13, shown: givenResistances },
  { type: 'number', path: 'surfaceResistances.outside', label: 'Outside surface resistance', quantity: 'thermalResistance', range: R.surfaceResistance, initial: 0.04, shown: givenResistances },
];

/** The shipped climate's title as its file gives it ("DEMO cold inland climate (invented)"). */
function climateTitle(climate: (typeof DEMO_CLIMATES)[number]): string {
  const title = (climate as { title?: unknown }).title;
  return typeof title === 'string' ? title : (climate.name ?? 'Shipped climate');
}

const WALL_CHECKS: readonly FormField[] = [
  {
    type: 'choice', path: 'moisture.climate', label: 'Climate for the monthly moisture check',
    options: (doc) => [
      { value: 'none', label: 'No monthly check' },
      ...DEMO_CLIMATES.map((c) => ({ value: c.name ?? '', label: climateTitle(c) })),
      ...(typeof getAt(doc, 'moisture.climate') === 'object' ? [{ value: 'file', label: 'The climate written in this case file' }] : []),
    ],
    read: (doc) => {
      const climate = getAt(doc, 'moisture.climate');
      return typeof climate === 'string' ? climate : climate && typeof climate === 'object' ? 'file' : 'none';
    },
    write: (doc, value) => (value === 'file' ? doc : setAt(doc, 'moisture.climate', value === 'none' ? undefined : value)),
  },
];

export function formSections(kind: CaseKindName): readonly FormSection[] {
  if (kind === 'wall') {
    return [
      { id: 'what', heading: 'What it is', fields: [TITLE, ...WALL_SIZE] },
      { id: 'inside', heading: 'Inside climate', fields: WALL_INSIDE },
      { id: 'outside', heading: 'Outside', fields: WALL_OUTSIDE },
      { id: 'build-up', heading: 'Build-up, inside to outside', fields: [], buildUp: true },
      { id: 'checks', heading: 'Checks', fields: WALL_CHECKS },
    ];
  }
  const pipe = kind === 'pipe';
  return [
    { id: 'what', heading: pipe ? 'The pipe and its size' : 'The surface and its size', fields: [TITLE, ...(pipe ? PIPE_SIZE : FLAT_SIZE)] },
    { id: 'operating', heading: 'Operating conditions', fields: innerFields(pipe ? "the pipe's inner face" : 'the inner face') },
    { id: 'surroundings', heading: 'Surroundings', fields: SURROUNDINGS },
    { id: 'build-up', heading: 'Build-up, inside to outside', fields: [], buildUp: true },
    { id: 'checks', heading: 'Checks', fields: [TOUCH_LIMIT] },
  ];
}

/** The fields shown now for a case, in form order. */
export function shownFields(kind: CaseKindName, doc: Json): FormField[] {
  return formSections(kind).flatMap((s) => s.fields.filter((f) => f.type === 'text' || !f.shown || f.shown(doc)));
}
