import { URGENCIES } from '@benchproof/domain';
import { z } from 'zod';
import { ConditionSchema, InspectionAreaSchema } from './inspection';
import { IsoDateTimeSchema } from './common';

export const FindingInputSchema = z.object({
  area: InspectionAreaSchema,
  condition: ConditionSchema,
  description: z.string().trim().min(1).max(4000),
  checkpointId: z.number().int().positive().nullable().default(null),
});
export const CreateFindingRequestSchema = FindingInputSchema;
export type CreateFindingRequest = z.infer<typeof CreateFindingRequestSchema>;

export const UpdateFindingRequestSchema = z.object({
  area: InspectionAreaSchema.optional(),
  condition: ConditionSchema.optional(),
  description: z.string().trim().min(1).max(4000).optional(),
  checkpointId: z.number().int().positive().nullable().optional(),
});
export type UpdateFindingRequest = z.infer<typeof UpdateFindingRequestSchema>;

export const PartLineInputSchema = z.object({
  description: z.string().trim().min(1).max(200),
  /** May be decimal (1.5 m of housing), at most 4 decimals. */
  qty: z.number().positive().max(10_000),
  /** Net unit price in the currency's minor unit (pence, cents). */
  unitPriceMinor: z.number().int().min(0).max(100_000_000),
});

/** CHECKS.md A.2 step 4: safety-critical, recommended soon, advisory. */
export const UrgencySchema = z.enum(URGENCIES);

/** Create or replace the recommendation of a finding. Labour is in hundredths of an hour (75 = 0.75 h). */
export const RecommendationRequestSchema = z.object({
  summary: z.string().trim().min(1).max(400),
  /** Omitted: derived from the finding's condition (libs/domain defaultUrgency). */
  urgency: UrgencySchema.optional(),
  parts: z.array(PartLineInputSchema).max(50).default([]),
  labourHundredths: z.number().int().min(0).max(100_000),
});
export type RecommendationRequest = z.infer<typeof RecommendationRequestSchema>;

export const DECISION_STATUSES = ['pending', 'approved', 'declined'] as const;
/** How a decision reached us. owner_link is the owner's own page; staff record the others. */
export const DECISION_CHANNELS = ['phone', 'in_person', 'email', 'owner_link'] as const;
export const DecisionStatusSchema = z.enum(DECISION_STATUSES);
export const DecisionChannelSchema = z.enum(DECISION_CHANNELS);
export type DecisionStatus = z.infer<typeof DecisionStatusSchema>;
export type DecisionChannel = z.infer<typeof DecisionChannelSchema>;

export const RecordDecisionRequestSchema = z.object({
  status: DecisionStatusSchema,
  channel: z.enum(['phone', 'in_person', 'email']),
  /** The person who decided (the owner, or someone they named). */
  decidedByName: z.string().trim().min(1).max(120),
  /** When the owner decided; defaults to now. */
  decidedAt: IsoDateTimeSchema.optional(),
  note: z.string().trim().max(1000).default(''),
});
export type RecordDecisionRequest = z.infer<typeof RecordDecisionRequestSchema>;

export const DecisionDtoSchema = z.object({
  id: z.number().int(),
  status: DecisionStatusSchema,
  channel: DecisionChannelSchema,
  decidedByName: z.string(),
  recordedById: z.number().int().nullable(),
  note: z.string(),
  decidedAt: IsoDateTimeSchema,
  recordedAt: IsoDateTimeSchema,
});
export type DecisionDto = z.infer<typeof DecisionDtoSchema>;

export const MoneyTotalsSchema = z.object({
  partsMinor: z.number().int(),
  labourMinor: z.number().int(),
  netMinor: z.number().int(),
  taxMinor: z.number().int(),
  grossMinor: z.number().int(),
});
export type MoneyTotals = z.infer<typeof MoneyTotalsSchema>;

export const RecommendationDtoSchema = z.object({
  id: z.number().int(),
  findingId: z.number().int(),
  summary: z.string(),
  urgency: UrgencySchema,
  parts: z.array(PartLineInputSchema.extend({ totalMinor: z.number().int() })),
  labourHundredths: z.number().int(),
  /** Rates copied from the shop settings when the recommendation was written. */
  labourRateMinor: z.number().int(),
  taxRateBp: z.number().int(),
  currency: z.string(),
  totals: MoneyTotalsSchema,
  decisionStatus: DecisionStatusSchema,
  decisions: z.array(DecisionDtoSchema),
  updatedAt: IsoDateTimeSchema,
});
export type RecommendationDto = z.infer<typeof RecommendationDtoSchema>;

export const FindingDtoSchema = z.object({
  id: z.number().int(),
  jobId: z.number().int(),
  checkpointId: z.number().int().nullable(),
  area: InspectionAreaSchema,
  condition: ConditionSchema,
  description: z.string(),
  /** True for unsafe findings: report and owner page say "Do not ride". */
  doNotRide: z.boolean(),
  cautions: z.array(z.string()),
  recommendation: RecommendationDtoSchema.nullable(),
  createdAt: IsoDateTimeSchema,
  updatedAt: IsoDateTimeSchema,
});
export type FindingDto = z.infer<typeof FindingDtoSchema>;

export const EstimateDtoSchema = z.object({
  jobId: z.number().int(),
  currency: z.string(),
  items: z.array(FindingDtoSchema.extend({ recommendation: RecommendationDtoSchema })),
  /** Each recommendation is priced on its own (tax once on its net); these are sums of those. */
  totals: z.object({ all: MoneyTotalsSchema, approved: MoneyTotalsSchema, pending: MoneyTotalsSchema, declined: MoneyTotalsSchema }),
});
export type EstimateDto = z.infer<typeof EstimateDtoSchema>;
