import { z } from 'zod';
import { BikeDtoSchema, BikeInputSchema } from './bikes';
import { pagedSchema } from './common';

/** PATCH /bikes/:id sends the whole edit form (the same schema as create; the owner may change). */
export const UpdateBikeRequestSchema = BikeInputSchema;
export type UpdateBikeRequest = z.infer<typeof UpdateBikeRequestSchema>;

/** A bike as listed and shown: its specs plus the owner's name. */
export const BikeListItemSchema = BikeDtoSchema.extend({ ownerName: z.string() });
export type BikeListItem = z.infer<typeof BikeListItemSchema>;

export const BikePageSchema = pagedSchema(BikeListItemSchema);
export type BikePage = z.infer<typeof BikePageSchema>;
