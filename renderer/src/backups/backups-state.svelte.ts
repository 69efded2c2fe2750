/**
 * State of the backups panel and of the library's health: the list of backups, and the
 * database status the Node side reported at start-up (a damaged file is shown, with the offer to
 * restore, and never overwritten).
 */
import type { BackupInfo, DatabaseStatus } from '../../../app/api/contract.js';
import { laminaApi, messageOf } from '../bridge/lamina-api.js';

export class BackupsState {
  status = $state<DatabaseStatus | undefined>(undefined);
  list = $state<readonly BackupInfo[]>([]);
  /** The backup whose Restore was pressed and now waits for confirmation. */
  confirming = $state<BackupInfo | undefined>(undefined);
  busy = $state(false);
  notice = $state<{ kind: 'done' | 'refused'; text: string } | undefined>(undefined);

  get libraryOpen(): boolean {
    return this.status?.state === 'open';
  }

  async refresh(): Promise<void> {
    try {
      this.status = await laminaApi().databaseStatus();
      this.list = await laminaApi().backups.list();
    } catch (error) {
      this.notice = { kind: 'refused', text: messageOf(error) };
    }
  }

  async create(): Promise<void> {
    this.busy = true;
    try {
      const made = await laminaApi().backups.create();
      this.notice = { kind: 'done', text: `Backup made: ${fileNameOf(made.file)}.` };
      this.list = await laminaApi().backups.list();
    } catch (error) {
      this.notice = { kind: 'refused', text: messageOf(error) };
    } finally {
      this.busy = false;
    }
  }

  /** Restores the confirmed backup; returns true when the library is open afterwards. */
  async restoreConfirmed(): Promise<boolean> {
    const backup = this.confirming;
    if (!backup) return false;
    this.busy = true;
    try {
      const result = await laminaApi().backups.restore({ file: backup.file });
      this.status = result.status;
      this.notice = {
        kind: 'done',
        text: `Restored the backup of ${describeDate(backup.createdAt)}.${result.movedAsideTo ? ` The file it replaced was kept as ${fileNameOf(result.movedAsideTo)}.` : ''}`,
      };
      this.list = await laminaApi().backups.list();
      return result.status.state === 'open';
    } catch (error) {
      this.notice = { kind: 'refused', text: messageOf(error) };
      return false;
    } finally {
      this.confirming = undefined;
      this.busy = false;
    }
  }
}

export function fileNameOf(filePath: string): string {
  return filePath.split(/[\\/]/).pop() ?? filePath;
}

const dateFormat = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short' });

export function describeDate(iso: string): string {
  const date = new Date(iso);
  return Number.isFinite(date.getTime()) ? dateFormat.format(date) : iso;
}

const REASONS: Readonly<Record<string, string>> = {
  manual: 'made by hand',
  daily: 'daily',
  'pre-migration': 'before a database upgrade',
  'pre-restore': 'before a restore',
};

export function describeReason(reason: string): string {
  return REASONS[reason] ?? reason;
}

export function describeSize(bytes: number): string {
  if (!Number.isFinite(bytes) || bytes < 0) return '–';
  if (bytes < 1024 * 1024) return `${Math.max(1, Math.round(bytes / 1024))} kB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}
