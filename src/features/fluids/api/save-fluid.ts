import { useMutation, useQueryClient } from '@tanstack/react-query';
import { fluidSchema, type FluidInput } from '../../../../shared/schemas/fluids';
import { api } from '../../../lib/api-client';

export function createFluid(input: FluidInput) {
  return api.post('/fluids', input, { schema: fluidSchema });
}

export function updateFluid({ id, input, version }: { id: string; input: FluidInput; version: number }) {
  return api.put(`/fluids/${encodeURIComponent(id)}`, { ...input, version }, { schema: fluidSchema });
}

export function useCreateFluid() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createFluid, onSuccess: () => queryClient.invalidateQueries({ queryKey: ['fluids'] }) });
}

export function useUpdateFluid() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateFluid, onSuccess: () => queryClient.invalidateQueries({ queryKey: ['fluids'] }) });
}
