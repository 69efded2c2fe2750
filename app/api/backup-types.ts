/** Backups of the library database, as the API lists them (newest first). */
export interface BackupInfo {
  /** Full path of the backup file; it names the backup in a restore request. */
  readonly file: string;
  /** Why it was made: pre-migration, daily, manual or pre-restore. */
  readonly reason: string;
  /** ISO 8601, UTC. */
  readonly createdAt: string;
  readonly sizeBytes: number;
}

/**
 * Whether the library database is open. When it could not be opened at start-up (damaged,
 * truncated, not a database, newer than this program, read-only folder), the UI shows `message`
 * and offers to restore one of `backups`; the damaged file is never overwritten (a restore moves
 * it aside).
 */
export type DatabaseStatus =
  | {
      readonly state: 'open';
      readonly databasePath: string;
      /** True when this start created the library (a first start): the app then opens on the demo project. */
      readonly createdAtThisStart: boolean;
    }
  | {
      readonly state: 'unavailable';
      readonly databasePath: string;
      /** One sentence from the storage layer: what is wrong and what to do. */
      readonly message: string;
      /** The storage layer's reason, e.g. 'damaged', 'truncated', 'not-a-database', 'newer-schema'. */
      readonly reason: string;
      readonly backups: readonly BackupInfo[];
    };

export interface RestoreResult {
  /** Where the file that was replaced now lies (never deleted), when there was one. */
  readonly movedAsideTo?: string;
  readonly status: DatabaseStatus;
}
