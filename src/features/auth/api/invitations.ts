import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { invitationPreviewSchema, meResponseSchema, type invitationAcceptInputSchema } from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';
import { meQueryKey } from './get-me';

export const invitationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: ['invitations', 'detail', token],
    queryFn: ({ signal }) =>
      api.get(`/invitations/${encodeURIComponent(token)}`, undefined, { schema: invitationPreviewSchema, signal }),
    enabled: token.length > 0,
    staleTime: Infinity,
  });

export const useInvitation = (token: string) => useQuery(invitationQueryOptions(token));

export function acceptInvitation(input: z.infer<typeof invitationAcceptInputSchema>) {
  return api.post('/invitations/accept', input, { schema: meResponseSchema }).then((body) => body.user);
}

/** Accepting signs the new person in, so the cache starts fresh with them. */
export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    onSuccess: (user) => {
      queryClient.clear();
      queryClient.setQueryData(meQueryKey, user);
    },
  });
}
