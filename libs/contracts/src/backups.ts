import { z } from 'zod';

/** One finished backup: a database copy plus a manifest of the stored files it refers to. */
export const BackupSummarySchema = z.object({
  id: z.string(),
  createdAt: z.string(),
  databaseBytes: z.number().int(),
  /** Media originals, issued reports and logos the copy refers to (kept in storage, not copied). */
  files: z.number().int(),
  fileBytes: z.number().int(),
});
export type BackupSummary = z.infer<typeof BackupSummarySchema>;

export const BackupListSchema = z.object({
  backups: z.array(BackupSummarySchema),
  /** How many are kept (BACKUP_KEEP) and how often one is made (hours; 0 = only on demand). */
  keep: z.number().int(),
  everyHours: z.number(),
  /** Where they are written: 'local' (the uploads folder) or 's3'. */
  storage: z.enum(['local', 's3']),
});
export type BackupList = z.infer<typeof BackupListSchema>;
