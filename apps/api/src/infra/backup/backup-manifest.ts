import type Database from 'better-sqlite3';

/** One stored file a backup refers to; media originals, issued reports and logos are written once and never change. */
export interface BackupFile {
  key: string;
  /** Null for a logo (its size is not recorded). */
  bytes: number | null;
  sha256: string;
  kind: 'original' | 'report' | 'logo';
}

export interface BackupManifest {
  format: 1;
  id: string;
  createdAt: string;
  /** The database copy beside this manifest. */
  database: { key: string; bytes: number; sha256: string };
  /** Files the database refers to that the backup does not copy (they already sit, unchangeable, in the same storage). */
  files: BackupFile[];
}

export const BACKUP_PREFIX = 'backups/';
export const databaseKey = (id: string) => `${BACKUP_PREFIX}${id}/database.sqlite`;
export const manifestKey = (id: string) => `${BACKUP_PREFIX}${id}/manifest.json`;

/** A backup id is its UTC time in a storage-safe form: 2026-12-05t16-20-00-123z (sorts by time). */
export function backupId(at: Date): string {
  return at.toISOString().toLowerCase().replace(/[:.]/g, '-');
}

/** Every immutable file the database refers to, read from the copy itself so it matches it exactly. */
export function referencedFiles(copy: Database.Database): BackupFile[] {
  const rows = copy
    .prepare(
      `SELECT original_key AS key, byte_size AS bytes, sha256, 'original' AS kind FROM media_assets WHERE original_key IS NOT NULL
       UNION ALL SELECT storage_key, byte_size, sha256, 'report' FROM reports WHERE kind = 'issued' AND storage_key IS NOT NULL AND sha256 IS NOT NULL
       UNION ALL SELECT logo_key, NULL, logo_sha256, 'logo' FROM shops WHERE logo_key IS NOT NULL AND logo_sha256 IS NOT NULL
       ORDER BY 1`,
    )
    .all() as BackupFile[];
  return rows;
}
