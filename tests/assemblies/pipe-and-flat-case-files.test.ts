/**
 * The pipe and flat case files: the shipped examples validate against their JSON Schemas
 * (draft 2020-12, checked with ajv, an independent validator) and parse and solve; materials
 * resolve inline or by library id; bad files give an InputError naming the field.
 */
import { readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import Ajv2020Module from 'ajv/dist/2020.js';
import { calculateFlatSurface } from '../../app/cases/flat/flat-surface-calculation.js';
import { calculatePipe } from '../../app/cases/pipe/pipe-calculation.js';
import { parseFlatCaseFile } from '../../app/cases/flat/flat-case-file.js';
import { parsePipeCaseFile } from '../../app/cases/pipe/pipe-case-file.js';
import type { MaterialProperties } from '../../app/materials/material-properties.js';
import { validateCaseInputs } from '../../main/services/case-inputs.js';
import { pipeSizeCatalogue } from '../../main/pipe-sizes/pipe-size-catalogue.js';
import * as sizes from '../../app/cases/pipe/pipe-sizes.js';

const resolvePipeSizeInCase = (json: unknown) => sizes.resolvePipeSizeInCase(json, pipeSizeCatalogue());
import { aluminium, inputErrorOf, mineralWool, steel } from './pipe-fixtures.js';

const root = path.resolve(import.meta.dirname, '../..');
const readJson = (file: string): unknown => JSON.parse(readFileSync(path.join(root, file), 'utf8'));
// ajv is CommonJS: under NodeNext the class is the module's `default` export.
const Ajv2020 = Ajv2020Module.default;
const ajv = new Ajv2020({ allErrors: true, strict: true, strictTuples: false }) // a0 in prefixItems, a1… in items: valid 2020-12 that strict tuples flag;
const validatePipeSchema = ajv.compile(readJson('data/schemas/pipe-case.schema.json') as object);
const validateFlatSchema = ajv.compile(readJson('data/schemas/flat-case.schema.json') as object);
const noLibrary = (): MaterialProperties | undefined => undefined;
const examples = readdirSync(path.join(root, 'data/examples')).filter((f) => /^(pipe|flat)-.*\.json$/.test(f));

describe('shipped examples', () => {
  it('there are pipe and flat examples (hot water indoors, steam outdoors, chilled water, hot tank wall)', () => {
    for (const name of ['pipe-hot-water-plant-room.json', 'pipe-steam-outdoor.json', 'pipe-chilled-water.json', 'flat-hot-tank-wall.json']) {
      expect(examples).toContain(name);
    }
  });

  for (const file of examples) {
    it(`${file} validates against its schema, parses and solves`, () => {
      const json = readJson(`data/examples/${file}`) as { kind: string; title: string; notes: string };
      const validate = json.kind === 'pipe' ? validatePipeSchema : validateFlatSchema;
      expect(validate(json), JSON.stringify(validate.errors)).toBe(true);
      // Project rule: demo data are set in an invented scenario and say so.
      expect(json.notes).toMatch(/Invented demo scenario/);
      const result =
        json.kind === 'pipe'
          ? calculatePipe(parsePipeCaseFile(resolvePipeSizeInCase(json).json, noLibrary))
          : calculateFlatSurface(parseFlatCaseFile(json, noLibrary));
      expect(Number.isFinite(result.surfaceTemperature)).toBe(true);
      expect(result.energyBalance.relativeResidual).toBeLessThan(1e-9);
      for (const check of Object.values(result.checks)) expect(['pass', 'warning', 'fail', 'not-applicable']).toContain(check.verdict);
    });
  }

  it('the chilled-water example is a heat gain and its surface stays above the dew point', () => {
    const result = calculatePipe(parsePipeCaseFile(readJson('data/examples/pipe-chilled-water.json'), noLibrary));
    expect(result.heatLossPerMetre).toBeLessThan(0);
    expect(result.checks.surfaceCondensation.margin!.value).toBeGreaterThan(0);
  });
});

describe('materials by library id', () => {
  const library = new Map<number, MaterialProperties>([
    [3, steel],
    [12, mineralWool],
    [7, aluminium],
  ]);
  const byId = {
    kind: 'pipe',
    schemaVersion: 1,
    pipe: { outerDiameter: 0.0603, wallThickness: 0.0029, materialId: 3 },
    inner: { kind: 'surface', temperature: 70 },
    layers: [{ materialId: 12, thickness: 0.04 }],
    jacket: { materialId: 7, thickness: 0.0006 },
    orientation: 'horizontal',
    ambient: { airTemperature: 18, relativeHumidity: 0.55, exposure: { kind: 'indoor' } },
    length: 12,
    operatingHours: 8760,
  };

  it('resolves every materialId through the callback, and the same file with the materials inline gives the same result', () => {
    const input = parsePipeCaseFile(byId, (id) => library.get(id));
    expect(input.pipe.material).toBe(steel);
    expect(input.layers[0]!.material).toBe(mineralWool);
    expect(input.jacket!.material).toBe(aluminium);
    expect(validatePipeSchema(byId)).toBe(true);
    const inline = {
      ...byId,
      pipe: { outerDiameter: 0.0603, wallThickness: 0.0029, material: { ...steel } },
      layers: [{ material: { ...mineralWool }, thickness: 0.04 }],
      jacket: { material: { ...aluminium }, thickness: 0.0006 },
    };
    expect(validatePipeSchema(inline), JSON.stringify(validatePipeSchema.errors)).toBe(true);
    expect(calculatePipe(parsePipeCaseFile(inline, noLibrary)).heatLossPerMetre).toBe(calculatePipe(input).heatLossPerMetre);
  });

  it('a file that refers to materials only by id passes the storage envelope check (main/services/case-inputs.ts)', () => {
    expect(() => validateCaseInputs(byId)).not.toThrow();
  });

  it('an unknown id is an InputError naming the field', () => {
    const error = inputErrorOf(() => parsePipeCaseFile({ ...byId, layers: [{ materialId: 99, thickness: 0.04 }] }, (id) => library.get(id)));
    expect(error.field).toBe('layers[0].materialId');
    expect(error.message).toMatch(/99 names no material/);
  });

  it('both material and materialId, or neither, is an InputError', () => {
    expect(inputErrorOf(() => parsePipeCaseFile({ ...byId, jacket: { materialId: 7, material: aluminium, thickness: 0.0006 } }, (id) => library.get(id))).field).toBe('jacket.material');
    expect(inputErrorOf(() => parsePipeCaseFile({ ...byId, layers: [{ thickness: 0.04 }] }, (id) => library.get(id))).message).toMatch(/not neither/);
    expect(validatePipeSchema({ ...byId, layers: [{ thickness: 0.04 }] })).toBe(false);
  });
});

describe('bad case files: the parser names the field and the schema rejects the same file', () => {
  const good = readJson('data/examples/pipe-hot-water-plant-room.json') as Record<string, unknown>;
  const ambient = good['ambient'] as Record<string, unknown>;
  const cases: [string, Record<string, unknown>, string][] = [
    ['relative humidity in per cent', { ...good, ambient: { ...ambient, relativeHumidity: 50 } }, 'ambient.relativeHumidity'],
    ['negative wind', { ...good, ambient: { ...ambient, exposure: { kind: 'outdoor', windSpeed: -2 } } }, 'ambient.exposure.windSpeed'],
    ['a misspelt field', { ...good, lenght: 40 }, 'lenght'],
    ['wrong kind', { ...good, kind: 'wall' }, 'kind'],
    ['wrong schema version', { ...good, schemaVersion: 2 }, 'schemaVersion'],
    ['thickness 0', { ...good, layers: [{ ...(good['layers'] as object[])[0], thickness: 0 }] }, 'layers[0].thickness'],
    ['emissivity above 1', { ...good, jacket: { ...(good['jacket'] as object), emissivity: 1.3 } }, 'jacket.emissivity'],
    ['diameter 0', { ...good, pipe: { ...(good['pipe'] as object), outerDiameter: 0 } }, 'pipe.outerDiameter'],
  ];
  for (const [what, file, field] of cases) {
    it(what, () => {
      expect(inputErrorOf(() => parsePipeCaseFile(file, noLibrary)).field).toBe(field);
      expect(validatePipeSchema(file)).toBe(false);
    });
  }

  it('flat: a missing surface orientation and an unknown surface key', () => {
    const flat = readJson('data/examples/flat-hot-tank-wall.json') as Record<string, unknown>;
    const { surface: _s, ...withoutSurface } = flat;
    expect(inputErrorOf(() => parseFlatCaseFile(withoutSurface, noLibrary)).field).toBe('surface');
    expect(validateFlatSchema(withoutSurface)).toBe(false);
    const extra = { ...flat, surface: { kind: 'vertical', height: 6, tilt: 10 } };
    expect(inputErrorOf(() => parseFlatCaseFile(extra, noLibrary)).field).toBe('surface.tilt');
    expect(validateFlatSchema(extra)).toBe(false);
  });
});
