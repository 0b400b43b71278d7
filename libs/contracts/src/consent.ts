import { z } from 'zod';
import { IsoDateTimeSchema } from './common';

/**
 * The consent wording, kept in code with a version id so every recorded
 * consent points at the exact words the owner saw. Change the text → bump the
 * version; old consents keep their version. Our own wording.
 */
export const CONSENT_WORDING = {
  version: 'marketing-photos-v1',
  title: 'May we show your bike in our marketing?',
  paragraphs: [
    'We would like to use some before-and-after photos from this visit on our website, in our shop and on social media, to show the kind of work we do.',
    'Only photos of the bike and its parts are used. No people, faces, number plates, addresses or other personal details appear: we crop or blur anything like that before use.',
    'Your name is never shown. You choose below whether the bike’s make and model may be named.',
    'You can withdraw this consent at any time on this page or by asking the shop. We then stop using the photos straight away in anything we publish from then on.',
  ],
  makeModelLabel: 'The make and model of my bike may be named',
} as const;

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
