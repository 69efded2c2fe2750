import { describe, expect, it } from 'vitest';
import { openLamina } from '../../main/services/lamina-services.js';
import { MATERIAL_CSV_HEADER } from '../../main/services/material-csv.js';
import { RefusedError } from '../../main/services/service-errors.js';
import { InputError } from '../../app/index.js';
import { wallInputs } from './case-fixtures.js';
import { tempDatabasePath } from './temp-folder.js';

const board = { name: 'Northwind site board', category: 'insulation', conductivity: { kind: 'constant', value: 0.034 }, density: 35 };

describe('materials library', () => {
  it('loads the built-in materials read-only; a duplicate is an editable user copy', async () => {
    const lamina = await openLamina(tempDatabasePath());
    const steel = lamina.materials.findByName('Carbon steel pipe')!;
    expect(steel.builtIn).toBe(true);
    expect(steel.vapourResistanceFactor).toBe(Infinity);
    expect(() => lamina.materials.update(steel.id, { ...board, name: 'Carbon steel pipe' })).toThrow(RefusedError);
    expect(() => lamina.materials.remove(steel.id)).toThrow('"Carbon steel pipe" is a built-in material and cannot be deleted.');
    const copy = lamina.materials.duplicate(steel.id);
    expect(copy).toMatchObject({ name: 'Carbon steel pipe (copy)', builtIn: false, conductivity: steel.conductivity, emissivity: steel.emissivity });
    expect(lamina.materials.duplicate(steel.id).name).toBe('Carbon steel pipe (copy) 2');
    const edited = lamina.materials.update(copy.id, { ...board, name: 'Carbon steel, painted', category: 'pipe', emissivity: 0.94, conductivity: { kind: 'constant', value: 50 } });
    expect(edited).toMatchObject({ name: 'Carbon steel, painted', emissivity: 0.94 });
    lamina.close();
  });

  it('creates, searches, filters, and refuses a duplicate name', async () => {
    const lamina = await openLamina(tempDatabasePath());
    const created = lamina.materials.create(board);
    expect(created).toMatchObject({ ...board, builtIn: false, specificHeat: null, source: '', notes: '' });
    expect(lamina.materials.list({ origin: 'user' }).map((m) => m.name)).toEqual(['Northwind site board']);
    expect(lamina.materials.list({ search: 'NORTHWIND' })).toHaveLength(1);
    expect(lamina.materials.list({ category: 'cladding' }).every((m) => m.category === 'cladding')).toBe(true);
    expect(lamina.materials.list({ category: 'cladding' }).length).toBeGreaterThan(5);
    // Search text is data, never SQL or a LIKE pattern.
    expect(lamina.materials.list({ search: "%' OR 1=1 --" })).toEqual([]);
    expect(lamina.materials.list({ search: '_' })).toEqual([]);
    expect(() => lamina.materials.create({ ...board, name: 'northwind SITE board' })).toThrow('A material named "northwind SITE board" already exists; choose another name.');
    lamina.close();
  });

  it('validates every field before touching the database, naming the field and range', async () => {
    const lamina = await openLamina(tempDatabasePath());
    const cases: [unknown, string][] = [
      [{ ...board, conductivity: { kind: 'constant', value: 0 } }, 'conductivity.value must be more than 0 and at most 1000 W/(m·K) (got 0).'],
      [{ ...board, density: -1 }, 'density must be more than 0 and at most 25000 kg/m³ (got -1).'],
      [{ ...board, emissivity: 1.2 }, 'emissivity must be more than 0 and at most 1 (got 1.2).'],
      [{ ...board, emissivity: Number.NaN }, 'emissivity must be a number more than 0 and at most 1.'],
      [{ ...board, name: '  ' }, 'name must be 1 to 120 characters long.'],
      [{ ...board, category: 'cheese' }, 'category must be one of building, insulation, pipe, cladding, membrane, air-layer, other.'],
      [{ ...board, minServiceTemperature: 50, maxServiceTemperature: 20 }, 'maxServiceTemperature must be above minServiceTemperature (50 °C).'],
      [{ ...board, conductivity: { kind: 'table', points: [[50, 0.04], [10, 0.03]] } }, 'conductivity.points must have strictly increasing temperatures (point 2 is not above point 1).'],
      [{ ...board, conductivity: { kind: 'polynomial', coefficients: [0.03, 1e-4] } }, 'minServiceTemperature and maxServiceTemperature are required for a polynomial conductivity (the curve is only trusted inside that range).'],
      [{ ...board, colour: 'red' }, 'material.colour is not a known field here; allowed: name, category, conductivity, density, specificHeat, vapourResistanceFactor, equivalentAirLayerThickness, emissivity, minServiceTemperature, maxServiceTemperature, source, notes.'],
    ];
    for (const [input, message] of cases) {
      const error = (() => {
        try {
          lamina.materials.create(input);
        } catch (e) {
          return e;
        }
      })();
      expect(error).toBeInstanceOf(InputError);
      expect((error as Error).message).toBe(message);
    }
    // A polynomial that dips to zero inside the service range is refused: 0.05 - 5e-4·θ is 0 at 100 °C.
    expect(() => lamina.materials.create({ ...board, conductivity: { kind: 'polynomial', coefficients: [0.05, -5e-4] }, minServiceTemperature: 0, maxServiceTemperature: 150 })).toThrow(/must stay above 0 W\/\(m·K\) from 0 to 150 °C, but the polynomial reaches -0.0250 W\/\(m·K\) at 150.0 °C/);
    expect(() => lamina.materials.get(0)).toThrow('id must be a whole number of 1 or more.');
    expect(() => lamina.materials.get('1' as unknown as number)).toThrow('id must be a whole number of 1 or more.');
    expect(lamina.materials.list({ origin: 'user' })).toEqual([]);
    lamina.close();
  });

  it('refuses to delete a material in use, or deletes it with an explicit replacement', async () => {
    const lamina = await openLamina(tempDatabasePath());
    const mine = lamina.materials.create({ ...board, vapourResistanceFactor: 1 }); // μ: a wall case needs it on every layer
    const other = lamina.materials.findByName('Mineral wool board')!;
    const project = lamina.projects.create({ name: 'Quarry Street offices' });
    const wall = lamina.projects.addCase(project.id, { name: 'East wall', inputs: wallInputs([mine.id, other.id, mine.id]) });
    lamina.projects.remove(project.id); // still counts while in the recycle bin
    expect(() => lamina.materials.remove(mine.id)).toThrow('"Northwind site board" is used by 1 case(s) in project "Quarry Street offices" (in the recycle bin); choose a replacement material or remove it from those cases first.');
    lamina.projects.restore(project.id);
    expect(() => lamina.materials.remove(mine.id, { replaceWith: mine.id })).toThrow(InputError);
    expect(lamina.materials.remove(mine.id, { replaceWith: other.id })).toEqual({ replacedInCases: 1 });
    expect(lamina.projects.getCase(wall.id).inputs.layers.map((l) => l.materialId)).toEqual([other.id, other.id, other.id]);
    expect(lamina.materials.usage(other.id)).toHaveLength(1);
    const unused = lamina.materials.create({ ...board, name: 'Spare' });
    expect(lamina.materials.remove(unused.id)).toEqual({ replacedInCases: 0 });
    expect(() => lamina.materials.get(unused.id)).toThrow(`There is no material with id ${unused.id}.`);
    lamina.close();
  });
});

