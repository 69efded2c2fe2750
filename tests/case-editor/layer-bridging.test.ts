/**
 * A wall layer's bridging sections, air gaps and fixings as the build-up editor writes them: the
 * entries the engine reads (a section of a library material and a plain area fraction; level 0 and
 * no fixings leave the layer as the case file would without them), and each refusal shown beside
 * its own box in the form's words.
 *
 * The U-value check uses the worked wall of tests/assemblies/bridged-layers.test.ts, worked by hand
 * with the EN ISO 6946:2017 §6.7.2 combined method (upper and lower limits averaged) and
 * R_si = 0.13, R_se = 0.04 m²·K/W for horizontal heat flow (ISO 6946 surface resistance table),
 * both from memory, as the project's reference notes state them: U = 0.417174 W/(m²·K). The
 * Annex F air-gap correction: ΔU'' = 0.01 W/(m²·K) at level 1, ΔU_g = ΔU''·(R_1/R_T,h)² (from memory).
 */
import { describe, expect, it } from 'vitest';
import { InputError } from '../../app/index.js';
import { MAXIMUM_BRIDGES_PER_LAYER } from '../../app/cases/wall/wall-validation.js';
import { buildUpPaths, normaliseMaterialPath } from '../../renderer/src/case-editor/build-up.js';
import { fieldForError, getAt, setAt, type Json } from '../../renderer/src/case-editor/case-paths.js';
import { applyChoice } from '../../renderer/src/case-editor/case-form-fields.js';
import {
  addBridge, addFasteners, airGapField, airGapLevelOf, bridgesOf, bridgingFieldName, bridgingPaths, bridgingSummary, canAddBridge, DEFAULT_BRIDGE_FRACTION,
  fastenersOn, nameBridge, removeBridge, removeFasteners, shankDiameter,
} from '../../renderer/src/case-editor/layer-bridging.js';
import { refusalText } from '../../renderer/src/case-editor/refusal-text.js';
import { analysisOf, solveWall, WALL } from './wall-editor-fixture.js';

/** Where the editor shows the engine's refusal of `doc`, and the sentence it shows there. */
function refusalBeside(doc: Json): { field: string | null; text: string } {
  try {
    solveWall(doc);
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    const field = fieldForError(error.field === undefined ? undefined : normaliseMaterialPath(error.field), new Set(buildUpPaths('wall', doc)));
    return { field, text: refusalText(error.field, error.sentence ?? error.message, 'SI', 'wall', doc) };
  }
  throw new Error('the case was solved, not refused');
}

describe('bridging sections', () => {
  it('adds a section of a library material with a starting fraction, names it, and removes it back to a homogeneous layer', () => {
    const studs = addBridge(WALL, 1, 3);
    expect(getAt(studs, 'layers[1].bridges')).toEqual([{ materialId: 3, fraction: DEFAULT_BRIDGE_FRACTION }]);
    const named = nameBridge(studs, 1, 0, 'studs at 600 mm');
    expect(getAt(named, 'layers[1].bridges[0].name')).toBe('studs at 600 mm');
    // Empty text leaves the name out, so the report names the section by its material.
    expect(getAt(nameBridge(named, 1, 0, '  '), 'layers[1].bridges[0]')).toEqual({ materialId: 3, fraction: DEFAULT_BRIDGE_FRACTION });
    const two = addBridge(named, 1, 1);
    expect(bridgesOf(removeBridge(two, 1, 0), 1)).toEqual([{ materialId: 1, fraction: DEFAULT_BRIDGE_FRACTION }]);
    // The case file has no empty list: the last section removed takes the key with it.
    expect(getAt(removeBridge(studs, 1, 0), 'layers[1]')).toEqual({ materialId: 2, thickness: 0.1 });
    expect(WALL).toEqual(structuredClone(WALL));
  });

  it('stops at the engine’s most sections per layer', () => {
    let doc = WALL;
    for (let k = 0; k < MAXIMUM_BRIDGES_PER_LAYER; k++) doc = addBridge(doc, 1, 3);
    expect(canAddBridge(doc, 1)).toBe(false);
    expect(addBridge(doc, 1, 3)).toBe(doc);
  });

  it('writes what the engine reads: 10 % timber studs in 100 mm of mineral wool give the hand-worked U of 0.417174 W/(m²·K)', () => {
    const plain = analysisOf(WALL).wall.uValue;
    // Homogeneous: 1/(0.32 + 0.1/0.04) = 1/2.82 (ISO 6946 §6.7.1 by hand).
    expect(plain).toBeCloseTo(1 / 2.82, 6);
    const studs = analysisOf(addBridge(WALL, 1, 3)).wall;
    expect(studs.uValue).toBeCloseTo(0.417174, 5);
    expect(studs.combinedMethod).not.toBeNull();
  });

  it('summarises what a layer carries in its closed line', () => {
    expect(bridgingSummary(WALL, 1)).toBe('none');
    const all = addFasteners(applyChoice(airGapField(1), addBridge(WALL, 1, 3), '1', { pipeSizes: [] }), 1);
    expect(bridgingSummary(all, 1)).toBe('1 section over 0.1 of the face, air gaps at level 1, fixings');
  });
});

