import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invitationSchema, type InviteUserInput } from '../../../../shared/schemas/users';
import { api } from '../../../lib/api-client';

export function inviteUser(input: InviteUserInput) {
  return api.post('/users/invitations', input, { schema: invitationSchema });
}

/** The invitation mail lands in the outbox, so the outbox list is refreshed too. */
export function useInviteUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: inviteUser,
    onSuccess: () => Promise.all([
      queryClient.invalidateQueries({ queryKey: ['users'] }),
      queryClient.invalidateQueries({ queryKey: ['outbox'] }),
      queryClient.invalidateQueries({ queryKey: ['audit'] }),
    ]),
  });
}
