import { queryOptions, useQuery } from '@tanstack/react-query';
import { layerCheckRevisionListSchema, layerCheckSchema } from '../../../../shared/schemas/layer-checks';
import { api } from '../../../lib/api-client';

export const layerCheckQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['layer-checks', 'detail', id],
    queryFn: ({ signal }) => api.get(`/layer-checks/${encodeURIComponent(id)}`, undefined, { schema: layerCheckSchema, signal }),
  });

export const useLayerCheck = (id: string | undefined) => useQuery({ ...layerCheckQueryOptions(id ?? ''), enabled: Boolean(id) });

export const layerCheckRevisionsQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['layer-checks', 'revisions', id],
    queryFn: ({ signal }) => api.get(`/layer-checks/${encodeURIComponent(id)}/revisions`, undefined, { schema: layerCheckRevisionListSchema, signal }),
  });

export const useLayerCheckRevisions = (id: string) => useQuery(layerCheckRevisionsQueryOptions(id));
