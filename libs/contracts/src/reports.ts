import { z } from 'zod';
import { IsoDateTimeSchema } from './common';
import { PageSizeSchema } from './shops';

export const REPORT_KINDS = ['draft', 'issued'] as const;
export const REPORT_STATES = ['rendering', 'ready', 'failed'] as const;

/** One rendered report of a job: a draft to preview, or an issued, immutable version. */
export const ReportDtoSchema = z.object({
  id: z.number().int(),
  jobId: z.number().int(),
  kind: z.enum(REPORT_KINDS),
  /** 1, 2, … for issued versions; null for drafts. */
  version: z.number().int().nullable(),
  state: z.enum(REPORT_STATES),
  /** Render progress 0..1 while rendering. */
  progress: z.number(),
  error: z.string().nullable(),
  pageSize: PageSizeSchema,
  pageCount: z.number().int().nullable(),
  byteSize: z.number().int().nullable(),
  /** SHA-256 of the PDF file (hex), once rendered. */
  sha256: z.string().nullable(),
  /** SHA-256 of the report's contents, printed on its last page; issued versions only. */
  fingerprint: z.string().nullable(),
  /** The draft an issued version was made from. */
  fromDraftId: z.number().int().nullable(),
  createdAt: IsoDateTimeSchema,
  createdBy: z.object({ id: z.number().int(), name: z.string() }).nullable(),
  issuedAt: IsoDateTimeSchema.nullable(),
  urls: z.object({ pdf: z.string().nullable(), download: z.string().nullable(), pagePng: z.string().nullable() }),
});
export type ReportDto = z.infer<typeof ReportDtoSchema>;

/** Issuing freezes a rendered draft's contents as the next version; no body fields. */
export const IssueReportRequestSchema = z.object({ draftId: z.number().int().positive() });
export type IssueReportRequest = z.infer<typeof IssueReportRequestSchema>;

/** A 64-hex SHA-256 (file or contents) or the 16-hex short code printed in the verify link. */
export const VerifyHashSchema = z
  .string()
  .trim()
  .toLowerCase()
  .regex(/^([0-9a-f]{16}|[0-9a-f]{64})$/, 'A fingerprint is 64 hexadecimal characters (or the 16-character code from the link)');

/** What the public verify page may learn, and nothing more. */
export const VerifyResultSchema = z.discriminatedUnion('issued', [
  z.object({ issued: z.literal(true), shopName: z.string(), jobNumber: z.string(), version: z.number().int(), issuedAt: IsoDateTimeSchema }),
  z.object({ issued: z.literal(false) }),
]);
export type VerifyResult = z.infer<typeof VerifyResultSchema>;
