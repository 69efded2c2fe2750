/**
 * The engine's refusal beside a box in the case editor: the figures in the unit the box shows
 * (mm, %, in, °F) and the field named by its label, while the command line's sentence keeps the
 * path and SI as it always has. Expected values: the ranges of app/base/quantity-ranges (2 m of
 * insulation is 2000 mm; 1 µm is 0.001 mm; 1 in = 25.4 mm exactly, NIST SP 811) and the form's labels.
 */
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { InputError, solveCase } from '../../app/index.js';
import { QUANTITY_RANGES } from '../../app/base/quantity-ranges.js';
import { enteredPart, rangePart, writeSentence, writeShownSentence } from '../../app/base/quantity-sentence.js';
import { quantityText, SI_TEXT } from '../../app/base/quantity-text.js';
import type { UnitSystem } from '../../app/base/unit-systems.js';
import { pipeSizeCatalogue } from '../../main/pipe-sizes/pipe-size-catalogue.js';
import { setAt, type Json } from '../../renderer/src/case-editor/case-paths.js';
import type { CaseKindName } from '../../renderer/src/case-editor/case-form-fields.js';
import { fieldName, refusalText } from '../../renderer/src/case-editor/refusal-text.js';

const example = (file: string): Json => JSON.parse(fs.readFileSync(path.resolve(import.meta.dirname, '..', '..', 'data', 'examples', file), 'utf8')) as Json;

/** The refusal of `doc` as the engine throws it in `system`. */
function refusalOf(doc: Json, system: UnitSystem): InputError {
  try {
    solveCase(doc, { resolveMaterial: () => undefined, pipeSizes: pipeSizeCatalogue(), unitSystem: system });
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('the case was solved, not refused');
}

const shown = (doc: Json, kind: CaseKindName, system: UnitSystem): string => {
  const error = refusalOf(doc, system);
  return refusalText(error.field, error.sentence ?? error.message, system, kind, doc);
};

describe('writeShownSentence', () => {
  const sentence = ['t must be ', rangePart(QUANTITY_RANGES.insulationThickness, 'thickness', 'at least 0.000001 and at most 2 m'), ' (got ', enteredPart(5, 'thickness', '5'), ').'];

  it('writes figures in the display units also in SI, where writeSentence keeps the SI text', () => {
    expect(writeSentence(sentence, SI_TEXT)).toBe('t must be at least 0.000001 and at most 2 m (got 5).');
    expect(writeShownSentence(sentence, SI_TEXT)).toBe('t must be at least 0.001 and at most 2000 mm (got 5000 mm).');
  });

  it('in US units writes what writeSentence writes', () => {
    const us = quantityText('IP');
    expect(writeShownSentence(sentence, us)).toBe(writeSentence(sentence, us));
    expect(writeShownSentence(sentence, us)).toBe('t must be at least 0.0000393701 and at most 78.7402 in (got 196.85 in).');
  });

  it('leaves a plain sentence as it is', () => {
    expect(writeShownSentence('layers must list 1 to 20 insulation layers, inside first.', SI_TEXT)).toBe('layers must list 1 to 20 insulation layers, inside first.');
  });
});

describe('a refusal beside its box', () => {
  const pipe = example('pipe-hot-water-plant-room.json');
  const wall = example('wall-masonry-cavity.json');

  it('a layer thickness of 5 m, typed as 5000 in a millimetre box, is refused in mm and by the box label', () => {
    const doc = setAt(pipe, 'layers[0].thickness', 5);
    // The command line's sentence is unchanged: path and SI.
    expect(refusalOf(doc, 'SI').message).toBe('layers[0].thickness must be at least 0.000001 and at most 2 m (got 5).');
    expect(shown(doc, 'pipe', 'SI')).toBe('Thickness of layer 1 must be at least 0.001 and at most 2000 mm (got 5000 mm).');
    expect(shown(doc, 'pipe', 'IP')).toBe('Thickness of layer 1 must be at least 0.0000393701 and at most 78.7402 in (got 196.85 in).');
  });

  it('a wall layer of no thickness: its own range (5 m), in mm', () => {
    expect(shown(setAt(wall, 'layers[1].thickness', 0), 'wall', 'SI')).toBe('Thickness of layer 2 must be at least 0.001 and at most 5000 mm (got 0 mm).');
  });

  it('a humidity, stored as a fraction, reads in the per cent its box shows', () => {
    const doc = setAt(wall, 'inside.relativeHumidity', 1.5);
    expect(refusalOf(doc, 'SI').message).toBe('inside.relativeHumidity must be a fraction from 0 to 1 (0 to 100 %) (got 1.5).');
    expect(shown(doc, 'wall', 'SI')).toBe('Inside relative humidity must be at least 0 and at most 100 % (got 150 %).');
    const air = setAt(pipe, 'ambient.relativeHumidity', 0);
    expect(refusalOf(air, 'SI').message).toBe('ambient.relativeHumidity must be a fraction above 0 and at most 1 (above 0 up to 100 %) (got 0).');
    expect(shown(air, 'pipe', 'SI')).toBe('Relative humidity of the air must be more than 0 and at most 100 % (got 0 %).');
  });

  it('a temperature in the form of the box, with the true minus sign', () => {
    expect(shown(setAt(pipe, 'ambient.airTemperature', 500), 'pipe', 'SI')).toBe('Air temperature must be between −100 °C and 200 °C (got 500 °C).');
    expect(shown(setAt(pipe, 'ambient.airTemperature', 500), 'pipe', 'IP')).toBe('Air temperature must be between −148 °F and 392 °F (got 932 °F).');
  });

  it('a sentence without figures names the field in words too', () => {
    expect(shown(setAt(pipe, 'layers', []), 'pipe', 'SI')).toBe('The layers must list 1 to 20 insulation layers, inside first.');
  });

  it('names the build-up controls and the form fields, and leaves a path the form has no words for', () => {
    expect(fieldName('pipe', pipe, 'jacket.thickness')).toBe('Jacket thickness');
    expect(fieldName('pipe', pipe, 'jacket.emissivity')).toBe('Emissivity of the jacket surface');
    expect(fieldName('wall', wall, 'layers[2].openingArea')).toBe('Vent opening area of layer 3');
    expect(fieldName('pipe', pipe, 'touchLimit')).toBe('Highest surface temperature safe to touch');
    expect(fieldName('pipe', pipe, 'layers[0].material.conductivity.kind')).toBeUndefined();
    expect(refusalText('notes.x', 'notes.x is not a known field here.', 'SI', 'pipe', pipe)).toBe('notes.x is not a known field here.');
  });
});
