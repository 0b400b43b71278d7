import { FINAL_CHECK_ITEMS } from '@benchproof/domain';
import { z } from 'zod';
import { BikeListItemSchema } from './bikes-api';
import { IdSchema, IsoDateSchema, IsoDateTimeSchema, pagedSchema, requiredText } from './common';
import { CustomerDtoSchema } from './customers';
import { JobDtoSchema, JobStatusSchema } from './jobs';

export const UpdateJobRequestSchema = z.object({
  reportedSymptoms: requiredText(2000).optional(),
  promisedOn: IsoDateSchema.optional(),
  mechanicId: IdSchema.nullable().optional(),
});
export type UpdateJobRequest = z.infer<typeof UpdateJobRequestSchema>;

export const JobPageSchema = pagedSchema(JobDtoSchema);
export type JobPage = z.infer<typeof JobPageSchema>;

export const JobTransitionDtoSchema = z.object({ to: JobStatusSchema, label: z.string(), primary: z.boolean() });
export type JobTransitionDto = z.infer<typeof JobTransitionDtoSchema>;

export const FinalCheckDtoSchema = z.object({
  id: IdSchema,
  checker: z.object({ id: IdSchema, name: z.string() }),
  passed: z.boolean(),
  items: z.record(z.enum(FINAL_CHECK_ITEMS), z.boolean()),
  testRideNotes: z.string().nullable(),
  note: z.string().nullable(),
  at: IsoDateTimeSchema,
});
export type FinalCheckDto = z.infer<typeof FinalCheckDtoSchema>;

/** GET /jobs/:id: the job page header and intake section. */
export const JobDetailSchema = JobDtoSchema.extend({
  statusLabel: z.string(),
  bikeDetail: BikeListItemSchema,
  customerDetail: CustomerDtoSchema,
  finalChecker: z.object({ id: IdSchema, name: z.string() }).nullable(),
  /** The header's main button (libs/domain nextAction), or null for a closed job. */
  nextAction: z.object({ to: JobStatusSchema, label: z.string() }).nullable(),
  allowedTransitions: z.array(JobTransitionDtoSchema),
  /** When the job last entered each status (null = never). */
  statusTimes: z.record(JobStatusSchema, IsoDateTimeSchema.nullable()),
  finalCheck: FinalCheckDtoSchema.nullable(),
  /** Shop setting: the final check must be by someone other than the job's mechanic. */
  finalCheckSecondPerson: z.boolean(),
  /** The bike was handed over with no report sent, confirmed by desk. */
  collectedWithoutReport: z.boolean(),
});
export type JobDetail = z.infer<typeof JobDetailSchema>;

export const JobEventSchema = z.object({
  id: IdSchema,
  from: JobStatusSchema.nullable(),
  to: JobStatusSchema,
  user: z.object({ id: IdSchema, name: z.string() }).nullable(),
  note: z.string().nullable(),
  at: IsoDateTimeSchema,
});
export type JobEvent = z.infer<typeof JobEventSchema>;
