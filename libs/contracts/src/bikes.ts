import { BRAKE_TYPES, CABLE_ROUTINGS, DROPOUT_TYPES, FRAME_MATERIALS, MAX_DRIVETRAIN_SPEEDS, MIN_DRIVETRAIN_SPEEDS, isTyreSize } from '@benchproof/domain';
import { z } from 'zod';
import { IdSchema, IdParamSchema, IsoDateTimeSchema, optionalText, pagingQuerySchema, requiredText } from './common';

export const FrameMaterialSchema = z.enum(FRAME_MATERIALS);
export const BrakeTypeSchema = z.enum(BRAKE_TYPES);
export const CableRoutingSchema = z.enum(CABLE_ROUTINGS);
export const DropoutTypeSchema = z.enum(DROPOUT_TYPES);

/** Model year: 1900 to next year, checked when parsed (a bike of next season's model year is normal). */
const YearSchema = z
  .int()
  .min(1900)
  .refine((y) => y <= new Date().getFullYear() + 1, 'Year cannot be later than next year')
  .nullish()
  .transform((v) => v ?? null);

/** ISO 5775 tyre designation like 28-622 (domain parseTyreSize), or empty. */
const TyreSizeSchema = optionalText(10).refine((v) => v === null || isTyreSize(v), 'Use the ISO 5775 size printed on the tyre, e.g. 28-622');

const bikeFields = {
  maker: requiredText(80),
  model: requiredText(80),
  year: YearSchema,
  frameMaterial: FrameMaterialSchema,
  size: optionalText(40),
  colour: optionalText(40),
  serialNumber: optionalText(60),
  drivetrainSpeeds: z.int().min(MIN_DRIVETRAIN_SPEEDS).max(MAX_DRIVETRAIN_SPEEDS),
  brakeType: BrakeTypeSchema,
  cableRouting: CableRoutingSchema,
  dropoutType: DropoutTypeSchema,
  tyreSize: TyreSizeSchema,
};

/** A bike without its owner, as entered at booking-in for a new bike. */
export const NewBikeInputSchema = z.object(bikeFields);
export type NewBikeInput = z.infer<typeof NewBikeInputSchema>;

export const BikeInputSchema = z.object({ customerId: IdSchema, ...bikeFields });
export type BikeInput = z.infer<typeof BikeInputSchema>;

export const BikeDtoSchema = z.object({
  id: IdSchema,
  customerId: IdSchema,
  maker: z.string(),
  model: z.string(),
  year: z.int().nullable(),
  frameMaterial: FrameMaterialSchema,
  size: z.string().nullable(),
  colour: z.string().nullable(),
  serialNumber: z.string().nullable(),
  drivetrainSpeeds: z.int(),
  brakeType: BrakeTypeSchema,
  cableRouting: CableRoutingSchema,
  dropoutType: DropoutTypeSchema,
  tyreSize: z.string().nullable(),
  createdAt: IsoDateTimeSchema,
});
export type BikeDto = z.infer<typeof BikeDtoSchema>;

export const BIKE_SORT_FIELDS = ['createdAt', 'maker'] as const;
export const BikeListQuerySchema = pagingQuerySchema(BIKE_SORT_FIELDS).extend({
  customerId: IdParamSchema.optional(),
});
export type BikeListQuery = z.infer<typeof BikeListQuerySchema>;
