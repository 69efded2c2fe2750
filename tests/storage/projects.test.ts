import { describe, expect, it } from 'vitest';
import { openLamina } from '../../main/services/lamina-services.js';
import { projectFileFromJson, projectFileToJson } from '../../main/services/project-file.js';
import { InvalidInputError, RefusedError } from '../../main/services/service-errors.js';
import { tempDatabasePath, wallInputs } from './temp-folder.js';

// Invented demo scenario: Brightwater Engineering insulating a plant room for Halden Dairy.
const fields = { name: 'Halden Dairy plant room', client: 'Halden Dairy Ltd', site: 'Unit 4, Mill Lane', reference: 'BW-2291', engineer: 'R. Okafor', revision: 'A', date: '2025-02-14', unitSystem: 'SI', notes: '' };

describe('projects', () => {
  it('creates, renames, duplicates, deletes to the recycle bin, restores and empties', async () => {
    const lamina = await openLamina(tempDatabasePath());
    const board = lamina.materials.findByName('Mineral wool board')!;
    const project = lamina.projects.create(fields);
    expect(project).toMatchObject({ ...fields, caseCount: 0, deletedAt: null, cases: [] });
    const pipeCase = lamina.projects.addCase(project.id, { name: 'Steam main', inputs: { schemaVersion: 1, kind: 'pipe', length: 42, pipe: { outerDiameter: 0.1143 }, layers: [{ materialId: board.id, thickness: 0.08 }] } });
    expect(pipeCase.inputs).toMatchObject({ pipe: { outerDiameter: 0.1143 } }); // fields beyond the envelope are kept as given
    lamina.projects.addCase(project.id, { name: 'Tank wall', inputs: wallInputs(board.id) });
    expect(lamina.projects.rename(project.id, 'Halden Dairy plant room, stage 2').name).toBe('Halden Dairy plant room, stage 2');
    const copy = lamina.projects.duplicate(project.id);
    expect(copy.name).toBe('Halden Dairy plant room, stage 2 (copy)');
    expect(copy.cases.map((c) => [c.name, c.position])).toEqual([['Steam main', 0], ['Tank wall', 1]]);
    expect(lamina.materials.usage(board.id)).toHaveLength(4);

    lamina.projects.remove(project.id);
    expect(lamina.projects.list().map((p) => p.id)).toEqual([copy.id]);
    expect(lamina.projects.listRecycleBin().map((p) => p.id)).toEqual([project.id]);
    expect(() => lamina.projects.rename(project.id, 'x')).toThrow(RefusedError);
    expect(lamina.projects.restore(project.id).deletedAt).toBeNull();
    lamina.projects.remove(copy.id);
    expect(lamina.projects.emptyRecycleBin()).toBe(1);
    expect(() => lamina.projects.open(copy.id)).toThrow(`There is no project with id ${copy.id}.`);
    expect(lamina.materials.usage(board.id)).toHaveLength(2); // the emptied copy's cases are gone with it
    lamina.close();
  });

  it('validates project fields and case envelopes before writing', async () => {
    const lamina = await openLamina(tempDatabasePath());
    const board = lamina.materials.findByName('Mineral wool board')!;
    const p = lamina.projects.create({ name: 'Test' });
    const bad: [unknown, string][] = [
      [{ ...wallInputs(board.id), schemaVersion: 2 }, 'inputs.schemaVersion must be 1.'],
      [{ ...wallInputs(board.id), kind: 'sphere' }, 'inputs.kind must be one of pipe, flat, wall.'],
      [{ ...wallInputs(board.id), layers: [] }, 'inputs.layers must list 1 to 50 layers.'],
      [{ ...wallInputs(board.id), layers: [{ materialId: board.id, thickness: 0 }] }, 'inputs.layers[0].thickness must be more than 0 and at most 10 m (got 0).'],
      [{ ...wallInputs(board.id), layers: [{ materialId: 999999, thickness: 0.1 }] }, 'inputs refer to material id 999999, which is not in the library.'],
      [{ ...wallInputs(board.id), claddingMaterialId: 999998 }, 'inputs refer to material id 999998, which is not in the library.'],
      [{ ...wallInputs(board.id), area: -2 }, 'inputs.area must be more than 0 and at most 1000000 m² (got -2).'],
      [{ ...wallInputs(board.id), extra: Number.POSITIVE_INFINITY }, 'inputs.extra must be a finite number.'],
    ];
    for (const [inputs, message] of bad) {
      expect(() => lamina.projects.addCase(p.id, { name: 'c', inputs })).toThrow(message);
    }
    expect(() => lamina.projects.create({ name: 'x', date: '2025-02-30' })).toThrow('date must be a calendar date written YYYY-MM-DD, or empty.');
    expect(() => lamina.projects.create({ name: 'x', unitSystem: 'cubits' })).toThrow('unitSystem must be one of SI, IP.');
    expect(() => lamina.projects.create({ name: 'x'.repeat(201) })).toThrow('name must be 1 to 200 characters long.');
    expect(() => lamina.projects.addCase(-1, { name: 'c', inputs: wallInputs(board.id) })).toThrow(InvalidInputError);
    expect(lamina.projects.open(p.id).cases).toEqual([]);
    lamina.close();
  });

  it('exports one self-contained file and imports it elsewhere, resolving materials that already exist', async () => {
    const home = await openLamina(tempDatabasePath());
    const builtIn = home.materials.findByName('Aluminium cladding, bright rolled')!;
    const own = home.materials.create({ name: 'Brightwater spray foam', category: 'insulation', conductivity: { kind: 'table', points: [[0, 0.022], [40, 0.025]] }, vapourResistanceFactor: Infinity, source: 'Brightwater test sheet (invented demo data)' });
    const clash = home.materials.create({ name: 'Site board', category: 'insulation', conductivity: { kind: 'constant', value: 0.03 } });
    const project = home.projects.create(fields);
    home.projects.addCase(project.id, { name: 'Roof', inputs: { ...wallInputs(own.id, clash.id), claddingMaterialId: builtIn.id } });
    const text = projectFileToJson(home.projects.exportProject(project.id));
    home.close();
    expect(JSON.parse(text).materials.map((m: { name: string }) => m.name).sort()).toEqual(['Aluminium cladding, bright rolled', 'Brightwater spray foam', 'Site board']);

    const away = await openLamina(tempDatabasePath());
    away.materials.create({ name: 'Site board', category: 'insulation', conductivity: { kind: 'constant', value: 0.045 } }); // same name, other data
    const result = away.projects.importProject(projectFileFromJson(text));
    expect(result).toMatchObject({ materialsReused: 1, materialsCreated: 2 });
    const [imported] = result.project.cases;
    const names = imported!.inputs.layers.map((l) => away.materials.get(l.materialId).name);
    expect(names).toEqual(['Brightwater spray foam', 'Site board (imported)']);
    expect(away.materials.get(imported!.inputs['claddingMaterialId'] as number)).toMatchObject({ name: 'Aluminium cladding, bright rolled', builtIn: true });
    expect(away.materials.findByName('Brightwater spray foam')!.vapourResistanceFactor).toBe(Infinity);
    expect(result.project).toMatchObject({ ...fields });
    // Importing the same file again reuses everything.
    expect(away.projects.importProject(projectFileFromJson(text))).toMatchObject({ materialsReused: 3, materialsCreated: 0 });
    away.close();
  });

  it('refuses a project file whose cases refer to materials it does not carry, writing nothing', async () => {
    const lamina = await openLamina(tempDatabasePath());
    const file = { format: 'lamina-project', formatVersion: 1, exportedAt: '', project: { name: 'P' }, materials: [], cases: [{ name: 'c', inputs: wallInputs(7) }] };
    expect(() => lamina.projects.importProject(file)).toThrow('cases[0].inputs.layers[0].materialId refers to material 7, which the file does not include.');
    expect(() => lamina.projects.importProject({ ...file, format: 'other' })).toThrow('format must be "lamina-project"; this is not a Lamina project file.');
    expect(() => projectFileFromJson('{nope')).toThrow(/The project file is not valid JSON/);
    expect(lamina.projects.list()).toEqual([]);
    lamina.close();
  });
});
