import { z } from 'zod';

/** A cell as SQLite stores it: text, a number, or null (JSON columns stay text, as stored). */
export const ExportCellSchema = z.union([z.string(), z.number(), z.null()]);

/** `data/<table>.json` in a shop or customer export: one file per record table. */
export const ExportTableFileSchema = z.object({
  table: z.string().min(1),
  columns: z.array(z.string().min(1)),
  rows: z.array(z.record(z.string(), ExportCellSchema)),
});
export type ExportTableFile = z.infer<typeof ExportTableFileSchema>;

export const ExportManifestEntrySchema = z.object({
  path: z.string().min(1),
  bytes: z.number().int().min(0),
  /** SHA-256 (hex) of the bytes in the zip. */
  sha256: z.string().regex(/^[0-9a-f]{64}$/),
});

/** `manifest.json`, the last entry of every export zip. */
export const ExportManifestSchema = z.object({
  format: z.literal(1),
  scope: z.enum(['shop', 'customer']),
  shopId: z.number().int(),
  customerId: z.number().int().nullable(),
  createdAt: z.string(),
  files: z.array(ExportManifestEntrySchema),
});
export type ExportManifest = z.infer<typeof ExportManifestSchema>;

/** Erasing a customer is final: the request must repeat the customer's number as confirmation. */
export const EraseCustomerRequestSchema = z.object({ confirmCustomerId: z.number().int().positive() });
export type EraseCustomerRequest = z.infer<typeof EraseCustomerRequestSchema>;

export const EraseCustomerResultSchema = z.object({
  customerId: z.number().int(),
  jobs: z.number().int(),
  /** Photos and videos deleted (jobs never handed over). */
  mediaDeleted: z.number().int(),
  /** Photos kept as the record of work handed over (they show the bike). */
  mediaKept: z.number().int(),
  reportFilesDeleted: z.number().int(),
});
export type EraseCustomerResult = z.infer<typeof EraseCustomerResultSchema>;
