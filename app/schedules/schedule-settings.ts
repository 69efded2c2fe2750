/**
 * A project's schedule settings checked at every edge (storage, HTTP, IPC, CLI): the condition
 * sets and the services with their criteria, the operating hours and the optional economics. The
 * criteria are checked by the sizing's own parser, so a service can only name criteria a case's
 * sizing block accepts. Refusals are InputErrors naming the field, as everywhere in the engine.
 */
import { InputError } from '../base/input-error.js';
import { isObject, rejectUnknownKeys, requireArray, requireNumberIn, requireObject, requireOneOf, requireString } from '../base/field-checks.js';
import type { NumberRange } from '../base/number-range.js';
import { INPUT_LIMITS } from '../cases/insulated/insulated-inputs.js';
import { parseSizingOptions } from '../cases/sizing/sizing-options.js';
import type { ConditionSet, ScheduleEconomics, ScheduleSettings, ServiceRule } from './schedule-model.js';

/** The allowed range of each number of the settings, in SI; the settings form shows the same. */
export const SCHEDULE_SETTING_RANGES = {
  airTemperature: { min: INPUT_LIMITS.airTemperature[0], max: INPUT_LIMITS.airTemperature[1], unit: '°C', quantity: 'temperature' },
  relativeHumidity: { min: 0, minExclusive: true, max: 1, unit: '' },
  windSpeed: { min: INPUT_LIMITS.windSpeed[0], max: INPUT_LIMITS.windSpeed[1], unit: 'm/s', quantity: 'windSpeed' },
  operatingHours: { min: INPUT_LIMITS.operatingHours[0], max: INPUT_LIMITS.operatingHours[1], unit: 'h' },
  energyPrice: { min: 0, max: 100, unit: 'per kWh' },
  generationEfficiency: { min: 0.05, max: 10, unit: '' },
  emissionFactor: { min: 0, max: 5, unit: 'kg/kWh', quantity: 'emissionFactor' },
} as const satisfies Record<string, NumberRange>;
export const MAX_CURRENCY_LENGTH = 12;
const R = SCHEDULE_SETTING_RANGES;

export const MAX_CONDITION_SETS = 50;
export const MAX_SERVICES = 50;
const MAX_NAME = 80;

const nonEmpty = (value: unknown, field: string, max: number): string => {
  const text = requireString(value, field, max).trim();
  if (text === '') throw new InputError(field, `${field} must not be empty.`);
  return text;
};

function unique(names: readonly string[], field: string): void {
  const seen = new Set<string>();
  names.forEach((name, i) => {
    if (seen.has(name.toLowerCase())) throw new InputError(`${field}[${i}].name`, `${field}[${i}] repeats the name '${name}'; each needs its own.`);
    seen.add(name.toLowerCase());
  });
}

function parseConditionSet(value: unknown, field: string): ConditionSet {
  const set = requireObject(value, field);
  rejectUnknownKeys(set, ['name', 'airTemperature', 'relativeHumidity', 'exposure', 'windSpeed'], field);
  const name = nonEmpty(set['name'], `${field}.name`, MAX_NAME);
  if (name.toLowerCase() === 'indoor' || name.toLowerCase() === 'outdoor') {
    throw new InputError(`${field}.name`, `${field}.name may not be '${name}': a run's location names indoor and outdoor without a set.`);
  }
  const exposure = requireOneOf(`${field}.exposure`, set['exposure'], ['indoor', 'outdoor'] as const);
  return {
    name,
    airTemperature: requireNumberIn(`${field}.airTemperature`, set['airTemperature'], R.airTemperature),
    relativeHumidity: requireNumberIn(`${field}.relativeHumidity`, set['relativeHumidity'], R.relativeHumidity),
    exposure,
    windSpeed: exposure === 'indoor' ? 0 : requireNumberIn(`${field}.windSpeed`, set['windSpeed'], R.windSpeed),
  };
}

function parseService(value: unknown, field: string): ServiceRule {
  const rule = requireObject(value, field);
  rejectUnknownKeys(rule, ['service', 'material', 'criteria'], field);
  const criteria = requireObject(rule['criteria'], `${field}.criteria`);
  try {
    // The criteria as a case's sizing block holds them; a list series stands in for the run's own.
    parseSizingOptions({ layer: 0, series: { kind: 'list', thicknesses: [0.05] }, criteria }, 'pipe', 1);
  } catch (error) {
    if (error instanceof InputError) throw new InputError(`${field}.${error.field.replace(/^sizing\./, '')}`, error.message.replace(/sizing\.criteria/g, `${field}.criteria`));
    throw error;
  }
  if (criteria['economic'] !== undefined) throw new InputError(`${field}.criteria.economic`, `${field}.criteria.economic is not offered for a schedule: its runs are sized to the physical criteria; size a single case for the economic thickness.`);
  return { service: nonEmpty(rule['service'], `${field}.service`, MAX_NAME), material: nonEmpty(rule['material'], `${field}.material`, 200), criteria };
}

function parseEconomics(value: unknown, field: string): ScheduleEconomics | null {
  if (value === null || value === undefined) return null;
  const e = requireObject(value, field);
  rejectUnknownKeys(e, ['energyPrice', 'generationEfficiency', 'emissionFactor', 'currency'], field);
  return {
    energyPrice: requireNumberIn(`${field}.energyPrice`, e['energyPrice'], R.energyPrice),
    generationEfficiency: requireNumberIn(`${field}.generationEfficiency`, e['generationEfficiency'], R.generationEfficiency),
    emissionFactor: requireNumberIn(`${field}.emissionFactor`, e['emissionFactor'], R.emissionFactor),
    currency: requireString(e['currency'], `${field}.currency`, MAX_CURRENCY_LENGTH),
  };
}

export function parseScheduleSettings(value: unknown, field = 'settings'): ScheduleSettings {
  if (!isObject(value)) throw new InputError(field, `${field} must be an object: conditionSets, services, operatingHours and economics.`);
  rejectUnknownKeys(value, ['conditionSets', 'services', 'operatingHours', 'economics', 'source'], field);
  const conditionSets = requireArray(value['conditionSets'], `${field}.conditionSets`, 0, MAX_CONDITION_SETS).map((s, i) => parseConditionSet(s, `${field}.conditionSets[${i}]`));
  unique(conditionSets.map((s) => s.name), `${field}.conditionSets`);
  const services = requireArray(value['services'], `${field}.services`, 0, MAX_SERVICES).map((s, i) => parseService(s, `${field}.services[${i}]`));
  const seen = new Set<string>();
  services.forEach((s, i) => {
    if (seen.has(s.service.toLowerCase())) throw new InputError(`${field}.services[${i}].service`, `${field}.services[${i}] repeats the service '${s.service}'; each needs its own.`);
    seen.add(s.service.toLowerCase());
  });
  return {
    conditionSets,
    services,
    operatingHours: requireNumberIn(`${field}.operatingHours`, value['operatingHours'], R.operatingHours),
    economics: parseEconomics(value['economics'], `${field}.economics`),
  };
}
