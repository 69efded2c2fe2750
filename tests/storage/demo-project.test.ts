/**
 * The demo project: a new library opened by the app starts with it, complete and solvable, in the
 * invented creamery scenario of data/examples; it is ordinary data (deletable, and it can be added
 * again), and a library that already exists never gets it again on its own.
 */
import { describe, expect, it } from 'vitest';
import { solveCase } from '../../app/index.js';
import { caseContext } from '../../main/cases/case-context.js';
import { addDemoProject } from '../../main/services/demo-project.js';
import { openLamina } from '../../main/services/lamina-services.js';
import { tempDatabasePath } from './temp-folder.js';

describe('the demo project', () => {
  it('opens with a new library: six solved cases of the invented creamery, pipes, a tank wall, a wall and a roof', async () => {
    const file = tempDatabasePath();
    const lamina = await openLamina(file, { demoProjectOnCreate: true });
    const [demo] = lamina.projects.list();
    expect(lamina.projects.list()).toHaveLength(1);
    expect(demo).toMatchObject({ name: 'Orrin Valley Creamery (demo)', reference: 'BTE-DEMO-001', caseCount: 6 });
    const cases = lamina.projects.open(demo!.id).cases;
    expect(cases.map((c) => c.inputs.kind)).toEqual(['pipe', 'pipe', 'pipe', 'flat', 'wall', 'wall']);
    const context = caseContext(lamina.materials);
    for (const c of cases) {
      const solved = solveCase(c.inputs, context);
      expect(solved.report.keyFigures.length, c.name).toBeGreaterThan(0);
      expect(solved.checks.length, c.name).toBeGreaterThan(0);
    }
    lamina.close();
    // Opened again (not created): nothing is added.
    const again = await openLamina(file, { demoProjectOnCreate: true });
    expect(again.projects.list()).toHaveLength(1);
    again.close();
  });

  it('is ordinary data: removed, then added again from data/demo', async () => {
    const lamina = await openLamina(tempDatabasePath(), { demoProjectOnCreate: true });
    const [demo] = lamina.projects.list();
    lamina.projects.remove(demo!.id);
    expect(lamina.projects.list()).toEqual([]);
    const added = addDemoProject(lamina.projects);
    expect(added.cases).toHaveLength(6);
    expect(lamina.projects.list().map((p) => p.id)).toEqual([added.id]);
    lamina.close();
  });

  it('is not added to a library the command line or a test creates', async () => {
    const lamina = await openLamina(tempDatabasePath());
    expect(lamina.projects.list()).toEqual([]);
    lamina.close();
  });
});
