import { z } from 'zod';
import { AuditEventSchema } from './audit';
import { ConsentDtoSchema } from './consent';
import { IsoDateTimeSchema } from './common';
import { DecisionStatusSchema, MoneyTotalsSchema, UrgencySchema } from './findings';
import { ConditionSchema, InspectionAreaSchema } from './inspection';

/** Desk creates (or re-sends) the owner link of a job. A new link replaces the earlier ones. */
export const CreateOwnerLinkRequestSchema = z.object({
  expiresInDays: z.number().int().min(1).max(60).default(14),
  /** E-mail it to the owner through the outbox (when the shop has a mail service). */
  send: z.boolean().default(true),
});
export type CreateOwnerLinkRequest = z.infer<typeof CreateOwnerLinkRequestSchema>;

export const OwnerLinkStateSchema = z.enum(['active', 'expired', 'revoked']);
export const OwnerLinkDtoSchema = z.object({
  id: z.number().int(),
  jobId: z.number().int(),
  state: OwnerLinkStateSchema,
  createdAt: IsoDateTimeSchema,
  createdById: z.number().int(),
  expiresAt: IsoDateTimeSchema,
  revokedAt: IsoDateTimeSchema.nullable(),
  lastViewedAt: IsoDateTimeSchema.nullable(),
  sentTo: z.string(),
});
export type OwnerLinkDto = z.infer<typeof OwnerLinkDtoSchema>;

/** Answer to a create: the only time the link's URL exists outside the owner's inbox. */
export const CreatedOwnerLinkDtoSchema = z.object({
  link: OwnerLinkDtoSchema,
  url: z.string(),
  /** How the link went to the owner: by e-mail or, for an owner who prefers texts, by text. */
  mail: z.object({ status: z.enum(['queued', 'not_sent']), reason: z.string().nullable(), channel: z.enum(['email', 'sms']).nullable() }),
});
export type CreatedOwnerLinkDto = z.infer<typeof CreatedOwnerLinkDtoSchema>;

/** Owner-side events shown to staff on the job (audit rows). */
export const OwnerActivityDtoSchema = z.array(AuditEventSchema);

/** Pushed to staff on the job page (Server-Sent Events) when the owner does something. */
export const OwnerEventSchema = z.object({
  type: z.enum(['viewed', 'decided', 'consent', 'link']),
  jobId: z.number().int(),
  at: IsoDateTimeSchema,
});
export type OwnerEvent = z.infer<typeof OwnerEventSchema>;

export const OwnerShotSchema = z.object({
  id: z.number().int(),
  caption: z.string(),
  width: z.number().int().nullable(),
  height: z.number().int().nullable(),
  thumbUrl: z.string(),
  screenUrl: z.string(),
});
export type OwnerShot = z.infer<typeof OwnerShotSchema>;

export const OwnerRecommendationSchema = z.object({
  id: z.number().int(),
  summary: z.string(),
  urgency: UrgencySchema,
  currency: z.string(),
  totals: MoneyTotalsSchema,
  decisionStatus: DecisionStatusSchema,
  /** The version the owner decides on; a decision on an older one is refused (PRICE_CHANGED). */
  updatedAt: IsoDateTimeSchema,
});

export const OwnerFindingSchema = z.object({
  id: z.number().int(),
  area: InspectionAreaSchema,
  condition: ConditionSchema,
  description: z.string(),
  doNotRide: z.boolean(),
  cautions: z.array(z.string()),
  shots: z.array(OwnerShotSchema),
  recommendation: OwnerRecommendationSchema.nullable(),
});
export type OwnerFinding = z.infer<typeof OwnerFindingSchema>;

export const OwnerMeasurementSchema = z.object({
  id: z.number().int(),
  kind: z.string(),
  condition: ConditionSchema,
  verdict: z.string(),
  explanation: z.string(),
});

export const OwnerPairSchema = z.object({ id: z.number().int(), caption: z.string(), before: OwnerShotSchema, after: OwnerShotSchema });
export type OwnerPair = z.infer<typeof OwnerPairSchema>;

export const OwnerPageDtoSchema = z.object({
  shop: z.object({ name: z.string(), phone: z.string(), email: z.string(), brandPrimary: z.string(), brandAccent: z.string(), dateLocale: z.string() }),
  job: z.object({ number: z.string(), status: z.string(), reportedSymptoms: z.string(), promisedOn: z.string().nullable() }),
  bike: z.object({ maker: z.string(), model: z.string(), year: z.number().int().nullable(), colour: z.string().nullable() }),
  ownerName: z.string(),
  expiresAt: IsoDateTimeSchema,
  findings: z.array(OwnerFindingSchema),
  measurements: z.array(OwnerMeasurementSchema),
  pairs: z.array(OwnerPairSchema),
  report: z.object({ issuedAt: IsoDateTimeSchema, pdfUrl: z.string() }).nullable(),
  consent: ConsentDtoSchema.nullable(),
});
export type OwnerPageDto = z.infer<typeof OwnerPageDtoSchema>;

export const OwnerDecisionItemSchema = z.object({
  recommendationId: z.number().int().positive(),
  status: z.enum(['approved', 'declined']),
  /** What the owner saw: the recommendation's version and gross price. */
  seenUpdatedAt: IsoDateTimeSchema,
  seenGrossMinor: z.number().int().min(0),
  /** Declining a safety item needs this second confirmation. */
  safetyConfirmed: z.boolean().default(false),
});
/** One answer per item: a submission naming an item twice (same or opposite answers) is refused whole. */
export const OwnerDecisionsRequestSchema = z.object({
  items: z
    .array(OwnerDecisionItemSchema)
    .min(1)
    .max(100)
    .superRefine((items, ctx) => {
      const seen = new Set<number>();
      items.forEach((item, i) => {
        if (seen.has(item.recommendationId))
          ctx.addIssue({ code: 'custom', path: [i, 'recommendationId'], message: 'This item is answered twice; give one answer per item.' });
        seen.add(item.recommendationId);
      });
    }),
});
export type OwnerDecisionsRequest = z.infer<typeof OwnerDecisionsRequestSchema>;
