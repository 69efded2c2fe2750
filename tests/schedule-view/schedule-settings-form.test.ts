/**
 * The schedule settings form's pure half: the shipped defaults read into boxes and back unchanged,
 * entries added with names of their own, renamed and removed, criteria switched with what was
 * typed kept, box texts read in the project's units (°F and % converted at the edge), a bad box
 * named by its path with its own sentence, and a refusal of the Node side placed at its box.
 * Conversions: 1 °F = 5/9 K, 32 °F = 0 °C (exact, by definition of the Fahrenheit scale).
 */
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseScheduleSettings } from '../../app/schedules/schedule-settings.js';
import type { ScheduleRun } from '../../app/schedules/schedule-model.js';
import {
  addConditionSet, addService, boxId, boxOfRefusal, draftOf, editConditionSet, editService, freshName, namesLeftBehind, readDraft, removeConditionSet,
  refusalInWords, removeService, shownPaths, switchCriterion, typeCriterion,
} from '../../renderer/src/schedule/schedule-settings-form.js';

const defaults = parseScheduleSettings(JSON.parse(fs.readFileSync(path.join(import.meta.dirname, '..', '..', 'data', 'schedules', 'schedule-defaults.json'), 'utf8')));
const read = (draft: ReturnType<typeof draftOf>, system: 'SI' | 'IP' = 'SI') => {
  const r = readDraft(draft, system);
  if (!r.ok) throw new Error(`unexpected errors: ${[...r.errors].join('; ')}`);
  return r.settings;
};

