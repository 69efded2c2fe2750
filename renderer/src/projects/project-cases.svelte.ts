/**
 * The cases of the open project: their list, one case being renamed, and one whose removal waits
 * for a confirmation. Editing a case's inputs is not offered yet; only names and removal are.
 */
import type { ProjectCase } from '../../../app/api/contract.js';
import { laminaApi, messageOf } from '../bridge/lamina-api.js';
import { PROJECT_LIMITS } from '../../../app/api/project-limits.js';

export interface CaseRename {
  readonly caseId: number;
  name: string;
  error: string | undefined;
}

export class ProjectCases {
  list = $state<readonly ProjectCase[]>([]);
  renaming = $state<CaseRename | undefined>(undefined);
  /** The case whose Remove was pressed; a second, explicit press removes it. */
  confirmingRemoval = $state<ProjectCase | undefined>(undefined);
  failure = $state<string | undefined>(undefined);

  constructor(cases: readonly ProjectCase[], private readonly onChanged: () => void) {
    this.list = cases;
  }

  startRename(projectCase: ProjectCase): void {
    this.renaming = { caseId: projectCase.id, name: projectCase.name, error: undefined };
    this.confirmingRemoval = undefined;
    this.failure = undefined;
  }

  async saveRename(): Promise<void> {
    const renaming = this.renaming;
    if (!renaming) return;
    const name = renaming.name.trim();
    if (name.length < 1 || name.length > PROJECT_LIMITS.caseName) {
      renaming.error = `Case name must be 1 to ${PROJECT_LIMITS.caseName} characters long.`;
      return;
    }
    try {
      const saved = await laminaApi().projects.updateCase({ caseId: renaming.caseId, changes: { name } });
      this.list = this.list.map((c) => (c.id === saved.id ? saved : c));
      this.renaming = undefined;
      this.onChanged();
    } catch (error) {
      renaming.error = messageOf(error);
    }
  }

  async remove(projectCase: ProjectCase): Promise<void> {
    this.confirmingRemoval = undefined;
    try {
      await laminaApi().projects.removeCase({ caseId: projectCase.id });
      this.list = this.list.filter((c) => c.id !== projectCase.id);
      this.onChanged();
    } catch (error) {
      this.failure = messageOf(error);
    }
  }
}
