import { z } from 'zod';

export const ROLES = ['manager', 'desk', 'mechanic'] as const;
export const RoleSchema = z.enum(ROLES);
export type Role = z.infer<typeof RoleSchema>;

export const ROLE_LABELS: Record<Role, string> = { manager: 'Manager', desk: 'Front desk', mechanic: 'Mechanic' };

export const LoginRequestSchema = z.object({
  email: z.email('Enter a valid e-mail address').max(200),
  password: z.string().min(1, 'Enter your password').max(200),
});
export type LoginRequest = z.infer<typeof LoginRequestSchema>;

export const SessionUserSchema = z.object({
  id: z.number().int(),
  shopId: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: RoleSchema,
});
export type SessionUser = z.infer<typeof SessionUserSchema>;

export const LoginResponseSchema = z.object({ user: SessionUserSchema, expiresAt: z.string(), csrfToken: z.string() });
export type LoginResponse = z.infer<typeof LoginResponseSchema>;

export const SessionResponseSchema = z.object({ user: SessionUserSchema, csrfToken: z.string() });
export type SessionResponse = z.infer<typeof SessionResponseSchema>;
