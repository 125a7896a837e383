import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { LayerCheckSummary } from '../../../../shared/schemas/layer-checks';
import type { PropertySpread, RunSpreadInput } from '../../../../shared/schemas/property-spreads';
import { api } from '../../../lib/api-client';

/** Checks a spread can be run on (newest first). */
export const useSpreadChecks = () =>
  useQuery({
    queryKey: ['layer-checks', 'list', { picker: 'spread' }],
    queryFn: ({ signal }) => api.get('/layer-checks', { pageSize: 200, sort: 'updatedAt', dir: 'desc' }, { signal }) as Promise<{ items: LayerCheckSummary[] }>,
  });

export const useSpreadsOfCheck = (checkId: string | null) =>
  useQuery({
    queryKey: ['property-spreads', 'list', checkId],
    queryFn: ({ signal }) => api.get(`/layer-checks/${checkId}/spreads`, undefined, { signal }) as Promise<{ items: PropertySpread[] }>,
    enabled: Boolean(checkId),
  });

/** One spread; polls every second while it is queued or running so the progress bar moves. */
export const useSpread = (id: string | null) =>
  useQuery({
    queryKey: ['property-spreads', 'detail', id],
    queryFn: ({ signal }) => api.get(`/property-spreads/${id}`, undefined, { signal }) as Promise<PropertySpread>,
    enabled: Boolean(id),
    refetchInterval: (query) => (query.state.data && (query.state.data.status === 'queued' || query.state.data.status === 'running') ? 1000 : false),
  });

export const useRunSpread = () => {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ checkId, body }: { checkId: string; body: RunSpreadInput }) => api.post(`/layer-checks/${checkId}/spreads`, body) as Promise<PropertySpread>,
    onSuccess: (spread) => {
      client.setQueryData(['property-spreads', 'detail', spread.id], spread);
      return client.invalidateQueries({ queryKey: ['property-spreads', 'list', spread.checkId] });
    },
  });
};
