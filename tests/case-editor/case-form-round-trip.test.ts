/**
 * Form ↔ case file: every field the editor shows, read into its box and written back, leaves each
 * pipe, flat and wall example in data/examples as it was, in SI and in US units; a value retyped
 * from its box gives the same results as the file; and the structural choices make cases the
 * engine solves. Expected values are the examples themselves and the engine's own solve.
 */
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { solveCase } from '../../app/index.js';
import { caseContext } from '../../main/cases/case-context.js';
import { pipeSizeCatalogue } from '../../main/pipe-sizes/pipe-size-catalogue.js';
import { applyChoice, shownFields, type CaseKindName, type FormContext } from '../../renderer/src/case-editor/case-form-fields.js';
import { getAt, setAt, type Json } from '../../renderer/src/case-editor/case-paths.js';
import { boxText, readBoxText, storedValueFor } from '../../renderer/src/case-editor/field-text.js';
import { materialSlots, moveLayer } from '../../renderer/src/case-editor/build-up.js';
import { criterionOn, economicsOn, seriesChoice, sizingBlock } from '../../renderer/src/case-editor/sizing-block.js';
import { criterionFields, ECONOMICS_FIELDS, RANGE_FIELDS } from '../../renderer/src/case-editor/sizing-fields.js';
import { SIZING_CRITERIA } from '../../app/cases/sizing/sizing-options.js';
import type { UnitSystem } from '../../app/base/unit-systems.js';

const examplesFolder = path.resolve(import.meta.dirname, '..', '..', 'data', 'examples');
const examples = fs
  .readdirSync(examplesFolder)
  .map((file) => ({ file, json: JSON.parse(fs.readFileSync(path.join(examplesFolder, file), 'utf8')) as Json & { kind: string } }))
  .filter((e) => ['pipe', 'flat', 'wall'].includes(e.json.kind));

const context: FormContext = { pipeSizes: pipeSizeCatalogue() };
// The shipped thickness series and installed-cost tables, as the app's solving worker has them.
const solve = (doc: Json) => solveCase(doc, { ...caseContext(null), pipeSizes: context.pipeSizes });

/** The sizing panel's boxes the case shows (none without a "sizing" block). */
function sizingFields(kind: CaseKindName, doc: Json) {
  if (kind === 'wall' || sizingBlock(doc) === undefined) return [];
  return [
    ...(seriesChoice(doc) === 'range' ? RANGE_FIELDS : []),
    ...SIZING_CRITERIA.filter((c) => criterionOn(doc, c)).flatMap((c) => criterionFields(c, kind)),
    ...(economicsOn(doc) ? ECONOMICS_FIELDS : []),
  ];
}

/** Every path the form edits as a number: the sections' fields and the build-up's thicknesses. */
function numberPaths(kind: CaseKindName, doc: Json) {
  const fields = [...shownFields(kind, doc), ...sizingFields(kind, doc)].filter((f) => f.type === 'number').map((f) => ({ path: f.path, quantity: f.quantity, label: f.label }));
  const thicknesses = materialSlots(kind, doc).filter((s) => s.thickness).map((s) => ({ path: `${s.entry}.thickness`, quantity: 'thickness' as const, label: 'Thickness' }));
  return [...fields, ...thicknesses];
}

/** Reads every field into its box and writes the box back, as a person tabbing through the form would. */
function passThroughForm(kind: CaseKindName, doc: Json, system: UnitSystem, retype: boolean): Json {
  let next = doc;
  for (const field of [...shownFields(kind, doc), ...sizingFields(kind, doc)]) {
    if (field.type === 'choice') next = applyChoice(field, next, field.read(next), context);
    if (field.type === 'text') next = setAt(next, field.path, getAt(next, field.path));
  }
  for (const { path: p, quantity, label } of numberPaths(kind, next)) {
    const value = getAt(next, p);
    if (typeof value !== 'number') continue;
    const text = boxText(value, quantity, system);
    const reading = retype ? readBoxText(text, quantity, system, label) : storedValueFor(text, value, quantity, system, label);
    if (!reading.ok) throw new Error(reading.message);
    next = setAt(next, p, reading.value);
  }
  return next;
}

