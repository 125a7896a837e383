import { queryOptions, useQuery } from '@tanstack/react-query';
import { meResponseSchema } from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';

export const meQueryKey = ['auth', 'me'] as const;

/** The signed-in person; fails with ApiError 401 when there is no session. */
export const meQueryOptions = () =>
  queryOptions({
    queryKey: meQueryKey,
    queryFn: ({ signal }) => api.get('/me', undefined, { schema: meResponseSchema, signal }).then((body) => body.user),
    staleTime: 5 * 60_000,
  });

export const useMe = () => useQuery(meQueryOptions());
