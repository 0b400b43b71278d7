import { z } from 'zod';

/** Free space on one of the server's disks; `freeBytes` null when it could not be read. */
export const DiskPlaceSchema = z.object({ freeBytes: z.number().nullable(), low: z.boolean() });

/** Where the database and the uploads live, against the configured low-space threshold (DISK_LOW_MB). */
export const DiskSpaceDtoSchema = z.object({
  low: z.boolean(),
  thresholdBytes: z.number(),
  database: DiskPlaceSchema,
  uploads: DiskPlaceSchema,
});
export type DiskSpaceDto = z.infer<typeof DiskSpaceDtoSchema>;
