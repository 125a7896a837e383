import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { outboxListSchema } from '../../../../shared/schemas/outbox';
import { api } from '../../../lib/api-client';

export interface OutboxListParams {
  page: number;
  pageSize: number;
}

export const outboxQueryOptions = (params: OutboxListParams) =>
  queryOptions({
    queryKey: ['outbox', 'list', params],
    queryFn: ({ signal }) => api.get('/outbox', { ...params }, { schema: outboxListSchema, signal }),
    placeholderData: keepPreviousData,
    staleTime: 5_000,
  });

export const useOutbox = (params: OutboxListParams) => useQuery(outboxQueryOptions(params));
