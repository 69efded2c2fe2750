/** Case paths: the engine's field names read, written and mapped to the fields on screen. */
import { describe, expect, it } from 'vitest';
import { fieldDomId, fieldForError, getAt, pathSegments, setAt, type Json } from '../../renderer/src/case-editor/case-paths.js';
import { normaliseMaterialPath } from '../../renderer/src/case-editor/build-up.js';

describe('case paths', () => {
  it('splits the paths InputError names into keys and indices', () => {
    expect(pathSegments('layers[0].thickness')).toEqual(['layers', 0, 'thickness']);
    expect(pathSegments('ambient.exposure.windSpeed')).toEqual(['ambient', 'exposure', 'windSpeed']);
    expect(pathSegments('moisture.climate.months[11].outside.temperature')).toEqual(['moisture', 'climate', 'months', 11, 'outside', 'temperature']);
  });

  it('sets and removes values on a copy, leaving the original snapshot as it was', () => {
    const original: Json = { layers: [{ thickness: 0.05 }, { thickness: 0.04 }], ambient: { airTemperature: 20 } };
    const frozen = JSON.stringify(original);
    const changed = setAt(original, 'layers[1].thickness', 0.06);
    expect(getAt(changed, 'layers[1].thickness')).toBe(0.06);
    expect(JSON.stringify(original)).toBe(frozen);
    // Untouched branches are shared, so a snapshot costs only the changed path.
    expect((changed as { ambient: Json }).ambient).toBe((original as { ambient: Json }).ambient);
    expect(getAt(setAt(original, 'ambient.airTemperature', undefined), 'ambient')).toEqual({});
    expect(getAt(setAt(original, 'layers[0]', undefined), 'layers')).toEqual([{ thickness: 0.04 }]);
  });

  it('maps an engine complaint to the field that shows it, or its nearest shown parent', () => {
    const shown = new Set(['inner.temperature', 'layers[0].thickness', 'layers[0].material', 'layers']);
    expect(fieldForError('layers[0].thickness', shown)).toBe('layers[0].thickness');
    expect(fieldForError(normaliseMaterialPath('layers[0].materialId'), shown)).toBe('layers[0].material');
    expect(fieldForError(normaliseMaterialPath('layers[0].material.conductivity.points[2]'), shown)).toBe('layers[0].material');
    expect(fieldForError('layers[3].thickness', shown)).toBe('layers');
    expect(fieldForError('kind', shown)).toBeNull();
    expect(fieldForError(undefined, shown)).toBeNull();
    expect(fieldForError('not a [path', shown)).toBeNull();
  });

  it('gives each path a DOM id made of safe characters', () => {
    expect(fieldDomId('layers[2].thickness')).toBe('case-layers-2-thickness');
    expect(fieldDomId('ambient.exposure.windSpeed')).toBe('case-ambient-exposure-windSpeed');
  });
});
