import { keepPreviousData, useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { layerEvaluationSchema, type EvaluateLayerCheckInput } from '../../../../shared/schemas/layer-checks';
import { api } from '../../../lib/api-client';

/**
 * Live evaluation of the form as it stands. The body is the query key, so each new body is a new
 * request; the previous one is aborted through the query's AbortSignal when its key is left
 * (TanStack Query cancels a fetch whose signal was used once nothing observes it any more).
 */
export function useLayerEvaluation(body: EvaluateLayerCheckInput | undefined) {
  useCancelOtherFetches(['layer-checks', 'evaluate'], body);
  return useQuery({
    queryKey: ['layer-checks', 'evaluate', body],
    queryFn: ({ signal }) => api.post('/layer-checks/evaluate', body, { schema: layerEvaluationSchema, signal }),
    enabled: body !== undefined,
    placeholderData: keepPreviousData,
    retry: false,
    staleTime: 60_000,
  });
}

/**
 * Aborts any request still running under `prefix` for another body than the current one, so a
 * slow answer to an older input can never arrive after (or instead of) the answer to the newest.
 */
export function useCancelOtherFetches(prefix: readonly unknown[], current: unknown) {
  const queryClient = useQueryClient();
  const currentText = JSON.stringify(current);
  useEffect(() => {
    void queryClient.cancelQueries({
      queryKey: prefix,
      predicate: (query) => query.state.fetchStatus === 'fetching' && JSON.stringify(query.queryKey[prefix.length]) !== currentText,
    });
    // `prefix` is a constant at each call site.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [queryClient, currentText]);
}
