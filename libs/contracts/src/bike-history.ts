import { CONDITIONS, MEASUREMENT_KINDS } from '@benchproof/domain';
import { z } from 'zod';
import { BikeDtoSchema } from './bikes';
import { JobDtoSchema } from './jobs';
import { IsoDateSchema, IsoDateTimeSchema } from './common';

export const WearPointSchema = z.object({
  jobId: z.number().int(),
  jobNumber: z.string(),
  at: IsoDateTimeSchema,
  value: z.number(),
  condition: z.enum(CONDITIONS),
});

/** One repeated measurement across visits, e.g. chain elongation in %, front pad thickness in mm. */
export const WearSeriesSchema = z.object({
  key: z.string(),
  kind: z.enum(MEASUREMENT_KINDS),
  label: z.string(),
  unit: z.string(),
  /** The limit the verdicts used (replace-at %, entered minimum mm), when there is one. */
  limit: z.number().nullable(),
  points: z.array(WearPointSchema),
});
export type WearSeries = z.infer<typeof WearSeriesSchema>;

export const BikeHistorySchema = z.object({
  bike: BikeDtoSchema,
  jobs: z.array(JobDtoSchema),
  series: z.array(WearSeriesSchema),
  /** Straight-line estimate from the chain readings' trend; null when the trend cannot say. */
  nextChainDue: z.object({ dueOn: IsoDateSchema, limitPct: z.number(), ratePctPer30Days: z.number(), basis: z.string() }).nullable(),
});
export type BikeHistory = z.infer<typeof BikeHistorySchema>;
