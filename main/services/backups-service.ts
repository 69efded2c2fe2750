import { createBackup, isDailyBackupDue, listBackups, DEFAULT_BACKUPS_KEPT, type BackupInfo } from '../storage/backups.js';
import { describeWriteFailure } from '../storage/storage-error.js';
import type { DatabaseContext } from './database-context.js';

/**
 * Backups of the open database. Restoring needs the database closed, so it is not here but in
 * restoreBackup (main/storage/backups.ts), which the app calls after closing its services.
 */
export class BackupsService {
  constructor(private readonly context: DatabaseContext, private readonly keep: number = DEFAULT_BACKUPS_KEPT) {}

  list(): BackupInfo[] {
    return listBackups(this.context.path);
  }

  async create(): Promise<BackupInfo> {
    try {
      return await createBackup(this.context.db, this.context.path, 'manual', { keep: this.keep });
    } catch (error) {
      throw describeWriteFailure(error, this.context.path);
    }
  }

  /** Makes the daily backup when the newest backup is a day old or there is none. */
  async backupIfDue(now: Date = new Date()): Promise<BackupInfo | undefined> {
    if (!isDailyBackupDue(this.context.path, now)) return undefined;
    try {
      return await createBackup(this.context.db, this.context.path, 'daily', { keep: this.keep, now });
    } catch (error) {
      throw describeWriteFailure(error, this.context.path);
    }
  }

  /**
   * Checks hourly while the app runs; returns a function that stops the timer. A failed backup is
   * reported through `onError` and tried again at the next check; it never stops the app.
   */
  startDailyBackups(onError: (error: unknown) => void, intervalMs = 60 * 60 * 1000): () => void {
    const tick = () => void this.backupIfDue().catch(onError);
    tick();
    const timer = setInterval(tick, intervalMs);
    timer.unref();
    return () => clearInterval(timer);
  }
}
