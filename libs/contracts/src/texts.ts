import { z } from 'zod';
import { IdSchema, IsoDateTimeSchema } from './common';

export const TEXT_STATUSES = ['queued', 'sending', 'sent', 'delivered', 'undelivered', 'failed', 'opted_out'] as const;
export const TextStatusSchema = z.enum(TEXT_STATUSES);
export type TextStatus = z.infer<typeof TextStatusSchema>;

/** One text to an owner as desk sees it: where it got to (the provider's delivery report) and why it stopped. */
export const TextMessageDtoSchema = z.object({
  id: IdSchema,
  jobId: IdSchema.nullable(),
  customerId: IdSchema,
  /** 'owner_link', 'estimate_decision', 'ready_to_collect' */
  kind: z.string(),
  /** E.164 */
  to: z.string(),
  /** The text as sent, its link replaced once the provider has it. */
  body: z.string(),
  status: TextStatusSchema,
  attempts: z.number().int(),
  maxAttempts: z.number().int(),
  lastError: z.string().nullable(),
  nextTryAt: IsoDateTimeSchema.nullable(),
  sentAt: IsoDateTimeSchema.nullable(),
  statusAt: IsoDateTimeSchema.nullable(),
  createdAt: IsoDateTimeSchema,
});
export type TextMessageDto = z.infer<typeof TextMessageDtoSchema>;
