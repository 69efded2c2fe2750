/**
 * Bad pipe inputs: each gives one InputError sentence naming the field path and the allowed range
 * (project rule: never NaN, never a crash).
 */
import { describe, expect, it } from 'vitest';
import { calculatePipe } from '../../app/cases/pipe/pipe-calculation.js';
import type { PipeInput } from '../../app/cases/pipe/pipe-input.js';
import { aluminium, hotPipe, inputErrorOf, material, mineralWool, steel } from './pipe-fixtures.js';

const ambient = hotPipe().ambient;

const cases: [string, PipeInput, string, RegExp][] = [
  ['relative humidity above 1', hotPipe({ ambient: { ...ambient, relativeHumidity: 1.5 } }), 'ambient.relativeHumidity', /0 up to 100 %/],
  ['relative humidity given in per cent', hotPipe({ ambient: { ...ambient, relativeHumidity: 60 } }), 'ambient.relativeHumidity', /at most 1/],
  ['relative humidity 0', hotPipe({ ambient: { ...ambient, relativeHumidity: 0 } }), 'ambient.relativeHumidity', /above 0/],
  ['negative wind', hotPipe({ ambient: { ...ambient, exposure: { kind: 'outdoor', windSpeed: -1 } } }), 'ambient.exposure.windSpeed', /between 0 m\/s and 60 m\/s/],
  ['jacket emissivity above 1', hotPipe({ jacket: { material: aluminium, thickness: 0.001, emissivity: 1.2 } }), 'jacket.emissivity', /between 0 and 1/],
  ['material emissivity below 0', hotPipe({ layers: [{ material: { ...mineralWool, emissivity: -0.1 }, thickness: 0.05 }] }), 'layers[0].material.emissivity', /between 0 and 1/],
  ['insulation thickness 0', hotPipe({ layers: [{ material: mineralWool, thickness: 0 }] }), 'layers[0].thickness', /at least 0\.000001 and at most 2 m/],
  ['negative insulation thickness', hotPipe({ layers: [{ material: mineralWool, thickness: 0.05 }, { material: mineralWool, thickness: -0.01 }] }), 'layers[1].thickness', /at least 0\.000001 and at most 2 m/],
  ['no insulation layer', hotPipe({ layers: [] }), 'layers', /1 to 20 insulation layers/],
  ['diameter 0', hotPipe({ pipe: { outerDiameter: 0, wallThickness: 0.003, material: steel } }), 'pipe.outerDiameter', /greater than 0 m/],
  ['wall as thick as the radius', hotPipe({ pipe: { outerDiameter: 0.1, wallThickness: 0.05, material: steel } }), 'pipe.wallThickness', /less than half of pipe.outerDiameter \(0.05 m\)/],
  ['fluid coefficient 0', hotPipe({ inner: { kind: 'fluid', temperature: 80, coefficient: 0 } }), 'inner.coefficient', /greater than 0 W/],
  ['fluid below absolute zero', hotPipe({ inner: { kind: 'surface', temperature: -300 } }), 'inner.temperature', /absolute zero/],
  ['unknown inner kind', hotPipe({ inner: { kind: 'steam', temperature: 80 } as never }), 'inner.kind', /'fluid', 'surface'/],
  ['air temperature not a number', hotPipe({ ambient: { ...ambient, airTemperature: Number.NaN } }), 'ambient.airTemperature', /finite number/],
  ['too many operating hours', hotPipe({ operatingHours: 9000 }), 'operatingHours', /between 0 h\/a and 8784 h\/a/],
  ['run length 0', hotPipe({ length: 0 }), 'length', /greater than 0 m/],
  ['unknown orientation', hotPipe({ orientation: 'diagonal' as never }), 'orientation', /'horizontal', 'vertical'/],
  ['height on a horizontal pipe', hotPipe({ height: 3 }), 'height', /only to a vertical pipe/],
  ['jacket thicker than a sheet', hotPipe({ jacket: { material: aluminium, thickness: 0.05 } }), 'jacket.thickness', /at most 0.02 m/],
  ['touch limit above 100 °C', hotPipe({ touchLimit: 150 }), 'touchLimit', /between 0 °C and 100 °C/],
  ['fixed coefficient 0', hotPipe({ surfaceMethod: { kind: 'fixed-coefficient', coefficient: 0 } }), 'surfaceMethod.coefficient', /greater than 0/],
  ['unknown surface method', hotPipe({ surfaceMethod: { kind: 'guess' } as never }), 'surfaceMethod.kind', /'correlations'/],
  ['material without conductivity', hotPipe({ layers: [{ material: { ...mineralWool, conductivity: undefined as never }, thickness: 0.05 }] }), 'layers[0].material.conductivity', /missing/],
  ['service range upside down', hotPipe({ layers: [{ material: { ...mineralWool, minServiceTemperature: 100, maxServiceTemperature: 50 }, thickness: 0.05 }] }), 'layers[0].material.maxServiceTemperature', /above/],
  ['no emissivity on the jacket or its material', hotPipe({ jacket: { material: { ...aluminium, emissivity: null }, thickness: 0.001 } }), 'jacket.emissivity', /from 0 to 1/],
  ['no jacket and no emissivity on the outer insulation', hotPipe({ jacket: undefined, layers: [{ material: material('Bare wool', 0.04), thickness: 0.05 }] }), 'layers[0].material.emissivity', /from 0 to 1/],
];

describe('pipe input errors name the field and the allowed range', () => {
  for (const [what, input, field, range] of cases) {
    it(what, () => {
      const error = inputErrorOf(() => calculatePipe(input));
      expect(error.field).toBe(field);
      expect(error.message).toMatch(range);
      expect(error.message.startsWith(field)).toBe(true);
    });
  }

  it('a fixed coefficient needs no emissivity', () => {
    const input = hotPipe({ jacket: undefined, layers: [{ material: material('Bare wool', 0.04), thickness: 0.05 }], surfaceMethod: { kind: 'fixed-coefficient', coefficient: 10 } });
    expect(Number.isFinite(calculatePipe(input).heatLossPerMetre)).toBe(true);
  });
});