describe('form and case file', () => {
  it('covers the pipe, flat and wall examples', () => {
    expect(examples.map((e) => e.json.kind).sort()).toEqual(['flat', 'flat', 'flat', 'pipe', 'pipe', 'pipe', 'pipe', 'pipe', 'pipe', 'wall', 'wall', 'wall', 'wall']);
  });

  for (const { file, json } of examples) {
    const kind = json.kind as CaseKindName;
    for (const system of ['SI', 'IP'] as const) {
      it(`${file}: every field read and written back in ${system} leaves the file as it was`, () => {
        const before = JSON.stringify(json);
        expect(passThroughForm(kind, json, system, false)).toEqual(json);
        expect(JSON.stringify(json)).toBe(before);
      });

      it(`${file}: values retyped from their ${system} boxes solve to the same figures`, () => {
        const retyped = passThroughForm(kind, json, system, true);
        for (const { path: p } of numberPaths(kind, json)) {
          const original = getAt(json, p);
          // A box shows 6 significant digits: retyped, a value is off by at most half a unit in the 6th.
          if (typeof original === 'number') expect(Math.abs((getAt(retyped, p) as number) - original)).toBeLessThanOrEqual(5e-6 * Math.abs(original));
        }
        const a = solve(json).report.keyFigures;
        const b = solve(retyped).report.keyFigures;
        expect(b.length).toBe(a.length);
        // The same figures as the report prints them (2 to 4 significant figures, app/base/quantities):
        // within half a unit in the 4th significant figure.
        b.forEach((f, i) => expect(Math.abs((f.value ?? 0) - (a[i]!.value ?? 0))).toBeLessThanOrEqual(5e-5 * Math.abs(a[i]!.value ?? 0)));
      });
    }
  }

  it('switches a pipe between a table size and a custom diameter, and outdoors, and still solves', () => {
    const steam = examples.find((e) => e.file === 'pipe-steam-outdoor.json')!.json;
    const fields = shownFields('pipe', steam);
    const mode = fields.find((f) => f.path === 'pipe.size')!;
    if (mode.type !== 'choice') throw new Error('pipe.size is a choice');
    const custom = applyChoice(mode, steam, 'custom', context);
    // The ASME B36.10M outside diameter of NPS 6 is 168.3 mm (the shipped table, data/pipe-sizes/steel.csv).
    expect(getAt(custom, 'pipe.outerDiameter')).toBeCloseTo(0.1683, 6);
    expect(solve(custom).report.keyFigures[0]!.value).toBeCloseTo(solve(steam).report.keyFigures[0]!.value!, 9);
    const dn = applyChoice(mode, custom, 'table', context);
    expect(getAt(dn, 'pipe.size')).toEqual({ series: 'steel-iso', nominal: 'DN100' });
    const exposure = fields.find((f) => f.path === 'ambient.exposure.kind')!;
    if (exposure.type !== 'choice') throw new Error('exposure is a choice');
    const indoor = applyChoice(exposure, dn, 'indoor', context);
    expect(getAt(indoor, 'ambient.exposure')).toEqual({ kind: 'indoor' });
    expect(getAt(applyChoice(exposure, indoor, 'outdoor', context), 'ambient.exposure')).toEqual({ kind: 'outdoor', windSpeed: 4 });
    expect(solve(indoor).report.keyFigures.length).toBeGreaterThan(0);
  });

  it('reorders wall layers and the U-value stays (series resistances commute)', () => {
    const wall = examples.find((e) => e.file === 'wall-winter-condensation.json')!.json;
    const moved = moveLayer(wall, 0, 2);
    expect((getAt(moved, 'layers') as { material: { name: string } }[]).map((l) => l.material.name.split(',')[0])).toEqual([
      'mineral wool batt', 'plywood sheathing', 'gypsum plasterboard', 'cement-sand render',
    ]);
    const u = (doc: Json) => solve(doc).report.keyFigures.find((f) => f.quantity === 'uValue' || f.quantity === 'uValueUnrounded')!.value!;
    expect(u(moved)).toBeCloseTo(u(wall), 12);
  });
});
