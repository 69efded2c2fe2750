import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import type { CliIO } from '../../main/cli/command.js';
import { materialsCommand } from '../../main/cli/commands/materials.js';
import { projectsCommand } from '../../main/cli/commands/projects.js';
import { defaultDatabasePath } from '../../main/storage/database-path.js';
import { openLamina } from '../../main/services/lamina-services.js';
import { MATERIAL_CSV_HEADER } from '../../main/services/material-csv.js';
import { wallInputs } from './case-fixtures.js';
import { tempFolder } from './temp-folder.js';

function captured(cwd: string, env: Record<string, string> = {}) {
  const out: string[] = [];
  const err: string[] = [];
  const io: CliIO = { stdout: (t) => out.push(t), stderr: (t) => err.push(t), env, cwd };
  return { io, out: () => out.join(''), err: () => err.join('') };
}

describe('lamina materials / projects commands', () => {
  it('lists, shows, imports and exports materials against --db', async () => {
    const cwd = tempFolder();
    let c = captured(cwd);
    expect(await materialsCommand(['list', '--db', 'lib.sqlite', '--category', 'cladding'], c.io)).toBe(0);
    expect(c.out()).toMatch(/built-in\tcladding\tAluminium cladding, bright rolled\t160 W\/\(m.K\)/);
    expect(fs.existsSync(path.join(cwd, 'lib.sqlite'))).toBe(true);

    fs.writeFileSync(path.join(cwd, 'in.csv'), `${MATERIAL_CSV_HEADER.join(',')}\nGood,insulation,0.04,,,,,,,,,\nBad,insulation,abc,,,,,,,,,\n`);
    c = captured(cwd, { LAMINA_DB: 'lib.sqlite' });
    expect(await materialsCommand(['import', 'in.csv'], c.io)).toBe(2);
    expect(c.err()).toBe('in.csv line 3: conductivity [W/(m.K)] "abc" is not a number.\nNothing was imported: 1 problem(s).\n');

    fs.writeFileSync(path.join(cwd, 'in.csv'), `${MATERIAL_CSV_HEADER.join(',')}\nGood,insulation,0.04,,,,,,,,"Brightwater sheet",\n`);
    c = captured(cwd, { LAMINA_DB: 'lib.sqlite' });
    expect(await materialsCommand(['import', 'in.csv'], c.io)).toBe(0);
    c = captured(cwd);
    expect(await materialsCommand(['show', 'Good', '--db', 'lib.sqlite', '--json'], c.io)).toBe(0);
    expect(JSON.parse(c.out())).toMatchObject({ name: 'Good', source: 'Brightwater sheet', builtIn: false });
    c = captured(cwd);
    expect(await materialsCommand(['export', '-', '--db', 'lib.sqlite', '--origin', 'user'], c.io)).toBe(0);
    expect(c.out()).toBe(`${MATERIAL_CSV_HEADER.join(',')}\nGood,insulation,0.04,,,,,,,,Brightwater sheet,\n`);

    c = captured(cwd);
    expect(await materialsCommand(['list', '--db', 'lib.sqlite', '--origin', 'mine'], c.io)).toBe(2);
    expect(c.err()).toBe('origin must be one of all, built-in, user.\n');
    c = captured(cwd);
    expect(await materialsCommand(['frobnicate'], c.io)).toBe(2);
    c = captured(cwd);
    expect(await materialsCommand(['show', '99999', '--db', 'lib.sqlite'], c.io)).toBe(2);
    expect(c.err()).toBe('There is no material with id 99999.\n');
  });

  it('exports a project from one database and imports it into another', async () => {
    const cwd = tempFolder();
    const lamina = await openLamina(path.join(cwd, 'a.sqlite'));
    const board = lamina.materials.findByName('Mineral wool board')!;
    const p = lamina.projects.create({ name: 'Larkfield school boiler room', client: 'Larkfield Trust' });
    lamina.projects.addCase(p.id, { name: 'Wall', inputs: wallInputs([board.id]) });
    lamina.close();
    let c = captured(cwd);
    expect(await projectsCommand(['export', String(p.id), 'p.json', '--db', 'a.sqlite'], c.io)).toBe(0);
    c = captured(cwd);
    expect(await projectsCommand(['import', 'p.json', '--db', 'b.sqlite'], c.io)).toBe(0);
    expect(c.out()).toMatch(/^Imported project 1 "Larkfield school boiler room" with 1 case\(s\); materials reused 1, added 0\.\n$/);
    c = captured(cwd);
    expect(await projectsCommand(['list', '--db', 'b.sqlite', '--json'], c.io)).toBe(0);
    expect(JSON.parse(c.out())).toMatchObject([{ name: 'Larkfield school boiler room', client: 'Larkfield Trust', caseCount: 1 }]);
    c = captured(cwd);
    expect(await projectsCommand(['export', 'x', 'p.json'], c.io)).toBe(2);
  });

  it('reports a damaged database with exit code 1 and one clear line', async () => {
    const cwd = tempFolder();
    fs.writeFileSync(path.join(cwd, 'junk.sqlite'), 'hello');
    const c = captured(cwd);
    expect(await projectsCommand(['list', '--db', 'junk.sqlite'], c.io)).toBe(1);
    expect(c.err()).toBe(`The file ${path.join(cwd, 'junk.sqlite')} is not a Lamina database (it is not an SQLite file): choose another file or restore a backup; Lamina has not changed it.\n`);
  });

  it('documents a default database path per system', () => {
    expect(defaultDatabasePath({ platform: 'linux', env: {}, home: '/home/ana' })).toBe('/home/ana/.local/share/lamina/lamina.sqlite');
    expect(defaultDatabasePath({ platform: 'linux', env: { XDG_DATA_HOME: '/data' }, home: '/home/ana' })).toBe('/data/lamina/lamina.sqlite');
    expect(defaultDatabasePath({ platform: 'darwin', env: {}, home: '/Users/ana' })).toBe('/Users/ana/Library/Application Support/Lamina/lamina.sqlite');
    expect(defaultDatabasePath({ platform: 'win32', env: { APPDATA: 'C:\\Users\\ana\\AppData\\Roaming' }, home: 'C:\\Users\\ana' })).toBe('C:\\Users\\ana\\AppData\\Roaming\\Lamina\\lamina.sqlite');
  });
});
