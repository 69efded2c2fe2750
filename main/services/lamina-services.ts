import { DEFAULT_BACKUPS_KEPT } from '../storage/backups.js';
import { openDatabase } from '../storage/open-database.js';
import { BackupsService } from './backups-service.js';
import type { DatabaseContext } from './database-context.js';
import { MaterialsService } from './materials-service.js';
import { ProjectsService } from './projects-service.js';
import { DEFAULT_SEED_FOLDER, seedBuiltInMaterials } from './seed-materials.js';

/**
 * The one entry point that the Electron IPC handlers, the browser-mode server and the command line
 * share: open the database (read-only checks first, so that a file which is not a Lamina library
 * is refused untouched; then migrations, with a backup before migrating), load the built-in
 * materials, and hand out the typed services.
 */
export interface LaminaServices {
  readonly databasePath: string;
  readonly migratedFrom: number;
  readonly preMigrationBackup?: string;
  readonly materials: MaterialsService;
  readonly projects: ProjectsService;
  readonly backups: BackupsService;
  close(): void;
}

export interface OpenLaminaOptions {
  readonly seedFolder?: string;
  readonly backupsKept?: number;
  readonly busyTimeoutMs?: number;
  /** Create the database's folder when it is missing (default true; see OpenOptions.createFolder). */
  readonly createFolder?: boolean;
}

export async function openLamina(databasePath: string, options: OpenLaminaOptions = {}): Promise<LaminaServices> {
  const keep = options.backupsKept ?? DEFAULT_BACKUPS_KEPT;
  const opened = await openDatabase(databasePath, {
    backupsKept: keep,
    ...(options.busyTimeoutMs ? { busyTimeoutMs: options.busyTimeoutMs } : {}),
    ...(options.createFolder === undefined ? {} : { createFolder: options.createFolder }),
  });
  const context: DatabaseContext = { db: opened.db, path: opened.path };
  try {
    const materials = new MaterialsService(context);
    seedBuiltInMaterials(context, materials, options.seedFolder ?? DEFAULT_SEED_FOLDER);
    return {
      databasePath: opened.path,
      migratedFrom: opened.migratedFrom,
      ...(opened.preMigrationBackup ? { preMigrationBackup: opened.preMigrationBackup } : {}),
      materials,
      projects: new ProjectsService(context, materials),
      backups: new BackupsService(context, keep),
      close: () => opened.db.close(),
    };
  } catch (error) {
    opened.db.close();
    throw error;
  }
}
