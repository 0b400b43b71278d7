import { z } from 'zod';
import { RoleSchema } from './auth';
import { IdSchema, IsoDateTimeSchema } from './common';

/** Minimum password length for staff accounts. */
export const MIN_PASSWORD_LENGTH = 10;

export const UpdateUserRequestSchema = z
  .object({ role: RoleSchema.optional(), active: z.boolean().optional() })
  .refine((v) => v.role !== undefined || v.active !== undefined, 'Change the role or the active flag');
export type UpdateUserRequest = z.infer<typeof UpdateUserRequestSchema>;

/** A signed-in user changes their own password; every other session of theirs ends. */
export const ChangePasswordRequestSchema = z.object({
  currentPassword: z.string().min(1, 'Required').max(200),
  newPassword: z.string().min(MIN_PASSWORD_LENGTH, `At least ${MIN_PASSWORD_LENGTH} characters`).max(200),
});
export type ChangePasswordRequest = z.infer<typeof ChangePasswordRequestSchema>;

export const UserDtoSchema = z.object({
  id: IdSchema,
  name: z.string(),
  email: z.email(),
  role: RoleSchema,
  active: z.boolean(),
  createdAt: IsoDateTimeSchema,
});
export type UserDto = z.infer<typeof UserDtoSchema>;
