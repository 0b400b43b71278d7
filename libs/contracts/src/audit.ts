import { z } from 'zod';

export const AuditQuerySchema = z.object({
  entityType: z.string().min(1).max(40).optional(),
  entityId: z.coerce.number().int().positive().optional(),
});
export type AuditQuery = z.infer<typeof AuditQuerySchema>;

export const AuditEventSchema = z.object({
  id: z.number().int(),
  userId: z.number().int().nullable(),
  action: z.string(),
  entityType: z.string(),
  entityId: z.number().int().nullable(),
  details: z.record(z.string(), z.unknown()).nullable(),
  at: z.string(),
});
export type AuditEvent = z.infer<typeof AuditEventSchema>;
