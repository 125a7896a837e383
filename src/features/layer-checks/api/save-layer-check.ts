import { useMutation, useQueryClient } from '@tanstack/react-query';
import { layerCheckSchema, type LayerCheckInput } from '../../../../shared/schemas/layer-checks';
import { api } from '../../../lib/api-client';

export function createLayerCheck(input: LayerCheckInput) {
  return api.post('/layer-checks', input, { schema: layerCheckSchema });
}

/** A stale `version` is refused with 409: someone saved a newer revision meanwhile. */
export function updateLayerCheck({ id, input, version }: { id: string; input: LayerCheckInput; version: number }) {
  return api.put(`/layer-checks/${encodeURIComponent(id)}`, { ...input, version }, { schema: layerCheckSchema });
}

export function useCreateLayerCheck() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createLayerCheck, onSuccess: () => queryClient.invalidateQueries({ queryKey: ['layer-checks'] }) });
}

export function useUpdateLayerCheck() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateLayerCheck, onSuccess: () => queryClient.invalidateQueries({ queryKey: ['layer-checks'] }) });
}
