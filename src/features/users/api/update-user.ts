import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userSchema, type UpdateUserInput } from '../../../../shared/schemas/users';
import { api } from '../../../lib/api-client';

export function updateUser({ id, changes }: { id: string; changes: UpdateUserInput }) {
  return api.patch(`/users/${encodeURIComponent(id)}`, changes, { schema: userSchema });
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    onSuccess: () => Promise.all([
      queryClient.invalidateQueries({ queryKey: ['users'] }),
      queryClient.invalidateQueries({ queryKey: ['audit'] }),
    ]),
  });
}
