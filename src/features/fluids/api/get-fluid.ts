import { queryOptions, useQuery } from '@tanstack/react-query';
import { fluidSchema } from '../../../../shared/schemas/fluids';
import { api } from '../../../lib/api-client';

export const fluidQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['fluids', 'detail', id],
    queryFn: ({ signal }) => api.get(`/fluids/${encodeURIComponent(id)}`, undefined, { schema: fluidSchema, signal }),
  });

export const useFluid = (id: string) => useQuery(fluidQueryOptions(id));
