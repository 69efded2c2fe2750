/**
 * The material form's edge: what a person typed (text in each box) to a MaterialInput in SI, and
 * back. Each refusal is one sentence naming the field by its label and giving the allowed range,
 * from the same limits table the storage layer checks (app/api/material-limits.ts).
 */
import type { Material, MaterialCategory, MaterialInput } from '../../../app/api/contract.js';
import { MATERIAL_LIMITS, describeRange, isInRange, type NumberRange } from '../../../app/api/material-limits.js';

export type ConductivityKind = 'constant' | 'polynomial' | 'table';

export interface MaterialDraft {
  name: string;
  category: MaterialCategory;
  conductivityKind: ConductivityKind;
  conductivityValue: string;
  /** Polynomial coefficients a0 a1 a2 ..., separated by spaces. */
  coefficients: string;
  /** Table points written θ:λ, separated by spaces. */
  points: string;
  density: string;
  specificHeat: string;
  vapourTight: boolean;
  vapourResistanceFactor: string;
  equivalentAirLayerThickness: string;
  emissivity: string;
  minServiceTemperature: string;
  maxServiceTemperature: string;
  source: string;
  notes: string;
}

/** The form's field ids; they match the MaterialInput names so a server refusal lands on the right box. */
export type DraftField = keyof MaterialInput | 'coefficients' | 'points';

export interface DraftError {
  readonly field: DraftField;
  readonly message: string;
}

export type DraftReading = { readonly ok: true; readonly input: MaterialInput } | { readonly ok: false; readonly errors: readonly DraftError[] };

export const FIELD_LABELS: Readonly<Record<DraftField, string>> = {
  name: 'Name',
  category: 'Category',
  conductivity: 'Thermal conductivity',
  coefficients: 'Conductivity coefficients',
  points: 'Conductivity points',
  density: 'Density',
  specificHeat: 'Specific heat capacity',
  vapourResistanceFactor: 'Vapour resistance factor μ',
  equivalentAirLayerThickness: 'Equivalent air layer thickness sd',
  emissivity: 'Surface emissivity',
  minServiceTemperature: 'Lowest service temperature',
  maxServiceTemperature: 'Highest service temperature',
  source: 'Source',
  notes: 'Notes',
};

export function emptyDraft(): MaterialDraft {
  return {
    name: '', category: 'insulation', conductivityKind: 'constant', conductivityValue: '', coefficients: '', points: '',
    density: '', specificHeat: '', vapourTight: false, vapourResistanceFactor: '', equivalentAirLayerThickness: '',
    emissivity: '', minServiceTemperature: '', maxServiceTemperature: '', source: '', notes: '',
  };
}

const text = (value: number | null): string => (value === null || !Number.isFinite(value) ? '' : String(value));

export function draftOf(material: Material | MaterialInput): MaterialDraft {
  const k = material.conductivity;
  return {
    name: material.name,
    category: material.category,
    conductivityKind: k.kind,
    conductivityValue: k.kind === 'constant' ? String(k.value) : '',
    coefficients: k.kind === 'polynomial' ? k.coefficients.join(' ') : '',
    points: k.kind === 'table' ? k.points.map(([t, l]) => `${t}:${l}`).join(' ') : '',
    density: text(material.density),
    specificHeat: text(material.specificHeat),
    vapourTight: material.vapourResistanceFactor === Infinity,
    vapourResistanceFactor: text(material.vapourResistanceFactor),
    equivalentAirLayerThickness: text(material.equivalentAirLayerThickness),
    emissivity: text(material.emissivity),
    minServiceTemperature: text(material.minServiceTemperature),
    maxServiceTemperature: text(material.maxServiceTemperature),
    source: material.source,
    notes: material.notes,
  };
}

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/** A typed number, accepting a true minus sign; undefined when it is not a number. */
function parseNumber(raw: string): number | undefined {
  const cleaned = raw.trim().replace('−', '-');
  return NUMBER.test(cleaned) ? Number(cleaned) : undefined;
}

