import { FINAL_CHECK_ITEMS, JOB_STATUSES, type FinalCheckItem } from '@benchproof/domain';
import { z } from 'zod';
import { NewBikeInputSchema } from './bikes';
import { IdParamSchema, IdSchema, IsoDateSchema, IsoDateTimeSchema, optionalText, pagingQuerySchema, queryList, requiredText } from './common';
import { CustomerInputSchema } from './customers';
import { JOB_SORT_FIELDS } from './jobs-sort';

export const JobStatusSchema = z.enum(JOB_STATUSES);

/**
 * Booking a bike in: an existing customer or a new one, an existing bike or
 * a new one (a new customer always brings a new bike), the owner's own words,
 * the promised date and optionally the mechanic.
 */
export const BookInRequestSchema = z
  .object({
    customerId: IdSchema.optional(),
    newCustomer: CustomerInputSchema.optional(),
    bikeId: IdSchema.optional(),
    newBike: NewBikeInputSchema.optional(),
    reportedSymptoms: requiredText(2000),
    promisedOn: IsoDateSchema,
    mechanicId: IdSchema.nullish(),
  })
  .superRefine((b, ctx) => {
    if ((b.customerId === undefined) === (b.newCustomer === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['customerId'], message: 'Choose an existing customer or enter a new one' });
    }
    if ((b.bikeId === undefined) === (b.newBike === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['bikeId'], message: 'Choose an existing bike or enter a new one' });
    }
    if (b.newCustomer !== undefined && b.bikeId !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['bikeId'], message: 'A new customer needs a new bike' });
    }
  });
export type BookInRequest = z.infer<typeof BookInRequestSchema>;

const PersonSummarySchema = z.object({ id: IdSchema, name: z.string() });

export const JobDtoSchema = z.object({
  id: IdSchema,
  /** "J-2026-0042" (domain formatJobNumber). */
  number: z.string(),
  status: JobStatusSchema,
  customer: PersonSummarySchema,
  bike: z.object({
    id: IdSchema,
    maker: z.string(),
    model: z.string(),
    colour: z.string().nullable(),
    serialNumber: z.string().nullable(),
  }),
  mechanic: PersonSummarySchema.nullable(),
  promisedOn: IsoDateSchema,
  reportedSymptoms: z.string(),
  createdAt: IsoDateTimeSchema,
  /** Promised date passed and the bike is not ready, collected or cancelled. */
  overdue: z.boolean(),
  /** Money still due in the shop's minor units (payments feature); null where the list does not say. */
  dueMinor: z.number().int().nullable(),
});
export type JobDto = z.infer<typeof JobDtoSchema>;

export const JobListQuerySchema = pagingQuerySchema(JOB_SORT_FIELDS).extend({
  status: queryList(JobStatusSchema).optional(),
  mechanicId: IdParamSchema.optional(),
  promisedAfter: IsoDateSchema.optional(),
  promisedBefore: IsoDateSchema.optional(),
  overdue: z.stringbool().optional(),
  /** true: only jobs still open (not collected or cancelled); false: only closed ones. */
  open: z.stringbool().optional(),
  /** true: only jobs that are ready to collect and still have money due. */
  readyUnpaid: z.stringbool().optional(),
});
export type JobListQuery = z.infer<typeof JobListQuerySchema>;

export const TransitionRequestSchema = z.object({
  to: JobStatusSchema,
  note: optionalText(500),
  /** Desk confirms handing the bike over although no report was sent (else REPORT_NOT_SENT). */
  confirmNoReport: z.boolean().optional(),
  /** Why the bike goes home with money still due; without it, a hand-over with a balance answers UNPAID_BALANCE. */
  unpaidReason: optionalText(500).optional(),
});
export type TransitionRequest = z.infer<typeof TransitionRequestSchema>;

const finalCheckItems = Object.fromEntries(FINAL_CHECK_ITEMS.map((item) => [item, z.boolean()])) as Record<FinalCheckItem, z.ZodBoolean>;

/**
 * The final check, signed off by the signed-in user (the api applies
 * domain finalCheckAllowed). Passed only when every item passed; a failed
 * check needs a note saying what to redo.
 */
export const FinalCheckRequestSchema = z
  .object({
    items: z.object(finalCheckItems),
    passed: z.boolean(),
    testRideNotes: optionalText(1000),
    note: optionalText(1000),
  })
  .superRefine((c, ctx) => {
    const allPassed = FINAL_CHECK_ITEMS.every((item) => c.items[item]);
    if (c.passed && !allPassed) {
      ctx.addIssue({ code: 'custom', path: ['passed'], message: 'Every item must pass before the check can pass' });
    }
    if (!c.passed && c.note === null) {
      ctx.addIssue({ code: 'custom', path: ['note'], message: 'Say what needs redoing' });
    }
  });
export type FinalCheckRequest = z.infer<typeof FinalCheckRequestSchema>;
