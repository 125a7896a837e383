import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { layerEvaluationSchema, type EvaluateLayerCheckInput } from '../../../../shared/schemas/layer-checks';
import { api } from '../../../lib/api-client';

/**
 * Live evaluation of the form as it stands. The body is the query key, so each new body is a new
 * request; the previous one is aborted through the query's AbortSignal when its key is left
 * (TanStack Query cancels a fetch whose signal was used once nothing observes it any more).
 */
export function useLayerEvaluation(body: EvaluateLayerCheckInput | undefined) {
  return useQuery({
    queryKey: ['layer-checks', 'evaluate', body],
    queryFn: ({ signal }) => api.post('/layer-checks/evaluate', body, { schema: layerEvaluationSchema, signal }),
    enabled: body !== undefined,
    placeholderData: keepPreviousData,
    retry: false,
    staleTime: 60_000,
  });
}
