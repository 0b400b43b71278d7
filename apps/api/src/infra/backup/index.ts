export { writeBackup, readManifest, listBackups, pruneBackups, restoreBackup, type BackupSummary, type RestoreResult } from './sqlite-backup';
export { backupId, type BackupManifest, type BackupFile } from './backup-manifest';
