import { queryOptions, useQuery } from '@tanstack/react-query';
import { sheetDetailSchema } from '../../../../shared/schemas/sheets';
import { api } from '../../../lib/api-client';

export const sheetQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['sheets', 'detail', id],
    queryFn: ({ signal }) => api.get(`/sheets/${encodeURIComponent(id)}`, undefined, { schema: sheetDetailSchema, signal }),
  });

export const useSheet = (id: string) => useQuery(sheetQueryOptions(id));

/** Where the browser shows (or downloads) a revision's PDF. */
export function sheetPdfUrl(id: string, options: { download?: boolean } = {}): string {
  return `/api/sheets/${encodeURIComponent(id)}/pdf${options.download ? '?download=1' : ''}`;
}
