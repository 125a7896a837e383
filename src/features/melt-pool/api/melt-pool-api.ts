import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { LayerCheckSummary } from '../../../../shared/schemas/layer-checks';
import type { Heat, HeatInput, MeltPoolAnswer, MeltPoolInputBody, MeltPoolSetup } from '../../../../shared/schemas/melt-pool';
import { api } from '../../../lib/api-client';

export const useMeltPool = (input: MeltPoolInputBody | null) =>
  useQuery({
    queryKey: ['melt-pool', 'evaluate', input],
    queryFn: ({ signal }) => api.post('/melt-pool/evaluate', input, { signal }) as Promise<MeltPoolAnswer>,
    enabled: input !== null,
    staleTime: Infinity,
    retry: false,
  });

export const useHeats = () =>
  useQuery({
    queryKey: ['heats', 'list'],
    queryFn: ({ signal }) => api.get('/heats', { pageSize: 200 }, { signal }) as Promise<{ items: Heat[]; total: number }>,
  });

export const useCreateHeat = () => {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: HeatInput) => api.post('/heats', body) as Promise<Heat>,
    onSuccess: () => client.invalidateQueries({ queryKey: ['heats'] }),
  });
};

export const useDeleteHeat = () => {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.delete(`/heats/${id}`),
    onSuccess: () => client.invalidateQueries({ queryKey: ['heats'] }),
  });
};

export const useMeltPoolChecks = () =>
  useQuery({
    queryKey: ['layer-checks', 'list', { processKind: 'melt-pool' }],
    queryFn: ({ signal }) => api.get('/layer-checks', { processKind: 'melt-pool', pageSize: 200, sort: 'title', dir: 'asc' }, { signal }) as Promise<{ items: LayerCheckSummary[] }>,
  });

export const useMeltPoolSetups = (checkId: string | null) =>
  useQuery({
    queryKey: ['melt-pool-setups', 'list', checkId],
    queryFn: ({ signal }) => api.get(`/layer-checks/${checkId}/melt-pool`, undefined, { signal }) as Promise<{ items: MeltPoolSetup[] }>,
    enabled: Boolean(checkId),
  });

export const useSaveMeltPoolSetup = () => {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ checkId, ...body }: { checkId: string; input: MeltPoolInputBody; firstHeatId: string; secondHeatId: string }) =>
      api.post(`/layer-checks/${checkId}/melt-pool`, body) as Promise<MeltPoolSetup>,
    onSuccess: (setup) => client.invalidateQueries({ queryKey: ['melt-pool-setups', 'list', setup.checkId] }),
  });
};
