import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { fluidListSchema, type FluidKind } from '../../../../shared/schemas/fluids';
import { api } from '../../../lib/api-client';

export interface FluidListParams {
  page: number;
  pageSize: number;
  q?: string;
  kind?: FluidKind;
  includeArchived?: boolean;
  sort?: 'name' | 'kind' | 'updatedAt' | 'density' | 'viscosity' | 'surfaceTension';
  dir?: 'asc' | 'desc';
}

export const fluidsQueryOptions = (params: FluidListParams) =>
  queryOptions({
    queryKey: ['fluids', 'list', params],
    queryFn: ({ signal }) =>
      api.get('/fluids', { ...params, includeArchived: params.includeArchived ? 'true' : undefined }, { schema: fluidListSchema, signal }),
    placeholderData: keepPreviousData,
  });

export const useFluids = (params: FluidListParams) => useQuery(fluidsQueryOptions(params));
