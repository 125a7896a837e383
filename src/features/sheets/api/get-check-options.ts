import { queryOptions, useQuery } from '@tanstack/react-query';
import { layerCheckListSchema } from '../../../../shared/schemas/layer-checks';
import { api } from '../../../lib/api-client';

/** Layer checks to issue a sheet from (newest first; a text filter narrows them). */
export const checkOptionsQueryOptions = (q?: string) =>
  queryOptions({
    queryKey: ['layer-checks', 'list', { picker: true, q }],
    queryFn: ({ signal }) => api.get('/layer-checks', { q, page: 1, pageSize: 50, sort: 'updatedAt', dir: 'desc' }, { schema: layerCheckListSchema, signal }),
  });

export const useCheckOptions = (q?: string) => useQuery(checkOptionsQueryOptions(q));
