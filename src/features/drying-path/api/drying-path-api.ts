import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { DryingPathAnswer, DryingPathInputBody, DryingSetup } from '../../../../shared/schemas/drying-paths';
import type { LayerCheckSummary } from '../../../../shared/schemas/layer-checks';
import { api } from '../../../lib/api-client';

/** POST /api/drying-paths/evaluate, as a query keyed by the input (the same input is not computed twice). */
export const useDryingPath = (input: DryingPathInputBody | null) =>
  useQuery({
    queryKey: ['drying-paths', 'evaluate', input],
    queryFn: ({ signal }) => api.post('/drying-paths/evaluate', input, { signal }) as Promise<DryingPathAnswer>,
    enabled: input !== null,
    staleTime: Infinity,
    retry: false,
  });

/** Drying-coat and cast-film checks a set-up can be saved against. */
export const useDryingChecks = () =>
  useQuery({
    queryKey: ['layer-checks', 'list', { drying: true }],
    queryFn: async ({ signal }) => {
      const [coats, films] = await Promise.all(
        (['drying-coat', 'cast-film'] as const).map(
          (processKind) => api.get('/layer-checks', { processKind, pageSize: 200, sort: 'title', dir: 'asc' }, { signal }) as Promise<{ items: LayerCheckSummary[] }>,
        ),
      );
      return [...coats.items, ...films.items];
    },
  });

export const useDryingSetups = (checkId: string | null) =>
  useQuery({
    queryKey: ['drying-setups', 'list', checkId],
    queryFn: ({ signal }) => api.get(`/layer-checks/${checkId}/drying-setups`, undefined, { signal }) as Promise<{ items: DryingSetup[] }>,
    enabled: Boolean(checkId),
  });

export const useSaveDryingSetup = () => {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ checkId, title, input }: { checkId: string; title: string; input: DryingPathInputBody }) =>
      api.post(`/layer-checks/${checkId}/drying-setups`, { title, input }) as Promise<DryingSetup>,
    onSuccess: (setup) => client.invalidateQueries({ queryKey: ['drying-setups', 'list', setup.checkId] }),
  });
};
