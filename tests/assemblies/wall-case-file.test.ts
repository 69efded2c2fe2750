/**
 * Wall case files: the shipped examples validate against data/schemas/wall-case.schema.json
 * (draft 2020-12, checked with ajv, an independent validator), parse, solve and run every check;
 * bad inputs give one InputError naming the field and the allowed range.
 */
import { readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import Ajv2020Module from 'ajv/dist/2020.js';
import { calculateWall } from '../../app/cases/wall/wall.js';
import { parseWallCaseFile } from '../../app/cases/wall/wall-case-file.js';
import {
  checkInterstitialAtDesignCondition,
  checkInterstitialMonthly,
  checkMouldAtDesignCondition,
  checkMouldMonthly,
} from '../checks/wall-moisture.js';
import { InputError } from '../../app/fe/index.js';
import type { MaterialProperties } from '../../app/materials/material-properties.js';
import { layer, material, thrownBy, wall } from './wall-fixtures.js';

const root = path.resolve(import.meta.dirname, '../..');
const readJson = (file: string): unknown => JSON.parse(readFileSync(path.join(root, file), 'utf8'));
// ajv is CommonJS: under NodeNext the class is the module's `default` export.
const Ajv2020 = Ajv2020Module.default;
const ajv = new Ajv2020({ allErrors: true, strict: true, strictTuples: false }) // a0 in prefixItems, a1… in items: valid 2020-12 that strict tuples flag;
const validateSchema = ajv.compile(readJson('data/schemas/wall-case.schema.json') as object);
const noLibrary = (): MaterialProperties | undefined => undefined;
const examples = readdirSync(path.join(root, 'data/examples')).filter((f) => /^wall-.*\.json$/.test(f));

function fieldOf(action: () => unknown): { field: string; message: string } {
  const e = thrownBy(action);
  expect(e).toBeInstanceOf(InputError);
  return { field: (e as InputError).field, message: (e as InputError).message };
}

const minimal = () => ({
  kind: 'wall',
  schemaVersion: 1,
  heatFlowDirection: 'horizontal',
  inside: { temperature: 20, relativeHumidity: 0.5 },
  outside: { temperature: -5, relativeHumidity: 0.85 },
  layers: [
    { material: { name: 'mineral wool', conductivity: 0.035, vapourResistanceFactor: 1 }, thickness: 0.1 },
    { kind: 'air-layer', thickness: 0.025, ventilation: 'unventilated' },
    { materialId: 7, thickness: 0.1 },
  ],
});
const brick = material('clay brick', 0.77, 10);
const library = (id: number) => (id === 7 ? brick : undefined);

describe('shipped wall examples', () => {
  it('include a masonry cavity wall, a timber frame with a vapour control layer, a flat roof (heat flow up) and a winter-condensation case', () => {
    for (const name of ['wall-masonry-cavity.json', 'wall-timber-frame-vcl.json', 'wall-flat-roof-warm-deck.json', 'wall-winter-condensation.json']) {
      expect(examples).toContain(name);
    }
    expect((readJson('data/examples/wall-flat-roof-warm-deck.json') as { heatFlowDirection: string }).heatFlowDirection).toBe('upward');
  });

  for (const file of examples) {
    it(`${file} validates against the schema, parses, solves and runs every check`, () => {
      const json = readJson(`data/examples/${file}`);
      const valid = validateSchema(json);
      expect(validateSchema.errors ?? []).toEqual([]);
      expect(valid).toBe(true);
      expect((json as { notes: string }).notes).toMatch(/Invented demo scenario/);
      const input = parseWallCaseFile(json, noLibrary);
      const r = calculateWall(input);
      expect(r.uValue).toBeGreaterThan(0);
      expect(r.energyBalance.relativeResidual).toBeLessThan(1e-10);
      for (const check of [
        checkMouldAtDesignCondition(input).mould,
        checkMouldMonthly(input).mould,
        checkInterstitialAtDesignCondition(input).check,
        checkInterstitialMonthly(input).check,
      ]) {
        expect(['pass', 'fail', 'warning', 'not-applicable']).toContain(check.verdict);
        expect(check.caution).toBeTruthy();
      }
      expect(JSON.stringify(r)).not.toMatch(/NaN|Infinity/);
    });
  }

  it('the winter-condensation example condenses in winter; the timber frame with its vapour control layer does not', () => {
    const bad = parseWallCaseFile(readJson('data/examples/wall-winter-condensation.json'), noLibrary);
    expect(checkInterstitialAtDesignCondition(bad).totalCondensationRate).toBeGreaterThan(0);
    expect(checkInterstitialMonthly(bad).maxAccumulated).toBeGreaterThan(0);
    const good = parseWallCaseFile(readJson('data/examples/wall-timber-frame-vcl.json'), noLibrary);
    expect(checkInterstitialMonthly(good).maxAccumulated).toBe(0);
  });
});

describe('case file parsing', () => {
  it('resolves inline materials, library ids and air layers', () => {
    expect(validateSchema(minimal())).toBe(true);
    const input = parseWallCaseFile(minimal(), library);
    expect(input.layers).toHaveLength(3);
    const r = calculateWall(input);
    // ISO 6946: 0.13 + 0.1/0.035 + 0.18 (25 mm, horizontal, table from memory) + 0.1/0.77 + 0.04.
    expect(Math.abs(r.totalResistance - (0.13 + 0.1 / 0.035 + 0.18 + 0.1 / 0.77 + 0.04))).toBeLessThan(1e-9);
  });

  it('takes a shipped climate by name and "vapour-tight" as μ = ∞', () => {
    const json = {
      ...minimal(),
      layers: [...minimal().layers, { material: { name: 'steel sheet', conductivity: 50, vapourResistanceFactor: 'vapour-tight' }, thickness: 0.001 }],
      moisture: { insideHumidity: { kind: 'class', humidityClass: 2, safetyFactor: true }, climate: 'demo-mild-coastal' },
    };
    expect(validateSchema(json)).toBe(true);
    const input = parseWallCaseFile(json, library);
    expect(input.moisture!.climate!.label).toMatch(/DEMO/);
    const m = input.layers[3]!;
    expect('material' in m && m.material.vapourResistanceFactor).toBe(Number.POSITIVE_INFINITY);
  });
});

describe('bad inputs name the field and the allowed range', () => {
  it('relative humidity outside 0..1 mentions 0 to 100 %', () => {
    const e = fieldOf(() => parseWallCaseFile({ ...minimal(), inside: { temperature: 20, relativeHumidity: 50 } }, library));
    expect(e.field).toBe('inside.relativeHumidity');
    expect(e.message).toContain('0 to 100 %');
    expect(validateSchema({ ...minimal(), inside: { temperature: 20, relativeHumidity: 50 } })).toBe(false);
  });

  it('zero or negative thickness', () => {
    const json = minimal();
    json.layers[0] = { material: { name: 'mineral wool', conductivity: 0.035, vapourResistanceFactor: 1 }, thickness: 0 };
    const e = fieldOf(() => parseWallCaseFile(json, library));
    expect(e.field).toBe('layers[0].thickness');
    expect(e.message).toBe('layers[0].thickness must be at least 0.000001 and at most 5 m (got 0).');
    const air = minimal();
    air.layers[1] = { kind: 'air-layer', thickness: -0.01, ventilation: 'unventilated' };
    expect(fieldOf(() => parseWallCaseFile(air, library)).field).toBe('layers[1].thickness');
  });

  it('air layer thicker than 0.3 m, or slightly ventilated without an opening area, or with a mismatching one', () => {
    const thick = minimal();
    thick.layers[1] = { kind: 'air-layer', thickness: 0.4, ventilation: 'unventilated' };
    expect(fieldOf(() => parseWallCaseFile(thick, library)).message).toContain('at most 0.3 m');
    const slight = minimal();
    slight.layers[1] = { kind: 'air-layer', thickness: 0.025, ventilation: 'slightly-ventilated' };
    expect(fieldOf(() => parseWallCaseFile(slight, library)).field).toBe('layers[1].openingArea');
    const mismatch = minimal();
    mismatch.layers[1] = { kind: 'air-layer', thickness: 0.025, ventilation: 'unventilated', openingArea: 2000 } as never;
    expect(fieldOf(() => parseWallCaseFile(mismatch, library)).field).toBe('layers[1].ventilation');
  });

  it('unknown library id, wrong kind, wrong schema version, unknown field, unknown climate', () => {
    expect(fieldOf(() => parseWallCaseFile(minimal(), noLibrary)).field).toBe('layers[2].materialId');
    expect(fieldOf(() => parseWallCaseFile({ ...minimal(), kind: 'pipe' }, library)).field).toBe('kind');
    expect(fieldOf(() => parseWallCaseFile({ ...minimal(), schemaVersion: 2 }, library)).field).toBe('schemaVersion');
    expect(fieldOf(() => parseWallCaseFile({ ...minimal(), colour: 'red' }, library)).field).toBe('colour');
    expect(fieldOf(() => parseWallCaseFile({ ...minimal(), moisture: { climate: 'nowhere' } }, library)).field).toBe('moisture.climate');
    expect(fieldOf(() => parseWallCaseFile({ ...minimal(), heatFlowDirection: 'up' }, library)).message).toContain("'upward'");
  });

  it('negative conductivity and bad surface resistances', () => {
    const json = minimal();
    json.layers[0] = { material: { name: 'x', conductivity: -1, vapourResistanceFactor: 1 }, thickness: 0.1 };
    expect(fieldOf(() => parseWallCaseFile(json, library)).field).toBe('layers[0].material.conductivity.value');
    expect(fieldOf(() => parseWallCaseFile({ ...minimal(), surfaceResistances: { inside: 0, outside: 0.04 } }, library)).field).toBe(
      'surfaceResistances.inside',
    );
  });

  it('a moisture check without μ or s_d names the material field', () => {
    const input = wall([layer(material('unknown board', 0.1), 0.02)]);
    const e = fieldOf(() => checkInterstitialAtDesignCondition(input));
    expect(e.field).toBe('layers[0].material.vapourResistanceFactor');
  });

  it('a monthly check without a climate says what is missing', () => {
    const e = fieldOf(() => checkInterstitialMonthly(wall([layer(material('board', 0.1, 10), 0.02)])));
    expect(e.field).toBe('moisture.climate');
  });
});
