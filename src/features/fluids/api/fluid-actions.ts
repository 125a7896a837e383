import { useMutation, useQueryClient } from '@tanstack/react-query';
import { fluidSchema } from '../../../../shared/schemas/fluids';
import { api } from '../../../lib/api-client';

export function duplicateFluid({ id, name }: { id: string; name?: string }) {
  return api.post(`/fluids/${encodeURIComponent(id)}/duplicate`, name ? { name } : {}, { schema: fluidSchema });
}

/** Archive hides a fluid from pickers but keeps it for the checks that use it; restore brings it back. */
export function setFluidArchived({ id, version, archived }: { id: string; version: number; archived: boolean }) {
  return api.post(`/fluids/${encodeURIComponent(id)}/${archived ? 'archive' : 'restore'}`, { version }, { schema: fluidSchema });
}

export function useDuplicateFluid() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: duplicateFluid, onSuccess: () => queryClient.invalidateQueries({ queryKey: ['fluids'] }) });
}

export function useSetFluidArchived() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: setFluidArchived, onSuccess: () => queryClient.invalidateQueries({ queryKey: ['fluids'] }) });
}
