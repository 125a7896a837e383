import { useMutation } from '@tanstack/react-query';
import type { z } from 'zod';
import type { passwordResetConfirmInputSchema, passwordResetRequestInputSchema } from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';

type ResetRequest = z.infer<typeof passwordResetRequestInputSchema>;
type ResetConfirm = z.infer<typeof passwordResetConfirmInputSchema>;

export function requestPasswordReset(input: ResetRequest) {
  return api.post('/auth/password-reset/request', input);
}

export function confirmPasswordReset(input: ResetConfirm) {
  return api.post('/auth/password-reset/confirm', input);
}

export const useRequestPasswordReset = () => useMutation({ mutationFn: requestPasswordReset });
export const useConfirmPasswordReset = () => useMutation({ mutationFn: confirmPasswordReset });
