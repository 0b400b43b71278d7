import { z } from 'zod';
import { RoleSchema } from './auth';

export const CreateUserRequestSchema = z.object({
  name: z.string().trim().min(2, 'Enter the full name').max(120),
  email: z.email('Enter a valid e-mail address').max(200),
  role: RoleSchema,
  password: z.string().min(10, 'At least 10 characters').max(200),
});
export type CreateUserRequest = z.infer<typeof CreateUserRequestSchema>;

export const UpdateUserRequestSchema = z
  .object({ role: RoleSchema.optional(), active: z.boolean().optional(), name: z.string().trim().min(2).max(120).optional() })
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change');
export type UpdateUserRequest = z.infer<typeof UpdateUserRequestSchema>;

export const UserDtoSchema = z.object({
  id: z.number().int(),
  name: z.string(),
  email: z.string(),
  role: RoleSchema,
  active: z.boolean(),
});
export type UserDto = z.infer<typeof UserDtoSchema>;
