import { z } from 'zod';

const optionalDate = (field: string) =>
  z.union([z.literal(''), z.iso.date({ error: `${field} must be a date (YYYY-MM-DD)` })]);

/**
 * The audit filter form. Same limits as the server's audit list query (shared/schemas/audit.ts);
 * blank fields mean "no filter", and a range must not end before it starts.
 */
export const auditFilterFormSchema = z
  .object({
    actor: z.string().trim().max(254, 'actor must be at most 254 characters'),
    entityType: z.string().trim().max(60, 'entity type must be at most 60 characters'),
    from: optionalDate('from'),
    to: optionalDate('to'),
  })
  .refine((values) => !values.from || !values.to || values.from <= values.to, {
    path: ['to'],
    message: 'to must be on or after from',
  });
export type AuditFilterForm = z.infer<typeof auditFilterFormSchema>;