describe('the schedule settings form', () => {
  it('reads the shipped settings into boxes and back unchanged, in SI and in US customary units', () => {
    expect(read(draftOf(defaults, 'SI'))).toEqual(defaults);
    expect(read(draftOf(defaults, 'IP'), 'IP')).toEqual(defaults);
    // 25 °C shows as 77 °F and 50 % stays 50 % (exact: 25 × 9/5 + 32 = 77).
    const ip = draftOf(defaults, 'IP');
    expect(ip.conditionSets[0]!.texts).toMatchObject({ airTemperature: '77', relativeHumidity: '50' });
    expect(ip.operatingHours).toBe('8760');
  });

  it('adds condition sets and services under names not yet taken, and renames and removes them', () => {
    expect(freshName('New surroundings', ['new surroundings', 'New surroundings 2'])).toBe('New surroundings 3');
    let d = addConditionSet(draftOf(defaults, 'SI'), 'SI');
    d = addConditionSet(d, 'SI');
    expect(d.conditionSets.slice(-2).map((s) => s.name)).toEqual(['New surroundings', 'New surroundings 2']);
    expect(new Set(d.conditionSets.map((s) => s.key)).size).toBe(d.conditionSets.length);
    d = editConditionSet(d, 4, { name: 'Roof walkway', exposure: 'outdoor', box: { key: 'airTemperature', text: '-8' } });
    d = editConditionSet(d, 4, { box: { key: 'windSpeed', text: '6' } });
    d = removeConditionSet(d, 5);
    d = addService(d, 'Elastomeric foam tube, typical curve', 'SI');
    d = editService(d, 7, { service: 'process water' });
    d = removeService(d, 0);
    const s = read(d);
    expect(s.conditionSets.map((c) => c.name)).toEqual(['Plant room', 'Ceiling void', 'Humid pump room', 'Outdoors in wind', 'Roof walkway']);
    expect(s.conditionSets[4]).toEqual({ name: 'Roof walkway', airTemperature: -8, relativeHumidity: 0.5, exposure: 'outdoor', windSpeed: 6 });
    expect(s.services.map((r) => r.service)).toEqual(['heating return', 'domestic hot water', 'steam', 'condensate', 'chilled water', 'domestic cold water', 'process water']);
    expect(s.services[6]).toEqual({ service: 'process water', material: 'Elastomeric foam tube, typical curve', criteria: { maxSurfaceTemperature: { limit: 50 } } });
    // What was read is what the Node side accepts.
    expect(parseScheduleSettings(s)).toEqual(s);
  });

  it('switches criteria on with their starting values and off again, keeping what was typed', () => {
    let d = switchCriterion(draftOf(defaults, 'SI'), 0, 'maxHeatLoss', true);
    expect(read(d).services[0]!.criteria).toEqual({ maxSurfaceTemperature: { limit: 50 }, maxHeatLoss: { limit: 30 } });
    d = typeCriterion(d, 0, 'maxHeatLoss', 'limit', '25');
    d = switchCriterion(d, 0, 'maxHeatLoss', false);
    expect(read(d).services[0]!.criteria).toEqual({ maxSurfaceTemperature: { limit: 50 } });
    d = switchCriterion(d, 0, 'maxHeatLoss', true);
    expect(read(d).services[0]!.criteria).toEqual({ maxSurfaceTemperature: { limit: 50 }, maxHeatLoss: { limit: 25 } });
    // The touch limit may be left empty (the engine's own limit applies); the freezing fraction too.
    d = typeCriterion(d, 0, 'maxSurfaceTemperature', 'limit', ' ');
    expect(read(d).services[0]!.criteria['maxSurfaceTemperature']).toEqual({});
  });

  it('converts a limit typed in °F at the edge: 113 °F is 45 °C (113 − 32) × 5/9 = 45', () => {
    const d = typeCriterion(draftOf(defaults, 'IP'), 0, 'maxSurfaceTemperature', 'limit', '113');
    expect(read(d, 'IP').services[0]!.criteria['maxSurfaceTemperature']).toEqual({ limit: 45 });
  });

  it('names each box that cannot be stored, in its own units, and keeps the text', () => {
    let d = editConditionSet(draftOf(defaults, 'SI'), 1, { box: { key: 'relativeHumidity', text: '150' } });
    d = editConditionSet(d, 2, { box: { key: 'airTemperature', text: 'warm' } });
    d = { ...d, operatingHours: '9000' };
    const r = readDraft(d, 'SI');
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(Object.fromEntries(r.errors)).toEqual({
      'conditionSets[1].relativeHumidity': 'Relative humidity may not be 150 %: allowed above 0 to 100 %.',
      'conditionSets[2].airTemperature': 'Air temperature must be a number in °C.',
      'operatingHours': 'Operating hours per year may not be 9000 h: allowed 0 to 8784 h.',
    });
    expect(d.conditionSets[1]!.texts['relativeHumidity']).toBe('150');
  });

  it('reads the economics when switched on and leaves them out when off', () => {
    const on = { ...draftOf(defaults, 'SI'), economicsOn: true, currency: 'GBP' };
    expect(read(on).economics).toEqual({ energyPrice: 0.1, generationEfficiency: 0.9, emissionFactor: 0.2, currency: 'GBP' });
    expect(read({ ...on, economicsOn: false }).economics).toBeNull();
  });

  it('places a refusal of the Node side at its box, or at the nearest group the form shows', () => {
    const d = draftOf(defaults, 'SI');
    const shown = shownPaths(d);
    expect(boxOfRefusal('settings.conditionSets[1].name', shown)).toBe('conditionSets[1].name');
    expect(boxOfRefusal('settings.services[0].criteria.maxSurfaceTemperature.limit', shown)).toBe('services[0].criteria.maxSurfaceTemperature.limit');
    // A criterion the form does not show (switched off) falls back to the service's criteria.
    expect(boxOfRefusal('settings.services[0].criteria.maxHeatLoss.limit', shown)).toBe('services[0].criteria');
    expect(boxOfRefusal('settings.economics.currency', shown)).toBeNull();
    expect(boxOfRefusal('settings', shown)).toBeNull();
    expect(boxOfRefusal(undefined, shown)).toBeNull();
    expect(boxId('conditionSets[1].relativeHumidity')).toBe('schedule-settings-conditionSets-1-relativeHumidity');
  });

  it('counts the runs whose condition set or service a rename or removal leaves behind', () => {
    const run = (location: string, service: string) => ({ location, service }) as ScheduleRun;
    const runs = [run('Plant room', 'heating flow'), run('plant room', 'steam'), run('outdoor', 'heating flow'), run('Ceiling void', 'heating flow')];
    let d = editConditionSet(draftOf(defaults, 'SI'), 0, { name: 'Boiler house' });
    d = removeService(d, 0);
    expect(namesLeftBehind(d, runs)).toEqual({ locations: [['Plant room', 1], ['plant room', 1]], services: [['heating flow', 3]] });
    expect(namesLeftBehind(draftOf(defaults, 'SI'), runs)).toEqual({ locations: [], services: [] });
  });
});

describe('a refusal of the Node side in the form\'s words', () => {
  it('names entries by their place in the list and fields by their labels', () => {
    // Sentences as parseScheduleSettings (app/schedules/schedule-settings.ts) writes them.
    expect(refusalInWords("settings.conditionSets[4] repeats the name 'Plant room'; each needs its own.")).toBe("Condition set 5 repeats the name 'Plant room'; each needs its own.");
    expect(refusalInWords('settings.services[0].service must not be empty.')).toBe('The name of service 1 must not be empty.');
    expect(refusalInWords('settings.services[2].criteria.maxHeatLoss.limit must be at least 0.1 W/m (got 0).')).toBe('The most heat lost (or gained) per length of pipe of service 3 must be at least 0.1 W/m (got 0).');
    expect(refusalInWords('settings.economics.currency must be text.')).toBe('The currency must be text.');
    expect(refusalInWords('settings.conditionSets[0].colour is not a field.')).toBe('settings.conditionSets[0].colour is not a field.');
  });
});
