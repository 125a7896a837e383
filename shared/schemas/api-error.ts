import { z } from 'zod';

/**
 * The one error shape every API route answers with:
 * `{ error: { code, message, fields? } }`. `fields` maps a field path ("email",
 * "rows.3.depth") to the message that belongs beside that field.
 */
export const apiErrorBodySchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    fields: z.record(z.string(), z.string()).optional(),
  }),
});
export type ApiErrorBody = z.infer<typeof apiErrorBodySchema>;

/** Paged list envelope used by every list endpoint. */
export const pageQuerySchema = z.object({
  page: z.coerce.number().int().min(1, 'page must be at least 1').max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1, 'pageSize must be at least 1').max(200, 'pageSize must be at most 200').default(25),
});
export type PageQuery = z.infer<typeof pageQuerySchema>;

export function pageOf<T extends z.ZodType>(item: T) {
  return z.object({
    items: z.array(item),
    total: z.number().int(),
    page: z.number().int(),
    pageSize: z.number().int(),
  });
}
