import { DEFAULT_BACKUPS_KEPT } from '../storage/backups.js';
import { openDatabase } from '../storage/open-database.js';
import { BackupsService } from './backups-service.js';
import { addDemoProject } from './demo-project.js';
import type { DatabaseContext } from './database-context.js';
import { LetterheadService } from './letterhead-service.js';
import { MaterialsService } from './materials-service.js';
import { ProjectsService } from './projects-service.js';
import { SchedulesService } from './schedules-service.js';
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
  /** Each project's schedule of pipe runs, sized in one go. */
  readonly schedules: SchedulesService;
  /** The library's letterhead for printed reports (the settings table). */
  readonly letterhead: LetterheadService;
  readonly backups: BackupsService;
  close(): void;
}

export interface OpenLaminaOptions {
  readonly seedFolder?: string;
  readonly backupsKept?: number;
  readonly busyTimeoutMs?: number;
  /** Create the database's folder when it is missing (default true; see OpenOptions.createFolder). */
  readonly createFolder?: boolean;
  /**
   * Add the demo project (data/demo) to a library this call creates, so a new user meets a complete,
   * solved example (default false: the app asks for it; the command line and tests do not).
   */
  readonly demoProjectOnCreate?: boolean;
  /** The data folder holding demo/ and examples/ (default the project's data/; the packaged app passes its own). */
  readonly dataFolder?: string;
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
    const letterhead = new LetterheadService(context);
    const projects = new ProjectsService(context, materials, letterhead);
    // migratedFrom 0: this call created the file (a first start).
    if (options.demoProjectOnCreate && opened.migratedFrom === 0) addDemoProject(projects, options.dataFolder);
    return {
      databasePath: opened.path,
      migratedFrom: opened.migratedFrom,
      ...(opened.preMigrationBackup ? { preMigrationBackup: opened.preMigrationBackup } : {}),
      materials,
      projects,
      schedules: new SchedulesService(context, materials),
      letterhead,
      backups: new BackupsService(context, keep),
      close: () => opened.db.close(),
    };
  } catch (error) {
    opened.db.close();
    throw error;
  }
}
