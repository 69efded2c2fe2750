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
    expect(result.reason).toMatch(/hot foam spans 60\.0 to 120\.0 °C \(allowed -50 to 105 °C\)/);
    expect(result.caution).toMatch(/licensed professional practice/);
  });

  it('passes with the smallest distance to a limit as the margin', () => {
    const result = serviceTemperatureCheck([span('foam', 100, 40, -50, 105), span('board', 40, 20, 18, null), span('sheet', 20, 19, null, null)]);
    expect(result.verdict).toBe('pass');
    // foam: 105 − 100 = 5 K; board spans 20..40 °C above its 18 °C minimum: 2 K; the sheet gives no range.
    expect(result.margin).toEqual({ value: 2, unit: 'K' });
    expect(result.reason).toMatch(/1 layer\(s\) give no range/);
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
