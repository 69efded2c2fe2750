/**
 * The "Reach a target U-value" panel's pure parts: the case file's "targetU" block as the panel
 * writes it (the layer named as the engine reads names, a name of its own where two layers share
 * one, the thicknesses in even steps), the thickness found read from the report, put into the
 * layer, and each refusal shown beside its own box.
 *
 * Expected thicknesses are worked by hand for a homogeneous wall (EN ISO 6946:2017 §6.7.1:
 * R_T = R_si + Σ d/λ + R_se, U = 1/R_T; R_si = 0.13, R_se = 0.04 m²·K/W for horizontal heat flow,
 * from memory as the project's reference notes state them): plasterboard 0.0125/0.25 = 0.05 and
 * sheathing 0.015/0.15 = 0.10, so R_T = 0.32 + d/0.04. For U ≤ 0.25 W/(m²·K) the layer needs
 * d ≥ 0.04·(4 − 0.32) = 0.1472 m: of 20, 40, … 300 mm the thinnest is 160 mm (U = 1/4.32 = 0.2315;
 * 140 mm gives 1/3.82 = 0.2618). The thickest, 300 mm, gives 1/7.82 = 0.1279, short of 0.1.
 */
import { describe, expect, it } from 'vitest';
import { InputError } from '../../app/index.js';
import { fieldForError, getAt, setAt, type Json } from '../../renderer/src/case-editor/case-paths.js';
import { applyChoice, type ChoiceField } from '../../renderer/src/case-editor/case-form-fields.js';
import { refusalText } from '../../renderer/src/case-editor/refusal-text.js';
import {
  chooseTargetLayer, chosenTargetThickness, listedThicknesses, shownTargetUPaths, startTargetU, stopTargetU, TARGET_U_FIELDS, targetLayerIndex, targetLayerOptions,
  targetLayers, targetUMarks, targetUSection, targetUTable, thicknessesKind, useTargetThickness,
} from '../../renderer/src/case-editor/target-u-block.js';
import { LIBRARY, analysisOf, solveWall, WALL } from './wall-editor-fixture.js';

const found = (doc: Json): number | null => chosenTargetThickness(targetUSection(solveWall(doc).report));

function refusalBeside(doc: Json): { field: string | null; text: string } {
  try {
    solveWall(doc);
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    return { field: fieldForError(error.field, new Set(shownTargetUPaths('wall', doc))), text: refusalText(error.field, error.sentence ?? error.message, 'SI', 'wall', doc) };
  }
  throw new Error('the case was solved, not refused');
}

describe('the target block as the panel writes it', () => {
  it('starts on the insulation layer, named as the engine reads it, with a starting target and even steps', () => {
    const on = startTargetU(WALL, LIBRARY);
    expect(getAt(on, 'targetU')).toEqual({ layer: 'Mineral wool (test)', thicknesses: { from: 0.02, to: 0.3, step: 0.02 }, value: 0.25 });
    expect(targetLayerIndex(on, LIBRARY)).toBe(1);
    expect(getAt(stopTargetU(on), 'targetU')).toBeUndefined();
    expect(shownTargetUPaths('wall', WALL)).toEqual([]);
    expect(shownTargetUPaths('pipe', on)).toEqual([]);
  });

  it('gives a layer a name of its own when another layer shares its name, so the block names exactly one', () => {
    const twoWools = setAt(WALL, 'layers[2]', { materialId: 2, thickness: 0.05 });
    const chosen = chooseTargetLayer(startTargetU(twoWools, LIBRARY), 2, LIBRARY);
    expect(getAt(chosen, 'layers[2].name')).toBe('Mineral wool (test) (layer 3)');
    expect(getAt(chosen, 'targetU.layer')).toBe('Mineral wool (test) (layer 3)');
    expect(targetLayerIndex(chosen, LIBRARY)).toBe(2);
    expect(() => solveWall(chosen)).not.toThrow();
  });

  it('offers only layers that count in U: none of an air layer, none outside a well ventilated one', () => {
    const vented = setAt(setAt(WALL, 'layers[3]', { kind: 'air-layer', thickness: 0.025, ventilation: 'well-ventilated' }), 'layers[4]', { materialId: 3, thickness: 0.02 });
    expect(targetLayers(vented)).toEqual([0, 1, 2]);
    const stray = setAt(startTargetU(WALL, LIBRARY), 'targetU.layer', 'no such layer');
    expect(targetLayerOptions(stray, LIBRARY)[0]).toEqual({ value: '', label: 'Choose a layer…' });
  });

  it('turns a listed series into the range it spans, keeping the list until then', () => {
    const listed = setAt(startTargetU(WALL, LIBRARY), 'targetU.thicknesses', [0.14, 0.09, 0.12]);
    expect(thicknessesKind(listed)).toBe('list');
    expect(listedThicknesses(listed)).toEqual([0.09, 0.12, 0.14]);
    const choice = TARGET_U_FIELDS.find((f) => f.type === 'choice') as ChoiceField;
    expect(getAt(applyChoice(choice, listed, 'range', { pipeSizes: [] }), 'targetU.thicknesses')).toEqual({ from: 0.09, to: 0.14, step: 0.01 });
    expect(shownTargetUPaths('wall', listed)).not.toContain('targetU.thicknesses.step');
  });
});

