import fs from 'node:fs';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { isDailyBackupDue, listBackups, restoreBackup } from '../../main/storage/backups.js';
import { openLamina } from '../../main/services/lamina-services.js';
import { tempDatabasePath } from './temp-folder.js';

describe('backups', () => {
  it('makes a daily backup only when the newest is a day old, and keeps a bounded number', async () => {
    const file = tempDatabasePath();
    const lamina = await openLamina(file, { backupsKept: 3 });
    const day = 24 * 3600 * 1000;
    const start = new Date('2025-03-01T08:00:00Z');
    expect(isDailyBackupDue(file, start)).toBe(true);
    expect(await lamina.backups.backupIfDue(start)).toBeDefined();
    expect(await lamina.backups.backupIfDue(new Date(start.getTime() + day - 1000))).toBeUndefined();
    for (let d = 1; d <= 4; d++) expect(await lamina.backups.backupIfDue(new Date(start.getTime() + d * day))).toBeDefined();
    const kept = lamina.backups.list();
    expect(kept).toHaveLength(3);
    expect(kept.map((b) => b.createdAt)).toEqual(['2025-03-05T08:00:00.000Z', '2025-03-04T08:00:00.000Z', '2025-03-03T08:00:00.000Z']);
    // No half-written copies are left behind, and each backup is a sound database.
    expect(fs.readdirSync(lamina.backups.list()[0]!.file.replace(/[^/]+$/, '')).some((n) => n.endsWith('.partial'))).toBe(false);
    for (const b of kept) {
      const copy = new Database(b.file, { readonly: true });
      expect(copy.pragma('integrity_check', { simple: true })).toBe('ok');
      copy.close();
    }
    lamina.close();
  });

  it('restores an earlier state and keeps the replaced database aside', async () => {
    const file = tempDatabasePath();
    let lamina = await openLamina(file);
    lamina.projects.create({ name: 'Before' });
    const backup = await lamina.backups.create();
    lamina.projects.create({ name: 'After' });
    lamina.close();

    const { movedAsideTo } = await restoreBackup(file, backup.file);
    expect(movedAsideTo).toBeDefined();
    lamina = await openLamina(file);
    expect(lamina.projects.list().map((p) => p.name)).toEqual(['Before']);
    lamina.close();
    const aside = new Database(movedAsideTo!, { readonly: true });
    expect((aside.prepare('SELECT name FROM projects ORDER BY id').all() as { name: string }[]).map((r) => r.name)).toEqual(['Before', 'After']);
    aside.close();
    expect(listBackups(file).length).toBeGreaterThanOrEqual(1);
  });
});