describe('air gaps and fixings', () => {
  it('writes level 1 or 2 as a number and level 0 as no entry', () => {
    const field = airGapField(1);
    const level1 = applyChoice(field, WALL, '1', { pipeSizes: [] });
    expect(getAt(level1, 'layers[1].airGapLevel')).toBe(1);
    expect(airGapLevelOf(level1, 1)).toBe('1');
    expect(getAt(applyChoice(field, level1, '0', { pipeSizes: [] }), 'layers[1]')).toEqual({ materialId: 2, thickness: 0.1 });
  });

  it('level 1 adds the Annex F correction to U by hand', () => {
    const a = analysisOf(applyChoice(airGapField(1), WALL, '1', { pipeSizes: [] })).wall;
    // R_1 = 0.1/0.04 = 2.5 is the whole of R_T,h = 2.82 less nothing but the other layers: ΔU_g = 0.01·(2.5/2.82)².
    expect(a.correctedUValue - a.uValue).toBeCloseTo(0.01 * (2.5 / 2.82) ** 2, 6);
  });

  it('adds steel fixings the engine accepts and takes them away', () => {
    const fixed = addFasteners(WALL, 1);
    expect(fastenersOn(fixed, 1)).toBe(true);
    expect(() => solveWall(fixed)).not.toThrow();
    expect(analysisOf(fixed).wall.correctedUValue).toBeGreaterThan(analysisOf(WALL).wall.uValue);
    expect(getAt(removeFasteners(fixed, 1), 'layers[1]')).toEqual({ materialId: 2, thickness: 0.1 });
    // A round shank of 5 mm has A = π·(2.5 mm)²: the diameter read back from the area.
    expect(shankDiameter(Math.PI * 0.0025 ** 2)).toBeCloseTo(0.005, 12);
  });
});

describe('refusals beside the bridging boxes', () => {
  it('a fraction of 1.2 shows beside that section’s fraction box, named in the form’s words', () => {
    const doc = setAt(addBridge(WALL, 1, 3), 'layers[1].bridges[0].fraction', 1.2);
    const { field, text } = refusalBeside(doc);
    expect(field).toBe('layers[1].bridges[0].fraction');
    expect(text.startsWith('Area fraction of section 1 in layer 2 must be')).toBe(true);
  });

  it('fractions adding up to 1 or more show above the layer’s sections', () => {
    const doc = setAt(setAt(addBridge(addBridge(WALL, 1, 3), 1, 1), 'layers[1].bridges[0].fraction', 0.6), 'layers[1].bridges[1].fraction', 0.5);
    const { field, text } = refusalBeside(doc);
    expect(field).toBe('layers[1].bridges');
    expect(text.startsWith('The bridging sections of layer 2')).toBe(true);
  });

  it('a section material missing from the library shows beside that section’s material picker', () => {
    expect(refusalBeside(addBridge(WALL, 1, 99)).field).toBe('layers[1].bridges[0].material');
  });

  it('a fixing longer than the layer shows beside its length box', () => {
    const doc = setAt(addFasteners(WALL, 1), 'layers[1].fasteners.lengthInLayer', 0.2);
    const { field, text } = refusalBeside(doc);
    expect(field).toBe('layers[1].fasteners.lengthInLayer');
    expect(text.startsWith('Length of a fixing inside the layer in layer 2 must be')).toBe(true);
  });

  it('names only the boxes a layer shows, and none of an air layer', () => {
    const doc = setAt(addBridge(WALL, 1, 3), 'layers[3]', { kind: 'air-layer', thickness: 0.025, ventilation: 'unventilated' });
    const paths = bridgingPaths(doc);
    expect(paths).toContain('layers[1].bridges[0].fraction');
    expect(paths).toContain('layers[0].airGapLevel');
    expect(paths).not.toContain('layers[1].fasteners.conductivity');
    expect(paths.some((p) => p.startsWith('layers[3]'))).toBe(false);
    expect(bridgingFieldName('layers[0].airGapLevel')).toBe('Air gaps in layer 1');
    expect(bridgingFieldName('layers[0].thickness')).toBeUndefined();
  });
});
