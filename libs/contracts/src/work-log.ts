import { THREADLOCKERS, TORQUE_UNITS } from '@benchproof/domain';
import { z } from 'zod';
import { IsoDateSchema, IsoDateTimeSchema } from './common';

export const WorkEntryRequestSchema = z.object({
  description: z.string().trim().min(1).max(2000),
  partsUsed: z.string().trim().max(2000).default(''),
  minutes: z
    .number()
    .int()
    .min(0)
    .max(24 * 60),
  /** Charged to the owner at the shop's labour rate (adds to the job's balance). */
  chargeable: z.boolean().default(false),
});
export type WorkEntryRequest = z.infer<typeof WorkEntryRequestSchema>;

export const WorkEntryDtoSchema = z.object({
  id: z.number().int(),
  description: z.string(),
  partsUsed: z.string(),
  minutes: z.number().int(),
  /** The hourly rate it is charged at, or null when it is not charged. */
  rateMinor: z.number().int().nullable(),
  userId: z.number().int().nullable(),
  userName: z.string().nullable(),
  at: IsoDateTimeSchema,
});
export type WorkEntryDto = z.infer<typeof WorkEntryDtoSchema>;

export const TorqueUnitSchema = z.enum(TORQUE_UNITS);
/** Thread-locking compound used on the fastener (ISO 4210-2 4.3.1, CHECKS.md B.3). */
export const ThreadlockerSchema = z.enum(THREADLOCKERS);

export const TorqueEntryRequestSchema = z.object({
  fastener: z.string().trim().min(1).max(200),
  /** The maker's value (min) or range (min–max), in the unit printed by the maker. */
  specified: z.object({ min: z.number().positive(), max: z.number().positive().nullable().default(null), unit: TorqueUnitSchema }),
  applied: z.object({ value: z.number().positive(), unit: TorqueUnitSchema }),
  /** Wrench tolerance for a single value; default per libs/domain defaultTorqueTolerancePct. */
  tolerancePct: z.number().min(0).max(50).optional(),
  /** Where the specified value comes from (maker's manual, printed on the part). Required. */
  specSource: z.string().trim().min(2).max(300),
  tool: z.string().trim().max(200).default(''),
  /** The wrench's last calibration (YYYY-MM-DD). The server rejects a date in the future. */
  toolCalibratedOn: IsoDateSchema.optional(),
  threadlocker: ThreadlockerSchema.optional(),
  carbonPart: z.boolean().default(false),
});
export type TorqueEntryRequest = z.infer<typeof TorqueEntryRequestSchema>;

export const TorqueEntryDtoSchema = z.object({
  id: z.number().int(),
  fastener: z.string(),
  specified: z.object({ min: z.number(), max: z.number().nullable(), unit: TorqueUnitSchema }),
  applied: z.object({ value: z.number(), unit: TorqueUnitSchema }),
  tolerancePct: z.number().nullable(),
  specSource: z.string(),
  tool: z.string(),
  toolCalibratedOn: IsoDateSchema.nullable(),
  /** True when the calibration was more than 12 months before the entry (libs/domain isWrenchCalibrationOverdue). */
  calibrationOverdue: z.boolean(),
  threadlocker: ThreadlockerSchema.nullable(),
  carbonPart: z.boolean(),
  verdict: z.enum(['within', 'under', 'over']),
  withinTolerance: z.boolean(),
  deviationPct: z.number(),
  appliedNm: z.number(),
  lowNm: z.number(),
  highNm: z.number(),
  message: z.string(),
  /** Always the torque caution; the carbon caution too for carbon parts. */
  cautions: z.array(z.string()),
  userId: z.number().int().nullable(),
  userName: z.string().nullable(),
  at: IsoDateTimeSchema,
});
export type TorqueEntryDto = z.infer<typeof TorqueEntryDtoSchema>;
