/**
 * Numbers at the edge of the form: SI stored, the project's units shown and typed. Factors are the
 * exact definitions in NIST SP 811 (Appendix B): 1 in = 0.0254 m, 1 ft = 0.3048 m, θ/°F = 1.8·θ/°C + 32.
 */
import { describe, expect, it } from 'vitest';
import { boxText, rangeHint, readBoxText, storedValueFor } from '../../renderer/src/case-editor/field-text.js';

describe('field text', () => {
  it('shows stored SI values in the project units without binary noise', () => {
    expect(boxText(0.0036, 'thickness', 'SI')).toBe('3.6');
    expect(boxText(150, 'temperature', 'IP')).toBe('302'); // NIST SP 811: 1.8·150 + 32
    expect(boxText(0.0508, 'thickness', 'IP')).toBe('2'); // NIST SP 811: 1 in = 0.0254 m exactly
    expect(boxText(0.05, 'thickness', 'IP')).toBe('1.9685'); // NIST SP 811: 0.05 / 0.0254 = 1.968503…, six significant digits
    expect(boxText(0.6, 'relativeHumidity', 'SI')).toBe('60');
    expect(boxText(-5, 'temperature', 'SI')).toBe('-5');
  });

  it('reads typed text back to SI, with a decimal comma and a true minus sign accepted', () => {
    const f = readBoxText('212', 'temperature', 'IP', 'Fluid temperature');
    expect(f.ok && f.value).toBeCloseTo(100, 12); // NIST SP 811: (212 − 32)/1.8
    const feet = readBoxText('10', 'length', 'IP', 'Length');
    expect(feet.ok && feet.value).toBeCloseTo(3.048, 12); // NIST SP 811: 1 ft = 0.3048 m exactly
    const comma = readBoxText('3,6', 'thickness', 'SI', 'Wall');
    expect(comma.ok && comma.value).toBeCloseTo(0.0036, 15);
    const minus = readBoxText('−5', 'temperature', 'SI', 'Air');
    expect(minus.ok && minus.value).toBe(-5);
  });

  it('refuses text that is not a number in one sentence naming the field and its unit', () => {
    expect(readBoxText('fifty', 'thickness', 'SI', 'Thickness')).toEqual({ ok: false, message: 'Thickness must be a number in mm.' });
    expect(readBoxText('', 'temperature', 'IP', 'Air temperature')).toEqual({ ok: false, message: 'Air temperature must be a number in °F.' });
    expect(readBoxText('1.2.3', 'emissivity', 'SI', 'Emissivity')).toEqual({ ok: false, message: 'Emissivity must be a number.' });
  });

  it('keeps every stored digit when the typed text is what the box already showed', () => {
    const stored = 0.1143 + 1e-15;
    const kept = storedValueFor(boxText(stored, 'diameter', 'IP'), stored, 'diameter', 'IP', 'Diameter');
    expect(kept).toEqual({ ok: true, value: stored });
  });

  it('states the allowed range in the project units', () => {
    expect(rangeHint({ min: -100, max: 200, unit: '°C' }, 'temperature', 'SI')).toBe('Allowed −100 to 200 °C');
    expect(rangeHint({ min: -100, max: 200, unit: '°C' }, 'temperature', 'IP')).toBe('Allowed −148 to 392 °F');
    expect(rangeHint({ min: 0, minExclusive: true, max: 1, unit: '' }, 'relativeHumidity', 'SI')).toBe('Allowed above 0 to 100 %');
    expect(rangeHint({ min: 1e-6, max: 0.02, unit: 'm' }, 'thickness', 'SI')).toBe('Allowed 0.001 to 20 mm');
  });
});
