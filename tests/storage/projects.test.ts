import { describe, expect, it } from 'vitest';
import { openLamina } from '../../main/services/lamina-services.js';
import { projectFileFromJson, projectFileToJson } from '../../main/services/project-file.js';
import { RefusedError } from '../../main/services/service-errors.js';
import { InputError } from '../../app/index.js';
import { pipeInputs, seedIds, wallInputs } from './case-fixtures.js';
import { tempDatabasePath } from './temp-folder.js';

// Invented demo scenario: Brightwater Engineering insulating a plant room for Halden Dairy.
const fields = { name: 'Halden Dairy plant room', client: 'Halden Dairy Ltd', site: 'Unit 4, Mill Lane', reference: 'BW-2291', engineer: 'R. Okafor', revision: 'A', date: '2025-02-14', unitSystem: 'SI', notes: '' };

describe('projects', () => {
  it('creates, renames, duplicates, deletes to the recycle bin, restores and empties', async () => {
    const lamina = await openLamina(tempDatabasePath());
    const board = lamina.materials.findByName('Mineral wool board')!;
    const seed = seedIds((name) => lamina.materials.findByName(name));
    const project = lamina.projects.create(fields);
    expect(project).toMatchObject({ ...fields, caseCount: 0, deletedAt: null, cases: [] });
    const steamMain = lamina.projects.addCase(project.id, { name: 'Steam main', inputs: pipeInputs({ pipe: seed.pipeSteel, insulation: [board.id], jacket: seed.cladding }, { length: 42 }) });
    expect(steamMain.inputs).toMatchObject({ pipe: { outerDiameter: 0.1143 }, length: 42 }); // fields beyond the envelope are kept as given
    lamina.projects.addCase(project.id, { name: 'Tank wall', inputs: wallInputs([board.id]) });
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
    const wall = wallInputs([board.id]);
    // The envelope and the material references are the service's own checks; the rest is the engine's parse.
    const bad: [unknown, string][] = [
      [{ ...wall, schemaVersion: 2 }, 'inputs.schemaVersion must be 1.'],
      [{ ...wall, kind: 'sphere' }, 'inputs.kind must be one of pipe, flat, wall.'],
      [{ ...wall, extra: Number.POSITIVE_INFINITY }, 'inputs.extra must be a finite number.'],
      [{ ...wall, layers: [{ materialId: 999999, thickness: 0.1 }] }, 'inputs refer to material id 999999, which is not in the library.'],
      [{ ...wall, claddingMaterialId: 999998 }, 'inputs refer to material id 999998, which is not in the library.'],
      [{ ...wall, layers: [] }, 'layers must list 1 to 100 layers, inside to outside.'],
      [{ ...wall, layers: [{ materialId: board.id, thickness: 0 }] }, 'layers[0].thickness must be at least 0.000001 and at most 5 m (got 0).'],
      [{ ...wall, area: -2 }, 'area must be more than 0 and at most 1000000 m² (got -2).'],
      [{ ...wall, inside: { temperature: 20 } }, 'inside.relativeHumidity must be a finite number in fraction 0..1 (got nothing).'],
    ];
    for (const [inputs, message] of bad) {
      expect(() => lamina.projects.addCase(p.id, { name: 'c', inputs })).toThrow(message);
    }
    expect(() => lamina.projects.create({ name: 'x', date: '2025-02-30' })).toThrow('date must be a calendar date written YYYY-MM-DD, or empty.');
    expect(() => lamina.projects.create({ name: 'x', unitSystem: 'cubits' })).toThrow('unitSystem must be one of SI, IP.');
    expect(() => lamina.projects.create({ name: 'x'.repeat(201) })).toThrow('name must be 1 to 200 characters long.');
    expect(() => lamina.projects.addCase(-1, { name: 'c', inputs: wall })).toThrow(InputError);
    expect(lamina.projects.open(p.id).cases).toEqual([]);
    lamina.close();
  });

  it('refuses, when it is added or saved, a case the engine could not solve, and writes nothing', async () => {
    const lamina = await openLamina(tempDatabasePath());
    const seed = seedIds((name) => lamina.materials.findByName(name));
    // A user insulation without an emissivity: bare on the outside, its surface's radiation is unknown.
    const foam = lamina.materials.create({ name: 'Kestrel site foam', category: 'insulation', conductivity: { kind: 'constant', value: 0.035 } });
    const p = lamina.projects.create({ name: 'Kestrel Lane boiler house' });
    const bare = pipeInputs({ pipe: seed.pipeSteel, insulation: [foam.id] });
    const needsEmissivity =
      'layers[0].material.emissivity is needed for the radiation from the bare insulation surface: give a value from 0 to 1, or add a jacket with an emissivity.';
    expect(() => lamina.projects.addCase(p.id, { name: 'Bare run', inputs: bare })).toThrow(needsEmissivity);
    expect(lamina.projects.open(p.id).cases).toEqual([]);
    expect(lamina.materials.usage(foam.id)).toEqual([]);
    // Under a jacket the same insulation is complete; saving it without the jacket is refused and the stored case kept.
    const clad = lamina.projects.addCase(p.id, { name: 'Clad run', inputs: pipeInputs({ pipe: seed.pipeSteel, insulation: [foam.id], jacket: seed.cladding }) });
    expect(() => lamina.projects.updateCase(clad.id, { inputs: bare })).toThrow(needsEmissivity);
    expect(lamina.projects.getCase(clad.id)).toEqual(clad);
    // A project file carrying that case is refused naming the case, and nothing of it is written.
    const file = projectFileToJson({ ...lamina.projects.exportProject(p.id), cases: [{ name: 'Bare run', inputs: bare }] });
    expect(() => lamina.projects.importProject(projectFileFromJson(file), 'copy')).toThrow(`Case "Bare run" cannot be stored: ${needsEmissivity}`);
    expect(lamina.projects.list().map((project) => project.name)).toEqual(['Kestrel Lane boiler house']);
    lamina.close();
  });

  it('exports one self-contained file and imports it elsewhere, resolving materials that already exist', async () => {
    const home = await openLamina(tempDatabasePath());
    const builtIn = home.materials.findByName('Aluminium cladding, bright rolled')!;
    const own = home.materials.create({ name: 'Brightwater spray foam', category: 'insulation', conductivity: { kind: 'table', points: [[0, 0.022], [40, 0.025]] }, vapourResistanceFactor: Infinity, source: 'Brightwater test sheet (invented demo data)' });
    const clash = home.materials.create({ name: 'Site board', category: 'insulation', conductivity: { kind: 'constant', value: 0.03 } });
    const project = home.projects.create(fields);
    const steel = home.materials.findByName('Carbon steel pipe')!;
    const warm = { inner: { kind: 'surface', temperature: 35 } }; // inside the spray foam's table
    home.projects.addCase(project.id, { name: 'Warm return', inputs: pipeInputs({ pipe: steel.id, insulation: [own.id, clash.id], jacket: builtIn.id }, warm) });
    const text = projectFileToJson(home.projects.exportProject(project.id));
    home.close();
    expect(JSON.parse(text).materials.map((m: { name: string }) => m.name).sort()).toEqual(['Aluminium cladding, bright rolled', 'Brightwater spray foam', 'Carbon steel pipe', 'Site board']);

    const away = await openLamina(tempDatabasePath());
    away.materials.create({ name: 'Site board', category: 'insulation', conductivity: { kind: 'constant', value: 0.045 } }); // same name, other data
    const result = away.projects.importProject(projectFileFromJson(text));
    expect(result).toMatchObject({ materialsReused: 2, materialsCreated: 2 });
    const [imported] = result.project.cases;
    const names = imported!.inputs.layers.map((l) => away.materials.get(l.materialId).name);
    expect(names).toEqual(['Brightwater spray foam', 'Site board (imported)']);
    expect(away.materials.get((imported!.inputs['jacket'] as { materialId: number }).materialId)).toMatchObject({ name: 'Aluminium cladding, bright rolled', builtIn: true });
    expect(away.materials.findByName('Brightwater spray foam')!.vapourResistanceFactor).toBe(Infinity);
    expect(result.project).toMatchObject({ ...fields });
    // The same file again: refused until the user chooses; as a copy it reuses every material.
    expect(() => away.projects.importProject(projectFileFromJson(text))).toThrow(
      `A project "${fields.name}" from the same file is already in the library: choose whether to add this one as a copy or to replace it (onExisting: copy or replace).`,
    );
    expect(away.projects.importProject(projectFileFromJson(text), 'copy')).toMatchObject({ materialsReused: 4, materialsCreated: 0, replaced: null });
    expect(away.projects.list().filter((p) => p.name === fields.name)).toHaveLength(2);
    // Replacing moves one existing copy to the recycle bin, where it can be restored.
    const replacing = away.projects.importProject(projectFileFromJson(text), 'replace');
    expect(replacing.replaced).not.toBeNull();
    expect(away.projects.list().filter((p) => p.name === fields.name)).toHaveLength(2);
    expect(away.projects.listRecycleBin().map((p) => p.id)).toEqual([replacing.replaced]);
    away.close();
  });

  it('refuses a project file whose cases refer to materials it does not carry, writing nothing', async () => {
    const lamina = await openLamina(tempDatabasePath());
    const file = { format: 'lamina-project', formatVersion: 1, exportedAt: '', project: { name: 'P' }, materials: [], cases: [{ name: 'c', inputs: wallInputs([7]) }] };
    expect(() => lamina.projects.importProject(file)).toThrow('cases[0].inputs.layers[0].materialId refers to material 7, which the file does not include.');
    expect(() => lamina.projects.importProject({ ...file, format: 'other' })).toThrow('format must be "lamina-project"; this is not a Lamina project file.');
    expect(() => projectFileFromJson('{nope')).toThrow(/The project file is not valid JSON/);
    expect(lamina.projects.list()).toEqual([]);
    lamina.close();
  });
});
