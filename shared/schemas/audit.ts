import { z } from 'zod';
import { pageOf, pageQuerySchema } from './api-error';

export const auditEventSchema = z.object({
  id: z.number().int(),
  actorId: z.string().nullable(),
  actorEmail: z.string().nullable(),
  action: z.string(),
  entityType: z.string(),
  entityId: z.string().nullable(),
  before: z.unknown().nullable(),
  after: z.unknown().nullable(),
  reason: z.string().nullable(),
  requestId: z.string().nullable(),
  occurredAt: z.string(),
});
export type AuditEvent = z.infer<typeof auditEventSchema>;
export const auditListSchema = pageOf(auditEventSchema);
export const auditListQuerySchema = pageQuerySchema.extend({
  actor: z.string().trim().max(254).optional(),
  entityType: z.string().trim().max(60).optional(),
  from: z.iso.date({ error: 'from must be a date (YYYY-MM-DD)' }).optional(),
  to: z.iso.date({ error: 'to must be a date (YYYY-MM-DD)' }).optional(),
});
export type AuditListQuery = z.infer<typeof auditListQuerySchema>;
