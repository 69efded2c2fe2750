/**
 * A sized run sent back by the app's worker (which sizes off the main thread with this same
 * engine), checked before it is stored: every figure a finite number, every sentence bounded
 * text, the basis and governing criterion ones the engine writes. Stored results are printed in
 * the report and the bill, so nothing unchecked may reach them.
 */
import { InputError } from '../base/input-error.js';
import { isObject } from '../base/field-checks.js';
import { SIZING_CRITERIA } from '../cases/sizing/sizing-options.js';
import type { KeyedSizedRun } from './size-schedule.js';

const MAX_SENTENCE = 2000;
const MAX_KEY = 200_000;
const FIGURES = ['thickness', 'pipeOuterDiameter', 'insulatedOuterDiameter', 'heatLossPerMetre', 'heatLoss', 'bareHeatLoss', 'annualEnergy', 'bareAnnualEnergy', 'surfaceTemperature', 'relativeResidual'] as const;
const VERDICTS = ['pass', 'fail', 'warning', 'not-applicable'];

const text = (value: unknown, max: number) => typeof value === 'string' && value.length <= max;

export function sizedRunFromObject(value: unknown, field: string): KeyedSizedRun {
  const bad = (what: string) => new InputError(field, `${field} is not a sized run as the engine writes one: ${what}.`);
  if (!isObject(value)) throw bad('not an object');
  if (!text(value['reference'], 60) || !text(value['caseKey'], MAX_KEY) || !text(value['reason'], MAX_SENTENCE)) throw bad('reference, caseKey or reason missing or too long');
  if (value['ok'] === false) {
    if (!text(value['column'], 60)) throw bad('column missing');
    return { reference: value['reference'] as string, ok: false, column: value['column'] as string, reason: value['reason'] as string, caseKey: value['caseKey'] as string };
  }
  if (value['ok'] !== true) throw bad('ok is neither true nor false');
  for (const key of FIGURES) if (typeof value[key] !== 'number' || !Number.isFinite(value[key])) throw bad(`${key} is not a finite number`);
  if (!['chosen', 'fixed', 'none-meets'].includes(value['basis'] as string)) throw bad('basis is not chosen, fixed or none-meets');
  if (!(value['governing'] === null || (SIZING_CRITERIA as readonly unknown[]).includes(value['governing']))) throw bad('governing is not a criterion');
  if (typeof value['criteriaMet'] !== 'boolean' || !text(value['material'], 200)) throw bad('criteriaMet or material missing');
  const verdicts = value['verdicts'];
  if (!Array.isArray(verdicts) || verdicts.length > 50 || !verdicts.every((v) => isObject(v) && text(v['check'], 200) && VERDICTS.includes(v['verdict'] as string))) throw bad('verdicts are not a list of checks with their verdicts');
  const picked = Object.fromEntries(['reference', 'ok', 'basis', 'governing', 'reason', 'criteriaMet', 'material', 'caseKey', ...FIGURES].map((k) => [k, value[k]]));
  return { ...picked, verdicts: verdicts.map((v) => ({ check: v['check'], verdict: v['verdict'] })) } as unknown as KeyedSizedRun;
}
