import { queryOptions, useQuery } from '@tanstack/react-query';
import { publicConfigSchema } from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';

export const publicConfigQueryOptions = () =>
  queryOptions({
    queryKey: ['config', 'public'],
    queryFn: ({ signal }) => api.get('/config/public', undefined, { schema: publicConfigSchema, signal }),
    staleTime: Infinity,
  });

export const usePublicConfig = () => useQuery(publicConfigQueryOptions());
