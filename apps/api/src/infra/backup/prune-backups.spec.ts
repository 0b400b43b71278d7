import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Readable } from 'node:stream';
import { LocalDiskStorage } from '../storage';
import { pruneBackups } from './sqlite-backup';

describe('backup retention (BACKUP_KEEP)', () => {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-prune-'));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('keeps the newest N finished backups, drops older ones and cut-off ones older than the oldest kept', async () => {
    const storage = new LocalDiskStorage(dir);
    const put = (key: string) => storage.put(key, Readable.from([Buffer.from('x')]));
    const finished = ['2026-01-01t00-00-00-000z', '2026-01-02t00-00-00-000z', '2026-01-03t00-00-00-000z', '2026-01-05t00-00-00-000z'];
    for (const id of finished) {
      await put(`backups/${id}/database.sqlite`);
      await put(`backups/${id}/manifest.json`);
    }
    // Cut off before its manifest: one old, one newer than every finished backup (maybe still running).
    await put('backups/2026-01-02t12-00-00-000z/database.sqlite');
    await put('backups/2026-01-06t00-00-00-000z/database.sqlite');
    await put('originals/1/keep-me');

    expect((await pruneBackups(storage, 2)).sort()).toEqual(['2026-01-01t00-00-00-000z', '2026-01-02t00-00-00-000z', '2026-01-02t12-00-00-000z']);
    expect((await storage.list('')).map((o) => o.key)).toEqual([
      'backups/2026-01-03t00-00-00-000z/database.sqlite',
      'backups/2026-01-03t00-00-00-000z/manifest.json',
      'backups/2026-01-05t00-00-00-000z/database.sqlite',
      'backups/2026-01-05t00-00-00-000z/manifest.json',
      'backups/2026-01-06t00-00-00-000z/database.sqlite',
      'originals/1/keep-me',
    ]);
  });
});