export function readDraft(draft: MaterialDraft): DraftReading {
  const errors: DraftError[] = [];
  const fail = (field: DraftField, message: string) => errors.push({ field, message });

  const rangeMessage = (field: DraftField, range: NumberRange, optional: boolean) =>
    `${FIELD_LABELS[field]} must be ${optional ? 'empty or ' : ''}a number ${describeRange(range)}.`;

  const optionalNumber = (field: DraftField, raw: string, range: NumberRange): number | null => {
    if (raw.trim() === '') return null;
    const value = parseNumber(raw);
    if (value === undefined || !isInRange(value, range)) {
      fail(field, rangeMessage(field, range, true));
      return null;
    }
    return value;
  };

  const name = draft.name.trim();
  if (name.length < 1 || name.length > MATERIAL_LIMITS.name) fail('name', `Name must be 1 to ${MATERIAL_LIMITS.name} characters long.`);

  const conductivity = readConductivity(draft, fail);
  const density = optionalNumber('density', draft.density, MATERIAL_LIMITS.density);
  const specificHeat = optionalNumber('specificHeat', draft.specificHeat, MATERIAL_LIMITS.specificHeat);
  const mu = draft.vapourTight ? Infinity : optionalNumber('vapourResistanceFactor', draft.vapourResistanceFactor, { ...MATERIAL_LIMITS.vapourResistanceFactor, unit: '' });
  const sd = optionalNumber('equivalentAirLayerThickness', draft.equivalentAirLayerThickness, MATERIAL_LIMITS.equivalentAirLayerThickness);
  const emissivity = optionalNumber('emissivity', draft.emissivity, MATERIAL_LIMITS.emissivity);
  const low = optionalNumber('minServiceTemperature', draft.minServiceTemperature, MATERIAL_LIMITS.temperature);
  const high = optionalNumber('maxServiceTemperature', draft.maxServiceTemperature, MATERIAL_LIMITS.temperature);
  if (low !== null && high !== null && low >= high) {
    fail('maxServiceTemperature', `Highest service temperature must be above the lowest service temperature (${low} °C).`);
  }
  if (conductivity?.kind === 'polynomial' && (low === null || high === null) && !errors.some((e) => e.field.endsWith('ServiceTemperature'))) {
    fail('minServiceTemperature', 'Lowest and highest service temperature are both needed for a conductivity curve, which is trusted only inside that range.');
  }
  const source = draft.source.trim();
  if (source.length > MATERIAL_LIMITS.source) fail('source', `Source must be at most ${MATERIAL_LIMITS.source} characters long.`);
  const notes = draft.notes.trim();
  if (notes.length > MATERIAL_LIMITS.notes) fail('notes', `Notes must be at most ${MATERIAL_LIMITS.notes} characters long.`);

  if (errors.length > 0 || !conductivity) return { ok: false, errors };
  return {
    ok: true,
    input: {
      name, category: draft.category, conductivity, density, specificHeat, vapourResistanceFactor: mu,
      equivalentAirLayerThickness: sd, emissivity, minServiceTemperature: low, maxServiceTemperature: high, source, notes,
    },
  };
}

function readConductivity(draft: MaterialDraft, fail: (field: DraftField, message: string) => void): MaterialInput['conductivity'] | undefined {
  const range = MATERIAL_LIMITS.conductivity;
  if (draft.conductivityKind === 'constant') {
    const value = parseNumber(draft.conductivityValue);
    if (value === undefined || !isInRange(value, range)) {
      fail('conductivity', `Thermal conductivity must be a number ${describeRange(range)}.`);
      return undefined;
    }
    return { kind: 'constant', value };
  }
  if (draft.conductivityKind === 'polynomial') {
    const parts = draft.coefficients.trim().split(/\s+/).filter(Boolean);
    const values = parts.map(parseNumber);
    const limit = MATERIAL_LIMITS.polynomialCoefficient;
    if (parts.length < 1 || parts.length > MATERIAL_LIMITS.maxPolynomialTerms || values.some((v) => v === undefined || !isInRange(v, limit))) {
      fail('coefficients', `Conductivity coefficients must be 1 to ${MATERIAL_LIMITS.maxPolynomialTerms} numbers a0 a1 a2 … separated by spaces, each ${describeRange(limit)}.`);
      return undefined;
    }
    return { kind: 'polynomial', coefficients: values as number[] };
  }
  const pairs = draft.points.trim().split(/\s+/).filter(Boolean);
  const points: [number, number][] = [];
  for (const pair of pairs) {
    const [t, k, extra] = pair.split(':');
    const temperature = parseNumber(t ?? '');
    const value = parseNumber(k ?? '');
    if (extra !== undefined || temperature === undefined || value === undefined || !isInRange(temperature, MATERIAL_LIMITS.temperature) || !isInRange(value, range)) {
      fail('points', `Conductivity points must be written temperature:conductivity (e.g. 10:0.035), with conductivity ${describeRange(range)}; "${pair}" is not.`);
      return undefined;
    }
    points.push([temperature, value]);
  }
  if (points.length < 2 || points.length > MATERIAL_LIMITS.maxTablePoints) {
    fail('points', `Conductivity points must list 2 to ${MATERIAL_LIMITS.maxTablePoints} pairs temperature:conductivity separated by spaces.`);
    return undefined;
  }
  for (let i = 1; i < points.length; i++) {
    if (points[i]![0] <= points[i - 1]![0]) {
      fail('points', 'Conductivity points must be listed with strictly increasing temperatures.');
      return undefined;
    }
  }
  return { kind: 'table', points };
}

/** Where a server refusal's field (e.g. "conductivity.points[2]") belongs in the form. */
export function draftFieldOf(serverField: string | undefined): DraftField | undefined {
  if (!serverField) return undefined;
  const head = serverField.split(/[.[ ]/, 1)[0] ?? '';
  if (serverField.startsWith('conductivity.coefficients')) return 'coefficients';
  if (serverField.startsWith('conductivity.points')) return 'points';
  return head in FIELD_LABELS ? (head as DraftField) : undefined;
}
