import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export function signOut() {
  return api.post('/auth/sign-out');
}

/** Signs out and forgets every cached answer (they belonged to the person who left). */
export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSettled: () => queryClient.clear(),
  });
}
