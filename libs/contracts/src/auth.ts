import { z } from 'zod';
import { EmailSchema, IdSchema, requiredText } from './common';
import { ROLES } from './roles';

export const RoleSchema = z.enum(ROLES);

export const LoginRequestSchema = z.object({
  email: EmailSchema,
  password: z.string().min(1, 'Required').max(200),
});
export type LoginRequest = z.infer<typeof LoginRequestSchema>;

/** The signed-in user as the api and the web see them. */
export const SessionUserSchema = z.object({
  id: IdSchema,
  shopId: IdSchema,
  email: z.email(),
  name: requiredText(100),
  role: RoleSchema,
});
export type SessionUser = z.infer<typeof SessionUserSchema>;

export const LoginResponseSchema = z.object({ user: SessionUserSchema, expiresAt: z.string(), csrfToken: z.string() });
export type LoginResponse = z.infer<typeof LoginResponseSchema>;

export const SessionResponseSchema = z.object({ user: SessionUserSchema, csrfToken: z.string() });
export type SessionResponse = z.infer<typeof SessionResponseSchema>;
