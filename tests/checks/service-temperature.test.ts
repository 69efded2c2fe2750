import { describe, expect, it } from 'vitest';
import type { PipeInput } from '../../app/cases/pipe/pipe-input.js';
import { serviceTemperatureCheck } from '../../app/checks/service-temperature.js';
import { calculatePipe } from '../../app/cases/pipe/pipe-calculation.js';
import { foam, hotPipe, material, mineralWool } from '../assemblies/pipe-fixtures.js';

const span = (name: string, innerTemperature: number, outerTemperature: number, min: number | null, max: number | null) => ({
  name,
  innerTemperature,
  outerTemperature,
  minServiceTemperature: min,
  maxServiceTemperature: max,
});

describe('service temperature check', () => {
  it('not applicable when no material gives a range', () => {
    const result = serviceTemperatureCheck([span('a', 100, 50, null, null), span('b', 50, 30, null, null)]);
    expect(result.verdict).toBe('not-applicable');
    expect(result.margin).toBeUndefined();
    expect(result.layersOutside).toEqual([]);
    expect(result.governingLimit).toBeNull();
    expect(result.reason).toBe('No layer material gives a service temperature range.');
  });

  it('finds the layers outside their range, by name, whichever face is hotter', () => {
    const result = serviceTemperatureCheck([
      span('hot foam', 120, 60, -50, 105),
      span('cold board', -5, 10, 0, 80),
      span('fine wool', 60, 25, null, 250),
    ]);
    expect(result.verdict).toBe('fail');
    expect(result.layersOutside.map((l) => l.name)).toEqual(['hot foam', 'cold board']);
    expect(result.layersOutside[1]).toMatchObject({ lowest: -5, highest: 10 });
    expect(result.margin!.value).toBe(-15); // 105 − 120
    expect(result.governingLimit).toEqual({ layer: 'hot foam', side: 'upper', limit: 105, temperature: 120, margin: -15 });
    expect(result.reason).toBe(
      'Outside the service range: hot foam reaches 120.0 °C, 15.0 K above its upper limit of 105 °C (service range −50 to 105 °C); ' +
        'cold board falls to −5.0 °C, 5.0 K below its lower limit of 0 °C (service range 0 to 80 °C).',
    );
    expect(result.caution).toMatch(/licensed professional practice/);
  });

  it('passes with the smallest distance to a judged limit as the margin, and names the layers it could not check', () => {
    const result = serviceTemperatureCheck([span('foam', 100, 40, -50, 105), span('board', 40, 20, 18, null), span('sheet', 20, 19, null, null)]);
    expect(result.verdict).toBe('pass');
    // foam runs hot: 105 − 100 = 5 K to its upper limit; board gives only a minimum: 20 − 18 = 2 K; the sheet gives no range.
    expect(result.margin).toEqual({ value: 2, unit: 'K', reference: 'the lower service limit of board', safeSide: 'above' });
    expect(result.reason).toBe(
      'Every layer with a service range stays within it. Nearest to its limit: board, whose coldest face at 20.0 °C is 2.0 K ' +
        'above its lower limit of 18 °C (service range from 18 °C; no upper limit given). ' +
        'One layer gives no service range and was not checked: sheet.',
    );
  });

  it('judges a hot layer against its upper limit and a chilled one against its lower limit, not the nearer number', () => {
    // A layer on a 150 °C pipe spanning 150 → 30 °C with limits 0 to 300 °C: 300 − 150 = 150 K to the
    // upper limit, although its cold face is only 30 K above the lower one (that face sits at ambient).
    const hot = serviceTemperatureCheck([span('wool on the hot pipe', 150, 30, 0, 300)]);
    expect(hot.margin!.value).toBe(150);
    expect(hot.governingLimit).toMatchObject({ side: 'upper', limit: 300, temperature: 150 });
    expect(hot.reason).toBe(
      'Every layer with a service range stays within it. Nearest to its limit: wool on the hot pipe, whose hottest face at ' +
        '150.0 °C is 150.0 K below its upper limit of 300 °C (service range 0 to 300 °C).',
    );
    // A chilled line: 6 → 24 °C in foam rated −50 to 105 °C: 6 − (−50) = 56 K to the lower limit.
    const cold = serviceTemperatureCheck([span('foam on the chilled pipe', 6, 24, -50, 105)]);
    expect(cold.margin).toEqual({ value: 56, unit: 'K', reference: 'the lower service limit of foam on the chilled pipe', safeSide: 'above' });
    // No temperature difference: the nearer limit (200 − 150 = 50 K against 150 − 0 = 150 K).
    expect(serviceTemperatureCheck([span('steel', 150, 150, 0, 200)]).governingLimit).toMatchObject({ side: 'upper', margin: 50 });
    // A hot layer whose crossed limit is the lower one still fails, against that limit.
    const frozen = serviceTemperatureCheck([span('wool outdoors', 90, -8, -5, 300)]);
    expect(frozen.verdict).toBe('fail');
    expect(frozen.governingLimit).toMatchObject({ side: 'lower', margin: -3 });
  });

  it('a missing limit reads "no lower limit given" or "no upper limit given"', () => {
    const onlyMax = serviceTemperatureCheck([span('wool', 200, 40, null, 180)]);
    expect(onlyMax.reason).toBe('Outside the service range: wool reaches 200.0 °C, 20.0 K above its upper limit of 180 °C (service range up to 180 °C; no lower limit given).');
    const onlyMin = serviceTemperatureCheck([span('board', 5, 15, 10, null)]);
    expect(onlyMin.reason).toBe('Outside the service range: board falls to 5.0 °C, 5.0 K below its lower limit of 10 °C (service range from 10 °C; no upper limit given).');
    for (const r of [onlyMax, onlyMin]) expect(r.reason).not.toMatch(/allowed|− to|to −/);
  });

  it('on a steam pipe: elastomeric foam directly on the pipe fails; behind enough mineral wool it stays within its range', () => {
    const steam = (layers: PipeInput['layers']) =>
      calculatePipe(hotPipe({ inner: { kind: 'surface', temperature: 160 }, layers })).checks.serviceTemperature;
    const direct = steam([{ material: foam, thickness: 0.03 }]);
    expect(direct.verdict).toBe('fail');
    expect(direct.layersOutside.map((l) => l.name)).toEqual(['insulation layer 1 (Elastomeric foam)']);
    const shielded = steam([{ material: mineralWool, thickness: 0.06 }, { material: foam, thickness: 0.02 }]);
    expect(shielded.verdict).toBe('pass');
    const noLimits = calculatePipe(hotPipe({ layers: [{ material: material('Unrated wool', 0.04, { emissivity: 0.9 }), thickness: 0.05 }] }));
    expect(noLimits.checks.serviceTemperature.verdict).toBe('not-applicable');
  });
});
