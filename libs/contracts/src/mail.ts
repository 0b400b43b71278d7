import { z } from 'zod';
import { EmailSchema, IdSchema, IsoDateTimeSchema } from './common';

export const OUTBOX_STATUSES = ['queued', 'sending', 'sent', 'failed'] as const;
export const OutboxStatusSchema = z.enum(OUTBOX_STATUSES);
export type OutboxStatus = z.infer<typeof OutboxStatusSchema>;

/** One e-mail of a job as desk sees it: where it is on its way and why it stopped. */
export const OutboxMessageDtoSchema = z.object({
  id: IdSchema,
  jobId: IdSchema.nullable(),
  kind: z.string(),
  reportId: IdSchema.nullable(),
  to: z.string(),
  subject: z.string(),
  status: OutboxStatusSchema,
  attempts: z.number().int(),
  maxAttempts: z.number().int(),
  lastError: z.string().nullable(),
  nextTryAt: IsoDateTimeSchema.nullable(),
  sentAt: IsoDateTimeSchema.nullable(),
  createdAt: IsoDateTimeSchema,
  messageId: z.string(),
  attachments: z.array(z.object({ filename: z.string(), size: z.number().int().nullable() })),
  /** Only a finally failed message can be sent again (a sent one stays sent). */
  canResend: z.boolean(),
});
export type OutboxMessageDto = z.infer<typeof OutboxMessageDtoSchema>;

/** Desk sends an issued report to the owner; `to` overrides the owner's address on file. */
export const SendReportRequestSchema = z.object({
  to: EmailSchema.optional(),
});
export type SendReportRequest = z.infer<typeof SendReportRequestSchema>;
