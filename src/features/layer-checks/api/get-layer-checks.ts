import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { layerCheckListSchema, type ProcessKind } from '../../../../shared/schemas/layer-checks';
import { api } from '../../../lib/api-client';

export interface LayerCheckListParams {
  page: number;
  pageSize: number;
  q?: string;
  processKind?: ProcessKind;
  /** Only this person's checks ("Only my checks" sends the signed-in person's id). */
  ownerId?: string;
  sort?: 'title' | 'processKind' | 'updatedAt' | 'depth' | 'margin';
  dir?: 'asc' | 'desc';
}

export const layerChecksQueryOptions = (params: LayerCheckListParams) =>
  queryOptions({
    queryKey: ['layer-checks', 'list', params],
    queryFn: ({ signal }) => api.get('/layer-checks', { ...params }, { schema: layerCheckListSchema, signal }),
    placeholderData: keepPreviousData,
  });

export const useLayerChecks = (params: LayerCheckListParams) => useQuery(layerChecksQueryOptions(params));
