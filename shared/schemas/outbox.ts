import { z } from 'zod';
import { pageOf } from './api-error';

export const outboxMessageSchema = z.object({
  id: z.uuid(),
  toAddress: z.string(),
  subject: z.string(),
  textBody: z.string(),
  kind: z.string(),
  status: z.enum(['pending', 'sent', 'failed']),
  attempts: z.number().int(),
  lastError: z.string().nullable(),
  createdAt: z.string(),
  sentAt: z.string().nullable(),
  /** True when the local SMTP fake received this message (demo mode). */
  delivered: z.boolean(),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;
export const outboxListSchema = pageOf(outboxMessageSchema);
