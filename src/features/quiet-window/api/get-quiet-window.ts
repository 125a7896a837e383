import { keepPreviousData, useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { quietWindowSchema, type EvaluateLayerCheckInput, type QuietWindowQuery } from '../../../../shared/schemas/layer-checks';
import { api } from '../../../lib/api-client';

/** The margin map of depth × drive around the check as it stands in the form (cancelled like the evaluation). */
export function useQuietWindow(check: EvaluateLayerCheckInput | undefined, window: QuietWindowQuery = {}) {
  const queryClient = useQueryClient();
  const checkText = JSON.stringify(check);
  // Abort a window still being computed for an older input (same reasoning as the live evaluation).
  useEffect(() => {
    void queryClient.cancelQueries({
      queryKey: ['layer-checks', 'window'],
      predicate: (query) => query.state.fetchStatus === 'fetching' && JSON.stringify(query.queryKey[2]) !== checkText,
    });
  }, [queryClient, checkText]);
  return useQuery({
    queryKey: ['layer-checks', 'window', check, window],
    queryFn: ({ signal }) => api.post('/layer-checks/window', { check, window }, { schema: quietWindowSchema, signal }),
    enabled: check !== undefined,
    placeholderData: keepPreviousData,
    retry: false,
    staleTime: 60_000,
  });
}
