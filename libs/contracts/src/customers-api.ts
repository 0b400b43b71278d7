import { type z } from 'zod';
import { pagedSchema } from './common';
import { CustomerDtoSchema, CustomerInputSchema } from './customers';

/** PATCH /customers/:id sends the whole edit form (the same schema as create). */
export const UpdateCustomerRequestSchema = CustomerInputSchema;
export type UpdateCustomerRequest = z.infer<typeof UpdateCustomerRequestSchema>;

export const CustomerPageSchema = pagedSchema(CustomerDtoSchema);
export type CustomerPage = z.infer<typeof CustomerPageSchema>;