describe('the thickness found', () => {
  it('is the thinnest of 20 … 300 mm reaching 0.25 W/(m²·K) by hand: 160 mm; used, the wall meets the target', () => {
    const on = startTargetU(WALL, LIBRARY);
    expect(found(on)).toBeCloseTo(0.16, 9);
    const table = targetUTable(targetUSection(solveWall(on).report))!;
    expect(table.rows).toHaveLength(15);
    // The 160 mm row, the eighth of 20, 40, …, is the one marked.
    expect(targetUMarks(table, 0.16).rows.map((r) => r.marked).indexOf(true)).toBe(7);
    expect(targetUMarks(table, null).rows.some((r) => r.marked)).toBe(false);
    const used = useTargetThickness(on, 1, 0.16);
    expect(getAt(used, 'layers[1].thickness')).toBe(0.16);
    const wall = analysisOf(used).wall;
    expect(wall.uValue).toBeCloseTo(1 / 4.32, 6);
    expect(wall.correctedUValue).toBeLessThanOrEqual(0.25);
    expect(analysisOf(setAt(used, 'layers[1].thickness', 0.14)).wall.uValue).toBeCloseTo(1 / 3.82, 6);
  });

  it('is none when the thickest of the series falls short: 300 mm gives 0.1279 > 0.1', () => {
    const high = setAt(startTargetU(WALL, LIBRARY), 'targetU.value', 0.1);
    expect(found(high)).toBeNull();
    expect(analysisOf(high).targetU!.rows.at(-1)!.correctedUValue).toBeCloseTo(1 / 7.82, 6);
  });
});

describe('refusals beside the target boxes', () => {
  const on = startTargetU(WALL, LIBRARY);

  it('a layer name the case does not hold shows beside the layer box', () => {
    const { field, text } = refusalBeside(setAt(on, 'targetU.layer', 'no such layer'));
    expect(field).toBe('targetU.layer');
    expect(text.startsWith('Layer to vary must be the name of one material layer')).toBe(true);
  });

  it('a target of 0 shows beside the target box', () => {
    const { field, text } = refusalBeside(setAt(on, 'targetU.value', 0));
    expect(field).toBe('targetU.value');
    expect(text.startsWith('Target U-value must be')).toBe(true);
  });

  it('too fine a step shows beside the step box; a bad listed thickness beside the series choice', () => {
    expect(refusalBeside(setAt(on, 'targetU.thicknesses.step', 0.001)).field).toBe('targetU.thicknesses.step');
    expect(refusalBeside(setAt(on, 'targetU.thicknesses', [0.1, -0.2])).field).toBe('targetU.thicknesses');
  });
});
