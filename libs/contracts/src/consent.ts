import { z } from 'zod';
import { IsoDateTimeSchema } from './common';

export { CONSENT_WORDING } from './consent-wording';

export const CONSENT_METHODS = ['owner_link', 'in_person'] as const;
export const ConsentMethodSchema = z.enum(CONSENT_METHODS);

/** The owner's own choice on the owner page. */
export const OwnerConsentRequestSchema = z.object({
  granted: z.boolean(),
  nameMakeModel: z.boolean().default(false),
  /** The wording version the owner read; refused if it is no longer current. */
  wordingVersion: z.string().min(1).max(60),
});
export type OwnerConsentRequest = z.infer<typeof OwnerConsentRequestSchema>;

/** Staff record a consent given (or withdrawn) in person, on paper or at the counter. */
export const RecordConsentRequestSchema = OwnerConsentRequestSchema.extend({
  givenByName: z.string().trim().min(1).max(120),
});
export type RecordConsentRequest = z.infer<typeof RecordConsentRequestSchema>;

export const ConsentDtoSchema = z.object({
  id: z.number().int(),
  jobId: z.number().int(),
  granted: z.boolean(),
  nameMakeModel: z.boolean(),
  wordingVersion: z.string(),
  method: ConsentMethodSchema,
  givenByName: z.string(),
  recordedById: z.number().int().nullable(),
  at: IsoDateTimeSchema,
});
export type ConsentDto = z.infer<typeof ConsentDtoSchema>;

/** What staff see on the job: the consent in force, its history (newest first) and the current wording. */
export const ConsentStatusDtoSchema = z.object({
  current: ConsentDtoSchema.nullable(),
  history: z.array(ConsentDtoSchema),
  wordingVersion: z.string(),
});
export type ConsentStatusDto = z.infer<typeof ConsentStatusDtoSchema>;
