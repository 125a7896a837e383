import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { quietWindowSchema, type EvaluateLayerCheckInput, type QuietWindowQuery } from '../../../../shared/schemas/layer-checks';
import { api } from '../../../lib/api-client';

/** The margin map of depth × drive around the check as it stands in the form (cancelled like the evaluation). */
export function useQuietWindow(check: EvaluateLayerCheckInput | undefined, window: QuietWindowQuery = {}) {
  return useQuery({
    queryKey: ['layer-checks', 'window', check, window],
    queryFn: ({ signal }) => api.post('/layer-checks/window', { check, window }, { schema: quietWindowSchema, signal }),
    enabled: check !== undefined,
    placeholderData: keepPreviousData,
    retry: false,
    staleTime: 60_000,
  });
}