describe('materials CSV import and export', () => {
  const header = MATERIAL_CSV_HEADER.join(',');

  it('imports nothing when any row is bad and reports every bad row with its line number', async () => {
    const lamina = await openLamina(tempDatabasePath());
    const csv = [
      header,
      'Good board,insulation,0.035,30,1030,1,,,,,"Northwind test sheet, 2024",',
      'Bad density,insulation,0.035,-3,,,,,,,,',
      '"Multi-line',
      'name",insulation,"0,035",,,,,,,,,',
      'Good board,insulation,0.036,,,,,,,,,',
      'Carbon steel pipe,pipe,50,,,,,,,,,',
      'Too short,insulation',
      'Curve,insulation,poly 0.05 -5e-4,,,,,,0,150,,',
    ].join('\r\n');
    const result = lamina.materials.importCsv(csv);
    expect(result).toEqual({
      ok: false,
      problems: [
        { line: 3, message: 'column "density [kg/m3]" must be more than 0 and at most 25000 kg/m³ (got -3).' },
        { line: 4, message: 'conductivity [W/(m.K)] "0,035" uses a comma; write decimals with a point.' },
        { line: 6, message: 'name "Good board" repeats the material on line 2.' },
        { line: 7, message: 'a material named "Carbon steel pipe" is already in the library.' },
        { line: 8, message: 'expected 12 columns, found 2.' },
        { line: 9, message: 'column "conductivity [W/(m.K)]" must stay above 0 W/(m·K) from 0 to 150 °C, but the polynomial reaches -0.0250 W/(m·K) at 150.0 °C.' },
      ],
    });
    expect(lamina.materials.list({ origin: 'user' })).toEqual([]);
    lamina.close();
  });

  it('checks the units named in the header', async () => {
    const lamina = await openLamina(tempDatabasePath());
    const csv = header.replace('conductivity [W/(m.K)]', 'conductivity [Btu.in/(h.ft2.F)]') + '\nA,insulation,0.24,,,,,,,,,\n';
    expect(lamina.materials.importCsv(csv)).toEqual({
      ok: false,
      problems: [{ line: 1, message: 'column 3 of the header must be "conductivity [W/(m.K)]" (values in the unit named in brackets), found "conductivity [Btu.in/(h.ft2.F)]".' }],
    });
    lamina.close();
  });

  it('round-trips every built-in material through export and import without loss', async () => {
    const source = await openLamina(tempDatabasePath());
    const builtIns = source.materials.list({ origin: 'built-in' });
    const csv = source.materials.exportCsv({ origin: 'built-in' });
    source.close();
    const target = await openLamina(tempDatabasePath(), { seedFolder: new URL('./fixtures/empty-seed/', import.meta.url).pathname });
    const result = target.materials.importCsv(csv);
    expect(result.ok).toBe(true);
    const strip = ({ id: _i, builtIn: _b, createdAt: _c, updatedAt: _u, ...rest }: (typeof builtIns)[number]) => rest;
    expect(target.materials.list().map(strip)).toEqual(builtIns.map(strip));
    target.close();
  });
});
