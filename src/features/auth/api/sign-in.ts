import { useMutation, useQueryClient } from '@tanstack/react-query';
import { meResponseSchema, type SignInInput } from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';
import { meQueryKey } from './get-me';

export function signIn(input: SignInInput) {
  return api.post('/auth/sign-in', input, { schema: meResponseSchema }).then((body) => body.user);
}

/** Signs in and starts from a clean cache, so nothing from a previous person lingers. */
export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (user) => {
      queryClient.clear();
      queryClient.setQueryData(meQueryKey, user);
    },
  });
}
