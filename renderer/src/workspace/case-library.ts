/**
 * What the page needs to solve a project's cases itself: the library's materials by id and the
 * pipe-size tables, fetched once when a project opens. The same context the Node side gives the
 * engine (main/cases/case-context.ts), so a case reads the same in the list as in `lamina solve`.
 */
import type { Material } from '../../../app/api/contract.js';
import type { CaseContext } from '../../../app/index.js';
import { laminaApi } from '../bridge/lamina-api.js';

export interface CaseLibrary {
  readonly materials: readonly Material[];
  readonly context: CaseContext;
}

export async function loadCaseLibrary(): Promise<CaseLibrary> {
  const [materials, pipeSizes] = await Promise.all([laminaApi().materials.list({ origin: 'all' }), laminaApi().pipeSizes()]);
  const byId = new Map(materials.map((m) => [m.id, m]));
  return { materials, context: { resolveMaterial: (id) => byId.get(id), pipeSizes } };
}
