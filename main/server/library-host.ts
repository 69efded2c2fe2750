/**
 * Holds the one open library (LaminaServices) for the desktop app or the browser-mode server.
 *
 * Opened once at start-up. A database that cannot be opened (damaged, truncated, not a database,
 * newer than this program, read-only) does not stop the program: the host remembers why, the UI
 * shows that sentence and offers to restore a backup, and the file is never written to. Restoring
 * closes the library, replaces the file (the old one is moved aside by restoreBackup) and reopens.
 */
import type { BackupInfo, DatabaseStatus, RestoreResult } from '../../app/api/backup-types.js';
import { listBackups, restoreBackup } from '../storage/backups.js';
import { StorageError } from '../storage/storage-error.js';
import { openLamina, type LaminaServices, type OpenLaminaOptions } from '../services/lamina-services.js';

/** A request the library cannot serve in its current state (not open, or being restored). */
export class LibraryUnavailableError extends Error {
  override name = 'LibraryUnavailableError';
}

export interface LibraryHostOptions extends OpenLaminaOptions {
  /** Called with a daily backup that failed; the app keeps running and tries again later. */
  readonly onBackupError?: (error: unknown) => void;
  /** Whether to run the daily backup timer while the library is open (default true). */
  readonly dailyBackups?: boolean;
}

export class LibraryHost {
  private services: LaminaServices | undefined;
  private failure: { message: string; reason: string } | undefined;
  private stopDailyBackups: (() => void) | undefined;
  /** Work that must finish before the database is closed (a backup in progress, a restore). */
  private queue: Promise<unknown> = Promise.resolve();
  private closed = false;

  private constructor(readonly databasePath: string, private readonly options: LibraryHostOptions) {}

  /** The data folder (demo/, examples/) the library was opened with; undefined for the project's own. */
  get dataFolder(): string | undefined {
    return this.options.dataFolder;
  }

  /** Opens the library; never throws for a storage problem (see status()). */
  static async open(databasePath: string, options: LibraryHostOptions = {}): Promise<LibraryHost> {
    const host = new LibraryHost(databasePath, options);
    await host.openNow();
    return host;
  }

  status(): DatabaseStatus {
    if (this.services) return { state: 'open', databasePath: this.services.databasePath, createdAtThisStart: this.services.migratedFrom === 0 };
    const failure = this.failure ?? { message: 'The library is closed.', reason: 'closed' };
    return { state: 'unavailable', databasePath: this.databasePath, ...failure, backups: this.backups() };
  }

  /** The open services, or a one-sentence refusal saying why there are none. */
  library(): LaminaServices {
    if (this.services) return this.services;
    if (this.failure) {
      throw new LibraryUnavailableError(`The library is not open: ${this.failure.message}`);
    }
    throw new LibraryUnavailableError('The library is closed.');
  }

  /** Listing backups reads the folder only, so it works even when the database could not be opened. */
  backups(): BackupInfo[] {
    return listBackups(this.databasePath);
  }

  /** Runs async work on the open library so that a restore or close waits for it to finish. */
  withLibrary<T>(work: (services: LaminaServices) => Promise<T>): Promise<T> {
    const run = this.queue.then(() => work(this.library()));
    this.queue = run.catch(() => undefined);
    return run;
  }

  /**
   * Replaces the database by one of its listed backups and reopens it. `file` must be exactly one
   * of the paths backups() lists: the API never restores from an arbitrary path.
   */
  restore(file: string): Promise<RestoreResult> {
    const run = this.queue.then(async () => {
      const backup = this.backups().find((b) => b.file === file);
      if (!backup) throw new LibraryUnavailableError(`file must name one of the listed backups; "${file}" is not one.`);
      this.closeNow();
      let moved: { movedAsideTo?: string };
      try {
        // restoreBackup checks the backup before it moves anything, so a failure leaves the old file in place.
        moved = await restoreBackup(this.databasePath, backup.file);
      } finally {
        await this.openNow();
      }
      return { ...moved, status: this.status() };
    });
    this.queue = run.catch(() => undefined);
    return run;
  }

  /** Stops the daily backups and closes the database once pending work has finished. */
  async close(): Promise<void> {
    this.closed = true;
    await this.queue;
    this.closeNow();
  }

  private async openNow(): Promise<void> {
    if (this.closed) return;
    try {
      this.services = await openLamina(this.databasePath, this.options);
      this.failure = undefined;
    } catch (error) {
      if (!(error instanceof StorageError)) throw error;
      this.services = undefined;
      this.failure = { message: error.message, reason: error.code };
      return;
    }
    if (this.options.dailyBackups !== false) this.startDailyBackups();
  }

  /**
   * Hourly check for the daily backup (and one now). It goes through the same queue as a restore,
   * so the database is never closed under a backup in progress.
   */
  private startDailyBackups(): void {
    const onError = this.options.onBackupError ?? ((error: unknown) => console.error('Lamina: the daily backup failed:', error));
    const tick = () => {
      if (this.services) void this.withLibrary((services) => services.backups.backupIfDue()).catch(onError);
    };
    tick();
    const timer = setInterval(tick, 60 * 60 * 1000);
    timer.unref();
    this.stopDailyBackups = () => clearInterval(timer);
  }

  private closeNow(): void {
    this.stopDailyBackups?.();
    this.stopDailyBackups = undefined;
    this.services?.close();
    this.services = undefined;
  }
}
