/**
 * Pipe sizes named in case files resolve from the tables in data/pipe-sizes. Expected values are the
 * well-established outside diameters and walls of ISO 4200 / EN 10220, EN 10255 medium series, ASME
 * B36.10M Schedule 40 and EN 1057 (from memory, as the tables themselves say).
 */
import { describe, expect, it } from 'vitest';
import { pipeSizeCatalogue } from '../../main/pipe-sizes/pipe-size-catalogue.js';
import * as sizes from '../../app/cases/pipe/pipe-sizes.js';

const findPipeSize = (series: unknown, nominal: unknown, field: string) => sizes.findPipeSize(pipeSizeCatalogue(), series, nominal, field);
const resolvePipeSizeInCase = (json: unknown) => sizes.resolvePipeSizeInCase(json, pipeSizeCatalogue());
import { InputError } from '../../app/fe/errors.js';

describe('pipe size tables', () => {
  it('DN100 is 114.3 mm with a 4.5 mm EN 10255 medium wall; NPS 6 is 168.3 mm with a 7.11 mm Schedule 40 wall (from memory)', () => {
    const dn100 = findPipeSize('steel-iso', 'DN100', 'pipe.size');
    expect(dn100.outerDiameter).toBeCloseTo(0.1143, 10);
    expect(dn100.wallThickness).toBeCloseTo(0.0045, 10);
    expect(findPipeSize('steel-iso', '100', 'pipe.size').nominal).toBe('DN100');
    const nps6 = findPipeSize('steel-asme', '6', 'pipe.size');
    expect(nps6.outerDiameter).toBeCloseTo(0.1683, 10);
    expect(nps6.wallThickness).toBeCloseTo(0.00711, 10);
    expect(findPipeSize('copper-en1057', 108, 'pipe.size').outerDiameter).toBeCloseTo(0.108, 10);
  });
  it('every table row is a positive diameter with a source', () => {
    const all = pipeSizeCatalogue();
    expect(all.length).toBeGreaterThan(60);
    for (const p of all) {
      expect(p.outerDiameter).toBeGreaterThan(0);
      expect(p.source.length).toBeGreaterThan(0);
      if (p.wallThickness !== null) expect(p.wallThickness).toBeLessThan(p.outerDiameter / 2);
    }
  });
  it('a case file naming a size gets the diameter and wall; a given wall wins; a tube without a wall must give one', () => {
    const base = { kind: 'pipe', pipe: { size: { series: 'steel-iso', nominal: 'DN50' }, materialId: 1 } };
    const r = resolvePipeSizeInCase(base).json as { pipe: Record<string, unknown> };
    expect(r.pipe['outerDiameter']).toBeCloseTo(0.0603, 10);
    expect(r.pipe['wallThickness']).toBeCloseTo(0.0036, 10);
    expect(r.pipe['size']).toBeUndefined();
    const own = resolvePipeSizeInCase({ ...base, pipe: { ...base.pipe, wallThickness: 0.0039 } }).json as { pipe: Record<string, unknown> };
    expect(own.pipe['wallThickness']).toBe(0.0039);
    expect(() => resolvePipeSizeInCase({ kind: 'pipe', pipe: { size: { series: 'copper-en1057', nominal: '22' } } })).toThrowError(/pipe\.wallThickness is needed/);
  });
  it('unknown series or size: an error naming the field', () => {
    expect(() => findPipeSize('steel-iso', 'DN7', 'pipe.size')).toThrowError(InputError);
    expect(() => findPipeSize('steel-iso', 'DN7', 'pipe.size')).toThrowError(/pipe\.size\.nominal "DN7" is not in the steel-iso table/);
    expect(() => findPipeSize('cast-iron', 'DN100', 'pipe.size')).toThrowError(/pipe\.size\.series must be one of/);
  });
});
